/**
 * Fraction of the daily dry-bulb range below the daily maximum, as printed for hours 1…24, from ASHRAE
 * Handbook—Fundamentals (2009 and later, SI), Ch. 14 "Climatic Design Information", Table 6 "Fraction of Daily
 * Temperature Range" (edition, table number and values from memory; check against the printed table). Element i is
 * the printed hour i + 1; fluxnote reads the printed hours as local standard time (our stated rule).
 */
// deno-fmt-ignore
export const FRACTION_OF_DAILY_RANGE_BY_HANDBOOK_HOUR: readonly number[] = [
  0.87, 0.92, 0.96, 0.99, 1.00, 0.98, 0.93, 0.84, 0.71, 0.56, 0.39, 0.23,
  0.11, 0.03, 0.00, 0.03, 0.10, 0.21, 0.34, 0.47, 0.58, 0.68, 0.76, 0.82,
];

/**
 * The same fractions in fluxnote's convention: index k is the value at k:00 local standard time (k = 0…23), so the
 * handbook's hour h (1…23) is index h and its hour 24 is index 0 (midnight starting the day).
 */
export const FRACTION_OF_DAILY_RANGE_AT_HOUR: readonly number[] = [
  FRACTION_OF_DAILY_RANGE_BY_HANDBOOK_HOUR[23] ?? Number.NaN,
  ...FRACTION_OF_DAILY_RANGE_BY_HANDBOOK_HOUR.slice(0, 23),
];

/** Design-day maximum dry bulb and the daily range below it. */
export interface DailyRangeInput {
  /** Design maximum dry-bulb temperature, °C. */
  readonly maxDryBulbC: number;
  /** Daily dry-bulb range (maximum minus minimum), K. */
  readonly dailyRangeK: number;
}

/** Hourly design-day dry bulb T(k) = Tmax − f(k)·range at k:00 local standard time, k = 0…23. */
export function designDayHourlyC(input: DailyRangeInput): number[] {
  if (!(input.dailyRangeK >= 0)) {
    throw new RangeError(
      `Cannot build a design-day profile: daily range "${input.dailyRangeK}" K is negative`,
    );
  }
  return FRACTION_OF_DAILY_RANGE_AT_HOUR.map((fraction) => input.maxDryBulbC - fraction * input.dailyRangeK);
}

/**
 * Value of a 24-value hourly list (index k = value at k:00) at any clock time, by straight-line interpolation
 * between hours, periodic over the day (23:00 → 24:00 interpolates toward index 0).
 */
export function interpolateHourly(hourlyValues: readonly number[], clockTimeH: number): number {
  if (hourlyValues.length !== 24) {
    throw new RangeError(
      `Cannot interpolate an hourly list: expected 24 values, found ${hourlyValues.length}`,
    );
  }
  const wrappedH = ((clockTimeH % 24) + 24) % 24;
  const lowerHour = Math.floor(wrappedH);
  const weight = wrappedH - lowerHour;
  const lower = hourlyValues[lowerHour % 24] ?? Number.NaN;
  const upper = hourlyValues[(lowerHour + 1) % 24] ?? Number.NaN;
  return weight === 0 ? lower : lower + weight * (upper - lower);
}

/** Number of time steps per day for a timestep in seconds that divides one hour exactly. */
export function stepsPerDay(timestepS: number): number {
  if (!Number.isInteger(timestepS) || timestepS <= 0 || 3600 % timestepS !== 0) {
    throw new RangeError(
      `Cannot use timestep "${timestepS}" s: it must be a whole number of seconds dividing 3600`,
    );
  }
  return (24 * 3600) / timestepS;
}

/** Expands a 24-value hourly list to one value per time step, at k·Δ local standard time (k = 0…steps − 1). */
export function expandHourlyToSteps(hourlyValues: readonly number[], timestepS: number): number[] {
  const count = stepsPerDay(timestepS);
  return Array.from({ length: count }, (_, k) => interpolateHourly(hourlyValues, (k * timestepS) / 3600));
}

/** Design-day dry bulb at each time step k·Δ (local standard time), interpolated between the hourly values. */
export function designDayStepsC(input: DailyRangeInput, timestepS: number): number[] {
  return expandHourlyToSteps(designDayHourlyC(input), timestepS);
}
