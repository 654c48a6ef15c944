import { clampUnit, cosDeg, sinDeg, toDeg } from "./_angles.ts";

/** Orientation of a plane surface: azimuth of its outward normal and tilt from the horizontal. */
export interface SurfaceOrientation {
  /** Azimuth of the outward normal, degrees clockwise from north (180 = facing south). */
  readonly azimuthDeg: number;
  /** Tilt from the horizontal, degrees: 0 = facing up, 90 = vertical, 180 = facing down. */
  readonly tiltDeg: number;
}

/** Sun direction in the sky. */
export interface SunDirection {
  /** Solar altitude above the horizon, degrees. */
  readonly altitudeDeg: number;
  /** Solar azimuth, degrees clockwise from north. */
  readonly azimuthDeg: number;
}

/**
 * Cosine of the angle of incidence between the sun's rays and the outward surface normal,
 * cos θ = cos β cos(φ − ψ) sin Σ + sin β cos Σ (ASHRAE Handbook—Fundamentals 2013 Ch. 14, from memory Eq. 22;
 * also Duffie & Beckman, Solar Engineering of Thermal Processes); negative when the sun is behind the surface.
 */
export function cosIncidence(sun: SunDirection, surface: SurfaceOrientation): number {
  const surfaceSolarAzimuthDeg = sun.azimuthDeg - surface.azimuthDeg;
  return clampUnit(
    cosDeg(sun.altitudeDeg) * cosDeg(surfaceSolarAzimuthDeg) * sinDeg(surface.tiltDeg) +
      sinDeg(sun.altitudeDeg) * cosDeg(surface.tiltDeg),
  );
}

/** Angle of incidence θ in degrees (0 = sun along the normal, > 90 = sun behind the surface). */
export function incidenceAngleDeg(sun: SunDirection, surface: SurfaceOrientation): number {
  return toDeg(Math.acos(cosIncidence(sun, surface)));
}

/** Beam irradiance on a surface from the beam normal irradiance: E_b·max(cos θ, 0), W/m². */
export function beamOnSurfaceWPerM2(beamNormalWPerM2: number, cosTheta: number): number {
  return beamNormalWPerM2 * Math.max(cosTheta, 0);
}
