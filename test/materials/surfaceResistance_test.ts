import assert from "node:assert/strict";
import { defaultSurfaceResistances, type SurfaceHeatFlow } from "../../src/materials/surfaceResistance.ts";
import type { HeatFlowDirection } from "../../src/project/model.ts";

// Compile-time check: the materials module's direction type and the model's stay the same set of values.
type Same<A, B> = [A] extends [B] ? ([B] extends [A] ? true : false) : false;
const directionsAgree: Same<SurfaceHeatFlow, HeatFlowDirection> = true;

Deno.test("defaultSurfaceResistances() equals ISO 6946:2017 Table 7", () => {
  assert.equal(directionsAgree, true);
  // ISO 6946:2017, Table 7 (Table 1 in the 2007 edition), read in several secondary copies:
  // R_si 0.10 upwards, 0.13 horizontal, 0.17 downwards; R_se 0.04 in every direction.
  const expected: ReadonlyArray<readonly [SurfaceHeatFlow, number, number]> = [
    ["upward", 0.1, 0.04],
    ["horizontal", 0.13, 0.04],
    ["downward", 0.17, 0.04],
  ];
  for (const [direction, inside, outside] of expected) {
    const r = defaultSurfaceResistances(direction);
    assert.equal(r.insideM2KPerW, inside, direction);
    assert.equal(r.outsideM2KPerW, outside, direction);
  }
});

Deno.test("defaultSurfaceResistances() names the standard, edition and table", () => {
  for (const direction of ["upward", "horizontal", "downward"] as const) {
    const { source } = defaultSurfaceResistances(direction);
    assert.match(source, /ISO 6946:2017, Table 7/);
    assert.match(source, /ISO 6946:2007/);
  }
});

Deno.test("defaultSurfaceResistances() agrees with R_s = 1/(h_c + h_r) to the table's rounding", () => {
  // from memory (believed ISO 6946:2017 Annex C basis): h_r = ε h_r0 with ε 0.9, h_r0 5.7 W/(m^2 K) at 20 °C
  // → h_r ≈ 5.13; h_ci 5.0 / 2.5 / 0.7 W/(m^2 K) for up / horizontal / down; outside h_ce = 4 + 4 v with
  // v = 4 m/s → 20, h_r0 4.6 at 0 °C → h_r ≈ 4.14.
  // 1/(5.0 + 5.13) = 0.0987, 1/(2.5 + 5.13) = 0.1311, 1/(0.7 + 5.13) = 0.1715, 1/(20 + 4.14) = 0.0414.
  const hr = 0.9 * 5.7;
  const cases: ReadonlyArray<readonly [SurfaceHeatFlow, number]> = [["upward", 5.0], ["horizontal", 2.5], [
    "downward",
    0.7,
  ]];
  for (const [direction, hc] of cases) {
    const r = defaultSurfaceResistances(direction);
    assert.ok(Math.abs(r.insideM2KPerW - 1 / (hc + hr)) < 0.005, direction); // table gives two decimals
    assert.ok(Math.abs(r.outsideM2KPerW - 1 / (20 + 0.9 * 4.6)) < 0.005, direction);
  }
});
