import assert from "node:assert/strict";
import type { ResultsJson } from "../../src/results/types.ts";
import { reviewScenarios } from "../../src/review/scenarioRules.ts";
import { construction, modelOf } from "./_project.ts";

const WALL = construction("EW-1", "External wall", ["{ material: concrete-2200, thickness: 200 mm }"]);
const ROOF = construction(
  "RF-1",
  "Flat roof",
  ["{ material: concrete-2200, thickness: 200 mm }"],
  "heat-flow: upward\n",
);

/** A design day at 28 °C max with a 10 K range (outdoor minimum 18 °C) and the given surface lines. */
function scenario(surfaces: readonly string[]): string {
  return "```scenario\nid: dd\nkind: design-day\ntimestep: 1 h\nindoor: 24 degC\n" +
    "outdoor: { max-dry-bulb: 28 degC, daily-range: 10 K }\n" +
    "site: { latitude: 52 deg, longitude: 0 deg, time-zone: 0 h }\ndate: 07-21\n" +
    "sky: { model: clear-sky, beam-optical-depth: 0.4, diffuse-optical-depth: 2.2 }\nsurfaces:\n" +
    surfaces.map((s) => `  - ${s}`).join("\n") + "\n```\n";
}

function rules(surfaces: readonly string[], results?: ResultsJson): string[] {
  return reviewScenarios(modelOf(WALL + ROOF + scenario(surfaces)), results).map((f) => f.rule);
}

function solAir(values: readonly number[]): string {
  return `{ id: s, construction: EW-1, area: 10 m^2, sol-air: [${
    values.map((v) => `${v} degC`).join(", ")
  }] }`;
}

/** 24 values rising linearly from lo to hi. */
function ramp(lo: number, hi: number): number[] {
  return Array.from({ length: 24 }, (_, k) => lo + ((hi - lo) * k) / 23);
}

Deno.test("orientation against the name: vertical roof or horizontal wall is a note (tilt 0 = up, 90 = vertical; ±10° tolerance, common practice)", () => {
  const roof = (tilt: number) =>
    `{ id: roof, construction: RF-1, azimuth: 180 deg, tilt: ${tilt} deg, area: 9 m^2, absorptance: 0.6 }`;
  assert.deepStrictEqual(rules([roof(90)]), ["surface-orientation-name"]);
  assert.deepStrictEqual(rules([roof(80)]), ["surface-orientation-name"]);
  assert.deepStrictEqual(rules([roof(79)]), []);
  assert.deepStrictEqual(
    rules(["{ id: south, construction: EW-1, tilt: 0 deg, area: 9 m^2, absorptance: 0.6 }"]),
    [
      "surface-orientation-name",
    ],
  );
  assert.deepStrictEqual(
    rules([
      "{ id: south, construction: EW-1, azimuth: 180 deg, tilt: 90 deg, area: 9 m^2, absorptance: 0.6 }",
    ]),
    [],
  );
});

Deno.test("absorptance outside 0.2–0.95 is a note (white paint ≈ 0.2, matt black ≈ 0.95, from memory)", () => {
  const wall = (a: number) =>
    `{ id: w, construction: EW-1, azimuth: 180 deg, tilt: 90 deg, area: 9 m^2, absorptance: ${a} }`;
  assert.deepStrictEqual(rules([wall(0.2)]), []);
  assert.deepStrictEqual(rules([wall(0.95)]), []);
  assert.deepStrictEqual(rules([wall(0.19)]), ["absorptance-extreme"]);
  assert.deepStrictEqual(rules([wall(0.96)]), ["absorptance-extreme"]);
});

Deno.test("sol-air given directly: ≥ outdoor min − 10 K, ≤ 90 °C, daily range ≤ 60 K (common practice, no source)", () => {
  // Outdoor minimum 28 − 10 = 18 °C, so the floor is 8 °C.
  assert.deepStrictEqual(rules([solAir(ramp(8, 20))]), []);
  assert.deepStrictEqual(rules([solAir(ramp(7.9, 20))]), ["sol-air-below-outdoor"]);
  assert.deepStrictEqual(rules([solAir(ramp(40, 90))]), []);
  assert.deepStrictEqual(rules([solAir(ramp(40, 90.1))]), ["sol-air-too-high"]);
  assert.deepStrictEqual(rules([solAir(ramp(10, 70))]), []);
  assert.deepStrictEqual(rules([solAir(ramp(10, 70.1))]), ["sol-air-range-large"]);
});

Deno.test("sol-air floor uses the computed outdoor series when results are given", () => {
  const results = { scenarios: { dd: { outdoor: ramp(15, 28) } } } as unknown as ResultsJson;
  // With a computed minimum of 15 °C the floor is 5 °C: 7.9 °C passes.
  assert.deepStrictEqual(rules([solAir(ramp(7.9, 20))], results), []);
  assert.deepStrictEqual(rules([solAir(ramp(4.9, 20))], results), ["sol-air-below-outdoor"]);
});
