/**
 * Scenario-condition rules: indoor temperatures outside those of heated buildings, and a long-wave
 * correction outside the usual sol-air convention. The reader already refuses what is impossible
 * (src/project/physicalBounds.ts); these are possible values that deserve a second look.
 */

import type { Diagnostic } from "../project/diagnostic.ts";
import type { Model, TemperatureProfile } from "../project/model.ts";
import type { Position } from "../project/position.ts";
import { about, finding, num, range } from "./finding.ts";
import { CONDITIONS } from "./limits.ts";

/** Checks the indoor temperature of every scenario and the long-wave correction of every surface. */
export function reviewConditions(model: Model): Diagnostic[] {
  const out: Diagnostic[] = [];
  for (const scenario of model.scenarios) {
    out.push(...about(scenario.id, indoor(scenario.id, profileRange(scenario.indoor), scenario.at)));
    for (const surface of scenario.surfaces) {
      const correction = surface.longwaveCorrectionK;
      if (correction === undefined) continue;
      if (correction >= 0 && correction <= CONDITIONS.maxLongwaveCorrection.value) continue;
      out.push(finding({
        severity: "warning",
        at: surface.at,
        subject: `${scenario.id}/${surface.id}`,
        rule: "longwave-correction-unusual",
        message:
          `Surface ${surface.id} of scenario ${scenario.id} has a long-wave correction outside the usual sol-air convention`,
        hint:
          "check the value and its unit: it is ε·ΔR/h_o in kelvin, subtracted from the sol-air temperature",
        value: `ΔT_lw = ${num(correction)} K`,
        expected: range(0, CONDITIONS.maxLongwaveCorrection.value, "K"),
        source: CONDITIONS.maxLongwaveCorrection.source,
      }));
    }
  }
  for (const heating of model.heatingScenarios ?? []) {
    out.push(...about(heating.id, indoor(heating.id, [heating.indoorC, heating.indoorC], heating.at)));
  }
  return out;
}

function profileRange(profile: TemperatureProfile): [number, number] {
  return profile.kind === "constant"
    ? [profile.valueC, profile.valueC]
    : [Math.min(...profile.hourlyC), Math.max(...profile.hourlyC)];
}

function indoor(id: string, [lo, hi]: [number, number], at: Position): Diagnostic[] {
  const min = CONDITIONS.minIndoor.value;
  const max = CONDITIONS.maxIndoor.value;
  if (lo >= min && hi <= max) return [];
  const low = lo < min;
  return [finding({
    severity: "warning",
    at,
    rule: "indoor-temperature-unusual",
    message: `Scenario ${id} has an indoor temperature ${
      low ? "below" : "above"
    } that of any heated building`,
    hint: "check the value and its unit (°F written as degC?)",
    value: `θ_i = ${num(low ? lo : hi)} °C`,
    expected: range(min, max, "°C"),
    source: low ? CONDITIONS.minIndoor.source : CONDITIONS.maxIndoor.source,
  })];
}
