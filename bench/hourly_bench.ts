/**
 * Hourly weather-year benchmark: `npx -y deno@2.9.6 bench --allow-read bench/hourly_bench.ts`.
 * A year (8760 h) of inside fluxes with sol-air for 1000 and 10000 surfaces cycled from the demo project's
 * constructions (test/scenarios/_demoYear.ts), and, on a 50-surface sample, the modal recursion beside the
 * polynomial CTF recursion and direct response-factor convolution. Target: 1000 surfaces < 1 s, 10000 linear.
 * The table with ms per 1000 surfaces, the scaling ratio, memory and the ratios: bench/hourly_table.ts.
 */
import { cycledSurfaces, loadDemoYear } from "../test/scenarios/_demoYear.ts";
import { ctfRun, directRun, modalRun, prepareYear, yearRun } from "./hourly_year.ts";

const demo = await loadDemoYear();
const thousand = cycledSurfaces(demo.scenario, 1000);
const tenThousand = cycledSurfaces(demo.scenario, 10000);

Deno.bench("year with sol-air, 1000 surfaces", { group: "year", baseline: true, n: 5, warmup: 1 }, () => {
  yearRun(demo, thousand);
});
Deno.bench("year with sol-air, 10000 surfaces", { group: "year", n: 2, warmup: 1 }, () => {
  yearRun(demo, tenThousand);
});

const sample = prepareYear(demo, cycledSurfaces(demo.scenario, 50));
Deno.bench("50 surfaces: modal recursion", { group: "methods", baseline: true }, () => {
  modalRun(demo, sample);
});
Deno.bench("50 surfaces: polynomial CTF recursion", { group: "methods" }, () => {
  ctfRun(demo, sample);
});
Deno.bench("50 surfaces: direct response-factor convolution", { group: "methods", n: 3, warmup: 1 }, () => {
  directRun(demo, sample);
});
