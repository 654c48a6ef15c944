import { type FluxModes, SurfaceRecursion } from "../engine/surfaceFlux.ts";

/** Shortest warm-up, days (our stated rule). */
export const MIN_WARM_UP_DAYS = 7;
/** Warm-up length in slowest time constants τ1: the start-up error decays as e^(−t/τ1), e^(−5) ≈ 0.7 % (our stated rule). */
export const WARM_UP_TIME_CONSTANTS = 5;

/** Warm-up length in days for a slowest time constant τ1 in hours: max(7, ⌈5 τ1 / 24 h⌉). */
export function warmUpDays(tau1H: number): number {
  return Math.max(MIN_WARM_UP_DAYS, Math.ceil((WARM_UP_TIME_CONSTANTS * tau1H) / 24));
}

/** Inside and outside fluxes at each step, W/m², positive from outside to inside. */
export interface StepFluxes {
  readonly insideWPerM2: Float64Array;
  readonly outsideWPerM2: Float64Array;
}

/**
 * Runs the modal recursion over the last `warmUpSteps` steps of the series (wrapping round as often as needed:
 * periodic-year assumption), started from a steady state at their mean sol-air and indoor temperatures, then over the
 * first `length` steps of the series, and returns the fluxes of those `length` steps.
 */
export function fluxesAfterWarmUp(
  modes: FluxModes,
  solAirC: ArrayLike<number>,
  indoorC: ArrayLike<number>,
  warmUpSteps: number,
  length: number,
): StepFluxes {
  const n = solAirC.length;
  const index = (j: number) => (((n - warmUpSteps + j) % n) + n) % n;
  let meanOut = 0;
  let meanIn = 0;
  for (let j = 0; j < warmUpSteps; j++) {
    meanOut += solAirC[index(j)]!;
    meanIn += indoorC[index(j)]!;
  }
  const run = new SurfaceRecursion(
    modes,
    warmUpSteps > 0 ? meanOut / warmUpSteps : solAirC[0]!,
    warmUpSteps > 0 ? meanIn / warmUpSteps : indoorC[0]!,
  );
  for (let j = 0; j < warmUpSteps; j++) run.step(solAirC[index(j)]!, indoorC[index(j)]!);
  const insideWPerM2 = new Float64Array(length);
  const outsideWPerM2 = new Float64Array(length);
  for (let k = 0; k < length; k++) {
    const [inside, outside] = run.step(solAirC[k % n]!, indoorC[k % n]!);
    insideWPerM2[k] = inside;
    outsideWPerM2[k] = outside;
  }
  return { insideWPerM2, outsideWPerM2 };
}
