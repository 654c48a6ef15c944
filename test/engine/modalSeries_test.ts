import assert from "node:assert/strict";
import { flatModes, modalSeries, modalSeriesStepwise } from "../../src/engine/modalSeries.ts";
import type { PulseModes } from "../../src/engine/pulseModes.ts";
import { ModalFilter } from "../../src/engine/surfaceFlux.ts";
import { DEMO_CONSTRUCTIONS, loadDemoYear } from "../scenarios/_demoYear.ts";

const demo = await loadDemoYear();

/** Index of the first element that is not the same double (Object.is: −0 ≠ 0, NaN = NaN), or −1. */
function firstDifference(a: ArrayLike<number>, b: ArrayLike<number>): number {
  if (a.length !== b.length) return Math.min(a.length, b.length);
  for (let k = 0; k < a.length; k++) if (!Object.is(a[k], b[k])) return k;
  return -1;
}

/** The straightforward path: one `ModalFilter` stepped over the input, outputs from step `skip` on. */
function stepped(modes: PulseModes, input: Float64Array, initial: number, skip: number): Float64Array {
  const filter = new ModalFilter(modes, initial);
  const out = new Float64Array(input.length - skip);
  for (let t = 0; t < input.length; t++) {
    const value = filter.step(input[t]!);
    if (t >= skip) out[t - skip] = value;
  }
  return out;
}

/** Two months of the demo's dry bulb with a step of +15 K every 100 h, so every mode is excited. */
const input = Float64Array.from(
  { length: 1500 },
  (_, t) => demo.weather.dryBulbC[t]! + (t % 200 < 100 ? 15 : 0),
);
const initial = 7.25;

for (const timestepS of [3600, 900]) {
  Deno.test(`modalSeries() is bit-identical to stepping ModalFilter on the demo constructions (Δ = ${timestepS} s)`, () => {
    const remainders = new Set<number>();
    for (const id of DEMO_CONSTRUCTIONS) {
      const modes = demo.context.analysisAt(id, timestepS).airToAir.modes;
      for (const key of ["X", "Y", "Z"] as const) {
        const m = modes[key];
        remainders.add(m.ratios.length % 8);
        const flat = flatModes(m);
        for (const skip of [0, 1, 168]) {
          const reference = stepped(m, input, initial, skip);
          assert.equal(
            firstDifference(modalSeries(flat, input, initial, skip), reference),
            -1,
            `${id} ${key} blocked`,
          );
          assert.equal(
            firstDifference(modalSeriesStepwise(flat, input, initial, skip), reference),
            -1,
            `${id} ${key}`,
          );
        }
      }
    }
    // The mode counts reach the 4-, 2- and 1-mode tails of the blocked loop (13 = 8+4+1, 14 = 8+4+2, 18 = 8+8+2).
    if (timestepS === 3600) {
      for (const r of [5, 6, 2]) assert.ok(remainders.has(r), `mode count ≡ ${r} mod 8`);
    }
  });
}

Deno.test("the bit-identity comparison sees one ulp of one weight and 1e-12 K of one input", () => {
  const m = demo.analysis("RF-1").airToAir.modes.Y;
  const reference = stepped(m, input, initial, 0);
  const flat = flatModes(m);
  // The three slowest modes carry most of the response; a fast mode's weight is far below one ulp of the sum.
  for (const n of [0, 1, 2]) {
    const weights = flat.weights.slice();
    weights[n] = weights[n]! * (1 + Number.EPSILON);
    assert.notEqual(weights[n], flat.weights[n]);
    assert.notEqual(
      firstDifference(modalSeries({ ...flat, weights }, input, initial), reference),
      -1,
      `mode ${n}`,
    );
  }
  // One input 1e-12 K higher (far below any tolerance anyone would set): the outside self-response X carries it.
  const x = demo.analysis("RF-1").airToAir.modes.X;
  const nudged = input.slice();
  nudged[700] = nudged[700]! + 1e-12;
  assert.equal(firstDifference(modalSeries(flatModes(x), input, initial), stepped(x, input, initial, 0)), -1);
  assert.equal(
    firstDifference(modalSeries(flatModes(x), nudged, initial), stepped(x, input, initial, 0)),
    700,
  );
});

Deno.test("modalSeries() from a steady past stays at the steady response U·x on a constant input", () => {
  // Identity: RF_0 + RF_1 + Σ c_n q_n / (1 − q_n) = Σ RF_j = U, so a constant input x gives U x at every step.
  const a = demo.analysis("EW-2");
  const flat = flatModes(a.airToAir.modes.Y);
  const out = modalSeries(flat, new Float64Array(500).fill(12), 12);
  for (const value of out) {
    assert.ok(Math.abs(value - 12 * a.airToAir.uValue) < 1e-12 * 12 * a.airToAir.uValue);
  }
});
