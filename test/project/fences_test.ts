import assert from "node:assert/strict";

import { splitFrontMatter, splitMarkdown } from "../../src/project/fences.ts";
import { parseYamlAt } from "../../src/project/yamlTree.ts";

const TEXT = [
  "---", // 1
  "title: x", // 2
  "---", // 3
  "# Head", // 4
  "", // 5
  "```material", // 6
  "id: a", // 7
  "name: b", // 8
  "```", // 9
  "", // 10
  "~~~ construction", // 11
  "id: c", // 12
  "~~~", // 13
  "```python", // 14
  "print(1)", // 15
  "```", // 16
  "",
].join("\n");

Deno.test("splitMarkdown() gives each fence its line and info string", () => {
  const split = splitFrontMatter(TEXT);
  assert.deepStrictEqual(split.yaml, "title: x");
  assert.deepStrictEqual(split.bodyLine, 4);
  const pieces = splitMarkdown(split.body, split.bodyLine);
  const fences = pieces.filter((p) => p.kind === "fence");
  assert.deepStrictEqual(fences.map((f) => [f.info, f.line, f.bodyLine]), [["material", 6, 7], [
    "construction",
    11,
    12,
  ], ["python", 14, 15]]);
  assert.deepStrictEqual(pieces[0], { kind: "prose", markdown: "# Head\n\n", line: 4 });
});

Deno.test("parseYamlAt() places keys and values at their file line and column", () => {
  const parsed = parseYamlAt("id: a\nlayers:\n  - { material: x, thickness: 10 mm }\n", "w.md", 7);
  if (!parsed.ok || parsed.value.kind !== "map") throw new Error("expected a mapping");
  const layers = parsed.value.entries[1];
  assert.deepStrictEqual(layers?.keyAt, { file: "w.md", line: 8, col: 1 });
  const first = layers?.value.kind === "list" ? layers.value.items[0] : undefined;
  const thickness = first?.kind === "map" ? first.entries[1] : undefined;
  assert.deepStrictEqual(thickness?.keyAt, { file: "w.md", line: 9, col: 20 });
  assert.deepStrictEqual(thickness?.value.at, { file: "w.md", line: 9, col: 31 });
});

Deno.test("parseYamlAt() refuses aliases, unknown tags and duplicate keys", () => {
  const alias = parseYamlAt("a: &x [1]\nb: *x\n", "f.md", 1);
  assert.deepStrictEqual(alias.ok ? "" : alias.diagnostics[0]?.rule, "yaml-alias");
  assert.deepStrictEqual(parseYamlAt("a: !!js/function x\n", "f.md", 1).ok, false);
  const dup = parseYamlAt("a: 1\na: 2\n", "f.md", 5);
  assert.deepStrictEqual(dup.ok ? undefined : dup.diagnostics[0]?.at.line, 6);
});
