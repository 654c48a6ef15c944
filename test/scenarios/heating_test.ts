/**
 * Heating design loss and the ISO 13788 surface checks, against values worked by hand (shown beside each value)
 * and against tabulated saturation pressures from outside the project.
 */
import assert from "node:assert/strict";
import type { Layer } from "../../src/engine/layer.ts";
import { steadyState } from "../../src/engine/steady.ts";
import type { Construction, HeatingScenario } from "../../src/project/model.ts";
import { computeHeating } from "../../src/scenarios/heating.ts";
import {
  dewPoint,
  mouldCriterion,
  saturationTemperature,
  saturationVapourPressure,
} from "../../src/scenarios/iso13788.ts";
import { construction } from "../report/dynamicFixture.ts";

const AT = { file: "winter.md", line: 3, col: 1 };
const close = (a: number, b: number, tol: number, what: string) =>
  assert.ok(Math.abs(a - b) <= tol, `${what}: ${a} vs ${b}`);

/** One massive layer of thermal resistance `r` (thickness r m at λ = 1 W/(m K)). */
function slab(id: string, r: number, films = { outside: 0.04, inside: 0.13 }): Construction {
  const layer: Layer = { kind: "massive", thicknessM: r, conductivity: 1, density: 2000, specificHeat: 1000 };
  return construction(id, [layer], films);
}

function run(scenario: Omit<HeatingScenario, "kind" | "at" | "id">, constructions: Construction[]) {
  const steady = Object.fromEntries(constructions.map((c) => [c.id, steadyState(c)]));
  return computeHeating(
    { ...scenario, kind: "heating", id: "winter", at: AT },
    new Map(constructions.map((c) => [c.id, c])),
    steady,
  );
}

const surface = (id: string, constructionId: string, areaM2: number) => ({
  id,
  construction: constructionId,
  areaM2,
  at: AT,
});

Deno.test("p_sat by the ISO 13788 formula (from memory) at hand-worked points and against tabulated values", () => {
  // 0 °C: 610.5 exactly (both branches give 610.5·e⁰).
  assert.equal(saturationVapourPressure(0), 610.5);
  // 20 °C by hand: 610.5·exp(17.269·20/257.3) = 610.5·exp(1.342324) = 2336.9 Pa.
  close(saturationVapourPressure(20), 2336.9, 0.1, "20 °C");
  // −10 °C over ice by hand: 610.5·exp(−218.75/255.5) = 610.5·exp(−0.856164) = 259.34 Pa.
  close(saturationVapourPressure(-10), 259.34, 0.01, "−10 °C");
  // Tabulated (from memory, IAPWS-based steam tables / Murphy & Koop 2005 over ice): 2339.2 Pa at 20 °C, 259.9 Pa
  // at −10 °C: the Magnus form is within 0.3 %.
  close(saturationVapourPressure(20) / 2339.2, 1, 0.003, "20 °C vs table");
  close(saturationVapourPressure(-10) / 259.9, 1, 0.003, "−10 °C vs table");
});

Deno.test("saturationTemperature() inverts p_sat on both branches (−40 to 50 °C)", () => {
  for (let t = -40; t <= 50; t += 0.5) {
    close(saturationTemperature(saturationVapourPressure(t)), t, 1e-9, `${t}`);
  }
});

Deno.test("dew point of 20 °C, 50 %: 9.27 °C by hand (common psychrometric value 9.3 °C)", () => {
  // p = 0.5·2336.9 = 1168.4 Pa; x = ln(1168.4/610.5) = 0.64917; θ = 237.3·x/(17.269 − x) = 9.269 °C.
  close(dewPoint(20, 0.5), 9.269, 0.002, "dew point");
  // Below zero (ice branch): 0 °C at 50 %: p = 305.25 Pa; x = ln 0.5 = −0.693147; θ = 265.5·x/(21.875 − x) = −8.154 °C.
  close(dewPoint(0, 0.5), -8.154, 0.002, "frost point");
});

Deno.test("mould criterion by hand: θi 20 °C, θe 0 °C, φ 50 % → θ_si,min 12.62 °C, f_Rsi,min 0.631", () => {
  // p_sat,min = 1168.4/0.8 = 1460.5 Pa; x = ln(1460.5/610.5) = 0.87226; θ = 237.3·x/(17.269 − x) = 12.624 °C.
  const m = mouldCriterion(20, 0, 0.5);
  close(m.minimumSaturationPressure, 1460.5, 0.1, "p_sat,min");
  close(m.minimumSurfaceTemperature, 12.624, 0.002, "θ_si,min");
  close(m.minimumTemperatureFactor, 12.624 / 20, 0.0001, "f_Rsi,min");
});

