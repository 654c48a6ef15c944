/**
 * The demo (projects/demo) in IP units prints as an SI package does (ISSUE 11, item 9): every table fits the
 * printed column (five layer tables, the materials table and the heating table overflowed and Chromium shrank
 * the whole document to 93 %), thicknesses to three significant figures, the indoor vapour pressure in in. Hg
 * and the heating notes in IP units.
 */
import assert from "node:assert/strict";
import { existsSync } from "node:fs";
import { CHROMIUM_ARGS, CHROMIUM_PATH } from "../../src/commands/pdf.ts";
import { demoPackage } from "./demoBuild.ts";
import { parseDocument } from "./dom.ts";

/** Text column of an A4 page: 210 mm less the package's 18 mm margins each side, at 96 px per inch (CSS). */
const A4_COLUMN_PX = Math.floor(((210 - 2 * 18) / 25.4) * 96);

/** Whether Chromium is installed and this test run may start it (run and homedir permissions). */
async function browserAllowed(): Promise<boolean> {
  if (!existsSync(CHROMIUM_PATH)) return false;
  const run = await Deno.permissions.query({ name: "run", command: CHROMIUM_PATH });
  const sys = await Deno.permissions.query({ name: "sys", kind: "homedir" });
  return run.state === "granted" && sys.state === "granted";
}

/** Tables, figures and drawings wider than the printed column, as Chromium lays out the print media. */
async function widerThanColumn(file: string): Promise<string[]> {
  const { chromium } = await import("playwright-core");
  const browser = await chromium.launch({ executablePath: CHROMIUM_PATH, args: CHROMIUM_ARGS });
  try {
    const page = await browser.newPage({ viewport: { width: A4_COLUMN_PX, height: 1000 } });
    await page.emulateMedia({ media: "print" });
    await page.goto(`file://${file}`);
    return await page.evaluate(() => {
      const column = document.body.clientWidth;
      return Array.from(document.querySelectorAll("table, figure, svg")).flatMap((el) => {
        const width = el.getBoundingClientRect().width;
        if (width <= column + 0.5) return [];
        const caption = el.querySelector("caption")?.textContent ?? el.closest("section[id]")?.id ?? "";
        return [
          `${el.tagName.toLowerCase()}.${el.getAttribute("class") ?? ""} ${
            Math.round(width)
          } px > ${column} px: ${caption.slice(0, 60)}`,
        ];
      });
    });
  } finally {
    await browser.close();
  }
}

for (const units of ["IP", "SI"] as const) {
  Deno.test({
    name: `${units} demo: every table fits the printed A4 column (nothing shrinks the document)`,
    // Runs where Chromium is installed and the test may start it (deno test -A, the browser job of CI); the
    // plain test task grants neither, and the test is then listed as ignored.
    ignore: !(await browserAllowed()),
    fn: async () => {
      assert.deepEqual(await widerThanColumn(await demoPackage(units)), []);
    },
  });
}

const ipDoc = async () => parseDocument(await Deno.readTextFile(await demoPackage("IP")));
const textOf = (el: Element | null | undefined) => (el?.textContent ?? "").replace(/\s+/g, " ").trim();

Deno.test("IP demo: layer thicknesses print to three significant figures (180 mm is 7.09 in, not 7.0866)", async () => {
  const doc = await ipDoc();
  const cells = Array.from(doc.querySelectorAll("table.layer-table td.thickness")).map(textOf);
  assert.ok(cells.length >= 15, `thickness cells: ${cells.length}`);
  // 180 mm = 7.0866 in (1 in = 25.4 mm exactly, international yard and pound agreement, 1959).
  assert.ok(cells.includes("7.09"), cells.join(" | "));
  for (const cell of cells) {
    const significant = cell.replace(".", "").replace(/^0+/, "").length;
    assert.ok(significant <= 3, `"${cell}" has ${significant} significant figures`);
  }
});

Deno.test("IP demo: the indoor vapour pressure prints in in. Hg and the heating notes in IP units", async () => {
  const doc = await ipDoc();
  const vapour = textOf(doc.querySelector('td[data-q="vapour-pressure"]'));
  assert.match(vapour, /^0\.\d{3} in\. Hg$/, vapour);
  // The demo's winter design: 21 °C indoors at 50 % RH, 0.5 × 2487 Pa ≈ 1243 Pa (saturation pressure at 21 °C,
  // from memory; the demo's 50-winter.md works the same 1243 Pa by hand); 1 in. Hg = 3386.389 Pa (NIST SP 811,
  // Appendix B): 0.367 in. Hg.
  assert.ok(Math.abs(Number(vapour.split(" ")[0]) - 0.367) < 0.002, vapour);
  const heating = Array.from(doc.querySelectorAll(".scenario-notes")).map(textOf).find((t) =>
    t.includes("f_Rsi")
  );
  assert.ok(heating !== undefined, "the heating notes");
  assert.doesNotMatch(heating, /m²·K\/W|°C/);
  // R_si = 0.25 m²·K/W × 5.678263 (h·ft²·°F/Btu per m²·K/W, NIST SP 811 Appendix B) = 1.42 h·ft²·°F/Btu.
  assert.match(heating, /R_si = 1\.42 h·ft²·°F\/Btu/);
});
