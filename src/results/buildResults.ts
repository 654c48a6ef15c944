import { inputsHash } from "../archive/hash.ts";
import {
  analyseConstruction,
  constructionChecksJson,
  constructionDynamicJson,
  type DynamicAnalysis,
} from "../engine/mod.ts";
import type { SteadyState } from "../engine/steady.ts";
import { type Diagnostic, error } from "../project/diagnostic.ts";
import type { Construction, Model } from "../project/model.ts";
import { TOOL_VERSION } from "../version.ts";
import type { CheckResult, ConstructionResults, InputFileRecord, LayerResult, ResultsJson } from "./types.ts";

/** The computed results of a project, before rendering. */
export interface ComputedProject {
  readonly results: ResultsJson;
  readonly steady: Readonly<Record<string, SteadyState>>;
  readonly analyses: Readonly<Record<string, DynamicAnalysis>>;
}

export type ComputeOutcome =
  | { readonly ok: true; readonly computed: ComputedProject }
  | { readonly ok: false; readonly diagnostics: readonly Diagnostic[] };

/** Computes every construction (steady state and dynamic response) and assembles results.json. */
export function computeProject(model: Model, inputs: readonly InputFileRecord[]): ComputeOutcome {
  const steady: Record<string, SteadyState> = {};
  const analyses: Record<string, DynamicAnalysis> = {};
  const constructions: Record<string, ConstructionResults> = {};
  const checks: CheckResult[] = [];
  const problems: Diagnostic[] = [];
  for (const construction of model.constructions) {
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
    constructions[construction.id] = {
      ...constructionResults(construction, analysis.steady),
      ...constructionDynamicJson(analysis),
    };
    checks.push(...constructionChecksJson(construction.id, analysis));
  }
  if (problems.length > 0) return { ok: false, diagnostics: problems };
  const results: ResultsJson = {
    schema: "fluxnote-results/1",
    tool: { name: "fluxnote", version: TOOL_VERSION },
    inputs: { files: inputs, sha256: inputsHash(inputs) },
    constructions,
    scenarios: {},
    checks,
    assumptions: model.assumptions.map((a) => ({ id: a.id, text: a.text, source: a.source, at: a.at })),
    warnings: [],
  };
  return { ok: true, computed: { results, steady, analyses } };
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
