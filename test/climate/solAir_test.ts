import assert from "node:assert/strict";
import {
  longwaveCorrectionK,
  solAirSeries,
  solAirTemperatureC,
  solAirTerms,
} from "../../src/climate/solAir.ts";
import { assertNear } from "./_assert.ts";

// h_o = 17 W/(m²K) (ASHRAE Fundamentals Ch. 18 sol-air convention, common practice, from memory).
const H_O = 17;
// α/h_o = 0.052 m²K/W for a dark surface and 0.026 for a light one (Fundamentals Ch. 18, common practice, from memory).
const dark = { absorptance: 0.052 * H_O, outsideCoefficientWPerM2K: H_O };
const light = { absorptance: 0.026 * H_O, outsideCoefficientWPerM2K: H_O };

Deno.test("solAirTemperatureC() dark horizontal roof: T_o + 0.052·E_t − 3.9 K", () => {
  // Sol-air equation (Fundamentals Ch. 18) by hand: 30 °C + 0.052 × 900 W/m² − 3.9 K = 30 + 46.8 − 3.9 = 72.9 °C.
  const roof = { ...dark, tiltDeg: 0, longwave: { kind: "by-tilt" } as const };
  assertNear(solAirTemperatureC(30, 900, roof), 72.9, 1e-9, "dark roof");
  // At night (E_t = 0) the roof sits 3.9 K below the air: 18 − 3.9 = 14.1 °C.
  assertNear(solAirTemperatureC(18, 0, roof), 14.1, 1e-9, "dark roof at night");
});

Deno.test("solAirTemperatureC() light vertical wall: T_o + 0.026·E_t, no long-wave correction", () => {
  // By hand: 30 °C + 0.026 × 500 W/m² − 0 = 43.0 °C.
  const wall = { ...light, tiltDeg: 90, longwave: { kind: "by-tilt" } as const };
  assertNear(solAirTemperatureC(30, 500, wall), 43, 1e-9, "light wall");
});

Deno.test("longwaveCorrectionK() 3.9 K horizontal, 0 vertical (handbook), 3.9 cos Σ between (a method choice of this package)", () => {
  // Fundamentals Ch. 18 (common practice): 3.9 K horizontal, 0 vertical. Our rule: 3.9 × cos 30° = 3.3775 K.
  assertNear(longwaveCorrectionK(0, { kind: "by-tilt" }), 3.9, 1e-12, "horizontal");
  assertNear(longwaveCorrectionK(90, { kind: "by-tilt" }), 0, 1e-12, "vertical");
  assertNear(longwaveCorrectionK(30, { kind: "by-tilt" }), 3.3775, 1e-4, "30° roof");
  assertNear(longwaveCorrectionK(135, { kind: "by-tilt" }), 0, 0, "overhang soffit");
  assertNear(longwaveCorrectionK(0, { kind: "given", correctionK: 2.5 }), 2.5, 0, "given");
});

Deno.test("solAirTerms() breakdown adds up and solAirSeries() keeps step order", () => {
  const roof = { ...dark, tiltDeg: 0, longwave: { kind: "by-tilt" } as const };
  const terms = solAirTerms(25, 600, roof);
  // By hand: solar term 0.052 × 600 = 31.2 K; long-wave 3.9 K; 25 + 31.2 − 3.9 = 52.3 °C.
  assertNear(terms.solarTermK, 31.2, 1e-9, "solar term");
  assertNear(terms.longwaveTermK, 3.9, 1e-12, "long-wave term");
  assertNear(terms.solAirC, 52.3, 1e-9, "sol-air");
  const series = solAirSeries([20, 25], [0, 600], roof);
  assertNear(series[1]?.solAirC ?? Number.NaN, 52.3, 1e-9, "second step");
  assert.throws(() => solAirSeries([20], [0, 1], roof), RangeError);
  assert.throws(() => solAirTerms(20, 0, { ...roof, outsideCoefficientWPerM2K: 0 }), RangeError);
});
