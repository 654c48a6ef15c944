/** Renders the consultant's prose: raw HTML shown as text, links allow-listed, images not loaded. */
import { Lexer, Marked, type Tokens } from "marked";
import { escapeHtml, type Trusted, trustMarkdownRendererOutput } from "./html.ts";
import { linearInlineTokenizer } from "./linearInline.ts";
import { decodeCharacterReferences, safeLinkUrl } from "./safeUrl.ts";

/** Prefix of every heading id generated from prose, so no id can clobber a page or DOM name. */
export const PROSE_ID_PREFIX = "u-";

/** Options of one prose rendering. */
export interface MarkdownOptions {
  /** Ids already used in the page; new heading ids are added to it and never repeat one. */
  readonly usedIds: Set<string>;
  /**
   * Added to each heading level so prose headings sit below the package's own (default 3); the result is kept
   * within h2 … h6 (h1 is the package's title).
   */
  readonly headingShift?: number;
}

/**
 * Per id set, the suffix to try next for each base id. Ids are only ever added to a set, so the
 * first free suffix of a base never goes down: resuming from the last one found gives the same
 * ids as counting from 2 each time, and k repeats of one heading cost O(k), not O(k²).
 */
const nextSuffix = new WeakMap<Set<string>, Map<string, number>>();

/** Turns heading text into an id `u-<slug>`, unique within `usedIds`. */
export function uniqueHeadingId(text: string, usedIds: Set<string>): string {
  const slug = text.toLowerCase().replace(/[^a-z0-9]+/g, "-").replace(/^-+|-+$/g, "").slice(0, 60);
  const base = PROSE_ID_PREFIX + (slug === "" ? "section" : slug);
  let suffixes = nextSuffix.get(usedIds);
  if (suffixes === undefined) nextSuffix.set(usedIds, suffixes = new Map());
  let id = base;
  let n = suffixes.get(base) ?? 2;
  if (usedIds.has(id)) {
    while (usedIds.has(id = `${base}-${n}`)) n++;
    suffixes.set(base, n + 1);
  }
  usedIds.add(id);
  return id;
}

function makeMarked(options: MarkdownOptions): Marked {
  const shift = options.headingShift ?? 3;
  return new Marked({
    async: false,
    gfm: true,
    breaks: false,
    tokenizer: linearInlineTokenizer,
    renderer: {
      html(token: Tokens.HTML | Tokens.Tag): string {
        const shown = escapeHtml(token.text);
        return token.block ? `<p class="raw-html">${shown}</p>\n` : shown;
      },
      heading(token: Tokens.Heading): string {
        const level = Math.max(2, Math.min(6, token.depth + shift));
        const plain = this.parser.parseInline(token.tokens, this.parser.textRenderer);
        const id = uniqueHeadingId(decodeCharacterReferences(plain), options.usedIds);
        return `<h${level} id="${escapeHtml(id)}">${this.parser.parseInline(token.tokens)}</h${level}>\n`;
      },
      checkbox(token: Tokens.Checkbox): string {
        // A task-list box as text: the package holds no form controls.
        return `<span class="task-box">${token.checked ? "[x]" : "[ ]"}</span> `;
      },
      link(token: Tokens.Link): string {
        const label = token.autolink === true
          ? escapeHtml(token.text)
          : this.parser.parseInline(token.tokens);
        const href = token.autolink === true ? token.href : decodeCharacterReferences(token.href);
        const safe = safeLinkUrl(href);
        if (safe === undefined) {
          const note = escapeHtml(`link not kept (scheme not allowed): ${href}`);
          return `<span class="link-removed" title="${note}">${label}</span>`;
        }
        const title = typeof token.title === "string" && token.title !== ""
          ? ` title="${escapeHtml(decodeCharacterReferences(token.title))}"`
          : "";
        return `<a href="${escapeHtml(safe)}"${title}>${label}</a>`;
      },
      image(token: Tokens.Image): string {
        const alt = decodeCharacterReferences(
          this.parser.parseInline(token.tokens, this.parser.textRenderer),
        );
        return `<span class="image-omitted">[image not embedded: ${escapeHtml(alt)}]</span>`;
      },
    },
  });
}

/** A file's title taken from its prose: the leading heading (markdown and depth) and the prose after it. */
export interface LeadingHeading {
  /** The heading as written (ATX or setext). */
  readonly heading: string;
  /** Its level as written, 1 for `#`. */
  readonly depth: number;
  /** The heading's text with inline markup removed, character references decoded. */
  readonly text: string;
  /** The prose after the heading. */
  readonly rest: string;
}

/** The plain text of one heading written in Markdown, as the heading ids read it. */
function headingText(heading: string): string {
  const plain = new Marked({
    async: false,
    gfm: true,
    tokenizer: linearInlineTokenizer,
    renderer: {
      heading(token: Tokens.Heading): string {
        return this.parser.parseInline(token.tokens, this.parser.textRenderer);
      },
    },
  }).parse(heading, { async: false });
  return decodeCharacterReferences(plain).trim();
}

/** The blank lines at the start and the first block of text after them (up to the next blank line). */
function openingBlock(markdown: string): string {
  let at = 0;
  let seenText = false;
  while (at < markdown.length) {
    const end = markdown.indexOf("\n", at);
    const next = end < 0 ? markdown.length : end + 1;
    const blank = markdown.slice(at, next).trim() === "";
    if (blank && seenText) break;
    seenText ||= !blank;
    at = next;
  }
  return markdown.slice(0, at);
}

/**
 * The heading that opens `markdown` (only blank lines before it), split from the prose after it; undefined when
 * the prose opens with anything else, so a heading is never moved above text the user put before it.
 */
export function leadingHeading(markdown: string): LeadingHeading | undefined {
  const opening = openingBlock(markdown);
  // A heading is an ATX line (`#` after at most three spaces) or text underlined by `=`/`-` on its second line;
  // anything else is told without lexing (and inline markup is never lexed here).
  const lines = opening.trimStart().split("\n", 2);
  if (!/^ {0,3}#/.test(lines[0] ?? "") && !/^ {0,3}(=+|-+)[ \t]*$/.test(lines[1] ?? "")) return undefined;
  const tokens = new Lexer({ async: false, gfm: true, breaks: false }).blockTokens(opening, []);
  let consumed = "";
  for (const token of tokens) {
    consumed += token.raw;
    if (token.type === "space") continue;
    if (token.type !== "heading") return undefined;
    // The lexer's raw text is the source as written; refuse anything it normalised.
    if (!markdown.startsWith(consumed)) return undefined;
    const heading = token as Tokens.Heading;
    return {
      heading: heading.raw,
      depth: heading.depth,
      text: headingText(heading.raw),
      rest: markdown.slice(consumed.length),
    };
  }
  return undefined;
}

/** Renders Markdown prose to trusted markup: no live raw HTML, no unsafe links, no loaded images. */
export function renderMarkdown(markdown: string, options: MarkdownOptions): Trusted {
  const out = makeMarked(options).parse(markdown, { async: false });
  return trustMarkdownRendererOutput(out);
}
