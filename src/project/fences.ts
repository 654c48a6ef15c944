import type { Token } from "marked";
import type { MarkdownPiece } from "./markdownPiece.ts";
import { splitPlainMarkdown } from "./plainMarkdown.ts";
import { loadReaderLibraries, markdownLibrary, readerLibrariesDeferred } from "./readerLibraries.ts";

export type { MarkdownPiece } from "./markdownPiece.ts";

// The lexer is there before any reading, unless `fluxnote check` deferred it (src/project/readerLibraries.ts).
if (!readerLibrariesDeferred()) await loadReaderLibraries();

/** Front matter split from a Markdown file: the YAML text and the line its first line is on. */
export interface FrontMatterSplit {
  readonly yaml: string | undefined;
  readonly yamlLine: number;
  /** The rest of the file. */
  readonly body: string;
  /** Line of the body's first line in the file. */
  readonly bodyLine: number;
  /** True when an opening `---` has no closing line. */
  readonly unterminated: boolean;
}

/** Splits YAML front matter (`---` ... `---` at the very start) from the Markdown body. */
export function splitFrontMatter(text: string): FrontMatterSplit {
  if (!text.startsWith("---\n")) {
    return { yaml: undefined, yamlLine: 1, body: text, bodyLine: 1, unterminated: false };
  }
  const lines = text.split("\n");
  for (let i = 1; i < lines.length; i++) {
    if (lines[i] === "---" || lines[i] === "...") {
      return {
        yaml: lines.slice(1, i).join("\n"),
        yamlLine: 2,
        body: lines.slice(i + 1).join("\n"),
        bodyLine: i + 2,
        unterminated: false,
      };
    }
  }
  return {
    yaml: lines.slice(1).join("\n"),
    yamlLine: 2,
    body: "",
    bodyLine: lines.length + 1,
    unterminated: true,
  };
}

const YAML_KEY_LINE = /^[A-Za-z][A-Za-z0-9_-]*:(\s|$)/;
const YAML_MORE_LINE = /^(\s+\S|-\s|#|\s*$)/;

/**
 * The line of a `---` block of YAML keys at the start of a body (blank lines before it allowed): a
 * second front matter after the first, or one that does not start on line 1. Markdown would read it
 * as a rule and a heading, and its keys would be lost in silence.
 */
export function findSecondFrontMatter(body: string, firstLine: number): number | undefined {
  const lines = body.split("\n");
  let start = 0;
  while (start < lines.length && (lines[start] ?? "").trim() === "") start++;
  if (lines[start] !== "---") return undefined;
  let keys = 0;
  for (let i = start + 1; i < lines.length; i++) {
    const line = lines[i] ?? "";
    if (line === "---" || line === "...") return keys > 0 ? firstLine + start : undefined;
    if (YAML_KEY_LINE.test(line)) keys++;
    else if (!YAML_MORE_LINE.test(line)) return undefined;
  }
  return undefined;
}

/**
 * Block tokens of a Markdown body, without the inline pass: splitting needs only the blocks'
 * `raw` texts, and marked's inline lexing of a long paragraph can take far longer than the blocks.
 */
function lexBlocks(body: string): Token[] {
  if (lastLexed?.body !== body) {
    const { Lexer } = markdownLibrary();
    lastLexed = { body, tokens: new Lexer({ gfm: true }).blockTokens(body.replace(/\r\n?/g, "\n"), []) };
  }
  return lastLexed.tokens;
}

/** The last body lexed: `findFenceProblems` reads the body `splitMarkdown` has just split. */
let lastLexed: { readonly body: string; readonly tokens: Token[] } | undefined;

/**
 * Lexes a Markdown body into prose and top-level fenced blocks with line numbers.
 * marked's tokens carry no positions, but their `raw` texts concatenate to the source, so a
 * running offset gives each token's line.
 */
export function splitMarkdown(body: string, firstLine: number): MarkdownPiece[] {
  const normalized = body.replace(/\r\n?/g, "\n");
  if (!mayHoldFence(body) && !/[ \t]$/.test(normalized)) {
    // No fence anywhere: all prose, as the lexer's tokens would give it (their raw texts concatenate to the
    // body, except for a lone space or tab at its very end, which the lexer gives as a line break).
    return normalized.trim() === "" ? [] : [{ kind: "prose", markdown: normalized, line: firstLine }];
  }
  return splitPlainMarkdown(body, firstLine) ?? splitLexed(body, firstLine);
}

/** A fence opens with three backticks or tildes; a body without either holds no fence, at any nesting. */
function mayHoldFence(body: string): boolean {
  return body.includes("```") || body.includes("~~~");
}

/** `splitMarkdown` by the lexer's tokens, whatever the body (exported for the test of the shortcut above). */
export function splitLexed(body: string, firstLine: number): MarkdownPiece[] {
  const tokens = lexBlocks(body);
  const pieces: MarkdownPiece[] = [];
  let line = firstLine;
  let prose = "";
  let proseLine = line;
  const flushProse = () => {
    if (prose.trim() !== "") pieces.push({ kind: "prose", markdown: prose, line: proseLine });
    prose = "";
  };
  for (const token of tokens) {
    const raw = token.raw;
    if (token.type === "code" && /^ {0,3}(```|~~~)/.test(raw)) {
      flushProse();
      const fenceLine = raw.split("\n", 1)[0] ?? "";
      const infoString = fenceLine.replace(/^ {0,3}(`{3,}|~{3,})/, "").trim();
      const info = infoString.split(/\s+/, 1)[0] ?? "";
      const leading = /^\n*/.exec(raw)?.[0].length ?? 0;
      pieces.push({
        kind: "fence",
        info,
        infoString,
        raw,
        body: String(token.text ?? ""),
        line: line + leading,
        bodyLine: line + leading + 1,
      });
    } else {
      if (prose === "") proseLine = line;
      prose += raw;
    }
    line += countNewlines(raw);
  }
  flushProse();
  return pieces;
}

