import type { LibraryMaterial } from "./libraryMaterial.ts";

/** Timber and wood-based boards of the built-in library, SI values with sources. */
export const TIMBER_MATERIALS: readonly LibraryMaterial[] = [
  {
    id: "timber-softwood-500",
    name: "Softwood timber, 500 kg/m3",
    materialClass: "softwood",
    conductivity: 0.13,
    density: 500,
    specificHeat: 1600,
    source: 'from memory (believed ISO 10456:2007, Table 3, row "timber, 500 kg/m3"); the same values ' +
      'appear as "softwood 500" in a secondary copy of the prEN 12524 design-value table',
  },
  {
    id: "timber-hardwood-700",
    name: "Hardwood timber, 700 kg/m3",
    materialClass: "hardwood",
    conductivity: 0.18,
    density: 700,
    specificHeat: 1600,
    source: 'from memory (believed ISO 10456:2007, Table 3, row "timber, 700 kg/m3"); the same values ' +
      'appear as "hardwood 700" in a secondary copy of the prEN 12524 design-value table',
  },
  {
    id: "plywood-500",
    name: "Plywood, 500 kg/m3",
    materialClass: "wood-based-board",
    conductivity: 0.13,
    density: 500,
    specificHeat: 1600,
    source: 'from memory (believed ISO 10456:2007, Table 3, row "plywood, 500 kg/m3")',
  },
  {
    id: "osb-650",
    name: "Oriented strand board (OSB), 650 kg/m3",
    materialClass: "wood-based-board",
    conductivity: 0.13,
    density: 650,
    specificHeat: 1700,
    source: 'from memory (believed ISO 10456:2007, Table 3, row "oriented strand board (OSB), 650 kg/m3")',
  },
  {
    id: "wood-fibre-board-250",
    name: "Wood-fibre board, 250 kg/m3",
    materialClass: "wood-based-board",
    conductivity: 0.07,
    density: 250,
    specificHeat: 1700,
    source: 'from memory (believed ISO 10456:2007, Table 3, row "fibreboard, including MDF, 250 kg/m3")',
  },
];
