/**
 * A reader for the plain YAML that project blocks are written in: block mappings of `key: value` lines, block
 * sequences (`- item`), one-line flow mappings and sequences (`{ a: 1, b: x }`, `[a, b]`), plain and simply quoted
 * scalars, whole-line comments. It gives exactly the tree the YAML library gives for such text (core schema), and
 * `undefined` for anything else (anchors, tags, block scalars, multi-line values, escapes, trailing comments, any
 * error), which the library then reads. It exists for start-up time: the library's CommonJS build takes longer to
 * load than a small project takes to read, so `check` loads it only when a block needs it (README, "Start-up").
 */
import type { Position } from "./position.ts";
import type { YamlEntry, YamlValue } from "./yamlValue.ts";

/** Any character the subset leaves to the library: tab, CR and other controls, DEL, C1, BOM, non-characters. */
// deno-lint-ignore no-control-regex -- finding control characters is the point
const UNUSUAL = /[\u0000-\u0009\u000B-\u001F\u007F-\u009F\uFEFF\uFFFE\uFFFF]/;
const KEY = /^[A-Za-z][A-Za-z0-9_-]{0,63}$/;
const NOT_TEXT_KEY = /^(?:~|[Nn]ull|NULL|[Tt]rue|TRUE|[Ff]alse|FALSE)$/;
/** First characters a plain scalar may not start with here (YAML indicators; `-` is checked apart). */
const INDICATOR = /^[?:,[\]{}#&*!|>'"%@`]/;
const MAX_DEPTH = 8;

/** Outside the subset: the caller reads the text with the YAML library instead. */
class NotSimple extends Error {}

interface Line {
  readonly start: number;
  readonly indent: number;
  /** The line without its indent; "" for a blank line. */
  readonly content: string;
}

/** Reads `text` if it is plain YAML as described above; `place` turns an offset into a position. */
export function parseSimpleYaml(text: string, place: (offset: number) => Position): YamlValue | undefined {
  if (UNUSUAL.test(text)) return undefined;
  try {
    return new SimpleReader(text, place).document();
  } catch (cause) {
    if (cause instanceof NotSimple) return undefined;
    throw cause;
  }
}

function notSimple(): never {
  throw new NotSimple();
}

/** The core schema's reading of a plain scalar (the YAML library's tests, in its order). */
function plainValue(s: string): string | number | boolean | null {
  if (/^(?:~|[Nn]ull|NULL)$/.test(s)) return null;
  if (/^(?:[Tt]rue|TRUE|[Ff]alse|FALSE)$/.test(s)) return s[0] === "t" || s[0] === "T";
  if (/^0o[0-7]+$/.test(s) || /^0x[0-9a-fA-F]+$/.test(s)) notSimple();
  if (/^[-+]?[0-9]+$/.test(s)) return parseInt(s, 10);
  if (/^(?:[-+]?\.(?:inf|Inf|INF)|\.nan|\.NaN|\.NAN)$/.test(s)) notSimple();
  if (/^[-+]?(?:\.[0-9]+|[0-9]+(?:\.[0-9]*)?)[eE][-+]?[0-9]+$/.test(s)) return parseFloat(s);
  if (/^[-+]?(?:\.[0-9]+|[0-9]+\.[0-9]*)$/.test(s)) return parseFloat(s);
  return s;
}

class SimpleReader {
  private readonly lines: Line[] = [];
  /** Index of the next line not yet read. */
  private next = 0;

  constructor(private readonly text: string, private readonly place: (offset: number) => Position) {
    let start = 0;
    for (const raw of text.split("\n")) {
      const content = raw.trimStart();
      if (content !== "" && raw.endsWith(" ")) notSimple(); // trailing spaces: left to the library
      if (/^(?:---|\.\.\.|%)/.test(raw)) notSimple(); // document markers and directives
      this.lines.push({ start, indent: raw.length - content.length, content });
      start += raw.length + 1;
    }
  }

  document(): YamlValue {
    const first = this.skipToContent();
    if (first === undefined || first.indent !== 0) notSimple();
    const map = this.blockMap(first.start, 0, 1);
    if (this.skipToContent() !== undefined) notSimple();
    return map;
  }

  /** The next line holding content (blank and whole-line comment lines skipped), without consuming it. */
  private skipToContent(): Line | undefined {
    while (this.next < this.lines.length) {
      const line = this.lines[this.next]!;
      if (line.content !== "" && !line.content.startsWith("#")) return line;
      this.next++;
    }
    return undefined;
  }

  /** A block mapping whose first key is at `offset` (on the current line), its keys in column `col`. */
  private blockMap(offset: number, col: number, depth: number): YamlValue {
    if (depth > MAX_DEPTH) notSimple();
    const entries: YamlEntry[] = [];
    const keys = new Set<string>();
    let at = offset;
    for (;;) {
      const line = this.lines[this.next]!;
      const rest = this.text.slice(at, line.start + line.indent + line.content.length);
      const colon = rest.indexOf(":");
      const key = colon < 0 ? "" : rest.slice(0, colon);
      if (!KEY.test(key) || NOT_TEXT_KEY.test(key) || keys.has(key)) notSimple();
      keys.add(key);
      const after = rest.slice(colon + 1);
      const keyAt = this.place(at);
      this.next++;
      let value: YamlValue;
      if (after === "") value = this.nested(col, depth);
      else {
        if (!after.startsWith(" ")) notSimple();
        const valueStart = at + colon + 1 + (after.length - after.trimStart().length);
        value = this.lineValue(valueStart, at + rest.length, depth, col);
        const following = this.skipToContent();
        if (following !== undefined && following.indent > col) notSimple(); // a continued value
      }
      entries.push({ key, keyAt, value });
      const following = this.skipToContent();
      if (following === undefined || following.indent < col) break;
      if (following.indent !== col) notSimple();
      at = following.start + following.indent;
    }
    return { kind: "map", entries, at: this.place(offset) };
  }

  /** The block collection under a `key:` that ends its line: a sequence or a mapping indented further. */
  private nested(col: number, depth: number): YamlValue {
    const line = this.skipToContent();
    if (line === undefined || line.indent <= col) notSimple(); // an empty value: left to the library
    if (line.content.startsWith("- ")) return this.blockSeq(line.indent, depth + 1);
    return this.blockMap(line.start + line.indent, line.indent, depth + 1);
  }

  /** A block sequence with its dashes in column `col`. */
  private blockSeq(col: number, depth: number): YamlValue {
    if (depth > MAX_DEPTH) notSimple();
    const items: YamlValue[] = [];
    const first = this.lines[this.next]!;
    for (;;) {
      const line = this.lines[this.next]!;
      const content = line.content;
      const gap = content.length - content.slice(1).trimStart().length;
      const itemStart = line.start + line.indent + gap;
      const item = content.slice(gap);
      if (/^[A-Za-z][A-Za-z0-9_-]*:(?: |$)/.test(item)) {
        items.push(this.blockMap(itemStart, line.indent + gap, depth + 1));
      } else {
        this.next++;
        items.push(this.lineValue(itemStart, line.start + line.indent + content.length, depth, col));
        const following = this.skipToContent();
        if (following !== undefined && following.indent > col) notSimple();
      }
      const following = this.skipToContent();
      if (following === undefined || following.indent < col) break;
      if (following.indent !== col || !following.content.startsWith("- ")) notSimple();
    }
    return { kind: "list", items, at: this.place(first.start + first.indent) };
  }

  /**
   * A value that fills the line from `start` to `end`: a flow collection (which may go on over lines indented
   * past `col`, the column of its key or dash), a quoted or a plain scalar.
   */
  private lineValue(start: number, end: number, depth: number, col: number): YamlValue {
    const c = this.text[start];
    if (c === "{" || c === "[") {
      const { value, end: after } = this.flow(start, depth + 1, col);
      if (after > end) {
        // Closed on a later line: nothing may follow it there.
        while (this.next < this.lines.length && this.lines[this.next]!.start <= after) this.next++;
        const last = this.lines[this.next - 1]!;
        if (after !== last.start + last.indent + last.content.length) notSimple();
      } else if (after !== end) notSimple();
      return value;
    }
    if (c === '"' || c === "'") {
      const { value, end: after } = this.quoted(start);
      if (after !== end) notSimple();
      return value;
    }
    const written = this.text.slice(start, end);
    if (INDICATOR.test(written) || /^-(?: |$)/.test(written)) notSimple();
    if (written.includes(" #") || written.includes(": ") || written.endsWith(":")) notSimple();
    return this.scalar(written, start);
  }

  private scalar(written: string, start: number): YamlValue {
    return { kind: "scalar", value: plainValue(written), text: written, at: this.place(start) };
  }

  /** A one-line quoted scalar without escapes; returns the offset after its closing quote. */
  private quoted(start: number): { value: YamlValue; end: number } {
    const quote = this.text[start]!;
    const close = this.text.indexOf(quote, start + 1);
    if (close < 0) notSimple();
    const inner = this.text.slice(start + 1, close);
    if (inner.includes("\n") || inner.includes("\\") || this.text[close + 1] === quote) notSimple();
    const written = this.text.slice(start, close + 1);
    return { value: { kind: "scalar", value: inner, text: written, at: this.place(start) }, end: close + 1 };
  }

  private skipSpaces(at: number): number {
    while (this.text[at] === " ") at++;
    return at;
  }

  /** The line that starts at `offset`, if any (binary search: a flow collection may span many lines). */
  private lineStartingAt(offset: number): Line | undefined {
    let lo = 0, hi = this.lines.length - 1;
    while (lo < hi) {
      const mid = (lo + hi) >> 1;
      if (this.lines[mid]!.start < offset) lo = mid + 1;
      else hi = mid;
    }
    const line = this.lines[lo];
    return line?.start === offset ? line : undefined;
  }

  /** Spaces and line breaks inside a flow collection: each new line indented past `col`, holding content. */
  private skipFlowSpace(at: number, col: number): number {
    for (;;) {
      at = this.skipSpaces(at);
      if (this.text[at] !== "\n") return at;
      const line = this.lineStartingAt(at + 1);
      if (line === undefined || line.indent <= col || line.content === "" || line.content.startsWith("#")) {
        notSimple();
      }
      at = line.start + line.indent;
    }
  }

  /** A flow mapping or sequence on one line, starting at its bracket; returns the offset after its closing one. */
  private flow(start: number, depth: number, col: number): { value: YamlValue; end: number } {
    if (depth > MAX_DEPTH) notSimple();
    const isMap = this.text[start] === "{";
    const closer = isMap ? "}" : "]";
    const entries: YamlEntry[] = [];
    const items: YamlValue[] = [];
    const keys = new Set<string>();
    let at = this.skipFlowSpace(start + 1, col);
    if (this.text[at] !== closer) {
      for (;;) {
        if (isMap) {
          const key = /^[A-Za-z][A-Za-z0-9_-]{0,63}(?=: )/.exec(this.text.slice(at, at + 66))?.[0];
          if (key === undefined || NOT_TEXT_KEY.test(key) || keys.has(key)) notSimple();
          keys.add(key);
          const keyAt = this.place(at);
          const read = this.flowValue(this.skipSpaces(at + key.length + 1), depth, col);
          entries.push({ key, keyAt, value: read.value });
          at = read.end;
        } else {
          const read = this.flowValue(at, depth, col);
          items.push(read.value);
          at = read.end;
        }
        at = this.skipFlowSpace(at, col);
        if (this.text[at] === closer) break;
        if (this.text[at] !== ",") notSimple();
        at = this.skipFlowSpace(at + 1, col);
        if (this.text[at] === closer || this.text[at] === ",") notSimple(); // trailing or empty entry
      }
    }
    const value: YamlValue = isMap
      ? { kind: "map", entries, at: this.place(start) }
      : { kind: "list", items, at: this.place(start) };
    return { value, end: at + 1 };
  }

  /** A value inside a flow collection; returns the offset after it (before any spaces). */
  private flowValue(start: number, depth: number, col: number): { value: YamlValue; end: number } {
    const c = this.text[start];
    if (c === "{" || c === "[") return this.flow(start, depth + 1, col);
    if (c === '"' || c === "'") return this.quoted(start);
    let end = start;
    while (end < this.text.length && !",]}\n".includes(this.text[end]!)) end++;
    const written = this.text.slice(start, end).trimEnd();
    if (written === "" || INDICATOR.test(written) || /^-(?: |$)/.test(written)) notSimple();
    if (/[:#[{"]/.test(written)) notSimple(); // pairs, comments, nested brackets: left to the library
    return { value: this.scalar(written, start), end: start + written.length };
  }
}
