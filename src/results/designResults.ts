/**
 * Design figures of a construction added to results.json under new keys: the combined method of a bridged
 * layer (`combinedMethod`), user corrections (`corrections`, `correctedU`), the temperature factor
 * (`temperatureFactor`, f_Rsi with the moisture R_si of ISO 13788 given in `temperatureFactorRsi`) and the code
 * limits with pass/fail (`limits`).
 */
import {
  airGapCorrection,
  COMBINED_METHOD_MAX_RATIO,
  COMBINED_METHOD_SOURCE,
  temperatureFactor,
} from "../engine/bridgedLayer.ts";
import { layerResistance } from "../engine/steady.ts";
import { evaluateBridged } from "../project/bridgedLayers.ts";
import type { Assumption, Construction, LimitSpec } from "../project/model.ts";
import { formatPosition } from "../project/position.ts";
import { bridgedAssumption, correctionAssumption } from "./designAssumptions.ts";
import { evaluateLimits, type LimitResult } from "./limitResults.ts";
import type { MoistureResistance } from "./moistureResistance.ts";
import { ISO13788_INSIDE_SURFACE_RESISTANCE } from "../scenarios/iso13788.ts";
import type { CheckResult, ConstructionResults } from "./types.ts";

/** Relative tolerance within which the equivalent layer must reproduce the combined method's R_T. */
export const EQUIVALENT_LAYER_TOLERANCE = 1e-9;

/** `constructions.<id>.combinedMethod` in results.json (SI; R in m^2 K/W). */
export interface CombinedMethodJson {
  /** 0-based index of the bridged layer, outside to inside. */
  readonly layer: number;
  readonly layerName: string;
  readonly thickness: number;
  readonly paths: readonly {
    readonly material: string;
    readonly fraction: number;
    readonly conductivity: number;
    readonly layerR: number;
    readonly R: number;
  }[];
  readonly upperR: number;
  readonly lowerConductivity: number;
  readonly lowerR: number;
  readonly R: number;
  readonly relativeError: number;
  readonly ratio: number;
  readonly ratioLimit: number;
  readonly applicable: boolean;
  readonly equivalentLayer: {
    readonly conductivity: number;
    readonly density: number;
    readonly specificHeat: number;
    readonly arealHeatCapacity: number;
  };
  readonly source: string;
}

/** `constructions.<id>.corrections` in results.json: ΔU per layer and in total, W/(m^2 K). */
export interface CorrectionsJson {
  readonly layers: readonly {
    readonly layer: number;
    readonly fasteners: number | null;
    readonly airGaps: { readonly level: number; readonly deltaU2: number; readonly deltaU: number } | null;
    readonly source: string;
    readonly at: string;
  }[];
  readonly deltaU: number;
}

/** The new keys of one construction plus the checks and assumptions they bring. */
export interface DesignParts {
  readonly keys: {
    readonly combinedMethod?: CombinedMethodJson;
    readonly corrections?: CorrectionsJson;
    readonly correctedU: number;
    /** f_Rsi = 1 − R_si/R_T with R_si = `temperatureFactorRsi` in place of the construction's own R_si */
    readonly temperatureFactor: number;
    /** m²·K/W, the moisture inside surface resistance used for `temperatureFactor` (ISO 13788 default 0.25) */
    readonly temperatureFactorRsi: number;
    readonly limits: readonly LimitResult[];
  };
  readonly checks: readonly CheckResult[];
  readonly assumptions: readonly Assumption[];
  readonly warnings: readonly { readonly at: string; readonly message: string }[];
}

