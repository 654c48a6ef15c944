/**
 * Marginal cost of one more heavy wall in a build: package bytes and build time (load, compute, review, serialise,
 * render, CSV; no disk writes), for projects of 41 and 121 invented heavy walls. Prints a table, the per-wall
 * figures (differences over the added walls) and the per-wall time of each phase of `produceOutputs`. Times are
 * the process's CPU time (user + system), so that other work on a shared machine inflates them less than the
 * clock; medians of `runs` builds.
 * Run: deno run --allow-read --allow-env bench/marginal_build.ts [runs]
 */
import process from "node:process";
import { loadProject } from "../src/commands/loadProject.ts";
import { produceOutputs, type ProducePhase } from "../src/commands/produce.ts";
import { memoryProjectFs } from "../src/project/projectFs.ts";
import { heavyWallFiles } from "../scripts/heavy-walls.ts";

const RUNS = Number(Deno.args[0] ?? 5);
const PHASES = ["load", "compute", "review", "results-json", "package-copy", "render", "csv"] as const;
type Phase = (typeof PHASES)[number];

interface Measured {
  readonly ms: number;
  readonly phaseMs: Record<Phase, number>;
  readonly pageBytes: number;
  readonly resultsBytes: number;
}

/** CPU time of this process so far, ms. */
function cpuMs(): number {
  const { user, system } = process.cpuUsage();
  return (user + system) / 1000;
}

const median = (values: number[]) => [...values].sort((a, b) => a - b)[Math.floor(values.length / 2)]!;

async function measure(count: number): Promise<Measured> {
  const fs = memoryProjectFs("heavy", heavyWallFiles(count));
  const times: number[] = [];
  const phaseTimes = Object.fromEntries(PHASES.map((p) => [p, [] as number[]])) as Record<Phase, number[]>;
  let pageBytes = 0;
  let resultsBytes = 0;
  for (let run = 0; run < RUNS; run++) {
    const start = cpuMs();
    const loaded = await loadProject(fs);
    let last = cpuMs();
    phaseTimes.load.push(last - start);
    const produced = produceOutputs(loaded, undefined, undefined, (phase: ProducePhase) => {
      const now = cpuMs();
      phaseTimes[phase].push(now - last);
      last = now;
    });
    times.push(cpuMs() - start);
    if (!produced.ok) throw new Error("the benchmark project does not build");
    pageBytes = new TextEncoder().encode(produced.outputs.page).length;
    resultsBytes = new TextEncoder().encode(produced.outputs.resultsJsonText).length;
  }
  const phaseMs = Object.fromEntries(PHASES.map((p) => [p, median(phaseTimes[p])])) as Record<Phase, number>;
  return { ms: median(times), phaseMs, pageBytes, resultsBytes };
}

// Both counts above COMPACT_ABOVE_CONSTRUCTIONS (40), as a large project is: the marginal wall of the compact package.
const counts = [41, 121];
const rows = [];
for (const count of counts) rows.push({ count, ...(await measure(count)) });
console.log(`walls  build CPU ms (median of ${RUNS})  package KB  results.json KB`);
for (const r of rows) {
  console.log(
    `${String(r.count).padStart(5)}  ${r.ms.toFixed(0).padStart(26)}  ${
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
console.log("per added wall by phase (CPU ms, medians):");
for (const phase of PHASES) {
  const perWall = (last.phaseMs[phase] - first.phaseMs[phase]) / added;
  console.log(`  ${phase.padEnd(13)} ${perWall.toFixed(2).padStart(6)}`);
}
