import {
  type DivisionCounter,
  type DivisionSeries,
  divisionSpace,
  longDivision,
  resynthesis,
} from "./longDivision.ts";
import type { ResponseFactors } from "./responseFactors.ts";

/** Conduction transfer function: q_t = Σ X_n T_o,t−n − Σ Y_n T_i,t−n + Σ_(n≥1) Φ_n q_t−n (and Y, Z for q_i). */
export interface Ctf {
  readonly X: readonly number[];
  readonly Y: readonly number[];
  readonly Z: readonly number[];
  /** Φ_1 … Φ_N (Φ_n = −d_n). */
  readonly Phi: readonly number[];
}

/** A CTF with the figures used to accept or reject it. */
export interface CtfCandidate {
  readonly ctf: Ctf;
  /** max |coefficient| over X, Y, Z, Φ */
  readonly maxAbsCoefficient: number;
  /** max_j |RF resynthesised − RF| / U over X, Y, Z and all response-factor terms */
  readonly resynthesisError: number;
  /** max over X, Y, Z of |ΣCTF/(1 − ΣΦ) − U| / U */
  readonly identityError: number;
  /** Roundoff bound of `identityError` from the coefficients' conditioning (see `identityRoundoffBound`). */
  readonly identityRoundoff: number;
  /** Limit of `identityError`: max(`CTF_MAX_IDENTITY_ERROR`, `identityRoundoff`). */
  readonly identityLimit: number;
}

/** Limits for accepting a polynomial CTF. */
export const CTF_MAX_COEFFICIENT = 1e3;
/** Largest accepted resynthesis error, relative to U. */
export const CTF_MAX_RESYNTHESIS_ERROR = 1e-6;
/** Largest accepted |ΣCTF/(1 − ΣΦ) − U| / U when roundoff allows less (the floor of the identity limit). */
export const CTF_MAX_IDENTITY_ERROR = 1e-6;
/**
 * Largest roundoff bound of the steady-state gain a published CTF may have: a CTF whose own coefficients cannot
 * carry its gain to 1e-4 in double precision is ill-conditioned and the modal form is used instead.
 */
export const CTF_MAX_IDENTITY_ROUNDOFF = 1e-4;
/** Unit roundoff of IEEE 754 double precision, 2^−53. */
const UNIT_ROUNDOFF = 2 ** -53;
/** Resynthesis error at which the pole search stops adding poles, relative to U. */
const CTF_TARGET_ERROR = 1e-9;

/** Coefficients d_0 = 1, d_1 … d_N of Π_n (1 − q_n z^−1). */
export function denominatorFromPoles(ratios: readonly number[]): number[] {
  let d = [1];
  for (const q of ratios) {
    const next = new Array<number>(d.length + 1).fill(0);
    for (let i = 0; i < d.length; i++) {
      next[i] = next[i]! + d[i]!;
      next[i + 1] = next[i + 1]! - q * d[i]!;
    }
    d = next;
  }
  return d;
}

/** Numerator b_k = Σ_j RF_j d_(k−j) for k = 0 … N+1. */
export function numeratorByConvolution(rf: readonly number[], d: readonly number[]): number[] {
  const length = d.length + 1;
  const out: number[] = [];
  for (let k = 0; k < length; k++) {
    let sum = 0;
    for (let j = 0; j <= k && j < rf.length; j++) {
      const dk = d[k - j];
      if (dk !== undefined) sum += rf[j]! * dk;
    }
    out.push(sum);
  }
  return out;
}

/** Long division b(z)/d(z): the first `terms` response factors the CTF implies. */
export function resynthesise(b: readonly number[], d: readonly number[], terms: number): number[] {
  const out = new Float64Array(terms);
  longDivision(b, d, out, terms);
  return Array.from(out);
}

function sum(values: readonly number[]): number {
  return values.reduce((s, v) => s + v, 0);
}

/** max over X, Y, Z of |ΣCTF / (1 − ΣΦ) − U| / U (the steady-state identity of a CTF). */
export function ctfIdentityError(ctf: Ctf, uValue: number): number {
  const sd = 1 - sum(ctf.Phi);
  return Math.max(...[ctf.X, ctf.Y, ctf.Z].map((num) => Math.abs(sum(num) / sd - uValue) / uValue));
}

