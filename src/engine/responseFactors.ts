import type { RampResponse } from "./residues.ts";
import { expandPulseModes, pulseModes } from "./pulseModes.ts";

/** Response factors for a unit triangular pulse of base 2Δ (air to air or surface to surface). */
export interface ResponseFactors {
  /** Δ, s */
  readonly timestepS: number;
  /** Outside surface flux per outside temperature pulse, W/(m^2 K). */
  readonly X: readonly number[];
  /** Cross response, W/(m^2 K). */
  readonly Y: readonly number[];
  /** Inside surface flux per inside temperature pulse, W/(m^2 K). */
  readonly Z: readonly number[];
  /** max over X, Y, Z of |Σ RF − U| / U after the returned terms. */
  readonly truncationResidual: number;
  /** Number of terms per series. */
  readonly termCount: number;
}

/** Largest number of terms produced; beyond it the residual is reported, never hidden. */
export const MAX_RESPONSE_FACTOR_TERMS = 1 << 19;

/** Relative size of the neglected tail used to choose the number of terms. */
const TAIL_TOLERANCE = 1e-10;

function termsNeeded(ramp: RampResponse, timestepS: number): number {
  const betas = ramp.betas;
  if (betas.length === 0) return 2;
  const q1 = Math.exp(-betas[0]! * timestepS);
  let bound = 0;
  for (const [n, beta] of betas.entries()) {
    const oneMinusQ = -Math.expm1(-beta * timestepS);
    const a = Math.max(
      Math.abs(ramp.residuesX[n]!),
      Math.abs(ramp.residuesY[n]!),
      Math.abs(ramp.residuesZ[n]!),
    );
    bound += (a * oneMinusQ) / timestepS;
  }
  const target = TAIL_TOLERANCE * ramp.uValue;
  if (bound <= target || q1 === 0) return 3;
  const extra = Math.log(target / bound) / Math.log(q1);
  return Math.min(MAX_RESPONSE_FACTOR_TERMS, Math.max(3, Math.ceil(extra) + 2));
}

/** Relative sum-rule residual |Σ RF − U| / U of one series. */
export function sumRuleResidual(rf: readonly number[], uValue: number): number {
  let sum = 0;
  for (const v of rf) sum += v;
  return Math.abs(sum - uValue) / uValue;
}

/** Response factors X, Y, Z at timestep Δ, with enough terms that |ΣRF − U|/U stays below 1e-8. */
export function responseFactors(ramp: RampResponse, timestepS: number): ResponseFactors {
  const terms = termsNeeded(ramp, timestepS);
  const X = expandPulseModes(pulseModes(ramp, "X", timestepS), terms);
  const Y = expandPulseModes(pulseModes(ramp, "Y", timestepS), terms);
  const Z = expandPulseModes(pulseModes(ramp, "Z", timestepS), terms);
  return {
    timestepS,
    X,
    Y,
    Z,
    truncationResidual: Math.max(
      sumRuleResidual(X, ramp.uValue),
      sumRuleResidual(Y, ramp.uValue),
      sumRuleResidual(Z, ramp.uValue),
    ),
    termCount: terms,
  };
}
