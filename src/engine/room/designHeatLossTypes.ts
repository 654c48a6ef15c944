/** Inputs and result of the room's steady design heat loss (designHeatLoss.ts). SI units, names carry them. */

/** What lies behind an opaque surface, in the heating case. */
export type LossBoundary =
  /** Outdoor air at θ_e: b = 1. */
  | { readonly kind: "outdoor" }
  /** The ground: the surface's U is the ISO 13370 floor U (groundFloorU) and it loses to θ_m,annual. */
  | { readonly kind: "ground" }
  /** A space held at `temperatureC` in the heating case: b = (θ_int − θ_adj)/(θ_int − θ_e). */
  | { readonly kind: "adjacent"; readonly temperatureC: number }
  /** A space like this one: b = 0. */
  | { readonly kind: "same-as-room" };

export interface LossSurface {
  readonly id: string;
  /** U_c of the construction (corrected U), or for a ground surface the ISO 13370 U, W/(m² K) */
  readonly uValueWPerM2K: number;
  /** Net opaque area, windows taken out (netOpaqueAreas), m² */
  readonly netAreaM2: number;
  readonly boundary: LossBoundary;
}

export interface LossWindow {
  readonly id: string;
  /** The surface the window sits in: the window loses heat to what lies behind that surface (its b). */
  readonly hostId: string;
  /** m² (whole window) */
  readonly areaM2: number;
  /** U_w, W/(m² K) */
  readonly uValueWPerM2K: number;
}

/** A linear thermal bridge on the outdoor envelope: ψ, W/(m K), over L, m. ψ may be negative. */
export interface LossLinearBridge {
  readonly name: string;
  readonly psiWPerMK: number;
  readonly lengthM: number;
}

/** A point thermal bridge on the outdoor envelope: χ, W/K, counted `count` times. χ may be negative. */
export interface LossPointBridge {
  readonly name: string;
  readonly chiWPerK: number;
  readonly count: number;
}

/** Outdoor air supplied to the room at θ_e (no heat recovery). */
export type LossVentilation =
  | { readonly kind: "outdoor-air"; readonly flowM3PerS: number }
  | { readonly kind: "air-changes"; readonly perHour: number; readonly volumeM3: number };

export interface DesignHeatLossInput {
  /** θ_int, design indoor temperature, °C */
  readonly indoorC: number;
  /** θ_e, design outdoor temperature, °C (below θ_int) */
  readonly outdoorC: number;
  /** θ_m,annual, annual mean outdoor temperature, °C; required when a surface has a ground boundary */
  readonly annualMeanOutdoorC?: number;
  readonly surfaces: readonly LossSurface[];
  readonly windows: readonly LossWindow[];
  readonly linearBridges: readonly LossLinearBridge[];
  readonly pointBridges: readonly LossPointBridge[];
  readonly ventilation?: LossVentilation;
  /** ρ·c of air, J/(m³ K); absent = 1200 (flagged as defaulted) */
  readonly airHeatCapacityJPerM3K?: number;
}

export type LossGroup = "transmission" | "windows" | "ground" | "thermalBridges" | "ventilation";

/** One named input of a line, as a reviewer reads it: e.g. { symbol: "U", value: 0.3, unit: "W/(m² K)" }. */
export interface LossQuantity {
  readonly symbol: string;
  readonly value: number;
  readonly unit: string;
}

/** One line of the table: H = product of the quantities, Φ = H · ΔT. */
export interface HeatLossLine {
  readonly group: LossGroup;
  /** Surface or window id, bridge name, or "ventilation". */
  readonly id: string;
  /** How H is formed from the quantities, e.g. "U·A·b". */
  readonly formula: string;
  readonly quantities: readonly LossQuantity[];
  /** W/K */
  readonly hWPerK: number;
  /** K: θ_int − θ_e, or θ_int − θ_m,annual for ground lines */
  readonly deltaTK: number;
  /** W */
  readonly phiW: number;
}

/** W per group; `total` is the sum of all lines in table order. */
export interface HeatLossSubtotals {
  readonly transmission: number;
  readonly windows: number;
  readonly ground: number;
  readonly thermalBridges: number;
  readonly ventilation: number;
  readonly total: number;
}

export interface DesignHeatLoss {
  readonly kind: "design-heat-loss";
  /** Transmission (surfaces in input order), windows, ground, linear then point bridges, ventilation. */
  readonly lines: readonly HeatLossLine[];
  readonly subtotalsW: HeatLossSubtotals;
  /** θ_int − θ_e, K */
  readonly designDeltaTK: number;
  /**
   * H = total / (θ_int − θ_e), W/K: ground and adjacent lines enter through their own temperature difference
   * (a ground line adds U·A·(θ_int − θ_m,annual)/(θ_int − θ_e)).
   */
  readonly heatLossCoefficientWPerK: number;
  readonly airHeatCapacity: {
    readonly valueJPerM3K: number;
    readonly defaulted: boolean;
    readonly source: string;
  };
  /** The basis of each group and the stated simplifications, one line each. */
  readonly statements: readonly string[];
}

export type DesignHeatLossRejectReason =
  | "indoor-not-above-outdoor"
  | "missing-annual-mean"
  | "unknown-window-host"
  | "window-in-ground-surface"
  | "invalid-input";

export interface DesignHeatLossRejected {
  readonly kind: "rejected";
  readonly reason: DesignHeatLossRejectReason;
  /** The surface, window, bridge or input key concerned. */
  readonly subject: string;
  readonly message: string;
}

export type DesignHeatLossResult = DesignHeatLoss | DesignHeatLossRejected;
