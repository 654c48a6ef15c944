import { sinDeg } from "./_angles.ts";
import type { ClearSkyIrradiance } from "./clearSky.ts";
import {
  beamOnSurfaceWPerM2,
  cosIncidence,
  type SunDirection,
  type SurfaceOrientation,
} from "./incidence.ts";
import { groundReflectedWPerM2, type SkyDiffuseModel, skyDiffuseOnSurfaceWPerM2 } from "./skyDiffuse.ts";

/** A surface's orientation and the reflectance of the ground in front of it. */
export interface SolarSurface extends SurfaceOrientation {
  /** Ground reflectance ρ_g, dimensionless (0.2 typical). */
  readonly groundReflectance: number;
}

/** Irradiance on one surface split by component, W/m², with the incidence cosine used. */
export interface SurfaceIrradiance {
  /** Cosine of the angle of incidence (may be negative: sun behind the surface). */
  readonly cosIncidence: number;
  readonly beamWPerM2: number;
  readonly skyDiffuseWPerM2: number;
  readonly groundReflectedWPerM2: number;
  /** Sum of the three components, W/m². */
  readonly totalWPerM2: number;
}

/** Adds up the three components into a `SurfaceIrradiance`. */
export function surfaceIrradiance(
  cosTheta: number,
  beamWPerM2: number,
  skyDiffuseWPerM2: number,
  groundWPerM2: number,
): SurfaceIrradiance {
  return {
    cosIncidence: cosTheta,
    beamWPerM2,
    skyDiffuseWPerM2,
    groundReflectedWPerM2: groundWPerM2,
    totalWPerM2: beamWPerM2 + skyDiffuseWPerM2 + groundWPerM2,
  };
}

/**
 * Clear-sky irradiance on a surface (ASHRAE Handbook—Fundamentals 2013 Ch. 14 transposition): beam E_b·max(cos θ, 0),
 * sky diffuse by the chosen model, ground-reflected (E_b sin β + E_d)·ρ_g·(1 − cos Σ)/2; all zero with the sun down.
 */
export function clearSkySurfaceIrradiance(
  sun: SunDirection,
  sky: ClearSkyIrradiance,
  surface: SolarSurface,
  model: SkyDiffuseModel = "handbook",
): SurfaceIrradiance {
  const cosTheta = cosIncidence(sun, surface);
  if (!(sun.altitudeDeg > 0)) return surfaceIrradiance(cosTheta, 0, 0, 0);
  const globalHorizontal = sky.beamNormalWPerM2 * sinDeg(sun.altitudeDeg) + sky.diffuseHorizontalWPerM2;
  return surfaceIrradiance(
    cosTheta,
    beamOnSurfaceWPerM2(sky.beamNormalWPerM2, cosTheta),
    skyDiffuseOnSurfaceWPerM2(sky.diffuseHorizontalWPerM2, cosTheta, surface.tiltDeg, model),
    groundReflectedWPerM2(globalHorizontal, surface.groundReflectance, surface.tiltDeg),
  );
}
