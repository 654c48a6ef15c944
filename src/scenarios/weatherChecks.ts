import type { FluxModes } from "../engine/surfaceFlux.ts";
import type { CheckResult } from "../results/types.ts";
import { fluxesAfterWarmUp } from "./weatherRecursion.ts";

/**
 * Limit of the annual energy-balance check |Σq − U Σ(T_sa − T_i)| / (U N max(1 K, mean|T_sa − T_i|)). The recursion
 * keeps ΣY = ΣZ = U exactly and the periodic warm-up makes the history before the first row equal to the end of the
 * series, so the only residual is the steady start before the warm-up, of relative order
 * e^(−W/τ1) · τ1/(N Δ) · max|T − mean| / mean|ΔT| — below 1e-5 for a year with W ≥ 5 τ1; 1e-4 leaves room for short series.
 */
export const WEATHER_ENERGY_BALANCE_LIMIT = 1e-4;
/** Limit of the warm-up check: first-day inside flux with W versus 2W warm-up days, relative to max(peak, U × 1 K). */
export const WARM_UP_LIMIT = 1e-3;

/** Annual energy balance of one surface: Σq versus U Σ(T_sa − T_i). */
export function energyBalanceCheck(
  subject: string,
  insideWPerM2: Float64Array,
  solAirC: Float64Array,
  indoorC: Float64Array,
  uValue: number,
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
    "Whole series: Σ inside flux versus U × Σ(sol-air − indoor), relative to U × N × max(1 K, mean |sol-air − indoor|)",
    value,
    WEATHER_ENERGY_BALANCE_LIMIT,
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
