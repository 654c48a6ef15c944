/**
 * Steady thermal transmittance of a slab-on-ground floor, ISO 13370:2017 (uninsulated or all-over insulated slab;
 * edge insulation, suspended floors and basements are not covered here). Pure numbers, SI units.
 *
 * Clause and equation numbers below are given from memory (the standard was not at hand): the characteristic
 * dimension B′ = A / (0.5 P), the equivalent thickness d_t = w + λ (R_si + R_f + R_se) and the two slab formulas
 * U = 2λ/(πB′ + d_t)·ln(πB′/d_t + 1) for d_t < B′ and U = λ/(0.457 B′ + d_t) for d_t ≥ B′.
 */

/** What the caller knows of the floor; absent optional values take the defaults below (flagged as defaulted). */
export interface GroundFloorInput {
  /** A, floor area, m² */
  readonly areaM2: number;
  /** P, exposed perimeter, m (edges towards outdoor air or unheated space; not party walls) */
  readonly exposedPerimeterM: number;
  /** R_f, thermal resistance of the floor construction's layers (all-over insulation, covering), films excluded, m² K/W */
  readonly floorResistanceM2KPerW: number;
  /** λ_g, thermal conductivity of the unfrozen ground, W/(m K); absent = 2.0 */
  readonly soilConductivityWPerMK?: number;
  /** w, full thickness of the walls at ground level, m; absent = 0.3 */
  readonly wallThicknessM?: number;
  /** R_si, m² K/W; absent = 0.17 (downward heat flow) */
  readonly insideResistanceM2KPerW?: number;
  /** R_se, m² K/W; absent = 0.04 */
  readonly outsideResistanceM2KPerW?: number;
}

/** One input as used: its value, whether it was defaulted, and where the value comes from. */
export interface GroundInputUsed {
  readonly value: number;
  readonly defaulted: boolean;
  readonly source: string;
}

/** Which of the standard's two slab formulas applied. */
export type GroundFloorBranch =
  /** d_t < B′: uninsulated and moderately insulated floors, U = 2λ/(πB′ + d_t)·ln(πB′/d_t + 1) */
  | "thin"
  /** d_t ≥ B′: well-insulated floors, U = λ/(0.457 B′ + d_t) */
  | "thick";

export interface GroundFloorU {
  readonly kind: "ground-floor";
  /** U, W/(m² K), to be used with the floor area A */
  readonly uValueWPerM2K: number;
  /** B′, m */
  readonly characteristicDimensionM: number;
  /** d_t, m */
  readonly equivalentThicknessM: number;
  readonly branch: GroundFloorBranch;
  readonly inputs: {
    readonly areaM2: GroundInputUsed;
    readonly exposedPerimeterM: GroundInputUsed;
    readonly floorResistanceM2KPerW: GroundInputUsed;
    readonly soilConductivityWPerMK: GroundInputUsed;
    readonly wallThicknessM: GroundInputUsed;
    readonly insideResistanceM2KPerW: GroundInputUsed;
    readonly outsideResistanceM2KPerW: GroundInputUsed;
  };
  /** One line per step, with the figures filled in and the clause cited, for the register. */
  readonly statements: readonly string[];
}

export type GroundFloorRejectReason =
  | "non-positive-area"
  | "non-positive-perimeter"
  | "invalid-input";

/** Input the formulas cannot take; `field` names the `GroundFloorInput` key. */
export interface GroundFloorRejected {
  readonly kind: "rejected";
  readonly reason: GroundFloorRejectReason;
  readonly field: keyof GroundFloorInput;
  readonly message: string;
}

export type GroundFloorResult = GroundFloorU | GroundFloorRejected;

/** λ_g when the soil is unknown, W/(m K). */
export const DEFAULT_SOIL_CONDUCTIVITY_W_PER_MK = 2.0;
/** w when not given, m. */
export const DEFAULT_WALL_THICKNESS_M = 0.3;
/** R_si for downward heat flow, m² K/W. */
export const GROUND_FLOOR_INSIDE_RESISTANCE_M2K_PER_W = 0.17;
/** R_se, m² K/W. */
export const GROUND_FLOOR_OUTSIDE_RESISTANCE_M2K_PER_W = 0.04;

const SOURCES = {
  area: "given",
  perimeter: "given",
  floorResistance: "given (floor construction's layers, films excluded)",
  soilDefault:
    "ISO 13370:2017, thermal properties of the ground (clause 5, Table 1 of the 2007 edition, from memory): " +
    "λ = 2.0 W/(m K) when the type of ground is unknown",
  wallDefault: "common practice, no source: w = 0.3 m",
  rsiDefault: "ISO 6946:2017, Table 7, downward heat flow (from memory), as ISO 13370 asks for a floor",
  rseDefault: "ISO 6946:2017, Table 7 (from memory), the R_se ISO 13370 uses in d_t",
} as const;

/** Formats a figure for a statement (5 significant figures, no trailing zeros). */
function fig(x: number): string {
  return String(Number(x.toPrecision(5)));
}

function used(given: number | undefined, fallback: number, givenSource: string, defaultSource: string) {
  return given === undefined
    ? { value: fallback, defaulted: true, source: defaultSource }
    : { value: given, defaulted: false, source: givenSource };
}

function reject(reason: GroundFloorRejectReason, field: keyof GroundFloorInput, message: string) {
  return { kind: "rejected", reason, field, message } as const;
}

