import assert from "node:assert/strict";
import { parseQuantity, type QuantityKind } from "../../src/project/quantity.ts";

function value(text: string, kind: QuantityKind): number {
  const result = parseQuantity(text, kind);
  if (!result.ok) throw new Error(`expected ${text} to parse: ${result.message}`);
  return result.value;
}

function close(actual: number, expected: number, relative: number): void {
  assert.ok(Math.abs(actual - expected) <= relative * Math.abs(expected), `${actual} vs ${expected}`);
}

Deno.test("parseQuantity() converts SI prefixes exactly", () => {
  assert.deepStrictEqual(value("200 mm", "length"), 0.2);
  assert.deepStrictEqual(value("1.4 W/(m K)", "conductivity"), 1.4);
  assert.deepStrictEqual(value("0.13 m^2 K/W", "resistance"), 0.13);
  assert.deepStrictEqual(value("30 min", "time"), 1800);
});

Deno.test("parseQuantity() converts IP units with the exact international constants", () => {
  // 1 in = 0.0254 m exactly (international yard and pound agreement, 1959)
  close(value("8 in", "length"), 0.2032, 1e-15);
  // 1 lb = 0.45359237 kg and 1 ft = 0.3048 m exactly: 1 lb/ft^3 = 16.018463373960138 kg/m^3
  close(value("140 lb/ft^3", "density"), 140 * 0.45359237 / 0.3048 ** 3, 1e-12);
  // International Table Btu = 1055.05585262 J (ISO 31-4 / NIST SP 811 Appendix B.8):
  // 1 Btu/(h ft degF) = 1055.05585262 / 3600 / 0.3048 * 1.8 = 1.730734666 W/(m K)
  close(value("0.25 BTU/(h ft degF)", "conductivity"), 0.25 * 1055.05585262 / 3600 / 0.3048 * 1.8, 1e-9);
  // 1 Btu/(lb degF) = 4186.8 J/(kg K) exactly (NIST SP 811 B.8)
  close(value("0.24 BTU/(lb degF)", "specificHeat"), 0.24 * 4186.8, 1e-12);
  // 1 h ft^2 degF/Btu = 0.1761101837 m^2 K/W (NIST SP 811 B.8, "thermal insulance")
  close(value("1 h ft^2 degF/BTU", "resistance"), 0.1761101837, 1e-9);
  // degF to degC: (91.4 - 32) / 1.8 = 33 (definition of the Fahrenheit scale)
  close(value("91.4 degF", "temperature"), 33, 1e-12);
});

Deno.test("parseQuantity() rejects a bare number and says which unit to write", () => {
  const result = parseQuantity("200", "length");
  assert.ok(!result.ok);
  assert.deepStrictEqual(result.message, 'Missing unit in a length "200": a bare number is ambiguous');
  assert.deepStrictEqual(result.hint, 'write the unit, e.g. "200 mm"');
});

Deno.test("parseQuantity() rejects units of the wrong dimension", () => {
  const result = parseQuantity("1.4 W/m", "conductivity");
  assert.ok(!result.ok);
  assert.match(result.message, /^Wrong kind of unit in "1.4 W\/m": expected a thermal conductivity/);
});

Deno.test("parseQuantity() rejects decimal commas, NaN, Infinity and out-of-range numbers", () => {
  for (
    const text of ["0,035 W/(m K)", "NaN W/(m K)", "Infinity W/(m K)", "1e400 W/(m K)", "1,234.5 W/(m K)"]
  ) {
    assert.ok(!parseQuantity(text, "conductivity").ok, text);
  }
});

Deno.test("parseQuantity() rejects direction-control and look-alike characters and shows their code points", () => {
  const bidi = parseQuantity("200 m\u202Em", "length");
  assert.ok(!bidi.ok);
  assert.match(bidi.message, /U\+202E/);
  const cyrillic = parseQuantity("200 \u043Cm", "length"); // Cyrillic em looks like Latin m
  assert.ok(!cyrillic.ok);
  assert.match(cyrillic.message, /U\+043C/);
});

Deno.test("parseQuantity() refuses a temperature where a temperature difference is expected", () => {
  const result = parseQuantity("11 degC", "temperatureDifference");
  assert.ok(!result.ok);
  assert.deepStrictEqual(value("11 K", "temperatureDifference"), 11);
});
