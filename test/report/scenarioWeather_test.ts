import assert from "node:assert/strict";
import { MINUS } from "../../src/report/page/format.ts";
import { renderPackage } from "../../src/report/package.ts";
import type { ScenarioResults } from "../../src/results/types.ts";
import { parseDocument } from "./dom.ts";
import { surface, weatherYearPackage } from "./scenarioFixture.ts";

/** EW-9 by hand: R = R_se + Σ d/λ + R_cavity + R_si (ISO 6946:2017 §6.7.1, from memory), U = 1/R. */
const WALL_U = 1 / (0.04 + 0.015 / 0.8 + 0.12 / 0.035 + 0.18 + 0.175 / 0.52 + 0.0125 / 0.21 + 0.13);
/** Hours of each month of 2031, a common year. */
const HOURS = [31, 28, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31].map((d) => 24 * d);
const AREA = 10;

const num = (text: string | null | undefined) => Number((text ?? "").replace(MINUS, "-").trim());

function constantYear() {
  // Dry bulb 5 °C all year, no sun, indoor 21 °C: after the warm-up the flux is steady, q = U (T_sa − T_i) with
  // T_sa = T_o for a vertical wall without sun (ε ΔR = 0 on a vertical surface).
  return weatherYearPackage(
    [surface({
      id: "south",
      construction: "EW-9",
      areaM2: AREA,
      azimuthDeg: 180,
      tiltDeg: 90,
      absorptance: 0.6,
    })],
    5,
    21,
  );
}

const { input, results } = constantYear();

Deno.test("weather scenario: the summary is shown without any step table", () => {
  assert.equal(results.totalHeatGain.length, 0, "the weather year keeps no step series in results.json");
  const doc = parseDocument(renderPackage(input));
  const output = doc.querySelector(".scenario-output");
  assert.ok(output !== null);
  assert.equal(output.querySelectorAll("table.hourly").length, 0);
  // Steady heat gain U·A·(5 − 21) W, printed to the watt.
  const steady = WALL_U * AREA * (5 - 21);
  assert.equal(output.querySelector(".peak-value")?.textContent, `${MINUS}${Math.round(-steady)} W`);
  assert.match(
    output.querySelector(".peak-time")?.textContent ?? "",
    /^2031-\d\d-\d\d \d\d:00 local standard time$/,
  );
  assert.ok(output.querySelector("figure svg.plot"), "the monthly plot");
  assert.match(output.textContent ?? "", /Heat gain is not cooling load/);
});

Deno.test("weather scenario: monthly losses equal U·A·ΔT·hours, month by month", () => {
  const doc = parseDocument(renderPackage(input));
  const rows = Array.from(doc.querySelectorAll(".scenario-output table.monthly tbody tr"));
  assert.equal(rows.length, 13, "twelve months and the year");
  for (const [m, hours] of HOURS.entries()) {
    const loss = num(rows[m]!.querySelector('td[data-q="loss"]')?.textContent);
    const gain = num(rows[m]!.querySelector('td[data-q="gain"]')?.textContent);
    // Loss energy = U · A · (21 − 5) K · hours, in kWh (W·h / 1000); printed to three significant figures.
    const expected = (WALL_U * AREA * 16 * hours) / 1000;
    assert.ok(Math.abs(loss - expected) <= 0.0051 * expected, `month ${m + 1}: ${loss} vs ${expected}`);
    assert.equal(gain, 0);
  }
  const year = rows[12]!.querySelectorAll("td");
  const yearLoss = (WALL_U * AREA * 16 * 8760) / 1000;
  assert.ok(Math.abs(num(year[2]?.textContent) - yearLoss) <= 0.0051 * yearLoss);
});

Deno.test("weather scenario: a results entry without the extension keys still renders its summary", () => {
  const plain: ScenarioResults = {
    kind: results.kind,
    timestep_h: results.timestep_h,
    outdoor: [],
    indoor: [],
    surfaces: results.surfaces,
    totalHeatGain: [],
    peak: results.peak,
    totals: results.totals,
    notes: [],
  };
  const id = Object.keys(input.results.scenarios)[0]!;
  const doc = parseDocument(
    renderPackage({ ...input, results: { ...input.results, scenarios: { [id]: plain } } }),
  );
  const output = doc.querySelector(".scenario-output")!;
  assert.equal(output.querySelectorAll("table.hourly").length, 0);
  assert.equal(output.querySelectorAll("table.monthly tbody tr").length, 13);
  assert.equal(
    output.querySelector(".peak-value")?.textContent,
    `${MINUS}${Math.round(-results.peak.heatGain)} W`,
  );
  assert.match(output.querySelector(".peak-time")?.textContent ?? "", /h after the first row$/);
});
