/**
 * The top-level split of plain Markdown without a lexer: paragraphs and headings that start at the margin with
 * a letter, a digit or `#`, blank lines between blocks, and fences of exactly three backticks at the margin with
 * a blank line (or the start or the end of the body) on either side. For such a body the pieces are exactly those
 * of marked's block lexer (src/project/fences.ts); for anything else (lists, quotes, tables, HTML, indented
 * lines, other fences) `undefined`, and the lexer splits it. It exists for start-up time, like
 * src/project/yamlSubset.ts.
 */
import type { MarkdownPiece } from "./markdownPiece.ts";

const OPENER = /^```[A-Za-z0-9-]*$/;
/** A line of prose that no block rule of CommonMark or GFM can read as anything but paragraph or heading. */
const PROSE = /^(?:#{1,6} |\*\*[A-Za-z0-9]|[A-Za-z0-9\u00C0-\uFFFF])/;
/** What such a line still may not be: a numbered list item, or a line holding fence characters. */
const NOT_PROSE = /^\d{1,9}[.)](?:\s|$)|```|~~~/;

/** The pieces of a plain body, or `undefined` when the lexer must split it. */
export function splitPlainMarkdown(body: string, firstLine: number): MarkdownPiece[] | undefined {
  if (body.includes("\r") || body.includes("\t") || body.endsWith(" ")) return undefined;
  const lines = body.split("\n");
  const starts: number[] = [];
  let at = 0;
  for (const line of lines) {
    starts.push(at);
    at += line.length + 1;
  }
  const pieces: MarkdownPiece[] = [];
  let proseStart = 0;
  let proseLine = 0; // index of the line holding proseStart
  for (let i = 0; i < lines.length; i++) {
    const line = lines[i]!;
    if (line === "") continue;
    if (!line.startsWith("```")) {
      if (!PROSE.test(line) || NOT_PROSE.test(line)) return undefined;
      continue;
    }
    // A fence: a blank line (or the start) before it, its closing line, a blank line (or the end) after.
    if (!OPENER.test(line) || (i > 0 && lines[i - 1] !== "")) return undefined;
    let close = i + 1;
    while (close < lines.length && !lines[close]!.includes("```")) close++;
    if (close >= lines.length || lines[close] !== "```") return undefined;
    if (close + 1 < lines.length && lines[close + 1] !== "") return undefined;
    const prose = body.slice(proseStart, starts[i]);
    if (prose.trim() !== "") pieces.push({ kind: "prose", markdown: prose, line: firstLine + proseLine });
    const fenceEnd = starts[close]! + 3;
    // A single line break left after the fence belongs to it (the lexer's one-character space token).
    const end = body.length === fenceEnd + 1 ? fenceEnd + 1 : fenceEnd;
    const infoString = line.slice(3).trim();
    const content = lines.slice(i + 1, close);
    let text = content.join("\n");
    // The lexer's rule: a body that is empty or ends in a blank line gains a line break.
    if (content.length > 0 && (text === "" || text.endsWith("\n"))) text += "\n";
    pieces.push({
      kind: "fence",
      info: infoString.split(/\s+/, 1)[0] ?? "",
      infoString,
      raw: body.slice(starts[i], end),
      body: text,
      line: firstLine + i,
      bodyLine: firstLine + i + 1,
    });
    proseStart = end;
    proseLine = close;
    i = close;
  }
  const prose = body.slice(proseStart);
  if (prose.trim() !== "") pieces.push({ kind: "prose", markdown: prose, line: firstLine + proseLine });
  return pieces;
}
