/**
 * `buildSummary`: the results.json `summary` — every verdict of the package copied from the results themselves
 * (nothing is recomputed here), the failed checks and the open items.
 */
import type { Diagnostic } from "../project/diagnostic.ts";
import type { Model } from "../project/model.ts";
import type { HeatingResults } from "../scenarios/heatingTypes.ts";
import type { LimitResult } from "./limitResults.ts";
import { collectOpenItems } from "./openItems.ts";
import { syntheticScenarios } from "./syntheticWeather.ts";
import type { ConstructionSummary, ScenarioSummary, SummaryJson } from "./summaryTypes.ts";
import type { ConstructionResults, ResultsJson, ScenarioResults } from "./types.ts";

/** Builds the summary of a computed project; `findings` are the review findings shown in the package. */
export function buildSummary(
  model: Model,
  results: ResultsJson,
  findings: readonly Diagnostic[],
): SummaryJson {
  const synthetic = syntheticScenarios(model, results);
  return {
    constructions: model.constructions.flatMap((c) => {
      const r = results.constructions[c.id];
      return r === undefined ? [] : [constructionSummary(c.id, c.name, r)];
    }),
    scenarios: [
      ...Object.entries(results.scenarios).map(([id, s]) => scenarioSummary(id, s, synthetic.has(id))),
      ...Object.entries(results.heating ?? {}).map(([id, h]) => heatingSummary(id, h)),
    ],
    failedChecks: results.checks.filter((c) => !c.pass).map((c) => ({
      id: c.id,
      subject: c.subject,
      description: c.description,
      value: c.value,
      limit: c.limit,
    })),
    openItems: collectOpenItems(model, results, findings),
  };
}

function numberAt(value: unknown, ...path: string[]): number | null {
  let at: unknown = value;
  for (const key of path) {
    if (typeof at !== "object" || at === null) return null;
    at = (at as Record<string, unknown>)[key];
  }
  return typeof at === "number" ? at : null;
}

function constructionSummary(id: string, name: string, r: ConstructionResults): ConstructionSummary {
  const limits = (r["limits"] ?? []) as readonly LimitResult[];
  return {
    id,
    name,
    U: r.U,
    correctedU: numberAt(r, "correctedU") ?? r.U,
    limits: limits.map((l) => ({
      id: l.id,
      limitKey: l.limitKey,
      value: l.value,
      limit: l.limit,
      unit: l.unit,
      clause: l.clause,
      pass: l.pass,
    })),
    decrementFactor: numberAt(r, "dynamic", "decrementFactor"),
    timeLag_h: numberAt(r, "dynamic", "timeLag_h"),
    kappa1: numberAt(r, "dynamic", "arealHeatCapacityInside"),
    fRsi: numberAt(r, "temperatureFactor"),
    fRsiSurfaceResistance: fRsiResistance(r),
  };
}

/**
 * The R_si behind `temperatureFactor`, as the results state it (`temperatureFactorRsi`, the moisture surface
 * resistance), else the construction's own inside surface resistance (`steady.insideSurfaceResistance`).
 */
function fRsiResistance(r: ConstructionResults): number | null {
  return numberAt(r, "temperatureFactorRsi") ?? numberAt(r, "steady", "insideSurfaceResistance");
}

function scenarioSummary(id: string, s: ScenarioResults, synthetic: boolean): ScenarioSummary {
  const days = s.kind === "design-day" ? 1 : numberAt(s, "period", "days") ?? 365;
  const peakTime = (s as { peakTime?: unknown }).peakTime;
  const cooling = s.coolingLoad?.peak;
  return {
    id,
    kind: s.kind,
    peakGain: {
      value: s.peak.heatGain,
      time_h: s.peak.time_h,
      time: typeof peakTime === "string" ? peakTime : null,
    },
    dailyEnergy: days > 0 ? { gain_J: s.totals.gain_J / days, loss_J: s.totals.loss_J / days } : null,
    peakCoolingLoad: cooling === undefined
      ? null
      : { value: cooling.value, time_h: cooling.time_h, time: null },
    designHeatLoss: null,
    surfaces: [],
    synthetic,
  };
}

function heatingSummary(id: string, h: HeatingResults): ScenarioSummary {
  return {
    id,
    kind: "heating",
    peakGain: null,
    dailyEnergy: null,
    peakCoolingLoad: null,
    designHeatLoss: h.totalHeatLoss,
    surfaces: Object.entries(h.surfaces).map(([surface, v]) => ({
      surface,
      construction: v.construction,
      condensation: { pass: v.surfaceCondensation.pass, margin: v.surfaceCondensation.margin },
      mould: { pass: v.mould.pass, margin: v.mould.margin },
    })),
    synthetic: false,
  };
}
