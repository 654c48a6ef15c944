/**
 * A weather year: hourly (or sub-hourly) weather rows → sol-air temperature per surface → inside and outside fluxes
 * by the modal recursion after a periodic-year warm-up → heat gains, peaks, monthly and daily summaries, and one CSV
 * of the step series (results.json keeps only the summaries, DESIGN.md §4).
 */
import type { WeatherSeries } from "../climate/weatherCsv.ts";
import { formatDurationS } from "../climate/weatherTime.ts";
import type { Assumption, Scenario } from "../project/model.ts";
import { formatPosition } from "../project/position.ts";
import type { CheckResult } from "../engine/checkResult.ts";
import type { EnergyTotals, ScenarioResults, SurfaceResults } from "./types.ts";
import type { CsvTable } from "../tables/csvTable.ts";
import type { ScenarioContext, ScenarioOutcome } from "./designDay.ts";
import { surfaceParameters, type SurfaceWarning } from "./surfaceParameters.ts";
import { coverageNotes, impliedCoverage, type PeriodJson, type WeatherCoverage } from "./weatherPeriod.ts";
import { weatherBoundary, type WeatherSurfaceInput } from "./weatherBoundary.ts";
import { energyBalanceCheck, WARM_UP_LIMIT, warmUpCheck } from "./weatherChecks.ts";
import {
  forEachInsideFlux,
  MIN_WARM_UP_DAYS,
  WARM_UP_TIME_CONSTANTS,
  warmUpDays,
} from "./weatherRecursion.ts";
import {
  type CsvSurface,
  dailyCsvTable,
  type DailySummary,
  dailySummary,
  energyTotals,
  type TimedPeak,
  timedPeak,
  weatherCsvTable,
  type WeatherFileSummary,
  weatherSummary,
} from "./weatherSummary.ts";

export { WARM_UP_LIMIT };

type WeatherScenario = Extract<Scenario, { kind: "weather" }>;

/** A surface of a weather year in results.json: empty step series (they are in the CSV) plus the summaries. */
export interface WeatherSurfaceResults extends SurfaceResults {
  readonly peakTime: string;
  /** Most negative heat gain (largest loss), W, with its time. */
  readonly peakLoss: TimedPeak;
  readonly totals: Required<EnergyTotals>;
}

/** A weather-year scenario in results.json (DESIGN.md §4 plus extension keys). */
export interface WeatherScenarioResults extends ScenarioResults {
  readonly surfaces: Readonly<Record<string, WeatherSurfaceResults>>;
  readonly totals: Required<EnergyTotals>;
  /** Path of the step CSV inside the output folder, `csv/scenario-<id>.csv` (the design-day CSV naming). */
  readonly csv: string;
  readonly peakTime: string;
  readonly peakLoss: TimedPeak;
  readonly weather: WeatherFileSummary;
  readonly warmUp: { readonly days: number; readonly tau1_h: number };
  readonly daily: { readonly firstDate: string; readonly days: number } & DailySummary;
  /** What the file covers: a whole year or the scenario's stated `period` (extension key). */
  readonly period: PeriodJson;
}

/** A computed weather year with the CSV files to write under the output folder. */
export interface WeatherOutcome extends ScenarioOutcome {
  readonly results: WeatherScenarioResults;
  /** CSV files to write: the step series (rows made as they are written) and the daily summary. */
  readonly csv: CsvTable[];
}

