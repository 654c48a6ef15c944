/** Reading helpers for a scenario's results: clock times, orientation words, defaults, checks, weather keys. */
import type { Assumption } from "../../project/model.ts";
import type { CheckResult, ScenarioResults } from "../../results/types.ts";
import { ROOF_TILT_LIMIT_DEG } from "../../scenarios/surfaceParameters.ts";

/** Joules in one kilowatt-hour. */
export const J_PER_KWH = 3.6e6;

/** English month names, January first (no locale lookup). */
export const MONTH_NAMES = [
  "January",
  "February",
  "March",
  "April",
  "May",
  "June",
  "July",
  "August",
  "September",
  "October",
  "November",
  "December",
] as const;

const COMPASS = ["north", "north-east", "east", "south-east", "south", "south-west", "west", "north-west"];

/** Hours after midnight as `hh:mm` (rounded to the minute; 24:00 stays 24:00). */
export function clockTime(hours: number): string {
  if (!Number.isFinite(hours)) return "—";
  const minutes = Math.round(hours * 60);
  const h = Math.floor(minutes / 60);
  const m = minutes - h * 60;
  return `${String(h).padStart(2, "0")}:${String(m).padStart(2, "0")}`;
}

/** A plain word for the way a surface faces: a compass point for walls, roof or soffit by tilt. */
export function orientationWord(azimuthDeg: number, tiltDeg: number): string {
  if (tiltDeg < ROOF_TILT_LIMIT_DEG) return tiltDeg === 0 ? "roof (horizontal)" : "roof (pitched)";
  if (tiltDeg > 180 - ROOF_TILT_LIMIT_DEG) return "facing down (soffit)";
  const normalised = ((azimuthDeg % 360) + 360) % 360;
  return COMPASS[Math.round(normalised / 45) % 8] ?? "north";
}

/** How one surface parameter was set, read from the assumptions register of results.json. */
export type ParameterBasis = "given" | "default" | "override";

/** The basis of parameter `name` (e.g. `emittance`) of one surface, from `default:`/`override:` assumption ids. */
export function parameterBasis(
  assumptions: readonly Pick<Assumption, "id">[],
  name: string,
  scenarioId: string,
  surfaceId: string,
): ParameterBasis {
  const tail = `:${name}:${scenarioId}/${surfaceId}`;
  if (assumptions.some((a) => a.id === `default${tail}`)) return "default";
  if (assumptions.some((a) => a.id === `override${tail}`)) return "override";
  return "given";
}

/** The checks whose subject is the scenario or one of its surfaces, in results order. */
export function scenarioChecks(checks: readonly CheckResult[], scenarioId: string): CheckResult[] {
  const subject = `scenario:${scenarioId}`;
  return checks.filter((c) => c.subject === subject || c.subject.startsWith(`${subject}/`));
}

/** The surface part of a `scenario:<id>/<surface>` subject, or the whole subject when it has none. */
export function surfaceOfSubject(subject: string, scenarioId: string): string {
  const prefix = `scenario:${scenarioId}/`;
  return subject.startsWith(prefix) ? subject.slice(prefix.length) : subject;
}

/** True when the scenario carries its step series (a design day), false for summaries only (a weather year). */
export function hasStepSeries(results: ScenarioResults): boolean {
  const n = results.totalHeatGain.length;
  return n > 0 && results.outdoor.length === n && results.indoor.length === n &&
    Object.values(results.surfaces).every((s) => s.heatGain.length === n && s.solAir.length === n);
}

/** A peak with its time as written in results.json (weather years: `YYYY-MM-DDTHH:MM`). */
export interface TimedValue {
  readonly heatGain: number;
  readonly time: string;
}

type Json = Readonly<Record<string, unknown>>;

function isObject(value: unknown): value is Json {
  return typeof value === "object" && value !== null && !Array.isArray(value);
}

/** Reads an extension `{ heatGain, time }` object, or undefined when absent or malformed. */
export function timedValue(value: unknown): TimedValue | undefined {
  if (!isObject(value) || typeof value.heatGain !== "number" || typeof value.time !== "string") {
    return undefined;
  }
  return { heatGain: value.heatGain, time: value.time };
}

/** Reads an extension string key of an object, or undefined. */
export function stringKey(owner: unknown, key: string): string | undefined {
  if (!isObject(owner)) return undefined;
  const value = owner[key];
  return typeof value === "string" ? value : undefined;
}

/** Reads an extension number key of an object, or undefined. */
export function numberKey(owner: unknown, key: string): number | undefined {
  if (!isObject(owner)) return undefined;
  const value = owner[key];
  return typeof value === "number" ? value : undefined;
}

/** Reads an extension object key of an object, or undefined. */
export function objectKey(owner: unknown, key: string): Json | undefined {
  if (!isObject(owner)) return undefined;
  const value = owner[key];
  return isObject(value) ? value : undefined;
}

/** Monthly gain and loss in J, when the totals hold exactly 12 well-formed months. */
export function monthlyTotals(totals: unknown): { gain_J: number; loss_J: number }[] | undefined {
  if (!isObject(totals) || !Array.isArray(totals.monthly) || totals.monthly.length !== 12) return undefined;
  const months = totals.monthly.map((m: unknown) =>
    isObject(m) && typeof m.gain_J === "number" && typeof m.loss_J === "number"
      ? { gain_J: m.gain_J, loss_J: m.loss_J }
      : undefined
  );
  return months.every((m) => m !== undefined) ? months as { gain_J: number; loss_J: number }[] : undefined;
}

/** A weather-year time `YYYY-MM-DDTHH:MM` shown as `YYYY-MM-DD HH:MM`; any other text unchanged. */
export function weatherTime(time: string): string {
  return /^\d{4}-\d\d-\d\dT\d\d:\d\d$/.test(time) ? time.replace("T", " ") : time;
}

/** The coverage of a weather scenario from results.json `period`: a year, or e.g. "period of 10 days". */
export function coverageLabel(results: unknown): { kind: "year" | "period"; label: string; days?: number } {
  const period = objectKey(results, "period");
  const days = numberKey(period, "days");
  if (stringKey(period, "kind") !== "period" || days === undefined) return { kind: "year", label: "year" };
  const text = Number.isInteger(days)
    ? `${days} day${days === 1 ? "" : "s"}`
    : `${Number(days.toFixed(2))} days`;
  return { kind: "period", label: `period of ${text}`, days };
}
