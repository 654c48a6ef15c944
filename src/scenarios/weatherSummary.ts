import type { EnergyTotals } from "./types.ts";
import { civilFromDays, daysFromCivil } from "../climate/weatherTime.ts";
import type { StepLabels } from "./weatherBoundary.ts";
import type { WeatherSeries } from "../climate/weatherCsv.ts";
import type { CsvTable, CsvValue } from "../tables/csvTable.ts";

/** `scenarios.<id>.weather` of a weather scenario in results.json. */
export interface WeatherFileSummary {
  readonly path: string;
  readonly firstTime: string;
  readonly lastTime: string;
  readonly steps: number;
  readonly dryBulbMean_C: number;
  readonly dryBulbMin_C: number;
  readonly dryBulbMax_C: number;
  /** Global horizontal irradiation over the file, J/m². */
  readonly globalHorizontal_J_per_m2: number;
}

/** Gain and loss energy of one month, J. */
export interface MonthTotals {
  readonly gain_J: number;
  readonly loss_J: number;
}

/** A peak: value, hours since the first row, and the row time. */
export interface TimedPeak {
  /** W */
  readonly heatGain: number;
  readonly time_h: number;
  /** ISO `YYYY-MM-DDTHH:MM`, local standard time. */
  readonly time: string;
}

/** Daily largest, smallest and mean heat gain, W, one value per calendar day. */
export interface DailySummary {
  readonly max: number[];
  readonly min: number[];
  readonly mean: number[];
}

/** Energy totals of a power series, J: gain (positive part) and loss (negative part, as a positive number), per month too. */
export function energyTotals(
  powerW: ArrayLike<number>,
  monthOfStep: ArrayLike<number>,
  timestepS: number,
): Required<EnergyTotals> {
  const gain = new Array<number>(12).fill(0);
  const loss = new Array<number>(12).fill(0);
  for (let k = 0; k < powerW.length; k++) {
    const p = powerW[k]!;
    const m = monthOfStep[k]! - 1;
    if (p > 0) gain[m] = gain[m]! + p * timestepS;
    else loss[m] = loss[m]! - p * timestepS;
  }
  return {
    gain_J: gain.reduce((a, b) => a + b, 0),
    loss_J: loss.reduce((a, b) => a + b, 0),
    monthly: gain.map((g, m) => ({ gain_J: g, loss_J: loss[m]! })),
  };
}

/** Largest (`sign` +1) or most negative (`sign` −1) value of a power series with its time (first on ties). */
export function timedPeak(
  powerW: ArrayLike<number>,
  timeLabels: StepLabels,
  timestepS: number,
  sign: 1 | -1,
): TimedPeak {
  let index = 0;
  for (let k = 1; k < powerW.length; k++) if (sign * powerW[k]! > sign * powerW[index]!) index = k;
  return {
    heatGain: powerW[index] ?? NaN,
    time_h: (index * timestepS) / 3600,
    time: timeLabels.at(index) ?? "",
  };
}

/** Daily max, min and mean of a power series by the day index of each step, rounded to 0.01 W. */
export function dailySummary(
  powerW: ArrayLike<number>,
  dayIndexOfStep: ArrayLike<number>,
  days: number,
): DailySummary {
  const max = new Array<number>(days).fill(-Infinity);
  const min = new Array<number>(days).fill(Infinity);
  const sum = new Array<number>(days).fill(0);
  const count = new Array<number>(days).fill(0);
  for (let k = 0; k < powerW.length; k++) {
    const d = dayIndexOfStep[k]!;
    const p = powerW[k]!;
    max[d] = Math.max(max[d]!, p);
    min[d] = Math.min(min[d]!, p);
    sum[d] = sum[d]! + p;
    count[d] = count[d]! + 1;
  }
  const round = (v: number) => Math.round(v * 100) / 100;
  return { max: max.map(round), min: min.map(round), mean: sum.map((s, d) => round(s / count[d]!)) };
}

/** One surface's columns in the hourly CSV. */
export interface CsvSurface {
  readonly id: string;
  readonly incidentWPerM2: Float64Array | null;
  readonly solAirC: ArrayLike<number>;
  readonly insideWPerM2: ArrayLike<number>;
  /** m²: the heat gain column is inside flux × area, computed as the row is written (not held as a series). */
  readonly areaM2: number;
}

