/**
 * Reads the outline of a PDF written by Chromium: each entry's title and page number (1-based), in
 * document order, and the named destinations Chromium writes for the link targets (the ids the package's
 * links point to). Only what Chromium writes uncompressed is read: the page tree, the outline items and the
 * catalog's destination dictionary.
 */

export interface OutlineEntry {
  readonly title: string;
  readonly page: number;
}

/** The bodies of the PDF's uncompressed objects by number. */
function objects(text: string): Map<number, string> {
  const out = new Map<number, string>();
  for (const m of text.matchAll(/(?:^|\s)(\d+) 0 obj\s*([\s\S]*?)endobj/g)) {
    out.set(Number(m[1]), m[2] ?? "");
  }
  return out;
}

/** Page object numbers in page order, walking the page tree from the catalog. */
function pageOrder(objs: Map<number, string>): number[] {
  let root: number | undefined;
  for (const body of objs.values()) {
    const m = body.match(/\/Type\s*\/Catalog[\s\S]*?\/Pages (\d+) 0 R/);
    if (m !== null) root = Number(m[1]);
  }
  const pages: number[] = [];
  const walk = (n: number, depth: number): void => {
    const body = objs.get(n) ?? "";
    if (depth > 64) return;
    if (/\/Type\s*\/Pages\b/.test(body)) {
      const kids = body.match(/\/Kids\s*\[([^\]]*)\]/)?.[1] ?? "";
      for (const k of kids.matchAll(/(\d+) 0 R/g)) walk(Number(k[1]), depth + 1);
    } else pages.push(n);
  };
  if (root !== undefined) walk(root, 0);
  return pages;
}

/** Decodes a PDF text string: a literal `( … )` in PDFDocEncoding (Latin-1 here) or hex UTF-16BE. */
function textString(token: string): string {
  if (token.startsWith("<")) {
    const hex = token.slice(1, -1).replace(/\s/g, "");
    const bytes = hex.match(/../g)?.map((h) => parseInt(h, 16)) ?? [];
    if (bytes[0] === 0xfe && bytes[1] === 0xff) {
      let s = "";
      for (let i = 2; i + 1 < bytes.length; i += 2) {
        s += String.fromCharCode(((bytes[i] ?? 0) << 8) | (bytes[i + 1] ?? 0));
      }
      return s;
    }
    return String.fromCharCode(...bytes);
  }
  const escapes: Record<string, string> = { n: "\n", r: "\r", t: "\t", b: "\b", f: "\f" };
  return token.slice(1, -1).replace(
    /\\([0-7]{1,3}|.)/g,
    (_, e: string) => /^[0-7]+$/.test(e) ? String.fromCharCode(parseInt(e, 8)) : escapes[e] ?? e,
  );
}

/** Outline entries with their page numbers, sorted by page then top-down; empty if there is no outline. */
export function pageNumbersFromOutline(pdf: Uint8Array): OutlineEntry[] {
  const text = new TextDecoder("latin1").decode(pdf);
  const objs = objects(text);
  const order = pageOrder(objs);
  const entries: { title: string; page: number; y: number }[] = [];
  const item =
    /\/Title\s*(\((?:\\.|[^\\)])*\)|<[0-9A-Fa-f\s]*>)\s*\/Dest\s*\[(\d+) 0 R \/XYZ [\d.-]+ ([\d.-]+)/;
  for (const body of objs.values()) {
    const m = body.match(item);
    if (m === null) continue;
    const index = order.indexOf(Number(m[2]));
    if (index < 0) continue;
    entries.push({ title: textString(m[1] ?? ""), page: index + 1, y: Number(m[3]) });
  }
  entries.sort((a, b) => a.page - b.page || b.y - a.y);
  return entries.map(({ title, page }) => ({ title, page }));
}

/** Decodes a PDF name token's `#xx` escapes (the id of a named destination). */
function pdfName(token: string): string {
  return token.replace(/#([0-9A-Fa-f]{2})/g, (_, h: string) => String.fromCharCode(parseInt(h, 16)));
}

/**
 * The page (1-based) of each named destination in the catalog's `/Dests` dictionary: Chromium writes one for
 * every element id a link in the page points to, at the element's top. Empty if there is none.
 */
export function namedDestinations(pdf: Uint8Array): Map<string, number> {
  const text = new TextDecoder("latin1").decode(pdf);
  const objs = objects(text);
  const order = pageOrder(objs);
  let dests: string | undefined;
  for (const body of objs.values()) {
    const m = body.match(/\/Type\s*\/Catalog[\s\S]*?\/Dests\s*(\d+) 0 R/);
    if (m !== null) dests = objs.get(Number(m[1]));
  }
  const out = new Map<string, number>();
  for (const m of (dests ?? "").matchAll(/\/([^\s/\[\]<>()]+)\s*\[(\d+) 0 R \/XYZ/g)) {
    const index = order.indexOf(Number(m[2]));
    if (index >= 0) out.set(pdfName(m[1] ?? ""), index + 1);
  }
  return out;
}