function countNewlines(text: string): number {
  let n = 0;
  for (let i = 0; i < text.length; i++) if (text.charCodeAt(i) === 10) n++;
  return n;
}

/** An input fence the splitter cannot read: never closed, or not at the top level of the file. */
export interface FenceProblem {
  readonly kind: "unterminated" | "nested";
  /** First word of the info string. */
  readonly info: string;
  /** The fence characters as written, e.g. "```". */
  readonly fence: string;
  readonly line: number;
  readonly col: number;
}

const NESTED_OPENER = /^((?:[ \t]*(?:>|[-*+]|\d{1,9}[.)]))*[ \t]*)(`{3,}|~{3,})[ \t]*([^\s`]+)/;

/**
 * Finds fenced blocks whose first info word is one of `infos` but that `splitMarkdown` does not
 * read as input: a top-level fence with no closing line (it would silently run to the end of the
 * file), and fences inside lists, block quotes or indented code (they would silently become prose).
 */
export function findFenceProblems(body: string, firstLine: number, infos: readonly string[]): FenceProblem[] {
  // Both kinds of problem start at fence characters; a plain body's fences are all closed, at the margin.
  if (!mayHoldFence(body) || splitPlainMarkdown(body, firstLine) !== undefined) return [];
  return lexedFenceProblems(body, firstLine, infos);
}

/** `findFenceProblems` by the lexer's tokens, whatever the body (exported for the test of the shortcuts). */
export function lexedFenceProblems(
  body: string,
  firstLine: number,
  infos: readonly string[],
): FenceProblem[] {
  const problems: FenceProblem[] = [];
  let line = firstLine;
  for (const token of lexBlocks(body)) {
    const raw = token.raw;
    const lines = raw.split("\n");
    const leading = /^\n*/.exec(raw)?.[0].length ?? 0;
    const opener = token.type === "code" ? /^ {0,3}(`{3,}|~{3,})(.*)$/.exec(lines[leading] ?? "") : null;
    if (opener !== null) {
      const fence = opener[1] ?? "```";
      const info = (opener[2] ?? "").trim().split(/\s+/, 1)[0] ?? "";
      const body = lines.slice(leading + 1);
      while (body.length > 0 && (body[body.length - 1] ?? "").trim() === "") body.pop();
      const close = new RegExp(`^ {0,3}${fence[0] === "`" ? "`" : "~"}{${fence.length},}[ \\t]*$`);
      if (infos.includes(info) && (body.length === 0 || !close.test(body[body.length - 1] ?? ""))) {
        problems.push({ kind: "unterminated", info, fence, line: line + leading, col: 1 });
      }
    } else {
      lines.forEach((text, i) => {
        const nested = NESTED_OPENER.exec(text);
        if (nested !== null && infos.includes(nested[3] ?? "")) {
          const fence = nested[2] ?? "```";
          problems.push({
            kind: "nested",
            info: nested[3] ?? "",
            fence,
            line: line + i,
            col: (nested[1] ?? "").length + 1,
          });
        }
      });
    }
    line += countNewlines(raw);
  }
  return problems;
}
