import { interpolateHourly } from "../climate/designDayProfile.ts";
import { solAirTemperatureC } from "../climate/solAir.ts";
import { solarPosition } from "../climate/solarPosition.ts";
import { intervalMidpointH, transposeToSurface } from "../climate/transposition.ts";
import type { WeatherSeries } from "../climate/weatherCsv.ts";
import { dayOfYearOf, formatLocalTime, localTimeAt, secondsOf } from "../climate/weatherTime.ts";
import type { ScenarioSurface, Site, TemperatureProfile } from "../project/model.ts";
import type { SurfaceParameters } from "./surfaceParameters.ts";

/** A surface of a weather scenario with the parameter values it uses. */
export interface WeatherSurfaceInput {
  readonly surface: ScenarioSurface;
  readonly parameters: SurfaceParameters;
}

/** Sol-air temperature of one surface at each row time, with the irradiance that went into it. */
export interface WeatherSurfaceBoundary {
  /** °C at each row time. */
  readonly solAirC: Float64Array;
  /** Total irradiance on the surface at each row time, W/m² (null for a surface with given sol-air values). */
  readonly incidentWPerM2: Float64Array | null;
}

/** Outdoor, indoor and sol-air series of a weather year, with the calendar of its steps. */
export interface WeatherBoundary {
  /** ISO `YYYY-MM-DDTHH:MM` of each row. */
  readonly timeLabels: readonly string[];
  readonly outdoorC: Float64Array;
  readonly indoorC: Float64Array;
  readonly surfaces: readonly WeatherSurfaceBoundary[];
  /** Index (0 = first) of the calendar day of the interval ending at each row time. */
  readonly dayIndexOfStep: Uint32Array;
  /** Date `YYYY-MM-DD` of day index 0. */
  readonly firstDate: string;
  readonly dayCount: number;
}

/** Indoor temperature at a clock time: a constant, or 24 hourly values repeated every day (linear between hours). */
export function indoorAtC(profile: TemperatureProfile, clockTimeH: number): number {
  return profile.kind === "constant" ? profile.valueC : interpolateHourly(profile.hourlyC, clockTimeH);
}

/**
 * Boundary conditions at each row time t_k: the row's global and diffuse horizontal irradiance (means over the
 * interval ending at t_k) are transposed onto each surface with the isotropic sky and the sun at the interval
 * midpoint; the irradiance at t_k is the mean of the interval ending and the interval starting at t_k (the year
 * wrapping round at its end), and enters T_sa = T_o + α E/h_o − εΔR/h_o with the dry bulb at t_k.
 */
export function weatherBoundary(
  weather: WeatherSeries,
  site: Site,
  indoor: TemperatureProfile,
  surfaces: readonly WeatherSurfaceInput[],
): WeatherBoundary {
  const n = weather.count;
  const dt = weather.timestepS;
  const start = secondsOf(weather.startTime);
  const timeLabels: string[] = [];
  const clockH = new Float64Array(n);
  const outdoorC = Float64Array.from(weather.dryBulbC);
  const indoorC = new Float64Array(n);
  const dayIndexOfStep = new Uint32Array(n);
  const firstDay = Math.floor((start - dt / 2) / 86400);
  const interval = surfaces.map(() => new Float64Array(n));
  for (let k = 0; k < n; k++) {
    const seconds = start + k * dt;
    const time = localTimeAt(seconds);
    timeLabels.push(formatLocalTime(time));
    const endTimeH = time.hour + time.minute / 60;
    clockH[k] = endTimeH;
    indoorC[k] = indoorAtC(indoor, endTimeH);
    dayIndexOfStep[k] = Math.floor((seconds - dt / 2) / 86400) - firstDay;
    const dayOfYear = dayOfYearOf(time.year, time.month, time.day);
    const sun = solarPosition({
      latitudeDeg: site.latitudeDeg,
      longitudeDeg: site.longitudeDeg,
      timeZoneH: site.timeZoneH,
      dayOfYear,
      localStandardTimeH: intervalMidpointH(endTimeH, dt),
      year: time.year,
    }, "meeus");
    const horizontal = {
      globalHorizontalWPerM2: weather.globalHorizontalWPerM2[k]!,
      diffuseHorizontalWPerM2: weather.diffuseHorizontalWPerM2[k]!,
    };
    for (const [s, { surface, parameters }] of surfaces.entries()) {
      if (surface.solAirC !== undefined) continue;
      const orientation = {
        azimuthDeg: parameters.azimuthDeg,
        tiltDeg: parameters.tiltDeg,
        groundReflectance: parameters.groundReflectance,
      };
      interval[s]![k] = transposeToSurface(horizontal, sun, dayOfYear, orientation, "isotropic").totalWPerM2;
    }
  }
  const boundaries = surfaces.map(({ surface, parameters }, s): WeatherSurfaceBoundary => {
    const given = surface.solAirC;
    if (given !== undefined) {
      return { solAirC: Float64Array.from(clockH, (h) => interpolateHourly(given, h)), incidentWPerM2: null };
    }
    const mean = interval[s]!;
    const incident = Float64Array.from(mean, (e, k) => (e + mean[(k + 1) % n]!) / 2);
    const solAirSurface = {
      absorptance: parameters.absorptance ?? 0,
      outsideCoefficientWPerM2K: parameters.outsideCoefficient,
      tiltDeg: parameters.tiltDeg,
      longwave: { kind: "given", correctionK: parameters.longwaveCorrectionK } as const,
    };
    return {
      solAirC: Float64Array.from(incident, (e, k) => solAirTemperatureC(outdoorC[k]!, e, solAirSurface)),
      incidentWPerM2: incident,
    };
  });
  const lastDay = n === 0 ? 0 : dayIndexOfStep[n - 1]!;
  const first = localTimeAt(firstDay * 86400);
  return {
    timeLabels,
    outdoorC,
    indoorC,
    surfaces: boundaries,
    dayIndexOfStep,
    firstDate: formatLocalTime(first).slice(0, 10),
    dayCount: lastDay + 1,
  };
}
