import type { ConstructionInput, Layer } from "./layer.ts";
import { type Unresolvable, unresolvable } from "./engineError.ts";

/** One conduction element of a chain, outside to inside: a massive layer or a massless resistance. */
export type ConductionElement =
  | {
    readonly kind: "massive";
    readonly thicknessM: number;
    /** W/(m K) */
    readonly conductivity: number;
    /** m^2/s */
    readonly diffusivity: number;
    /** m^2 K/W */
    readonly resistance: number;
    /** J/(m^2 K) */
    readonly arealHeatCapacity: number;
  }
  | { readonly kind: "resistive"; readonly resistance: number };

/** Which boundary the chain runs between: the two air nodes (films included) or the two surfaces. */
export type ChainBoundary = "air-to-air" | "surface-to-surface";

/** A validated chain of conduction elements and its total resistance. */
export interface ConductionChain {
  readonly kind: "chain";
  readonly boundary: ChainBoundary;
  readonly elements: readonly ConductionElement[];
  /** m^2 K/W */
  readonly totalResistance: number;
}

function layerElement(layer: Layer, index: number): ConductionElement | Unresolvable {
  switch (layer.kind) {
    case "massive": {
      const { thicknessM, conductivity, density, specificHeat } = layer;
      const values = { thicknessM, conductivity, density, specificHeat };
      for (const [name, value] of Object.entries(values)) {
        if (!Number.isFinite(value) || value <= 0) {
          return unresolvable(
            "invalid-layer",
            `Cannot analyse layer ${index + 1}: ${name} must be a positive finite number, found ${value}`,
          );
        }
      }
      const volumetricHeatCapacity = density * specificHeat;
      return {
        kind: "massive",
        thicknessM,
        conductivity,
        diffusivity: conductivity / volumetricHeatCapacity,
        resistance: thicknessM / conductivity,
        arealHeatCapacity: volumetricHeatCapacity * thicknessM,
      };
    }
    case "resistive":
      if (!Number.isFinite(layer.resistance) || layer.resistance < 0) {
        return unresolvable(
          "invalid-layer",
          `Cannot analyse layer ${
            index + 1
          }: resistance must be a finite number >= 0, found ${layer.resistance}`,
        );
      }
      return { kind: "resistive", resistance: layer.resistance };
  }
}

/** Smallest total resistance analysed, m^2 K/W (below it U overflows or loses all digits). */
export const MIN_RESISTANCE = 1e-9;

/** Validates a construction and builds its conduction chain for the given boundary. */
export function conductionChain(
  input: ConstructionInput,
  boundary: ChainBoundary,
): ConductionChain | Unresolvable {
  if (input.layers.length === 0) {
    return unresolvable("no-layers", "Cannot analyse construction: it has no layers");
  }
  for (
    const [name, value] of [["outside", input.outsideResistance], ["inside", input.insideResistance]] as const
  ) {
    if (!Number.isFinite(value) || value < 0) {
      return unresolvable(
        "invalid-surface-resistance",
        `Cannot analyse construction: ${name} surface resistance must be a finite number >= 0, found ${value}`,
      );
    }
  }
  const elements: ConductionElement[] = [];
  if (boundary === "air-to-air" && input.outsideResistance > 0) {
    elements.push({ kind: "resistive", resistance: input.outsideResistance });
  }
  for (const [index, layer] of input.layers.entries()) {
    const element = layerElement(layer, index);
    if (element.kind === "unresolvable") return element;
    elements.push(element);
  }
  if (boundary === "air-to-air" && input.insideResistance > 0) {
    elements.push({ kind: "resistive", resistance: input.insideResistance });
  }
  const totalResistance = elements.reduce((sum, e) => sum + e.resistance, 0);
  if (!(totalResistance >= MIN_RESISTANCE)) {
    return unresolvable(
      "zero-resistance",
      `Cannot analyse construction ${boundary}: total thermal resistance is ${totalResistance} m^2 K/W, expected at least ${MIN_RESISTANCE}`,
    );
  }
  return { kind: "chain", boundary, elements, totalResistance };
}
