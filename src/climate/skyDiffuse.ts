import { cosDeg, sinDeg } from "./_angles.ts";

/** How sky diffuse irradiance on a surface is obtained from the diffuse horizontal irradiance. */
export type SkyDiffuseModel =
  /** ASHRAE Handbook—Fundamentals (2013) Ch. 14 ratio Y for vertical surfaces and its rule for other tilts. */
  | "handbook"
  /** Isotropic sky (Liu & Jordan 1963): E_d(1 + cos Σ)/2. */
  | "isotropic";

/**
 * Ratio Y of sky diffuse on a vertical surface to diffuse on the horizontal, Y = max(0.45, 0.55 + 0.437 cos θ +
 * 0.313 cos² θ) (ASHRAE Handbook—Fundamentals 2013 Ch. 14, from memory Eq. 27; the "max" form switches to 0.45 at
 * cos θ ≈ −0.288, where the printed text states the switch at cos θ = −0.2; the two differ in Y by ≤ 0.025).
 */
export function verticalDiffuseRatio(cosTheta: number): number {
  return Math.max(0.45, 0.55 + 0.437 * cosTheta + 0.313 * cosTheta * cosTheta);
}

/**
 * Sky diffuse irradiance on a surface, W/m²: handbook rule E_d(Y sin Σ + cos Σ) for Σ ≤ 90° and E_d·Y·sin Σ for Σ > 90°
 * (ASHRAE Handbook—Fundamentals 2013 Ch. 14, from memory Eqs. 28–29), or isotropic E_d(1 + cos Σ)/2.
 */
export function skyDiffuseOnSurfaceWPerM2(
  diffuseHorizontalWPerM2: number,
  cosTheta: number,
  tiltDeg: number,
  model: SkyDiffuseModel,
): number {
  switch (model) {
    case "handbook": {
      const y = verticalDiffuseRatio(cosTheta);
      return tiltDeg <= 90
        ? diffuseHorizontalWPerM2 * (y * sinDeg(tiltDeg) + cosDeg(tiltDeg))
        : diffuseHorizontalWPerM2 * y * sinDeg(tiltDeg);
    }
    case "isotropic":
      return (diffuseHorizontalWPerM2 * (1 + cosDeg(tiltDeg))) / 2;
  }
}

/**
 * Ground-reflected irradiance on a surface, E_r = (E_b sin β + E_d)·ρ_g·(1 − cos Σ)/2, W/m² (isotropic ground,
 * ASHRAE Handbook—Fundamentals 2013 Ch. 14, from memory Eq. 30), with E_b sin β + E_d the global horizontal.
 */
export function groundReflectedWPerM2(
  globalHorizontalWPerM2: number,
  groundReflectance: number,
  tiltDeg: number,
): number {
  return (globalHorizontalWPerM2 * groundReflectance * (1 - cosDeg(tiltDeg))) / 2;
}
