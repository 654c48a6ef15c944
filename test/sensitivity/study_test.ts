import assert from "node:assert/strict";
import { join } from "node:path";
import { loadProject } from "../../src/commands/loadProject.ts";
import { computeProject } from "../../src/results/buildResults.ts";
import { designDayBlock } from "../scenarios/_scenarioBlocks.ts";

const PROJECT = `---
title: Sensitivity fixture
reference: T-2
revision: A
status: draft
prepared-by: Test Preparer
checked-by: Test Checker
date: 2031-01-15
units: SI
sensitivity: { variation: 0.2 }
---
`;
const WALL =
  "```construction\nid: W\nlayers:\n  - { name: block, thickness: 200 mm, conductivity: 0.5 W/(m K), " +
  "density: 1400 kg/m^3, specific-heat: 1000 J/(kg K), source: test }\n```\n";

Deno.test("sensitivityStudy() gives the closed-form change of U and equal effects of density and specific heat", async () => {
  const folder = await Deno.makeTempDir();
  Deno.writeTextFileSync(join(folder, "project.md"), PROJECT);
  Deno.writeTextFileSync(join(folder, "wall.md"), WALL);
  const loaded = await loadProject(folder);
  assert.ok(loaded.model !== undefined);
  const outcome = computeProject(loaded.model, loaded.inputRecords);
  assert.ok(outcome.ok);
  const study = outcome.computed.results.sensitivity;
  assert.ok(study !== undefined);
  assert.equal(study.variation, 0.2);
  // ISO 6946 (homogeneous layers, Table 7 films for horizontal flow): U(λ) = 1 / (0.04 + d/λ + 0.13).
  const u = (lambda: number) => 1 / (0.04 + 0.2 / lambda + 0.13);
  const byProperty = new Map(study.constructions.W?.U.map((e) => [e.property, e]));
  const conductivity = byProperty.get("conductivity");
  assert.ok(conductivity !== undefined);
  assert.ok(Math.abs(conductivity.minus - (u(0.4) - u(0.5))) < 1e-12);
  assert.ok(Math.abs(conductivity.plus - (u(0.6) - u(0.5))) < 1e-12);
  // U does not depend on density or specific heat (steady state): both effects are zero, below the threshold,
  // left out of the list and counted.
  assert.equal(byProperty.has("density"), false);
  assert.equal(byProperty.has("specificHeat"), false);
  assert.equal(study.constructions.W?.dropped.U, 2);
  // The transient response depends on ρ and c only through ρc (Fourier equation), so their effects on the lag agree.
  const lag = new Map(study.constructions.W?.timeLag_h.map((e) => [e.property, e]));
  assert.ok(Math.abs((lag.get("density")?.plus ?? NaN) - (lag.get("specificHeat")?.plus ?? NaN)) < 1e-9);
  assert.ok((lag.get("density")?.plus ?? 0) > 0, "more mass, longer lag");
  await Deno.remove(folder, { recursive: true });
});

Deno.test("the sensitivity study varies absorptance, h_o, the design temperatures and indoor, and counts effects below 0.5 %", async () => {
  const folder = await Deno.makeTempDir();
  Deno.writeTextFileSync(join(folder, "project.md"), PROJECT);
  Deno.writeTextFileSync(join(folder, "wall.md"), WALL);
  Deno.writeTextFileSync(
    join(folder, "day.md"),
    designDayBlock("day", [
      "{ id: s1, construction: W, azimuth: 180 deg, tilt: 90 deg, area: 10 m^2, absorptance: 0.6 }",
    ]),
  );
  const loaded = await loadProject(folder);
  assert.ok(loaded.model !== undefined, loaded.diagnostics.map((d) => d.message).join("\n"));
  const outcome = computeProject(loaded.model, loaded.inputRecords);
  assert.ok(outcome.ok);
  const study = outcome.computed.results.sensitivity!;
  assert.equal(study.threshold, 0.005);
  const day = study.scenarios["day"]!;
  const byCondition = new Map(day.conditions.map((e) => [e.condition, e]));
  assert.deepStrictEqual([...byCondition.keys()].sort(), [
    "dailyRange",
    "indoor",
    "maxDryBulb",
    "outsideCoefficient",
  ]);
  // With no sky model there is no irradiance, so absorptance has no effect: it is dropped and counted.
  assert.equal(day.dropped.conditions, 1);
  // The day is linear in its temperatures (superposition): shifting the whole outdoor profile by ±2 K or the indoor
  // by ±1 K moves every step, hence the peak, by U_day·A·ΔT, with U_day the response's U at R_se = 1/17 (the daily
  // mean flux over the mean temperature difference, energy balance, METHODS A16).
  const s1 = outcome.computed.results.scenarios["day"]!.surfaces["s1"]!;
  const indoor = outcome.computed.results.scenarios["day"]!.indoor;
  const mean = (xs: readonly number[]) => xs.reduce((a, b) => a + b, 0) / xs.length;
  const uDay = mean(s1.insideFlux) / (mean(s1.solAir) - mean(indoor));
  const close = (a: number, b: number) => Math.abs(a - b) <= 1e-6 * Math.abs(b);
  assert.ok(close(byCondition.get("maxDryBulb")!.plus, uDay * 10 * 2));
  assert.ok(close(byCondition.get("maxDryBulb")!.minus, -uDay * 10 * 2));
  assert.ok(close(byCondition.get("indoor")!.plus, -uDay * 10 * 1));
  assert.equal(byCondition.get("maxDryBulb")!.step, "±2 K");
  assert.equal(byCondition.get("outsideCoefficient")!.step, "±20 %");
  // Without sun a vertical wall's sol-air is the outdoor air, so a larger h_o only raises U_day = 1/(1/h_o + ΣR + R_si)
  // and with it the peak gain: the signs follow.
  assert.ok(
    byCondition.get("outsideCoefficient")!.plus > 0 && byCondition.get("outsideCoefficient")!.minus < 0,
  );
  // Every listed effect is at or above the threshold; the material effects below it are counted.
  for (const e of [...day.conditions, ...day.peakHeatGain]) {
    assert.ok(Math.max(Math.abs(e.minus), Math.abs(e.plus)) >= 0.005 * Math.abs(day.basePeakHeatGain));
  }
  await Deno.remove(folder, { recursive: true });
});
