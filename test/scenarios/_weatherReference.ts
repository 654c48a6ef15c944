/**
 * The straightforward weather-year computation, kept as the reference for the optimised one: every surface transposed
 * on its own at every step with `solAirTemperatureC`, and the fluxes stepped through `SurfaceRecursion` (four
 * `ModalFilter`s per surface). Used by the equality tests and by bench/hourly_table.ts as the "before" path.
 */
import { solAirTemperatureC } from "../../src/climate/solAir.ts";
import { solarPosition } from "../../src/climate/solarPosition.ts";
import { intervalMidpointH, transposeToSurface } from "../../src/climate/transposition.ts";
import type { WeatherSeries } from "../../src/climate/weatherCsv.ts";
import { dayOfYearOf, localTimeAt, secondsOf } from "../../src/climate/weatherTime.ts";
import { type FluxModes, SurfaceRecursion } from "../../src/engine/surfaceFlux.ts";
import type { Site } from "../../src/project/model.ts";
import type { StepFluxes } from "../../src/scenarios/weatherRecursion.ts";
import type { SurfaceParameters } from "../../src/scenarios/surfaceParameters.ts";

/** Incident irradiance and sol-air temperature of each surface, computed surface by surface and step by step. */
export function referenceSolAir(
  weather: WeatherSeries,
  site: Site,
  parameters: readonly SurfaceParameters[],
): { incidentWPerM2: Float64Array; solAirC: Float64Array }[] {
  const n = weather.count;
  const dt = weather.timestepS;
  const start = secondsOf(weather.startTime);
  const interval = parameters.map(() => new Float64Array(n));
  for (let k = 0; k < n; k++) {
    const time = localTimeAt(start + k * dt);
    const endTimeH = time.hour + time.minute / 60;
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
    for (const [s, p] of parameters.entries()) {
      const orientation = {
        azimuthDeg: p.azimuthDeg,
        tiltDeg: p.tiltDeg,
        groundReflectance: p.groundReflectance,
      };
      interval[s]![k] = transposeToSurface(horizontal, sun, dayOfYear, orientation, "isotropic").totalWPerM2;
    }
  }
  return parameters.map((p, s) => {
    const mean = interval[s]!;
    const incidentWPerM2 = Float64Array.from(mean, (e, k) => (e + mean[(k + 1) % n]!) / 2);
    const surface = {
      absorptance: p.absorptance ?? 0,
      outsideCoefficientWPerM2K: p.outsideCoefficient,
      tiltDeg: p.tiltDeg,
      longwave: { kind: "given", correctionK: p.longwaveCorrectionK } as const,
    };
    const solAirC = Float64Array.from(
      incidentWPerM2,
      (e, k) => solAirTemperatureC(weather.dryBulbC[k]!, e, surface),
    );
    return { incidentWPerM2, solAirC };
  });
}

/**
 * Fluxes after the periodic warm-up by stepping `SurfaceRecursion`: the last `warmUpSteps` steps (wrapping round)
 * from a steady state at their means, then the first `length` steps.
 */
export function referenceFluxes(
  modes: FluxModes,
  solAirC: ArrayLike<number>,
  indoorC: ArrayLike<number>,
  warmUpSteps: number,
  length: number,
): StepFluxes {
  const n = solAirC.length;
  const index = (j: number) => (((n - warmUpSteps + j) % n) + n) % n;
  let meanOut = 0;
  let meanIn = 0;
  for (let j = 0; j < warmUpSteps; j++) {
    meanOut += solAirC[index(j)]!;
    meanIn += indoorC[index(j)]!;
  }
  const run = new SurfaceRecursion(
    modes,
    warmUpSteps > 0 ? meanOut / warmUpSteps : solAirC[0]!,
    warmUpSteps > 0 ? meanIn / warmUpSteps : indoorC[0]!,
  );
  for (let j = 0; j < warmUpSteps; j++) run.step(solAirC[index(j)]!, indoorC[index(j)]!);
  const insideWPerM2 = new Float64Array(length);
  const outsideWPerM2 = new Float64Array(length);
  for (let k = 0; k < length; k++) {
    const [inside, outside] = run.step(solAirC[k % n]!, indoorC[k % n]!);
    insideWPerM2[k] = inside;
    outsideWPerM2[k] = outside;
  }
  return { insideWPerM2, outsideWPerM2 };
}