/**
 * Roundoff bound of |Σb/Σd − U| / U for the CTF of the ratios q_n (Higham, Accuracy and Stability of Numerical
 * Algorithms, 2nd ed., §3.1: a sum or product chain of m terms carries at most γ_m = m u/(1 − m u) relative error
 * of the sum of absolute values). The expansion of d(z) = Π(1 − q_n z⁻¹) errs by at most γ_N times the coefficients
 * of Π(1 + q_n z⁻¹), whose sum is Π(1 + q_n); the numerators b = RF ∗ d add Σ|RF_j| times that. Summing N + 2
 * terms and dividing add γ_(N+3). Relative to Σb ≈ U Σd the bound is
 * γ_(2N+5) · Π(1 + q_n)/Σd · (1 + Σ_(j≤N+1) |RF_j| / U), worst over X, Y, Z.
 */
export function identityRoundoffBound(
  ratios: readonly number[],
  rf: ResponseFactors,
  uValue: number,
): number {
  const n = ratios.length;
  const m = 2 * n + 5;
  const gamma = (m * UNIT_ROUNDOFF) / (1 - m * UNIT_ROUNDOFF);
  let absProduct = 1;
  let product = 1;
  for (const q of ratios) {
    absProduct *= 1 + q;
    product *= 1 - q;
  }
  let worstRf = 0;
  for (const series of [rf.X, rf.Y, rf.Z]) {
    let s = 0;
    for (let j = 0; j <= n + 1 && j < series.length; j++) s += Math.abs(series[j]!);
    worstRf = Math.max(worstRf, s / uValue);
  }
  return (gamma * absProduct * (1 + worstRf)) / product;
}

/** Builds the CTF from the first `poleCount` ratios q_n and checks it against the response factors. */
export function ctfCandidate(
  ratios: readonly number[],
  rf: ResponseFactors,
  uValue: number,
  stopAbove = Infinity,
): CtfCandidate {
  return candidateWithSeries(ratios, rf, uValue, stopAbove).candidate;
}

/** A candidate with its long divisions (X, Y, Z) when they ran over every response-factor term. */
interface CandidateWithSeries {
  readonly candidate: CtfCandidate;
  readonly series?: DivisionSeries;
}

function candidateWithSeries(
  ratios: readonly number[],
  rf: ResponseFactors,
  uValue: number,
  stopAbove: number,
  counter?: DivisionCounter,
  space?: DivisionSeries,
  bestScore?: number,
): CandidateWithSeries {
  const d = denominatorFromPoles(ratios);
  const X = numeratorByConvolution(rf.X, d);
  const Y = numeratorByConvolution(rf.Y, d);
  const Z = numeratorByConvolution(rf.Z, d);
  const Phi = d.slice(1).map((v) => -v);
  const identityError = ctfIdentityError({ X, Y, Z, Phi }, uValue);
  const all = [...X, ...Y, ...Z, ...Phi];
  const maxAbsCoefficient = all.reduce((m, v) => Math.max(m, Math.abs(v)), 0);
  const roundoff = identityRoundoffBound(ratios, rf, uValue);
  const identityRoundoff = Number.isFinite(roundoff) ? roundoff : Infinity;
  const figures = {
    maxAbsCoefficient,
    identityError: Number.isNaN(identityError) ? Infinity : identityError,
    identityRoundoff,
    identityLimit: Math.max(CTF_MAX_IDENTITY_ERROR, identityRoundoff),
  };
  // A candidate whose other figures already score no better than the best cannot be chosen, whatever its
  // resynthesis: its division need only tell whether it meets the search's target (`selectCtfWithSeries`).
  const stop = bestScore !== undefined && scoreWithout(figures) >= bestScore
    ? Math.min(stopAbove, CTF_TARGET_ERROR)
    : stopAbove;
  // A candidate over the coefficient bound is rejected whatever its resynthesis: skip the long division.
  const division = maxAbsCoefficient > CTF_MAX_COEFFICIENT && stopAbove !== Infinity
    ? undefined
    : resynthesis([X, Y, Z], d, [rf.X, rf.Y, rf.Z], uValue, stop, counter, space);
  const resynthesisError = division === undefined ? Infinity : Math.max(...division.errors);
  const candidate: CtfCandidate = {
    ctf: { X, Y, Z, Phi },
    ...figures,
    resynthesisError: Number.isNaN(resynthesisError) ? Infinity : resynthesisError,
  };
  return division?.series === undefined ? { candidate } : { candidate, series: division.series };
}

/** Worst of the acceptance ratios (≤ 1 means accepted). */
function score(c: CtfCandidate): number {
  return Math.max(c.resynthesisError / CTF_MAX_RESYNTHESIS_ERROR, scoreWithout(c));
}

