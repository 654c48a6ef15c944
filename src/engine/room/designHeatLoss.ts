/**
 * The room's steady design heat loss as a table of lines a reviewer can add by hand: transmission per opaque
 * surface U_c·A_net·b·(θ_int − θ_e), windows U_w·A_w·b·(θ_int − θ_e), ground floors U_g·A·(θ_int − θ_m,annual),
 * thermal bridges ψ·L·ΔT and χ·n·ΔT, ventilation ρc·V̇·(θ_int − θ_e). Pure numbers, SI units.
 */
import type {
  DesignHeatLoss,
  DesignHeatLossInput,
  DesignHeatLossRejected,
  DesignHeatLossRejectReason,
  DesignHeatLossResult,
  HeatLossLine,
  LossBoundary,
  LossGroup,
  LossQuantity,
} from "./designHeatLossTypes.ts";

export type * from "./designHeatLossTypes.ts";

/** ρ·c of air used when none is given, J/(m³ K). */
export const DEFAULT_AIR_HEAT_CAPACITY_J_PER_M3K = 1200;

const AIR_HEAT_CAPACITY_SOURCE =
  "ρ_a·c_a = 1200 J/(m³ K) of ISO 13789:2017's ventilation heat transfer coefficient " +
  "(the same value in ISO 13790:2008), from memory; air near 20 °C: ρ ≈ 1.2 kg/m³, c_p ≈ 1.0 kJ/(kg K)";

const U = "W/(m² K)";

/** The basis of each group and the stated simplifications. */
const STATEMENTS: readonly string[] = [
  "Transmission: Φ = U_c·A_net·b·(θ_int − θ_e) per opaque surface, A_net with its windows taken out; b = 1 for " +
  "outdoor, b = (θ_int − θ_adj)/(θ_int − θ_e) for an adjacent space, b = 0 for a space like this one " +
  "(temperature adjustment factor as in ISO 13789:2017, from memory); ground surfaces are not in this group",
  "Windows: Φ = U_w·A_w·b·(θ_int − θ_e), b of the surface the window sits in",
  "Ground: Φ = U_g·A·(θ_int − θ_m,annual) with U_g by ISO 13370:2017 and the annual mean outdoor temperature, " +
  "the standard's steady-state part; its periodic (seasonal) part is neglected for the design loss " +
  "(stated simplification)",
  "Thermal bridges: Φ = ψ·L·(θ_int − θ_e) and χ·n·(θ_int − θ_e); every bridge is taken to lie on the outdoor " +
  "envelope",
  "Ventilation: Φ = ρc·V̇·(θ_int − θ_e), outdoor air entering at θ_e without heat recovery; V̇ = n·V/3600 for " +
  "air changes",
  "Heat loss coefficient H = Φ_total/(θ_int − θ_e); ground and adjacent lines enter it through their own " +
  "temperature difference; Φ_total is the sum of the lines in table order",
];

function reject(
  reason: DesignHeatLossRejectReason,
  subject: string,
  message: string,
): DesignHeatLossRejected {
  return { kind: "rejected", reason, subject, message };
}

function badNumber(value: number, min: number | undefined): boolean {
  return !Number.isFinite(value) || (min !== undefined && value < min);
}

