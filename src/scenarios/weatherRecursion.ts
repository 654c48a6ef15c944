import { type FlatModes, flatModes, modalSeries } from "../engine/modalSeries.ts";
import type { PulseModes } from "../engine/pulseModes.ts";
import type { FluxModes } from "../engine/surfaceFlux.ts";

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

/** A filter input laid out in running order: the warm-up steps, then the reported steps, and the steady past before. */
export interface WarmUpInput {
  readonly input: Float64Array;
  /** Mean of the warm-up values (the first value when there is no warm-up): every input before the first. */
  readonly initial: number;
}

/**
 * The last `warmUpSteps` steps of the series (wrapping round as often as needed: periodic-year assumption) followed by
 * its first `length` steps (wrapping too), with the steady past at the mean of the warm-up values.
 */
export function warmUpInput(series: ArrayLike<number>, warmUpSteps: number, length: number): WarmUpInput {
  const n = series.length;
  const input = new Float64Array(warmUpSteps + length);
  let sum = 0;
  for (let j = 0; j < warmUpSteps; j++) {
    const value = series[(((n - warmUpSteps + j) % n) + n) % n]!;
    input[j] = value;
    sum += value;
  }
  for (let k = 0; k < length; k++) input[warmUpSteps + k] = series[k % n]!;
  return { input, initial: warmUpSteps > 0 ? sum / warmUpSteps : series[0]! };
}

/** Response of one modal filter to a series after the warm-up (a term of the flux, W/m²), for the reported steps. */
export function responseAfterWarmUp(modes: FlatModes, input: WarmUpInput, warmUpSteps: number): Float64Array {
  return modalSeries(modes, input.input, input.initial, warmUpSteps);
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
  const outside = warmUpInput(solAirC, warmUpSteps, length);
  const inside = warmUpInput(indoorC, warmUpSteps, length);
  const y = flatModes(modes.Y);
  const yOut = responseAfterWarmUp(y, outside, warmUpSteps);
  const zIn = responseAfterWarmUp(flatModes(modes.Z), inside, warmUpSteps);
  const xOut = responseAfterWarmUp(flatModes(modes.X), outside, warmUpSteps);
  const yIn = responseAfterWarmUp(y, inside, warmUpSteps);
  for (let k = 0; k < length; k++) {
    yOut[k] = yOut[k]! - zIn[k]!;
    xOut[k] = xOut[k]! - yIn[k]!;
  }
  return { insideWPerM2: yOut, outsideWPerM2: xOut };
}

/**
 * The indoor term Z·T_i of the inside flux after the warm-up, W/m²: it depends only on the construction and the
 * indoor series, so every surface of one construction in a scenario shares it.
 */
export function indoorTermAfterWarmUp(
  z: PulseModes,
  indoorC: ArrayLike<number>,
  warmUpSteps: number,
  length: number,
): Float64Array {
  return responseAfterWarmUp(flatModes(z), warmUpInput(indoorC, warmUpSteps, length), warmUpSteps);
}

/**
 * Inside flux after the warm-up, W/m², as Y·T_sa − Z·T_i with the shared indoor term: the same numbers as
 * `fluxesAfterWarmUp(...).insideWPerM2`, without the outside flux (a weather year does not report it).
 */
export function insideFluxAfterWarmUp(
  y: FlatModes,
  solAirC: ArrayLike<number>,
  indoorTerm: Float64Array,
  warmUpSteps: number,
): Float64Array {
  const length = indoorTerm.length;
  const inside = responseAfterWarmUp(y, warmUpInput(solAirC, warmUpSteps, length), warmUpSteps);
  for (let k = 0; k < length; k++) inside[k] = inside[k]! - indoorTerm[k]!;
  return inside;
}

/** A surface of a weather year for the recursion: its construction's modal form and its sol-air series. */
export interface RecursionSurface {
  readonly modes: FluxModes;
  readonly solAirC: ArrayLike<number>;
}

/**
 * Inside flux of each surface after the warm-up (the numbers of `fluxesAfterWarmUp`), handed to `visit` one surface at
 * a time in order, so a caller that keeps only summaries holds one series at a time; the flat Y filter and the indoor
 * term Z·T_i are made once per modal form (one construction) and shared.
 */
export function forEachInsideFlux(
  surfaces: readonly RecursionSurface[],
  indoorC: ArrayLike<number>,
  warmUpSteps: number,
  length: number,
  visit: (index: number, insideWPerM2: Float64Array) => void,
): void {
  const shared = new Map<FluxModes, { y: FlatModes; indoorTerm: Float64Array }>();
  for (const [index, { modes, solAirC }] of surfaces.entries()) {
    let filters = shared.get(modes);
    if (filters === undefined) {
      filters = {
        y: flatModes(modes.Y),
        indoorTerm: indoorTermAfterWarmUp(modes.Z, indoorC, warmUpSteps, length),
      };
      shared.set(modes, filters);
    }
    visit(index, insideFluxAfterWarmUp(filters.y, solAirC, filters.indoorTerm, warmUpSteps));
  }
}
