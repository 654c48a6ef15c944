/**
 * A surface given only a `sol-air` list carries no tilt, so nothing tells a wall from a roof: the wall's radiant
 * fraction is used and a warning says so, with the value and the fix; a tilt or an explicit radiant fraction settles
 * it without a warning. Radiant fractions 0.46 (walls) and 0.60 (roofs): ASHRAE Handbook—Fundamentals 2009–2021,
 * Ch. 18 Table 14 (from memory).
 */
import assert from "node:assert/strict";
import { join } from "node:path";
import { loadProject } from "../../src/commands/loadProject.ts";
import { computeProject } from "../../src/results/buildResults.ts";
import { designDayBlock } from "./_scenarioBlocks.ts";

const GOOD = new URL("../fixtures/good/minimal/", import.meta.url).pathname;
const SOL_AIR = `[${
  Array.from({ length: 24 }, (_, h) => `${20 + 10 * Math.sin((Math.PI * h) / 24)} degC`).join(", ")
}]`;

async function computed(surfaces: string[]) {
  const project = await Deno.makeTempDir();
  for (const name of ["project.md", "walls.md"]) Deno.copyFileSync(join(GOOD, name), join(project, name));
  Deno.writeTextFileSync(
    join(project, "day.md"),
    `# Day\n\n${designDayBlock("day", surfaces)}`,
  );
  const loaded = await loadProject(project);
  assert.ok(loaded.model !== undefined, loaded.diagnostics.map((d) => d.message).join("\n"));
  const outcome = computeProject(loaded.model, loaded.inputRecords, loaded.dataTexts);
  assert.ok(outcome.ok);
  return outcome.computed.results;
}

const radiantFraction = (results: Awaited<ReturnType<typeof computed>>, id: string) =>
  (results.scenarios["day"]!.surfaces[id]!["parameters"] as { radiantFraction: number }).radiantFraction;

Deno.test("sol-air list without tilt: the wall's radiant fraction 0.46 is used and a warning names it and the fix", async () => {
  const results = await computed([`{ id: flat, construction: EW-1, area: 10 m^2, sol-air: ${SOL_AIR} }`]);
  assert.equal(radiantFraction(results, "flat"), 0.46);
  const warnings = results.warnings.filter((w) => /surface flat/.test(w.message));
  assert.equal(warnings.length, 1, JSON.stringify(results.warnings));
  assert.match(warnings[0]!.message, /^Give "tilt" or "radiant-fraction" for surface flat: /);
  assert.match(warnings[0]!.message, /radiant fraction is taken as 0\.46, a wall's \(a roof's is 0\.6\)/);
  assert.match(warnings[0]!.message, /`tilt: 0 deg` for a roof/);
  assert.match(warnings[0]!.at, /day\.md:\d+:\d+/);
  const assumption = results.assumptions.find((a) => a.id === "default:radiant-fraction:day/flat");
  assert.match(assumption!.text, /no tilt given, taken as a wall/);
});

Deno.test("sol-air list with a tilt or a radiant fraction: no warning, the stated kind decides", async () => {
  const results = await computed([
    `{ id: roof, construction: EW-1, area: 10 m^2, tilt: 0 deg, sol-air: ${SOL_AIR} }`,
    `{ id: given, construction: EW-1, area: 10 m^2, radiant-fraction: 0.6, sol-air: ${SOL_AIR} }`,
  ]);
  assert.equal(radiantFraction(results, "roof"), 0.6);
  assert.equal(radiantFraction(results, "given"), 0.6);
  assert.deepStrictEqual(results.warnings.filter((w) => /radiant-fraction/.test(w.message)), []);
});
