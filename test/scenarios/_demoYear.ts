/**
 * The demo project's weather year (projects/demo: constructions EW-1…EW-4 and RF-1, scenario
 * weather-year-synthetic and its synthetic weather file) for the equality tests and the hourly benchmark, from the
 * snapshot in _demoSnapshot.ts (checked against the project by weatherFast_test.ts), with a deterministic generator of
 * many surfaces cycled from it.
 */
import { parseWeatherCsv, type WeatherSeries } from "../../src/climate/weatherCsv.ts";
import { analyseConstruction, type DynamicAnalysis } from "../../src/engine/mod.ts";
import type { Construction, Scenario, ScenarioSurface } from "../../src/project/model.ts";
import type { Position } from "../../src/project/position.ts";
import type { ScenarioContext } from "../../src/scenarios/designDay.ts";
import { DEMO_SNAPSHOT } from "./_demoSnapshot.ts";

/** The demo's weather scenario. */
export type DemoScenario = Extract<Scenario, { kind: "weather" }>;

/** The demo's weather year ready to compute. */
export interface DemoYear {
  readonly scenario: DemoScenario;
  readonly weather: WeatherSeries;
  readonly constructions: readonly Construction[];
  readonly context: ScenarioContext;
  /** Root analysis of a construction at 1 h (no state space: the modal form does not depend on it). */
  readonly analysis: (id: string) => DynamicAnalysis;
}

/** Constructions the generated surfaces cycle through. */
export const DEMO_CONSTRUCTIONS = ["EW-1", "EW-2", "EW-3", "EW-4", "RF-1"] as const;

/** Folder of the demo project. */
export const DEMO_FOLDER = new URL("../../projects/demo/", import.meta.url).pathname;
const SNAPSHOT_AT: Position = { file: "_demoSnapshot.ts", line: 1, col: 1 };

/** A deep copy of plain data with `at` (and `weatherAt` on the scenario) put back on every object. */
function placed<T>(value: unknown): T {
  if (Array.isArray(value)) return value.map((v) => placed(v)) as T;
  if (typeof value !== "object" || value === null) return value as T;
  const out: Record<string, unknown> = { at: SNAPSHOT_AT };
  for (const [key, v] of Object.entries(value)) out[key] = placed(v);
  if (out.kind === "weather") out.weatherAt = SNAPSHOT_AT;
  return out as T;
}

/** Keys left out of the snapshot: source positions and the reference texts of materials (no number depends on them). */
const PROVENANCE_KEYS = new Set(["at", "weatherAt", "source"]);

/** Plain data without the provenance keys (`at`, `weatherAt`, `source`), as in the snapshot. */
export function withoutProvenance(value: unknown): unknown {
  return JSON.parse(JSON.stringify(value, (key, v) => (PROVENANCE_KEYS.has(key) ? undefined : v)));
}

/** The demo's constructions and weather year from the snapshot and the weather file (needs read access only). */
export async function loadDemoYear(): Promise<DemoYear> {
  const model = { constructions: placed<Construction[]>(DEMO_SNAPSHOT.constructions) };
  const scenario = placed<DemoScenario>(DEMO_SNAPSHOT.scenario);
  const text = await Deno.readTextFile(`${DEMO_FOLDER}${scenario.weatherPath}`);
  const parsed = parseWeatherCsv(text.replaceAll("\r\n", "\n"), scenario.weatherPath, 1, 3600);
  if (!parsed.ok) throw new Error(parsed.diagnostics.map((d) => d.message).join("\n"));
  const constructions = new Map(model.constructions.map((c) => [c.id, c]));
  const cache = new Map<string, DynamicAnalysis>();
  const analysisAt = (id: string, timestepS: number): DynamicAnalysis => {
    const key = `${id}@${timestepS}`;
    const hit = cache.get(key);
    if (hit !== undefined) return hit;
    const a = analyseConstruction(constructions.get(id)!, timestepS, { stateSpace: false });
    if (a.kind !== "analysis") throw new Error(a.message);
    cache.set(key, a);
    return a;
  };
  return {
    scenario,
    weather: parsed.weather,
    constructions: model.constructions,
    context: { constructions, analysisAt },
    analysis: (id) => analysisAt(id, 3600),
  };
}

const WALL_AZIMUTHS = [180, 225, 270, 315, 0, 45, 90, 135];
const ROOF_ORIENTATIONS = [[180, 0], [180, 15], [90, 30], [270, 30]] as const;

/**
 * `count` surfaces cycled deterministically (no random numbers): constructions EW-1, EW-2, EW-3, EW-4, RF-1 in
 * turn; walls vertical at the eight compass points, the roof flat or pitched; absorptance 0.30…0.90 in 13 steps;
 * area 5…21 m². Surface i always gets the same values, whatever `count`.
 */
export function cycledSurfaces(scenario: DemoScenario, count: number): ScenarioSurface[] {
  return Array.from({ length: count }, (_, i) => {
    const construction = DEMO_CONSTRUCTIONS[i % DEMO_CONSTRUCTIONS.length]!;
    const turn = Math.floor(i / DEMO_CONSTRUCTIONS.length);
    const [azimuthDeg, tiltDeg] = construction === "RF-1"
      ? ROOF_ORIENTATIONS[turn % ROOF_ORIENTATIONS.length]!
      : [WALL_AZIMUTHS[turn % WALL_AZIMUTHS.length]!, 90];
    return {
      id: `s${i}`,
      construction,
      areaM2: 5 + (i % 17),
      azimuthDeg,
      tiltDeg,
      absorptance: 0.3 + 0.05 * (i % 13),
      at: scenario.at,
    };
  });
}
