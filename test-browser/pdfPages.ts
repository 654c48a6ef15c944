/**
 * The printed lines of a PDF, read from `pdftotext -bbox-layout` (poppler): per page, the rows of text inside
 * the page's text area (the margins hold the running header and the page number), top to bottom. Used by the
 * page-budget test to find the page where the body ends and headings stranded at a page foot.
 */

export interface PdfLine {
  readonly page: number;
  readonly yMin: number;
  readonly yMax: number;
  readonly xMin: number;
  readonly text: string;
}

export interface PrintedHeading {
  readonly level: string;
  readonly text: string;
}

/** The package's top and bottom page margins, 20 mm (src/report/page/css.ts @page), in pt. */
const MARGIN_PT = (20 / 25.4) * 72;
/** Rows whose tops are this close (pt) are one printed row (cells of a table row, a label and its value). */
const SAME_ROW_PT = 2;

function unescapeXml(s: string): string {
  return s.replace(/&lt;/g, "<").replace(/&gt;/g, ">").replace(/&quot;/g, '"').replace(/&apos;/g, "'")
    .replace(/&#39;/g, "'").replace(/&amp;/g, "&");
}

/** Every line of text inside the text area of each page, from pdftotext's bbox-layout XHTML. */
export function pdfLines(bboxLayout: string): PdfLine[] {
  const out: PdfLine[] = [];
  const pages = bboxLayout.split(/<page width="/).slice(1);
  pages.forEach((chunk, i) => {
    const height = Number(chunk.match(/height="([\d.]+)"/)?.[1]);
    for (
      const m of chunk.matchAll(
        /<line xMin="([\d.]+)" yMin="([\d.]+)" xMax="[\d.]+" yMax="([\d.]+)">([\s\S]*?)<\/line>/g,
      )
    ) {
      const yMin = Number(m[2]);
      const yMax = Number(m[3]);
      if (yMin < MARGIN_PT - 3 || yMax > height - MARGIN_PT + 3) continue;
      const words = [...(m[4] ?? "").matchAll(/<word[^>]*>([\s\S]*?)<\/word>/g)].map((w) =>
        unescapeXml(w[1] ?? "")
      );
      out.push({ page: i + 1, yMin, yMax, xMin: Number(m[1]), text: words.join(" ") });
    }
  });
  return out;
}

/** The rows of one page, top to bottom; each row's lines joined left to right. */
function rows(lines: readonly PdfLine[], page: number): string[] {
  const onPage = lines.filter((l) => l.page === page).sort((a, b) => a.yMin - b.yMin || a.xMin - b.xMin);
  const out: PdfLine[][] = [];
  for (const line of onPage) {
    const last = out[out.length - 1];
    if (last !== undefined && Math.abs((last[0]?.yMin ?? 0) - line.yMin) <= SAME_ROW_PT) last.push(line);
    else out.push([line]);
  }
  return out.map((row) => row.sort((a, b) => a.xMin - b.xMin).map((l) => l.text).join(" "));
}

/** Text compared without any white space: pdftotext splits and joins words differently from the DOM. */
function squeeze(s: string): string {
  return s.replace(/\s+/g, "");
}

/**
 * Headings stranded at a page foot: the last one, two or three rows of a page (a heading may wrap) read exactly
 * as a heading or label. The last page is not checked (nothing follows it).
 */
export function strandedHeadings(headings: readonly PrintedHeading[], lines: readonly PdfLine[]): string[] {
  const texts = new Set(headings.map((h) => squeeze(h.text)).filter((t) => t.length > 0));
  const last = Math.max(0, ...lines.map((l) => l.page));
  const out: string[] = [];
  for (let page = 1; page < last; page++) {
    const r = rows(lines, page);
    for (let k = 1; k <= 3 && k <= r.length; k++) {
      const tail = r.slice(r.length - k).join(" ");
      if (texts.has(squeeze(tail))) {
        out.push(`page ${page}: "${tail}"`);
        break;
      }
    }
  }
  return out;
}

/**
 * The last page of the body, cover to cautions (issue 11's measure): the page before the heading (h2) of the
 * section that follows the cautions, or that page when the section starts below other text on it. 0 when the
 * print has no cautions or nothing after them.
 */
export function bodyEndPage(
  headings: readonly PrintedHeading[],
  outline: readonly { title: string; page: number }[],
  lines: readonly PdfLine[],
): number {
  const sections = headings.filter((h) => h.level === "h2" || h.level === "h1");
  const cautions = sections.findIndex((h) => /^Cautions$/.test(squeeze(h.text)));
  const first = cautions < 0 ? undefined : sections[cautions + 1];
  if (first === undefined) return 0;
  const entry = outline.find((e) => squeeze(e.title) === squeeze(first.text));
  if (entry === undefined) return 0;
  const top = rows(lines, entry.page)[0] ?? "";
  const opensPage = top.length > 0 && squeeze(first.text).startsWith(squeeze(top));
  return opensPage ? entry.page - 1 : entry.page;
}
