import assert from "node:assert/strict";
import { MINUS } from "../../src/report/page/format.ts";
import { renderPackage } from "../../src/report/package.ts";
import { assertNoLiveMarkup, parseDocument } from "./dom.ts";
import { HOSTILE } from "./fixture.ts";
import { designDay, designDayPackage, surface } from "./scenarioFixture.ts";

/** EW-9 by hand: R = R_se + Σ d/λ + R_cavity + R_si (ISO 6946:2017 §6.7.1, from memory), U = 1/R. */
const WALL_U = 1 / (0.04 + 0.015 / 0.8 + 0.12 / 0.035 + 0.18 + 0.175 / 0.52 + 0.0125 / 0.21 + 0.13);

const num = (text: string | null | undefined) => Number((text ?? "").replace(MINUS, "-").trim());

function cells(table: Element, q: string): Element[][] {
  return Array.from(table.querySelectorAll("tbody tr")).map((tr) =>
    Array.from(tr.querySelectorAll(`td[data-q="${q}"]`))
  );
}

function column(table: Element, q: string, index = 0): number[] {
  return cells(table, q).map((row) => num(row[index]?.textContent));
}

function fourSurfaces() {
  return [
    surface({
      id: "south",
      construction: "EW-9",
      areaM2: 42,
      azimuthDeg: 180,
      tiltDeg: 90,
      absorptance: 0.6,
    }),
    surface({ id: "west", construction: "EW-9", areaM2: 18, azimuthDeg: 270, tiltDeg: 90, absorptance: 0.6 }),
    surface({ id: "east", construction: "EW-9", areaM2: 25, azimuthDeg: 90, tiltDeg: 90, absorptance: 0.3 }),
    surface({ id: "flat", construction: "RF-9", areaM2: 120, tiltDeg: 0, absorptance: 0.9, emittance: 0.9 }),
  ];
}

Deno.test("scenario output: the peak shown is the peak in results.json and the largest total in the table", () => {
  const { input, results } = designDayPackage(designDay(fourSurfaces()));
  const doc = parseDocument(renderPackage(input));
  const output = doc.querySelector(".scenario-output");
  assert.ok(output !== null);
  // Whole watts (round half away from zero is not needed: the value is positive).
  assert.equal(output.querySelector(".peak-value")?.textContent, `${Math.round(results.peak.heatGain)} W`);
  // Hourly steps: the peak's time is its hour, written hh:00.
  const hour = String(results.peak.time_h).padStart(2, "0");
  assert.equal(output.querySelector(".peak-time")?.textContent, `${hour}:00 local standard time`);
  // The step tables print in Appendix E (hourly scenario values).
  assert.equal(output.querySelector("table.hourly-gains"), null);
  const gains = doc.querySelector("#s-e table.hourly-gains")!;
  const totals = column(gains, "total");
  assert.equal(totals.length, 24);
  assert.equal(Math.max(...totals), Math.round(results.peak.heatGain));
  const times = column(gains, "time").length;
  assert.equal(times, 24);
  const timeCells = cells(gains, "time").map((row) => row[0]?.textContent);
  assert.equal(timeCells[totals.indexOf(Math.max(...totals))], `${hour}:00`);
  // Daily gain in kWh = Σ positive totals × 1 h / 1000, from the table's own column (display rounding 0.5 W each).
  const gainKWh = totals.filter((t) => t > 0).reduce((a, b) => a + b, 0) / 1000;
  const printed = output.querySelector(".peak-summary")!.textContent!.match(/heat gain ([\d.]+) kWh/);
  assert.ok(printed !== null);
  assert.ok(Math.abs(Number(printed[1]) - gainKWh) <= 0.005 + 24 * 0.0005, `${printed[1]} vs ${gainKWh}`);
});

Deno.test("scenario output: each row's surface gains add up to the total column (split tables)", () => {
  const { input } = designDayPackage(designDay(fourSurfaces()));
  const doc = parseDocument(renderPackage(input));
  const gains = doc.querySelector("table.hourly-gains")!;
  assert.ok(doc.querySelector("table.hourly-temperatures"), "four surfaces split temperatures and gains");
  const rows = cells(gains, "gain");
  const totals = column(gains, "total");
  for (const [k, row] of rows.entries()) {
    assert.equal(row.length, 4);
    const sum = row.reduce((a, td) => a + num(td.textContent), 0);
    // Σ surface gains = total; five numbers each rounded to the watt: |error| ≤ 5 × 0.5 W.
    assert.ok(Math.abs(sum - totals[k]!) <= 2.5, `row ${k}: Σ ${sum} vs total ${totals[k]}`);
  }
  assert.ok(totals.some((t) => Math.abs(t) > 50), "the identity is tested on non-trivial numbers");
});

