/**
 * `splitMarkdown` and `findFenceProblems` skip marked's lexer for a body with no fence characters (all prose)
 * and for plain Markdown (src/project/plainMarkdown.ts: margin paragraphs and headings, closed backtick fences
 * between blank lines), for start-up time (README). Their answers must be exactly those of the lexer's tokens
 * (the reference: marked 18.2.1's block lexer, GFM): checked on every Markdown body of the repository and on
 * generated bodies of every block kind.
 */
import assert from "node:assert/strict";
import { join } from "node:path";
import fc from "fast-check";

import {
  findFenceProblems,
  lexedFenceProblems,
  splitFrontMatter,
  splitLexed,
  splitMarkdown,
} from "../../src/project/fences.ts";
import { splitPlainMarkdown } from "../../src/project/plainMarkdown.ts";

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

function agree(body: string, where: string): void {
  assert.deepEqual(splitMarkdown(body, 7), splitLexed(body, 7), where);
  assert.deepEqual(findFenceProblems(body, 7, INFOS), lexedFenceProblems(body, 7, INFOS), where);
}

Deno.test("a Markdown body splits as the lexer splits it, shortcuts or not: the repository's files", () => {
  let plain = 0, bodies = 0;
  for (
    const path of ["projects", "templates", "test/fixtures"].flatMap((f) => markdownFiles(join(ROOT, f)))
  ) {
    const text = new TextDecoder().decode(Deno.readFileSync(path));
    const split = splitFrontMatter(text);
    const prose = splitLexed(split.body, 1).flatMap((p) => p.kind === "prose" ? [p.markdown] : []);
    for (const body of [split.body, ...prose]) {
      agree(body, path);
      bodies++;
      if (splitPlainMarkdown(body, 1) !== undefined) plain++;
    }
  }
  assert.ok(plain > 50 && bodies > plain, `${plain} of ${bodies} bodies plain`);
});

Deno.test("the template's Markdown is split without the lexer", () => {
  for (const path of markdownFiles(join(ROOT, "templates", "new-project"))) {
    const { body, bodyLine } = splitFrontMatter(Deno.readTextFileSync(path));
    const fenceFree = !body.includes("```") && !body.includes("~~~");
    assert.ok(fenceFree || splitPlainMarkdown(body, bodyLine) !== undefined, path);
  }
});

const BLOCKS = [
  "# Heading",
  "## Heading ##",
  "#NoSpace",
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
  "a | b\n--|--",
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
  "**Bold** start",
  "** * **",
  "2031 was a year",
  "λ = 0.5 W/(m K)",
  "1. x\n\n   ```material\n   a: 1\n   ```",
  "```material\nid: a\n```",
  "```construction\nid: b\nlayers:\n  - x\n```",
  "```\n```",
  "```scenario\n\n```",
  "```material\nno close",
  "````material\nid: a\n````",
  "~~~material\nid: a\n~~~",
  "```material\n  ```\n```",
  " ```material\nid: a\n```",
  "```material extra words\nid: a\n```",
  "```material\n~~~\n```",
  "```material\n```x\n```",
];

Deno.test("a Markdown body splits as the lexer splits it, shortcuts or not: generated bodies", () => {
  let plain = 0;
  fc.assert(
    fc.property(
      fc.array(fc.constantFrom(...BLOCKS), { minLength: 1, maxLength: 7 }),
      fc.array(fc.constantFrom("\n", "\n\n", "\n\n", "\n\n\n", "\r\n", ""), { minLength: 7, maxLength: 7 }),
      (blocks, gaps) => {
        const body = blocks.map((b, i) => b + gaps[i]).join("");
        if (splitPlainMarkdown(body, 7) !== undefined) plain++;
        agree(body, JSON.stringify(body));
      },
    ),
    { numRuns: 3000, seed: 20312 },
  );
  assert.ok(plain > 80, `only ${plain} generated bodies plain`);
});
