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
}

/** Limits for accepting a polynomial CTF. */
export const CTF_MAX_COEFFICIENT = 1e3;
/** Largest accepted resynthesis error, relative to U. */
export const CTF_MAX_RESYNTHESIS_ERROR = 1e-6;
/** Largest accepted |ΣCTF/(1 − ΣΦ) − U| / U. */
export const CTF_MAX_IDENTITY_ERROR = 1e-6;
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
  const out: number[] = [];
  for (let k = 0; k < terms; k++) {
    let v = b[k] ?? 0;
    for (let n = 1; n < d.length && n <= k; n++) v -= d[n]! * out[k - n]!;
    out.push(v);
  }
  return out;
}

/** max_k |long division − RF_k| / U, stopping early once it exceeds `stopAbove`. */
function maxError(
  b: readonly number[],
  d: readonly number[],
  rf: readonly number[],
  u: number,
  stopAbove: number,
): number {
  const out = new Float64Array(rf.length);
  let worst = 0;
  for (let k = 0; k < rf.length; k++) {
    let v = b[k] ?? 0;
    for (let n = 1; n < d.length && n <= k; n++) v -= d[n]! * out[k - n]!;
    out[k] = v;
    const e = Math.abs(v - rf[k]!) / u;
    if (!(e <= worst)) worst = Number.isFinite(e) ? e : Infinity;
    if (worst > stopAbove) break;
  }
  return worst;
}

function sum(values: readonly number[]): number {
  return values.reduce((s, v) => s + v, 0);
}

/** Builds the CTF from the first `poleCount` ratios q_n and checks it against the response factors. */
export function ctfCandidate(
  ratios: readonly number[],
  rf: ResponseFactors,
  uValue: number,
  stopAbove = Infinity,
): CtfCandidate {
  const d = denominatorFromPoles(ratios);
  const X = numeratorByConvolution(rf.X, d);
  const Y = numeratorByConvolution(rf.Y, d);
  const Z = numeratorByConvolution(rf.Z, d);
  const Phi = d.slice(1).map((v) => -v);
  const sd = sum(d);
  const identityError = Math.max(
    ...[X, Y, Z].map((num) => Math.abs(sum(num) / sd - uValue) / uValue),
  );
  const all = [...X, ...Y, ...Z, ...Phi];
  const maxAbsCoefficient = all.reduce((m, v) => Math.max(m, Math.abs(v)), 0);
  // A candidate over the coefficient bound is rejected whatever its resynthesis: skip the long division.
  const resynthesisError = maxAbsCoefficient > CTF_MAX_COEFFICIENT && stopAbove !== Infinity
    ? Infinity
    : Math.max(
      maxError(X, d, rf.X, uValue, stopAbove),
      maxError(Y, d, rf.Y, uValue, stopAbove),
      maxError(Z, d, rf.Z, uValue, stopAbove),
    );
  return {
    ctf: { X, Y, Z, Phi },
    maxAbsCoefficient,
    resynthesisError: Number.isNaN(resynthesisError) ? Infinity : resynthesisError,
    identityError: Number.isNaN(identityError) ? Infinity : identityError,
  };
}

/** Worst of the three acceptance ratios (≤ 1 means accepted). */
function score(c: CtfCandidate): number {
  return Math.max(
    c.resynthesisError / CTF_MAX_RESYNTHESIS_ERROR,
    c.identityError / CTF_MAX_IDENTITY_ERROR,
    c.maxAbsCoefficient / CTF_MAX_COEFFICIENT,
  );
}

/**
 * Smallest pole set (slowest first) whose CTF resynthesises the response factors to 1e-9 U with the identity to
 * 1e-8; otherwise the candidate with the best acceptance score.
 */
export function selectCtf(ratios: readonly number[], rf: ResponseFactors, uValue: number): CtfCandidate {
  const usable = ratios.filter((q) => q > 1e-12);
  let best: CtfCandidate | undefined;
  for (let n = 0; n <= usable.length; n++) {
    const stopAbove = Math.max(best?.resynthesisError ?? Infinity, CTF_MAX_RESYNTHESIS_ERROR);
    const candidate = ctfCandidate(usable.slice(0, n), rf, uValue, stopAbove);
    if (best === undefined || score(candidate) < score(best)) best = candidate;
    if (candidate.resynthesisError <= CTF_TARGET_ERROR && candidate.identityError <= 10 * CTF_TARGET_ERROR) {
      break;
    }
    if (candidate.maxAbsCoefficient > CTF_MAX_COEFFICIENT && best.maxAbsCoefficient <= CTF_MAX_COEFFICIENT) {
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