Deno.test("scenario output: without sun a vertical wall's sol-air is the outdoor air, which spans the daily range", () => {
  const walls = [
    surface({
      id: "south",
      construction: "EW-9",
      areaM2: 100,
      azimuthDeg: 180,
      tiltDeg: 90,
      absorptance: 0.6,
    }),
    surface({ id: "north", construction: "EW-9", areaM2: 10, azimuthDeg: 0, tiltDeg: 90, absorptance: 0.6 }),
  ];
  const indoor = { kind: "constant", valueC: 10 } as const;
  const { input } = designDayPackage(designDay(walls, { sky: { kind: "none" }, indoor }));
  const doc = parseDocument(renderPackage(input));
  const table = doc.querySelector("table.hourly-gains")!;
  assert.equal(doc.querySelector("table.hourly-temperatures"), null, "two surfaces share one table");
  const outdoor = column(table, "outdoor");
  // Daily range: maximum 31 °C and minimum 31 − 11 = 20 °C over the day.
  assert.equal(Math.max(...outdoor), 31);
  assert.equal(Math.min(...outdoor), 20);
  // Sol-air T_sa = T_o + αE/h_o − εΔR/h_o with E = 0 and ΔR = 0 on a vertical surface: T_sa = T_o.
  assert.deepEqual(column(table, "solair", 0), outdoor);
  // Daily mean inside flux = U × (mean T_sa − T_i) (steady-periodic energy balance), so the mean gain is
  // U·A·(mean T_o − 10 °C); tolerance: gains rounded to 0.5 W, temperatures to 0.05 K.
  const gains = column(table, "gain", 0);
  const meanGain = gains.reduce((a, b) => a + b, 0) / gains.length;
  const meanOutdoor = outdoor.reduce((a, b) => a + b, 0) / outdoor.length;
  const expected = WALL_U * 100 * (meanOutdoor - 10);
  assert.ok(expected > 300, "a large enough flow for a 1 % error to show");
  assert.ok(Math.abs(meanGain - expected) <= 0.5 + WALL_U * 100 * 0.05, `${meanGain} vs ${expected}`);
});

Deno.test("scenario output: a quarter-hour step still lists every step", () => {
  const walls = [
    surface({
      id: "south",
      construction: "EW-9",
      areaM2: 42,
      azimuthDeg: 180,
      tiltDeg: 90,
      absorptance: 0.6,
    }),
  ];
  const { input, results } = designDayPackage(designDay(walls, { timestepS: 900 }));
  const doc = parseDocument(renderPackage(input));
  const table = doc.querySelector("table.hourly-gains")!;
  const times = cells(table, "time").map((row) => row[0]?.textContent);
  assert.equal(times.length, 96);
  assert.deepEqual(times.slice(0, 3), ["00:00", "00:15", "00:30"]);
  assert.equal(times[95], "23:45");
  const minutes = Math.round(results.peak.time_h * 60);
  const expected = `${String(Math.floor(minutes / 60)).padStart(2, "0")}:${
    String(minutes % 60).padStart(2, "0")
  }`;
  assert.match(doc.querySelector(".peak-time")?.textContent ?? "", new RegExp(`^${expected} `));
});