/** Checks the inputs; returns the first problem found, or undefined. */
function firstProblem(i: GroundFloorInput): GroundFloorRejected | undefined {
  if (!Number.isFinite(i.areaM2) || i.areaM2 <= 0) {
    return reject("non-positive-area", "areaM2", `Give a floor area above 0 m² (got ${i.areaM2})`);
  }
  if (!Number.isFinite(i.exposedPerimeterM) || i.exposedPerimeterM <= 0) {
    return reject(
      "non-positive-perimeter",
      "exposedPerimeterM",
      `Give an exposed perimeter above 0 m (got ${i.exposedPerimeterM}); a floor with no exposed edge loses no heat by ISO 13370`,
    );
  }
  const nonNegative: readonly (keyof GroundFloorInput)[] = [
    "floorResistanceM2KPerW",
    "wallThicknessM",
    "insideResistanceM2KPerW",
    "outsideResistanceM2KPerW",
  ];
  for (const key of nonNegative) {
    const v = i[key];
    if (v !== undefined && (!Number.isFinite(v) || v < 0)) {
      return reject("invalid-input", key, `Give ${key} as a number of 0 or more (got ${v})`);
    }
  }
  const lambda = i.soilConductivityWPerMK;
  if (lambda !== undefined && (!Number.isFinite(lambda) || lambda <= 0)) {
    return reject(
      "invalid-input",
      "soilConductivityWPerMK",
      `Give a soil conductivity above 0 W/(m K) (got ${lambda})`,
    );
  }
  return undefined;
}

/**
 * U of a slab-on-ground floor by ISO 13370:2017. Never throws: bad input gives a `rejected` result.
 * The caller logs every input flagged `defaulted`.
 */
export function groundFloorU(input: GroundFloorInput): GroundFloorResult {
  const problem = firstProblem(input);
  if (problem) return problem;
  const inputs = {
    areaM2: { value: input.areaM2, defaulted: false, source: SOURCES.area },
    exposedPerimeterM: { value: input.exposedPerimeterM, defaulted: false, source: SOURCES.perimeter },
    floorResistanceM2KPerW: {
      value: input.floorResistanceM2KPerW,
      defaulted: false,
      source: SOURCES.floorResistance,
    },
    soilConductivityWPerMK: used(
      input.soilConductivityWPerMK,
      DEFAULT_SOIL_CONDUCTIVITY_W_PER_MK,
      "given",
      SOURCES.soilDefault,
    ),
    wallThicknessM: used(input.wallThicknessM, DEFAULT_WALL_THICKNESS_M, "given", SOURCES.wallDefault),
    insideResistanceM2KPerW: used(
      input.insideResistanceM2KPerW,
      GROUND_FLOOR_INSIDE_RESISTANCE_M2K_PER_W,
      "given",
      SOURCES.rsiDefault,
    ),
    outsideResistanceM2KPerW: used(
      input.outsideResistanceM2KPerW,
      GROUND_FLOOR_OUTSIDE_RESISTANCE_M2K_PER_W,
      "given",
      SOURCES.rseDefault,
    ),
  };
  const a = inputs.areaM2.value;
  const p = inputs.exposedPerimeterM.value;
  const lambda = inputs.soilConductivityWPerMK.value;
  const w = inputs.wallThicknessM.value;
  const rsi = inputs.insideResistanceM2KPerW.value;
  const rf = inputs.floorResistanceM2KPerW.value;
  const rse = inputs.outsideResistanceM2KPerW.value;

  const bPrime = a / (0.5 * p);
  const dt = w + lambda * (rsi + rf + rse);
  const branch: GroundFloorBranch = dt < bPrime ? "thin" : "thick";
  const u = branch === "thin"
    ? ((2 * lambda) / (Math.PI * bPrime + dt)) * Math.log((Math.PI * bPrime) / dt + 1)
    : lambda / (0.457 * bPrime + dt);

  const slab = "ISO 13370:2017, slab-on-ground floor; 9.1";
  const eq = (n: number) => `(${slab}, Eq. (${n}) of the 2007 edition, from memory)`;
  const dtSum = `${fig(w)} + ${fig(lambda)} × (${fig(rsi)} + ${fig(rf)} + ${fig(rse)})`;
  const formula = branch === "thin"
    ? "d_t < B′ (uninsulated or moderately insulated floor): U = 2λ/(πB′ + d_t)·ln(πB′/d_t + 1)"
    : "d_t ≥ B′ (well-insulated floor): U = λ/(0.457 B′ + d_t)";
  const statements = [
    `B′ = A / (0.5 P) = ${fig(a)} / (0.5 × ${fig(p)}) = ${fig(bPrime)} m ` +
    "(ISO 13370:2017, characteristic dimension of the floor; clause 8, Eq. (2) of the 2007 edition, from memory)",
    `d_t = w + λ (R_si + R_f + R_se) = ${dtSum} = ${fig(dt)} m ${eq(3)}`,
    `${formula} = ${fig(u)} W/(m² K) ${eq(branch === "thin" ? 4 : 5)}`,
    "Steady-state U of the floor and the ground together, no edge insulation; the periodic (seasonal) part of " +
    "ISO 13370 is not included",
    "A and P are used as given: P counts only the edges towards outdoor air or unheated space, not those towards " +
    "other heated parts of the building (ISO 13370:2017, characteristic dimension; clause 8 of the 2007 edition, " +
    "from memory); for a room inside a larger floor, EN 12831-1 takes B′ of the whole building (from memory)",
  ];
  return {
    kind: "ground-floor",
    uValueWPerM2K: u,
    characteristicDimensionM: bPrime,
    equivalentThicknessM: dt,
    branch,
    inputs,
    statements,
  };
}