/** Worst of the acceptance ratios other than the resynthesis (known before the long division). */
function scoreWithout(
  c: Pick<CtfCandidate, "identityError" | "identityLimit" | "identityRoundoff" | "maxAbsCoefficient">,
): number {
  return Math.max(
    c.identityError / c.identityLimit,
    c.identityRoundoff / CTF_MAX_IDENTITY_ROUNDOFF,
    c.maxAbsCoefficient / CTF_MAX_COEFFICIENT,
  );
}

/** Why a candidate is not accepted: each failed criterion with its value and limit (empty when accepted). */
export function ctfRejectionReasons(c: CtfCandidate): string[] {
  const reasons: string[] = [];
  const e = (v: number) => v.toExponential(2);
  if (!(c.resynthesisError <= CTF_MAX_RESYNTHESIS_ERROR)) {
    reasons.push(
      `its long division misses the response factors by ${e(c.resynthesisError)} U (limit ${
        e(CTF_MAX_RESYNTHESIS_ERROR)
      } U)`,
    );
  }
  if (!(c.maxAbsCoefficient <= CTF_MAX_COEFFICIENT)) {
    reasons.push(
      `its largest coefficient is ${e(c.maxAbsCoefficient)} (limit ${e(CTF_MAX_COEFFICIENT)}: cancellation)`,
    );
  }
  if (!(c.identityRoundoff <= CTF_MAX_IDENTITY_ROUNDOFF)) {
    reasons.push(
      `its coefficients are ill-conditioned: roundoff alone could move its steady-state gain by ${
        e(c.identityRoundoff)
      } U (limit ${e(CTF_MAX_IDENTITY_ROUNDOFF)} U)`,
    );
  } else if (!(c.identityError <= c.identityLimit)) {
    reasons.push(`its steady-state gain is off by ${e(c.identityError)} U (limit ${e(c.identityLimit)} U)`);
  }
  return reasons;
}

/**
 * Smallest pole set (slowest first) whose CTF resynthesises the response factors to 1e-9 U with the identity to
 * 1e-8 (or to its roundoff bound, if larger); otherwise the candidate with the best acceptance score.
 */
export function selectCtf(ratios: readonly number[], rf: ResponseFactors, uValue: number): CtfCandidate {
  return selectCtfWithSeries(ratios, rf, uValue).candidate;
}

/**
 * `selectCtf` with the chosen CTF's long divisions (X, Y, Z over every response-factor term) when they ran to the
 * end, so that a caller comparing them with other response factors does not divide again. `counter` counts the
 * terms divided.
 */
export function selectCtfWithSeries(
  ratios: readonly number[],
  rf: ResponseFactors,
  uValue: number,
  counter?: DivisionCounter,
): CandidateWithSeries {
  const usable = ratios.filter((q) => q > 1e-12);
  let best: CandidateWithSeries | undefined;
  // Two sets of division space: one the best candidate's series live in, one the next candidate writes.
  let spare = divisionSpace(rf.X.length);
  let kept = divisionSpace(rf.X.length);
  for (let n = 0; n <= usable.length; n++) {
    const stopAbove = Math.max(best?.candidate.resynthesisError ?? Infinity, CTF_MAX_RESYNTHESIS_ERROR);
    const bestScore = best === undefined ? undefined : score(best.candidate);
    const next = candidateWithSeries(usable.slice(0, n), rf, uValue, stopAbove, counter, spare, bestScore);
    const candidate = next.candidate;
    if (best === undefined || score(candidate) < score(best.candidate)) {
      best = next;
      if (next.series === spare) [spare, kept] = [kept, spare];
    }
    if (
      candidate.resynthesisError <= CTF_TARGET_ERROR &&
      candidate.identityError <= Math.max(10 * CTF_TARGET_ERROR, candidate.identityRoundoff)
    ) {
      break;
    }
    if (
      candidate.maxAbsCoefficient > CTF_MAX_COEFFICIENT &&
      best.candidate.maxAbsCoefficient <= CTF_MAX_COEFFICIENT
    ) {
      break;
    }
    if (candidate.maxAbsCoefficient > 1e12) break;
  }
  return best!;
}

/** Whether a CTF candidate passes the coefficient-size, resynthesis and identity limits. */
export function ctfAccepted(candidate: CtfCandidate): boolean {
  return score(candidate) <= 1;
}
