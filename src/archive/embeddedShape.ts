/** Shape checks for the JSON a package embeds, before `verify` or `diff` rely on any of it. */
import type { LibraryMaterial } from "../materials/libraryMaterial.ts";

/** The parts of an embedded results.json that verification reads, proven to have these types. */
export interface EmbeddedResultsHead {
  readonly schema: string;
  readonly tool: { readonly name: "fluxnote"; readonly version: string };
  readonly inputs: {
    readonly sha256: string;
    readonly files: readonly { readonly path: string; readonly sha256: string }[];
  };
}

export type ShapeOutcome<T> =
  | { readonly ok: true; readonly value: T; readonly parsed: unknown }
  | { readonly ok: false; readonly reason: string };

function isRecord(value: unknown): value is Record<string, unknown> {
  return typeof value === "object" && value !== null && !Array.isArray(value);
}

function kind(value: unknown): string {
  if (value === null) return "null";
  if (Array.isArray(value)) return "an array";
  if (typeof value === "string") return `the string ${JSON.stringify(value.slice(0, 40))}`;
  return typeof value === "object" ? "an object" : `${typeof value} ${String(value)}`;
}

function parse(text: string): { ok: true; value: unknown } | { ok: false; reason: string } {
  try {
    return { ok: true, value: JSON.parse(text) };
  } catch (cause) {
    return {
      ok: false,
      reason: `not valid JSON (${cause instanceof Error ? cause.message : String(cause)})`,
    };
  }
}

const HEX64 = /^[0-9a-f]{64}$/;

/** Parses the embedded results text and checks the members verification depends on. */
export function checkEmbeddedResults(text: string): ShapeOutcome<EmbeddedResultsHead> {
  const parsed = parse(text);
  if (!parsed.ok) return parsed;
  const root = parsed.value;
  const fail = (pointer: string, expected: string, found: unknown) => ({
    ok: false as const,
    reason: `${pointer === "" ? "the document" : pointer} must be ${expected}, found ${kind(found)}`,
  });
  if (!isRecord(root)) return fail("", "an object", root);
  if (typeof root.schema !== "string" || !root.schema.startsWith("fluxnote-results/")) {
    return fail("/schema", 'a string "fluxnote-results/<n>"', root.schema);
  }
  const tool = root.tool;
  if (!isRecord(tool)) return fail("/tool", "an object", tool);
  if (tool.name !== "fluxnote") return fail("/tool/name", '"fluxnote"', tool.name);
  if (typeof tool.version !== "string" || !/^[0-9A-Za-z.+-]{1,64}$/.test(tool.version)) {
    return fail("/tool/version", "a version string such as 1.2.3", tool.version);
  }
  const inputs = root.inputs;
  if (!isRecord(inputs)) return fail("/inputs", "an object", inputs);
  if (typeof inputs.sha256 !== "string" || !HEX64.test(inputs.sha256)) {
    return fail("/inputs/sha256", "a SHA-256 in 64 lowercase hex digits", inputs.sha256);
  }
  if (!Array.isArray(inputs.files)) return fail("/inputs/files", "an array", inputs.files);
  const files: { path: string; sha256: string }[] = [];
  for (const [i, record] of inputs.files.entries()) {
    if (!isRecord(record)) return fail(`/inputs/files/${i}`, "an object", record);
    if (typeof record.path !== "string" || record.path === "") {
      return fail(`/inputs/files/${i}/path`, "a non-empty string", record.path);
    }
    if (typeof record.sha256 !== "string" || !HEX64.test(record.sha256)) {
      return fail(`/inputs/files/${i}/sha256`, "a SHA-256 in 64 lowercase hex digits", record.sha256);
    }
    files.push({ path: record.path, sha256: record.sha256 });
  }
  return {
    ok: true,
    parsed: root,
    value: {
      schema: root.schema,
      tool: { name: "fluxnote", version: tool.version },
      inputs: { sha256: inputs.sha256, files },
    },
  };
}

function finite(value: unknown): boolean {
  return typeof value === "number" && Number.isFinite(value);
}

/** Parses an embedded library entry and checks it has the members of a `LibraryMaterial`. */
export function checkLibraryEntry(text: string, id: string): ShapeOutcome<LibraryMaterial> {
  const parsed = parse(text);
  if (!parsed.ok) return parsed;
  const entry = parsed.value;
  if (!isRecord(entry)) return { ok: false, reason: `it must be an object, found ${kind(entry)}` };
  if (entry.id !== id) return { ok: false, reason: `its id must be "${id}", found ${kind(entry.id)}` };
  for (const key of ["name", "materialClass", "source"]) {
    if (typeof entry[key] !== "string") {
      return { ok: false, reason: `its "${key}" must be a string, found ${kind(entry[key])}` };
    }
  }
  const numbers = "resistance" in entry ? ["resistance"] : ["conductivity", "density", "specificHeat"];
  for (const key of numbers) {
    if (!finite(entry[key])) {
      return { ok: false, reason: `its "${key}" must be a number, found ${kind(entry[key])}` };
    }
  }
  return { ok: true, parsed: entry, value: entry as unknown as LibraryMaterial };
}
