/**
 * An IP package leaves no SI unit on a printed number: the text of tables, captions, summaries and plots is
 * scanned after removing only the SI values shown beside IP ones, the exact-definition rows of the glossary and
 * the text quoted verbatim from the inputs or results.json.
 */
import assert from "node:assert/strict";
import { formatSig } from "../../src/report/page/format.ts";
import { renderPackage } from "../../src/report/package.ts";
import type { ScenarioResults } from "../../src/results/types.ts";
import { parseDocument } from "./dom.ts";
import { asIp, siPackages } from "./unitFixtures.ts";

/** Joules in one kBtu (International Table Btu = 1055.05585262 J, NIST SP 811 Appendix B). */
const J_PER_KBTU = 1055055.85262;

/**
 * Parts that are not display output: SI beside IP, the exact definitions, input blocks and prose as written,
 * checks and register statements quoted from results.json (relative values, SI text), the calculation methods section,
 * the sources and the appendices (the scenario notes are scanned: their values are converted).
 */
const QUOTED = [
  ".si-equivalent",
  "tr.unit-definitions",
  ".input-block",
  ".prose",
  "table.subject-checks",
  "#s-3",
  "#s-4",
  "#s-5",
  "#s-7",
  "#s-10",
  "#s-a",
  "#s-b",
  "#s-c",
  "style",
];

/** SI unit labels, and an SI unit symbol right after a number. */
const SI_LABELS = ["W/(m²·K)", "m²·K/W", "W/(m·K)", "kg/m³", "J/(kg·K)", "kJ/(m²·K)", "°C", "W/m²", "kWh"];
const SI_AFTER_NUMBER = /\d[\s\u2009]*(W|K|mm|m|m²|kJ|J)(?![\w²³/·(])/;
/** A bare SI symbol as a word of its own, as in an axis label "Heat gain (W)" or a header "ΔT_lw K". */
const SI_WORD = /(^|[\s(,])(W|K|mm|m|m²|kWh|J)(?=$|[\s).,;:])/m;

function displayedText(markup: string): string {
  const doc = parseDocument(markup);
  for (const selector of QUOTED) for (const el of Array.from(doc.querySelectorAll(selector))) el.remove();
  const parts = Array.from(doc.querySelectorAll("main, .cover")).map((el) => el.textContent ?? "");
  return parts.join("\n");
}

function assertNoSiLabel(name: string, markup: string): void {
  const shown = displayedText(markup);
  assert.ok(shown.length > 10_000, `${name}: the scan sees the package (${shown.length} characters)`);
  for (const label of SI_LABELS) {
    const at = shown.indexOf(label);
    assert.equal(at, -1, `${name}: "${label}" in …${shown.slice(Math.max(0, at - 80), at + 40)}…`);
  }
  for (const pattern of [SI_AFTER_NUMBER, SI_WORD]) {
    const match = pattern.exec(shown);
    const at = match?.index ?? 0;
    assert.equal(match, null, `${name}: "${match?.[0]}" in …${shown.slice(Math.max(0, at - 80), at + 40)}…`);
  }
}

const packages = siPackages();

Deno.test("IP: no SI unit label is left on a displayed number (plain, design day, weather year)", () => {
  for (const [name, input] of Object.entries(packages)) assertNoSiLabel(name, renderPackage(asIp(input)));
});

Deno.test("the scan finds the SI labels of an SI package (it can fail)", () => {
  const shown = displayedText(renderPackage(packages["si-design-day"]!));
  for (const label of SI_LABELS.filter((l) => l !== "kWh")) assert.ok(shown.includes(label), label);
  assert.match(shown, SI_AFTER_NUMBER);
  assert.match(shown, SI_WORD);
  assert.match(shown, /\d\u2009mm overall/);
});

Deno.test("IP weather year: monthly energy in kBtu, dry bulb in °F, the monthly plot labelled in kBtu", () => {
  const input = packages["si-weather-year"]!;
  const results = input.results.scenarios["test-year"] as ScenarioResults;
  const monthly = (results.totals.monthly ?? [])[0]!;
  const doc = parseDocument(renderPackage(asIp(input)));
  const head = doc.querySelector("table.monthly thead")?.textContent?.replace(/\s+/g, " ").trim();
  assert.equal(head, "Month Heat gain kBtu Heat loss kBtu Net (gain − loss) kBtu");
  const january = Array.from(doc.querySelectorAll("table.monthly tbody tr")[0]!.querySelectorAll("td"));
  assert.equal(january[2]?.textContent, formatSig(monthly.loss_J / J_PER_KBTU, 3));
  assert.ok(monthly.loss_J > 0, "a 5 °C year against 20 °C indoors loses heat");
  const conditions = doc.querySelector("table.conditions")?.textContent ?? "";
  // 5 °C constant: 41.0 °F; indoor 20 °C: 68 °F.
  assert.match(conditions, /mean 41\.0 °F, lowest 41\.0 °F, highest 41\.0 °F/);
  assert.match(conditions, /68 °F at every step/);
  const plot = Array.from(doc.querySelectorAll("svg.plot[aria-label^='Monthly'] text")).map((t) =>
    t.textContent
  );
  assert.ok(plot.includes("Heat gain (+) and heat loss (−) (kBtu)"), plot.join(" | "));
});
