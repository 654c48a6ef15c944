import { inputsHash } from "../archive/hash.ts";
import {
  analyseConstruction,
  constructionChecksJson,
  constructionDynamicJson,
  constructionMethodNotesJson,
  type DynamicAnalysis,
} from "../engine/mod.ts";
import type { SteadyState } from "../engine/steady.ts";
import { type Diagnostic, error } from "../project/diagnostic.ts";
import type { Assumption, Construction, Model } from "../project/model.ts";
import { formatPosition } from "../project/position.ts";
import { computeDesignDay, type ScenarioContext } from "../scenarios/designDay.ts";
import { computeHeating } from "../scenarios/heating.ts";
import { computeRooms, withRoomSeries } from "./roomResults.ts";
import { roomCsvTables } from "../scenarios/room/roomCsv.ts";
import { heatingCsv } from "../scenarios/heatingCsv.ts";
import type { CsvTable } from "../tables/csvTable.ts";
import { computeWeatherYear } from "../scenarios/weatherYear.ts";
import { weatherCoverage } from "../scenarios/weatherPeriod.ts";
import { weatherBudget } from "../scenarios/weatherBudget.ts";
import { sensitivityStudy } from "../sensitivity/study.ts";
import { parseWeatherCsv } from "../climate/weatherCsv.ts";
import { stampSyntheticCsv, syntheticMark } from "./syntheticWeather.ts";
import { TOOL_VERSION } from "../version.ts";
import { limitsFor, ownLimits } from "../project/constructionLimits.ts";
import { designResults } from "./designResults.ts";
import { moistureResistances } from "./moistureResistance.ts";
import type {
  CheckResult,
  ConstructionResults,
  InputFileRecord,
  LayerResult,
  MethodNoteResult,
  ResultsJson,
  ScenarioResults,
} from "./types.ts";

/** The computed results of a project, before rendering. */
export interface ComputedProject {
  readonly results: ResultsJson;
  readonly steady: Readonly<Record<string, SteadyState>>;
  readonly analyses: Readonly<Record<string, DynamicAnalysis>>;
  /** CSV tables computed with the scenarios (weather-year series and daily summaries, heating surfaces). */
  readonly csvFiles: readonly CsvTable[];
}

/** What to compute besides the results `check` reports (findings, checks, limits, summary). */
export interface ComputeOptions {
  /**
   * Also compute the parts only the package shows: the sensitivity study and the CSV tables (default true).
   * `check` passes false; everything it reports (checks, limits, warnings, assumptions, scenario results) is
   * computed either way.
   */
  readonly packageParts?: boolean;
}

export type ComputeOutcome =
  | { readonly ok: true; readonly computed: ComputedProject }
  | { readonly ok: false; readonly diagnostics: readonly Diagnostic[] };

