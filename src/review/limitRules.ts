/** Limit rules: each code limit written by the user, reported as met (note) or not met (warning). */

import type { Diagnostic } from "../project/diagnostic.ts";
import type { Model } from "../project/model.ts";
import type { LimitResult } from "../results/limitResults.ts";
import type { ResultsJson } from "../results/types.ts";
import { finding, num } from "./finding.ts";

const COMPARISON: Readonly<Record<LimitResult["limitKey"], { symbol: string; label: string }>> = {
  "max-u": { symbol: "≤", label: "U (incl. ΔU corrections)" },
  "max-periodic-transmittance": { symbol: "≤", label: "periodic thermal transmittance |Y12|" },
  "min-time-lag": { symbol: "≥", label: "time lag" },
  "min-temperature-factor": { symbol: "≥", label: "temperature factor f_Rsi" },
};

function isLimitList(x: unknown): x is readonly LimitResult[] {
  return Array.isArray(x) && x.every((e) => typeof e === "object" && e !== null && "limitKey" in e);
}

function withUnit(value: number, unit: string): string {
  return unit === "-" ? num(value) : `${num(value)} ${unit}`;
}

/** Reports every limit of every computed construction: `limit-met` (note) or `limit-not-met` (warning). */
export function reviewLimits(model: Model, results: ResultsJson): Diagnostic[] {
  const out: Diagnostic[] = [];
  for (const c of model.constructions) {
    const limits = results.constructions[c.id]?.["limits"];
    if (!isLimitList(limits)) continue;
    for (const l of limits) {
      const { symbol } = COMPARISON[l.limitKey];
      const rsi = results.constructions[c.id]?.["temperatureFactorRsi"];
      const label = l.limitKey === "min-temperature-factor" && typeof rsi === "number"
        ? `${COMPARISON[l.limitKey].label} (R_si = ${num(rsi)} m²·K/W)`
        : COMPARISON[l.limitKey].label;
      const value = l.value === null ? "not computed" : `${label} = ${withUnit(l.value, l.unit)}`;
      const where = l.scope === "project" ? "project-wide limit in project.md" : `limit at ${l.at}`;
      out.push(finding({
        severity: l.pass ? "note" : "warning",
        at: c.at,
        subject: `${c.id}/${l.limitKey}`,
        rule: l.pass ? "limit-met" : "limit-not-met",
        message: `${c.id} ${l.pass ? "meets" : "does NOT meet"} ${l.limitKey} (${where})`,
        ...(l.pass
          ? {}
          : { hint: "a compliance finding, not a calculation error: revise the design or record a waiver" }),
        value,
        expected: `${symbol} ${withUnit(l.limit, l.unit)}`,
        source: l.clause,
      }));
    }
  }
  return out;
}
