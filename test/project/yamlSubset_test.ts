/**
 * The plain-YAML reader (src/project/yamlSubset.ts) must give exactly what the YAML library gives (the reference:
 * npm yaml 2.9.1, core schema), or step aside: every block and front matter of the repository's projects,
 * template and fixtures, and generated texts mixing plain YAML with what the subset leaves to the library, read
 * both ways, must agree to the last position.
 */
import assert from "node:assert/strict";
import { join } from "node:path";
import fc from "fast-check";

import { splitFrontMatter, splitMarkdown } from "../../src/project/fences.ts";
import { parseSimpleYaml } from "../../src/project/yamlSubset.ts";
import { parseYamlAt, parseYamlWithLibrary } from "../../src/project/yamlTree.ts";

const ROOT = new URL("../../", import.meta.url).pathname;

/** Every front matter and fenced block of the Markdown files under `folder`. */
function yamlTexts(folder: string): { where: string; text: string; line: number }[] {
  const out: { where: string; text: string; line: number }[] = [];
  for (const entry of Deno.readDirSync(folder)) {
    const path = join(folder, entry.name);
    if (entry.isDirectory) out.push(...yamlTexts(path));
    else if (entry.isFile && entry.name.endsWith(".md")) {
      let text: string;
      try {
        text = new TextDecoder("utf-8", { fatal: true }).decode(Deno.readFileSync(path));
      } catch {
        continue; // the not-UTF-8 fixture
      }
      const split = splitFrontMatter(text);
      if (split.yaml !== undefined) out.push({ where: `${path} front matter`, text: split.yaml, line: 2 });
      for (const piece of splitMarkdown(split.body, split.bodyLine)) {
        if (piece.kind === "fence") out.push({ where: `${path}:${piece.line}`, text: piece.body, line: 3 });
      }
    }
  }
  return out;
}

const accepted = (text: string) =>
  parseSimpleYaml(text, (offset) => ({ file: "", line: 1, col: offset })) !== undefined;

Deno.test("the plain-YAML reader agrees with the YAML library on every block of the projects, template and fixtures", () => {
  const texts = ["projects", "templates", "test/fixtures"].flatMap((f) => yamlTexts(join(ROOT, f)));
  assert.ok(texts.length > 300, `only ${texts.length} blocks found`);
  let simple = 0;
  for (const { where, text, line } of texts) {
    assert.deepEqual(parseYamlAt(text, "f.md", line, 2), parseYamlWithLibrary(text, "f.md", line, 2), where);
    if (accepted(text)) simple++;
  }
  // Most input is plain YAML; the rest (hostile and broken fixtures) goes to the library.
  assert.ok(simple > texts.length / 2, `${simple} of ${texts.length} read by the subset`);
});

Deno.test("the template and the demo are read without the YAML library", () => {
  for (const folder of ["templates/new-project", "projects/demo"]) {
    for (const { where, text } of yamlTexts(join(ROOT, folder))) assert.ok(accepted(text), where);
  }
});

/** Scalars: plain values, the core schema's special words, and what only the library reads. */
const GOOD = [
  "x",
  "15 mm",
  "0.40",
  "-5 degC",
  "12:30",
  "http://a.b/c",
  "a b  c",
  "C#5",
  "Checker's Name",
  "2031-01-01",
  "1e3",
  ".5",
  "+7",
  "-0",
  "007",
  "1.",
  "0b1",
  "~",
  "null",
  "Null",
  "NULL",
  "true",
  "False",
  "TRUE",
  "yes",
  "on",
  '"q: d"',
  '"it\'s"',
  "'s'",
  '""',
  "''",
  "λ = 0.5",
  "—",
  "𝑥",
  "a, b",
  "a]",
  "{a}",
  "12345678901234567890",
];
const BAD = [
  "0x1F",
  "0o17",
  ".inf",
  "-.Inf",
  ".nan",
  "'it''s'",
  '"a\\tb"',
  "a # c",
  "a:",
  "a: b",
  "- a",
  "-",
  "&a x",
  "*a",
  "!!str 5",
  "!t x",
  "|",
  ">",
  "? a",
  "@a",
  "`a`",
  "%a",
  "x ",
  "\tx",
  "a\u0007",
  "{ a: 1, }",
  "[a, , b]",
  "{ a }",
  "{a:1}",
  "[a: 1]",
  "{ a: 1 } x",
  "a\n b",
  "",
];
const KEYS = ["a", "b", "id", "max-u", "x_1", "Key9"];
const BAD_KEYS = ["true", "null", "1", "a b", '"q"', "a"];