/** Computes every construction (steady state and dynamic response) and assembles results.json. */
export function computeProject(
  model: Model,
  inputs: readonly InputFileRecord[],
  dataTexts: ReadonlyMap<string, string> = new Map(),
  progress: (message: string) => void = () => {},
  options: ComputeOptions = {},
): ComputeOutcome {
  const packageParts = options.packageParts ?? true;
  const steady: Record<string, SteadyState> = {};
  const analyses: Record<string, DynamicAnalysis> = {};
  const constructions: Record<string, ConstructionResults> = {};
  const checks: CheckResult[] = [];
  const methodNotes: MethodNoteResult[] = [];
  const problems: Diagnostic[] = [];
  const ownLimitsById = ownLimits(model);
  const moistureRsi = moistureResistances(model);
  const designAssumptions: Assumption[] = [];
  const designWarnings: { at: string; message: string }[] = [];
  const correctedU = new Map<string, number>();
  for (const [index, construction] of model.constructions.entries()) {
    progress(`construction ${index + 1}/${model.constructions.length}: ${construction.id}`);
    const analysis = analyseConstruction(construction, construction.timestepS);
    if (analysis.kind === "unresolvable") {
      problems.push(
        error(
          construction.at,
          `unresolvable-${analysis.reason}`,
          `Cannot compute construction "${construction.id}": ${analysis.message}`,
          "check the layers and surface resistances of this construction",
        ),
      );
      continue;
    }
    analyses[construction.id] = analysis;
    steady[construction.id] = analysis.steady;
    const base = {
      ...constructionResults(construction, analysis.steady),
      ...constructionDynamicJson(analysis),
    };
    const design = designResults(
      construction,
      base,
      limitsFor(ownLimitsById.get(construction.id), model.info.limits),
      moistureRsi(construction.id),
    );
    constructions[construction.id] = { ...base, ...design.keys };
    correctedU.set(construction.id, design.keys.correctedU);
    checks.push(...constructionChecksJson(construction.id, analysis), ...design.checks);
    methodNotes.push(...constructionMethodNotesJson(construction.id, analysis));
    designAssumptions.push(...design.assumptions);
    designWarnings.push(...design.warnings);
  }
  if (problems.length > 0) return { ok: false, diagnostics: problems };
  // Rooms need only the model; computed first so a design day can use a room's own radiant time series.
  const rooms = computeRooms(model, steady, correctedU);
  if (rooms.problems.length > 0) return { ok: false, diagnostics: rooms.problems };
  const withSeries = withRoomSeries(model, rooms.results);
  const scenarioParts = computeScenarios(withSeries, analyses, dataTexts, progress);
  if (scenarioParts.problems.length > 0) return { ok: false, diagnostics: scenarioParts.problems };
  checks.push(...scenarioParts.checks);
  methodNotes.push(...scenarioParts.methodNotes);
  const heating = (model.heatingScenarios ?? []).map((s) =>
    [
      s.id,
      computeHeating(s, new Map(model.constructions.map((c) => [c.id, c])), steady, correctedU),
    ] as const
  );
  checks.push(...rooms.checks);
  const variation = packageParts ? model.info.sensitivityVariation : undefined;
  if (variation !== undefined) progress("sensitivity study");
  const sensitivity = variation === undefined
    ? undefined
    : sensitivityStudy(withSeries, variation, new Map(Object.entries(analyses)));
  const results: ResultsJson = {
    schema: "fluxnote-results/1",
    tool: { name: "fluxnote", version: TOOL_VERSION },
    inputs: { files: inputs, sha256: inputsHash(inputs) },
    constructions,
    scenarios: scenarioParts.scenarios,
    checks,
    methodNotes,
    assumptions: [
      ...model.assumptions,
      ...designAssumptions,
      ...scenarioParts.assumptions,
      ...heating.flatMap(([, h]) => h.assumptions),
      ...rooms.assumptions,
    ].map((a) => ({
      id: a.id,
      text: a.text,
      source: a.source,
      at: a.at,
    })),
    warnings: [...designWarnings, ...scenarioParts.warnings, ...rooms.warnings],
    ...(sensitivity === undefined ? {} : { sensitivity }),
    ...(heating.length === 0
      ? {}
      : { heating: Object.fromEntries(heating.map(([id, h]) => [id, h.results])) }),
    ...(rooms.results === undefined ? {} : { rooms: rooms.results }),
  };
  const csvFiles = packageParts
    ? [
      ...scenarioParts.csvFiles,
      ...heating.map(([id, h]) => heatingCsv(id, h.results)),
      ...roomCsvTables(rooms.results),
    ]
    : [];
  return { ok: true, computed: { results, steady, analyses, csvFiles } };
}

interface ScenarioParts {
  readonly scenarios: Record<string, ScenarioResults>;
  readonly checks: CheckResult[];
  readonly methodNotes: MethodNoteResult[];
  readonly assumptions: Assumption[];
  readonly warnings: { at: string; message: string }[];
  readonly csvFiles: CsvTable[];
  readonly problems: Diagnostic[];
}

