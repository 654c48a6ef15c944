/**
 * Opens the demo package in Debian's Chromium (headless, driven by playwright-core) as a reader would:
 * no network request, no console error, every section and plot visible, screenshots at screen and print
 * sizes and a PDF. Run with `deno task browser` after `deno task demo`; needs /usr/bin/chromium.
 */
import assert from "node:assert/strict";
import { CHROMIUM_ARGS, CHROMIUM_PATH } from "../src/commands/pdf.ts";
import { join } from "node:path";
import { chromium } from "playwright-core";

const PACKAGE = new URL("../projects/demo/out/package.html", import.meta.url);
// Beside the output folder, not in it: a build replaces only a folder holding nothing but its own files.
const SHOTS = new URL("../projects/demo/screenshots/", import.meta.url).pathname;

Deno.test("the demo package opens in Chromium with no request beyond itself, no console error, all sections and plots visible", async () => {
  await Deno.mkdir(SHOTS, { recursive: true });
  const browser = await chromium.launch({ executablePath: CHROMIUM_PATH, args: CHROMIUM_ARGS });
  try {
    const page = await browser.newPage({ viewport: { width: 1200, height: 1600 } });
    const requests: string[] = [];
    const problems: string[] = [];
    page.on("request", (r) => requests.push(r.url()));
    page.on("console", (m) => {
      if (m.type() === "error" || m.type() === "warning") problems.push(`${m.type()}: ${m.text()}`);
    });
    page.on("pageerror", (e) => problems.push(`page error: ${e.message}`));
    await page.goto(PACKAGE.href, { waitUntil: "load" });
    assert.deepStrictEqual(requests, [PACKAGE.href], "the package must load nothing but itself");
    assert.deepStrictEqual(problems, []);
    const sections = await page.locator("section[id^='s-']").all();
    assert.ok(sections.length >= 10, `${sections.length} sections`);
    for (const section of sections) {
      assert.ok(await section.isVisible(), await section.getAttribute("id") ?? "section");
    }
    const figures = await page.locator("figure > svg").all();
    assert.ok(figures.length >= 10, `${figures.length} plots and drawings`);
    for (const svg of figures) {
      const box = await svg.boundingBox();
      assert.ok(box !== null && box.width > 100 && box.height > 50, "every figure has a visible size");
    }
    assert.ok(await page.getByText("END OF CALCULATION PACKAGE").isVisible());
    await page.screenshot({ path: join(SHOTS, "screen-top.png") });
    const firstFigure = page.locator("figure").first();
    await firstFigure.scrollIntoViewIfNeeded();
    await firstFigure.screenshot({ path: join(SHOTS, "screen-first-figure.png"), timeout: 60000 });
    await page.emulateMedia({ media: "print" });
    await page.setViewportSize({ width: 794, height: 1123 });
    await page.evaluate(() => globalThis.scrollTo(0, 0));
    await page.screenshot({ path: join(SHOTS, "print-a4-top.png"), timeout: 60000 });
    await page.pdf({ path: join(SHOTS, "package-a4.pdf"), format: "A4", printBackground: true });
    await page.pdf({ path: join(SHOTS, "package-letter.pdf"), format: "Letter", printBackground: true });
    const pdf = Deno.readFileSync(join(SHOTS, "package-a4.pdf"));
    const pages = (new TextDecoder("latin1").decode(pdf).match(/\/Type\s*\/Page[^s]/g) ?? []).length;
    assert.ok(pages >= 10, `${pages} A4 pages`);
  } finally {
    await browser.close();
  }
});
