import assert from "node:assert/strict";
import { analyseConstruction, type DynamicAnalysis } from "../../src/engine/mod.ts";
import {
  ctfRepeatedDayFlux,
  repeatedDayFlux,
  steadyPeriodicFlux,
  SurfaceRecursion,
} from "../../src/engine/surfaceFlux.ts";
import { HEAVY_WALL, LIGHT_WALL } from "./walls.ts";
import type { ConstructionInput } from "../../src/engine/layer.ts";

function analyse(input: ConstructionInput, timestepS: number): DynamicAnalysis {
  const a = analyseConstruction(input, timestepS, { stateSpace: false });
  if (a.kind !== "analysis") throw new Error(a.message);
  return a;
}

/** An invented sol-air day: 26 °C mean, a sinusoid plus a sharp afternoon bump, at n steps. */
function solAirDay(n: number): number[] {
  return Array.from({ length: n }, (_, k) => {
    const h = (24 * k) / n;
    return 26 + 8 * Math.cos((2 * Math.PI * (h - 15)) / 24) +
      (h > 12 && h < 17 ? 12 * Math.sin((Math.PI * (h - 12)) / 5) : 0);
  });
}

for (const [name, wall] of [["heavy", HEAVY_WALL], ["light", LIGHT_WALL]] as const) {
  for (const timestepS of [3600, 900]) {
    Deno.test(`steadyPeriodicFlux() equals the day repeated to convergence (${name} wall, Δ = ${timestepS} s)`, () => {
      const a = analyse(wall, timestepS);
      const n = 86400 / timestepS;
      const solAir = solAirDay(n);
      const indoor = new Array<number>(n).fill(24);
      const periodic = steadyPeriodicFlux(a.airToAir.modes, solAir, indoor);
      const repeated = repeatedDayFlux(a.airToAir.modes, solAir, indoor, 1e-10);
      const scale = Math.max(...periodic.insideWPerM2.map(Math.abs));
      for (let k = 0; k < n; k++) {
        assert.ok(
          Math.abs(periodic.insideWPerM2[k]! - repeated.insideWPerM2[k]!) < 1e-6 * scale,
          `inside step ${k}`,
        );
        assert.ok(
          Math.abs(periodic.outsideWPerM2[k]! - repeated.outsideWPerM2[k]!) < 1e-6 * scale + 1e-9,
          `outside step ${k}`,
        );
      }
      // Daily energy balance (identity: Σ Y_P = U, Σ Z_P = U): mean inside flux = U (mean T_sa − mean T_i).
      const mean = (xs: readonly number[]) => xs.reduce((s, v) => s + v, 0) / xs.length;
      const expected = a.steady.uValue * (mean(solAir) - 24);
      assert.ok(Math.abs(mean(periodic.insideWPerM2) - expected) < 1e-9 * Math.abs(expected));
      assert.ok(Math.abs(mean(periodic.outsideWPerM2) - expected) < 1e-9 * Math.abs(expected));
    });
  }
}

Deno.test("steadyPeriodicFlux() matches the ISO 13786 harmonic solution for a sinusoidal sol-air temperature", () => {
  // Closed form (EN ISO 13786:2017, periodic thermal transmittance Y12 = |Y12| e^(iφ)): for
  // T_sa(t) = A cos(ωt) and constant T_i = 0, the inside flux is q(t) = A |Y12| cos(ω(t − lag)).
  // Sampling at Δ = 10 min with linear interpolation multiplies the first harmonic by sinc²(π/144)
  // = 0.99984 and adds aliased harmonics of order 1e-4, so 1e-3 of the amplitude is the tolerance.
  const a = analyse(HEAVY_WALL, 600);
  const n = 144;
  const amplitudeK = 10;
  const solAir = Array.from({ length: n }, (_, k) => amplitudeK * Math.cos((2 * Math.PI * k) / n));
  const flux = steadyPeriodicFlux(a.airToAir.modes, solAir, new Array<number>(n).fill(0));
  const y12 = a.iso13786.periodicTransmittance.amplitude;
  const lagH = a.iso13786.timeLag_h;
  for (let k = 0; k < n; k++) {
    const tH = k / 6;
    const expected = amplitudeK * y12 * Math.cos((2 * Math.PI * (tH - lagH)) / 24);
    assert.ok(Math.abs(flux.insideWPerM2[k]! - expected) < 1e-3 * amplitudeK * y12, `step ${k}`);
  }
});

Deno.test("SurfaceRecursion() started steady stays at the steady flux U (T_o − T_i)", () => {
  // Identity: with constant temperatures the conduction is steady, q = U ΔT (ISO 6946 U of the wall).
  const a = analyse(HEAVY_WALL, 3600);
  const run = new SurfaceRecursion(a.airToAir.modes, 35, 24);
  for (let k = 0; k < 100; k++) {
    const [inside, outside] = run.step(35, 24);
    assert.ok(Math.abs(inside - a.steady.uValue * 11) < 1e-9);
    assert.ok(Math.abs(outside - a.steady.uValue * 11) < 1e-9);
  }
});

Deno.test("ctfRepeatedDayFlux() with the root CTF converges to the periodic-response-factor day", () => {
  // Both routes are exact for piecewise-linear temperatures (Stephenson & Mitalas 1971: the CTF is the
  // z-transform of the response factors), so they must agree once the recursion has settled.
  for (const wall of [HEAVY_WALL, LIGHT_WALL]) {
    const a = analyse(wall, 3600);
    assert.ok(a.airToAir.ctfAccepted);
    const solAir = solAirDay(24);
    const indoor = new Array<number>(24).fill(24);
    const periodic = steadyPeriodicFlux(a.airToAir.modes, solAir, indoor);
    const ctf = ctfRepeatedDayFlux(a.airToAir.ctfCandidate.ctf, a.steady.uValue, solAir, indoor, 1e-10);
    const scale = Math.max(...periodic.insideWPerM2.map(Math.abs));
    for (let k = 0; k < 24; k++) {
      assert.ok(Math.abs(periodic.insideWPerM2[k]! - ctf.insideWPerM2[k]!) < 1e-6 * scale, `inside ${k}`);
      assert.ok(Math.abs(periodic.outsideWPerM2[k]! - ctf.outsideWPerM2[k]!) < 1e-6 * scale, `outside ${k}`);
    }
  }
});
