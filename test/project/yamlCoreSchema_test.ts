/**
 * Input YAML is read with the core schema of YAML 1.2 and nothing more: no tags, no control
 * characters from escapes, and integers only in decimal where a number is meant.
 */
import assert from "node:assert/strict";

import { daysInMonth } from "../../src/project/frontMatter.ts";
import { parseQuantity } from "../../src/project/quantity.ts";
import { parseYamlAt, type YamlValue } from "../../src/project/yamlTree.ts";

function rules(text: string): string[] {
  const parsed = parseYamlAt(text, "f.md", 1);
  return parsed.ok ? [] : parsed.diagnostics.map((d) => d.rule);
}

function scalarOf(text: string): unknown {
  const parsed = parseYamlAt(text, "f.md", 1);
  if (!parsed.ok || parsed.value.kind !== "map") return undefined;
  const value: YamlValue | undefined = parsed.value.entries[0]?.value;
  return value?.kind === "scalar" ? value.value : undefined;
}

Deno.test("every explicit YAML tag is refused, including the standard !!timestamp, !!binary and !!str", () => {
  // !!timestamp would give a Date printed in the machine's time zone; !!binary decodes base64 unseen.
  for (const tag of ["!!timestamp 2031-01-15", "!!binary aGVsbG8=", "!!str 5", "!!int 5", "!!map {}"]) {
    assert.deepEqual(rules(`a: ${tag}\n`), ["yaml-tag"], tag);
  }
  assert.deepEqual(rules("a: 2031-01-15\n"), []);
});

Deno.test("control characters from double-quoted escapes are refused with their code point", () => {
  // C0 controls (U+0000–U+001F except tab and line feed), DEL and C1 controls (Unicode 15, chapter 23).
  for (const escape of ["\\u001b", "\\0", "\\a", "\\b", "\\r", "\\x7f", "\\u0085", "\\e"]) {
    assert.deepEqual(rules(`a: "x${escape}y"\n`), ["control-character"], escape);
  }
  const parsed = parseYamlAt('name: "a\\u001b[31mb"\n', "f.md", 4);
  assert.ok(!parsed.ok);
  assert.equal(parsed.diagnostics[0]?.at.line, 4);
  assert.match(parsed.diagnostics[0]?.message ?? "", /U\+001B/);
  // Tab and line feed stay allowed: block scalars hold line feeds.
  assert.deepEqual(rules('a: "x\\ty"\nb: |\n  one\n  two\n'), []);
});

Deno.test("0x, 0o and 0b integers stay text, so a number or quantity field refuses them", () => {
  // YAML 1.2.2 core schema reads 0x1 and 0o7 as integers (spec section 10.3.2, from memory).
  assert.equal(scalarOf("a: 0x1\n"), "0x1");
  assert.equal(scalarOf("a: 0o7\n"), "0o7");
  assert.equal(scalarOf("a: 0b1\n"), "0b1");
  assert.equal(scalarOf("a: 12\n"), 12);
  const quantity = parseQuantity("0x10 mm", "length");
  assert.ok(!quantity.ok);
  assert.match(quantity.message, /only decimal numbers/);
});

Deno.test("a bare time zone is told to write hours, a bare timestep minutes, a bare elevation metres", () => {
  const bare = (text: string, kind: Parameters<typeof parseQuantity>[1], unit: string, example: string) => {
    const result = parseQuantity(text, kind, { unit, example });
    return result.ok ? "" : result.hint;
  };
  assert.equal(bare("1", "time", "h", "1 h"), 'write the unit, e.g. "1 h"');
  assert.equal(bare("15", "time", "min", "15 min"), 'write the unit, e.g. "15 min"');
  assert.equal(bare("120", "length", "m", "120 m"), 'write the unit, e.g. "120 m"');
});

Deno.test("daysInMonth() follows the Gregorian leap-year rule (ISO 8601)", () => {
  // Divisible by 4 but not by 100, or by 400: 2028 and 2000 are leap years, 2100 and 2031 are not.
  assert.deepEqual([2028, 2000, 2100, 2031].map((y) => daysInMonth(y, 2)), [29, 29, 28, 28]);
  assert.deepEqual([1, 4, 6, 9, 11, 12].map((m) => daysInMonth(2031, m)), [31, 30, 30, 30, 30, 31]);
});
