import { formatPosition, type Position } from "../project/position.ts";
import type { Field } from "./fields.ts";

/** The decoded text of each input file, by project path, split into lines. */
export type SourceLines = ReadonlyMap<string, readonly string[]>;

/** Splits each source text into lines (texts are already LF-normalised by the reader). */
export function sourceLines(
  sources: readonly { readonly path: string; readonly text: string }[],
): SourceLines {
  return new Map(sources.map((s) => [s.path, s.text.split("\n")]));
}

/** Formats a position; places outside the project (the built-in library) print without line and column. */
export function where(at: Position): string {
  return at.file.startsWith("(") ? at.file : formatPosition(at);
}

function escapeRegExp(text: string): string {
  return text.replace(/[.*+?^${}()|[\]\\]/g, "\\$&");
}

function keyPattern(f: Field): RegExp {
  if (f.find !== undefined) return f.find;
  const last = f.key.split(".").pop() ?? f.key;
  return new RegExp(`(^|[\\s{,])${escapeRegExp(last)}\\s*:`);
}

function isBlockEnd(line: string): boolean {
  return /^\s*(```|~~~)/.test(line) || line === "---";
}

function indentOf(line: string): number {
  return line.length - line.trimStart().length;
}

function found(at: Position, lineIndex: number, column: number): string {
  return formatPosition({ file: at.file, line: lineIndex + 1, col: column + 1 });
}

/**
 * Finds the line of `f` inside the input that starts at `at`: a block (`inline` false) is searched down
 * to its closing fence, preferring keys at the block's own indentation; a list item (`inline` true) is
 * searched on its own line, then on following lines indented at least as deep. Falls back to `at`.
 */
export function locate(lines: SourceLines, at: Position, f: Field, inline: boolean): string {
  const text = lines.get(at.file);
  if (text === undefined) return where(at);
  const pattern = keyPattern(f);
  const start = at.line - 1;
  const depth = at.col - 1;
  const candidates: number[] = [];
  for (let i = start; i < text.length; i++) {
    const line = text[i] ?? "";
    if (i > start && (isBlockEnd(line) || (inline && (line.trim() === "" || indentOf(line) < depth)))) break;
    if (i > start && inline && line.trimStart().startsWith("- ") && indentOf(line) <= depth) break;
    candidates.push(i);
  }
  const search = (onlyTopLevel: boolean): string | undefined => {
    for (const i of candidates) {
      const line = text[i] ?? "";
      const from = i === start ? depth : 0;
      if (onlyTopLevel && indentOf(line) !== depth && i !== start) continue;
      const match = pattern.exec(line.slice(from));
      if (match === null) continue;
      const lead = (match[1] ?? "").length;
      return found(at, i, from + match.index + lead);
    }
    return undefined;
  };
  return (inline || f.key.includes(".") ? undefined : search(true)) ?? search(false) ?? where(at);
}
