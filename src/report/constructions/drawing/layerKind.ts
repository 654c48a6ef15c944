/** Classifies a resolved layer into the material family its section hatch is drawn with. */
import type { ResolvedLayer } from "../../../project/model.ts";
import { findLibraryMaterial } from "../../../materials/library.ts";

/** The drafting family of a layer: decides its hatch pattern in the section drawing. */
export type LayerKind =
  | "insulation"
  | "masonry"
  | "concrete"
  | "plaster"
  | "timber"
  | "board"
  | "membrane"
  | "metal"
  | "air";

/** Key text of each family. */
export const LAYER_KIND_LABEL: Readonly<Record<LayerKind, string>> = {
  insulation: "insulation",
  masonry: "masonry",
  concrete: "concrete",
  plaster: "plaster, render",
  timber: "timber",
  board: "board",
  membrane: "membrane",
  metal: "metal",
  air: "air layer",
};

/** Family of each library material class (src/materials/classes.ts). */
const CLASS_KIND: Readonly<Record<string, LayerKind>> = {
  "dense-concrete": "concrete",
  "lightweight-concrete": "concrete",
  "aerated-concrete": "concrete",
  "clay-masonry": "masonry",
  "concrete-block": "masonry",
  "natural-stone": "masonry",
  "ceramic-tile": "masonry",
  "earth": "masonry",
  "soil": "masonry",
  "gypsum-board": "board",
  "wood-based-board": "board",
  "carpet-linoleum": "board",
  "glass": "board",
  "gypsum-plaster": "plaster",
  "lime-plaster": "plaster",
  "cement-mortar": "plaster",
  "softwood": "timber",
  "hardwood": "timber",
  "mineral-wool": "insulation",
  "polystyrene": "insulation",
  "polyurethane-phenolic": "insulation",
  "cellular-glass": "insulation",
  "steel": "metal",
  "stainless-steel": "metal",
  "aluminium": "metal",
  "copper": "metal",
  "zinc": "metal",
  "lead": "metal",
  "bitumen-asphalt": "membrane",
  "plastics-rubber": "membrane",
  "air-layer": "air",
};

/** Thickness up to which a non-insulating layer without a known class is drawn as a membrane, m. */
const MEMBRANE_MAX_M = 0.005;

/** The family of a material given by its library class, properties and name. */
export function materialKind(
  m: {
    readonly materialId?: string;
    readonly name: string;
    readonly conductivity: number;
    readonly density: number;
  },
  thicknessM: number,
): LayerKind {
  const cls = m.materialId === undefined ? undefined : findLibraryMaterial(m.materialId)?.materialClass;
  const byClass = cls === undefined ? undefined : CLASS_KIND[cls];
  if (byClass !== undefined) return byClass;
  if (m.conductivity >= 10) return "metal";
  if (m.conductivity <= 0.07) return "insulation";
  if (thicknessM <= MEMBRANE_MAX_M) return "membrane";
  if (/render|plaster/i.test(m.name)) return "plaster";
  if (/timber|softwood|hardwood/i.test(m.name)) return "timber";
  if (m.density >= 1800) return "concrete";
  if (m.density >= 1200) return "masonry";
  return "board";
}

/**
 * Chooses the family: a resistive layer is air; otherwise the library class of the material decides, and
 * without one its properties (λ ≥ 10 W/(m·K) metal, λ ≤ 0.07 W/(m·K) insulation, ≤ 5 mm membrane,
 * ρ ≥ 1800 kg/m³ concrete, ρ ≥ 1200 kg/m³ masonry, otherwise board).
 */
export function layerKind(layer: ResolvedLayer): LayerKind {
  if (layer.kind === "resistive") return "air";
  const base = layer.bridge?.base;
  if (base !== undefined) return materialKind(base, layer.thicknessM);
  return materialKind(layer, layer.thicknessM);
}
