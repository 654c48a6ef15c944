/** One difference between two JSON documents, located by a JSON Pointer (RFC 6901). */
export interface JsonDifference {
  readonly pointer: string;
  readonly before: unknown;
  readonly after: unknown;
}

function escapeToken(token: string): string {
  return token.replaceAll("~", "~0").replaceAll("/", "~1");
}

/** True when two numbers agree within `relative` of the larger magnitude (or both are below 1e-15). */
export function numbersAgree(a: number, b: number, relative: number): boolean {
  if (a === b) return true;
  const scale = Math.max(Math.abs(a), Math.abs(b));
  return Math.abs(a - b) <= relative * scale || Math.abs(a - b) < 1e-15;
}

/** Lists the differences between two JSON values; numbers are compared within a relative tolerance. */
export function compareJson(
  before: unknown,
  after: unknown,
  relative: number,
  pointer = "",
  out: JsonDifference[] = [],
): JsonDifference[] {
  if (typeof before === "number" && typeof after === "number") {
    if (!numbersAgree(before, after, relative)) out.push({ pointer, before, after });
    return out;
  }
  if (Array.isArray(before) && Array.isArray(after)) {
    const n = Math.max(before.length, after.length);
    for (let i = 0; i < n; i++) {
      if (i >= before.length || i >= after.length) {
        out.push({ pointer: `${pointer}/${i}`, before: before[i], after: after[i] });
      } else compareJson(before[i], after[i], relative, `${pointer}/${i}`, out);
    }
    return out;
  }
  if (isRecord(before) && isRecord(after)) {
    const keys = [...new Set([...Object.keys(before), ...Object.keys(after)])].sort();
    for (const key of keys) {
      const at = `${pointer}/${escapeToken(key)}`;
      if (!(key in before) || !(key in after)) {
        out.push({ pointer: at, before: before[key], after: after[key] });
      } else compareJson(before[key], after[key], relative, at, out);
    }
    return out;
  }
  if (before !== after) out.push({ pointer, before, after });
  return out;
}

function isRecord(value: unknown): value is Record<string, unknown> {
  return typeof value === "object" && value !== null && !Array.isArray(value);
}
