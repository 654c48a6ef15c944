import type { HeatingResults } from "../scenarios/heatingTypes.ts";
import type { ConstructionResults, ResultsJson, ScenarioResults } from "../results/types.ts";
import { roomQuantities, roomsOf } from "./roomEffects.ts";
import type { ComparedQuantity, Effect } from "./types.ts";

function text(value: unknown): string | null {
  return typeof value === "string" && value !== "" ? value : null;
}

/** Hours from one local time `YYYY-MM-DDTHH:MM` to another, or null when either is not such a time. */
export function hoursBetween(from: string, to: string): number | null {
  const pattern = /^\d{4}-\d\d-\d\dT\d\d:\d\d$/;
  if (!pattern.test(from) || !pattern.test(to)) return null;
  const ms = Date.parse(`${to}:00Z`) - Date.parse(`${from}:00Z`);
  return Number.isFinite(ms) ? ms / 3.6e6 : null;
}

/** The signed shortest change between two clock hours, in [−12, 12): 23:00 → 00:00 is +1 h, 02:00 → 22:00 is −4 h. */
export function clockChange(oldHour: number, newHour: number): number {
  const d = (((newHour - oldHour) % 24) + 24) % 24;
  return d >= 12 ? d - 24 : d;
}

function finite(value: unknown): number | null {
  return typeof value === "number" && Number.isFinite(value) ? value : null;
}

function dynamicOf(c: ConstructionResults): Record<string, unknown> {
  const d = c.dynamic;
  return typeof d === "object" && d !== null ? d as Record<string, unknown> : {};
}

/** True when the construction's U carries a correction (ΔU for air gaps, fixings, ...), so U_c can differ from U. */
function hasCorrection(c: ConstructionResults | undefined): boolean {
  return c !== undefined && c.corrections !== undefined && c.corrections !== null;
}

function constructionQuantities(id: string, c: ConstructionResults, corrected: boolean): ComparedQuantity[] {
  const subject = `construction:${id}`;
  const dynamic = dynamicOf(c);
  const correctedU: ComparedQuantity[] = corrected
    ? [{ subject, quantity: "correctedU", unit: "W/(m²·K)", value: finite(c.correctedU), ratio: true }]
    : [];
  return [
    { subject, quantity: "U", unit: "W/(m²·K)", value: finite(c.U), ratio: true },
    { subject, quantity: "decrementFactor", unit: "", value: finite(dynamic.decrementFactor), ratio: true },
    { subject, quantity: "timeLag_h", unit: "h", value: finite(dynamic.timeLag_h), ratio: true },
    ...correctedU,
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

function heatingQuantities(id: string, h: HeatingResults): ComparedQuantity[] {
  const subject = `heating:${id}`;
  return [
    { subject, quantity: "designHeatLoss", unit: "W", value: finite(h.totalHeatLoss), ratio: true },
    ...Object.entries(h.surfaces ?? {}).flatMap(([surfaceId, s]): ComparedQuantity[] => [
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

function scenarioQuantities(id: string, s: ScenarioResults): ComparedQuantity[] {
  const subject = `scenario:${id}`;
  const weather = s.kind === "weather";
  const period = weather ? "annual" : "daily";
  // A weather peak is a moment of the year (the package prints its local time); a design-day peak a clock hour.
  const when = (owner: unknown) =>
    weather ? { time: text((owner as Record<string, unknown>)?.peakTime) } : { clock: true };
  const own: ComparedQuantity[] = [
    { subject, quantity: "peakHeatGain", unit: "W", value: finite(s.peak?.heatGain), ratio: true },
    {
      subject,
      quantity: "peakTime_h",
      unit: "h",
      value: finite(s.peak?.time_h),
      ratio: false,
      ...when(s),
    },
    { subject, quantity: `${period}Gain_J`, unit: "J", value: finite(s.totals?.gain_J), ratio: true },
    { subject, quantity: `${period}Loss_J`, unit: "J", value: finite(s.totals?.loss_J), ratio: true },
  ];
  const surfaces = Object.entries(s.surfaces ?? {}).flatMap(([surfaceId, surface]): ComparedQuantity[] => [
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
      ...when(surface),
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
      clock: true,
    },
  ];
  return [...own, ...cooling, ...surfaces];
}

function quantitiesOf(results: ResultsJson, other: ResultsJson): ComparedQuantity[] {
  const corrected = (id: string, c: ConstructionResults) =>
    hasCorrection(c) || hasCorrection(other.constructions?.[id]);
  return [
    ...Object.entries(results.constructions ?? {}).flatMap(([id, c]) =>
      constructionQuantities(id, c, corrected(id, c))
    ),
    ...Object.entries(results.scenarios ?? {}).flatMap(([id, s]) => scenarioQuantities(id, s)),
    ...Object.entries(results.heating ?? {}).flatMap(([id, h]) => heatingQuantities(id, h)),
    ...Object.entries(roomsOf(results)).flatMap(([id, r]) => roomQuantities(id, r)),
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
 * surface's peak; per room its load peaks by both methods, design heat loss and heat loss coefficient (roomEffects.ts).
 * Returns the quantities that differ, largest |relative| change first, and how many agree.
 */
export function compareResults(a: ResultsJson, b: ResultsJson): { effects: Effect[]; unchanged: number } {
  const key = (q: ComparedQuantity) => `${q.subject}\u0000${q.quantity}`;
  const oldQ = new Map(quantitiesOf(a, b).map((q) => [key(q), q]));
  const newQ = quantitiesOf(b, a);
  const newKeys = new Set(newQ.map(key));
  const merged = [
    ...newQ.map((n) => ({ q: n, o: oldQ.get(key(n)), n: n as ComparedQuantity | undefined })),
    ...[...oldQ.values()].filter((o) => !newKeys.has(key(o))).map((o) => ({ q: o, o, n: undefined })),
  ];
  let unchanged = 0;
  const effects: Effect[] = [];
  for (const m of merged) {
    const old = m.o?.value ?? null;
    const now = m.n?.value ?? null;
    const oldTime = m.o?.time ?? null;
    const newTime = m.n?.time ?? null;
    const timed = m.q.time !== undefined;
    if (timed && oldTime !== null && newTime !== null ? oldTime === newTime : old === now) {
      unchanged++;
      continue;
    }
    const between = oldTime !== null && newTime !== null ? hoursBetween(oldTime, newTime) : null;
    const absolute = old === null || now === null
      ? between
      : m.q.clock === true
      ? clockChange(old, now)
      : between ?? now - old;
    effects.push({
      subject: m.q.subject,
      quantity: m.q.quantity,
      unit: m.q.unit,
      old,
      new: now,
      absolute,
      relative: m.q.ratio ? relativeChange(old, now) : null,
      ...(timed ? { oldTime, newTime } : {}),
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
