import type { HeatingResults } from "../results/heatingTypes.ts";
import type { ConstructionResults, ResultsJson, ScenarioResults } from "../results/types.ts";
import type { Effect, EffectQuantity } from "./types.ts";

interface Quantity {
  readonly subject: string;
  readonly quantity: EffectQuantity;
  readonly unit: string;
  readonly value: number | null;
  /** False for a clock time, whose relative change means nothing. */
  readonly ratio: boolean;
}

function finite(value: unknown): number | null {
  return typeof value === "number" && Number.isFinite(value) ? value : null;
}

function dynamicOf(c: ConstructionResults): Record<string, unknown> {
  const d = c.dynamic;
  return typeof d === "object" && d !== null ? d as Record<string, unknown> : {};
}

function constructionQuantities(id: string, c: ConstructionResults): Quantity[] {
  const subject = `construction:${id}`;
  const dynamic = dynamicOf(c);
  return [
    { subject, quantity: "U", unit: "W/(m²·K)", value: finite(c.U), ratio: true },
    { subject, quantity: "decrementFactor", unit: "", value: finite(dynamic.decrementFactor), ratio: true },
    { subject, quantity: "timeLag_h", unit: "h", value: finite(dynamic.timeLag_h), ratio: true },
    { subject, quantity: "correctedU", unit: "W/(m²·K)", value: finite(c.correctedU), ratio: true },
    { subject, quantity: "temperatureFactor", unit: "", value: finite(c.temperatureFactor), ratio: true },
    {
      subject,
      quantity: "limitsNotMet",
      unit: "",
      value: Array.isArray(c.limits)
        ? c.limits.filter((l: { pass?: boolean }) => l.pass === false).length
        : null,
      ratio: false,
    },
  ];
}

function heatingQuantities(id: string, h: HeatingResults): Quantity[] {
  const subject = `heating:${id}`;
  return [
    { subject, quantity: "designHeatLoss", unit: "W", value: finite(h.totalHeatLoss), ratio: true },
    ...Object.entries(h.surfaces ?? {}).flatMap(([surfaceId, s]): Quantity[] => [
      {
        subject: `${subject}/${surfaceId}`,
        quantity: "designHeatLoss",
        unit: "W",
        value: finite(s.heatLoss),
        ratio: true,
      },
      {
        subject: `${subject}/${surfaceId}`,
        quantity: "insideSurfaceTemperature",
        unit: "°C",
        value: finite(s.insideSurfaceTemperature),
        ratio: false,
      },
      {
        subject: `${subject}/${surfaceId}`,
        quantity: "mouldMargin",
        unit: "",
        value: finite(s.mould?.margin),
        ratio: false,
      },
    ]),
  ];
}

function scenarioQuantities(id: string, s: ScenarioResults): Quantity[] {
  const subject = `scenario:${id}`;
  const period = s.kind === "weather" ? "annual" : "daily";
  const own: Quantity[] = [
    { subject, quantity: "peakHeatGain", unit: "W", value: finite(s.peak?.heatGain), ratio: true },
    { subject, quantity: "peakTime_h", unit: "h", value: finite(s.peak?.time_h), ratio: false },
    { subject, quantity: `${period}Gain_J`, unit: "J", value: finite(s.totals?.gain_J), ratio: true },
    { subject, quantity: `${period}Loss_J`, unit: "J", value: finite(s.totals?.loss_J), ratio: true },
  ];
  const surfaces = Object.entries(s.surfaces ?? {}).flatMap(([surfaceId, surface]): Quantity[] => [
    {
      subject: `${subject}/${surfaceId}`,
      quantity: "peakHeatGain",
      unit: "W",
      value: finite(surface.peak?.heatGain),
      ratio: true,
    },
    {
      subject: `${subject}/${surfaceId}`,
      quantity: "peakTime_h",
      unit: "h",
      value: finite(surface.peak?.time_h),
      ratio: false,
    },
  ]);
  const cooling = s.coolingLoad === undefined ? [] : [
    {
      subject,
      quantity: "peakCoolingLoad" as const,
      unit: "W",
      value: finite(s.coolingLoad.peak.value),
      ratio: true,
    },
    {
      subject,
      quantity: "peakCoolingLoadTime_h" as const,
      unit: "h",
      value: finite(s.coolingLoad.peak.time_h),
      ratio: false,
    },
  ];
  return [...own, ...cooling, ...surfaces];
}

function quantitiesOf(results: ResultsJson): Quantity[] {
  return [
    ...Object.entries(results.constructions ?? {}).flatMap(([id, c]) => constructionQuantities(id, c)),
    ...Object.entries(results.scenarios ?? {}).flatMap(([id, s]) => scenarioQuantities(id, s)),
    ...Object.entries(results.heating ?? {}).flatMap(([id, h]) => heatingQuantities(id, h)),
  ];
}

/** Relative change (new − old) / |old|, or null where it is undefined. */
export function relativeChange(oldValue: number | null, newValue: number | null): number | null {
  if (oldValue === null || newValue === null || oldValue === 0) return null;
  return (newValue - oldValue) / Math.abs(oldValue);
}

/**
 * Compares the headline results of two runs: per construction U, decrement factor and time lag; per
 * scenario the peak heat gain and its hour, the daily (design day) or annual (weather) totals, and each
 * surface's peak. Returns the quantities that differ, largest |relative| change first, and how many agree.
 */
export function compareResults(a: ResultsJson, b: ResultsJson): { effects: Effect[]; unchanged: number } {
  const key = (q: Quantity) => `${q.subject}\u0000${q.quantity}`;
  const oldQ = new Map(quantitiesOf(a).map((q) => [key(q), q]));
  const newQ = quantitiesOf(b);
  const newKeys = new Set(newQ.map(key));
  const merged = [
    ...newQ.map((n) => ({ q: n, old: oldQ.get(key(n))?.value ?? null, new: n.value })),
    ...[...oldQ.values()].filter((o) => !newKeys.has(key(o))).map((o) => ({ q: o, old: o.value, new: null })),
  ];
  let unchanged = 0;
  const effects: Effect[] = [];
  for (const m of merged) {
    if (m.old === m.new) {
      unchanged++;
      continue;
    }
    effects.push({
      subject: m.q.subject,
      quantity: m.q.quantity,
      unit: m.q.unit,
      old: m.old,
      new: m.new,
      absolute: m.old === null || m.new === null ? null : m.new - m.old,
      relative: m.q.ratio ? relativeChange(m.old, m.new) : null,
    });
  }
  return { effects: sortEffects(effects), unchanged };
}

/** Orders effects by |relative change|, largest first; those without one keep their order at the end. */
export function sortEffects(effects: readonly Effect[]): Effect[] {
  const indexed = effects.map((e, i) => ({ e, i }));
  indexed.sort((x, y) => {
    const rx = x.e.relative === null ? -1 : Math.abs(x.e.relative);
    const ry = y.e.relative === null ? -1 : Math.abs(y.e.relative);
    return ry - rx || x.i - y.i;
  });
  return indexed.map((x) => x.e);
}