/** The first input problem, or undefined. */
function firstProblem(input: DesignHeatLossInput): DesignHeatLossRejected | undefined {
  const { indoorC, outdoorC } = input;
  if (badNumber(indoorC, undefined) || badNumber(outdoorC, undefined)) {
    return reject(
      "invalid-input",
      "indoorC",
      `Give finite design temperatures (got ${indoorC} and ${outdoorC} °C)`,
    );
  }
  if (indoorC <= outdoorC) {
    return reject(
      "indoor-not-above-outdoor",
      "indoorC",
      `Give an indoor design temperature above the outdoor one (got ${indoorC} °C indoors, ${outdoorC} °C outdoors)`,
    );
  }
  for (const s of input.surfaces) {
    if (badNumber(s.uValueWPerM2K, 0) || badNumber(s.netAreaM2, 0)) {
      return reject("invalid-input", s.id, `Give surface "${s.id}" a U and an area of 0 or more`);
    }
    if (s.boundary.kind === "adjacent" && badNumber(s.boundary.temperatureC, undefined)) {
      return reject("invalid-input", s.id, `Give the adjacent space of "${s.id}" a finite temperature`);
    }
  }
  const hasGround = input.surfaces.some((s) => s.boundary.kind === "ground");
  if (
    hasGround && (input.annualMeanOutdoorC === undefined || badNumber(input.annualMeanOutdoorC, undefined))
  ) {
    return reject(
      "missing-annual-mean",
      "annualMeanOutdoorC",
      "Give the annual mean outdoor temperature: a ground floor loses heat to it (ISO 13370)",
    );
  }
  for (const w of input.windows) {
    if (badNumber(w.uValueWPerM2K, 0) || badNumber(w.areaM2, 0)) {
      return reject("invalid-input", w.id, `Give window "${w.id}" a U and an area of 0 or more`);
    }
  }
  for (const b of input.linearBridges) {
    if (badNumber(b.psiWPerMK, undefined) || badNumber(b.lengthM, 0)) {
      return reject(
        "invalid-input",
        b.name,
        `Give thermal bridge "${b.name}" a finite ψ and a length of 0 or more`,
      );
    }
  }
  for (const b of input.pointBridges) {
    if (badNumber(b.chiWPerK, undefined) || badNumber(b.count, 0)) {
      return reject(
        "invalid-input",
        b.name,
        `Give point bridge "${b.name}" a finite χ and a count of 0 or more`,
      );
    }
  }
  const v = input.ventilation;
  if (
    v &&
    (v.kind === "outdoor-air"
      ? badNumber(v.flowM3PerS, 0)
      : badNumber(v.perHour, 0) || badNumber(v.volumeM3, 0))
  ) {
    return reject(
      "invalid-input",
      "ventilation",
      "Give the ventilation a flow, air changes and volume of 0 or more",
    );
  }
  const rc = input.airHeatCapacityJPerM3K;
  if (rc !== undefined && (badNumber(rc, 0) || rc === 0)) {
    return reject("invalid-input", "airHeatCapacityJPerM3K", `Give ρc of air above 0 J/(m³ K) (got ${rc})`);
  }
  return undefined;
}

/** b of a non-ground boundary for the design temperatures. */
function adjustmentFactor(
  boundary: Exclude<LossBoundary, { kind: "ground" }>,
  indoorC: number,
  outdoorC: number,
) {
  switch (boundary.kind) {
    case "outdoor":
      return 1;
    case "adjacent":
      return (indoorC - boundary.temperatureC) / (indoorC - outdoorC);
    case "same-as-room":
      return 0;
  }
}

function line(
  group: LossGroup,
  id: string,
  formula: string,
  quantities: readonly LossQuantity[],
  hWPerK: number,
  deltaTK: number,
): HeatLossLine {
  return { group, id, formula, quantities, hWPerK, deltaTK, phiW: hWPerK * deltaTK };
}

/**
 * The room's design heat loss table. Never throws: bad input gives a `rejected` result. Surfaces carry net
 * areas (see netOpaqueAreas); a ground surface carries the ISO 13370 U (see groundFloorU).
 */
