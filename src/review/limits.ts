/**
 * Every threshold the review rules use, each with its unit and where it comes from: a document, edition
 * and table (marked "secondary copy" when read in a copy), "from memory", "computed" for a closed form, or
 * "common practice, no source".
 */

/** A single limit with its unit and source. */
export interface Limit {
  readonly value: number;
  readonly unit: string;
  readonly source: string;
}

function limit(value: number, unit: string, source: string): Limit {
  return { value, unit, source };
}

const CIBSE_METALS = "CIBSE Guide A (2006) Table 3.36 (secondary copy)";

/** Global hard limits: values no building material reaches. */
export const HARD = {
  maxConductivity: limit(
    450,
    "W/(m·K)",
    `set just above copper, 380–390 W/(m·K), the most conductive building metal in ${CIBSE_METALS}`,
  ),
  maxDensity: limit(
    11500,
    "kg/m³",
    `set just above lead, 11 340 kg/m³, the densest material in ${CIBSE_METALS}`,
  ),
  minSpecificHeat: limit(
    100,
    "J/(kg·K)",
    `set just below lead, 130 J/(kg·K), the lowest specific heat in ${CIBSE_METALS}`,
  ),
} as const;

/** Unit-slip detectors. */
export const SLIP = {
  /** A specific heat at or below this is a value in kJ/(kg·K) written as J/(kg·K). */
  kilojouleSpecificHeat: limit(
    10,
    "J/(kg·K)",
    "common practice, no source: building materials have 0.13–4.2 kJ/(kg·K) (lead to water, from memory), so a value ≤ 10 is a kJ figure",
  ),
  maxSpecificHeat: limit(
    5000,
    "J/(kg·K)",
    "from memory: liquid water, 4190 J/(kg·K), is above every solid building material",
  ),
  /** kg/m³ per lb/ft³: 0.45359237 kg / 0.3048³ m³ (exact definitions, computed). */
  poundPerCubicFoot: limit(
    16.018463,
    "kg/m³ per lb/ft³",
    "computed from 1 lb = 0.45359237 kg, 1 ft = 0.3048 m",
  ),
  minMasonryThickness: limit(
    0.005,
    "m",
    "common practice, no source: the thinnest masonry units, concrete toppings and stone slips are over 10 mm",
  ),
  maxLayerResistance: limit(
    10,
    "m²·K/W",
    "common practice, no source: 300 mm of 0.030 W/(m·K) insulation is R = 10; more in one layer suggests an IP R-value or a mm/m slip",
  ),
} as const;

/** The lowest conductivity of a gas-filled (non-vacuum, non-aerogel) insulation. */
export const INSULATION_FLOOR = limit(
  0.018,
  "W/(m·K)",
  "lower bound of the PUR/PIR/phenolic class: CIBSE Guide A (2006) Table 3.37 (secondary copy), lowered to current foil-faced boards from memory; only vacuum panels (0.004–0.010) and aerogels (0.013–0.020) go lower (from memory)",
);

/** Below this conductivity a layer counts as insulation for the layer-order rules. */
export const INSULATION_MAX_CONDUCTIVITY = limit(
  0.065,
  "W/(m·K)",
  "from memory: the usual threshold for calling a material thermal insulation",
);

const MINERAL_SOURCE =
  "from memory: λ of porous mineral materials rises with ρ (ISO 10456:2007 Table 3 concrete ladder, 2000 kg/m³ → 1.35 W/(m·K)); aerated concrete up to 800 kg/m³ has ≤ 0.25 W/(m·K) (CIBSE Guide A Table 3.36, secondary copy)";

/** λ–ρ consistency for mineral materials. */
export const MINERAL = {
  lightDensity: limit(1200, "kg/m³", MINERAL_SOURCE),
  lightMaxConductivity: limit(1.0, "W/(m·K)", MINERAL_SOURCE),
  denseDensity: limit(2000, "kg/m³", MINERAL_SOURCE),
  denseMinConductivity: limit(0.5, "W/(m·K)", MINERAL_SOURCE),
} as const;

const DERIVED_SOURCE =
  "common practice, no source: band around the values computed from the class anchors (concrete 8e-7, brick 5e-7, timber 1.5e-7, mineral wool 1e-6 m²/s)";

