/**
 * Scenario-surface rules: orientation that contradicts the name, extreme solar absorptance, and sol-air
 * temperatures given directly that the climate cannot produce.
 */

import type { Diagnostic } from "../project/diagnostic.ts";
import type { Model, Scenario, ScenarioSurface } from "../project/model.ts";
import type { ResultsJson } from "../results/types.ts";
import { about, finding, num, range } from "./finding.ts";
import { SURFACE } from "./limits.ts";

const ROOF_NAME = /roof|\bdeck\b/i;
const WALL_NAME = /wall|facade|façade|elevation/i;
/** A surface within this many degrees of vertical (or of horizontal) counts as vertical (or horizontal). */
const ORIENTATION_TOLERANCE_DEG = 10;
const ORIENTATION_SOURCE =
  "common practice, no source: tilt is measured from horizontal, 0° facing up, 90° vertical (fluxnote input convention)";

/** Checks the surfaces of every scenario; sol-air bounds use the computed outdoor series when given. */
export function reviewScenarios(model: Model, results?: ResultsJson): Diagnostic[] {
  const out: Diagnostic[] = [];
  const constructionNames = new Map(model.constructions.map((c) => [c.id, `${c.id} ${c.name}`]));
  for (const scenario of model.scenarios) {
    const outdoorMin = outdoorMinimum(scenario, results);
    for (const surface of scenario.surfaces) {
      const name = `${surface.id} ${constructionNames.get(surface.construction) ?? ""}`;
      out.push(...about(`${scenario.id}/${surface.id}`, [
        ...orientation(surface, name),
        ...absorptance(surface),
        ...solAir(surface, outdoorMin),
      ]));
    }
  }
  return out;
}

function outdoorMinimum(scenario: Scenario, results?: ResultsJson): number | undefined {
  const series = results?.scenarios[scenario.id]?.outdoor;
  if (series !== undefined && series.length > 0) return Math.min(...series);
  if (scenario.kind !== "design-day") return undefined;
  return scenario.outdoor.kind === "daily-range"
    ? scenario.outdoor.maxDryBulbC - scenario.outdoor.dailyRangeK
    : Math.min(...scenario.outdoor.hourlyC);
}

function orientation(surface: ScenarioSurface, name: string): Diagnostic[] {
  const tilt = surface.tiltDeg;
  if (tilt === undefined) return [];
  const vertical = Math.abs(tilt - 90) <= ORIENTATION_TOLERANCE_DEG;
  const horizontal = tilt <= ORIENTATION_TOLERANCE_DEG || tilt >= 180 - ORIENTATION_TOLERANCE_DEG;
  const roofLike = ROOF_NAME.test(name) && !WALL_NAME.test(name);
  const wallLike = WALL_NAME.test(name) && !ROOF_NAME.test(name);
  if (!(vertical && roofLike) && !(horizontal && wallLike)) return [];
  return [finding({
    severity: "note",
    at: surface.at,
    rule: "surface-orientation-name",
    message: vertical
      ? `Surface ${surface.id} is vertical but its name or construction says roof`
      : `Surface ${surface.id} is horizontal but its name or construction says wall`,
    hint:
      "tilt is 0 deg for a flat roof facing up and 90 deg for a wall; check the tilt and the construction",
    value: `tilt = ${num(tilt)}°`,
    expected: vertical ? `tilt ≤ ${90 - ORIENTATION_TOLERANCE_DEG}° for a roof` : `tilt near 90° for a wall`,
    source: ORIENTATION_SOURCE,
  })];
}

function absorptance(surface: ScenarioSurface): Diagnostic[] {
  const α = surface.absorptance;
  if (α === undefined || (α >= SURFACE.minAbsorptance.value && α <= SURFACE.maxAbsorptance.value)) return [];
  const low = α < SURFACE.minAbsorptance.value;
  return [finding({
    severity: "note",
    at: surface.at,
    rule: "absorptance-extreme",
    message: `Surface ${surface.id} has a solar absorptance ${
      low ? "lower" : "higher"
    } than usual for an opaque building finish`,
    hint: low
      ? "bare or polished metal can be this low; otherwise check that emittance and absorptance are not swapped"
      : "confirm the finish; check that emittance and absorptance are not swapped",
    value: `α = ${num(α)}`,
    expected: range(SURFACE.minAbsorptance.value, SURFACE.maxAbsorptance.value, "").trim(),
    source: low ? SURFACE.minAbsorptance.source : SURFACE.maxAbsorptance.source,
  })];
}

function solAir(surface: ScenarioSurface, outdoorMin: number | undefined): Diagnostic[] {
  const series = surface.solAirC;
  if (series === undefined || series.length === 0) return [];
  const lo = Math.min(...series);
  const hi = Math.max(...series);
  const at = surface.at;
  const out: Diagnostic[] = [];
  const floor = outdoorMin === undefined ? undefined : outdoorMin - SURFACE.solAirBelowOutdoor.value;
  if (floor !== undefined && lo < floor) {
    out.push(finding({
      severity: "warning",
      at,
      rule: "sol-air-below-outdoor",
      message: `Sol-air temperatures of surface ${surface.id} fall far below the coldest outdoor air`,
      hint: "check the unit (°F?) and that the values are for this scenario's climate",
      value: `min sol-air = ${num(lo)} °C (outdoor min ${num(outdoorMin ?? NaN)} °C)`,
      expected: `≥ ${num(floor)} °C (outdoor min − ${num(SURFACE.solAirBelowOutdoor.value)} K)`,
      source: SURFACE.solAirBelowOutdoor.source,
    }));
  }
  if (hi > SURFACE.maxSolAir.value) {
    out.push(finding({
      severity: "warning",
      at,
      rule: "sol-air-too-high",
      message: `Sol-air temperatures of surface ${surface.id} exceed what a building surface reaches`,
      hint: "check the unit: °F values entered as °C?",
      value: `max sol-air = ${num(hi)} °C`,
      expected: `≤ ${num(SURFACE.maxSolAir.value)} °C`,
      source: SURFACE.maxSolAir.source,
    }));
  }
  if (hi - lo > SURFACE.maxSolAirRange.value) {
    out.push(finding({
      severity: "warning",
      at,
      rule: "sol-air-range-large",
      message:
        `Sol-air temperatures of surface ${surface.id} swing more in one day than sun and air can cause`,
      hint: "check the series for a stray value or a unit change",
      value: `daily range = ${num(hi - lo)} K`,
      expected: `≤ ${num(SURFACE.maxSolAirRange.value)} K`,
      source: SURFACE.maxSolAirRange.source,
    }));
  }
  return out;
}
