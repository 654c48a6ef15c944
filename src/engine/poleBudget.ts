import type { ConstructionInput } from "./layer.ts";

/**
 * Most poles the engine computes for one construction. A homogeneous layer has about L·√(β_max/α)/π poles
 * below β_max (its eigenvalues are α(nπ/L)², Carslaw & Jaeger); with β_max = 40/Δ a 1 m earth wall at
 * Δ = 10 min needs about 120 and heavy multilayer walls a few hundred, so this budget only stops layers no real construction has (metres of a
 * super-insulating material), which would otherwise keep the engine busy for minutes.
 */
export const MAX_POLES = 2000;

/** Estimated number of poles with β Δ ≤ 40 (all layers, air to air), and the layer that contributes most. */
export function estimatedPoles(
  input: ConstructionInput,
  timestepS: number,
): { count: number; worstLayer: number } {
  const betaMax = 40 / timestepS;
  let count = 0;
  let worst = -1;
  let worstCount = 0;
  input.layers.forEach((layer, index) => {
    if (layer.kind !== "massive") return;
    const diffusivity = layer.conductivity / (layer.density * layer.specificHeat);
    const n = (layer.thicknessM * Math.sqrt(betaMax / diffusivity)) / Math.PI;
    count += n;
    if (n > worstCount) {
      worstCount = n;
      worst = index;
    }
  });
  return { count: Math.ceil(count), worstLayer: worst };
}
