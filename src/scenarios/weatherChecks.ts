import type { PulseModes } from "../engine/pulseModes.ts";
import type { FluxModes } from "../engine/surfaceFlux.ts";
import type { CheckResult } from "../engine/checkResult.ts";
import { fluxesAfterWarmUp } from "./weatherRecursion.ts";

/** Unit roundoff of IEEE 754 double precision, 2^−53. */
const UNIT_ROUNDOFF = 2 ** -53;

/** γ_m = m u / (1 − m u): relative error bound of a sum or product chain of m terms (Higham 2002, §3.1). */
function gamma(m: number): number {
  return (m * UNIT_ROUNDOFF) / (1 - m * UNIT_ROUNDOFF);
}

/** Mean of the warm-up window (the last `warmUpSteps` values, wrapped) and the largest |x − that mean| of the series. */
function startSpread(
  series: ArrayLike<number>,
  warmUpSteps: number,
): { mean: number; spread: number; max: number } {
  const n = series.length;
  let sum = 0;
  for (let j = 0; j < warmUpSteps; j++) sum += series[(((n - warmUpSteps + j) % n) + n) % n]!;
  const mean = warmUpSteps > 0 ? sum / warmUpSteps : series[0]!;
  let spread = 0;
  let max = 0;
  for (let k = 0; k < n; k++) {
    spread = Math.max(spread, Math.abs(series[k]! - mean));
    max = Math.max(max, Math.abs(series[k]!));
  }
  return { mean, spread, max };
}

/**
 * One modal filter's share of the check's limit, in W/m² summed over the series: the start-up bound plus roundoff.
 * Start-up: the filter starts steady at the warm-up mean m, so each state s_n is off the periodic one by at most
 * D/(1 − q_n) (D = max|x − m|), and after W warm-up steps the reported steps add at most
 * Σ_n |c_n| q_n^(W+1) D / (1 − q_n)² in total (a geometric sum). Roundoff: per step, γ over the terms
 * |RF_0| + |RF_1| + Σ|c_n| q_n/(1 − q_n) times max|x|, plus the states' own accumulated error u·max|x|·Σ|c_n| q_n/(1 − q_n)².
 */
function filterBound(modes: PulseModes, series: ArrayLike<number>, warmUpSteps: number): number {
  const { spread, max } = startSpread(series, warmUpSteps);
  const n = series.length;
  let startUp = 0;
  let terms = Math.abs(modes.rf0) + Math.abs(modes.rf1);
  let states = 0;
  modes.ratios.forEach((q, i) => {
    if (!(q > 0)) return;
    const c = Math.abs(modes.coefficients[i]!);
    const oneMinusQ = 1 - q;
    startUp += (c * Math.exp((warmUpSteps + 1) * Math.log(q))) / (oneMinusQ * oneMinusQ);
    terms += (c * q) / oneMinusQ;
    states += (c * q) / (oneMinusQ * oneMinusQ);
  });
  const perStep = gamma(modes.ratios.length + 3) * terms * max + UNIT_ROUNDOFF * states * max;
  return startUp * spread + n * perStep;
}

/**
 * The energy-balance limit of one surface, relative like the check's value: the largest residual that the warm-up
 * start and double-precision roundoff can leave, so it follows the series length, the warm-up and the construction
 * instead of a fixed number. A wrong gain, a lost step or a wrong coefficient leaves far more.
 */
export function energyBalanceLimit(
  modes: FluxModes,
  solAirC: ArrayLike<number>,
  indoorC: ArrayLike<number>,
  warmUpSteps: number,
  uValue: number,
  insideWPerM2: ArrayLike<number>,
): number {
  const n = insideWPerM2.length;
  let maxFlux = 0;
  let sumAbsDifference = 0;
  let maxDifference = 0;
  for (let k = 0; k < n; k++) {
    maxFlux = Math.max(maxFlux, Math.abs(insideWPerM2[k]!));
    const d = Math.abs(solAirC[k]! - indoorC[k]!);
    sumAbsDifference += d;
    maxDifference = Math.max(maxDifference, d);
  }
  const absolute = filterBound(modes.Y, solAirC, warmUpSteps) + filterBound(modes.Z, indoorC, warmUpSteps) +
    gamma(n) * n * (maxFlux + uValue * maxDifference);
  return absolute / (uValue * n * Math.max(1, sumAbsDifference / n));
}
/** Limit of the warm-up check: first-day inside flux with W versus 2W warm-up days, relative to max(peak, U × 1 K). */
export const WARM_UP_LIMIT = 1e-3;

/**
 * Energy balance of one surface over the whole series: Σq versus U Σ(T_sa − T_i). The recursion keeps ΣY = ΣZ = U
 * and the periodic warm-up makes the history before the first row the end of the series, so over the series
 * Σq = U Σ(T_sa − T_i) up to the steady start before the warm-up and roundoff, which `energyBalanceLimit` bounds.
 */
export function energyBalanceCheck(
  subject: string,
  insideWPerM2: Float64Array,
  solAirC: Float64Array,
  indoorC: Float64Array,
  uValue: number,
  modes: FluxModes,
  warmUpSteps: number,
): CheckResult {
  let sumFlux = 0;
  let sumDifference = 0;
  let sumAbsDifference = 0;
  for (let k = 0; k < insideWPerM2.length; k++) {
    const difference = solAirC[k]! - indoorC[k]!;
    sumFlux += insideWPerM2[k]!;
    sumDifference += difference;
    sumAbsDifference += Math.abs(difference);
  }
  const n = insideWPerM2.length;
  const value = Math.abs(sumFlux - uValue * sumDifference) / (uValue * n * Math.max(1, sumAbsDifference / n));
  return check(
    "energy-balance",
    subject,
    "Whole series: Σ inside flux versus U × Σ(sol-air − indoor), relative to U × N × max(1 K, mean |sol-air − indoor|); " +
      "limit: bound of the warm-up start's residual plus roundoff for this series",
    value,
    energyBalanceLimit(modes, solAirC, indoorC, warmUpSteps, uValue, insideWPerM2),
  );
}

/** Warm-up check of one surface: the first day after W warm-up days versus after 2W. */
export function warmUpCheck(
  subject: string,
  modes: FluxModes,
  solAirC: Float64Array,
  indoorC: Float64Array,
  warmUpSteps: number,
  insideWPerM2: Float64Array,
  uValue: number,
  stepsPerDay: number,
): CheckResult {
  const length = Math.min(stepsPerDay, insideWPerM2.length);
  const doubled = fluxesAfterWarmUp(modes, solAirC, indoorC, 2 * warmUpSteps, length).insideWPerM2;
  let difference = 0;
  let scale = uValue;
  for (let k = 0; k < length; k++) {
    difference = Math.max(difference, Math.abs(insideWPerM2[k]! - doubled[k]!));
    scale = Math.max(scale, Math.abs(doubled[k]!));
  }
  return check(
    "warm-up",
    subject,
    "First day's inside flux after the warm-up versus after twice the warm-up: max |Δq| / max(peak |q|, U × 1 K)",
    difference / scale,
    WARM_UP_LIMIT,
  );
}

function check(id: string, subject: string, description: string, value: number, limit: number): CheckResult {
  return { id, subject, description, value, limit, pass: Math.abs(value) <= limit };
}
