import { periodicFromModes } from "./periodic.ts";
import { insideFluxBound, type RepeatedDayBound } from "./periodicStart.ts";
import type { PulseModes } from "./pulseModes.ts";

/** The modal form of X, Y and Z of one construction at the scenario timestep (air to air). */
export interface FluxModes {
  readonly X: PulseModes;
  readonly Y: PulseModes;
  readonly Z: PulseModes;
}

/** Fluxes of one surface at each step, W/m², positive from outside to inside. */
export interface SurfaceFlux {
  /** Flux leaving the inside surface into the room. */
  readonly insideWPerM2: readonly number[];
  /** Flux entering the outside surface from outside. */
  readonly outsideWPerM2: readonly number[];
}

/** Circular convolution Σ_j p_j x((k − j) mod N). */
function circular(p: readonly number[], x: readonly number[]): number[] {
  const n = x.length;
  const out = new Array<number>(n).fill(0);
  for (let k = 0; k < n; k++) {
    let sum = 0;
    for (let j = 0; j < n; j++) sum += p[j]! * x[(k - j + n) % n]!;
    out[k] = sum;
  }
  return out;
}

/**
 * Steady-periodic fluxes for one day repeated forever: periodic response factors (each mode summed in
 * closed form over all past days) applied by circular convolution; exact for temperatures that are
 * piecewise linear between steps.
 */
export function steadyPeriodicFlux(
  modes: FluxModes,
  solAirC: readonly number[],
  indoorC: readonly number[],
): SurfaceFlux {
  const n = solAirC.length;
  const pX = periodicFromModes(modes.X, n);
  const pY = periodicFromModes(modes.Y, n);
  const pZ = periodicFromModes(modes.Z, n);
  const yOut = circular(pY, solAirC);
  const zIn = circular(pZ, indoorC);
  const xOut = circular(pX, solAirC);
  const yIn = circular(pY, indoorC);
  return {
    insideWPerM2: yOut.map((v, k) => v - zIn[k]!),
    outsideWPerM2: xOut.map((v, k) => v - yIn[k]!),
  };
}

/** A running modal recursion: one first-order state per pole plus the two leading terms. */
export class ModalFilter {
  readonly #modes: PulseModes;
  readonly #states: Float64Array;
  #previous1 = 0;
  #previous2 = 0;

  /** Starts the filter with all past inputs equal to `initial`. */
  constructor(modes: PulseModes, initial = 0) {
    this.#modes = modes;
    this.#states = new Float64Array(modes.ratios.length);
    this.#previous1 = initial;
    this.#previous2 = initial;
    // A constant past input x gives the state x / (1 − q) for each mode.
    for (let n = 0; n < this.#states.length; n++) this.#states[n] = initial / (1 - modes.ratios[n]!);
  }

  /** Feeds the next input and returns the response at this step. */
  step(x: number): number {
    const m = this.#modes;
    let value = m.rf0 * x + m.rf1 * this.#previous1;
    const x2 = this.#previous2;
    for (let n = 0; n < this.#states.length; n++) {
      const q = m.ratios[n]!;
      const state = q * this.#states[n]! + x2;
      this.#states[n] = state;
      value += m.coefficients[n]! * q * state;
    }
    this.#previous2 = this.#previous1;
    this.#previous1 = x;
    return value;
  }
}

/** Running inside and outside fluxes of one surface from its modal form. */
export class SurfaceRecursion {
  readonly #yOut: ModalFilter;
  readonly #zIn: ModalFilter;
  readonly #xOut: ModalFilter;
  readonly #yIn: ModalFilter;

  /** Starts with a steady past at the given outdoor (sol-air) and indoor temperatures. */
  constructor(modes: FluxModes, initialOutC: number, initialInC: number) {
    this.#yOut = new ModalFilter(modes.Y, initialOutC);
    this.#zIn = new ModalFilter(modes.Z, initialInC);
    this.#xOut = new ModalFilter(modes.X, initialOutC);
    this.#yIn = new ModalFilter(modes.Y, initialInC);
  }