/** Columns of one surface in the hourly CSV, after `<id>:`. */
const SURFACE_COLUMNS = ["incident_W_m2", "sol_air_degC", "inside_flux_W_m2", "heat_gain_W"] as const;

/** The step series of a weather scenario's hourly CSV, held as arrays (the rows are made as they are written). */
export interface WeatherCsvSeries {
  readonly timeLabels: StepLabels;
  readonly outdoorC: ArrayLike<number>;
  readonly indoorC: ArrayLike<number>;
  readonly surfaces: readonly CsvSurface[];
  readonly totalW: ArrayLike<number>;
}

/**
 * The hourly CSV of a weather scenario: `time` (local standard time), `outdoor_degC`, `indoor_degC`, then per
 * surface `<id>:incident_W_m2`, `<id>:sol_air_degC`, `<id>:inside_flux_W_m2`, `<id>:heat_gain_W`, and
 * `total_heat_gain_W`; one row per step, made when the row is written.
 */
export function weatherCsvTable(path: string, series: WeatherCsvSeries): CsvTable {
  const { timeLabels, outdoorC, indoorC, surfaces, totalW } = series;
  return {
    path,
    header: [
      "time",
      "outdoor_degC",
      "indoor_degC",
      ...surfaces.flatMap((s) => SURFACE_COLUMNS.map((c) => `${s.id}:${c}`)),
      "total_heat_gain_W",
    ],
    rows: function* () {
      for (let k = 0; k < timeLabels.length; k++) {
        const cells: CsvValue[] = [timeLabels.at(k)!, outdoorC[k]!, indoorC[k]!];
        for (const s of surfaces) {
          cells.push(
            s.incidentWPerM2 === null ? null : s.incidentWPerM2[k]!,
            s.solAirC[k]!,
            s.insideWPerM2[k]!,
            s.insideWPerM2[k]! * s.areaM2,
          );
        }
        cells.push(totalW[k]!);
        yield cells;
      }
    },
  };
}

/**
 * The daily summary CSV of a weather scenario: `date`, then per surface `<id>:max_heat_gain_W`,
 * `<id>:min_heat_gain_W`, `<id>:mean_heat_gain_W`; one row per calendar day from `firstDate`.
 */
export function dailyCsvTable(
  path: string,
  firstDate: string,
  columns: readonly ({ id: string } & DailySummary)[],
): CsvTable {
  const [year, month, day] = firstDate.split("-").map(Number) as [number, number, number];
  const start = daysFromCivil(year, month, day);
  const days = columns[0]?.mean.length ?? 0;
  return {
    path,
    header: [
      "date",
      ...columns.flatMap((c) => ["max", "min", "mean"].map((k) => `${c.id}:${k}_heat_gain_W`)),
    ],
    rows: function* () {
      for (let d = 0; d < days; d++) {
        const date = civilFromDays(start + d);
        const label = `${date.year}-${String(date.month).padStart(2, "0")}-${
          String(date.day).padStart(2, "0")
        }`;
        yield [label, ...columns.flatMap((c) => [c.max[d]!, c.min[d]!, c.mean[d]!])];
      }
    },
  };
}

/** The weather file's extent and dry-bulb and irradiation summary for results.json `scenarios.<id>.weather`. */
export function weatherSummary(
  path: string,
  weather: WeatherSeries,
  timeLabels: StepLabels,
): WeatherFileSummary {
  let sum = 0;
  let min = Infinity;
  let max = -Infinity;
  let global = 0;
  for (let k = 0; k < weather.count; k++) {
    const t = weather.dryBulbC[k]!;
    sum += t;
    min = Math.min(min, t);
    max = Math.max(max, t);
    global += weather.globalHorizontalWPerM2[k]! * weather.timestepS;
  }
  return {
    path,
    firstTime: timeLabels.at(0) ?? "",
    lastTime: timeLabels.at(timeLabels.length - 1) ?? "",
    steps: weather.count,
    dryBulbMean_C: sum / weather.count,
    dryBulbMin_C: min,
    dryBulbMax_C: max,
    globalHorizontal_J_per_m2: global,
  };
}
