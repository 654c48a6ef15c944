import assert from "node:assert/strict";
import { alignByKey } from "../../src/diff/align.ts";

const pairs = (a: string[], b: string[]) => alignByKey(a, b).map((p) => [p.old, p.new]);

Deno.test("alignByKey() pairs equal lists item by item", () => {
  assert.deepEqual(pairs(["a", "b"], ["a", "b"]), [[0, 0], [1, 1]]);
});

Deno.test("alignByKey() reports an inserted item alone and keeps the later items paired", () => {
  assert.deepEqual(pairs(["wool", "concrete", "plaster"], ["fibre", "wool", "concrete", "plaster"]), [
    [null, 0],
    [0, 1],
    [1, 2],
    [2, 3],
  ]);
});

Deno.test("alignByKey() reports a removed item alone", () => {
  assert.deepEqual(pairs(["brick", "cavity", "block"], ["brick", "block"]), [[0, 0], [1, null], [2, 1]]);
});

Deno.test("alignByKey() pairs a replaced item with the one in its place", () => {
  assert.deepEqual(pairs(["brick", "eps", "block"], ["brick", "pir", "block"]), [[0, 0], [1, 1], [2, 2]]);
});

Deno.test("alignByKey() handles repeated keys and empty lists", () => {
  assert.deepEqual(pairs(["a", "a"], ["a", "x", "a"]), [[0, 0], [null, 1], [1, 2]]);
  assert.deepEqual(pairs([], ["a"]), [[null, 0]]);
  assert.deepEqual(pairs(["a"], []), [[0, null]]);
});
