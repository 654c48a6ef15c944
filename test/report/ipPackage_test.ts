/**
 * The same model rendered with `units: IP`: each expected value is converted here with the factor written out
 * (1 W/(m²·K) = 1/5.678263 Btu/(h·ft²·°F), 1 W = 3.412142 Btu/h, °F = °C × 1.8 + 32, Δ°F = K × 1.8; NIST SP 811
 * Appendix B.9), never with the module under test.
 */
import assert from "node:assert/strict";
import { formatFixed, formatSig, formatTrim, MINUS } from "../../src/report/page/format.ts";
import { renderPackage } from "../../src/report/package.ts";
import type { ScenarioResults } from "../../src/results/types.ts";
import { parseDocument } from "./dom.ts";
import { asIp, siPackages } from "./unitFixtures.ts";

/** W/(m²·K) in one Btu/(h·ft²·°F) (NIST SP 811, B.9). */
const U_FACTOR = 5.678263;
/** Btu/h in one W (NIST SP 811, B.9: 1 Btu_IT/h = 0.2930711 W). */
const BTUH_PER_W = 3.412142;

const packages = siPackages();
const designDay = packages["si-design-day"]!;
const ipDoc = parseDocument(renderPackage(asIp(designDay)));
const siDoc = parseDocument(renderPackage(designDay));
const july = designDay.results.scenarios["july-day"] as ScenarioResults;
const wall = designDay.results.constructions["EW-9"]!;

/** Text content with runs of ASCII white space made one space (the thin space of `formatSig` is kept). */
const text = (el: Element | null | undefined) => (el?.textContent ?? "").replace(/[ \t\r\n]+/g, " ").trim();
const number = (s: string) => Number(s.replace(MINUS, "-").replace(/[^\d.eE+-].*$/, ""));

function rowOf(doc: Document, tableSelector: string, firstCell: string): Element {
  const row = Array.from(doc.querySelectorAll(`${tableSelector} tr`)).find((r) =>
    text(r.querySelector("td, th")) === firstCell || text(r.children[1]).startsWith(firstCell)
  );
  assert.ok(row !== undefined, `no row ${firstCell} in ${tableSelector}`);
  return row;
}

Deno.test("IP: U and R are converted with the exact factor and show their SI value beside", () => {
  const uIp = formatSig(wall.U / U_FACTOR, 3);
  const rIp = formatSig(wall.R * U_FACTOR, 3);
  const uRow = rowOf(ipDoc, "table.layer-table", "Thermal transmittance U = 1/R (Btu/(h·ft²·°F))");
  const uCell = uRow.querySelectorAll("td.num")[0]!;
  assert.equal(text(uCell), `${uIp}(${formatSig(wall.U, 3)} W/(m²·K))`, "IP value, then SI below it");
  assert.equal(uCell.querySelector("br + .si-equivalent")?.tagName, "SPAN");
  assert.equal(text(uCell.querySelector(".si-equivalent")), `(${formatSig(wall.U, 3)} W/(m²·K))`);
  const rRow = rowOf(ipDoc, "table.layer-table", "Total resistance R, air to air (h·ft²·°F/Btu)");
  assert.equal(text(rRow.querySelectorAll("td.num")[0]), `${rIp}(${formatSig(wall.R, 3)} m²·K/W)`);
  const line = Array.from(ipDoc.querySelectorAll(".block-output p")).find((p) => text(p).startsWith("U = "));
  assert.equal(
    text(line),
    `U = ${uIp} Btu/(h·ft²·°F) (${formatSig(wall.U, 3)} W/(m²·K)) (R = ${rIp} h·ft²·°F/Btu (${
      formatSig(wall.R, 3)
    } m²·K/W), heat flow horizontal)`,
  );
  // The wall's U is about 0.24 W/(m²·K): 0.042 in IP, not the SI number relabelled.
  assert.ok(Math.abs(number(uIp) - 0.042) < 0.001, uIp);
});

