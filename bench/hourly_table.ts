/**
 * Hourly weather-year benchmark as a table: `npx -y deno@2.9.6 run --allow-read bench/hourly_table.ts`.
 * Times the year run with sol-air (hourly_year.ts) for 1000 and 10000 surfaces cycled from the demo (best of a few
 * runs), prints ms per 1000 surfaces, the 10k/1k ratio, memory (rss and heap before/after, and the largest rss
 * sampled during the runs), and, on a 50-surface sample scaled to 1000, the modal recursion beside the
 * polynomial CTF recursion and direct response-factor convolution, plus the former straightforward path.
 */
import { computeWeatherYear } from "../src/scenarios/weatherYear.ts";
import { surfaceParameters } from "../src/scenarios/surfaceParameters.ts";
import type { ScenarioSurface } from "../src/project/model.ts";
import { cycledSurfaces, type DemoYear, loadDemoYear } from "../test/scenarios/_demoYear.ts";
import { referenceFluxes, referenceSolAir } from "../test/scenarios/_weatherReference.ts";
import { ctfRun, directRun, modalRun, prepareYear, yearRun } from "./hourly_year.ts";

const MB = 1024 * 1024;
const demo = await loadDemoYear();

/** Best and median wall time of `runs` calls, ms. */
function timed(runs: number, f: () => unknown): { best: number; median: number } {
  const times: number[] = [];
  for (let r = 0; r < runs; r++) {
    const start = performance.now();
    f();
    times.push(performance.now() - start);
  }
  times.sort((a, b) => a - b);
  return { best: times[0]!, median: times[Math.floor(times.length / 2)]! };
}

/** Largest rss seen, sampled after every 100th surface of the year runs (Deno needs --allow-all for /proc/self). */
let peakRss = 0;
const sample100 = (i: number) => {
  if (i % 100 === 99) peakRss = Math.max(peakRss, Deno.memoryUsage().rss);
};

function memory(): string {
  const m = Deno.memoryUsage();
  return `rss ${(m.rss / MB).toFixed(0)} MB, heap ${(m.heapUsed / MB).toFixed(0)} MB`;
}

/** The former path: each surface transposed on its own, four ModalFilters per surface stepped one by one. */
function straightforward(d: DemoYear, surfaces: readonly ScenarioSurface[]): void {
  const parameters = surfaces.map((s) =>
    surfaceParameters("bench", s, d.context.constructions.get(s.construction)!, [], [])
  );
  const solAir = referenceSolAir(d.weather, d.scenario.site!, parameters);
  const indoor = new Float64Array(d.weather.count).fill(21);
  for (const [i, s] of surfaces.entries()) {
    referenceFluxes(
      d.analysis(s.construction).airToAir.modes,
      solAir[i]!.solAirC,
      indoor,
      168,
      d.weather.count,
    );
  }
}

const rows: string[][] = [];
const row = (...cells: string[]) => rows.push(cells);
const perThousand = (ms: number, count: number) => ((ms * 1000) / count).toFixed(0);

yearRun(demo, cycledSurfaces(demo.scenario, 200)); // compile the hot loops first
for (const count of [1000, 10000]) {
  const surfaces = cycledSurfaces(demo.scenario, count);
  const before = memory();
  const t = timed(count === 1000 ? 5 : 2, () => yearRun(demo, surfaces, sample100));
  row(
    `year with sol-air, ${count} surfaces`,
    t.best.toFixed(0),
    t.median.toFixed(0),
    perThousand(t.best, count),
  );
  row(`  memory before → after`, before, memory(), `peak rss (sampled) ${(peakRss / MB).toFixed(0)} MB`);
}
const scaling = Number(rows[2]![1]) / Number(rows[0]![1]);

const sampleSize = 50;
const sample = prepareYear(demo, cycledSurfaces(demo.scenario, sampleSize));
const modal = timed(3, () => modalRun(demo, sample)).best;
const ctf = timed(3, () => ctfRun(demo, sample)).best;
const direct = timed(2, () => directRun(demo, sample)).best;
const fluxes: Float64Array[] = [];
modalRun(demo, sample, (_, q) => fluxes.push(q));
let scale = 0;
for (const q of fluxes) for (const v of q) scale = Math.max(scale, Math.abs(v));
const deviation = (run: typeof ctfRun) => {
  let worst = 0;
  run(demo, sample, (i, q) => {
    for (let k = 0; k < q.length; k++) worst = Math.max(worst, Math.abs(q[k]! - fluxes[i]![k]!));
  });
  return (worst / scale).toExponential(1);
};
row(
  `${sampleSize} surfaces → 1000: modal recursion (used)`,
  modal.toFixed(1),
  "",
  perThousand(modal, sampleSize),
);
row(
  `  polynomial CTF recursion`,
  ctf.toFixed(1),
  "",
  perThousand(ctf, sampleSize),
  `max abs deviation from modal ${deviation(ctfRun)}`,
);
row(
  `  direct RF convolution`,
  direct.toFixed(1),
  "",
  perThousand(direct, sampleSize),
  `max abs deviation from modal ${deviation(directRun)}`,
);

const formerSample = cycledSurfaces(demo.scenario, 100);
const former = timed(1, () => straightforward(demo, formerSample)).best;
row(
  `100 surfaces → 1000: former path (per-surface sun, 4 filters)`,
  former.toFixed(0),
  "",
  perThousand(former, 100),
);
const whole = timed(
  1,
  () => computeWeatherYear({ ...demo.scenario, surfaces: formerSample }, demo.weather, demo.context),
);
row(
  `100 surfaces → 1000: computeWeatherYear (+ checks, summaries, CSV)`,
  whole.best.toFixed(0),
  "",
  perThousand(whole.best, 100),
);

console.log("| run | best ms | median ms | ms per 1000 surfaces | note |\n|---|---|---|---|---|");
for (const r of rows) console.log(`| ${r.join(" | ")} |`);
console.log(`\n10k/1k time ratio (best): ${scaling.toFixed(2)} (10 = linear)`);
console.log(
  `direct RF convolution / modal recursion: ${(direct / modal).toFixed(1)}×; / CTF: ${
    (direct / ctf).toFixed(1)
  }×`,
);
console.log(`deviations are relative to the sample's largest inside flux, ${scale.toFixed(2)} W/m²`);
