import type { LibraryMaterial } from "./libraryMaterial.ts";

/** Concretes, masonry units, natural stone and earth of the built-in library, SI values with sources. */
export const MASONRY_MATERIALS: readonly LibraryMaterial[] = [
  {
    id: "concrete-2000",
    name: "Concrete, medium density, 2000 kg/m3",
    materialClass: "dense-concrete",
    conductivity: 1.35,
    density: 2000,
    specificHeat: 1000,
    source: 'from memory (believed ISO 10456:2007, Table 3, row "concrete, medium density, 2000 kg/m3")',
  },
  {
    id: "concrete-2200",
    name: "Concrete, medium density, 2200 kg/m3",
    materialClass: "dense-concrete",
    conductivity: 1.65,
    density: 2200,
    specificHeat: 1000,
    source: 'from memory (believed ISO 10456:2007, Table 3, row "concrete, medium density, 2200 kg/m3")',
  },
  {
    id: "concrete-2400",
    name: "Concrete, high density, 2400 kg/m3",
    materialClass: "dense-concrete",
    conductivity: 2.0,
    density: 2400,
    specificHeat: 1000,
    source: 'from memory (believed ISO 10456:2007, Table 3, row "concrete, high density, 2400 kg/m3")',
  },
  {
    id: "concrete-reinforced-2300",
    name: "Reinforced concrete, 1 % steel, 2300 kg/m3",
    materialClass: "dense-concrete",
    conductivity: 2.3,
    density: 2300,
    specificHeat: 1000,
    source: 'from memory (believed ISO 10456:2007, Table 3, row "reinforced concrete, 1 % steel")',
  },
  {
    id: "concrete-lightweight-aggregate-1280",
    name: "Lightweight-aggregate concrete, 1280 kg/m3",
    materialClass: "lightweight-concrete",
    conductivity: 0.53,
    density: 1280,
    specificHeat: 840,
    source: "from memory (believed ASHRAE Handbook—Fundamentals 2005, Ch. 30, Table 19, " +
      'layer "lightweight concrete")',
  },
  {
    id: "aerated-concrete-600",
    name: "Autoclaved aerated concrete block, 600 kg/m3",
    materialClass: "aerated-concrete",
    conductivity: 0.16,
    density: 600,
    specificHeat: 1000,
    source: "from memory (typical design value for 600 kg/m3 autoclaved aerated concrete blocks, " +
      "EN 771-4 products; no table row checked: confirm against the product declaration)",
  },
  {
    id: "clay-brick-outer-leaf-1700",
    name: "Clay brickwork, exposed (outer leaf), 1700 kg/m3",
    materialClass: "clay-masonry",
    conductivity: 0.77,
    density: 1700,
    specificHeat: 1000,
    source: 'from memory (believed CIBSE Guide A (2006), Table 3.38 "inorganic porous materials", ' +
      'row "brickwork, outer leaf")',
  },
  {
    id: "clay-brick-inner-leaf-1700",
    name: "Clay brickwork, protected (inner leaf), 1700 kg/m3",
    materialClass: "clay-masonry",
    conductivity: 0.56,
    density: 1700,
    specificHeat: 1000,
    source: 'from memory (believed CIBSE Guide A (2006), Table 3.38 "inorganic porous materials", ' +
      'row "brickwork, inner leaf")',
  },
  {
    id: "clay-brick-perforated-1100",
    name: "Perforated clay block, 1100 kg/m3 gross",
    materialClass: "clay-masonry",
    conductivity: 0.4,
    density: 1100,
    specificHeat: 1000,
    source: "from memory (typical design value of vertically perforated clay blocks, EN 771-1 products; " +
      "no table row checked: confirm against the product declaration)",
  },
  {
    id: "concrete-block-medium-1400",
    name: "Concrete block, medium density, 1400 kg/m3",
    materialClass: "concrete-block",
    conductivity: 0.51,
    density: 1400,
    specificHeat: 1000,
    source: 'from memory (believed CIBSE Guide A (2006), Table 3.38 "inorganic porous materials", row ' +
      '"concrete block (medium weight)"; no table row checked: confirm against the product declaration)',
  },
  {
    id: "concrete-block-dense-2000",
    name: "Concrete block, dense aggregate, 2000 kg/m3",
    materialClass: "concrete-block",
    conductivity: 1.13,
    density: 2000,
    specificHeat: 1000,
    source: "from memory (typical design value of dense-aggregate concrete blocks; no table row checked: " +
      "confirm against the product declaration)",
  },
  {
    id: "stone-limestone-hard-2200",
    name: "Limestone, hard, 2200 kg/m3",
    materialClass: "natural-stone",
    conductivity: 1.7,
    density: 2200,
    specificHeat: 1000,
    source: 'from memory (believed ISO 10456:2007, Table 3, row "limestone, hard")',
  },
  {
    id: "stone-granite-2600",
    name: "Granite, 2600 kg/m3",
    materialClass: "natural-stone",
    conductivity: 2.8,
    density: 2600,
    specificHeat: 1000,
    source: 'from memory (believed ISO 10456:2007, Table 3, row "granite", density 2500–2700 kg/m3)',
  },
  {
    id: "stone-sandstone-2600",
    name: "Sandstone (silica), 2600 kg/m3",
    materialClass: "natural-stone",
    conductivity: 2.3,
    density: 2600,
    specificHeat: 1000,
    source: 'from memory (believed ISO 10456:2007, Table 3, row "sandstone (silica)")',
  },
  {
    id: "rammed-earth-1900",
    name: "Rammed earth with fibre, 1900 kg/m3",
    materialClass: "earth",
    conductivity: 0.96,
    density: 1900,
    specificHeat: 1000,
    source:
      "conductivity and specific heat: B. Berge, The Ecology of Building Materials (edition not checked), " +
      'Table 14.15, row "earth (pisé and adobe), with fibre 10 kg/m3", read in a secondary copy; ' +
      "density from memory (typical rammed earth), no source",
  },
];
