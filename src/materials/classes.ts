/**
 * Material classes with plausibility envelopes for λ, ρ and c (or R for air layers). The envelopes flag
 * outliers for the reviewer; they are not design values. Each envelope names where it comes from: the bands
 * were compiled from secondary copies of the named handbook tables and from memory, and are marked so.
 */

import type { MassiveMaterialClass, MaterialClass } from "./materialClass.ts";

export type {
  MassiveMaterialClass,
  MaterialClass,
  ResistiveMaterialClass,
  ValueRange,
} from "./materialClass.ts";
export { isWithinRange } from "./materialClass.ts";

const SECONDARY = "envelope compiled from secondary copies of";
const MEMORY = "from memory";

function massive(
  id: string,
  name: string,
  conductivity: readonly [number, number],
  density: readonly [number, number],
  specificHeat: readonly [number, number],
  source: string,
): MassiveMaterialClass {
  return {
    kind: "massive",
    id,
    name,
    conductivity: { min: conductivity[0], max: conductivity[1] },
    density: { min: density[0], max: density[1] },
    specificHeat: { min: specificHeat[0], max: specificHeat[1] },
    source,
  };
}

const RENDER_SOURCE =
  `${SECONDARY} a "building physics key figures" data sheet and B. Berge, The Ecology of ` +
  "Building Materials, Table 14.15; density and specific heat bands shared by all plasters and renders";

