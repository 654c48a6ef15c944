import { cosDeg, sinDeg } from "./_angles.ts";

/**
 * Solar constant used by the ASHRAE clear-sky model, W/m²: E_sc = 1367 W/m² (ASHRAE Handbook—Fundamentals 2009 and
 * 2013, Ch. 14; value from memory; the WMO value adopted in 1981).
 */
export const SOLAR_CONSTANT_W_PER_M2 = 1367;

/** Edition of the handbook's air-mass exponent fits (the 2013 fits are repeated in later editions, from memory). */
export type ClearSkyEdition = "2013" | "2009";

/** Monthly site clear-sky pseudo optical depths from the handbook's climatic design tables (inputs, not constants). */
export interface OpticalDepths {
  /** Beam pseudo optical depth τ_b, dimensionless. */
  readonly beamOpticalDepth: number;
  /** Diffuse pseudo optical depth τ_d, dimensionless. */
  readonly diffuseOpticalDepth: number;
}

/** Clear-sky irradiance components at one instant, with the intermediates a reviewer traces. */
export interface ClearSkyIrradiance {
  readonly edition: ClearSkyEdition;
  /** Extraterrestrial normal irradiance E_0, W/m². */
  readonly extraterrestrialNormalWPerM2: number;
  /** Relative air mass m (Kasten & Young 1989); NaN with the sun at or below the horizon. */
  readonly airMass: number;
  /** Beam air-mass exponent ab. */
  readonly beamExponent: number;
  /** Diffuse air-mass exponent ad. */
  readonly diffuseExponent: number;
  /** Beam normal irradiance E_b, W/m² (0 with the sun at or below the horizon). */
  readonly beamNormalWPerM2: number;
  /** Diffuse horizontal irradiance E_d, W/m² (0 with the sun at or below the horizon). */
  readonly diffuseHorizontalWPerM2: number;
}

/**
 * Extraterrestrial normal irradiance E_0 = E_sc{1 + 0.033 cos[360°(n − 3)/365]}, W/m² (ASHRAE Handbook—Fundamentals
 * 2013, Ch. 14, from memory Eq. 4).
 */
export function extraterrestrialNormalWPerM2(dayOfYear: number): number {
  return SOLAR_CONSTANT_W_PER_M2 * (1 + 0.033 * cosDeg((360 * (dayOfYear - 3)) / 365));
}

/**
 * Relative optical air mass m = 1/[sin β + 0.50572(6.07995 + β)^−1.6364], β in degrees (Kasten & Young 1989, "Revised
 * optical air mass tables and approximation formula", Applied Optics 28(22)); NaN for β ≤ 0.
 */
export function kastenYoungAirMass(altitudeDeg: number): number {
  if (!(altitudeDeg > 0)) return Number.NaN;
  return 1 / (sinDeg(altitudeDeg) + 0.50572 * (6.07995 + altitudeDeg) ** -1.6364);
}

/**
 * Air-mass exponents ab, ad from τ_b, τ_d (ASHRAE Handbook—Fundamentals Ch. 14; from memory 2013 Eqs. 17–18,
 * ab = 1.454 − 0.406τ_b − 0.268τ_d + 0.021τ_bτ_d, ad = 0.507 + 0.205τ_b − 0.080τ_d − 0.190τ_bτ_d; 2009 edition:
 * ab = 1.219 − 0.043τ_b − 0.151τ_d − 0.204τ_bτ_d, ad = 0.202 + 0.852τ_b − 0.007τ_d − 0.357τ_bτ_d).
 */
export function airMassExponents(
  depths: OpticalDepths,
  edition: ClearSkyEdition,
): { readonly beamExponent: number; readonly diffuseExponent: number } {
  const tb = depths.beamOpticalDepth;
  const td = depths.diffuseOpticalDepth;
  switch (edition) {
    case "2013":
      // Sign of the 0.021 product term: "+" as in most secondary sources; one minority form has "−" (≈ 0.1 % on E_b).
      return {
        beamExponent: 1.454 - 0.406 * tb - 0.268 * td + 0.021 * tb * td,
        diffuseExponent: 0.507 + 0.205 * tb - 0.080 * td - 0.190 * tb * td,
      };
    case "2009":
      return {
        beamExponent: 1.219 - 0.043 * tb - 0.151 * td - 0.204 * tb * td,
        diffuseExponent: 0.202 + 0.852 * tb - 0.007 * td - 0.357 * tb * td,
      };
  }
}

/**
 * ASHRAE clear-sky beam normal and diffuse horizontal irradiance, E_b = E_0 exp(−τ_b m^ab) and
 * E_d = E_0 exp(−τ_d m^ad) (Handbook—Fundamentals 2013 Ch. 14, from memory Eqs. 15–16); zero for β ≤ 0.
 */
export function clearSkyIrradiance(
  altitudeDeg: number,
  dayOfYear: number,
  depths: OpticalDepths,
  edition: ClearSkyEdition = "2013",
): ClearSkyIrradiance {
  const extraterrestrial = extraterrestrialNormalWPerM2(dayOfYear);
  const { beamExponent, diffuseExponent } = airMassExponents(depths, edition);
  const airMass = kastenYoungAirMass(altitudeDeg);
  const sunUp = Number.isFinite(airMass);
  return {
    edition,
    extraterrestrialNormalWPerM2: extraterrestrial,
    airMass,
    beamExponent,
    diffuseExponent,
    beamNormalWPerM2: sunUp
      ? extraterrestrial * Math.exp(-depths.beamOpticalDepth * airMass ** beamExponent)
      : 0,
    diffuseHorizontalWPerM2: sunUp
      ? extraterrestrial * Math.exp(-depths.diffuseOpticalDepth * airMass ** diffuseExponent)
      : 0,
  };
}
