import { dayOfYear } from "./calendar.ts";
import { type ClearSkyEdition, clearSkyIrradiance } from "./clearSky.ts";
import { clearSkySurfaceIrradiance, type SurfaceIrradiance, surfaceIrradiance } from "./clearSkySurface.ts";
import { cosIncidence } from "./incidence.ts";
import { designDayHourlyC, expandHourlyToSteps, stepsPerDay } from "./designDayProfile.ts";
import { type SkyDiffuseModel } from "./skyDiffuse.ts";
import { type LongwaveCorrection, longwaveCorrectionK, type SolAirTerms, solAirTerms } from "./solAir.ts";
import { type SolarPosition, solarPosition, type SolarPositionMethod } from "./solarPosition.ts";

/** How each sky-diffuse model is named in the package (in words, not by its input value). */
const SKY_DIFFUSE_WORDS: Readonly<Record<SkyDiffuseModel, string>> = {
  handbook:
    "by the ASHRAE Handbook—Fundamentals ratio Y for vertical surfaces and its rule for other tilts (from memory)",
  isotropic: "isotropic (Liu & Jordan 1963)",
};

/** Outdoor dry bulb of a design day: from maximum and daily range, or 24 hourly values (index k = k:00). */
export type OutdoorProfile =
  | { readonly kind: "daily-range"; readonly maxDryBulbC: number; readonly dailyRangeK: number }
  | { readonly kind: "hourly"; readonly hourlyC: readonly number[] };

/** Sky of a design day: the ASHRAE clear-sky model with site optical depths, or no solar irradiance at all. */
export type DesignSky =
  | {
    readonly kind: "clear-sky";
    readonly beamOpticalDepth: number;
    readonly diffuseOpticalDepth: number;
    readonly edition: ClearSkyEdition;
    readonly skyDiffuseModel: SkyDiffuseModel;
  }
  | { readonly kind: "none" };

/** An outside surface: sun-exposed with its properties, or with a sol-air profile given by the user. */
export type BoundarySurface =
  | {
    readonly kind: "solar";
    readonly id: string;
    readonly azimuthDeg: number;
    readonly tiltDeg: number;
    readonly absorptance: number;
    readonly outsideCoefficientWPerM2K: number;
    readonly groundReflectance: number;
    readonly longwave: LongwaveCorrection;
  }
  | { readonly kind: "given-sol-air"; readonly id: string; readonly hourlyC: readonly number[] };

/** A design-day scenario, complete and in SI (validated and defaulted by the project reader). */
export interface DesignDayInput {
  readonly site: {
    readonly latitudeDeg: number;
    readonly longitudeDeg: number;
    readonly timeZoneH: number;
    readonly year?: number;
  };
  /** Month 1…12 and day of the non-leap design year. */
  readonly month: number;
  readonly day: number;
  /** Time step in seconds, dividing 3600. */
  readonly timestepS: number;
  readonly outdoor: OutdoorProfile;
  readonly sky: DesignSky;
  readonly surfaces: readonly BoundarySurface[];
  readonly solarPositionMethod: SolarPositionMethod;
}

/** Boundary conditions of one surface at every step. */
export type SurfaceBoundary =
  | {
    readonly kind: "solar";
    readonly id: string;
    readonly solAirC: number[];
    readonly irradiance: SurfaceIrradiance[];
    readonly terms: SolAirTerms[];
  }
  | { readonly kind: "given-sol-air"; readonly id: string; readonly solAirC: number[] };

/** Design-day boundary conditions at t_k = k·Δ, local standard time, with the conventions used stated. */
export interface DesignDayBoundary {
  readonly timeBase: "local standard time";
  readonly dayOfYear: number;
  readonly timestepS: number;
  /** Clock time of each step, hours local standard time. */
  readonly timesH: number[];
  readonly outdoorC: number[];
  readonly sunPosition: SolarPosition[];
  readonly surfaces: SurfaceBoundary[];
  /** One sentence per convention or rule applied, for the package's assumptions section. */
  readonly notes: string[];
}

/**
 * Outdoor, irradiance and sol-air series for a design day at every time step k·Δ (local standard time); solar time is
 * obtained from it by the equation of time plus the longitude correction (longitude − 15°·time zone)/15°.
 */
export function designDayBoundary(input: DesignDayInput): DesignDayBoundary {
  const n = dayOfYear(input.month, input.day);
  const count = stepsPerDay(input.timestepS);
  const timesH = Array.from({ length: count }, (_, k) => (k * input.timestepS) / 3600);
  const hourlyOutdoor = input.outdoor.kind === "daily-range"
    ? designDayHourlyC(input.outdoor)
    : input.outdoor.hourlyC;
  const outdoorC = expandHourlyToSteps(hourlyOutdoor, input.timestepS);
  const sunPosition = timesH.map((t) =>
    solarPosition({ ...input.site, dayOfYear: n, localStandardTimeH: t }, input.solarPositionMethod)
  );
  const notes = [
    "Time base: local standard time; value k is at k·Δ, hourly lists are interpolated linearly between hours.",
    "Solar time: local standard time + equation of time + (longitude − 15°·time zone)/15° per hour.",
  ];
  if (input.outdoor.kind === "daily-range") {
    notes.push(
      "Outdoor dry bulb: T = Tmax − f·range, f from ASHRAE Fundamentals Ch. 14 fraction of daily range.",
    );
  }
  const { sky } = input;
  switch (sky.kind) {
    case "clear-sky":
      notes.push(
        `Irradiance: ASHRAE clear-sky model, ${sky.edition} exponents, sky diffuse ${
          SKY_DIFFUSE_WORDS[sky.skyDiffuseModel]
        }.`,
      );
      break;
    case "none":
      notes.push("Irradiance: none (sky model off); sol-air = outdoor − long-wave correction.");
      break;
  }
  const surfaces = input.surfaces.map((surface): SurfaceBoundary => {
    switch (surface.kind) {
      case "given-sol-air":
        return {
          kind: "given-sol-air",
          id: surface.id,
          solAirC: expandHourlyToSteps(surface.hourlyC, input.timestepS),
        };
      case "solar": {
        const irradiance = sunPosition.map((sun) => {
          switch (sky.kind) {
            case "clear-sky":
              return clearSkySurfaceIrradiance(
                sun,
                clearSkyIrradiance(sun.altitudeDeg, n, sky, sky.edition),
                surface,
                sky.skyDiffuseModel,
              );
            case "none":
              return surfaceIrradiance(cosIncidence(sun, surface), 0, 0, 0);
          }
        });
        const terms = irradiance.map((e, k) =>
          solAirTerms(outdoorC[k] ?? Number.NaN, e.totalWPerM2, surface)
        );
        const correctionK = longwaveCorrectionK(surface.tiltDeg, surface.longwave);
        notes.push(
          `Surface "${surface.id}": long-wave correction ${correctionK.toFixed(2)} K (${
            surface.longwave.kind === "by-tilt"
              ? "3.9 K × cos tilt below 90°, else 0: a method choice of this package"
              : "given"
          }).`,
        );
        return { kind: "solar", id: surface.id, solAirC: terms.map((t) => t.solAirC), irradiance, terms };
      }
    }
  });
  return {
    timeBase: "local standard time",
    dayOfYear: n,
    timestepS: input.timestepS,
    timesH,
    outdoorC,
    sunPosition,
    surfaces,
    notes,
  };
}