/** Computes a weather year: sol-air per surface, fluxes after a periodic warm-up, gains, summaries, checks and CSV. */
export function computeWeatherYear(
  scenario: WeatherScenario,
  weather: WeatherSeries,
  context: ScenarioContext,
  coverage: WeatherCoverage = impliedCoverage(weather),
): WeatherOutcome {
  if (scenario.site === undefined) {
    throw new RangeError(`Cannot compute weather scenario ${scenario.id}: it has no site to place the sun`);
  }
  const dt = weather.timestepS;
  const n = weather.count;
  const assumptions: Assumption[] = [];
  const warnings: SurfaceWarning[] = [];
  const inputs: (WeatherSurfaceInput & { uValue: number; tau1H: number })[] = [];
  for (const surface of scenario.surfaces) {
    const construction = context.constructions.get(surface.construction);
    if (construction === undefined) continue;
    const root = context.analysisAt(surface.construction, dt).airToAir;
    const parameters = surfaceParameters(scenario.id, surface, construction, assumptions, warnings);
    inputs.push({ surface, parameters, uValue: root.uValue, tau1H: root.tau1H });
  }
  const boundary = weatherBoundary(weather, scenario.site, scenario.indoor, inputs);
  const tau1H = Math.max(0, ...inputs.map((i) => i.tau1H));
  const days = warmUpDays(tau1H);
  const stepsPerDay = Math.round(86400 / dt);
  const warmUpSteps = days * stepsPerDay;
  const at = formatPosition(scenario.at);
  const repeating = coverage.label;
  assumptions.push(
    warmUpAssumption(scenario.id, days, tau1H, at, repeating),
    ...methodAssumptions(scenario.id, at),
  );
  const surfaces: Record<string, WeatherSurfaceResults> = {};
  const checks: CheckResult[] = [];
  const csvSurfaces: CsvSurface[] = [];
  const dailyColumns: ({ id: string } & DailySummary)[] = [];
  const total = new Float64Array(n);
  // One heat-gain buffer for all surfaces: each surface's summaries are taken before the next overwrites it, so memory
  // grows with rows × surfaces only by the series the CSV needs (incident, sol-air, inside flux).
  const heatGain = new Float64Array(n);
  const runs = inputs.map((input, s) => ({
    modes: context.analysisAt(input.surface.construction, dt).airToAir.modes,
    solAirC: boundary.surfaces[s]!.solAirC,
  }));
  forEachInsideFlux(runs, boundary.indoorC, warmUpSteps, n, (s, insideWPerM2) => {
    const { surface, parameters: p, uValue } = inputs[s]!;
    const { modes, solAirC } = runs[s]!;
    for (let k = 0; k < n; k++) heatGain[k] = insideWPerM2[k]! * surface.areaM2;
    for (let k = 0; k < n; k++) total[k] = total[k]! + heatGain[k]!;
    const subject = `scenario:${scenario.id}/${surface.id}`;
    checks.push(
      energyBalanceCheck(subject, insideWPerM2, solAirC, boundary.indoorC, uValue, modes, warmUpSteps),
      warmUpCheck(
        subject,
        modes,
        solAirC,
        boundary.indoorC,
        warmUpSteps,
        insideWPerM2,
        uValue,
        stepsPerDay,
      ),
    );
    const peak = timedPeak(heatGain, boundary.timeLabels, dt, 1);
    surfaces[surface.id] = {
      construction: surface.construction,
      area: surface.areaM2,
      solAir: [],
      insideFlux: [],
      outsideFlux: [],
      heatGain: [],
      radiantGain: [],
      convectiveGain: [],
      peak: { heatGain: peak.heatGain, time_h: peak.time_h },
      incident: [],
      parameters: {
        absorptance: p.absorptance,
        emittance: p.emittance,
        outsideCoefficient: p.outsideCoefficient,
        longwaveCorrection: p.longwaveCorrectionK,
        radiantFraction: p.radiantFraction,
        groundReflectance: p.groundReflectance,
      },
      peakTime: peak.time,
      peakLoss: timedPeak(heatGain, boundary.timeLabels, dt, -1),
      totals: energyTotals(heatGain, weather.monthOfStep, dt),
    };
    dailyColumns.push({
      id: surface.id,
      ...dailySummary(heatGain, boundary.dayIndexOfStep, boundary.dayCount),
    });
    csvSurfaces.push({
      id: surface.id,
      incidentWPerM2: boundary.surfaces[s]!.incidentWPerM2,
      solAirC,
      insideWPerM2,
      areaM2: surface.areaM2,
    });
  });
  const csvPath = `csv/scenario-${scenario.id}.csv`;
  const dailyPath = `csv/scenario-${scenario.id}-daily.csv`;
  const peak = timedPeak(total, boundary.timeLabels, dt, 1);
  const results: WeatherScenarioResults = {
    kind: "weather",
    timestep_h: dt / 3600,
    outdoor: [],
    indoor: [],
    surfaces,
    totalHeatGain: [],
    peak: { heatGain: peak.heatGain, time_h: peak.time_h },
    totals: energyTotals(total, weather.monthOfStep, dt),
    notes: [
      ...coverageNotes(coverage),
      ...notes(scenario.id, csvPath, dt, repeating),
      `Daily maximum, minimum and mean heat gain per surface are in ${dailyPath}.`,
    ],
    csv: csvPath,
    peakTime: peak.time,
    peakLoss: timedPeak(total, boundary.timeLabels, dt, -1),
    weather: weatherSummary(scenario.weatherPath, weather, boundary.timeLabels),
    warmUp: { days, tau1_h: tau1H },
    daily: {
      firstDate: boundary.firstDate,
      days: boundary.dayCount,
      ...dailySummary(total, boundary.dayIndexOfStep, boundary.dayCount),
    },
    period: coverage.json,
  };
  return {
    results,
    checks,
    assumptions,
    warnings,
    csv: [
      weatherCsvTable(csvPath, {
        timeLabels: boundary.timeLabels,
        outdoorC: boundary.outdoorC,
        indoorC: boundary.indoorC,
        surfaces: csvSurfaces,
        totalW: total,
      }),
      dailyCsvTable(dailyPath, boundary.firstDate, dailyColumns),
    ],
  };
}