Deno.test("scenario output: hostile surface ids come out as text only", () => {
  const ids = Object.values(HOSTILE);
  const surfaces = ids.slice(0, 4).map((id, i) =>
    surface({ id, construction: "EW-9", areaM2: 10 + i, azimuthDeg: 90 * i, tiltDeg: 90, absorptance: 0.5 })
  );
  const { input } = designDayPackage(designDay(surfaces));
  const out = renderPackage(input);
  const doc = parseDocument(out);
  assertNoLiveMarkup(out, doc);
  const heads = Array.from(doc.querySelectorAll("table.hourly-gains thead th")).map((th) =>
    th.textContent ?? ""
  );
  for (const id of ids.slice(0, 4)) {
    assert.ok(heads.some((h) => h.startsWith(id)), `column for ${id}`);
    const firstCells = Array.from(doc.querySelectorAll("table.scenario-surfaces tbody tr td:first-child"));
    assert.ok(firstCells.some((td) => td.textContent === id), `surface row for ${id}`);
  }
  // Surface ids name the lines at their ends: escaped, isolated text, never markup inside a plot.
  for (const svg of Array.from(doc.querySelectorAll(".scenario-output figure svg.plot"))) {
    assert.equal(svg.querySelectorAll("svg, script, a, img").length, 0, "no project markup inside a plot");
  }
  const solAir = doc.querySelector(".scenario-output svg.plot[aria-label^='Outdoor, indoor and sol-air']");
  const names = Array.from(solAir?.querySelectorAll("text") ?? []).map((t) => t.textContent ?? "");
  for (const id of ids.slice(0, 4)) assert.ok(names.includes(`\u2068${id}\u2069`), `line end label ${id}`);
});

Deno.test("scenario output: defaults are marked, constructions linked, checks listed and counted on the cover", () => {
  const { input } = designDayPackage(designDay(fourSurfaces()));
  const doc = parseDocument(renderPackage(input));
  const rows = Array.from(doc.querySelectorAll("table.scenario-surfaces tbody tr"));
  const emittance = (r: Element) => r.querySelectorAll("td")[5]?.textContent ?? "";
  assert.match(emittance(rows[0]!), /0\.9\s*\(default\)/, "south: ε not given");
  assert.equal(emittance(rows[3]!), "0.9", "flat: ε given in the input");
  const link = rows[0]!.querySelector("td:nth-child(2) a");
  assert.equal(link?.getAttribute("href"), "#c-ew-9");
  assert.ok(doc.getElementById("c-ew-9"), "the link target exists");
  // Two checks per surface (periodic-convergence, energy-balance) from designDay.ts, all passed: one line in the
  // body, the rows in Appendix C.
  assert.equal(doc.querySelectorAll(".scenario-output table.subject-checks tbody tr").length, 0);
  assert.match(
    doc.querySelector(".scenario-output .checks-line")?.textContent ?? "",
    new RegExp(`^${2 * 4} numerical checks passed \\(Appendix C\\)`),
  );
  assert.match(
    doc.querySelector(".cover")?.textContent ?? "",
    new RegExp(`all ${input.results.checks.length} passed`),
  );
  const contents = doc.querySelector(`nav.contents a[href="#sc-july-day"]`);
  assert.equal(contents?.textContent, "Results of scenario july-day");
  assert.match(doc.querySelector(".caution-box")?.textContent ?? "", /Heat gain is not cooling load/);
  // The general caution is printed once, in section 8, not repeated in every scenario's caution box.
  assert.doesNotMatch(doc.querySelector(".caution-box")?.textContent ?? "", /professional judgment/);
  assert.match(doc.querySelector("#s-8")?.textContent ?? "", /they do not replace it/);
});

Deno.test("scenario output: the package with a scenario is byte-identical when rendered twice", () => {
  const a = renderPackage(designDayPackage(designDay(fourSurfaces())).input);
  const b = renderPackage(designDayPackage(designDay(fourSurfaces())).input);
  assert.equal(a, b);
});

Deno.test("scenario output: a repeated scenario block id gets one output and one fragment id", () => {
  const { input } = designDayPackage(designDay(fourSurfaces()));
  const doc0 = input.model.documents[1]!;
  const block = doc0.segments.find((s) => s.kind === "block" && s.blockKind === "scenario")!;
  const documents = [input.model.documents[0]!, { ...doc0, segments: [...doc0.segments, block] }];
  const doc = parseDocument(renderPackage({ ...input, model: { ...input.model, documents } }));
  assert.equal(doc.querySelectorAll(".scenario-output").length, 1);
  assert.equal(doc.querySelectorAll("#sc-july-day").length, 1);
  assert.match(doc.querySelectorAll(".block-output")[4]?.textContent ?? "", /used by an earlier block/);
  assert.equal(doc.querySelectorAll(`nav.contents a[href="#sc-july-day"]`).length, 1);
});
