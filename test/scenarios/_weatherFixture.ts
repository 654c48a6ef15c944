import { parseWeatherCsv, type WeatherSeries } from "../../src/climate/weatherCsv.ts";
import { analyseConstruction, type ConstructionInput, type DynamicAnalysis } from "../../src/engine/mod.ts";
import type { Construction, Scenario, ScenarioSurface, TemperatureProfile } from "../../src/project/model.ts";
import type { ScenarioContext } from "../../src/scenarios/designDay.ts";

export type WeatherScenario = Extract<Scenario, { kind: "weather" }>;

const AT = { file: "45-weather.md", line: 1, col: 1 };

/** A project construction from an engine input, with invented names and positions. */
export function construction(id: string, input: ConstructionInput): Construction {
  return {
    id,
    name: id,
    layers: input.layers.map((layer, i) => ({ ...layer, name: `layer ${i + 1}`, source: "test", at: AT })),
    heatFlow: "horizontal",
    outsideResistance: input.outsideResistance,
    outsideResistanceDefaulted: false,
    insideResistance: input.insideResistance,
    insideResistanceDefaulted: false,
    timestepS: 3600,
    at: AT,
  };
}

/** A scenario context over the given constructions, analysing each at the asked timestep (no state space). */
export function context(constructions: readonly Construction[]): ScenarioContext & {
  analysis(id: string): DynamicAnalysis;
} {
  const map = new Map(constructions.map((c) => [c.id, c]));
  const cache = new Map<string, DynamicAnalysis>();
  const analysisAt = (id: string, timestepS: number) => {
    const key = `${id}@${timestepS}`;
    const hit = cache.get(key);
    if (hit !== undefined) return hit;
    const a = analyseConstruction(map.get(id)!, timestepS, { stateSpace: false });
    if (a.kind !== "analysis") throw new Error(a.message);
    cache.set(key, a);
    return a;
  };
  return { constructions: map, analysisAt, analysis: (id) => analysisAt(id, 3600) };
}

/** A surface with the given keys (position filled in). */
export function surface(fields: Omit<ScenarioSurface, "at">): ScenarioSurface {
  return { ...fields, at: AT };
}

/** A weather scenario at 1 h for an invented site at 52.4° N, 1.9° W, UTC. */
export function weatherScenario(
  surfaces: readonly ScenarioSurface[],
  indoor: TemperatureProfile = { kind: "constant", valueC: 20 },
): WeatherScenario {
  return {
    id: "test-year",
    kind: "weather",
    timestepS: 3600,
    timestepDefaulted: false,
    indoor,
    surfaces,
    at: AT,
    weatherPath: "weather/test-year.csv",
    weatherAt: AT,
    site: { latitudeDeg: 52.4, longitudeDeg: -1.9, timeZoneH: 0 },
  };
}

/** Hours in each month of 2031 (a common year). */
export const HOURS_IN_MONTH_2031 = [31, 28, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31].map((d) => 24 * d);

/**
 * An hourly year of 2031 as weather CSV text, rows 2031-01-01T01:00 … 2032-01-01T00:00 (8760 rows); `row(h)` gives
 * [dry bulb °C, global W/m², diffuse W/m²] for hour h = 1…8760 after 2031-01-01T00:00.
 */
export function yearCsv(row: (h: number) => readonly [number, number, number]): string {
  const lines = ["time,dry-bulb,global-horizontal,diffuse-horizontal"];
  const starts = [0];
  for (const hours of HOURS_IN_MONTH_2031) starts.push(starts[starts.length - 1]! + hours);
  for (let h = 1; h <= 8760; h++) {
    const month = h === 8760 ? 13 : starts.findIndex((s, m) => h >= s && h < starts[m + 1]!) + 1;
    const hourOfMonth = h - (starts[month - 1] ?? 8760);
    const date = month === 13
      ? "2032-01-01"
      : `2031-${String(month).padStart(2, "0")}-${String(1 + Math.floor(hourOfMonth / 24)).padStart(2, "0")}`;
    const [t, g, d] = row(h);
    lines.push(`${date}T${String(hourOfMonth % 24).padStart(2, "0")}:00,${t},${g},${d}`);
  }
  return `${lines.join("\n")}\n`;
}

/** Parses a weather CSV made by `yearCsv`, failing loudly on any diagnostic. */
export function weather(text: string): WeatherSeries {
  const parsed = parseWeatherCsv(text, "weather/test-year.csv", 1, 3600);
  if (!parsed.ok) throw new Error(parsed.diagnostics.map((d) => `${d.at.line}: ${d.message}`).join("\n"));
  return parsed.weather;
}

/** A column of a CSV text by header name, as numbers (or strings for `time`). */
export function csvColumn(text: string, name: string): number[] {
  const [header, ...rows] = text.trimEnd().split("\n");
  const index = header!.split(",").indexOf(name);
  if (index < 0) throw new Error(`no column ${name}`);
  return rows.map((r) => Number(r.split(",")[index]));
}
