import { interpolateHourly } from "../climate/designDayProfile.ts";
import { longwaveCorrectionK, type SolAirSurface, solAirTerms } from "../climate/solAir.ts";
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
  /** Row times `YYYY-MM-DDTHH:MM`, made when asked for (a list of a million template strings costs hundreds of MB). */
  readonly timeLabels: StepLabels;
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
 * wrapping round at its end), and enters T_sa = T_o + α E/h_o − εΔR/h_o with the dry bulb at t_k. Surfaces with the
 * same orientation and ground reflectance share one transposed series (and one array), and those that also share
 * α, h_o and εΔR/h_o share one sol-air series: the sun is placed once per step, whatever the number of surfaces.
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
  const timeLabels = stepLabels(start, dt, n);
  const clockH = new Float64Array(n);
  const outdoorC = Float64Array.from(weather.dryBulbC);
  const indoorC = new Float64Array(n);
  const dayIndexOfStep = new Uint32Array(n);
  const firstDay = Math.floor((start - dt / 2) / 86400);
  // Surfaces facing the same way with the same ground reflectance share one transposition.
  const orientationOf = new Map<string, number>();
  const orientations: { azimuthDeg: number; tiltDeg: number; groundReflectance: number }[] = [];
  const orientationIndex = surfaces.map(({ surface, parameters: p }) => {
    if (surface.solAirC !== undefined) return -1;
    const key = `${p.azimuthDeg}|${p.tiltDeg}|${p.groundReflectance}`;
    let index = orientationOf.get(key);
    if (index === undefined) {
      index = orientations.length;
      orientationOf.set(key, index);
      orientations.push({
        azimuthDeg: p.azimuthDeg,
        tiltDeg: p.tiltDeg,
        groundReflectance: p.groundReflectance,
      });
    }
    return index;
  });
  const interval = orientations.map(() => new Float64Array(n));
  for (let k = 0; k < n; k++) {
    const seconds = start + k * dt;
    const time = localTimeAt(seconds);
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
    for (let o = 0; o < orientations.length; o++) {
      interval[o]![k] =
        transposeToSurface(horizontal, sun, dayOfYear, orientations[o]!, "isotropic").totalWPerM2;
    }
  }
  const incidentOf = interval.map((mean) => Float64Array.from(mean, (e, k) => (e + mean[(k + 1) % n]!) / 2));
  // Surfaces that also share absorptance, h_o and the long-wave term share the sol-air series.
  const solAirOf = new Map<string, Float64Array>();
  const boundaries = surfaces.map(({ surface, parameters }, s): WeatherSurfaceBoundary => {
    const given = surface.solAirC;
    if (given !== undefined) {
      return { solAirC: Float64Array.from(clockH, (h) => interpolateHourly(given, h)), incidentWPerM2: null };
    }
    const o = orientationIndex[s]!;
    const incident = incidentOf[o]!;
    const solAirSurface = {
      absorptance: parameters.absorptance ?? 0,
      outsideCoefficientWPerM2K: parameters.outsideCoefficient,
      tiltDeg: parameters.tiltDeg,
      longwave: { kind: "given", correctionK: parameters.longwaveCorrectionK } as const,
    };
    const key =
      `${o}|${solAirSurface.absorptance}|${solAirSurface.outsideCoefficientWPerM2K}|${parameters.longwaveCorrectionK}`;
    let solAirC = solAirOf.get(key);
    if (solAirC === undefined) {
      solAirC = solAirSeriesC(outdoorC, incident, solAirSurface);
      solAirOf.set(key, solAirC);
    }
    return { solAirC, incidentWPerM2: incident };
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

/**
 * Sol-air temperature at each step with the arithmetic of `solAirTerms` (α E / h_o added to T_o, then the long-wave
 * term subtracted) in one loop; the first step goes through `solAirTerms` itself so a bad h_o fails the same way.
 */
function solAirSeriesC(outdoorC: Float64Array, incident: Float64Array, surface: SolAirSurface): Float64Array {
  const n = outdoorC.length;
  const out = new Float64Array(n);
  if (n === 0) return out;
  out[0] = solAirTerms(outdoorC[0]!, incident[0]!, surface).solAirC;
  const absorptance = surface.absorptance;
  const h = surface.outsideCoefficientWPerM2K;
  const longwaveTermK = longwaveCorrectionK(surface.tiltDeg, surface.longwave);
  for (let k = 1; k < n; k++) {
    const solarTermK = (absorptance * incident[k]!) / h;
    out[k] = outdoorC[k]! + solarTermK - longwaveTermK;
  }
  return out;
}

/** Labels of the rows of a series: `length` and the label of row k; an array of strings is one too. */
export interface StepLabels {
  readonly length: number;
  at(index: number): string | undefined;
}

/** The labels `YYYY-MM-DDTHH:MM` of `count` rows from `startS` at step `dt`, each formatted when asked for. */
export function stepLabels(startS: number, dt: number, count: number): StepLabels {
  return {
    length: count,
    at: (index) =>
      Number.isInteger(index) && index >= 0 && index < count
        ? formatLocalTime(localTimeAt(startS + index * dt))
        : undefined,
  };
}
