import assert from "node:assert/strict";
import type { ResultsJson } from "../../src/results/types.ts";
import { reviewElements } from "../../src/review/elementRules.ts";
import { ELEMENT } from "../../src/review/limits.ts";
import { construction, modelOf } from "./_project.ts";

const MODEL = modelOf(construction("EW-1", "Wall", ["{ material: concrete-2200, thickness: 200 mm }"]));

/** Results with only the fields the element rules read. */
function results(U: number, kappa: number, lag: number): ResultsJson {
  const c = { U, dynamic: { arealHeatCapacityInside: kappa, timeLag_h: lag } };
  return { constructions: { "EW-1": c }, scenarios: {}, assumptions: [] } as unknown as ResultsJson;
}

function rules(U: number, kappa: number, lag: number): string[] {
  return reviewElements(MODEL, results(U, kappa, lag)).map((f) => `${f.severity} ${f.rule}`);
}

Deno.test("U > 6 W/(m²K) for an opaque element is a warning (common practice; 1/(0.04 + 0.13) = 5.9, computed)", () => {
  assert.deepStrictEqual(rules(6, 100_000, 8), []);
  assert.deepStrictEqual(rules(6.01, 100_000, 8), ["warning u-value-high"]);
  const f = reviewElements(MODEL, results(6.01, 100_000, 8))[0];
  assert.deepStrictEqual(f?.at, { file: "input.md", line: 2, col: 1 });
  assert.equal(f?.value, "U = 6.01 W/(m²·K)");
});

Deno.test("κ1 > 400 kJ/(m²K) is a warning (computed bound for a semi-infinite stone layer)", () => {
  assert.deepStrictEqual(rules(1, 400_000, 8), []);
  assert.deepStrictEqual(rules(1, 400_001, 8), ["warning kappa-high"]);
  // κ1 of a semi-infinite layer is b·√(T/2π); at the natural-stone envelope corner (λ 3.5, ρ 2900, c 1000:
  // class envelope compiled from B. Berge, Ecology of Building Materials Table 14.15) it is about 374 kJ/(m²K),
  // below the limit.
  const semiInfinite = Math.sqrt(3.5 * 2900 * 1000) * Math.sqrt(86400 / (2 * Math.PI));
  assert.ok(Math.abs(semiInfinite - 373_600) < 500);
  assert.ok(semiInfinite < ELEMENT.maxKappa.value);
});

Deno.test("time lag > 24 h is a note (common practice, no source)", () => {
  assert.deepStrictEqual(rules(1, 100_000, 24), []);
  assert.deepStrictEqual(rules(1, 100_000, 24.1), ["note time-lag-long"]);
});
