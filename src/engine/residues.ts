import type { ConductionChain } from "./elements.ts";
import { realTransmission } from "./transmission.ts";

/**
 * Ramp-response data of the three flux transfer functions X = D/B, Y = 1/B, Z = A/B:
 * r_G(t) = U t + G'(0) + Σ_n a_n e^(−β_n t).
 */
export interface RampResponse {
  /** 1/B(0), W/(m^2 K) */
  readonly uValue: number;
  /** Exact derivatives at s = 0 of X, Y, Z, J/(m^2 K). */
  readonly xPrime0: number;
  readonly yPrime0: number;
  readonly zPrime0: number;
  /** β_n, 1/s, ascending. */
  readonly betas: readonly number[];
  /** Residues a_n of X/s², Y/s², Z/s² at s = −β_n, J/(m^2 K). */
  readonly residuesX: readonly number[];
  readonly residuesY: readonly number[];
  readonly residuesZ: readonly number[];
}

/** Derivatives at s = 0 of the chain matrix: A'(0), B'(0), D'(0) by the product rule, and B(0) = R. */
export function zeroFrequencyDerivatives(
  chain: ConductionChain,
): { r: number; da: number; db: number; dd: number } {
  const { m, dmds } = realTransmission(chain, 0);
  return { r: m.b, da: dmds.a, db: dmds.b, dd: dmds.d };
}

/** Constant terms from the exact s = 0 derivatives and residues from the analytic dB/ds at each pole. */
export function rampResponse(chain: ConductionChain, betas: readonly number[]): RampResponse {
  const { r, da, db, dd } = zeroFrequencyDerivatives(chain);
  const r2 = r * r;
  const residuesX: number[] = [];
  const residuesY: number[] = [];
  const residuesZ: number[] = [];
  for (const beta of betas) {
    const { m, dmds } = realTransmission(chain, beta);
    const den = beta * beta * dmds.b;
    residuesX.push(m.d / den);
    residuesY.push(1 / den);
    residuesZ.push(m.a / den);
  }
  return {
    uValue: 1 / r,
    xPrime0: (dd * r - db) / r2,
    yPrime0: -db / r2,
    zPrime0: (da * r - db) / r2,
    betas,
    residuesX,
    residuesY,
    residuesZ,
  };
}
