/** Element-level rules on computed results: U-value, inside areal heat capacity κ1 and time lag. */

import type { Diagnostic } from "../project/diagnostic.ts";
import type { Model } from "../project/model.ts";
import type { ResultsJson } from "../results/types.ts";
import { finding, num } from "./finding.ts";
import { ELEMENT } from "./limits.ts";

interface DynamicPart {
  readonly timeLag_h?: unknown;
  readonly arealHeatCapacityInside?: unknown;
}

function numberOf(x: unknown): number | undefined {
  return typeof x === "number" && Number.isFinite(x) ? x : undefined;
}

/** Checks each computed construction against the element-level thresholds. */
export function reviewElements(model: Model, results: ResultsJson): Diagnostic[] {
  const out: Diagnostic[] = [];
  for (const c of model.constructions) {
    const r = results.constructions[c.id];
    if (r === undefined) continue;
    if (r.U > ELEMENT.maxU.value) {
      out.push(finding({
        severity: "warning",
        at: c.at,
        subject: c.id,
        rule: "u-value-high",
        message: `${c.id} has a U-value higher than an opaque element normally has`,
        hint: "check for a missing layer, a thickness in the wrong unit, or surface resistances set to zero",
        value: `U = ${num(r.U)} W/(m²·K)`,
        expected: `U ≤ ${num(ELEMENT.maxU.value)} W/(m²·K)`,
        source: ELEMENT.maxU.source,
      }));
    }
    const dynamic =
      (typeof r["dynamic"] === "object" && r["dynamic"] !== null ? r["dynamic"] : {}) as DynamicPart;
    const kappa = numberOf(dynamic.arealHeatCapacityInside);
    if (kappa !== undefined && kappa > ELEMENT.maxKappa.value) {
      out.push(finding({
        severity: "warning",
        at: c.at,
        subject: c.id,
        rule: "kappa-high",
        message: `${c.id} has an inside areal heat capacity κ1 above that of a semi-infinite stone wall`,
        hint: "check density and specific heat of the inner layers (kJ vs J, lb/ft³ vs kg/m³)",
        value: `κ1 = ${num(kappa / 1000)} kJ/(m²·K)`,
        expected: `κ1 ≤ ${num(ELEMENT.maxKappa.value / 1000)} kJ/(m²·K)`,
        source: ELEMENT.maxKappa.source,
      }));
    }
    const lag = numberOf(dynamic.timeLag_h);
    if (lag !== undefined && lag > ELEMENT.maxTimeLag.value) {
      out.push(finding({
        severity: "note",
        at: c.at,
        subject: c.id,
        rule: "time-lag-long",
        message: `${c.id} has a time lag longer than one day`,
        hint: "plausible only for very massive elements; confirm the thicknesses",
        value: `time lag = ${num(lag)} h`,
        expected: `≤ ${num(ELEMENT.maxTimeLag.value)} h`,
        source: ELEMENT.maxTimeLag.source,
      }));
    }
  }
  return out;
}
