import assert from "node:assert/strict";
import { weatherBoundary } from "../../src/scenarios/weatherBoundary.ts";
import { fluxesAfterWarmUp, forEachInsideFlux } from "../../src/scenarios/weatherRecursion.ts";
import { surfaceParameters } from "../../src/scenarios/surfaceParameters.ts";
import { computeWeatherYear } from "../../src/scenarios/weatherYear.ts";
import { energyTotals } from "../../src/scenarios/weatherSummary.ts";
import { loadProject } from "../../src/commands/loadProject.ts";
import {
  cycledSurfaces,
  DEMO_CONSTRUCTIONS,
  DEMO_FOLDER,
  loadDemoYear,
  withoutProvenance,
} from "./_demoYear.ts";
import { referenceFluxes, referenceSolAir } from "./_weatherReference.ts";

const demo = await loadDemoYear();
const n = demo.weather.count;
/** The demo's own four surfaces and 40 more cycled from its constructions (shared and distinct orientations). */
const surfaces = [...demo.scenario.surfaces, ...cycledSurfaces(demo.scenario, 40)];
const inputs = surfaces.map((surface) => ({
  surface,
  parameters: surfaceParameters("t", surface, demo.context.constructions.get(surface.construction)!, [], []),
}));

/** Index of the first element that is not the same double (Object.is), or −1. */
function firstDifference(a: ArrayLike<number>, b: ArrayLike<number>): number {
  if (a.length !== b.length) return Math.min(a.length, b.length);
  for (let k = 0; k < a.length; k++) if (!Object.is(a[k], b[k])) return k;
  return -1;
}

Deno.test("the demo snapshot matches projects/demo as read by loadProject, and so does its weather", async () => {
  const loaded = await loadProject(DEMO_FOLDER);
  assert.ok(loaded.model !== undefined, loaded.diagnostics.map((d) => d.message).join("\n"));
  const scenario = loaded.model.scenarios.find((s) => s.id === demo.scenario.id);
  // The snapshot holds the weather year's constructions; the demo's room adds GF-1 and IW-2 in 60-reading-room.md.
  const yearConstructions = loaded.model.constructions.filter((c) =>
    (DEMO_CONSTRUCTIONS as readonly string[]).includes(c.id)
  );
  assert.deepEqual(withoutProvenance(demo.constructions), withoutProvenance(yearConstructions));
  assert.deepEqual(withoutProvenance(demo.scenario), withoutProvenance(scenario));
  assert.deepEqual(demo.constructions.map((c) => c.id), [...DEMO_CONSTRUCTIONS]);
  const text = loaded.dataTexts.get(demo.scenario.weatherPath)!;
  assert.equal(
    text,
    (await Deno.readTextFile(`${DEMO_FOLDER}${demo.scenario.weatherPath}`)).replaceAll("\r\n", "\n"),
  );
});

Deno.test("weatherBoundary() shares transposition and sol-air bit for bit with the surface-by-surface computation", () => {
  const boundary = weatherBoundary(demo.weather, demo.scenario.site!, demo.scenario.indoor, inputs);
  const reference = referenceSolAir(demo.weather, demo.scenario.site!, inputs.map((i) => i.parameters));
  for (const [s, r] of reference.entries()) {
    const id = surfaces[s]!.id;
    assert.equal(
      firstDifference(boundary.surfaces[s]!.incidentWPerM2!, r.incidentWPerM2),
      -1,
      `${id} incident`,
    );
    assert.equal(firstDifference(boundary.surfaces[s]!.solAirC, r.solAirC), -1, `${id} sol-air`);
  }
  // Not a vacuous comparison: the sun reaches every surface and the sol-air differs between two absorptances.
  for (const r of reference) assert.ok(Math.max(...r.incidentWPerM2) > 100);
  assert.notEqual(firstDifference(reference[4]!.solAirC, reference[5]!.solAirC), -1);
});

Deno.test("the year's fluxes equal stepping SurfaceRecursion, bit for bit, on every demo construction", () => {
  const boundary = weatherBoundary(demo.weather, demo.scenario.site!, demo.scenario.indoor, inputs);
  const warmUpSteps = 7 * 24;
  const runs = inputs.map((input, s) => ({
    modes: demo.analysis(input.surface.construction).airToAir.modes,
    solAirC: boundary.surfaces[s]!.solAirC,
  }));
  const seen = new Set<string>();
  forEachInsideFlux(runs, boundary.indoorC, warmUpSteps, n, (s, inside) => {
    seen.add(surfaces[s]!.construction);
    const reference = referenceFluxes(runs[s]!.modes, runs[s]!.solAirC, boundary.indoorC, warmUpSteps, n);
    assert.equal(firstDifference(inside, reference.insideWPerM2), -1, surfaces[s]!.id);
  });
  assert.deepEqual([...seen].sort(), [...DEMO_CONSTRUCTIONS]);
  // Both fluxes of the warm-up check's path, with no warm-up, a long one, and one longer than the series (wrapping).
  const short = boundary.indoorC.slice(0, 500).map((t, k) => t - 4 * Math.sin(k / 5));
  for (const [s, run] of runs.slice(0, 9).entries()) {
    for (
      const [solAirC, indoorC, warmUp, length] of [
        [run.solAirC, boundary.indoorC, 0, 48],
        [run.solAirC, boundary.indoorC, 2 * warmUpSteps, n],
        [run.solAirC.slice(0, 500), short, 1300, 900],
      ] as const
    ) {
      const fast = fluxesAfterWarmUp(run.modes, solAirC, indoorC, warmUp, length);
      const reference = referenceFluxes(run.modes, solAirC, indoorC, warmUp, length);
      assert.equal(firstDifference(fast.insideWPerM2, reference.insideWPerM2), -1, `${s} inside W=${warmUp}`);
      assert.equal(
        firstDifference(fast.outsideWPerM2, reference.outsideWPerM2),
        -1,
        `${s} outside W=${warmUp}`,
      );
    }
  }
  // The comparison is exact: for the roof (τ1 ≈ 19 h) one warm-up step more changes the flux somewhere.
  const roof = runs[3]!;
  const longer = referenceFluxes(roof.modes, roof.solAirC, boundary.indoorC, warmUpSteps + 1, n);
  const fast = fluxesAfterWarmUp(roof.modes, roof.solAirC, boundary.indoorC, warmUpSteps, n);
  assert.notEqual(firstDifference(fast.insideWPerM2, longer.insideWPerM2), -1);
});

Deno.test("computeWeatherYear() on the demo scenario reports the peaks and totals of the reference recursion", () => {
  const outcome = computeWeatherYear(demo.scenario, demo.weather, demo.context);
  const own = inputs.slice(0, demo.scenario.surfaces.length);
  const reference = referenceSolAir(demo.weather, demo.scenario.site!, own.map((i) => i.parameters));
  const warmUpSteps = outcome.results.warmUp.days * 24;
  for (const [s, { surface }] of own.entries()) {
    const modes = demo.analysis(surface.construction).airToAir.modes;
    const indoor = new Float64Array(n).fill(21);
    const q = referenceFluxes(modes, reference[s]!.solAirC, indoor, warmUpSteps, n).insideWPerM2;
    const gain = q.map((v) => v * surface.areaM2);
    const result = outcome.results.surfaces[surface.id]!;
    assert.equal(result.peak.heatGain, Math.max(...gain), surface.id);
    assert.equal(result.peakLoss.heatGain, Math.min(...gain), surface.id);
    assert.deepEqual(result.totals, energyTotals(gain, demo.weather.monthOfStep, 3600), surface.id);
  }
});
