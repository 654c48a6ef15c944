/**
 * ISO 6946:2017 combined method for a building element with one thermally inhomogeneous (bridged) layer, and
 * the equivalent homogeneous layer that hands its result to the dynamic engine. Pure functions, SI units.
 *
 * Upper limit R'_T: the element is split into parallel sections (one per material of the bridged layer),
 * each a stack of homogeneous layers from air to air; 1/R'_T = Σ f_m / R_T,m.
 * Lower limit R''_T: the bridged layer becomes one layer of conductivity λ'' = Σ f_m λ_m (same thickness),
 * and all layers add in series. R_T = (R'_T + R''_T)/2 and the relative maximum error e = (R'_T − R''_T)/(2 R_T).
 */

/** The stated applicability condition: R'_T / R''_T ≤ 1.5 (ISO 6946:2017 combined method, from memory). */
export const COMBINED_METHOD_MAX_RATIO = 1.5;

/** Where the ratio condition comes from, as printed in the package (recalled, not checked against the text). */
export const COMBINED_METHOD_SOURCE =
  "ISO 6946:2017, combined method for thermally inhomogeneous layers (from memory: clause 6.7.2; " +
  "condition R'_T/R''_T ≤ 1.5, otherwise a numerical method to ISO 10211; clause number not verified)";

/** One material of a bridged layer: its area fraction and properties, SI. */
export interface BridgeSection {
  readonly fraction: number;
  /** W/(m K) */
  readonly conductivity: number;
  /** kg/m^3 */
  readonly density: number;
  /** J/(kg K) */
  readonly specificHeat: number;
}

/** The element around the bridged layer: the resistances in series with it, air to air. */
export interface CombinedMethodInput {
  /** Thickness of the bridged layer, m. */
  readonly thicknessM: number;
  /** Sections of the bridged layer; their fractions add up to 1. */
  readonly sections: readonly BridgeSection[];
  /** R_se + Σ R of every other layer + R_si, m^2 K/W. */
  readonly otherResistance: number;
}

/** One parallel path of the upper limit: its area fraction and its air-to-air resistance. */
export interface CombinedPath {
  readonly fraction: number;
  /** R of the bridged layer in this path, d/λ_m, m^2 K/W. */
  readonly layerR: number;
  /** R_T,m of the whole path, air to air, m^2 K/W. */
  readonly R: number;
}

/** The combined method's result for one element, m^2 K/W unless stated. */
export interface CombinedMethodResult {
  readonly paths: readonly CombinedPath[];
  /** R'_T, upper limit (parallel paths). */
  readonly upperR: number;
  /** λ'' = Σ f λ of the bridged layer, W/(m K). */
  readonly lowerConductivity: number;
  /** R''_T, lower limit (equivalent layer conductivity, layers in series). */
  readonly lowerR: number;
  /** R_T = (R'_T + R''_T)/2. */
  readonly R: number;
  /** e = (R'_T − R''_T)/(2 R_T). */
  readonly relativeError: number;
  /** R'_T / R''_T. */
  readonly ratio: number;
  /** ratio ≤ COMBINED_METHOD_MAX_RATIO. */
  readonly applicable: boolean;
}

/** The homogeneous layer that has the combined R_T in the element and the area-weighted heat capacity. */
export interface EquivalentLayer {
  /** λ_eq = d / (R_T − other resistances), W/(m K). */
  readonly conductivity: number;
  /** Σ f ρ, kg/m^3. */
  readonly density: number;
  /** Σ f ρ c / Σ f ρ, J/(kg K), so that ρ c = Σ f ρ c exactly. */
  readonly specificHeat: number;
  /** Σ f ρ c d, J/(m^2 K). */
  readonly arealHeatCapacity: number;
}

/** Computes R'_T, R''_T, R_T, e and the applicability ratio by the combined method. */
export function combinedMethod(input: CombinedMethodInput): CombinedMethodResult {
  const d = input.thicknessM;
  const paths = input.sections.map((s) => {
    const layerR = d / s.conductivity;
    return { fraction: s.fraction, layerR, R: input.otherResistance + layerR };
  });
  const upperR = 1 / paths.reduce((sum, p) => sum + p.fraction / p.R, 0);
  const lowerConductivity = input.sections.reduce((sum, s) => sum + s.fraction * s.conductivity, 0);
  const lowerR = input.otherResistance + d / lowerConductivity;
  const R = (upperR + lowerR) / 2;
  const ratio = upperR / lowerR;
  return {
    paths,
    upperR,
    lowerConductivity,
    lowerR,
    R,
    relativeError: (upperR - lowerR) / (2 * R),
    ratio,
    applicable: ratio <= COMBINED_METHOD_MAX_RATIO,
  };
}

/** Returns the equivalent homogeneous layer: λ reproducing R_T of the combined method, ρc area-weighted. */
export function equivalentLayer(input: CombinedMethodInput, combined: CombinedMethodResult): EquivalentLayer {
  const layerR = combined.R - input.otherResistance;
  const density = input.sections.reduce((sum, s) => sum + s.fraction * s.density, 0);
  const volumetric = input.sections.reduce((sum, s) => sum + s.fraction * s.density * s.specificHeat, 0);
  return {
    conductivity: input.thicknessM / layerR,
    density,
    specificHeat: volumetric / density,
    arealHeatCapacity: volumetric * input.thicknessM,
  };
}

/** ISO 6946:2017 Annex F air-gap correction ΔU_g = ΔU''·(R_1/R_T)^2 (from memory), W/(m^2 K). */
export function airGapCorrection(deltaU2: number, layerR: number, totalR: number): number {
  return deltaU2 * (layerR / totalR) ** 2;
}

/** ISO 13788 temperature factor of a plane element in steady state, f_Rsi = 1 − U·R_si. */
export function temperatureFactor(uValue: number, insideResistance: number): number {
  return 1 - uValue * insideResistance;
}
