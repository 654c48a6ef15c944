/**
 * The results a package embeds: response-factor series cut to their leading terms, the rest regained from the
 * modal form beside them (RF_j = Σ c_n q_n^(j−1), j ≥ 2 — the form the engine expands; Hittle 1979 / Seem 1987
 * write response factors as sums of exponential modes, from memory). The check is against results.json itself:
 * the expansion must give back every term bit for bit, so nothing `verify` needs is lost.
 */
import assert from "node:assert/strict";
import { COMPACT_ABOVE_CONSTRUCTIONS } from "../../src/report/page/compact.ts";
import { loadProject } from "../../src/commands/loadProject.ts";
import { produceOutputs } from "../../src/commands/produce.ts";
import { memoryProjectFs } from "../../src/project/projectFs.ts";
import { expandPackageCopy, LEADING_TERMS, packageResultsCopy } from "../../src/results/packageCopy.ts";

const DEMO = new URL("../../projects/demo/", import.meta.url).pathname;

async function build(folder: string | ReturnType<typeof memoryProjectFs>) {
  const produced = produceOutputs(await loadProject(folder));
  if (!produced.ok) throw new Error(produced.diagnostics.map((d) => d.message).join("; "));
  return produced.outputs;
}

/** A project of `count` heavy walls (brick, insulation, 200–300 mm dense core, plaster), in memory. */
function heavyWalls(count: number) {
  const text = (s: string) => new TextEncoder().encode(s);
  const blocks = Array.from(
    { length: count },
    (_, i) =>
      "```construction\n" + `id: H-${i + 1}\nname: Heavy wall ${i + 1}\nlayers:\n` +
      `  - { material: clay-brick-outer-leaf-1700, thickness: ${100 + 5 * (i % 5)} mm }\n` +
      `  - { material: mineral-wool-25, thickness: ${100 + 20 * (i % 3)} mm }\n` +
      `  - { material: concrete-2200, thickness: ${200 + 25 * (i % 4)} mm }\n` +
      "  - { material: plaster-gypsum-1000, thickness: 15 mm }\nheat-flow: horizontal\n```\n",
  );
  return memoryProjectFs(
    "heavy",
    new Map([
      [
        "project.md",
        text(
          "---\ntitle: Heavy walls (invented)\nreference: T-HEAVY\nrevision: A\nstatus: draft\n" +
            "prepared-by: Test\nchecked-by: Test\ndate: 2031-01-01\nunits: SI\n---\n\nInvented heavy walls.\n",
        ),
      ],
      ["20-walls.md", text(`# Heavy walls\n\n${blocks.join("\n")}`)],
    ]),
  );
}

Deno.test("the package's copy of the results regains every response-factor term of the demo bit for bit", async () => {
  const outputs = await build(DEMO);
  const full = JSON.parse(outputs.resultsJsonText);
  const copy = JSON.parse(outputs.embeddedResultsText);
  const cut = Object.values(copy.constructions as Record<string, { responseFactors: { terms?: number } }>)
    .filter((c) => c.responseFactors.terms !== undefined);
  assert.ok(cut.length > 0, "at least one demo construction has more than one day of terms");
  for (const c of cut) {
    assert.ok(!("X" in c.responseFactors), "a cut series is not written under its full name");
  }
  assert.deepStrictEqual(expandPackageCopy(copy), full);
  assert.ok(outputs.embeddedResultsText.length < outputs.resultsJsonText.length);
});

Deno.test("a series that is not exactly its modal form stays whole in the package's copy", async () => {
  const full = JSON.parse((await build(heavyWalls(1))).resultsJsonText);
  const wall = full.constructions["H-1"];
  assert.ok(wall.responseFactors.Y.length > LEADING_TERMS);
  wall.responseFactors.Y[LEADING_TERMS + 3] *= 1 + 1e-15;
  const copy = packageResultsCopy(full) as typeof full;
  assert.equal(copy.constructions["H-1"].responseFactors.Y.length, wall.responseFactors.Y.length);
  assert.deepStrictEqual(packageResultsCopy(copy), copy, "a copy of a copy is the same copy");
});

Deno.test("a heavy wall adds at most 60 KB to a large project's package", async () => {
  // Issue target (issue 12): a project of 201 heavy walls at no more than 60 KB per construction. Above
  // COMPACT_ABOVE_CONSTRUCTIONS the package is compact, so the marginal wall is measured from 41 to 44 walls.
  const before = await build(heavyWalls(COMPACT_ABOVE_CONSTRUCTIONS + 1));
  const after = await build(heavyWalls(COMPACT_ABOVE_CONSTRUCTIONS + 4));
  const bytes = (s: string) => new TextEncoder().encode(s).length;
  const perWall = (bytes(after.page) - bytes(before.page)) / 3;
  console.log(`package bytes per heavy wall: ${(perWall / 1024).toFixed(1)} KB`);
  assert.ok(perWall <= 60 * 1024, `${(perWall / 1024).toFixed(1)} KB per heavy wall`);
});
