/**
 * A priori bound of how far a repeated day is from the steady-periodic day when the modal recursion starts from a
 * steady past at the day's mean input (the start of `repeatedDayFlux`).
 *
 * Each mode's state obeys s_t = q s_(t−1) + x_(t−2). The steady start puts it at m/(1 − q); the periodic state is
 * Σ_(j≥0) q^j x_(t−2−j). With x̃ = x − m periodic of period P and zero mean, their difference is
 * Σ_(j<P) q^j x̃_j / (1 − q^P) = Σ_(j<P) (q^j − 1) x̃_j / (1 − q^P), so |δ| ≤ D·min(1/(1 − q), (P − (1 − q^P)/(1 − q))/(1 − q^P))
 * with D = max|x̃| (closed form, geometric sums). The deviation decays by q each step, and the mode adds c q s_t to the
 * response: on day d every step is off by at most Σ_n |c_n| q_n |δ_n| (q_n^P)^(d−1).
 */
import type { PulseModes } from "./pulseModes.ts";

/** The bound as a function of the number of days repeated (d ≥ 1), W/m² per filter input in °C. */
export interface RepeatedDayBound {
  /** Largest error of any step of day d. */
  after(days: number): number;
}

function spreadAboutMean(series: readonly number[]): number {
  const mean = series.reduce((s, v) => s + v, 0) / series.length;
  return series.reduce((worst, v) => Math.max(worst, Math.abs(v - mean)), 0);
}

/** Bound for one modal filter fed with the periodic day `series` (one value per step). */
export function repeatedDayBound(modes: PulseModes, series: readonly number[]): RepeatedDayBound {
  const period = series.length;
  const spread = spreadAboutMean(series);
  const amplitude: number[] = [];
  const dailyDecay: number[] = [];
  modes.ratios.forEach((q, n) => {
    if (!(q > 0)) return;
    const oneMinusQ = -Math.expm1(Math.log(q));
    const oneMinusQP = -Math.expm1(period * Math.log(q));
    const deviation = spread * Math.min(1 / oneMinusQ, (period - oneMinusQP / oneMinusQ) / oneMinusQP);
    amplitude.push(Math.abs(modes.coefficients[n]!) * q * deviation);
    dailyDecay.push(1 - oneMinusQP);
  });
  return {
    after(days: number): number {
      let sum = 0;
      for (let n = 0; n < amplitude.length; n++) sum += amplitude[n]! * dailyDecay[n]! ** (days - 1);
      return sum;
    },
  };
}

/** Bound of the inside flux Y·T_sa − Z·T_i of a repeated day: the two filters' bounds added. */
export function insideFluxBound(
  modes: { readonly Y: PulseModes; readonly Z: PulseModes },
  solAirC: readonly number[],
  indoorC: readonly number[],
): RepeatedDayBound {
  const y = repeatedDayBound(modes.Y, solAirC);
  const z = repeatedDayBound(modes.Z, indoorC);
  return { after: (days) => y.after(days) + z.after(days) };
}
