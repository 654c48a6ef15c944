/** The package shows the cooling load and heating tables with the numbers of results.json (built end to end). */
import assert from "node:assert/strict";
import { join } from "node:path";
import { runBuild } from "../../src/commands/build.ts";
import { MINUS } from "../../src/report/page/format.ts";
import type { ResultsJson } from "../../src/results/types.ts";
import { assertNoLiveMarkup, parseDocument } from "./dom.ts";

const GOOD = new URL("../fixtures/design-answers/good/", import.meta.url).pathname;
const quiet = { stdout: () => {}, stderr: () => {} };
const num = (text: string | null | undefined) => Number((text ?? "").replace(MINUS, "-").trim());

async function built(): Promise<{ doc: Document; results: ResultsJson; out: string; page: string }> {
  const out = join(await Deno.makeTempDir(), "out");
  assert.equal(await runBuild({ project: GOOD, out }, quiet), 0);
  const page = Deno.readTextFileSync(join(out, "package.html"));
  const results = JSON.parse(Deno.readTextFileSync(join(out, "results.json"))) as ResultsJson;
  return { doc: parseDocument(page), results, out, page };
}

Deno.test("package: the cooling load section prints the series, its source (escaped), peaks and hourly loads", async () => {
  const { doc, results, page } = await built();
  const cl = results.scenarios.summer!.coolingLoad!;
  const section = doc.querySelector(".cooling-load-output");
  assert.ok(section !== null);
  assert.deepStrictEqual(
    Array.from(section.querySelectorAll('td[data-q="rts"]')).map((td) => num(td.textContent)),
    [0.5, 0.2, 0.1, 0.05, 0.05, 0.05, 0.05, ...new Array(17).fill(0)],
  );
  // The user's source is printed as text: its markup is shown, not obeyed.
  assert.equal(
    section.querySelector(".rts-source")?.textContent,
    "Invented test series <b>not</b> from any table",
  );
  assert.equal(section.querySelector(".rts-source b"), null);
  // The hourly loads print in Appendix E (hourly scenario values), not in the body's cooling load section.
  assert.equal(section.querySelectorAll("table.cooling-load").length, 0);
  const loads = Array.from(doc.querySelectorAll('#s-e table.cooling-load td[data-q="total-load"]')).map((
    td,
  ) => num(td.textContent));
  assert.deepStrictEqual(loads, cl.total.map((v) => Math.round(v)));
  assert.equal(
    num(section.querySelector('[data-q="total-load-peak"]')?.textContent),
    Math.round(cl.peak.value),
  );
  const hour = String(cl.peak.time_h).padStart(2, "0");
  assert.equal(section.querySelector('[data-q="total-load-time"]')?.textContent, `${hour}:00`);
  assert.equal(section.querySelectorAll("svg.plot").length, 2);
  assert.match(section.querySelector(".cooling-limits")?.textContent ?? "", /continuous operation/);
  assertNoLiveMarkup(page, doc);
});

Deno.test("package: the heating table lists U, area, loss, θ_si, f_Rsi and verdicts from results.json", async () => {
  const { doc, results } = await built();
  const h = results.heating!.winter!;
  const table = doc.querySelector("#hs-winter table.heating-surfaces");
  assert.ok(table !== null);
  const rows = Array.from(table.querySelectorAll("tbody tr")).filter((tr) =>
    !tr.classList.contains("total-row")
  );
  assert.deepStrictEqual(rows.map((tr) => tr.querySelector("th")?.textContent), ["south", "north"]);
  for (const tr of rows) {
    const s = h.surfaces[tr.querySelector("th")!.textContent!]!;
    assert.equal(num(tr.querySelector('[data-q="loss"]')?.textContent), Math.round(s.heatLoss));
    assert.equal(tr.querySelector('[data-q="theta-si"]')?.textContent, s.insideSurfaceTemperature.toFixed(1));
    assert.equal(tr.querySelector('[data-q="frsi"]')?.textContent, s.fRsi.toFixed(3));
    assert.equal(tr.querySelector('[data-q="mould"]')?.textContent, s.mould.pass ? "pass" : "mould risk");
  }
  // Hand check of the minimal wall: R_T = 0.04 + 0.2/1.65 + 0.1/0.035 + 0.18 + 0.013/0.21 + 0.13 (ISO 6946),
  // loss = 30 m² × 20 K / R_T.
  const rt = 0.04 + 0.2 / 1.65 + 0.1 / 0.035 + 0.18 + 0.013 / 0.21 + 0.13;
  assert.equal(num(table.querySelector('[data-q="total-loss"]')?.textContent), Math.round((30 * 20) / rt));
  assert.equal(
    doc.querySelector('#hs-winter [data-q="dew-point"]')?.textContent,
    `${h.indoorDewPoint.toFixed(1)} °C`,
  );
});

Deno.test("build: heating CSV and cooling-load columns in the design-day CSV", async () => {
  const { out, results } = await built();
  const heating = Deno.readTextFileSync(join(out, "csv/heating-winter.csv")).trimEnd().split("\n");
  assert.equal(heating[0]!.split(",")[4], "heat_loss_W");
  // CSV numbers carry 6 significant figures (src/results/csvTable.ts): within half a unit of the 6th figure.
  const six = (a: number, b: number) => assert.ok(Math.abs(a - b) <= 5e-6 * Math.abs(b), `${a} ≠ ${b}`);
  six(Number(heating[1]!.split(",")[4]), results.heating!.winter!.surfaces.south!.heatLoss);
  const day = Deno.readTextFileSync(join(out, "csv/scenario-summer.csv")).trimEnd().split("\n");
  const header = day[0]!.split(",");
  const col = header.indexOf("total_cooling_load_W");
  assert.ok(header.includes("south:cooling_load_W") && col > 0);
  six(Number(day[1 + 14]!.split(",")[col]), results.scenarios.summer!.coolingLoad!.total[14]!);
});
