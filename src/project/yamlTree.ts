import type { Node } from "yaml";
import { type Diagnostic, error } from "./diagnostic.ts";
import type { Position } from "./position.ts";
import { describeCodePoints, NON_DECIMAL_NUMBER } from "./quantity.ts";
import { loadReaderLibraries, readerLibrariesDeferred, yamlLibrary } from "./readerLibraries.ts";
import { parseSimpleYaml } from "./yamlSubset.ts";
import type { YamlEntry, YamlValue } from "./yamlValue.ts";

export type { YamlEntry, YamlValue } from "./yamlValue.ts";

// The library is there before any reading, unless `fluxnote check` deferred it (src/project/readerLibraries.ts).
if (!readerLibrariesDeferred()) await loadReaderLibraries();

export type YamlParse =
  | { readonly ok: true; readonly value: YamlValue }
  | { readonly ok: false; readonly diagnostics: readonly Diagnostic[] };

const MAX_DEPTH = 16;
/** C0 controls except tab and line feed, DEL and C1 controls: never meant in a project's text. */
// deno-lint-ignore no-control-regex -- matching control characters is the point
const CONTROL = /[\u0000-\u0008\u000B-\u001F\u007F-\u009F]/;

/**
 * Parses a YAML text that sits at `firstLine` of `file` into a position-carrying tree.
 * Aliases, tags and duplicate keys are errors, so alias bombs and object tags cannot get in.
 */
export function parseYamlAt(text: string, file: string, firstLine: number, firstCol = 1): YamlParse {
  const simple = parseSimpleYaml(text, simplePlacer(text, file, firstLine, firstCol));
  return simple === undefined
    ? parseYamlWithLibrary(text, file, firstLine, firstCol)
    : { ok: true, value: simple };
}

