/**
 * The ISO 6946:2017 combined method (thermally inhomogeneous layers) checked against a derivation written out by
 * hand below, with exact fractions so that every step can be re-done on paper.
 *
 * Invented element (all values chosen for exact arithmetic, no published source):
 *   R_se = 0.04, R_si = 0.13 m²K/W (ISO 6946:2017 Table 7, horizontal heat flow)
 *   sheathing 10 mm, λ 0.125        → R = 0.010/0.125 = 0.08 m²K/W
 *   stud zone 100 mm: insulation λ 0.04 (f = 0.8), studs λ 0.125 (f = 0.2)
 *   lining 12.5 mm, λ 0.25          → R = 0.0125/0.25 = 0.05 m²K/W
 * Resistances in series with the stud zone: 0.04 + 0.08 + 0.05 + 0.13 = 0.30 m²K/W.
 *
 * Upper limit R'_T (parallel paths through the whole element, air to air):
 *   path a (insulation): R_Ta = 0.30 + 0.100/0.04  = 2.80 m²K/W, f_a = 0.8
 *   path b (studs):      R_Tb = 0.30 + 0.100/0.125 = 1.10 m²K/W, f_b = 0.2
 *   1/R'_T = 0.8/2.80 + 0.2/1.10 = (0.8·1.10 + 0.2·2.80)/(2.80·1.10) = 1.44/3.08
 *   R'_T = 3.08/1.44 = 77/36 = 2.13888… m²K/W
 * Lower limit R''_T (layers in series, stud zone with λ'' = Σ f λ):
 *   λ'' = 0.8·0.04 + 0.2·0.125 = 0.032 + 0.025 = 0.057 W/(m K)
 *   R''_T = 0.30 + 0.100/0.057 = 0.30 + 100/57 = 117.1/57 = 2.05438… m²K/W
 * R_T = (R'_T + R''_T)/2 = (77/36 + 117.1/57)/2 = 2.09663… m²K/W
 * e = (R'_T − R''_T)/(2 R_T) = 0.08450…/4.19327… = 0.02015… (2.0 %)
 * R'_T/R''_T = 1.0411… ≤ 1.5, so the method applies.
 * Equivalent layer: λ_eq = 0.100/(R_T − 0.30) = 0.100/1.79663… = 0.05566… W/(m K);
 *   ρc = 0.8·30·1000 + 0.2·500·1600 = 24 000 + 160 000 = 184 000 J/(m³K); κ = 0.1·184 000 = 18 400 J/(m²K).
 */
import assert from "node:assert/strict";
import {
  airGapCorrection,
  combinedMethod,
  type CombinedMethodInput,
  equivalentLayer,
  temperatureFactor,
} from "../../src/engine/bridgedLayer.ts";
import { steadyState } from "../../src/engine/steady.ts";

const close = (actual: number, expected: number, tol = 1e-12) =>
  assert.ok(Math.abs(actual - expected) <= tol * Math.abs(expected), `${actual} ≠ ${expected}`);

const STUD_WALL: CombinedMethodInput = {
  thicknessM: 0.1,
  otherResistance: 0.04 + 0.08 + 0.05 + 0.13,
  sections: [
    { fraction: 0.8, conductivity: 0.04, density: 30, specificHeat: 1000 },
    { fraction: 0.2, conductivity: 0.125, density: 500, specificHeat: 1600 },
  ],
};

const UPPER = 77 / 36; // hand derivation above
const LOWER = 117.1 / 57; // hand derivation above
const MEAN = (UPPER + LOWER) / 2;

Deno.test("combinedMethod() gives R'_T, R''_T, R_T and e of the hand derivation", () => {
  const r = combinedMethod(STUD_WALL);
  close(r.paths[0]!.R, 2.8);
  close(r.paths[1]!.R, 1.1);
  close(r.upperR, UPPER);
  close(r.lowerConductivity, 0.057);
  close(r.lowerR, LOWER);
  close(r.R, MEAN);
  close(r.relativeError, (UPPER - LOWER) / (2 * MEAN));
  close(r.relativeError, 0.020152, 1e-4); // 2.0 %, rounded by hand
  close(r.ratio, UPPER / LOWER);
  assert.equal(r.applicable, true);
  // Not the parallel-resistance mean of the two paths (a common slip): R''_T differs from R'_T.
  assert.ok(r.upperR - r.lowerR > 0.08);
});

Deno.test("equivalentLayer() reproduces R_T exactly in the series sum and weights ρc by area", () => {
  const r = combinedMethod(STUD_WALL);
  const eq = equivalentLayer(STUD_WALL, r);
  close(eq.conductivity, 0.1 / (MEAN - 0.3));
  close(eq.density * eq.specificHeat, 184_000); // 0.8·30·1000 + 0.2·500·1600
  close(eq.arealHeatCapacity, 18_400);
  close(eq.density, 0.8 * 30 + 0.2 * 500);
  const steady = steadyState({
    outsideResistance: 0.04,
    insideResistance: 0.13,
    layers: [
      { kind: "massive", thicknessM: 0.01, conductivity: 0.125, density: 600, specificHeat: 1600 },
      {
        kind: "massive",
        thicknessM: 0.1,
        conductivity: eq.conductivity,
        density: eq.density,
        specificHeat: eq.specificHeat,
      },
      { kind: "massive", thicknessM: 0.0125, conductivity: 0.25, density: 800, specificHeat: 1000 },
    ],
  });
  close(steady.totalResistance, MEAN, 1e-14);
});

Deno.test("combinedMethod() flags a steel stud as outside its applicability (R'_T/R''_T > 1.5)", () => {
  // Steel λ = 50 W/(m K), f = 0.1: path b = 0.30 + 0.1/50 = 0.302; 1/R'_T = 0.9/2.8 + 0.1/0.302 → R'_T ≈ 1.533;
  // λ'' = 0.9·0.04 + 0.1·50 = 5.036 → R''_T = 0.30 + 0.1/5.036 ≈ 0.3199; ratio ≈ 4.79 (by hand).
  const r = combinedMethod({
    ...STUD_WALL,
    sections: [
      { fraction: 0.9, conductivity: 0.04, density: 30, specificHeat: 1000 },
      { fraction: 0.1, conductivity: 50, density: 7800, specificHeat: 450 },
    ],
  });
  close(r.upperR, 1 / (0.9 / 2.8 + 0.1 / 0.302));
  close(r.lowerR, 0.3 + 0.1 / 5.036);
  close(r.ratio, 4.79, 2e-3);
  assert.equal(r.applicable, false);
});

Deno.test("combinedMethod() with a bridge of the infill's own conductivity is the homogeneous sum", () => {
  const r = combinedMethod({
    ...STUD_WALL,
    sections: [
      { fraction: 0.85, conductivity: 0.04, density: 30, specificHeat: 1000 },
      { fraction: 0.15, conductivity: 0.04, density: 30, specificHeat: 1000 },
    ],
  });
  close(r.upperR, 2.8);
  close(r.lowerR, 2.8);
  assert.ok(Math.abs(r.relativeError) < 1e-14);
});

Deno.test("airGapCorrection() and temperatureFactor() follow their formulas", () => {
  // ΔU_g = ΔU''·(R_1/R_T)²: 0.01·(2/4)² = 0.0025 (ISO 6946:2017 Annex F, from memory)
  close(airGapCorrection(0.01, 2, 4), 0.0025);
  // f_Rsi = 1 − U·R_si (ISO 13788, plane element): 1 − 0.25·0.13 = 0.9675
  close(temperatureFactor(0.25, 0.13), 0.9675);
});
