import { cosDeg, sinDeg } from "./_angles.ts";
import { extraterrestrialNormalWPerM2 } from "./clearSky.ts";
import { type SolarSurface, type SurfaceIrradiance, surfaceIrradiance } from "./clearSkySurface.ts";
import { beamOnSurfaceWPerM2, cosIncidence, type SunDirection } from "./incidence.ts";
import { groundReflectedWPerM2 } from "./skyDiffuse.ts";
import { type SolarPosition, solarPosition, type SolarPositionInput } from "./solarPosition.ts";

/** Sky model that splits measured diffuse horizontal irradiance onto a tilted surface. */
export type TranspositionModel =
  /** Isotropic sky, Liu & Jordan (1963) Solar Energy 7(2): sky diffuse E_dh(1 + cos Σ)/2. */
  | "isotropic"
  /**
   * Hay & Davies (1980), "Calculation of the solar radiation incident on an inclined surface", Proc. First Canadian
   * Solar Radiation Data Workshop, pp. 59–72 (from memory): circumsolar share A_i = E_bn/E_0 follows the beam.
   */
  | "hay-davies";

/** Measured horizontal irradiance of one weather-file interval, W/m² (means over the interval). */
export interface HorizontalIrradiance {
  readonly globalHorizontalWPerM2: number;
  readonly diffuseHorizontalWPerM2: number;
}

/** Below this solar altitude the beam is treated as diffuse (beam horizontal / sin β is ill-conditioned). */
export const LOW_SUN_ALTITUDE_DEG = 2;

/** Transposed irradiance on a surface with the split of the horizontal data that was used. */
export interface TransposedIrradiance extends SurfaceIrradiance {
  readonly model: TranspositionModel;
  /** Beam horizontal used, W/m²: max(global − diffuse, 0), or 0 when the low-sun guard applied. */
  readonly beamHorizontalWPerM2: number;
  /** Beam normal derived from it, W/m²: beam horizontal / sin β. */
  readonly beamNormalWPerM2: number;
  /** Diffuse horizontal used, W/m²: the measured value, or the global when the low-sun guard applied. */
  readonly diffuseHorizontalWPerM2: number;
  /** Whether the sun was below `LOW_SUN_ALTITUDE_DEG`, so the whole global irradiance was treated as diffuse. */
  readonly lowSunGuard: boolean;
}

/**
 * Global and diffuse horizontal → beam horizontal → irradiance on a tilted surface, for one sun position: beam
 * E_bn·max(cos θ, 0), sky diffuse by the chosen model, ground-reflected E_gh·ρ_g(1 − cos Σ)/2. With the sun below
 * 2° the beam is put into the diffuse (stated rule).
 */
export function transposeToSurface(
  horizontal: HorizontalIrradiance,
  sun: SunDirection,
  dayOfYear: number,
  surface: SolarSurface,
  model: TranspositionModel,
): TransposedIrradiance {
  const global = Math.max(horizontal.globalHorizontalWPerM2, 0);
  const lowSunGuard = !(sun.altitudeDeg >= LOW_SUN_ALTITUDE_DEG);
  const beamHorizontal = lowSunGuard ? 0 : Math.max(global - horizontal.diffuseHorizontalWPerM2, 0);
  const diffuseHorizontal = global - beamHorizontal;
  const sinAltitude = sinDeg(sun.altitudeDeg);
  const beamNormal = beamHorizontal > 0 ? beamHorizontal / sinAltitude : 0;
  const cosTheta = cosIncidence(sun, surface);
  const isotropicSky = (diffuseHorizontal * (1 + cosDeg(surface.tiltDeg))) / 2;
  let skyDiffuse: number;
  switch (model) {
    case "isotropic":
      skyDiffuse = isotropicSky;
      break;
    case "hay-davies": {
      // Anisotropy index A_i = E_bn/E_0 (≤ 1) and beam ratio R_b = max(cos θ, 0)/sin β (Hay & Davies 1980).
      const anisotropyIndex = Math.min(beamNormal / extraterrestrialNormalWPerM2(dayOfYear), 1);
      const beamRatio = lowSunGuard ? 0 : Math.max(cosTheta, 0) / sinAltitude;
      skyDiffuse = diffuseHorizontal * anisotropyIndex * beamRatio + (1 - anisotropyIndex) * isotropicSky;
      break;
    }
  }
  return {
    ...surfaceIrradiance(
      cosTheta,
      beamOnSurfaceWPerM2(beamNormal, cosTheta),
      skyDiffuse,
      groundReflectedWPerM2(global, surface.groundReflectance, surface.tiltDeg),
    ),
    model,
    beamHorizontalWPerM2: beamHorizontal,
    beamNormalWPerM2: beamNormal,
    diffuseHorizontalWPerM2: diffuseHorizontal,
    lowSunGuard,
  };
}

/** Clock time at the middle of a weather interval that ends at `endTimeH`, hours local standard time. */
export function intervalMidpointH(endTimeH: number, timestepS: number): number {
  return endTimeH - timestepS / 7200;
}

/** One weather-file row to transpose: where, when (end of the interval) and what was measured. */
export interface WeatherStepInput {
  readonly site: Omit<SolarPositionInput, "dayOfYear" | "localStandardTimeH">;
  readonly dayOfYear: number;
  /** Row time `time`, hours local standard time; the irradiance is the mean over the interval ending here. */
  readonly endTimeH: number;
  readonly timestepS: number;
  readonly horizontal: HorizontalIrradiance;
}

/**
 * Transposes one weather row onto a surface using the sun position at the interval midpoint (time − Δ/2), since the
 * row's irradiance is the mean over the interval ending at its time.
 */
export function transposeWeatherStep(
  step: WeatherStepInput,
  surface: SolarSurface,
  model: TranspositionModel,
): { readonly sun: SolarPosition; readonly irradiance: TransposedIrradiance } {
  const sun = solarPosition({
    ...step.site,
    dayOfYear: step.dayOfYear,
    localStandardTimeH: intervalMidpointH(step.endTimeH, step.timestepS),
  });
  return { sun, irradiance: transposeToSurface(step.horizontal, sun, step.dayOfYear, surface, model) };
}
