import assert from "node:assert/strict";

import { nearBlockKind } from "../../src/project/fenceKind.ts";

const KINDS = ["material", "construction", "scenario"];

Deno.test("a fence info string close to a block kind is a near miss with the kind meant", () => {
  const cases: [string, string][] = [
    ["constuction", "construction"], // one letter dropped
    ["constructions", "construction"], // plural
    ["Construction", "construction"], // capital
    ["senario", "scenario"],
    ["materail", "material"], // two letters swapped: edit distance 2
    ["yaml construction", "construction"], // a language word first
    ["construction\u200B", "construction"], // zero-width space after the word
    ["\u202Ematerial", "material"], // a right-to-left override before it
    ["{.scenario}", "scenario"],
    ["SCENARIOS", "scenario"],
  ];
  for (const [info, kind] of cases) assert.equal(nearBlockKind(info, KINDS)?.kind, kind, info);
});

Deno.test("ordinary code fences are not near misses", () => {
  // Info words from GitHub's list of highlighted languages (from memory), plus empty and free titles.
  for (
    const info of [
      "",
      "ts",
      "yaml",
      "text",
      "json",
      "sh",
      "mermaid",
      "markdown",
      "terminal",
      "console",
      "python",
      "javascript",
      "toml",
      "csv",
      "diff",
      "text the construction below is an example only",
    ]
  ) {
    assert.equal(nearBlockKind(info, KINDS), undefined, info);
  }
});