Deno.test("heat loss = U·A·(θi − θe) per surface, summed (U = 1/(0.04 + R + 0.13) by hand)", () => {
  const a = slab("A", 0.35);
  const b = slab("B", 2.83);
  const r = run({
    indoorC: 21,
    outdoorC: -4,
    indoorRelativeHumidity: 0.5,
    surfaces: [surface("a1", "A", 10), surface("b1", "B", 30), surface("a2", "A", 5)],
  }, [a, b]).results;
  // U_A = 1/0.52 = 1.923077; U_B = 1/3.00 = 0.333333; ΔT = 25 K.
  close(r.surfaces.a1!.heatLoss, (1 / 0.52) * 10 * 25, 1e-9, "a1");
  close(r.surfaces.b1!.heatLoss, (1 / 3.0) * 30 * 25, 1e-9, "b1");
  close(r.surfaces.a2!.heatLoss, (1 / 0.52) * 5 * 25, 1e-9, "a2");
  close(r.totalHeatLoss, (15 / 0.52 + 30 / 3.0) * 25, 1e-9, "total");
  close(r.totalUA, 15 / 0.52 + 30 / 3.0, 1e-12, "Σ UA");
});

Deno.test("f_Rsi = 1 − U·R_si when the checks use the construction's own R_si; θ_si = θi − R_si·U·ΔT", () => {
  const a = slab("A", 0.35); // U = 1/0.52
  const r = run({
    indoorC: 20,
    outdoorC: 0,
    indoorRelativeHumidity: 0.5,
    moistureSurfaceResistance: 0.13,
    surfaces: [surface("a", "A", 1)],
  }, [a]).results;
  // f = 1 − 0.13/0.52 = 0.75; θ_si = 20 − 0.13·(1/0.52)·20 = 15.0 °C.
  close(r.surfaces.a!.fRsi, 0.75, 1e-12, "f_Rsi");
  close(r.surfaces.a!.insideSurfaceTemperature, 15, 1e-12, "θ_si");
});

Deno.test("default R_si = 0.25 for the checks: R_T = 0.52 − 0.13 + 0.25 = 0.64, f_Rsi = 1 − 0.25/0.64", () => {
  const outcome = run({
    indoorC: 20,
    outdoorC: 0,
    indoorRelativeHumidity: 0.5,
    surfaces: [surface("a", "A", 1)],
  }, [slab("A", 0.35)]);
  close(outcome.results.surfaces.a!.fRsi, 1 - 0.25 / 0.64, 1e-12, "f_Rsi");
  assert.ok(outcome.assumptions.some((x) => x.id === "default:moisture-surface-resistance:winter"));
  assert.ok(outcome.assumptions.some((x) => x.id === "iso13788:mould-criterion:winter"));
  assert.ok(outcome.assumptions.some((x) => x.id === "iso13788:saturation-pressure:winter"));
});

Deno.test("verdicts by hand at θi 20, θe 0, φ 80 %: dew point 16.44 °C, f_Rsi,min = 1 (every surface fails mould)", () => {
  // p = 0.8·2336.9 = 1869.5 Pa → θ_dew = 237.3·1.11917/16.1498 = 16.445 °C; p/0.8 = p_sat(20) → θ_si,min = 20.
  const r = run({
    indoorC: 20,
    outdoorC: 0,
    indoorRelativeHumidity: 0.8,
    moistureSurfaceResistance: 0.13,
    surfaces: [surface("poor", "A", 1), surface("good", "B", 1)],
  }, [slab("A", 0.35), slab("B", 1.13)]).results;
  close(r.indoorDewPoint, 16.445, 0.002, "dew point");
  close(r.mouldCriterion.fRsiMin, 1, 1e-9, "f_Rsi,min");
  // poor: f = 0.75 → θ_si = 15.0 °C < 16.44: condensation. good: R_T = 1.30, f = 0.9 → 18.0 °C: no condensation.
  assert.equal(r.surfaces.poor!.surfaceCondensation.pass, false);
  close(r.surfaces.poor!.surfaceCondensation.margin, 15 - 16.445, 0.002, "poor margin");
  assert.equal(r.surfaces.good!.surfaceCondensation.pass, true);
  close(r.surfaces.good!.insideSurfaceTemperature, 18, 1e-9, "good θ_si");
  assert.equal(r.surfaces.poor!.mould.pass, false);
  assert.equal(r.surfaces.good!.mould.pass, false);
});

Deno.test("mould verdict passes above f_Rsi,min and fails below it (θi 20, θe 0, φ 50 %: f_Rsi,min 0.631)", () => {
  // f = 1 − 0.13·U: slab 0.20 → R_T 0.37, f = 0.6486 (pass); slab 0.15 → R_T 0.32, f = 0.59375 (fail).
  const r = run({
    indoorC: 20,
    outdoorC: 0,
    indoorRelativeHumidity: 0.5,
    moistureSurfaceResistance: 0.13,
    surfaces: [surface("above", "A", 1), surface("below", "B", 1)],
  }, [slab("A", 0.2), slab("B", 0.15)]).results;
  close(r.surfaces.above!.fRsi, 1 - 0.13 / 0.37, 1e-12, "above");
  assert.equal(r.surfaces.above!.mould.pass, true);
  close(r.surfaces.below!.fRsi, 0.59375, 1e-12, "below");
  assert.equal(r.surfaces.below!.mould.pass, false);
});