const scalar = fc.oneof({ weight: 30, arbitrary: fc.constantFrom(...GOOD) }, fc.constantFrom(...BAD));
const key = fc.oneof({ weight: 40, arbitrary: fc.constantFrom(...KEYS) }, fc.constantFrom(...BAD_KEYS));
/** Keys of one mapping, mostly distinct (a repeated key is for the library). */
const distinct = (entries: [string, string][]) =>
  entries.map(([k, v], i): [string, string] => [KEYS.includes(k) && i % 5 !== 4 ? `${k}${i}` : k, v]);
/** A flow value; `wrap` puts line breaks (with the given indent) after some commas. */
const { flowValue } = fc.letrec<{ flowValue: string }>((tie) => ({
  flowValue: fc.oneof(
    { depthSize: "small", withCrossShrink: true },
    scalar,
    fc.array(tie("flowValue"), { maxLength: 3 }).map((xs) => `[${xs.join(", ")}]`),
    fc.array(fc.tuple(key, tie("flowValue")), { maxLength: 3 }).map((xs) =>
      `{ ${distinct(xs).map(([k, v]) => `${k}: ${v}`).join(", ")} }`
    ),
  ),
}));
const broken = (indent: string) =>
  fc.oneof(
    { weight: 6, arbitrary: fc.constant(`\n${indent}   `) },
    fc.constantFrom("\n", `\n${indent}`, "\n# c\n   ", "\n\n   "),
  );
/** A flow value, sometimes spread over lines. */
const spread = (indent: string) =>
  fc.tuple(flowValue, fc.array(broken(indent), { maxLength: 2 })).map(([v, breaks]) => {
    let out = v;
    for (const b of breaks) out = out.replace(/, (?!.*\n)/, `,${b}`);
    return out;
  });
const { block } = fc.letrec<{ block: string }>((tie) => ({
  // A block mapping at indent 0 (re-indented by the parent).
  block: fc.array(
    fc.tuple(
      key,
      fc.oneof(
        { depthSize: "small" },
        spread("").map((v) => ` ${v}`),
        tie("block").map((b) => `\n${b.replace(/^/gm, "  ")}`),
        fc.array(fc.oneof(spread("  "), tie("block")), { minLength: 1, maxLength: 2 }).map((items) =>
          "\n" + items.map((i) => `  - ${i.replace(/\n/g, "\n    ")}`).join("\n")
        ),
      ),
      fc.constantFrom("", "", "", "\n", "\n# note", "\n  # note"),
    ).map(([k, v, after]): [string, string] => [k, `${v}${after}`]),
    { minLength: 1, maxLength: 3 },
  ).map((entries) => distinct(entries).map(([k, v]) => `${k}:${v}`).join("\n")),
}));

Deno.test("generated YAML: the plain-YAML reader agrees with the library or leaves the text to it", () => {
  let simple = 0;
  fc.assert(
    fc.property(block, fc.constantFrom("", "\n", "\n\n"), (text, end) => {
      const full = text + end;
      if (accepted(full)) simple++;
      assert.deepEqual(
        parseYamlAt(full, "f.md", 4),
        parseYamlWithLibrary(full, "f.md", 4),
        JSON.stringify(full),
      );
    }),
    { numRuns: 1000, seed: 20311 },
  );
  // The generator must reach the subset often enough for the comparison to mean something.
  assert.ok(simple > 200, `only ${simple} generated texts read by the subset`);
});
