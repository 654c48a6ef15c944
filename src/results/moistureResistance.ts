/**
 * The one inside surface resistance of the temperature factor f_Rsi (ISO 13788): the construction-level
 * `temperatureFactor` uses the same R_si as the heating scenarios' surface checks, so a `min-temperature-factor`
 * limit and the heating table's mould verdict read the same number.
 */
import type { Model } from "../project/model.ts";
import { ISO13788_INSIDE_SURFACE_RESISTANCE } from "../scenarios/iso13788.ts";

/** How the R_si of a construction's f_Rsi was chosen. */
export interface MoistureResistance {
  /** m²·K/W */
  readonly value: number;
  /** Heating scenarios that include the construction (empty when none does). */
  readonly scenarios: readonly string[];
  /** True when the scenarios give different R_si and the largest (lowest f_Rsi, most onerous) is used. */
  readonly mostOnerous: boolean;
}

/**
 * The R_si for each construction's f_Rsi: the `moisture-surface-resistance` of the heating scenarios that
 * include it (ISO 13788 default 0.25 m²·K/W where a scenario states none; the largest when they differ). A
 * construction in no heating scenario takes the project's one value when every heating scenario agrees, else
 * the ISO 13788 default.
 */
export function moistureResistances(model: Model): (constructionId: string) => MoistureResistance {
  const scenarios = (model.heatingScenarios ?? []).map((s) => ({
    id: s.id,
    rsi: s.moistureSurfaceResistance ?? ISO13788_INSIDE_SURFACE_RESISTANCE,
    constructions: new Set(s.surfaces.map((x) => x.construction)),
  }));
  const distinct = new Set(scenarios.map((s) => s.rsi));
  const projectValue = distinct.size === 1 ? [...distinct][0]! : ISO13788_INSIDE_SURFACE_RESISTANCE;
  return (constructionId) => {
    const own = scenarios.filter((s) => s.constructions.has(constructionId));
    if (own.length === 0) return { value: projectValue, scenarios: [], mostOnerous: false };
    const values = own.map((s) => s.rsi);
    const value = Math.max(...values);
    return { value, scenarios: own.map((s) => s.id), mostOnerous: new Set(values).size > 1 };
  };
}
