import { formatFixed, formatSig, formatTrim, MINUS, withUnit } from "../report/page/format.ts";
import { weatherTime } from "../report/scenarios/scenarioData.ts";
import type { Change, Effect, EffectQuantity, FieldValue } from "./types.ts";

const LONG_TEXT = 90;

/** Display conversions from the SI value kept in the data: key → [display unit, factor]. */
const SHOWN_AS: Readonly<Record<string, readonly [string, number]>> = {
  "thickness|m": ["mm", 1000],
  "timestep|s": ["min", 1 / 60],
};

function shorten(text: string): string {
  const flat = text.replace(/\s+/g, " ");
  return flat.length > LONG_TEXT ? `${flat.slice(0, LONG_TEXT - 1)}…` : flat;
}

function numberParts(value: number, unit: string, key: string | null): [string, string] {
  const [shownUnit, factor] = SHOWN_AS[`${(key ?? "").split(".").pop()}|${unit}`] ?? [unit, 1];
  return [formatTrim(value * factor, 6), shownUnit];
}

/** Prints an input value for people: numbers to 6 significant digits with their unit, lists summarised. */
export function valueText(value: FieldValue, unit: string, key: string | null): string {
  if (value === null) return "(absent)";
  if (typeof value === "number") return withUnit(...numberParts(value, unit, key));
  if (typeof value === "boolean") return value ? "yes" : "no";
  if (typeof value === "string") return shorten(value);
  if (value.length === 0) return "(empty list)";
  const min = Math.min(...value);
  const max = Math.max(...value);
  return `${value.length} values, ${formatTrim(min, 4)} to ${withUnit(formatTrim(max, 4), unit)}`;
}

/** The change of one input as `old → new`, or what was added or removed. */
export function changeText(c: Change): string {
  if (c.change === "added") return `added: ${valueText(c.new, c.unit, c.key)}`;
  if (c.change === "removed") return `removed: ${valueText(c.old, c.unit, c.key)}`;
  if (typeof c.old === "number" && typeof c.new === "number" && c.unit !== "") {
    const [oldText] = numberParts(c.old, c.unit, c.key);
    const [newText, unit] = numberParts(c.new, c.unit, c.key);
    return `${oldText} → ${withUnit(newText, unit)}`;
  }
  return `${valueText(c.old, c.unit, c.key)} → ${valueText(c.new, c.unit, c.key)}`;
}

/** What a change is about, e.g. `W-1 layer 2 thickness`. */
export function changeLabel(c: Change): string {
  return [c.subject, c.part, c.key].filter((x): x is string => x !== null).join(" · ");
}

const QUANTITY_NAMES: Readonly<Record<EffectQuantity, string>> = {
  U: "U-value",
  decrementFactor: "decrement factor",
  timeLag_h: "time lag",
  peakHeatGain: "peak heat gain",
  peakTime_h: "hour of peak",
  dailyGain_J: "heat gain over the day",
  dailyLoss_J: "heat loss over the day",
  annualGain_J: "heat gain over the weather year or stated period",
  annualLoss_J: "heat loss over the weather year or stated period",
  correctedU: "U-value with corrections",
  temperatureFactor: "temperature factor f_Rsi (moisture R_si, ISO 13788 default 0.25 m²·K/W)",
  limitsNotMet: "limits not met",
  peakCoolingLoad: "peak cooling load",
  peakCoolingLoadTime_h: "hour of peak cooling load",
  designHeatLoss: "design heat loss",
  insideSurfaceTemperature: "inside surface temperature",
  mouldMargin: "mould margin f_Rsi − f_Rsi,min",
  heatBalancePeak: "peak cooling load, heat balance",
  heatBalancePeakTime_h: "hour of peak cooling load, heat balance",
  rtsMethodPeak: "peak cooling load, radiant time series method",
  rtsMethodPeakTime_h: "hour of peak cooling load, radiant time series method",
  heatLossCoefficient: "heat loss coefficient",
  peakInsideSurfaceTemperature: "highest inside surface temperature",
};

/** A readable name of a result quantity. */
export function quantityName(q: EffectQuantity): string {
  return QUANTITY_NAMES[q];
}

/** The subject of an effect for people: `W-1`, `summer-day`, `summer-day / roof`. */
export function effectSubject(e: Effect): string {
  const [kind = "", rest = ""] = e.subject.split(/:(.*)/s);
  if (kind === "construction") return `construction ${rest}`;
  return `${kind === "room" ? "room" : "scenario"} ${rest.replace("/", " / surface ")}`;
}

function clock(hours: number): string {
  const minutes = Math.round((((hours % 24) + 24) % 24) * 60);
  return `${String(Math.floor(minutes / 60)).padStart(2, "0")}:${String(minutes % 60).padStart(2, "0")}`;
}

/** Result quantities that are clock hours: printed as `HH:MM`. */
const CLOCK_HOURS: ReadonlySet<EffectQuantity> = new Set([
  "peakTime_h",
  "peakCoolingLoadTime_h",
  "heatBalancePeakTime_h",
  "rtsMethodPeakTime_h",
]);

/** Result quantities that count things: printed as whole numbers. */
const COUNTS: ReadonlySet<EffectQuantity> = new Set(["limitsNotMet"]);

/** Prints one side of an effect; energies in kWh (1 kWh = 3.6 MJ), peak hours as a clock time, counts whole. */
export function effectValue(e: Effect, value: number | null): string {
  if (value === null) return "—";
  if (COUNTS.has(e.quantity)) return String(Math.round(value));
  if (CLOCK_HOURS.has(e.quantity)) return clock(value);
  if (e.unit === "J") return withUnit(formatSig(value / 3.6e6, 4), "kWh");
  return withUnit(formatSig(value, 4), e.unit);
}

/**
 * Prints side a (`old`) or b (`new`) of an effect: a weather-year peak as the local date and time the package
 * prints (`2031-07-21 14:00`), anything else as `effectValue`.
 */
export function effectSide(e: Effect, side: "old" | "new"): string {
  const time = side === "old" ? e.oldTime : e.newTime;
  if (typeof time === "string") return weatherTime(time);
  return effectValue(e, e[side]);
}

/** Prints the absolute change of an effect with its sign; counts as whole numbers. */
export function effectAbsolute(e: Effect): string {
  if (e.absolute === null) return "—";
  const sign = e.absolute > 0 ? "+" : "";
  if (COUNTS.has(e.quantity)) return sign + String(Math.round(e.absolute)).replace("-", MINUS);
  if (e.unit === "J") return sign + withUnit(formatSig(e.absolute / 3.6e6, 3), "kWh");
  return sign + withUnit(formatSig(e.absolute, 3), e.unit);
}

/** Prints the relative change of an effect as a signed percentage. */
export function effectRelative(e: Effect): string {
  if (e.relative === null) return "—";
  const text = formatFixed(e.relative * 100, 1);
  return `${e.relative > 0 ? "+" : text.startsWith(MINUS) ? "" : "±"}${text} %`;
}
