import type { PulseModes } from "./pulseModes.ts";

/** Folds response factors into `period` periodic response factors: P_j = Σ_k RF_(j + k·period). */
export function foldPeriodic(rf: readonly number[], period: number): number[] {
  const out = new Array<number>(period).fill(0);
  for (let j = 0; j < rf.length; j++) out[j % period] = out[j % period]! + rf[j]!;
  return out;
}

/**
 * Periodic response factors summed in closed form from the modal form (no truncation):
 * Σ_k c q^(j+kP−1) = c q^(j−1) / (1 − q^P) for j ≥ 2, and the wrapped tails added to P_0, P_1.
 */
export function periodicFromModes(modes: PulseModes, period: number): number[] {
  const out = new Array<number>(period).fill(0);
  out[0] = modes.rf0;
  if (period > 1) out[1] = out[1]! + modes.rf1;
  else out[0] = out[0]! + modes.rf1;
  for (const [n, q] of modes.ratios.entries()) {
    const c = modes.coefficients[n]!;
    if (q === 0) continue;
    const logQ = Math.log(q);
    const oneMinusQP = -Math.expm1(period * logQ);
    for (let j = 0; j < period; j++) {
      // Smallest index ≥ 2 congruent to j modulo the period.
      let first = j;
      while (first < 2) first += period;
      out[j] = out[j]! + (c * Math.exp((first - 1) * logQ)) / oneMinusQP;
    }
  }
  return out;
}
