/**
 * Cooling load from conduction heat gain by the radiant time series method (ASHRAE Handbook—Fundamentals,
 * nonresidential cooling load chapter): Q(h) = q_conv(h) + Σ_j r_j q_rad(h − j), hourly, day repeated.
 */
import type { RadiantTimeSeries } from "../project/model.ts";
import type { CoolingLoadResults } from "./heatingTypes.ts";
import type { SurfaceResults } from "./types.ts";
import { peakOf, sumSeries } from "./seriesStats.ts";

const HOURS = 24;

/** Values at the full hours 0:00 … 23:00 of a day series with `stepsPerHour` steps per hour. */
export function atFullHours(series: readonly number[], stepsPerHour: number): number[] {
  return Array.from({ length: HOURS }, (_, h) => series[h * stepsPerHour] ?? NaN);
}

/**
 * Hourly cooling load, W, of a 24-hour periodic gain split into convective and radiant parts (both hourly):
 * the radiant part is spread over the following hours by r_0 … r_23, wrapping around the repeated day.
 */
export function radiantTimeSeriesLoad(
  convectiveW: readonly number[],
  radiantW: readonly number[],
  rts: readonly number[],
): number[] {
  return Array.from({ length: HOURS }, (_, h) => {
    let load = convectiveW[h] ?? NaN;
    for (let j = 0; j < HOURS; j++) load += (rts[j] ?? 0) * (radiantW[(h - j + HOURS) % HOURS] ?? NaN);
    return load;
  });
}

/** The cooling load of every surface and the total, from the design day's split heat gains. */
export function designDayCoolingLoad(
  surfaces: Readonly<Record<string, SurfaceResults>>,
  rts: RadiantTimeSeries,
  timestepS: number,
): { surfaces: Record<string, SurfaceResults>; total: CoolingLoadResults } {
  const stepsPerHour = Math.round(3600 / timestepS);
  const out: Record<string, SurfaceResults> = {};
  for (const [id, s] of Object.entries(surfaces)) {
    const load = radiantTimeSeriesLoad(
      atFullHours(s.convectiveGain, stepsPerHour),
      atFullHours(s.radiantGain, stepsPerHour),
      rts.values,
    );
    const peak = peakOf(load);
    out[id] = { ...s, coolingLoad: load, coolingLoadPeak: { value: peak.value, time_h: peak.index } };
  }
  const loads = Object.values(out).map((s) => s.coolingLoad ?? []);
  const total = sumSeries(loads, HOURS);
  const gains = sumSeries(Object.values(surfaces).map((s) => atFullHours(s.heatGain, stepsPerHour)), HOURS);
  const peak = peakOf(total);
  const gainPeak = peakOf(gains);
  return {
    surfaces: out,
    total: {
      timestep_h: 1,
      total,
      peak: { value: peak.value, time_h: peak.index },
      totalHeatGain: gains,
      heatGainPeak: { value: gainPeak.value, time_h: gainPeak.index },
      radiantTimeSeries: {
        values: [...rts.values],
        source: rts.source,
        ...(rts.room === undefined ? {} : { room: rts.room }),
      },
    },
  };
}

/** The statements the package prints about the cooling load method and its limits. */
export function coolingLoadNotes(timestepS: number): string[] {
  const subHourly = timestepS < 3600
    ? [
      `The scenario's time step is ${
        timestepS / 60
      } min; the radiant time series is hourly, so the heat gains are taken at the full hours (00:00, 01:00, …) and the cooling load is given per hour.`,
    ]
    : [];
  return [
    "Cooling load by the radiant time series method: load at hour h = convective gain at h + Σ r_j × radiant gain at h − j (j = 0 … 23), the day repeated.",
    ...subHourly,
  ];
}