Deno.test("IP: response factors and CTF coefficients scale like U; Φ keeps its value", () => {
  const rf = wall.responseFactors as { Y: number[] };
  const firstRow = ipDoc.querySelector("table.rf-table tbody tr")!;
  assert.equal(text(firstRow.children[3]), formatSig(rf.Y[0]! / U_FACTOR, 4));
  const ctf = wall.ctf as { Y: number[]; Phi: number[] };
  const secondRow = Array.from(ipDoc.querySelectorAll("table.ctf-table tbody tr.group-start"))[1]!;
  const cells = secondRow.querySelectorAll("td.num");
  assert.equal(text(cells[2]), formatSig(ctf.Y[1]! / U_FACTOR, 6));
  assert.equal(text(cells[4]), formatSig(ctf.Phi[0]!, 6));
  assert.match(text(ipDoc.querySelector("table.ctf-table caption")), /X_n, Y_n and Z_n in Btu\/\(h·ft²·°F\)/);
});

Deno.test("IP: temperatures in °F (× 1.8 + 32), the daily range and ΔT_lw as °F differences (× 1.8 only)", () => {
  const outdoor = Array.from(ipDoc.querySelectorAll("td[data-q='outdoor']")).map(text);
  assert.deepEqual(outdoor, july.outdoor.map((c) => formatFixed(c * 1.8 + 32, 1)));
  const indoor = Array.from(ipDoc.querySelectorAll("td[data-q='indoor']")).map(text);
  assert.ok(indoor.every((t) => t === "75.2"), "24 °C indoor is 75.2 °F");
  const solAir = Array.from(ipDoc.querySelectorAll("td[data-q='solair']")).map(text);
  const roof = july.surfaces["roof"]!;
  assert.ok(solAir.includes(formatFixed(roof.solAir[12]! * 1.8 + 32, 1)));
  const outdoorRow = text(rowOf(ipDoc, "table.conditions", "Outdoor air"));
  // 31 °C maximum, 11 K range: 87.8 °F and 19.8 °F of difference; 11 × 1.8 + 32 = 51.8 must not appear.
  assert.match(outdoorRow, /Maximum dry bulb 87\.8 °F, daily range 19\.8 Δ°F\./);
  assert.doesNotMatch(outdoorRow, /51\.8/);
  const lw = roof.parameters.longwaveCorrection;
  assert.ok(lw > 1, "the horizontal roof has a long-wave correction");
  const roofRow = rowOf(ipDoc, "table.scenario-surfaces", "roof");
  assert.ok(
    text(roofRow.children[7]).startsWith(`${formatFixed(lw * 1.8, 2)}(default)`),
    text(roofRow.children[7]),
  );
  assert.match(text(ipDoc.querySelector("table.scenario-surfaces thead")), /ΔT_lw Δ°F/);
});

Deno.test("IP: heat gains in Btu/h (× 3.412142), the peak with its SI value beside", () => {
  const peak = text(ipDoc.querySelector(".peak-value"));
  assert.match(peak, / Btu\/h$/);
  assert.ok(Math.abs(number(peak) - july.peak.heatGain * BTUH_PER_W) <= 0.5 + 1e-6, peak);
  const line = ipDoc.querySelector(".peak-line")!;
  assert.equal(text(line.querySelector(".si-equivalent")), `(${formatFixed(july.peak.heatGain, 0)} W)`);
  const totals = Array.from(ipDoc.querySelectorAll("td[data-q='total']")).map((td) => number(text(td)));
  july.totalHeatGain.forEach((w, k) =>
    assert.ok(Math.abs(totals[k]! - w * BTUH_PER_W) <= 0.5 + 1e-6, `step ${k}`)
  );
});