/** `parseYamlAt` by the YAML library alone (what the subset reader must agree with). */
export function parseYamlWithLibrary(text: string, file: string, firstLine: number, firstCol = 1): YamlParse {
  const { isAlias, isMap, isScalar, isSeq, LineCounter, parseDocument } = yamlLibrary();
  const lineCounter = new LineCounter();
  const doc = parseDocument(text, {
    lineCounter,
    uniqueKeys: true,
    prettyErrors: false,
    schema: "core",
    strict: true,
  });
  const place = (offset: number): Position => {
    const p = lineCounter.linePos(offset);
    return { file, line: firstLine + p.line - 1, col: (p.line === 1 ? firstCol - 1 : 0) + p.col };
  };
  const problems = [...doc.errors, ...doc.warnings];
  if (problems.length > 0) {
    return {
      ok: false,
      diagnostics: problems.map((e) =>
        error(
          place(e.pos[0]),
          "yaml-syntax",
          `Cannot parse the block as YAML: ${firstSentence(e.message)}`,
          "check indentation and that each line reads `key: value`; quote values containing `: ` or `#`",
        )
      ),
    };
  }
  const diagnostics: Diagnostic[] = [];
  const aliases: Position[] = [];
  const convert = (node: unknown, depth: number): YamlValue | undefined => {
    const n = node as Node | null;
    const at = place(n?.range?.[0] ?? 0);
    if (depth > MAX_DEPTH) {
      diagnostics.push(
        error(at, "yaml-depth", `Too deeply nested: more than ${MAX_DEPTH} levels`, "flatten the block"),
      );
      return undefined;
    }
    if (n === null || n === undefined) return { kind: "scalar", value: null, text: "", at };
    if (isAlias(n)) {
      aliases.push(at);
      return undefined;
    }
    if (n.tag !== undefined) {
      // Core schema only: an explicit tag (`!!timestamp`, `!!binary`, `!!str`, `!local`) changes what a
      // value means, and `!!timestamp` even depends on the machine's time zone.
      const shown = n.tag.replace(/^tag:yaml\.org,2002:/, "!!");
      diagnostics.push(
        error(
          at,
          "yaml-tag",
          `Cannot use the YAML tag "${describeCodePoints(shown)}": input blocks hold plain values only`,
          "remove the tag and write the value as plain text (a date as `2031-05-14`, a name as words)",
        ),
      );
      return undefined;
    }
    if (isScalar(n)) {
      const [start, end] = n.range ?? [0, 0];
      const written = text.slice(start, end);
      const value = n.value;
      if (typeof value === "string" && CONTROL.test(value)) {
        const code = describeCodePoints(CONTROL.exec(value)?.[0] ?? "");
        diagnostics.push(
          error(
            at,
            "control-character",
            `Cannot use the control character ${code} in the text "${describeCodePoints(value)}"`,
            "remove it; escapes such as \\u001b, \\0 or \\a in quoted text are not accepted",
          ),
        );
        return undefined;
      }
      // Hexadecimal, octal and binary integers (0x1, 0o7, 0b1) stay text, so a number field refuses them.
      const plain = typeof value === "number" && NON_DECIMAL_NUMBER.test(written)
        ? written
        : typeof value === "string" || typeof value === "number" || typeof value === "boolean" ||
            value === null
        ? value
        : String(value);
      return { kind: "scalar", value: plain, text: written, at };
    }
    if (isSeq(n)) {
      const items: YamlValue[] = [];
      for (const item of n.items) {
        const v = convert(item, depth + 1);
        if (v !== undefined) items.push(v);
      }
      return { kind: "list", items, at };
    }
    if (isMap(n)) {
      const entries: YamlEntry[] = [];
      for (const pair of n.items) {
        const keyNode = pair.key as Node | null;
        const keyAt = place(keyNode?.range?.[0] ?? 0);
        if (!isScalar(keyNode) || typeof keyNode.value !== "string") {
          diagnostics.push(
            error(keyAt, "yaml-key", "Cannot use a non-text key", "write keys as plain words, e.g. `id:`"),
          );
          continue;
        }
        const value = convert(pair.value, depth + 1) ?? { kind: "scalar", value: null, text: "", at: keyAt };
        entries.push({
          key: keyNode.value,
          keyAt,
          value: pair.value === null ? { ...value, at: keyAt } : value,
        });
      }
      return { kind: "map", entries, at };
    }
    diagnostics.push(
      error(at, "yaml-node", "Cannot read this YAML value", "write a plain value, list or mapping"),
    );
    return undefined;
  };
  const value = convert(doc.contents, 0);
  const firstAlias = aliases[0];
  if (firstAlias !== undefined) {
    // One finding per block: an alias bomb repeats `*name` many times, and one line says it all.
    const count = aliases.length > 1 ? ` (${aliases.length} aliases in this block)` : "";
    diagnostics.push(
      error(
        firstAlias,
        "yaml-alias",
        `Cannot use YAML aliases (*name) in input blocks${count}`,
        "write the value out in full",
      ),
    );
  }
  if (diagnostics.length > 0 || value === undefined) return { ok: false, diagnostics };
  return { ok: true, value };
}

/** `place` of the library's reading, for the subset: line and column (UTF-16 units, 1-based) of an offset. */
function simplePlacer(
  text: string,
  file: string,
  firstLine: number,
  firstCol: number,
): (offset: number) => Position {
  const starts = [0];
  for (let i = text.indexOf("\n"); i >= 0; i = text.indexOf("\n", i + 1)) starts.push(i + 1);
  return (offset) => {
    let lo = 0, hi = starts.length - 1;
    while (lo < hi) {
      const mid = (lo + hi + 1) >> 1;
      if (starts[mid]! <= offset) lo = mid;
      else hi = mid - 1;
    }
    return { file, line: firstLine + lo, col: (lo === 0 ? firstCol - 1 : 0) + offset - starts[lo]! + 1 };
  };
}

function firstSentence(message: string): string {
  if (message.startsWith("Source contains multiple documents")) {
    return "a line `---` starts a second YAML document; a block holds one mapping";
  }
  return (message.split("\n", 1)[0] ?? message).replace(/ at line \d+, column \d+:?$/, "").replace(/\.$/, "");
}
