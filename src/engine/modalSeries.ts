/**
 * The modal recursion of `ModalFilter` (surfaceFlux.ts) run over a whole series in flat typed arrays. Every
 * floating-point operation is the one `ModalFilter.step` performs, in the same order, so the outputs are
 * bit-identical to stepping a `ModalFilter`; only the bookkeeping (objects, bounds, tuples) is gone.
 */
import type { PulseModes } from "./pulseModes.ts";

/** A modal form in flat arrays: RF_0, RF_1, the ratios q_n and the weights c_n·q_n used at every step. */
export interface FlatModes {
  readonly rf0: number;
  readonly rf1: number;
  readonly ratios: Float64Array;
  /** c_n·q_n, the product `ModalFilter.step` forms first (left to right) before multiplying by the state. */
  readonly weights: Float64Array;
}

/** Flattens a modal form for `modalSeries`. */
export function flatModes(modes: PulseModes): FlatModes {
  const count = modes.ratios.length;
  const ratios = new Float64Array(count);
  const weights = new Float64Array(count);
  for (let n = 0; n < count; n++) {
    const q = modes.ratios[n]!;
    ratios[n] = q;
    weights[n] = modes.coefficients[n]! * q;
  }
  return { rf0: modes.rf0, rf1: modes.rf1, ratios, weights };
}

/**
 * Response of the modal filter to `input` with every earlier input equal to `initial` (the `ModalFilter`
 * constructor's steady past), keeping the outputs from step `skip` on: out[t − skip] for t = skip … length − 1.
 * The loop runs over the whole series once per block of up to eight modes, whose state chains are independent and
 * overlap in the processor; each output still receives RF_0 x + RF_1 x₋₁ first and then the modes in index order,
 * exactly as `ModalFilter.step` sums them.
 */
export function modalSeries(
  modes: FlatModes,
  input: Float64Array,
  initial: number,
  skip = 0,
): Float64Array {
  const length = input.length;
  const { rf0, rf1, ratios } = modes;
  const sums = new Float64Array(length);
  // Leading terms: RF_0 x_t + RF_1 x_(t−1) with x_(−1) = initial.
  let previous = initial;
  for (let t = 0; t < length; t++) {
    const x = input[t]!;
    sums[t] = rf0 * x + rf1 * previous;
    previous = x;
  }
  // Input two steps back, x_(t−2), with x_(−1) = x_(−2) = initial.
  const lagged = new Float64Array(length);
  for (let t = 0; t < length; t++) lagged[t] = t >= 2 ? input[t - 2]! : initial;
  const count = ratios.length;
  let n = 0;
  for (; n + 8 <= count; n += 8) addEight(modes, n, lagged, initial, sums);
  if (n + 4 <= count) addFour(modes, n, lagged, initial, sums), n += 4;
  if (n + 2 <= count) addTwo(modes, n, lagged, initial, sums), n += 2;
  if (n < count) addOne(modes, n, lagged, initial, sums);
  return skip === 0 ? sums : sums.slice(skip);
}

function addEight(m: FlatModes, n: number, lagged: Float64Array, initial: number, sums: Float64Array): void {
  const q = m.ratios, w = m.weights;
  const q0 = q[n]!, q1 = q[n + 1]!, q2 = q[n + 2]!, q3 = q[n + 3]!;
  const q4 = q[n + 4]!, q5 = q[n + 5]!, q6 = q[n + 6]!, q7 = q[n + 7]!;
  const w0 = w[n]!, w1 = w[n + 1]!, w2 = w[n + 2]!, w3 = w[n + 3]!;
  const w4 = w[n + 4]!, w5 = w[n + 5]!, w6 = w[n + 6]!, w7 = w[n + 7]!;
  let s0 = initial / (1 - q0), s1 = initial / (1 - q1), s2 = initial / (1 - q2), s3 = initial / (1 - q3);
  let s4 = initial / (1 - q4), s5 = initial / (1 - q5), s6 = initial / (1 - q6), s7 = initial / (1 - q7);
  for (let t = 0; t < lagged.length; t++) {
    const x2 = lagged[t]!;
    s0 = q0 * s0 + x2, s1 = q1 * s1 + x2, s2 = q2 * s2 + x2, s3 = q3 * s3 + x2;
    s4 = q4 * s4 + x2, s5 = q5 * s5 + x2, s6 = q6 * s6 + x2, s7 = q7 * s7 + x2;
    sums[t] = sums[t]! + w0 * s0 + w1 * s1 + w2 * s2 + w3 * s3 + w4 * s4 + w5 * s5 + w6 * s6 + w7 * s7;
  }
}

function addFour(m: FlatModes, n: number, lagged: Float64Array, initial: number, sums: Float64Array): void {
  const q = m.ratios, w = m.weights;
  const q0 = q[n]!, q1 = q[n + 1]!, q2 = q[n + 2]!, q3 = q[n + 3]!;
  const w0 = w[n]!, w1 = w[n + 1]!, w2 = w[n + 2]!, w3 = w[n + 3]!;
  let s0 = initial / (1 - q0), s1 = initial / (1 - q1), s2 = initial / (1 - q2), s3 = initial / (1 - q3);
  for (let t = 0; t < lagged.length; t++) {
    const x2 = lagged[t]!;
    s0 = q0 * s0 + x2, s1 = q1 * s1 + x2, s2 = q2 * s2 + x2, s3 = q3 * s3 + x2;
    sums[t] = sums[t]! + w0 * s0 + w1 * s1 + w2 * s2 + w3 * s3;
  }
}

function addTwo(m: FlatModes, n: number, lagged: Float64Array, initial: number, sums: Float64Array): void {
  const q0 = m.ratios[n]!, q1 = m.ratios[n + 1]!, w0 = m.weights[n]!, w1 = m.weights[n + 1]!;
  let s0 = initial / (1 - q0), s1 = initial / (1 - q1);
  for (let t = 0; t < lagged.length; t++) {
    const x2 = lagged[t]!;
    s0 = q0 * s0 + x2, s1 = q1 * s1 + x2;
    sums[t] = sums[t]! + w0 * s0 + w1 * s1;
  }
}

function addOne(m: FlatModes, n: number, lagged: Float64Array, initial: number, sums: Float64Array): void {
  const q0 = m.ratios[n]!, w0 = m.weights[n]!;
  let s0 = initial / (1 - q0);
  for (let t = 0; t < lagged.length; t++) {
    s0 = q0 * s0 + lagged[t]!;
    sums[t] = sums[t]! + w0 * s0;
  }
}

/**
 * The same response stepped time-outer like `ModalFilter` but over flat arrays: the straightforward loop order,
 * kept for the benchmark's comparison of loop orders and as a second reference in the tests.
 */
export function modalSeriesStepwise(
  modes: FlatModes,
  input: Float64Array,
  initial: number,
  skip = 0,
): Float64Array {
  const { rf0, rf1, ratios, weights } = modes;
  const count = ratios.length;
  const states = new Float64Array(count);
  for (let n = 0; n < count; n++) states[n] = initial / (1 - ratios[n]!);
  const out = new Float64Array(Math.max(0, input.length - skip));
  let previous1 = initial;
  let previous2 = initial;
  for (let t = 0; t < input.length; t++) {
    const x = input[t]!;
    let value = rf0 * x + rf1 * previous1;
    for (let n = 0; n < count; n++) {
      const state = ratios[n]! * states[n]! + previous2;
      states[n] = state;
      value += weights[n]! * state;
    }
    previous2 = previous1;
    previous1 = x;
    if (t >= skip) out[t - skip] = value;
  }
  return out;
}
