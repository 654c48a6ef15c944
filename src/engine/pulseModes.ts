import type { RampResponse } from "./residues.ts";

/** Which flux transfer function: X (outside self), Y (cross), Z (inside self). */
export type FluxSeries = "X" | "Y" | "Z";

/** Triangular-pulse response in modal form: RF_0, RF_1, and RF_j = Σ_n c_n q_n^(j−1) for j ≥ 2. */
export interface PulseModes {
  readonly timestepS: number;
  readonly rf0: number;
  readonly rf1: number;
  /** q_n = e^(−β_n Δ), descending. */
  readonly ratios: readonly number[];
  /** c_n = a_n (1 − q_n)² / Δ, W/(m^2 K). */
  readonly coefficients: readonly number[];
}

/** Modal form of one series at timestep Δ, with its constant term from the exact s = 0 derivative. */
export function pulseModes(ramp: RampResponse, series: FluxSeries, timestepS: number): PulseModes {
  let residues: readonly number[];
  let gPrime0: number;
  switch (series) {
    case "X":
      residues = ramp.residuesX, gPrime0 = ramp.xPrime0;
      break;
    case "Y":
      residues = ramp.residuesY, gPrime0 = ramp.yPrime0;
      break;
    case "Z":
      residues = ramp.residuesZ, gPrime0 = ramp.zPrime0;
      break;
  }
  let sum0 = gPrime0;
  let sum1 = -gPrime0;
  const ratios: number[] = [];
  const coefficients: number[] = [];
  for (const [n, beta] of ramp.betas.entries()) {
    const q = Math.exp(-beta * timestepS);
    const oneMinusQ = -Math.expm1(-beta * timestepS);
    const a = residues[n]!;
    sum0 += a * q;
    sum1 += a * (q * q - 2 * q);
    ratios.push(q);
    coefficients.push((a * oneMinusQ * oneMinusQ) / timestepS);
  }
  return {
    timestepS,
    rf0: ramp.uValue + sum0 / timestepS,
    rf1: sum1 / timestepS,
    ratios,
    coefficients,
  };
}

/** Expands a modal form into `terms` response factors. */
export function expandPulseModes(modes: PulseModes, terms: number): number[] {
  const out = new Array<number>(terms).fill(0);
  out[0] = modes.rf0;
  if (terms > 1) out[1] = modes.rf1;
  const power = [...modes.ratios];
  const { ratios, coefficients } = modes;
  let active = power.length;
  for (let j = 2; j < terms && active > 0; j++) {
    let value = 0;
    for (let n = 0; n < active; n++) {
      value += coefficients[n]! * power[n]!;
      power[n] = power[n]! * ratios[n]!;
    }
    out[j] = value;
    while (active > 0 && Math.abs(power[active - 1]!) < 1e-300) active--;
  }
  return out;
}

/**
 * Hourly (or sub-hourly) flux by the modal recursion, one first-order term per pole:
 * q_t = RF_0 x_t + RF_1 x_(t−1) + Σ_n c_n q_n s_n,t with s_n,t = q_n s_n,(t−1) + x_(t−2); zero history.
 */
export function modalConvolve(modes: PulseModes, input: readonly number[]): number[] {
  const states = new Array<number>(modes.ratios.length).fill(0);
  return input.map((x, t) => {
    const x2 = t >= 2 ? input[t - 2]! : 0;
    let value = modes.rf0 * x + modes.rf1 * (t >= 1 ? input[t - 1]! : 0);
    for (let n = 0; n < states.length; n++) {
      const q = modes.ratios[n]!;
      states[n] = q * states[n]! + x2;
      value += modes.coefficients[n]! * q * states[n]!;
    }
    return value;
  });
}

/** Σ_(j≥terms) RF_j of a modal form in closed form: Σ_n c_n q_n^(terms−1)/(1 − q_n) (terms ≥ 2). */
export function modalTailSum(modes: PulseModes, terms: number): number {
  let sum = 0;
  modes.ratios.forEach((q, n) => {
    if (!(q > 0)) return;
    sum += (modes.coefficients[n]! * Math.exp((terms - 1) * Math.log(q))) / -Math.expm1(Math.log(q));
  });
  return sum;
}

/** The tail Σ_(j≥terms) RF_j folded into `period` residues j mod period, in closed form (terms ≥ 2). */
export function foldedModalTail(modes: PulseModes, terms: number, period: number): number[] {
  const out = new Array<number>(period).fill(0);
  modes.ratios.forEach((q, n) => {
    if (!(q > 0)) return;
    const logQ = Math.log(q);
    const c = modes.coefficients[n]! / -Math.expm1(period * logQ);
    for (let r = 0; r < period; r++) {
      const first = terms + ((((r - terms) % period) + period) % period);
      out[r] = out[r]! + c * Math.exp((first - 1) * logQ);
    }
  });
  return out;
}