/** All material classes known to the library, with their envelopes and sources. */
export const MATERIAL_CLASSES: readonly MaterialClass[] = [
  massive(
    "dense-concrete",
    "Dense concrete",
    [1.1, 2.5],
    [2000, 2500],
    [840, 1100],
    `${SECONDARY} ASHRAE Handbook—Fundamentals 2005 Ch. 30 Table 19 and a prEN 12524 design-value table; ISO 10456:2007 Table 3 concrete ladder ${MEMORY}`,
  ),
  massive(
    "lightweight-concrete",
    "Lightweight-aggregate concrete",
    [0.3, 1.0],
    [1000, 1800],
    [840, 1000],
    `${SECONDARY} ASHRAE Handbook—Fundamentals 2005 Ch. 30 Table 19`,
  ),
  massive(
    "aerated-concrete",
    "Aerated (cellular) concrete",
    [0.08, 0.25],
    [300, 800],
    [840, 1100],
    `${SECONDARY} a trade reference page on thermal conductivity (aerated 0.16 W/(m K); cellular 400 kg/m3 0.10); c band ${MEMORY}`,
  ),
  massive(
    "clay-masonry",
    "Clay brick, block and tile",
    [0.3, 1.3],
    [800, 2100],
    [790, 1000],
    `${SECONDARY} ASHRAE Handbook—Fundamentals 2005 Ch. 30 Table 19 and B. Berge, The Ecology of Building Materials, Table 14.15`,
  ),
  massive(
    "concrete-block",
    "Concrete block",
    [0.2, 1.7],
    [600, 2200],
    [840, 1000],
    `${MEMORY} (light to dense blocks; ANSI/ASHRAE Standard 140 case 900 block)`,
  ),
  massive(
    "natural-stone",
    "Natural stone",
    [1.1, 3.5],
    [1600, 2900],
    [750, 1000],
    `${SECONDARY} B. Berge, The Ecology of Building Materials, Table 14.15 and a key-figures data sheet`,
  ),
  massive(
    "gypsum-board",
    "Gypsum plasterboard",
    [0.15, 0.26],
    [600, 1000],
    [840, 1100],
    `${SECONDARY} ASHRAE Handbook—Fundamentals 2005 Ch. 30 Table 19 and a plasterboard data sheet citing ISO 10456`,
  ),
  massive("gypsum-plaster", "Gypsum plaster", [0.18, 0.7], [200, 2100], [840, 1120], RENDER_SOURCE),
  massive("lime-plaster", "Lime plaster and render", [0.7, 0.9], [200, 2100], [840, 1120], RENDER_SOURCE),
  massive(
    "cement-mortar",
    "Cement render, mortar and screed",
    [0.8, 1.4],
    [200, 2100],
    [840, 1120],
    RENDER_SOURCE,
  ),
  massive(
    "softwood",
    "Softwood timber",
    [0.1, 0.15],
    [400, 800],
    [1200, 2800],
    `${SECONDARY} a prEN 12524 design-value table; c band spans sources that disagree (1600 vs 2600 J/(kg K))`,
  ),
  massive(
    "hardwood",
    "Hardwood timber",
    [0.15, 0.22],
    [400, 800],
    [1200, 2800],
    `${SECONDARY} a prEN 12524 design-value table; c band as for softwood`,
  ),
  massive("wood-based-board", "Wood-based boards (plywood, OSB, fibreboard)", [0.04, 0.18], [150, 1000], [
    1300,
    1700,
  ], `${MEMORY} (believed ISO 10456:2007 Table 3 wood-based panels)`),
  massive(
    "mineral-wool",
    "Mineral wool (glass or stone)",
    [0.03, 0.045],
    [10, 200],
    [800, 1030],
    `${MEMORY} (ANSI/ASHRAE Standard 140 fibreglass quilt; believed ASHRAE Handbook—Fundamentals 2017 Ch. 26 Table 1)`,
  ),
  massive(
    "polystyrene",
    "Expanded and extruded polystyrene",
    [0.029, 0.04],
    [10, 45],
    [1200, 1500],
    `${SECONDARY} ASHRAE Handbook—Fundamentals 2005 Ch. 30 Table 19`,
  ),
  massive(
    "polyurethane-phenolic",
    "PUR, PIR and phenolic foam",
    [0.018, 0.03],
    [30, 120],
    [1400, 1500],
    `${SECONDARY} CIBSE Guide A Table 3.37 (λ band lowered to current boards ${MEMORY})`,
  ),
  massive(
    "cellular-glass",
    "Cellular glass",
    [0.036, 0.056],
    [100, 165],
    [750, 840],
    `${SECONDARY} CIBSE Guide A Table 3.36`,
  ),
  massive(
    "steel",
    "Carbon steel",
    [45, 60],
    [7800, 8000],
    [450, 500],
    `${SECONDARY} CIBSE Guide A Table 3.36 and a prEN 12524 design-value table`,
  ),
  massive(
    "stainless-steel",
    "Stainless steel",
    [15, 17],
    [7800, 8000],
    [450, 500],
    `${SECONDARY} CIBSE Guide A Table 3.36 and a prEN 12524 design-value table`,
  ),
  massive(
    "aluminium",
    "Aluminium and its alloys",
    [160, 237],
    [2700, 2800],
    [880, 900],
    `${SECONDARY} CIBSE Guide A Table 3.36 and a prEN 12524 design-value table`,
  ),
  massive(
    "copper",
    "Copper",
    [380, 390],
    [8600, 8900],
    [380, 390],
    `${SECONDARY} CIBSE Guide A Table 3.36 and a prEN 12524 design-value table`,
  ),
  massive(
    "zinc",
    "Zinc",
    [110, 113],
    [7000, 7200],
    [380, 390],
    `${SECONDARY} CIBSE Guide A Table 3.36; c 380 ${MEMORY} (believed ISO 10456:2007 Table 3)`,
  ),
  massive("lead", "Lead", [35, 35], [11340, 11340], [130, 130], `${SECONDARY} CIBSE Guide A Table 3.36`),
  massive(
    "glass",
    "Glass, soda-lime",
    [0.8, 1.05],
    [2500, 2500],
    [720, 840],
    `${SECONDARY} CIBSE Guide A Table 3.36 and a prEN 12524 design-value table`,
  ),
  massive(
    "bitumen-asphalt",
    "Asphalt, bitumen and roofing felt",
    [0.15, 1.2],
    [960, 2400],
    [840, 1700],
    `${SECONDARY} CIBSE Guide A Table 3.36`,
  ),
  massive("plastics-rubber", "Plastics and rubbers (PVC, EPDM, PA, PMMA, PC)", [0.15, 0.3], [1050, 1500], [
    900,
    1600,
  ], `${SECONDARY} CIBSE Guide A Table 3.36 and a prEN 12524 design-value table`),
  massive(
    "ceramic-tile",
    "Ceramic tile",
    [1.0, 1.4],
    [2000, 2500],
    [840, 840],
    `${SECONDARY} CIBSE Guide A Table 3.36`,
  ),
  massive(
    "carpet-linoleum",
    "Carpet and linoleum",
    [0.06, 0.19],
    [160, 1200],
    [1360, 2500],
    `${SECONDARY} CIBSE Guide A Tables 3.36–3.37`,
  ),
  massive(
    "earth",
    "Earth and rammed earth",
    [0.4, 1.2],
    [1500, 2100],
    [1000, 1050],
    `${SECONDARY} B. Berge, The Ecology of Building Materials, Table 14.15; density band ${MEMORY}`,
  ),
  massive(
    "soil",
    "Soil (ground)",
    [0.5, 3.5],
    [1200, 2200],
    [800, 1500],
    `${MEMORY} (believed ISO 13370:2017 Table 7 ground properties)`,
  ),
  {
    kind: "resistive",
    id: "air-layer",
    name: "Unventilated air layer, high-emissivity faces",
    resistance: { min: 0, max: 0.23 },
    source:
      `${MEMORY} (believed ISO 6946:2017 Table 8, unventilated air layers; low-emissivity faces can reach about 0.6–0.8 m^2 K/W and need their own calculation)`,
  },
];

const BY_ID: ReadonlyMap<string, MaterialClass> = new Map(MATERIAL_CLASSES.map((c) => [c.id, c]));

/** Returns the material class with this id, or undefined when there is none. */
export function findMaterialClass(id: string): MaterialClass | undefined {
  return BY_ID.get(id);
}