export function designHeatLoss(input: DesignHeatLossInput): DesignHeatLossResult {
  const problem = firstProblem(input);
  if (problem) return problem;
  const { indoorC, outdoorC } = input;
  const dT = indoorC - outdoorC;
  const lines: HeatLossLine[] = [];
  const bById = new Map<string, number>();

  for (const s of input.surfaces) {
    if (s.boundary.kind === "ground") continue;
    const b = adjustmentFactor(s.boundary, indoorC, outdoorC);
    bById.set(s.id, b);
    const q = [
      { symbol: "U", value: s.uValueWPerM2K, unit: U },
      { symbol: "A", value: s.netAreaM2, unit: "m²" },
      { symbol: "b", value: b, unit: "—" },
    ];
    lines.push(line("transmission", s.id, "U·A·b", q, s.uValueWPerM2K * s.netAreaM2 * b, dT));
  }
  for (const w of input.windows) {
    const host = input.surfaces.find((s) => s.id === w.hostId);
    if (!host) {
      return reject(
        "unknown-window-host",
        w.id,
        `Name a surface of the room for window "${w.id}" (got "${w.hostId}")`,
      );
    }
    const b = bById.get(host.id);
    if (b === undefined) {
      return reject(
        "window-in-ground-surface",
        w.id,
        `Put window "${w.id}" in a wall or roof: "${host.id}" lies on the ground`,
      );
    }
    const q = [
      { symbol: "U_w", value: w.uValueWPerM2K, unit: U },
      { symbol: "A_w", value: w.areaM2, unit: "m²" },
      { symbol: "b", value: b, unit: "—" },
    ];
    lines.push(line("windows", w.id, "U_w·A_w·b", q, w.uValueWPerM2K * w.areaM2 * b, dT));
  }
  for (const s of input.surfaces) {
    if (s.boundary.kind !== "ground") continue;
    // firstProblem guarantees the annual mean when a ground surface exists.
    const groundDT = indoorC - (input.annualMeanOutdoorC as number);
    const q = [{ symbol: "U_g", value: s.uValueWPerM2K, unit: U }, {
      symbol: "A",
      value: s.netAreaM2,
      unit: "m²",
    }];
    lines.push(line("ground", s.id, "U_g·A", q, s.uValueWPerM2K * s.netAreaM2, groundDT));
  }
  for (const b of input.linearBridges) {
    const q = [{ symbol: "ψ", value: b.psiWPerMK, unit: "W/(m K)" }, {
      symbol: "L",
      value: b.lengthM,
      unit: "m",
    }];
    lines.push(line("thermalBridges", b.name, "ψ·L", q, b.psiWPerMK * b.lengthM, dT));
  }
  for (const b of input.pointBridges) {
    const q = [{ symbol: "χ", value: b.chiWPerK, unit: "W/K" }, { symbol: "n", value: b.count, unit: "—" }];
    lines.push(line("thermalBridges", b.name, "χ·n", q, b.chiWPerK * b.count, dT));
  }
  const defaulted = input.airHeatCapacityJPerM3K === undefined;
  const rc = input.airHeatCapacityJPerM3K ?? DEFAULT_AIR_HEAT_CAPACITY_J_PER_M3K;
  const v = input.ventilation;
  if (v) {
    const rcQ = { symbol: "ρc", value: rc, unit: "J/(m³ K)" };
    if (v.kind === "outdoor-air") {
      const q = [rcQ, { symbol: "V̇", value: v.flowM3PerS, unit: "m³/s" }];
      lines.push(line("ventilation", "ventilation", "ρc·V̇", q, rc * v.flowM3PerS, dT));
    } else {
      const q = [rcQ, { symbol: "n", value: v.perHour, unit: "1/h" }, {
        symbol: "V",
        value: v.volumeM3,
        unit: "m³",
      }];
      lines.push(
        line("ventilation", "ventilation", "ρc·n·V/3600", q, (rc * v.perHour * v.volumeM3) / 3600, dT),
      );
    }
  }

  const groupSum = (g: LossGroup) => lines.filter((l) => l.group === g).reduce((sum, l) => sum + l.phiW, 0);
  const total = lines.reduce((sum, l) => sum + l.phiW, 0);
  const result: DesignHeatLoss = {
    kind: "design-heat-loss",
    lines,
    subtotalsW: {
      transmission: groupSum("transmission"),
      windows: groupSum("windows"),
      ground: groupSum("ground"),
      thermalBridges: groupSum("thermalBridges"),
      ventilation: groupSum("ventilation"),
      total,
    },
    designDeltaTK: dT,
    heatLossCoefficientWPerK: total / dT,
    airHeatCapacity: {
      valueJPerM3K: rc,
      defaulted,
      source: defaulted ? AIR_HEAT_CAPACITY_SOURCE : "given",
    },
    statements: STATEMENTS,
  };
  return result;
}
