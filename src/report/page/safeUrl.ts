/** URL allow-listing for links in the consultant's prose: http, https, mailto, relative and #fragment. */

const ALLOWED_SCHEMES: ReadonlySet<string> = new Set(["http", "https", "mailto"]);

const NAMED_REFERENCES: Readonly<Record<string, string>> = {
  amp: "&",
  lt: "<",
  gt: ">",
  quot: '"',
  apos: "'",
  colon: ":",
  sol: "/",
  tab: "\t",
  newline: "\n",
  num: "#",
  quest: "?",
  period: ".",
  lpar: "(",
  rpar: ")",
};

/**
 * Decodes numeric character references and a few named ones (those that could spell a URL scheme);
 * other named references stay literal, so they are later escaped and shown as text.
 */
export function decodeCharacterReferences(text: string): string {
  return text.replace(/&(#[xX][0-9a-fA-F]+|#[0-9]+|[A-Za-z]+);?/g, (whole, body: string) => {
    if (body.startsWith("#")) {
      const hex = body[1] === "x" || body[1] === "X";
      const code = Number.parseInt(body.slice(hex ? 2 : 1), hex ? 16 : 10);
      if (code === 0 || code > 0x10ffff || (code >= 0xd800 && code <= 0xdfff)) return "\uFFFD";
      return String.fromCodePoint(code);
    }
    return NAMED_REFERENCES[body.toLowerCase()] ?? whole;
  });
}

/**
 * Returns the URL to print when it is http(s), mailto, relative or a fragment, else undefined.
 * Tab, CR and LF are removed first, as browsers do, so `java\nscript:` cannot slip through.
 */
export function safeLinkUrl(url: string): string | undefined {
  // deno-lint-ignore no-control-regex
  const cleaned = url.replace(/[\t\n\r]/g, "").replace(/^[\u0000-\u0020]+|[\u0000-\u0020]+$/g, "");
  // deno-lint-ignore no-control-regex
  if (/[\u0000-\u001f\u007f\\]/.test(cleaned)) return undefined;
  const scheme = /^([^:/?#]*):/.exec(cleaned);
  if (scheme === null) return cleaned.startsWith("//") ? undefined : cleaned;
  const name = (scheme[1] ?? "").toLowerCase();
  if (!ALLOWED_SCHEMES.has(name)) return undefined;
  return cleaned;
}
