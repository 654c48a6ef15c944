import type { LibraryMaterial } from "./libraryMaterial.ts";

const PREN12524_NOTE = "the same values appear in a secondary copy of the prEN 12524 design-value table";
const CIBSE_3_36 = 'CIBSE Guide A, Table 3.36 "impermeable materials"';
const CIBSE_COPY = "(read in a secondary copy of the table; edition believed 2006)";

/** Metals, glass, bitumen and roofing membranes of the built-in library, SI values with sources. */
export const METAL_AND_SHEET_MATERIALS: readonly LibraryMaterial[] = [
  {
    id: "steel-carbon",
    name: "Steel (carbon)",
    materialClass: "steel",
    conductivity: 50,
    density: 7800,
    specificHeat: 450,
    source: `from memory (believed ISO 10456:2007, Table 3, row "steel"); ${PREN12524_NOTE}`,
  },
  {
    id: "steel-stainless",
    name: "Stainless steel",
    materialClass: "stainless-steel",
    conductivity: 17,
    density: 7900,
    specificHeat: 460,
    source: `from memory (believed ISO 10456:2007, Table 3, row "stainless steel"); ${PREN12524_NOTE}`,
  },
  {
    id: "aluminium-alloy",
    name: "Aluminium alloy",
    materialClass: "aluminium",
    conductivity: 160,
    density: 2800,
    specificHeat: 880,
    source: `from memory (believed ISO 10456:2007, Table 3, row "aluminium alloys"); ${PREN12524_NOTE}`,
  },
  {
    id: "copper",
    name: "Copper",
    materialClass: "copper",
    conductivity: 380,
    density: 8900,
    specificHeat: 380,
    source: `from memory (believed ISO 10456:2007, Table 3, row "copper"); ${PREN12524_NOTE}`,
  },
  {
    id: "zinc",
    name: "Zinc",
    materialClass: "zinc",
    conductivity: 113,
    density: 7000,
    specificHeat: 390,
    source: `${CIBSE_3_36}, row "metals — zinc" ${CIBSE_COPY}`,
  },
  {
    id: "glass-soda-lime",
    name: "Glass, soda-lime",
    materialClass: "glass",
    conductivity: 1.0,
    density: 2500,
    specificHeat: 750,
    source: `from memory (believed ISO 10456:2007, Table 3, row "glass, soda lime"); ${PREN12524_NOTE}`,
  },
  {
    id: "mastic-asphalt-2330",
    name: "Mastic asphalt, roofing, 2330 kg/m3",
    materialClass: "bitumen-asphalt",
    conductivity: 1.15,
    density: 2330,
    specificHeat: 840,
    source: `${CIBSE_3_36}, row "asphalt — roofing, mastic" ${CIBSE_COPY}`,
  },
  {
    id: "bitumen-roofing-felt",
    name: "Bitumen roofing felt",
    materialClass: "bitumen-asphalt",
    conductivity: 0.19,
    density: 960,
    specificHeat: 840,
    source: `${CIBSE_3_36}, row "roofing felt" ${CIBSE_COPY}`,
  },
  {
    id: "membrane-epdm",
    name: "Roofing membrane, EPDM rubber",
    materialClass: "plastics-rubber",
    conductivity: 0.25,
    density: 1150,
    specificHeat: 1000,
    source: 'from memory (believed ISO 10456:2007, Table 3, rubbers, row "EPDM")',
  },
];
