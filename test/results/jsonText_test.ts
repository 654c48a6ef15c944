import assert from "node:assert/strict";
import fc from "fast-check";
import { resultsJsonText, type SharedTexts } from "../../src/results/jsonText.ts";

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

Deno.test("resultsJsonText() with texts shared from an earlier writing gives the text written afresh", () => {
  // Reference: the same value written without shared texts. The second value holds the first one's objects at
  // their own indent (reusable), one level deeper and inside an array (another indent: not reusable), beside new
  // members, as the package's copy of results.json holds the results' members.
  fc.assert(
    fc.property(fc.dictionary(fc.string(), fc.jsonValue()), fc.jsonValue(), (first, extra) => {
      const shared: SharedTexts = new Map();
      assert.equal(resultsJsonText(first, shared), resultsJsonText(first));
      const members = Object.values(first);
      const second = { ...first, extra, nested: { again: first, list: [first, ...members] } };
      assert.equal(resultsJsonText(second, shared), resultsJsonText(second));
    }),
    { seed: 20312, numRuns: 300 },
  );
});

Deno.test("resultsJsonText() reuses an object's text only at the indent it was written at", () => {
  const inner = { a: [1, 2], b: { c: "x" } };
  const shared: SharedTexts = new Map();
  resultsJsonText({ inner }, shared);
  assert.equal(shared.get(inner)?.indent, "  ");
  // Written at the top now (indent ""), and inside a list (indent "    "): both afresh, not the remembered text.
  assert.equal(resultsJsonText(inner, shared), '{\n  "a": [1, 2],\n  "b": {\n    "c": "x"\n  }\n}\n');
  assert.equal(
    resultsJsonText({ list: [inner] }, shared),
    '{\n  "list": [\n    {\n      "a": [1, 2],\n      "b": {\n        "c": "x"\n      }\n    }\n  ]\n}\n',
  );
});
