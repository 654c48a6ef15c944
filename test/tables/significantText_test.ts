import assert from "node:assert/strict";
import { analyseConstruction } from "../../src/engine/mod.ts";
import {
  significantText,
  significantTextByToPrecision,
  type SignificantTextCounter,
} from "../../src/tables/significantText.ts";
import { HEAVY_WALL } from "../engine/walls.ts";

/** Plain decimal: optional sign, digits, optional fraction without trailing zeros; never an exponent. */
const PLAIN = /^-?\d+(\.\d*[1-9])?$/;

/** Values that test the rounding: random magnitudes and bit patterns, exact binary ties, decade boundaries. */
function testValues(): number[] {
  let s = 2024;
  const rand = () => ((s = (1664525 * s + 1013904223) >>> 0) / 2 ** 32);
  const bits = new Float64Array(1);
  const words = new Uint32Array(bits.buffer);
  const values = [0.5, 1, 999999.5, 999999.4999999999, 9.999995e-7, 1e-7, 123456.5, 1e21, 5e-324, -2.5e-300];
  // Whole numbers (a CSV's step index and hours): each side of 10^p and 10^6, trailing zeros, negatives.
  for (const w of [7, 10, 99, 100, 999, 1000, 1001, 9999, 10000, 12300, 99999, 100000, 120000, 999999]) {
    values.push(w, -w, w + 1, w * 10, w * 1000);
  }
  for (let i = 0; i < 40_000; i++) {
    values.push((rand() - 0.5) * 10 ** (Math.floor(rand() * 60) - 35));
    words[0] = (rand() * 2 ** 32) >>> 0;
    words[1] = (rand() * 2 ** 32) >>> 0;
    if (Number.isFinite(bits[0]!)) values.push(bits[0]!);
    // An exact tie at the 7th significant figure, scaled by a power of two (exact): n + 0.5 with n of 6 digits.
    values.push((100000 + Math.floor(rand() * 900000) + 0.5) / 2 ** Math.floor(rand() * 20));
  }
  return values;
}

Deno.test("significantText() writes toPrecision's rounding as a plain decimal, for every precision", () => {
  // Reference: Number.prototype.toPrecision (ECMA-262, §21.1.3.5), read back as a number.
  for (const v of testValues()) {
    for (const p of [1, 3, 6, 10, 15]) {
      const text = significantText(v, p);
      assert.match(text, PLAIN, `${v} to ${p}`);
      assert.equal(Number(text), Number(v.toPrecision(p)), `${v} to ${p}`);
      assert.equal(text, significantTextByToPrecision(v, p), `${v} to ${p}`);
    }
  }
});

Deno.test("significantText() rounds response factors by one scaling, leaving toPrecision to near-ties only", () => {
  const analysis = analyseConstruction(HEAVY_WALL, 3600);
  if (analysis.kind !== "analysis") throw new Error(analysis.message);
  const rf = analysis.airToAir.responseFactors;
  const values = [...rf.X, ...rf.Y, ...rf.Z].filter((v) => v !== 0);
  const counter: SignificantTextCounter = { fallback: 0 };
  for (const v of values) assert.equal(significantText(v, 6, counter), significantTextByToPrecision(v, 6));
  assert.ok(values.length > 100);
  // Only a fraction within s·1e−15 of one half goes to toPrecision: a window of about 1e−9 at six figures
  // (an estimate from its width, no source); allow 1 %.
  assert.ok(
    counter.fallback <= values.length / 100,
    `${counter.fallback} of ${values.length} by toPrecision`,
  );
});