/** Derived-quantity bands, used for materials without a class. */
export const DERIVED = {
  /** At or above this λ a material is a metal and the non-metal bands do not apply. */
  metalConductivity: limit(
    10,
    "W/(m·K)",
    "common practice, no source: the most conductive non-metals in the class envelopes (natural stone) stay below 3.5 W/(m·K); the least conductive metal (stainless steel) is 15",
  ),
  minDiffusivity: limit(5e-8, "m²/s", DERIVED_SOURCE),
  maxDiffusivity: limit(3e-6, "m²/s", DERIVED_SOURCE),
  /** Below this density the upper diffusivity bound is that of still air. */
  lightDensity: limit(
    100,
    "kg/m³",
    "common practice, no source: fibrous and foam insulation below 100 kg/m³ approaches still air",
  ),
  maxDiffusivityLight: limit(2.5e-5, "m²/s", "from memory: still air at 20 °C, a ≈ 2.2e-5 m²/s"),
  maxVolumetricHeatCapacity: limit(
    3.0e6,
    "J/(m³·K)",
    "common practice, no source: masonry 1.2–2.4 MJ/(m³·K) computed from the class envelopes; only water (4.19) and metals exceed 3",
  ),
  minEffusivity: limit(
    10,
    "W·s^½/(m²·K)",
    "common practice, no source: insulation 20–80 computed from the class envelopes",
  ),
  maxEffusivity: limit(
    4000,
    "W·s^½/(m²·K)",
    "common practice, no source: dense stone, √(3.5 × 2900 × 1000) ≈ 3200 computed from the natural-stone envelope",
  ),
} as const;

/** Air-layer envelope for inline resistive layers named like a cavity. */
export const AIR_LAYER_NAME = /\b(air|cavity|gap)\b/i;

/** Scenario surface thresholds. */
export const SURFACE = {
  minAbsorptance: limit(
    0.2,
    "",
    "from memory: fresh white paint ≈ 0.2 is about the lowest solar absorptance of an opaque non-metallic finish (tables in ASHRAE Handbook—Fundamentals and CIBSE Guide A, not checked)",
  ),
  maxAbsorptance: limit(
    0.95,
    "",
    "from memory: matt black ≈ 0.95 is about the highest solar absorptance of a building finish (tables in ASHRAE Handbook—Fundamentals and CIBSE Guide A, not checked)",
  ),
  solAirBelowOutdoor: limit(
    10,
    "K",
    "common practice, no source: the long-wave term ε·ΔR/h_o is about 4 K for a horizontal surface (ASHRAE Handbook—Fundamentals sol-air convention, from memory), so sol-air falls only a few kelvin below the air",
  ),
  maxSolAir: limit(
    90,
    "°C",
    "common practice, no source: a matt-black roof in 45 °C air under 1000 W/m² reaches about 45 + 0.95 × 1000 / 25 ≈ 83 °C (computed with h_o = 25 W/(m²·K))",
  ),
  maxSolAirRange: limit(
    60,
    "K",
    "common practice, no source: the solar term α·I/h_o stays below about 40 K (computed, 0.95 × 1000 / 25) and the air range below about 20 K",
  ),
} as const;

/** Element-level thresholds, checked on computed results. */
export const ELEMENT = {
  maxU: limit(
    6,
    "W/(m²·K)",
    "common practice, no source; for reference an opaque element with no layer resistance has U = 1/(0.04 + 0.13) = 5.9 W/(m²·K) with the ISO 6946:2017 Table 7 horizontal-flow resistances (computed)",
  ),
  maxKappa: limit(
    400_000,
    "J/(m²·K)",
    "computed: κ1 of a semi-infinite layer is b·√(T/2π) = √(3.5 × 2900 × 1000) × √(86 400/2π) ≈ 374 kJ/(m²·K) at the natural-stone envelope corner; 400 leaves a margin",
  ),
  maxTimeLag: limit(
    24,
    "h",
    "common practice, no source: a lag beyond one 24 h period is rare (a 600 mm stone wall lags about 14 h, from memory) and may be a phase-unwrapping artefact",
  ),
} as const;

/** Scenario conditions: possible, but unusual enough to check. */
export const CONDITIONS = {
  minIndoor: limit(
    10,
    "°C",
    "from memory: design indoor temperatures of heated buildings run from about 12 °C (stores, workshops) to 30 °C (pool halls) (CIBSE Guide A Table 1.5 and EN 12831 national annexes, not checked); the band is widened by 2 K",
  ),
  maxIndoor: limit(
    32,
    "°C",
    "from memory: design indoor temperatures of heated buildings run from about 12 °C (stores, workshops) to 30 °C (pool halls) (CIBSE Guide A Table 1.5 and EN 12831 national annexes, not checked); the band is widened by 2 K",
  ),
  maxLongwaveCorrection: limit(
    10,
    "K",
    "from memory: the ASHRAE Handbook—Fundamentals sol-air convention uses ε·ΔR/h_o ≈ 3.9 K (7 °F) for horizontal surfaces and 0 for vertical ones; more than 10 K needs a reason",
  ),
} as const;
