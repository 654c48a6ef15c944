/**
 * Nesting limit for prose. marked reads each list item and block quote by lexing its contents again
 * (a recursive call per level), so d levels of nesting cost d passes over the nested text and a
 * stack frame chain d deep: 1,000 nested list items take half a minute and a gigabyte, a few
 * thousand `> ` overflow the stack. Lines that nest deeper than the limit are found here, line by
 * line in linear time, before marked sees the text.
 */
import { type Diagnostic, error } from "./diagnostic.ts";
import { splitFrontMatter } from "./fences.ts";
import type { SourceText } from "./sourceText.ts";

/** Deepest nesting of lists and block quotes read in prose (common practice, no source: prose rarely nests past 5). */
export const MAX_PROSE_NESTING = 32;

/** A prose line that nests lists or quotes deeper than the limit. */
export interface DeepNesting {
  /** 1-based line in the file. */
  readonly line: number;
  /** 1-based column (character) of the marker that goes past the limit. */
  readonly col: number;
  /** Levels counted on this line. */
  readonly depth: number;
}

const TAB_STOP = 4;
const FENCE_OPEN = /^ {0,3}(`{3,}|~{3,})/;

/** A container marker found at the start of a line: its kind, column and where its content starts. */
interface Marker {
  readonly kind: "quote" | "item";
  /** Column of the marker, tabs expanded. */
  readonly col: number;
  /** Index of the marker in the line. */
  readonly index: number;
  /** Column where an item's content starts: one space past the marker. */
  readonly contentCol: number;
}

/** Reads the marker (`>`, `-`, `*`, `+`, `1.`, `1)`) at index `i`, if any. */
function markerAt(text: string, i: number): { kind: "quote" | "item"; end: number } | undefined {
  const c = text[i];
  if (c === ">") return { kind: "quote", end: i + 1 };
  const spaceAfter = (j: number) => j === text.length || text[j] === " " || text[j] === "\t";
  if ((c === "-" || c === "*" || c === "+") && spaceAfter(i + 1)) return { kind: "item", end: i + 1 };
  let j = i;
  while (j < text.length && j - i < 9 && text.charCodeAt(j) >= 48 && text.charCodeAt(j) <= 57) j++;
  if (j > i && (text[j] === "." || text[j] === ")") && spaceAfter(j + 1)) return { kind: "item", end: j + 1 };
  return undefined;
}

/** True when the line, past its quote markers, is a thematic break (`- - -`, `***`), not list items. */
function isThematicBreak(text: string): boolean {
  return /^[ \t>]*([-*_])(?:[ \t]*\1){2,}[ \t]*$/.test(text);
}

/** The container markers opening a line, with their columns. */
function leadingMarkers(text: string): Marker[] {
  const markers: Marker[] = [];
  let col = 0;
  let i = 0;
  while (i < text.length) {
    const c = text[i];
    if (c === " ") {
      col++;
      i++;
      continue;
    }
    if (c === "\t") {
      col += TAB_STOP - (col % TAB_STOP);
      i++;
      continue;
    }
    const marker = markerAt(text, i);
    if (marker === undefined) break;
    markers.push({ kind: marker.kind, col, index: i, contentCol: col + marker.end - i + 1 });
    col += marker.end - i;
    i = marker.end;
  }
  return markers;
}

/** For each line, false when it is a top-level fence line or inside fenced code, true otherwise. */
export function proseLineFlags(lines: readonly string[]): boolean[] {
  let fence: { char: string; length: number } | undefined;
  return lines.map((text) => {
    if (fence !== undefined) {
      const close = /^ {0,3}(`{3,}|~{3,})[ \t]*$/.exec(text)?.[1];
      if (close !== undefined && close[0] === fence.char && close.length >= fence.length) fence = undefined;
      return false;
    }
    const opener = FENCE_OPEN.exec(text)?.[1];
    if (opener !== undefined) fence = { char: opener[0] ?? "`", length: opener.length };
    return opener === undefined;
  });
}

/**
 * Finds prose lines that nest lists or block quotes deeper than `MAX_PROSE_NESTING`. A line's depth
 * is its quote markers plus the open list items it sits in: an item stays open while later items
 * start at or right of its content column (the CommonMark rule for list items, simplified; it may
 * count a level too many, never one too few). Lines inside top-level fenced code are skipped.
 */
function findDeepNesting(
  lines: readonly string[],
  prose: readonly boolean[],
  firstLine: number,
): DeepNesting[] {
  const found: DeepNesting[] = [];
  /** Content columns of the list items open so far. */
  const open: number[] = [];
  let previousBlank = true;
  for (let index = 0; index < lines.length; index++) {
    const text = lines[index] ?? "";
    if (!prose[index]) continue;
    const blank = text.trim() === "";
    const markers = blank || isThematicBreak(text) ? [] : leadingMarkers(text);
    if (markers.length === 0 && !blank && previousBlank && !/^[ \t]/.test(text)) open.length = 0;
    previousBlank = blank;
    const before = open.length;
    let quotes = 0;
    let firstItem = true;
    let pastLimit: number | undefined;
    for (const marker of markers) {
      if (marker.kind === "quote") quotes++;
      else {
        if (firstItem) { while (open.length > 0 && (open[open.length - 1] ?? 0) > marker.col) open.pop(); }
        firstItem = false;
        open.push(marker.contentCol);
      }
      if (pastLimit === undefined && quotes + open.length > MAX_PROSE_NESTING) pastLimit = marker.index + 1;
    }
    if (pastLimit !== undefined) {
      found.push({ line: firstLine + index, col: pastLimit, depth: quotes + open.length });
      open.length = Math.min(open.length, before); // the line is dropped, so its items never open
    }
  }
  return found;
}

/**
 * Reports each prose line of `source` that nests lists or quotes deeper than the limit, and returns
 * the source with those lines emptied, line count kept, so the Markdown reader stays bounded while
 * the rest of the file is still checked.
 */
export function boundProseNesting(source: SourceText, out: Diagnostic[]): SourceText {
  const split = splitFrontMatter(source.text);
  const lines = split.body.split("\n");
  const prose = proseLineFlags(lines);
  const drop = new Set<number>();
  const deep = findDeepNesting(lines, prose, split.bodyLine);
  // One finding per run of consecutive deep lines: a deep list is one mistake, not one per line.
  for (let i = 0; i < deep.length;) {
    const first = deep[i] as DeepNesting;
    let j = i + 1;
    while (j < deep.length && deep[j]?.line === (deep[j - 1]?.line ?? 0) + 1) j++;
    const more = j - i - 1;
    out.push(error(
      { file: source.path, line: first.line, col: first.col },
      "prose-nesting-too-deep",
      `Lists or quotes nest ${first.depth} levels deep on this line${
        more === 0 ? "" : ` (and on the next ${more})`
      }: at most ${MAX_PROSE_NESTING} levels are read, because the Markdown reader reads the text once more for each level`,
      `flatten the list or quote to ${MAX_PROSE_NESTING} levels or fewer, or put the text in a fenced code block`,
    ));
    for (let k = i; k < j; k++) drop.add((deep[k]?.line ?? 0) - split.bodyLine);
    i = j;
  }
  if (drop.size === 0) return source;
  const body = lines.map((text, i) => drop.has(i) ? "" : text).join("\n");
  return { path: source.path, text: source.text.slice(0, source.text.length - split.body.length) + body };
}
