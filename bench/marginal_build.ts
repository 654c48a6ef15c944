/**
 * Marginal cost of one more heavy wall in a build: package bytes and build time (compute, render, serialise;
 * no disk writes), for projects of 41 and 121 invented heavy walls. Prints a table and the per-wall figures
 * (differences over the added walls). Run: deno run --allow-read --allow-env bench/marginal_build.ts
 */
import { loadProject } from "../src/commands/loadProject.ts";
import { produceOutputs } from "../src/commands/produce.ts";
import { memoryProjectFs } from "../src/project/projectFs.ts";
import { heavyWallFiles } from "../scripts/heavy-walls.ts";

const RUNS = 3;

async function measure(count: number): Promise<{ ms: number; pageBytes: number; resultsBytes: number }> {
  const fs = memoryProjectFs("heavy", heavyWallFiles(count));
  const times: number[] = [];
  let pageBytes = 0;
  let resultsBytes = 0;
  for (let run = 0; run < RUNS; run++) {
    const start = performance.now();
    const produced = produceOutputs(await loadProject(fs));
    times.push(performance.now() - start);
    if (!produced.ok) throw new Error("the benchmark project does not build");
    pageBytes = new TextEncoder().encode(produced.outputs.page).length;
    resultsBytes = new TextEncoder().encode(produced.outputs.resultsJsonText).length;
  }
  times.sort((a, b) => a - b);
  return { ms: times[Math.floor(RUNS / 2)]!, pageBytes, resultsBytes };
}

// Both counts above COMPACT_ABOVE_CONSTRUCTIONS (40), as a large project is: the marginal wall of the compact package.
const counts = [41, 121];
const rows = [];
for (const count of counts) rows.push({ count, ...(await measure(count)) });
console.log("walls  build ms (median of 3)  package KB  results.json KB");
for (const r of rows) {
  console.log(
    `${String(r.count).padStart(5)}  ${r.ms.toFixed(0).padStart(22)}  ${
      (r.pageBytes / 1024).toFixed(0).padStart(10)
    }  ${(r.resultsBytes / 1024).toFixed(0).padStart(15)}`,
  );
}
const first = rows[0]!;
const last = rows[rows.length - 1]!;
const added = last.count - first.count;
console.log(
  `per added wall: ${((last.ms - first.ms) / added).toFixed(1)} ms, package ${
    ((last.pageBytes - first.pageBytes) / added / 1024).toFixed(1)
  } KB, results.json ${((last.resultsBytes - first.resultsBytes) / added / 1024).toFixed(1)} KB`,
);
