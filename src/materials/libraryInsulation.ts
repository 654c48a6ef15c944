import type { LibraryMaterial } from "./libraryMaterial.ts";

const DECLARED_NOTE = "insulation products are normally taken from the manufacturer's declared value; " +
  "override with a project material when the product is known";

/** Thermal insulation materials of the built-in library, SI values with sources. */
export const INSULATION_MATERIALS: readonly LibraryMaterial[] = [
  {
    id: "mineral-wool-12",
    name: "Glass-wool quilt, 12 kg/m3",
    materialClass: "mineral-wool",
    conductivity: 0.04,
    density: 12,
    specificHeat: 840,
    source: "from memory (believed ASHRAE Handbook—Fundamentals (2017), Ch. 26, Table 1, glass-fibre " +
      "blanket insulation; no table row checked: confirm against the product declaration)",
  },
  {
    id: "mineral-wool-25",
    name: "Glass-wool batt, 25 kg/m3",
    materialClass: "mineral-wool",
    conductivity: 0.035,
    density: 25,
    specificHeat: 1030,
    source: "from memory: conductivity a typical declared value for 25 kg/m3 glass-wool batts (EN 13162), " +
      "no table row; specific heat believed ISO 10456:2007, Table 4, mineral wool; " + DECLARED_NOTE,
  },
  {
    id: "mineral-wool-140",
    name: "Stone-wool roof board, 140 kg/m3",
    materialClass: "mineral-wool",
    conductivity: 0.038,
    density: 140,
    specificHeat: 1030,
    source: "from memory: conductivity a typical declared value for 140 kg/m3 stone-wool roof boards " +
      "(EN 13162), no table row; specific heat believed ISO 10456:2007, Table 4, mineral wool; " +
      DECLARED_NOTE,
  },
  {
    id: "eps-20",
    name: "Expanded polystyrene (EPS) board, 20 kg/m3",
    materialClass: "polystyrene",
    conductivity: 0.036,
    density: 20,
    specificHeat: 1450,
    source: "from memory: conductivity believed within ASHRAE Handbook—Fundamentals 2017, Ch. 26, Table 1, " +
      '"expanded polystyrene, molded beads"; specific heat believed ISO 10456:2007, Table 4, EPS; ' +
      DECLARED_NOTE,
  },
  {
    id: "xps-35",
    name: "Extruded polystyrene (XPS) board, 35 kg/m3",
    materialClass: "polystyrene",
    conductivity: 0.034,
    density: 35,
    specificHeat: 1450,
    source: "from memory: conductivity a typical declared value for XPS boards 80–120 mm thick (EN 13164), " +
      "no table row; specific heat believed ISO 10456:2007, Table 4, XPS; " + DECLARED_NOTE,
  },
  {
    id: "pir-board-45",
    name: "Polyisocyanurate (PIR) foam board, 45 kg/m3",
    materialClass: "polyurethane-phenolic",
    conductivity: 0.03,
    density: 45,
    specificHeat: 1470,
    source: 'CIBSE Guide A, Table 3.37 "non-hygroscopic materials", row "foam — polyisocyanate" ' +
      "(read in a secondary copy of the table; edition believed 2006); conservative against current " +
      "foil-faced boards, " + DECLARED_NOTE,
  },
  {
    id: "phenolic-foam-40",
    name: "Phenolic foam board, closed cell, 40 kg/m3",
    materialClass: "polyurethane-phenolic",
    conductivity: 0.022,
    density: 40,
    specificHeat: 1400,
    source:
      "from memory: conductivity a typical declared value for closed-cell phenolic boards (EN 13166), " +
      "no table row; specific heat believed ISO 10456:2007, Table 4, phenolic foam; " + DECLARED_NOTE,
  },
  {
    id: "cellular-glass-140",
    name: "Cellular glass, 140 kg/m3",
    materialClass: "cellular-glass",
    conductivity: 0.048,
    density: 140,
    specificHeat: 840,
    source: 'CIBSE Guide A, Table 3.36 "impermeable materials", row "glass — cellular sheet" ' +
      "(read in a secondary copy of the table; edition believed 2006)",
  },
];