function warmUpAssumption(
  id: string,
  days: number,
  tau1H: number,
  at: string,
  repeating: string,
): Assumption {
  const periodic = repeating === "year"
    ? "periodic-year assumption"
    : `periodic assumption over the ${repeating}`;
  return {
    id: `rule:weather-warm-up:${id}`,
    text:
      `Warm-up: the last ${days} days of the weather file are run first, from a steady state at their mean ` +
      `temperatures, so the first row follows the end of the file as if the ${repeating} repeated (${periodic}); ` +
      `${days} days = max(${MIN_WARM_UP_DAYS}, ⌈${WARM_UP_TIME_CONSTANTS} τ1 / 24 h⌉) with the slowest τ1 = ${
        tau1H.toFixed(1)
      } h of the scenario's constructions`,
    source: "fluxnote rule (start-up error decays as e^(−t/τ1); checked by the warm-up check)",
    at,
  };
}

function methodAssumptions(id: string, at: string): Assumption[] {
  return [{
    id: `rule:weather-transposition:${id}`,
    text: "Irradiance on each surface from the file's global and diffuse horizontal values: isotropic sky " +
      "(Liu & Jordan), beam = global − diffuse (all diffuse with the sun below 2°), ground reflection ρg (1 − cos Σ)/2, " +
      "sun position at the middle of each interval; direct-normal, when given, is not used",
    source:
      "Liu & Jordan (1963), Solar Energy 7(2) (from memory); the beam/diffuse split and the interval timing are method choices of this package",
    at,
  }];
}

function notes(id: string, csvPath: string, dt: number, repeating: string): string[] {
  const periodic = repeating === "year" ? "periodic year" : `the ${repeating} repeating`;
  return [
    "Time base: local standard time as written in the weather file; row k is at the first row's time + k·Δ.",
    "Irradiance in the file is the mean over the interval ending at each row's time; transposition uses the sun at " +
    "the interval's midpoint.",
    "Irradiance at a row's time is the mean of the interval ending and the interval starting there (the last row " +
    `uses the first interval: ${periodic}), so a peak is not shifted by half a step; the sol-air temperature ` +
    "combines it with the dry bulb at that time and is taken as linear between rows.",
    "Sky model for the transposition: isotropic (Liu & Jordan).",
    `Fluxes: modal recursion at Δ = ${formatDurationS(dt)} after a ${
      repeating === "year" ? "periodic-year" : `periodic (${repeating})`
    } warm-up (see assumptions).`,
    "Monthly totals: each step counts for the month of the interval ending at its time (time − Δ/2).",
    `Step series of scenario ${id} are in ${csvPath}, not in results.json: columns time, outdoor_degC, indoor_degC, ` +
    "then per surface <id>:incident_W_m2, <id>:sol_air_degC, <id>:inside_flux_W_m2 (positive into the " +
    "room), <id>:heat_gain_W, and total_heat_gain_W.",
  ];
}