function computeScenarios(
  model: Model,
  analyses: Readonly<Record<string, DynamicAnalysis>>,
  dataTexts: ReadonlyMap<string, string>,
  progress: (message: string) => void,
): ScenarioParts {
  const constructions = new Map(model.constructions.map((c) => [c.id, c]));
  const cache = new Map<string, DynamicAnalysis>();
  const parts: ScenarioParts = {
    scenarios: {},
    checks: [],
    methodNotes: [],
    assumptions: [],
    warnings: [],
    csvFiles: [],
    problems: [],
  };
  const context: ScenarioContext = {
    constructions,
    analysisAt(constructionId, timestepS, outsideResistance) {
      const own = analyses[constructionId];
      const construction = constructions.get(constructionId)!;
      const film = outsideResistance === undefined || outsideResistance === construction.outsideResistance
        ? undefined
        : outsideResistance;
      if (own !== undefined && own.timestepS === timestepS && film === undefined) return own;
      const key = `${constructionId}@${timestepS}@${film ?? "own"}`;
      const cached = cache.get(key);
      if (cached !== undefined) return cached;
      // The surface-to-surface analysis has no film in it: the construction's own is reused when the step matches.
      const analysis = analyseConstruction(
        film === undefined ? construction : { ...construction, outsideResistance: film },
        timestepS,
        own === undefined ? {} : { sameLayers: { input: construction, analysis: own } },
      );
      if (analysis.kind === "unresolvable") {
        throw new Error(`construction ${constructionId} at ${timestepS} s: ${analysis.message}`);
      }
      const at = `At the scenario time step ${timestepS / 60} min${
        film === undefined
          ? ""
          : ` with the design-day outside film R_se = ${Number(film.toPrecision(4))} m²·K/W`
      }`;
      cache.set(key, analysis);
      parts.checks.push(
        ...constructionChecksJson(constructionId, analysis).map((c) => ({
          ...c,
          description: `${at}: ${c.description}`,
        })),
      );
      parts.methodNotes.push(
        ...constructionMethodNotesJson(constructionId, analysis).map((n) => ({
          ...n,
          text: `${at}: ${n.text}`,
        })),
      );
      return analysis;
    },
  };
  let heldBytes = 0;
  for (const scenario of model.scenarios) {
    progress(`scenario ${scenario.id} (${scenario.kind}, ${scenario.surfaces.length} surfaces)`);
    if (scenario.timestepDefaulted) {
      parts.assumptions.push({
        id: `default:timestep:${scenario.id}`,
        text: `Time step of scenario ${scenario.id} not given: 1 h`,
        source: "fluxnote default",
        at: formatPosition(scenario.at),
      });
    }
    switch (scenario.kind) {
      case "design-day": {
        const outcome = computeDesignDay(scenario, context);
        parts.scenarios[scenario.id] = outcome.results;
        parts.checks.push(...outcome.checks);
        parts.assumptions.push(...outcome.assumptions);
        parts.warnings.push(...outcome.warnings);
        break;
      }
      case "weather": {
        const text = dataTexts.get(scenario.weatherPath);
        if (text === undefined) {
          parts.problems.push(
            error(
              scenario.weatherAt,
              "weather-missing",
              `Cannot compute scenario "${scenario.id}": its weather file was not read`,
              "check the `weather` path",
            ),
          );
          break;
        }
        const parsed = parseWeatherCsv(text, scenario.weatherPath, 1, scenario.timestepS);
        if (!parsed.ok) {
          parts.problems.push(...parsed.diagnostics);
          break;
        }
        const coverage = weatherCoverage(scenario, parsed.weather);
        if (!coverage.ok) {
          parts.problems.push(coverage.diagnostic);
          break;
        }
        const budget = weatherBudget(scenario, parsed.weather.count, heldBytes);
        if (!budget.ok) {
          parts.problems.push(budget.diagnostic);
          break;
        }
        heldBytes += budget.bytes;
        const outcome = computeWeatherYear(scenario, parsed.weather, context, coverage.coverage);
        const synthetic = syntheticMark(scenario.synthetic, parsed.synthetic);
        parts.scenarios[scenario.id] = synthetic === undefined
          ? outcome.results
          : { ...outcome.results, synthetic };
        parts.checks.push(...outcome.checks);
        parts.assumptions.push(...outcome.assumptions);
        parts.warnings.push(...outcome.warnings);
        parts.warnings.push(
          ...parsed.diagnostics.filter((d) => d.severity !== "error").map((d) => ({
            at: formatPosition(d.at),
            message: d.message,
          })),
        );
        parts.csvFiles.push(
          ...(synthetic === undefined
            ? outcome.csv
            : outcome.csv.map((f) => stampSyntheticCsv(f, synthetic))),
        );
        break;
      }
    }
  }
  return parts;
}

function constructionResults(construction: Construction, steady: SteadyState): ConstructionResults {
  const layers: LayerResult[] = construction.layers.map((layer, index) => {
    const common = {
      name: layer.name,
      R: steady.layerResistances[index] ?? NaN,
      arealHeatCapacity: steady.layerArealHeatCapacities[index] ?? 0,
    };
    return layer.kind === "massive"
      ? {
        kind: "massive",
        thickness: layer.thicknessM,
        conductivity: layer.conductivity,
        density: layer.density,
        specificHeat: layer.specificHeat,
        ...common,
      }
      : { kind: "resistive", ...common };
  });
  return {
    U: steady.uValue,
    R: steady.totalResistance,
    timestep_h: construction.timestepS / 3600,
    steady: {
      outsideSurfaceResistance: construction.outsideResistance,
      insideSurfaceResistance: construction.insideResistance,
      surfaceToSurfaceU: steady.surfaceToSurfaceU,
      arealHeatCapacity: steady.arealHeatCapacity,
      layers,
    },
  };
}
