/**
 * A Markdown body with no fence characters (three backticks or tildes) is all prose: `splitMarkdown` gives it
 * whole without running marked's lexer (start-up, README), and must give exactly what the lexer's tokens give
 * (the reference: marked 18.2.1's block lexer, GFM). Checked on the prose of every Markdown file of the
 * repository and on generated bodies of every block kind.
 */
import assert from "node:assert/strict";
import { join } from "node:path";
import fc from "fast-check";

import { findFenceProblems, splitFrontMatter, splitLexed, splitMarkdown } from "../../src/project/fences.ts";

const ROOT = new URL("../../", import.meta.url).pathname;
const INFOS = ["material", "construction", "scenario"];

function markdownFiles(folder: string): string[] {
  const out: string[] = [];
  for (const entry of Deno.readDirSync(folder)) {
    const path = join(folder, entry.name);
    if (entry.isDirectory) out.push(...markdownFiles(path));
    else if (entry.isFile && entry.name.endsWith(".md")) out.push(path);
  }
  return out;
}

const fenceFree = (text: string) => !text.includes("```") && !text.includes("~~~");

function agree(body: string, where: string): void {
  assert.deepEqual(splitMarkdown(body, 7), splitLexed(body, 7), where);
  assert.deepEqual(findFenceProblems(body, 7, INFOS), [], where);
}

Deno.test("a body without fence characters splits as the lexer splits it: the repository's prose", () => {
  let bodies = 0;
  for (
    const path of ["projects", "templates", "test/fixtures"].flatMap((f) => markdownFiles(join(ROOT, f)))
  ) {
    const text = new TextDecoder().decode(Deno.readFileSync(path));
    const split = splitFrontMatter(text);
    const candidates = [
      split.body,
      ...splitLexed(split.body, 1).flatMap((p) => p.kind === "prose" ? [p.markdown] : []),
    ];
    for (const body of candidates.filter(fenceFree)) {
      agree(body, path);
      bodies++;
    }
  }
  assert.ok(bodies > 100, `only ${bodies} fence-free bodies`);
});

const BLOCKS = [
  "# Heading",
  "Setext\n===",
  "Setext\n---",
  "para one\npara two",
  "  indented para",
  "    indented code",
  "- item\n- item",
  "1. one\n2) two",
  "* a\n\n  b",
  "> quote\nlazy",
  "> > nested",
  "| a | b |\n|---|---|\n| 1 | 2 |",
  "<div>\nhtml\n</div>",
  "<!-- comment -->",
  "<pre>\nx\n\n</pre>",
  '[ref]: http://x "t"',
  "***",
  "- [ ] task",
  "text  \nhard break",
  "a\\\nb",
  "`code` span",
  "``not a fence``",
  "~~strike~~",
  "",
  " ",
  "\t",
  "\r\n",
  "text\r\nmore",
  "Placeholder: replace",
  "  - nested\n    - deeper",
  "| lone pipe",
  "1. x\n\n   ```\n",
];

Deno.test("a body without fence characters splits as the lexer splits it: generated bodies", () => {
  fc.assert(
    fc.property(
      fc.array(fc.constantFrom(...BLOCKS), { minLength: 1, maxLength: 8 }),
      fc.array(fc.constantFrom("\n", "\n\n", "\n\n\n", "\r\n"), { minLength: 8, maxLength: 8 }),
      (blocks, gaps) => {
        const body = blocks.map((b, i) => b + gaps[i]).join("");
        if (fenceFree(body)) agree(body, JSON.stringify(body));
      },
    ),
    { numRuns: 1500, seed: 20312 },
  );
});
