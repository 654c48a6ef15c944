/**
 * What a weather file covers: its first and last row times, its rows and step, and whether that is one whole year.
 * Row k stands for the interval ending at its time, so the file covers (first − Δ, last], rows × Δ long. A year is
 * that span ending exactly one calendar year after it starts (8760 h, or 8784 h across 29 February).
 */
import {
  daysFromCivil,
  formatDurationS,
  formatLocalTime,
  type LocalTime,
  localTimeAt,
  secondsOf,
} from "./weatherTime.ts";

const SECONDS_PER_DAY = 86400;

/** The extent of a weather series. */
export interface WeatherSpan {
  /** First and last row times, `YYYY-MM-DDTHH:MM`, local standard time. */
  readonly first: string;
  readonly last: string;
  readonly rows: number;
  /** Δ, s */
  readonly timestepS: number;
  /** rows × Δ, s */
  readonly spanS: number;
  /** True when the span is exactly one calendar year. */
  readonly isYear: boolean;
}

/** The span of `rows` rows at step `timestepS` whose first row is at `start`. */
export function weatherSpan(start: LocalTime, rows: number, timestepS: number): WeatherSpan {
  const firstS = secondsOf(start);
  const spanS = rows * timestepS;
  const begin = localTimeAt(firstS - timestepS);
  const yearLater = (daysFromCivil(begin.year + 1, begin.month, begin.day) -
    daysFromCivil(begin.year, begin.month, begin.day)) * SECONDS_PER_DAY;
  return {
    first: formatLocalTime(start),
    last: formatLocalTime(localTimeAt(firstS + (rows - 1) * timestepS)),
    rows,
    timestepS,
    spanS,
    isYear: spanS === yearLater,
  };
}

/** A span as the user would write it: `10 days`, `1 day`, else `8759 h` or `90 min`. */
export function formatSpan(seconds: number): string {
  if (seconds % SECONDS_PER_DAY === 0) {
    const days = seconds / SECONDS_PER_DAY;
    return `${days} day${days === 1 ? "" : "s"}`;
  }
  return formatDurationS(seconds);
}

/** The span in words with its days when not whole days: `10 days`, `8759 h (364.96 days)`. */
export function describeSpan(seconds: number): string {
  const text = formatSpan(seconds);
  return seconds % SECONDS_PER_DAY === 0 ? text : `${text} (${(seconds / SECONDS_PER_DAY).toFixed(2)} days)`;
}
