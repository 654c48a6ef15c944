/**
 * Calendar arithmetic for weather-file times (local standard time, proleptic Gregorian calendar) without Date
 * objects: civil date ↔ day count, ISO `YYYY-MM-DDTHH:MM` reading and writing.
 */

/** A local standard clock time to the minute. */
export interface LocalTime {
  readonly year: number;
  /** 1…12 */
  readonly month: number;
  /** 1…31 */
  readonly day: number;
  /** 0…23 */
  readonly hour: number;
  /** 0…59 */
  readonly minute: number;
}

const SECONDS_PER_DAY = 86400;

/** Whether a Gregorian year has 29 February. */
function isLeap(year: number): boolean {
  return (year % 4 === 0 && year % 100 !== 0) || year % 400 === 0;
}

/** Number of days in a month (1…12) of a Gregorian year. */
export function daysInMonth(year: number, month: number): number {
  const lengths = [31, isLeap(year) ? 29 : 28, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31];
  return lengths[month - 1] ?? 0;
}

/**
 * Days from 1970-01-01 to a Gregorian date (H. Hinnant, "chrono-Compatible Low-Level Date Algorithms",
 * `days_from_civil`, public domain).
 */
export function daysFromCivil(year: number, month: number, day: number): number {
  const y = month <= 2 ? year - 1 : year;
  const era = Math.floor(y / 400);
  const yearOfEra = y - era * 400;
  const dayOfYear = Math.floor((153 * (month + (month > 2 ? -3 : 9)) + 2) / 5) + day - 1;
  const dayOfEra = yearOfEra * 365 + Math.floor(yearOfEra / 4) - Math.floor(yearOfEra / 100) + dayOfYear;
  return era * 146097 + dayOfEra - 719468;
}

/** Gregorian date of a day count from 1970-01-01 (Hinnant's `civil_from_days`, the inverse of `daysFromCivil`). */
export function civilFromDays(days: number): { year: number; month: number; day: number } {
  const z = days + 719468;
  const era = Math.floor(z / 146097);
  const dayOfEra = z - era * 146097;
  const yearOfEra = Math.floor(
    (dayOfEra - Math.floor(dayOfEra / 1460) + Math.floor(dayOfEra / 36524) - Math.floor(dayOfEra / 146096)) /
      365,
  );
  const dayOfYear = dayOfEra - (365 * yearOfEra + Math.floor(yearOfEra / 4) - Math.floor(yearOfEra / 100));
  const mp = Math.floor((5 * dayOfYear + 2) / 153);
  const day = dayOfYear - Math.floor((153 * mp + 2) / 5) + 1;
  const month = mp < 10 ? mp + 3 : mp - 9;
  return { year: yearOfEra + era * 400 + (month <= 2 ? 1 : 0), month, day };
}

/** Seconds from 1970-01-01T00:00 (same clock, no time zone) to a local time. */
export function secondsOf(time: LocalTime): number {
  return daysFromCivil(time.year, time.month, time.day) * SECONDS_PER_DAY + time.hour * 3600 +
    time.minute * 60;
}

/** Local time at a count of seconds from 1970-01-01T00:00, truncated to the minute. */
export function localTimeAt(seconds: number): LocalTime {
  const days = Math.floor(seconds / SECONDS_PER_DAY);
  const secondOfDay = seconds - days * SECONDS_PER_DAY;
  return {
    ...civilFromDays(days),
    hour: Math.floor(secondOfDay / 3600),
    minute: Math.floor((secondOfDay % 3600) / 60),
  };
}

/** Day of the year (1 = 1 January) of a date, counting 29 February in leap years. */
export function dayOfYearOf(year: number, month: number, day: number): number {
  return daysFromCivil(year, month, day) - daysFromCivil(year, 1, 1) + 1;
}

/** Formats a local time as ISO 8601 `YYYY-MM-DDTHH:MM`. */
export function formatLocalTime(time: LocalTime): string {
  const two = (n: number) => String(n).padStart(2, "0");
  return `${String(time.year).padStart(4, "0")}-${two(time.month)}-${two(time.day)}T${two(time.hour)}:${
    two(time.minute)
  }`;
}

/** Formats a duration in seconds as `N h` when whole hours, else `N min` or `N s`. */
export function formatDurationS(seconds: number): string {
  if (seconds % 3600 === 0) return `${seconds / 3600} h`;
  return seconds % 60 === 0 ? `${seconds / 60} min` : `${seconds} s`;
}

const ISO_LOCAL = /^(\d{4})-(\d{2})-(\d{2})T(\d{2}):(\d{2})(?::(\d{2}))?$/;

/**
 * Reads `YYYY-MM-DDTHH:MM` (optionally `:00` seconds) as local standard time; returns the reason as a phrase when the
 * text is not such a time.
 */
export function parseLocalTime(text: string): { ok: true; time: LocalTime } | { ok: false; reason: string } {
  if (/(Z|[+-]\d{2}(:?\d{2})?)$/.test(text) && /T/.test(text) && !ISO_LOCAL.test(text)) {
    return { ok: false, reason: "times are local standard time and carry no UTC offset or Z" };
  }
  const match = ISO_LOCAL.exec(text);
  if (match === null) return { ok: false, reason: "expected YYYY-MM-DDTHH:MM, e.g. 2031-07-21T14:00" };
  const [year, month, day, hour, minute, second] = match.slice(1).map((
    s,
  ) => (s === undefined ? 0 : Number(s)));
  if (month! < 1 || month! > 12) return { ok: false, reason: `month ${month} is not 1…12` };
  const length = daysInMonth(year!, month!);
  if (day! < 1 || day! > length) {
    return { ok: false, reason: `day ${day} is not in 1…${length} for ${match[1]}-${match[2]}` };
  }
  if (hour === 24) return { ok: false, reason: "hour 24 is not accepted: write 00:00 of the next day" };
  if (hour! > 23) return { ok: false, reason: `hour ${hour} is not 0…23` };
  if (minute! > 59) return { ok: false, reason: `minute ${minute} is not 0…59` };
  if (second !== 0) return { ok: false, reason: "seconds other than :00 are not accepted" };
  return { ok: true, time: { year: year!, month: month!, day: day!, hour: hour!, minute: minute! } };
}
