/**
 * The work timed by bench/hourly_bench.ts and bench/hourly_table.ts: a year of hourly inside fluxes for many surfaces
 * cycled from the demo project (sol-air included), and the same fluxes by direct response-factor convolution and by
 * the polynomial CTF recursion for the side-by-side comparison.
 */
import { forEachInsideFlux, warmUpDays, warmUpInput } from "../src/scenarios/weatherRecursion.ts";
import { weatherBoundary } from "../src/scenarios/weatherBoundary.ts";
import { surfaceParameters } from "../src/scenarios/surfaceParameters.ts";
import type { ScenarioSurface } from "../src/project/model.ts";
import type { DemoYear } from "../test/scenarios/_demoYear.ts";

/** Sol-air series, indoor series, warm-up and modal forms of a set of surfaces: the input of every method below. */
export interface PreparedYear {
  readonly surfaces: readonly ScenarioSurface[];
  readonly solAirC: readonly Float64Array[];
  readonly indoorC: Float64Array;
  readonly warmUpSteps: number;
}

/** Surface parameters, transposition and sol-air of every surface, and the scenario's warm-up (as computeWeatherYear). */
export function prepareYear(demo: DemoYear, surfaces: readonly ScenarioSurface[]): PreparedYear {
  const inputs = surfaces.map((surface) => ({
    surface,
    parameters: surfaceParameters(
      "bench",
      surface,
      demo.context.constructions.get(surface.construction)!,
      [],
      [],
    ),
  }));
  const boundary = weatherBoundary(demo.weather, demo.scenario.site!, demo.scenario.indoor, inputs);
  const tau1H = Math.max(0, ...surfaces.map((s) => demo.analysis(s.construction).airToAir.tau1H));
  return {
    surfaces,
    solAirC: boundary.surfaces.map((b) => b.solAirC),
    indoorC: boundary.indoorC,
    warmUpSteps: warmUpDays(tau1H) * 24,
  };
}

/**
 * The timed year run: sol-air of every surface, then its inside flux after the warm-up by the modal recursion, each
 * series consumed (summed into the total heat gain) as it comes, then `afterSurface`; returns the total heat gain, W.
 */
export function yearRun(
  demo: DemoYear,
  surfaces: readonly ScenarioSurface[],
  afterSurface: (index: number) => void = () => {},
): Float64Array {
  const year = prepareYear(demo, surfaces);
  const n = year.indoorC.length;
  const total = new Float64Array(n);
  const runs = surfaces.map((s, i) => ({
    modes: demo.analysis(s.construction).airToAir.modes,
    solAirC: year.solAirC[i]!,
  }));
  forEachInsideFlux(runs, year.indoorC, year.warmUpSteps, n, (i, q) => {
    const area = surfaces[i]!.areaM2;
    for (let k = 0; k < n; k++) total[k] = total[k]! + q[k]! * area;
    afterSurface(i);
  });
  return total;
}

/** Σ_j f_j x(t − j) over the whole series f, with the year repeating before its first step (periodic history). */
function periodicConvolution(f: readonly number[], x: Float64Array): Float64Array {
  const n = x.length;
  const terms = f.length;
  const lead = terms - 1;
  const extended = new Float64Array(lead + n);
  for (let j = 0; j < lead; j++) extended[j] = x[(((n - lead + j) % n) + n) % n]!;
  extended.set(x, lead);
  const out = new Float64Array(n);
  for (let t = 0; t < n; t++) {
    let sum = 0;
    for (let j = 0; j < terms; j++) sum += f[j]! * extended[lead + t - j]!;
    out[t] = sum;
  }
  return out;
}

/**
 * Inside fluxes by direct response-factor convolution, q_t = Σ_j Y_j T_sa(t − j) − Σ_j Z_j T_i(t − j) over every
 * response factor, with the indoor term shared per construction (as the modal path shares it); calls `visit` per surface.
 */
export function directRun(
  demo: DemoYear,
  year: PreparedYear,
  visit: (index: number, insideWPerM2: Float64Array) => void = () => {},
): void {
  const indoorTerm = new Map<string, Float64Array>();
  for (const [i, surface] of year.surfaces.entries()) {
    const rf = demo.analysis(surface.construction).airToAir.responseFactors;
    let z = indoorTerm.get(surface.construction);
    if (z === undefined) indoorTerm.set(surface.construction, z = periodicConvolution(rf.Z, year.indoorC));
    const q = periodicConvolution(rf.Y, year.solAirC[i]!);
    for (let k = 0; k < q.length; k++) q[k] = q[k]! - z[k]!;
    visit(i, q);
  }
}

/** Σ_n b_n x_(t−n) + Σ_n Φ_n y_(t−n) over the warm-up input, from a steady past; outputs after the warm-up. */
function ctfSeries(
  b: readonly number[],
  phi: readonly number[],
  x: Float64Array,
  initial: number,
  skip: number,
) {
  const sumB = b.reduce((s, v) => s + v, 0);
  const sumPhi = phi.reduce((s, v) => s + v, 0);
  const history = Math.max(b.length, phi.length + 1);
  const xs = new Float64Array(history + x.length).fill(initial);
  const ys = new Float64Array(history + x.length).fill((sumB / (1 - sumPhi)) * initial);
  xs.set(x, history);
  for (let t = history; t < ys.length; t++) {
    let y = 0;
    for (let j = 0; j < b.length; j++) y += b[j]! * xs[t - j]!;
    for (let j = 0; j < phi.length; j++) y += phi[j]! * ys[t - 1 - j]!;
    ys[t] = y;
  }
  return ys.slice(history + skip);
}

/**
 * Inside fluxes by the polynomial CTF recursion of each construction (Y on sol-air, Z on indoor shared per
 * construction, both with the Φ recursion), after the same warm-up as the modal path; calls `visit` per surface.
 */
export function ctfRun(
  demo: DemoYear,
  year: PreparedYear,
  visit: (index: number, insideWPerM2: Float64Array) => void = () => {},
): void {
  const n = year.indoorC.length;
  const w = year.warmUpSteps;
  const indoorTerm = new Map<string, Float64Array>();
  for (const [i, surface] of year.surfaces.entries()) {
    const ctf = demo.analysis(surface.construction).airToAir.ctfCandidate.ctf;
    let z = indoorTerm.get(surface.construction);
    if (z === undefined) {
      const input = warmUpInput(year.indoorC, w, n);
      indoorTerm.set(surface.construction, z = ctfSeries(ctf.Z, ctf.Phi, input.input, input.initial, w));
    }
    const input = warmUpInput(year.solAirC[i]!, w, n);
    const q = ctfSeries(ctf.Y, ctf.Phi, input.input, input.initial, w);
    for (let k = 0; k < n; k++) q[k] = q[k]! - z[k]!;
    visit(i, q);
  }
}

/** Inside fluxes by the modal recursion of a prepared year (the flux part of `yearRun`); calls `visit` per surface. */
export function modalRun(
  demo: DemoYear,
  year: PreparedYear,
  visit: (index: number, insideWPerM2: Float64Array) => void = () => {},
): void {
  const runs = year.surfaces.map((s, i) => ({
    modes: demo.analysis(s.construction).airToAir.modes,
    solAirC: year.solAirC[i]!,
  }));
  forEachInsideFlux(runs, year.indoorC, year.warmUpSteps, year.indoorC.length, visit);
}
