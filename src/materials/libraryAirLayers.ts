import type { LibraryMaterial } from "./libraryMaterial.ts";

const AIR_LAYER_TABLE = "from memory (believed ISO 6946:2017, Table 8, thermal resistance of unventilated " +
  "air layers with high-emissivity surfaces; Table 2 in the 2007 edition)";

/** Unventilated air layers of the built-in library, given as thermal resistances by thickness and heat flow. */
export const AIR_LAYER_MATERIALS: readonly LibraryMaterial[] = [
  {
    id: "air-layer-25mm-horizontal",
    name: "Unventilated air layer, 25 mm, horizontal heat flow",
    materialClass: "air-layer",
    resistance: 0.18,
    source: `${AIR_LAYER_TABLE}, row 25 mm, column "horizontal"`,
  },
  {
    id: "air-layer-50mm-horizontal",
    name: "Unventilated air layer, 50 mm, horizontal heat flow",
    materialClass: "air-layer",
    resistance: 0.18,
    source: `${AIR_LAYER_TABLE}, row 50 mm, column "horizontal"`,
  },
  {
    id: "air-layer-25mm-upward",
    name: "Unventilated air layer, 25 mm, upward heat flow",
    materialClass: "air-layer",
    resistance: 0.16,
    source: `${AIR_LAYER_TABLE}, row 25 mm, column "upwards"`,
  },
  {
    id: "air-layer-25mm-downward",
    name: "Unventilated air layer, 25 mm, downward heat flow",
    materialClass: "air-layer",
    resistance: 0.19,
    source: `${AIR_LAYER_TABLE}, row 25 mm, column "downwards"`,
  },
];
