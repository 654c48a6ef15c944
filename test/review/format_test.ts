import assert from "node:assert/strict";
import type { Diagnostic } from "../../src/project/diagnostic.ts";
import { countFindings, formatFinding, formatFindings, REVIEW_RULES } from "../../src/review/mod.ts";
import { num } from "../../src/review/finding.ts";
import { parsePosition } from "../../src/project/position.ts";

const AT = { file: "walls.md", line: 12, col: 5 };

Deno.test("formatFinding: head, hint, then value/expected/source on one indented line", () => {
  const d: Diagnostic = {
    severity: "warning",
    at: AT,
    rule: "density-outside-class",
    message: "The material has a density outside its class",
    hint: "confirm the value",
    value: "ρ = 2600 kg/m³",
    expected: "2000–2500 kg/m³",
    source: "a table",
  };
  assert.equal(
    formatFinding(d),
    "walls.md:12:5: warning: The material has a density outside its class\n  hint: confirm the value\n" +
      "  value: ρ = 2600 kg/m³ expected: 2000–2500 kg/m³ (source: a table)",
  );
  const plain: Diagnostic = { severity: "error", at: AT, rule: "x", message: "m" };
  assert.deepStrictEqual(formatFindings([plain]), ["walls.md:12:5: error: m"]);
  assert.deepStrictEqual(countFindings([plain, d, d]), { error: 1, warning: 2, note: 0 });
});

Deno.test("num() gives four significant digits without locale; parsePosition() inverts path:line:col", () => {
  assert.equal(num(2243.2), "2243");
  assert.equal(num(0.0031), "0.0031");
  assert.equal(num(3.1e-6), "3.1e-6");
  assert.equal(num(1234567), "1.23e+6");
  assert.deepStrictEqual(parsePosition("a:b/walls.md:12:5"), { file: "a:b/walls.md", line: 12, col: 5 });
});

Deno.test("REVIEW_RULES ids are unique kebab-case", () => {
  const ids = REVIEW_RULES.map((r) => r.id);
  assert.equal(new Set(ids).size, ids.length);
  for (const id of ids) assert.match(id, /^[a-z0-9]+(-[a-z0-9]+)*$/);
});
