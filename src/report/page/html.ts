/**
 * Escaping-by-default HTML assembly: every interpolated value is escaped unless it is markup
 * this module produced itself.
 */

const MINT: unique symbol = Symbol("fluxnote.trusted");

/** Markup that is safe to insert as is, made only by `html`, `raw` or `joinHtml`. */
export class Trusted {
  /** The markup text. */
  readonly markup: string;

  /** Internal: only this module holds the key that creates trusted markup. */
  constructor(key: typeof MINT, markup: string) {
    if (key !== MINT) throw new TypeError("Cannot create Trusted markup outside html.ts");
    this.markup = markup;
  }

  /** The markup text, so a Trusted value prints as its markup. */
  toString(): string {
    return this.markup;
  }
}

/** A value that may be interpolated into `html`: text (escaped) or trusted markup. */
export type HtmlValue = string | Trusted | readonly Trusted[];

const SPECIAL = /[&<>"']/;

/**
 * Escapes `& < > " '` so the text is inert in element content and quoted attribute values. Native passes, `&`
 * first, rather than a callback per character: the embedded results JSON holds a quote every few bytes.
 */
export function escapeHtml(text: string): string {
  if (!SPECIAL.test(text)) return text;
  return text.replaceAll("&", "&amp;").replaceAll("<", "&lt;").replaceAll(">", "&gt;").replaceAll(
    '"',
    "&quot;",
  )
    .replaceAll("'", "&#39;");
}

function renderValue(value: HtmlValue): string {
  if (value instanceof Trusted) return value.markup;
  if (typeof value === "string") return escapeHtml(value);
  if (Array.isArray(value)) {
    return value.map((item: unknown) => {
      if (!(item instanceof Trusted)) {
        throw new TypeError("Cannot interpolate an array item that is not Trusted");
      }
      return item.markup;
    }).join("");
  }
  throw new TypeError(`Cannot interpolate a value of type "${typeof value}": format it to a string first`);
}

/** Bidirectional embeddings, overrides, isolates and marks (UAX #9 explicit formatting characters). */
const BIDI_CONTROL = /[\u061C\u200E\u200F\u202A-\u202E\u2066-\u2069]/;

/**
 * True when markup ending with `before` continues inside a tag (an attribute value) or in an element
 * whose content is not parsed as markup (`title`, `textarea`, `script`, `style`).
 */
function inTagOrRawText(before: string): boolean {
  const open = before.lastIndexOf("<");
  if (open > before.lastIndexOf(">")) return true;
  return /^<(title|textarea|script|style)\b/i.test(before.slice(open));
}

/** True inside an SVG `text` or `tspan` element, where an HTML `<bdi>` would not be rendered. */
function inSvgText(before: string): boolean {
  return /^<(text|tspan)\b/.test(before.slice(before.lastIndexOf("<")));
}

/** Isolates escaped text: `<bdi>` in HTML; FIRST STRONG ISOLATE … POP DIRECTIONAL ISOLATE in SVG text. */
function isolated(before: string, rendered: string): string {
  return inSvgText(before) ? `\u2068${rendered}\u2069` : `<bdi>${rendered}</bdi>`;
}

/**
 * Tagged template that escapes every interpolated value unless it is Trusted (arrays of Trusted are joined).
 * Text holding bidirectional controls (a right-to-left override in a name or file name) is put in a
 * `<bdi>` element in element content, so it cannot reorder the text around it; the text itself is
 * unchanged, so what the archive reader extracts stays byte-exact.
 */
export function html(strings: TemplateStringsArray, ...values: readonly HtmlValue[]): Trusted {
  let out = strings[0] ?? "";
  for (let i = 0; i < values.length; i++) {
    const value = values[i] as HtmlValue;
    const rendered = renderValue(value);
    const isolate = typeof value === "string" && BIDI_CONTROL.test(value) && !inTagOrRawText(out);
    out += (isolate ? isolated(out, rendered) : rendered) + (strings[i + 1] ?? "");
  }
  return new Trusted(MINT, out);
}

/** Marks constant internal markup as trusted; never pass text that came from a project file. */
export function raw(markup: string): Trusted {
  return new Trusted(MINT, markup);
}

/** Joins trusted fragments with a trusted separator. */
export function joinHtml(parts: readonly Trusted[], separator: Trusted = raw("")): Trusted {
  return new Trusted(MINT, parts.map((p) => p.markup).join(separator.markup));
}

/**
 * Adopts the output of the Markdown renderer in markdown.ts, whose every token renderer escapes
 * text and filters URLs; nothing else may call this.
 */
export function trustMarkdownRendererOutput(markup: string): Trusted {
  return new Trusted(MINT, markup);
}

/**
 * Makes a quoted CSS string literal whose every character outside `[A-Za-z0-9 ]` is a hex escape,
 * so text from a project file can appear in a stylesheet without ending the string or the `<style>`.
 */
export function cssStringLiteral(text: string): Trusted {
  let out = '"';
  for (const ch of text) {
    out += /^[A-Za-z0-9 ]$/.test(ch)
      ? ch
      // Six hex digits and a space: the parser takes one whitespace after an escape as its end, even after
      // six digits, so the space is always written; a literal space that follows then survives.
      : `\\${(ch.codePointAt(0) ?? 0xfffd).toString(16).padStart(6, "0")} `;
  }
  return new Trusted(MINT, out + '"');
}

/**
 * A line feed to put right after `<pre>`: the HTML parser drops one leading line feed there, so the
 * element's text then equals the interpolated text exactly, even when that text starts with a line feed.
 */
export const PRE_LEAD: Trusted = raw("\n");
