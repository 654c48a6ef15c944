/**
 * Scenario results for the rendering tests, produced by the real design-day and weather-year code (never typed
 * in), on the invented wall EW-9 and an invented roof RF-9.
 */
import { parseWeatherCsv } from "../../src/climate/weatherCsv.ts";
import { analyseConstruction, type DynamicAnalysis } from "../../src/engine/mod.ts";
import type { Construction, Scenario, ScenarioSurface, Site } from "../../src/project/model.ts";
import type { PackageInput } from "../../src/report/package.ts";
import type { ScenarioResults } from "../../src/results/types.ts";
import {
  computeDesignDay,
  type ScenarioContext,
  type ScenarioOutcome,
} from "../../src/scenarios/designDay.ts";
import { computeWeatherYear } from "../../src/scenarios/weatherYear.ts";
import { construction } from "./dynamicFixture.ts";
import { fixture, wall } from "./fixture.ts";

/** A design-day scenario. */
export type DesignDay = Extract<Scenario, { kind: "design-day" }>;
/** A weather-year scenario. */
export type WeatherYear = Extract<Scenario, { kind: "weather" }>;

const AT = { file: "walls.md", line: 30, col: 1 };

/** Invented site: 48° N, 11° E, UTC+1. */
export const SITE: Site = { latitudeDeg: 48, longitudeDeg: 11, timeZoneH: 1, elevationM: 500 };

/** Invented roof: 150 mm insulation (λ 0.035) on 200 mm concrete (λ 1.65), films 0.04 / 0.10. */
export function roof(): Construction {
  return construction(
    "RF-9",
    [
      { kind: "massive", thicknessM: 0.15, conductivity: 0.035, density: 30, specificHeat: 1400 },
      { kind: "massive", thicknessM: 0.2, conductivity: 1.65, density: 2300, specificHeat: 1000 },
    ],
    { outside: 0.04, inside: 0.1 },
  );
}

/** A scenario context over EW-9 and RF-9 that analyses each construction at the asked time step. */
export function scenarioContext(): ScenarioContext {
  const map = new Map([wall(), roof()].map((c) => [c.id, c]));
  const cache = new Map<string, DynamicAnalysis>();
  return {
    constructions: map,
    analysisAt(id, timestepS) {
      const key = `${id}@${timestepS}`;
      const hit = cache.get(key);
      if (hit !== undefined) return hit;
      const analysis = analyseConstruction(map.get(id)!, timestepS);
      if (analysis.kind !== "analysis") throw new Error(analysis.message);
      cache.set(key, analysis);
      return analysis;
    },
  };
}

/** A surface with the given keys and a position. */
export function surface(fields: Omit<ScenarioSurface, "at">): ScenarioSurface {
  return { ...fields, at: AT };
}

/** A design day on 21 July: outdoor 31 °C maximum with an 11 K range, indoor 24 °C, clear sky unless `sky` says. */
export function designDay(surfaces: readonly ScenarioSurface[], options: Partial<DesignDay> = {}): DesignDay {
  return {
    id: "july-day",
    kind: "design-day",
    timestepS: 3600,
    timestepDefaulted: false,
    indoor: { kind: "constant", valueC: 24 },
    outdoor: { kind: "daily-range", maxDryBulbC: 31, dailyRangeK: 11 },
    site: SITE,
    month: 7,
    day: 21,
    sky: { kind: "clear-sky", beamOpticalDepth: 0.4, diffuseOpticalDepth: 2.2 },
    at: AT,
    surfaces,
    ...options,
  };
}

/** The package fixture with `scenario` in place of its scenario and `outcome` merged into results.json. */
export function packageWith(scenario: Scenario, outcome: ScenarioOutcome, text = ""): PackageInput {
  const base = fixture({ text });
  const documents = base.model.documents.map((d) => ({
    ...d,
    segments: d.segments.map((s) =>
      s.kind === "block" && s.blockKind === "scenario" ? { ...s, id: scenario.id } : s
    ),
  }));
  const results = {
    ...base.results,
    scenarios: { [scenario.id]: outcome.results },
    checks: [...base.results.checks, ...outcome.checks],
    assumptions: [...base.results.assumptions, ...outcome.assumptions],
  };
  return {
    ...base,
    model: { ...base.model, documents, scenarios: [scenario], constructions: [wall(), roof()] },
    results,
    resultsJsonText: JSON.stringify(results),
    embeddedResultsText: JSON.stringify(results),
  };
}

/** Computes a design day with the real code and puts it into the package fixture. */
export function designDayPackage(
  scenario: DesignDay,
  text = "",
): { input: PackageInput; results: ScenarioResults } {
  const outcome = computeDesignDay(scenario, scenarioContext());
  return { input: packageWith(scenario, outcome, text), results: outcome.results };
}

/** Hourly rows of 2031 from 01:00 on 1 January to 00:00 on 1 January 2032, all with the same values. */
function constantYearCsv(dryBulbC: number, globalWPerM2: number, diffuseWPerM2: number): string {
  const lines = ["time,dry-bulb,global-horizontal,diffuse-horizontal"];
  const start = Date.UTC(2031, 0, 1);
  for (let h = 1; h <= 8760; h++) {
    const time = new Date(start + h * 3_600_000).toISOString().slice(0, 16);
    lines.push(`${time},${dryBulbC},${globalWPerM2},${diffuseWPerM2}`);
  }
  return `${lines.join("\n")}\n`;
}

/** A weather year with constant dry bulb and no sun, computed by the real weather-year code. */
export function weatherYearPackage(
  surfaces: readonly ScenarioSurface[],
  dryBulbC: number,
  indoorC: number,
): { input: PackageInput; results: ScenarioResults } {
  const scenario: WeatherYear = {
    id: "test-year",
    kind: "weather",
    timestepS: 3600,
    timestepDefaulted: false,
    indoor: { kind: "constant", valueC: indoorC },
    surfaces,
    at: AT,
    weatherPath: "weather/test-year.csv",
    weatherAt: AT,
    site: SITE,
  };
  const parsed = parseWeatherCsv(constantYearCsv(dryBulbC, 0, 0), scenario.weatherPath, 1, 3600);
  if (!parsed.ok) throw new Error(parsed.diagnostics.map((d) => d.message).join("\n"));
  const outcome = computeWeatherYear(scenario, parsed.weather, scenarioContext());
  return { input: packageWith(scenario, outcome), results: outcome.results };
}
