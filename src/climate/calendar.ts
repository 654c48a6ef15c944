/** Days in each month of the non-leap design year (index 0 = January). */
const DAYS_IN_MONTH_NON_LEAP = [31, 28, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31] as const;

/**
 * Default calendar year for the astronomical solar position when a design day names no year: 2026, the middle
 * non-leap year of the 2024–2028 leap cycle, so the calendar-to-orbit offset is mid-range.
 */
export const DESIGN_REFERENCE_YEAR = 2026;

/** Day of year (1 = 1 January) of a month (1…12) and day in the non-leap design year. */
export function dayOfYear(month: number, day: number): number {
  if (!Number.isInteger(month) || month < 1 || month > 12) {
    throw new RangeError(`Cannot compute day of year: month "${month}" is not an integer 1…12`);
  }
  const monthLength = DAYS_IN_MONTH_NON_LEAP[month - 1] ?? 0;
  if (!Number.isInteger(day) || day < 1 || day > monthLength) {
    throw new RangeError(
      `Cannot compute day of year: day "${day}" is not in 1…${monthLength} for month ${month}`,
    );
  }
  let total = day;
  for (let m = 0; m < month - 1; m++) total += DAYS_IN_MONTH_NON_LEAP[m] ?? 0;
  return total;
}

/** Whether a Gregorian calendar year is a leap year. */
export function isLeapYear(year: number): boolean {
  return (year % 4 === 0 && year % 100 !== 0) || year % 400 === 0;
}

/**
 * Julian Day of an instant given as Gregorian year, day of year (1 = 1 January of that year) and hours of
 * Universal Time; Meeus, Astronomical Algorithms, 2nd ed. (1998), Ch. 7, Eq. 7.1, taken for 0 January.
 */
export function julianDay(year: number, dayOfYearInYear: number, universalTimeH: number): number {
  // 0 January of `year` is written as month 13 of the previous year (Meeus Ch. 7: January → month 13).
  const y = year - 1;
  const m = 13;
  const a = Math.floor(y / 100);
  const b = 2 - a + Math.floor(a / 4);
  const jdJanuary0 = Math.floor(365.25 * (y + 4716)) + Math.floor(30.6001 * (m + 1)) + b - 1524.5;
  return jdJanuary0 + dayOfYearInYear + universalTimeH / 24;
}