/** Computes the design keys of a construction from its resolved input and its steady/dynamic results. */
export function designResults(
  construction: Construction,
  results: ConstructionResults,
  limits: readonly LimitSpec[],
  moisture: MoistureResistance = {
    value: ISO13788_INSIDE_SURFACE_RESISTANCE,
    scenarios: [],
    mostOnerous: false,
  },
): DesignParts {
  const checks: CheckResult[] = [];
  const assumptions: Assumption[] = [];
  const warnings: { at: string; message: string }[] = [];
  const evaluation = evaluateBridged(construction);
  let combinedMethodJson: CombinedMethodJson | undefined;
  if (evaluation !== undefined) {
    const { result, equivalent, bridge, index } = evaluation;
    const layer = construction.layers[index]!;
    combinedMethodJson = {
      layer: index,
      layerName: layer.name,
      thickness: evaluation.input.thicknessM,
      paths: [bridge.base, bridge.bridge].map((c, i) => ({
        material: c.materialId ?? c.name,
        fraction: evaluation.input.sections[i]?.fraction ?? NaN,
        conductivity: c.conductivity,
        layerR: result.paths[i]?.layerR ?? NaN,
        R: result.paths[i]?.R ?? NaN,
      })),
      upperR: result.upperR,
      lowerConductivity: result.lowerConductivity,
      lowerR: result.lowerR,
      R: result.R,
      relativeError: result.relativeError,
      ratio: result.ratio,
      ratioLimit: COMBINED_METHOD_MAX_RATIO,
      applicable: result.applicable,
      equivalentLayer: { ...equivalent },
      source: COMBINED_METHOD_SOURCE,
    };
    checks.push({
      id: "equivalent-layer-R",
      subject: `construction:${construction.id}`,
      description:
        "The equivalent homogeneous layer reproduces R_T of the ISO 6946 combined method: |R − R_T| / R_T",
      value: Math.abs(results.R - result.R) / result.R,
      limit: EQUIVALENT_LAYER_TOLERANCE,
      pass: Math.abs(results.R - result.R) / result.R <= EQUIVALENT_LAYER_TOLERANCE,
    });
    assumptions.push(bridgedAssumption(construction, evaluation));
    if (!result.applicable) {
      warnings.push({
        at: formatPosition(bridge.at),
        message: `${construction.id}: the ISO 6946 combined method does not apply (R'_T/R''_T = ${
          result.ratio.toPrecision(3)
        } > ${COMBINED_METHOD_MAX_RATIO}); U is indicative only`,
      });
    }
  }
  const corrections = correctionsOf(construction, results.R);
  if (corrections !== undefined) assumptions.push(correctionAssumption(construction, corrections, results.U));
  const correctedU = results.U + (corrections?.deltaU ?? 0);
  // U with the moisture R_si in place of the construction's own: the U of R_T' = 1/U − R_si,own + R_si,moist.
  const rsi = moisture.value;
  const fRsi = temperatureFactor(1 / (1 / results.U - construction.insideResistance + rsi), rsi);
  if (moisture.mostOnerous) {
    assumptions.push({
      id: `temperature-factor-rsi:${construction.id}`,
      text:
        `f_Rsi of ${construction.id} uses R_si = ${rsi} m²·K/W, the largest inside surface resistance of ` +
        `the heating scenarios that include it (${
          moisture.scenarios.join(", ")
        }), so any limit on it is judged ` +
        "at the most onerous of them; each heating table uses its own",
      source: "ISO 13788:2012, clause 4, internal surface resistance for opaque elements (from memory)",
      at: formatPosition(construction.at),
    });
  }
  return {
    keys: {
      ...(combinedMethodJson === undefined ? {} : { combinedMethod: combinedMethodJson }),
      ...(corrections === undefined ? {} : { corrections }),
      correctedU,
      temperatureFactor: fRsi,
      temperatureFactorRsi: rsi,
      limits: evaluateLimits(construction.id, limits, { ...results, correctedU, temperatureFactor: fRsi }),
    },
    checks,
    assumptions,
    warnings,
  };
}

function correctionsOf(construction: Construction, totalR: number): CorrectionsJson | undefined {
  const layers: CorrectionsJson["layers"][number][] = [];
  construction.layers.forEach((layer, index) => {
    const c = layer.corrections;
    if (c === undefined) return;
    const airGaps = c.airGaps === undefined ? null : {
      level: c.airGaps.level,
      deltaU2: c.airGaps.deltaU2,
      deltaU: airGapCorrection(c.airGaps.deltaU2, layerResistance(layer), totalR),
    };
    layers.push({
      layer: index,
      fasteners: c.fastenersDeltaU ?? null,
      airGaps,
      source: c.source,
      at: formatPosition(c.at),
    });
  });
  if (layers.length === 0) return undefined;
  const deltaU = layers.reduce((sum, l) => sum + (l.fasteners ?? 0) + (l.airGaps?.deltaU ?? 0), 0);
  return { layers, deltaU };
}
