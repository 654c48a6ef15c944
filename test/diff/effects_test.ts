import assert from "node:assert/strict";
import { relativeChange, sortEffects } from "../../src/diff/effects.ts";
import type { Effect } from "../../src/diff/types.ts";

function e(subject: string, relative: number | null): Effect {
  return { subject, quantity: "U", unit: "W/(m²·K)", old: 1, new: 1, absolute: 0, relative };
}

Deno.test("sortEffects() orders by |relative| descending, whatever the sign, and puts missing ones last in order", () => {
  const sorted = sortEffects([
    e("p", null),
    e("a", 0.05),
    e("b", -0.30),
    e("q", null),
    e("c", 0.2),
    e("d", -0.05),
  ]);
  assert.deepEqual(sorted.map((x) => x.subject), ["b", "c", "a", "d", "p", "q"]);
});

Deno.test("relativeChange() is (new − old)/|old| and undefined for a zero or missing old value", () => {
  assert.ok(Math.abs((relativeChange(0.25, 0.2) ?? NaN) + 0.2) < 1e-15); // (0.2 − 0.25)/0.25 = −0.2
  assert.ok(Math.abs((relativeChange(0.3, 0.33) ?? NaN) - 0.1) < 1e-15); // (0.33 − 0.3)/0.3 = 0.1
  assert.equal(relativeChange(-2, -1), 0.5); // (−1 − −2)/|−2| = +0.5: a loss that halves is a rise
  assert.equal(relativeChange(0, 5), null);
  assert.equal(relativeChange(null, 5), null);
  assert.equal(relativeChange(5, null), null);
});
