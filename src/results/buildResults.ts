import { inputsHash } from "../archive/hash.ts";
import { type SteadyState, steadyState } from "../engine/steady.ts";
import type { Construction, Model } from "../project/model.ts";
import { TOOL_VERSION } from "../version.ts";
import type { ConstructionResults, InputFileRecord, LayerResult, ResultsJson } from "./types.ts";

/** The computed results of a project, before rendering. */
export interface ComputedProject {
  readonly results: ResultsJson;
  readonly steady: Readonly<Record<string, SteadyState>>;
}

/** Computes every construction's steady state and assembles results.json. */
export function computeProject(model: Model, inputs: readonly InputFileRecord[]): ComputedProject {
  const steady: Record<string, SteadyState> = {};
  const constructions: Record<string, ConstructionResults> = {};
  for (const construction of model.constructions) {
    const result = steadyState(construction);
    steady[construction.id] = result;
    constructions[construction.id] = constructionResults(construction, result);
  }
  const results: ResultsJson = {
    schema: "fluxnote-results/1",
    tool: { name: "fluxnote", version: TOOL_VERSION },
    inputs: { files: inputs, sha256: inputsHash(inputs) },
    constructions,
    scenarios: {},
    checks: [],
    assumptions: model.assumptions.map((a) => ({ id: a.id, text: a.text, source: a.source, at: a.at })),
    warnings: [],
  };
  return { results, steady };
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
