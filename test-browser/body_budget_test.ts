/**
 * The demo's body (cover to the cautions) prints in at most 30 A4 pages (issue 11: "Goal: the demo's body (cover
 * to cautions) prints in ≤ 30 A4 pages"). Prints projects/demo with `build --pdf` through Debian's Chromium and
 * reads the page of each heading from the PDF outline. Needs /usr/bin/chromium; skipped without it.
 */
import assert from "node:assert/strict";
import { join } from "node:path";
import { runBuild } from "../src/commands/build.ts";
import { CHROMIUM_PATH } from "../src/commands/pdf.ts";
import { pageNumbersFromOutline } from "../src/commands/pdfOutline.ts";

const DEMO = new URL("../projects/demo/", import.meta.url).pathname;
const HAS_CHROMIUM = (() => {
  try {
    return Deno.statSync(CHROMIUM_PATH).isFile;
  } catch {
    return false;
  }
})();

/** The body's page budget on A4 (issue 11). */
const BODY_PAGES = 30;

Deno.test({
  name: "the demo's body, cover to cautions, prints in at most 30 A4 pages",
  ignore: !HAS_CHROMIUM,
  async fn() {
    const dir = await Deno.makeTempDir({ prefix: "fluxnote-budget-test-" });
    try {
      const out = join(dir, "out");
      const err: string[] = [];
      const code = await runBuild({ project: DEMO, out, pdf: true }, {
        stdout: () => {},
        stderr: (l) => err.push(l),
      });
      assert.equal(code, 0, err.join("\n"));
      const outline = pageNumbersFromOutline(await Deno.readFile(join(out, "package.pdf")));
      const cautions = outline.findIndex((e) => /\bCautions$/.test(e.title));
      assert.ok(cautions >= 0, outline.map((e) => e.title).join(" | "));
      // The body ends where the cautions end: on the page where the next heading after them starts (counted
      // even when that heading starts a fresh page, so the count never flatters).
      const next = outline[cautions + 1];
      const last = next?.page ?? outline[cautions]!.page;
      assert.ok(
        last <= BODY_PAGES,
        `the body takes ${last} pages (cautions on page ${outline[cautions]!.page})`,
      );
    } finally {
      await Deno.remove(dir, { recursive: true });
    }
  },
});
