/** Classifies a resolved layer for drawing: insulation, masonry, board, metal, other, or resistive gap. */
import type { ResolvedLayer } from "../project/model.ts";

/** The drawing class of a layer. */
export type LayerKind = "insulation" | "masonry" | "board" | "metal" | "gap";

/** Legend text of each drawing class. */
export const LAYER_KIND_LABEL: Readonly<Record<LayerKind, string>> = {
  insulation: "insulation",
  masonry: "masonry, concrete, render",
  board: "board, timber, light plaster",
  metal: "metal",
  gap: "resistive layer, not to scale",
};

/** Fill colour of each drawing class (plain fills, no hatching). */
export const LAYER_KIND_FILL: Readonly<Record<LayerKind, string>> = {
  insulation: "#f5e79e",
  masonry: "#c4ad98",
  board: "#d3e2c3",
  metal: "#a9b6c4",
  gap: "#ffffff",
};

/**
 * Chooses the class from the layer's properties: resistive → gap; λ ≥ 10 W/(m·K) → metal;
 * λ ≤ 0.07 W/(m·K) → insulation; ρ ≥ 1200 kg/m³ → masonry; otherwise board.
 */
export function layerKind(layer: ResolvedLayer): LayerKind {
  if (layer.kind === "resistive") return "gap";
  if (layer.conductivity >= 10) return "metal";
  if (layer.conductivity <= 0.07) return "insulation";
  if (layer.density >= 1200) return "masonry";
  return "board";
}
