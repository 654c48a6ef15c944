/**
 * Turns a construction's bridged layer into its equivalent homogeneous layer (ISO 6946:2017 combined method),
 * so every later step (steady state, dynamic response, scenarios) sees one consistent layer.
 */
import {
  combinedMethod,
  type CombinedMethodInput,
  type CombinedMethodResult,
  type EquivalentLayer,
  equivalentLayer,
} from "../engine/bridgedLayer.ts";
import { layerResistance } from "../engine/steady.ts";
import { type Diagnostic, error, warning } from "./diagnostic.ts";
import type { LayerBridge, ResolvedLayer } from "./model.ts";
import { formatPosition } from "./position.ts";

/** The combined method applied to one construction: which layer, its inputs, result and equivalent layer. */
export interface BridgedEvaluation {
  /** Index of the bridged layer (outside to inside, 0-based). */
  readonly index: number;
  readonly bridge: LayerBridge;
  readonly input: CombinedMethodInput;
  readonly result: CombinedMethodResult;
  readonly equivalent: EquivalentLayer;
}

/** Builds the combined-method input of the bridged layer at `index` within the given surface resistances. */
export function combinedInput(
  layers: readonly ResolvedLayer[],
  index: number,
  bridge: LayerBridge,
  thicknessM: number,
  outsideResistance: number,
  insideResistance: number,
): CombinedMethodInput {
  const others = layers.reduce((sum, layer, i) => i === index ? sum : sum + layerResistance(layer), 0);
  return {
    thicknessM,
    otherResistance: outsideResistance + others + insideResistance,
    sections: [
      { fraction: 1 - bridge.fraction, ...properties(bridge.base) },
      { fraction: bridge.fraction, ...properties(bridge.bridge) },
    ],
  };
}

function properties(c: LayerBridge["base"]) {
  return { conductivity: c.conductivity, density: c.density, specificHeat: c.specificHeat };
}

/** Evaluates the combined method for a resolved construction (undefined when no layer is bridged). */
export function evaluateBridged(construction: {
  readonly layers: readonly ResolvedLayer[];
  readonly outsideResistance: number;
  readonly insideResistance: number;
}): BridgedEvaluation | undefined {
  const index = construction.layers.findIndex((l) => l.bridge !== undefined);
  const layer = construction.layers[index];
  if (layer === undefined || layer.bridge === undefined || layer.kind !== "massive") return undefined;
  const input = combinedInput(
    construction.layers,
    index,
    layer.bridge,
    layer.thicknessM,
    construction.outsideResistance,
    construction.insideResistance,
  );
  const result = combinedMethod(input);
  return { index, bridge: layer.bridge, input, result, equivalent: equivalentLayer(input, result) };
}

/**
 * Replaces the bridged layer's values by its equivalent homogeneous layer, computed with the surface
 * resistances the construction will use; reports a second bridged layer (error) and an inapplicable method
 * (warning).
 */
export function applyBridges(
  layers: readonly ResolvedLayer[],
  outsideResistance: number,
  insideResistance: number,
  label: string,
  out: Diagnostic[],
): readonly ResolvedLayer[] {
  const bridged = layers.filter((l) => l.bridge !== undefined);
  if (bridged.length === 0) return layers;
  if (bridged.length > 1) {
    out.push(error(
      bridged[1]?.bridge?.at ?? bridged[1]!.at,
      "several-bridged-layers",
      `Construction "${label}" has ${bridged.length} bridged layers; one is supported (first at ${
        formatPosition(bridged[0]!.at)
      })`,
      "the section geometry of several bridged layers is ambiguous: model the element with one bridged layer, or compute it numerically (ISO 10211) and enter the result",
    ));
    return layers;
  }
  const evaluation = evaluateBridged({ layers, outsideResistance, insideResistance });
  if (evaluation === undefined) return layers;
  const { result, equivalent } = evaluation;
  if (!result.applicable) {
    out.push(warning(
      evaluation.bridge.at,
      "combined-method-not-applicable",
      `The combined method does not apply to "${label}": R'_T/R''_T = ${
        result.ratio.toPrecision(3)
      } exceeds 1.5 (ISO 6946:2017, from memory)`,
      "strong bridges (metal studs) need a numerical calculation to ISO 10211; enter its result as an inline layer",
    ));
  }
  return layers.map((layer, i) =>
    i !== evaluation.index || layer.kind !== "massive" ? layer : {
      ...layer,
      conductivity: equivalent.conductivity,
      density: equivalent.density,
      specificHeat: equivalent.specificHeat,
    }
  );
}
