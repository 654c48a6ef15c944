/** Renders the consultant's prose: raw HTML shown as text, links allow-listed, images not loaded. */
import { Marked, type Tokens } from "marked";
import { escapeHtml, type Trusted, trustMarkdownRendererOutput } from "./html.ts";
import { decodeCharacterReferences, safeLinkUrl } from "./safeUrl.ts";

/** Prefix of every heading id generated from prose, so no id can clobber a page or DOM name. */
export const PROSE_ID_PREFIX = "u-";

/** Options of one prose rendering. */
export interface MarkdownOptions {
  /** Ids already used in the page; new heading ids are added to it and never repeat one. */
  readonly usedIds: Set<string>;
  /** Added to each heading level so prose headings sit below the package's own (default 3). */
  readonly headingShift?: number;
}

/** Turns heading text into an id `u-<slug>`, unique within `usedIds`. */
export function uniqueHeadingId(text: string, usedIds: Set<string>): string {
  const slug = text.toLowerCase().replace(/[^a-z0-9]+/g, "-").replace(/^-+|-+$/g, "").slice(0, 60);
  const base = PROSE_ID_PREFIX + (slug === "" ? "section" : slug);
  let id = base;
  for (let n = 2; usedIds.has(id); n++) id = `${base}-${n}`;
  usedIds.add(id);
  return id;
}

function makeMarked(options: MarkdownOptions): Marked {
  const shift = options.headingShift ?? 3;
  return new Marked({
    async: false,
    gfm: true,
    breaks: false,
    renderer: {
      html(token: Tokens.HTML | Tokens.Tag): string {
        const shown = escapeHtml(token.text);
        return token.block ? `<p class="raw-html">${shown}</p>\n` : shown;
      },
      heading(token: Tokens.Heading): string {
        const level = Math.min(6, token.depth + shift);
        const plain = this.parser.parseInline(token.tokens, this.parser.textRenderer);
        const id = uniqueHeadingId(decodeCharacterReferences(plain), options.usedIds);
        return `<h${level} id="${escapeHtml(id)}">${this.parser.parseInline(token.tokens)}</h${level}>\n`;
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

/** Renders Markdown prose to trusted markup: no live raw HTML, no unsafe links, no loaded images. */
export function renderMarkdown(markdown: string, options: MarkdownOptions): Trusted {
  const out = makeMarked(options).parse(markdown, { async: false });
  return trustMarkdownRendererOutput(out);
}
