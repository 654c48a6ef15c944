import assert from "node:assert/strict";
import {
  formatFixed,
  formatSig,
  formatTrim,
  MINUS,
  THIN_SPACE,
  withUnit,
} from "../../src/report/page/format.ts";

// Expected strings below are hand-rounded (round half up on the decimal value), from memory of the
// usual significant-figure rule; no published source.

Deno.test("formatSig() rounds to significant digits and keeps trailing zeros", () => {
  assert.equal(formatSig(0.238471, 3), "0.238");
  assert.equal(formatSig(4.193383, 3), "4.19");
  assert.equal(formatSig(0.3, 2), "0.30");
  assert.equal(formatSig(1234.5, 3), "1230");
  assert.equal(formatSig(220.5, 3), "221");
  assert.equal(formatSig(0.1 + 0.2, 3), "0.300");
  assert.equal(formatSig(999.7, 3), "1000");
  assert.equal(formatSig(0, 3), "0.00");
});

Deno.test("formatSig() uses U+2212 for negatives and ×10ⁿ for very small or large magnitudes", () => {
  assert.equal(formatSig(-1.5, 2), `${MINUS}1.5`);
  assert.equal(formatSig(2.5e-7, 2), `2.5${THIN_SPACE}×${THIN_SPACE}10⁻⁷`);
  assert.equal(formatSig(-3.14159e12, 3), `${MINUS}3.14${THIN_SPACE}×${THIN_SPACE}10¹²`);
  assert.equal(formatSig(Number.NaN, 3), "NaN");
  assert.equal(formatSig(-Infinity, 3), `${MINUS}∞`);
  assert.ok(!formatSig(-0.5, 3).includes("-"), "no ASCII hyphen-minus");
});

Deno.test("formatTrim() drops trailing zeros and never prints a negative zero", () => {
  assert.equal(formatTrim(10, 4), "10");
  assert.equal(formatTrim(12.5, 4), "12.5");
  assert.equal(formatTrim(0.035, 4), "0.035");
  assert.equal(formatTrim(1600, 4), "1600");
  assert.equal(formatTrim(-1e-30, 4), `${MINUS}1.000${THIN_SPACE}×${THIN_SPACE}10⁻³⁰`);
  assert.equal(formatTrim(-0, 4), "0");
});

Deno.test("formatFixed() and withUnit() format without locale", () => {
  assert.equal(formatFixed(-0.004, 2), "0.00");
  assert.equal(formatFixed(-2.5, 1), `${MINUS}2.5`);
  assert.equal(withUnit("0.238", "W/(m²·K)"), `0.238${THIN_SPACE}W/(m²·K)`);
});

Deno.test("formatSig() rejects a digit count outside 1 to 15", () => {
  assert.throws(() => formatSig(1, 0), RangeError);
});
