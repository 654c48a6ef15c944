import assert from "node:assert/strict";
import { formatSig } from "../../src/report/page/format.ts";
import { renderPackage } from "../../src/report/package.ts";
import { parseDocument } from "./dom.ts";
import { engineEntry } from "./dynamicFixture.ts";
import { fixture, PASSING_CHECK, wall } from "./fixture.ts";

function text(doc: Document, selector: string): string {
  return doc.querySelector(selector)?.textContent ?? "";
}

/** Limit cell of the calculation methods section's check table for a check id. */
function limitCell(doc: Document, id: string): string | undefined {
  const rows = Array.from(doc.querySelectorAll("#s-c table.method-checks tbody tr"));
  const row = rows.find((r) => r.querySelector("td")?.textContent === id);
  return row?.querySelectorAll("td")[2]?.textContent ?? undefined;
}

Deno.test("renderPackage() places the calculation methods in the last appendix, listed in the contents", () => {
  const out = renderPackage(fixture());
  const doc = parseDocument(out);
  assert.match(text(doc, "#s-3 h2"), /^Appendix G Calculation methods$/);
  assert.ok(out.indexOf('id="s-2"') < out.indexOf('<section id="s-3"'));
  // Results and verdicts first: the methods come after every other appendix.
  assert.ok(out.indexOf('<section id="s-3"') > out.indexOf('<section id="s-d"'));
  const link = doc.querySelector('nav.contents a[href="#s-3"]');
  assert.equal(link?.textContent, "Appendix G Calculation methods");
  assert.match(text(doc, "#s-4 h2"), /^Checks and findings$/);
});

Deno.test("renderPackage() states the method's equations and conventions", () => {
  const method = text(parseDocument(renderPackage(fixture())), "#s-3");
  for (
    const expected of [
      "X = D/B",
      "Y = 1/B",
      "Z = A/B",
      "A = D = cosh(γd)",
      "M = F_se · M_1 · M_2 ⋯ M_n · F_si",
      "q_i(t) = Σ_j Y_j T_o(t − jΔ) − Σ_j Z_j T_i(t − jΔ)",
      "Y_P,j = Σ_(k≥0) Y_(j+24k)",
      "Y_12 = −1/Z_12",
      "negative is a lag",
      "Seem 1987",
      "Ouyang & Haghighat 1991",
      "Kusuda 1969",
      "Hittle 1981",
    ]
  ) {
    assert.ok(method.includes(expected), `calculation methods section holds "${expected}"`);
  }
});

Deno.test("renderPackage() prints sinc²(π/24) of the harmonic cross-check correctly", () => {
  // Closed form by its Taylor series, independent of Math.sin: sinc² x = 1 − x²/3 + 2x⁴/45 − x⁶/315 + …,
  // x = π/24 (next term ≈ 1e-11): 0.994301456, printed to three significant figures.
  const x = Math.PI / 24;
  const series = 1 - x ** 2 / 3 + (2 * x ** 4) / 45 - x ** 6 / 315;
  const doc = parseDocument(renderPackage(fixture()));
  assert.ok(text(doc, "#s-3").includes(`sinc²(π/24) = ${formatSig(series, 3)}`));
});

Deno.test("renderPackage() takes the limits of the calculation methods section's checks from results.json", () => {
  const few = parseDocument(renderPackage(fixture({ checks: [PASSING_CHECK] })));
  assert.equal(limitCell(few, "sum-rule-Y"), formatSig(PASSING_CHECK.limit, 3));
  assert.equal(limitCell(few, "periodic-fold"), "not run");
  const { checks } = engineEntry(wall());
  const doc = parseDocument(renderPackage(fixture({ checks })));
  for (const c of checks) assert.equal(limitCell(doc, c.id), formatSig(c.limit, 3), c.id);
  const rows = Array.from(doc.querySelectorAll("#s-c table.method-checks tbody tr"));
  const surface = rows.find((r) => r.querySelector("td")?.textContent === "sum-rule-Y-surface");
  assert.match(surface?.textContent ?? "", /Surface to surface/);
});

Deno.test("renderPackage() lists the method's references among the sources", () => {
  const sources = text(parseDocument(renderPackage(fixture())), "#s-7");
  for (
    const expected of [
      "ISO 13786:2017",
      "Pipes, L.A. (1957)",
      "Stephenson, D.G., Mitalas, G.P. (1967)",
      "Stephenson, D.G., Mitalas, G.P. (1971)",
      "Kusuda, T. (1969)",
      "Hittle, D.C. (1981)",
      "Seem, J.E. (1987)",
      "Ouyang, K., Haghighat, F. (1991)",
      "Spitler, J.D., Fisher, D.E. (1999)",
      "ASHRAE Handbook—Fundamentals",
    ]
  ) {
    assert.ok(sources.includes(expected), `sources list "${expected}"`);
  }
});