Deno.test("IP: the layer table, the section drawing and the material tables use in, Btu·in/(h·ft²·°F), lb/ft³", () => {
  const head = text(ipDoc.querySelector("table.layer-table thead"));
  assert.equal(
    head,
    "No. Layer Thickness in λ Btu·in/(h·ft²·°F) ρ lb/ft³ c Btu/(lb·°F) R h·ft²·°F/Btu ρ·c·d, heat capacity per area (total row: Σ ρ·c·d) Btu/(ft²·°F)",
  );
  // Layer 2: 120 mm EPS, λ 0.035, ρ 20, c 1450.
  const eps = rowOf(ipDoc, "table.layer-table", "EPS board");
  const cells = Array.from(eps.querySelectorAll("td.num")).map(text);
  assert.deepEqual(cells.slice(1, 5), [
    formatTrim(0.12 / 0.0254, 3), // three significant figures (ISSUE 11 item 9): 4.72 in
    formatTrim(0.035 / (U_FACTOR * 0.0254), 3), // Btu·in/(h·ft²·°F) = 5.678263 W/(m²·K) × 0.0254 m
    formatTrim(20 / (0.45359237 / 0.3048 ** 3), 3),
    formatTrim(1450 / 4186.8, 3),
  ]);
  const drawing = ipDoc.querySelector("svg.section-drawing")!;
  const labels = Array.from(drawing.querySelectorAll("text")).map(text);
  assert.ok(labels.includes(formatTrim(0.12 / 0.0254, 3)), "120 mm EPS is 4.72 in");
  assert.ok(labels.some((l) => /^[\d.]+\u2009in overall/.test(l)), labels.join(" | "));
  assert.ok(!labels.some((l) => /mm/.test(l)), labels.join(" | "));
  // The fixture's materials have no block in a document, so section 6 gives their values.
  const material = rowOf(ipDoc, "#s-6 table", "eps-board");
  assert.equal(text(material.children[2]), formatTrim(0.035 / (U_FACTOR * 0.0254), 3));
});

Deno.test("IP: the plots are drawn in IP values with IP axis labels", () => {
  const plotText = (id: string) =>
    Array.from(ipDoc.querySelectorAll(`svg.plot[aria-label^='${id}'] text`)).map(text).join(" | ");
  assert.match(plotText("Outdoor, indoor and sol-air"), /Temperature \(°F\)/);
  assert.match(plotText("Inside heat flux of each"), /Inside heat flux, into the room \(Btu\/\(h·ft²\)\)/);
  assert.match(plotText("Heat gain stacked"), /Heat gain \(Btu\/h\)/);
  assert.match(plotText("Response factors X, Y and Z"), /Response factor, Btu\/\(h·ft²·°F\)/);
  const step = plotText("Step response");
  assert.match(step, /Inside heat flux per Δ°F, Btu\/\(h·ft²·°F\)/);
  assert.ok(step.includes(`U = ${formatTrim(wall.U / U_FACTOR, 3)}\u2009Btu/(h·ft²·°F)`), step);
  // The temperature axis spans the °F values (a °C axis would end near the roof's sol-air in °C).
  const ticks = plotText("Outdoor, indoor and sol-air").split(" | ").filter((t) => /^[−\d.]+$/.test(t))
    .map(number);
  const all = [...july.outdoor, ...Object.values(july.surfaces).flatMap((s) => s.solAir)].map((c) =>
    c * 1.8 + 32
  );
  assert.ok(Math.max(...ticks) >= Math.max(...all) - 20, `ticks ${ticks.join(", ")}`);
  assert.ok(Math.min(...ticks) <= Math.min(...all) + 20, `ticks ${ticks.join(", ")}`);
});

Deno.test("IP: the glossary names the unit system; inputs and results.json are unchanged", () => {
  const conventions = text(ipDoc.querySelector("#s-1 table"));
  assert.match(conventions, /Inch-pound \(IP\)/);
  assert.match(conventions, /results\.json \(Appendix B\) and the CSV files are in SI/);
  const uRow = rowOf(ipDoc, "#s-1 table", "U");
  assert.equal(
    text(uRow.children[1]),
    "Thermal transmittance air to air, Btu/(h·ft²·°F), U = 1/R with R including R_se and R_si.",
  );
  assert.doesNotMatch(text(siDoc.querySelector("#s-1 table")), /Inch-pound/);
  const blocks = (doc: Document) =>
    Array.from(doc.querySelectorAll(".input-block pre")).map((p) => p.textContent);
  assert.deepEqual(blocks(ipDoc), blocks(siDoc));
  const json = (doc: Document) => doc.querySelector("pre[data-embedded='results-json']")?.textContent;
  assert.equal(json(ipDoc), json(siDoc));
  assert.equal(
    json(ipDoc)?.replace(/^\n/, ""),
    designDay.resultsJsonText,
    "the text written as results.json",
  );
});
