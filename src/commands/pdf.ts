/**
 * package.pdf: the written package printed by a locally installed Chromium (driven by playwright-core).
 * No request leaves the file, and no script is added to the package: the contents' page numbers come from a
 * first print (its named destinations give each link target's page, its outline each heading's) and are written
 * into a PDF-only copy printed again.
 */
import { join } from "node:path";
import process from "node:process";
import { namedDestinations, pageNumbersFromOutline } from "./pdfOutline.ts";

/** Debian's Chromium; the `chromium` package installs it here. */
export const CHROMIUM_PATH = "/usr/bin/chromium";
export const NO_CHROMIUM_MESSAGE =
  "package.pdf needs Chromium: install Debian's chromium package (apt-get install chromium)";

/** Chromium switches for a headless run that reaches no network service of its own. */
export const CHROMIUM_ARGS = [
  "--no-sandbox",
  "--disable-gpu",
  "--disable-background-networking",
  "--disable-component-update",
  "--disable-sync",
  "--no-first-run",
  "--disable-quic",
];

export type PaperSize = "A4" | "Letter";

export type PdfResult =
  | { readonly ok: true; readonly bytes: Uint8Array }
  | { readonly ok: false; readonly reason: string };

/** Ids of the contents' targets, in order, with a placeholder span after each entry for its page number. */
function withPageNumbers(page: string, pages: ReadonlyMap<string, number>): string {
  const nav = page.match(/<nav class="contents"[\s\S]*?<\/nav>/);
  if (nav === null) return page;
  const numbered = nav[0].replace(
    /(<a href="#([^"]+)">[\s\S]*?<\/a>)/g,
    (whole: string, link: string, id: string) => {
      const n = pages.get(id);
      return n === undefined ? whole : `${link}<span class="page-ref"> … ${String(n)}</span>`;
    },
  );
  return page.replace(nav[0], numbered);
}

/** Size and the contents' page numbers: only in the copy that is printed, never in package.html. */
function printCopy(page: string, paper: PaperSize, pages: ReadonlyMap<string, number>): string {
  const style = `<style>@page { size: ${
    paper === "A4" ? "A4" : "letter"
  }; } .page-ref { float: right; }</style>`;
  return withPageNumbers(page, pages).replace("</head>", `${style}</head>`);
}

/** Prints `page` (the text of package.html) to PDF bytes, or says why it cannot. */
export async function renderPdf(
  page: string,
  paper: PaperSize,
  executablePath: string = CHROMIUM_PATH,
): Promise<PdfResult> {
  try {
    const info = await Deno.stat(executablePath);
    if (!info.isFile) return { ok: false, reason: NO_CHROMIUM_MESSAGE };
  } catch {
    return { ok: false, reason: NO_CHROMIUM_MESSAGE };
  }
  // playwright-core probes /proc/sys/fs/binfmt_misc at load to detect WSL (for opening desktop apps, unused
  // here); Deno allows that path only with --allow-all. Its own test switch defers the probe.
  // (fluxnote's CLI gives dependencies an empty process.env: the switch is set there, not in the real one.)
  process.env.__IS_WSL_TEST__ = "1";
  const { chromium } = await import("playwright-core");
  const dir = await Deno.makeTempDir({ prefix: "fluxnote-pdf-" });
  let browser;
  try {
    browser = await chromium.launch({ executablePath, args: CHROMIUM_ARGS });
  } catch (cause) {
    await Deno.remove(dir, { recursive: true });
    return {
      ok: false,
      reason: `package.pdf: Chromium at "${executablePath}" could not be started (${
        String(cause).split("\n")[0]
      }); run with the permissions of the fluxnote task in deno.json, or reinstall Debian's chromium package`,
    };
  }
  try {
    const file = join(dir, "package-print.html");
    const print = async (text: string, outline: boolean): Promise<Uint8Array> => {
      await Deno.writeTextFile(file, text);
      const tab = await browser.newPage();
      const href = new URL(`file://${file}`).href;
      // Nothing but the file itself is loaded.
      await tab.route("**/*", (route) => route.request().url() === href ? route.continue() : route.abort());
      await tab.goto(href, { waitUntil: "load" });
      const bytes = await tab.pdf({ preferCSSPageSize: true, printBackground: true, outline, tagged: true });
      await tab.close();
      return new Uint8Array(bytes);
    };
    const first = await print(printCopy(page, paper, new Map()), true);
    // Each link target's page: its named destination (the element's top), else its heading in the outline.
    const ids = new Map([...headingIds(page, pageNumbersFromOutline(first)), ...namedDestinations(first)]);
    return { ok: true, bytes: await print(printCopy(page, paper, ids), true) };
  } finally {
    await browser.close();
    await Deno.remove(dir, { recursive: true });
  }
}

/**
 * Maps each contents target to its page: the first heading at or after the target's `id` is matched by
 * its text with the outline titles, in document order.
 */
function headingIds(page: string, titles: readonly { title: string; page: number }[]): Map<string, number> {
  const out = new Map<string, number>();
  const nav = page.match(/<nav class="contents"[\s\S]*?<\/nav>/)?.[0] ?? "";
  let from = 0;
  for (const link of nav.matchAll(/<a href="#([^"]+)">/g)) {
    const id = link[1] ?? "";
    const at = page.indexOf(`id="${id}"`);
    if (at < 0) continue;
    const heading = page.slice(page.lastIndexOf("<", at)).match(/<h([1-6])\b[^>]*>([\s\S]*?)<\/h\1>/);
    if (heading === null) continue;
    const text = plain(heading[2] ?? "");
    const found = titles.findIndex((t, i) => i >= from && plain(t.title) === text);
    if (found < 0) continue;
    out.set(id, titles[found]?.page ?? 0);
    from = found + 1;
  }
  return out;
}

function plain(markup: string): string {
  return markup.replace(/<[^>]*>/g, "").replace(/&lt;/g, "<").replace(/&gt;/g, ">").replace(/&quot;/g, '"')
    .replace(/&#39;/g, "'").replace(/&amp;/g, "&").replace(/\s+/g, " ").trim();
}
