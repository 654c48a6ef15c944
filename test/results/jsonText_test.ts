import assert from "node:assert/strict";
import fc from "fast-check";
import { resultsJsonText } from "../../src/results/jsonText.ts";

Deno.test("resultsJsonText() parses back to exactly the value JSON.stringify would give (ECMA-404 round trip)", () => {
  fc.assert(
    fc.property(fc.jsonValue(), (value) => {
      assert.deepStrictEqual(JSON.parse(resultsJsonText(value)), JSON.parse(JSON.stringify(value) ?? "null"));
    }),
    { seed: 20311, numRuns: 300 },
  );
});

Deno.test("resultsJsonText() keeps numeric series on one line and objects one member per line", () => {
  assert.equal(
    resultsJsonText({ a: [1, 2.5, -3e-9], b: { c: "x" } }),
    '{\n  "a": [1, 2.5, -3e-9],\n  "b": {\n    "c": "x"\n  }\n}\n',
  );
});