  /** Advances one step; returns [inside flux, outside flux] in W/m². */
  step(outC: number, inC: number): [number, number] {
    const inside = this.#yOut.step(outC) - this.#zIn.step(inC);
    const outside = this.#xOut.step(outC) - this.#yIn.step(inC);
    return [inside, outside];
  }
}

/** Result of repeating a design day until the whole day settles. */
export interface RepeatedDay extends SurfaceFlux {
  readonly days: number;
  /** Relative change of the daily peak inside flux between the last two days. */
  readonly peakChange: number;
  /** max over all steps of |q_i(last day) − q_i(day before)| / scale (scale: max(peak |q_i|, floor)). */
  readonly dayChange: number;
  /**
   * Bound of the last day's distance from the steady-periodic day at any step, relative to scale (`periodicStart.ts`:
   * a priori, from the modes and the day's inputs); NaN if it never came below the tolerance.
   */
  readonly remainingEstimate: number;
}

/** Largest number of repeated days; never reached by the constructions the pole budget admits (sweep test). */
export const MAX_REPEATED_DAYS = 20000;

/**
 * Runs the design day again and again through the modal recursion (starting from a steady state at the daily
 * means) until the bound of the whole day's distance from the steady-periodic day (`insideFluxBound`) and the last
 * day-to-day change are both below `relativeTolerance` of max(peak |q_i|, `scaleFloor`) (W/m², e.g. U × 1 K).
 */
export function repeatedDayFlux(
  modes: FluxModes,
  solAirC: readonly number[],
  indoorC: readonly number[],
  relativeTolerance = 1e-4,
  maxDays = MAX_REPEATED_DAYS,
  scaleFloor = 0,
): RepeatedDay {
  const run = new SurfaceRecursion(modes, meanOf(solAirC), meanOf(indoorC));
  return repeatUntilSettled(
    solAirC.length,
    (k) => run.step(solAirC[k]!, indoorC[k]!),
    { tolerance: relativeTolerance, maxDays, scaleFloor },
    insideFluxBound(modes, solAirC, indoorC),
  );
}

/** Polynomial CTF coefficients of one construction: X, Y, Z (n = 0, 1, …) and Φ (n = 1, 2, …). */
export interface CtfCoefficients {
  readonly X: readonly number[];
  readonly Y: readonly number[];
  readonly Z: readonly number[];
  readonly Phi: readonly number[];
}

/**
 * Runs the design day again and again through the polynomial CTF recursion
 * q_i,t = Σ Y_n T_o,t−n − Σ Z_n T_i,t−n + Σ Φ_n q_i,t−n (and the same with X, Y for q_o), from a steady start
 * at the daily means, until the daily peak inside flux changes by less than `relativeTolerance`.
 */
export function ctfRepeatedDayFlux(
  ctf: CtfCoefficients,
  uValue: number,
  solAirC: readonly number[],
  indoorC: readonly number[],
  relativeTolerance = 1e-4,
  maxDays = MAX_REPEATED_DAYS,
  scaleFloor = 0,
  modes?: FluxModes,
): RepeatedDay {
  const meanOut = meanOf(solAirC);
  const meanIn = meanOf(indoorC);
  const history = Math.max(ctf.X.length, ctf.Y.length, ctf.Z.length, ctf.Phi.length + 1) + 1;
  const tOut: number[] = new Array<number>(history).fill(meanOut);
  const tIn: number[] = new Array<number>(history).fill(meanIn);
  const qIn: number[] = new Array<number>(history).fill(uValue * (meanOut - meanIn));
  const qOut: number[] = qIn.slice();
  const step = (k: number): [number, number] => {
    tOut.unshift(solAirC[k]!);
    tIn.unshift(indoorC[k]!);
    tOut.length = history;
    tIn.length = history;
    let qi = 0;
    let qo = 0;
    for (let j = 0; j < ctf.Y.length; j++) {
      qi += ctf.Y[j]! * tOut[j]!;
      qo -= ctf.Y[j]! * tIn[j]!;
    }
    for (let j = 0; j < ctf.Z.length; j++) qi -= ctf.Z[j]! * tIn[j]!;
    for (let j = 0; j < ctf.X.length; j++) qo += ctf.X[j]! * tOut[j]!;
    for (let j = 0; j < ctf.Phi.length; j++) {
      qi += ctf.Phi[j]! * qIn[j]!;
      qo += ctf.Phi[j]! * qOut[j]!;
    }
    qIn.unshift(qi);
    qOut.unshift(qo);
    qIn.length = history;
    qOut.length = history;
    return [qi, qo];
  };
  // The CTF reproduces the response of the modal form it was built from (resynthesis to 1e-6 U, the same slowest
  // poles), so that form's bound tells how many days the CTF's start needs too; without it, the change alone decides.
  const bound = modes === undefined ? { after: () => 0 } : insideFluxBound(modes, solAirC, indoorC);
  return repeatUntilSettled(
    solAirC.length,
    step,
    { tolerance: relativeTolerance, maxDays, scaleFloor },
    bound,
  );
}

/**
 * Repeats a day (one call of `step` per time step) until the a priori bound of the day's distance from the
 * steady-periodic day and the day-to-day change over all steps are both below the tolerance (relative to
 * max(peak |q_i|, floor)); at least two days.
 */
function repeatUntilSettled(
  steps: number,
  step: (k: number) => [number, number],
  options: { readonly tolerance: number; readonly maxDays: number; readonly scaleFloor: number },
  bound: RepeatedDayBound,
): RepeatedDay {
  let previous: number[] = [];
  let inside: number[] = [];
  let outside: number[] = [];
  let last = { peakChange: NaN, dayChange: NaN };
  for (let day = 1; day <= options.maxDays; day++) {
    inside = [];
    outside = [];
    for (let k = 0; k < steps; k++) {
      const [qi, qo] = step(k);
      inside.push(qi);
      outside.push(qo);
    }
    const peak = Math.max(...inside.map(Math.abs));
    const scale = Math.max(peak, options.scaleFloor, 1e-300);
    if (day >= 2) {
      let change = 0;
      for (let k = 0; k < steps; k++) change = Math.max(change, Math.abs(inside[k]! - previous[k]!));
      const previousPeak = Math.max(...previous.map(Math.abs));
      last = { peakChange: Math.abs(peak - previousPeak) / Math.max(peak, 1e-12), dayChange: change / scale };
      const remainingEstimate = bound.after(day) / scale;
      if (last.dayChange <= options.tolerance && remainingEstimate <= options.tolerance) {
        return { insideWPerM2: inside, outsideWPerM2: outside, days: day, ...last, remainingEstimate };
      }
    }
    previous = inside;
  }
  return {
    insideWPerM2: inside,
    outsideWPerM2: outside,
    days: options.maxDays,
    ...last,
    remainingEstimate: NaN,
  };
}

function meanOf(xs: readonly number[]): number {
  return xs.reduce((a, b) => a + b, 0) / xs.length;
}
