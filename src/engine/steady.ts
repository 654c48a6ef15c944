import type { ConstructionInput, Layer } from "./layer.ts";

/** Steady-state figures of a construction, SI units. */
export interface SteadyState {
  /** Thermal resistance of each layer, m^2 K/W (ISO 6946: R = d/lambda for a homogeneous layer). */
  readonly layerResistances: readonly number[];
  /** Areal heat capacity of each layer, J/(m^2 K): rho c d (0 for a resistive layer). */
  readonly layerArealHeatCapacities: readonly number[];
  /** Sum of layer resistances, surface to surface, m^2 K/W. */
  readonly layersResistance: number;
  /** R_se + layers + R_si, air to air, m^2 K/W. */
  readonly totalResistance: number;
  /** 1 / totalResistance, W/(m^2 K). */
  readonly uValue: number;
  /** 1 / layersResistance, W/(m^2 K). */
  readonly surfaceToSurfaceU: number;
  /** Sum of layer areal heat capacities, J/(m^2 K). */
  readonly arealHeatCapacity: number;
}

/** Thermal resistance of one layer, m^2 K/W. */
export function layerResistance(layer: Layer): number {
  switch (layer.kind) {
    case "massive":
      return layer.thicknessM / layer.conductivity;
    case "resistive":
      return layer.resistance;
  }
}

/** Areal heat capacity of one layer, J/(m^2 K). */
export function layerArealHeatCapacity(layer: Layer): number {
  switch (layer.kind) {
    case "massive":
      return layer.density * layer.specificHeat * layer.thicknessM;
    case "resistive":
      return 0;
  }
}

/** Computes layer resistances, total R and U (ISO 6946 method for homogeneous layers). */
export function steadyState(construction: ConstructionInput): SteadyState {
  const layerResistances = construction.layers.map(layerResistance);
  const layerArealHeatCapacities = construction.layers.map(layerArealHeatCapacity);
  const layersResistance = layerResistances.reduce((a, b) => a + b, 0);
  const totalResistance = construction.outsideResistance + layersResistance + construction.insideResistance;
  return {
    layerResistances,
    layerArealHeatCapacities,
    layersResistance,
    totalResistance,
    uValue: 1 / totalResistance,
    surfaceToSurfaceU: 1 / layersResistance,
    arealHeatCapacity: layerArealHeatCapacities.reduce((a, b) => a + b, 0),
  };
}
