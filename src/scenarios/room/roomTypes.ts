/** A room in results.json (`rooms.<id>`, README "Rooms"): the contract tests read, plus stated extensions. */

/** A load peak: W and the clock time of its step, h. */
export interface LoadPeak {
  readonly load: number;
  readonly time_h: number;
}

export interface RoomCoolingLoadResults {
  /** Sensible cooling load by the heat balance method, W per step of the design day. */
  readonly heatBalance: readonly number[];
  readonly heatBalancePeak: LoadPeak;
  /** The room's own radiant time series, 24 hourly fractions each (Σ = 1). */
  readonly radiantTimeSeries: {
    readonly nonsolar: readonly number[];
    readonly solar: readonly number[];
    /** Extension: share of the unit pulse that reaches the air (the rest is conducted out), before normalising. */
    readonly retained: { readonly nonsolar: number; readonly solar: number };
  };
  /** Sensible cooling load by the radiant time series method, W per hour (24 values). */
  readonly rtsMethod: readonly number[];
  readonly rtsMethodPeak: LoadPeak;
  /** Extension: radiant time series method minus heat balance at the full hours, W (24 values). */
  readonly difference: readonly number[];
  /** Extension: (RTS-method peak − heat balance peak) / heat balance peak. */
  readonly peakDifference: number;
  /** Extension: the heat balance load split by source (superposition), W per step; sums to `heatBalance`. */
  readonly bySource: Readonly<Record<string, readonly number[]>>;
  /** Extension: latent gains, W per step, reported apart from the sensible load. */
  readonly latent: readonly number[];
}

export interface RoomSurfaceResults {
  readonly construction: string;
  readonly boundary: "outdoor" | "ground" | "adjacent" | "same-as-room";
  /** Gross area as written, m². */
  readonly grossArea: number;
  /** Area less the windows in it, m². */
  readonly netArea: number;
  /** Inside surface temperature, °C per step. */
  readonly insideSurfaceTemperature: readonly number[];
}

export interface GroundFloorResults {
  /** U, W/(m² K) (ISO 13370 slab on ground). */
  readonly U: number;
  /** B′ = A / (0.5 P), m */
  readonly characteristicDimension: number;
  /** d_t, m */
  readonly equivalentThickness: number;
  /** Extension: which formula applied ("thin": d_t < B′, "thick": d_t ≥ B′). */
  readonly branch: "thin" | "thick";
  /** Extension: every input used, SI, and whether it was defaulted (A m², P m, R_f m²K/W, λ_g W/(m K), w m, R_si, R_se). */
  readonly inputs: Readonly<
    Record<string, { readonly value: number; readonly defaulted: boolean; readonly source: string }>
  >;
  /** Extension: the ground temperature the floor's far side sees on the design day, °C. */
  readonly designDayGroundTemperature: number;
}

/** Extension: one line of the design heat loss table, which a reviewer can add up by hand. */
export interface HeatLossLineResults {
  readonly group: "transmission" | "windows" | "ground" | "thermalBridges" | "ventilation";
  readonly id: string;
  /** e.g. "U·A·b", "ψ·L", "ρc·V̇" */
  readonly formula: string;
  readonly quantities: readonly { readonly symbol: string; readonly value: number; readonly unit: string }[];
  /** W/K */
  readonly H: number;
  /** K */
  readonly deltaT: number;
  /** W */
  readonly phi: number;
}

export interface RoomWindowResults {
  readonly in: string;
  /** m² */
  readonly area: number;
  /** Solar transmitted into the room, W per step. */
  readonly transmittedSolar: readonly number[];
}

export interface RoomHeatingResults {
  /** W */
  readonly transmission: number;
  readonly windows: number;
  readonly ground: number;
  readonly thermalBridges: number;
  readonly ventilation: number;
  readonly total: number;
  /** Extension: the heating scenario, its indoor and outdoor design temperatures, °C. */
  readonly scenario: string;
  readonly indoor: number;
  readonly outdoor: number;
  /** Extension: the table's lines in order; they add up to `total`. */
  readonly lines: readonly HeatLossLineResults[];
}

export interface RoomResults {
  readonly name: string;
  readonly designDay: string;
  readonly timestep_h: number;
  /** Room air set point, °C per step. */
  readonly airTemperature: readonly number[];
  readonly coolingLoad: RoomCoolingLoadResults;
  /** Extension: outdoor air temperature, °C per step (windows, ventilation, thermal bridges). */
  readonly outdoor: readonly number[];
  readonly windows: Readonly<Record<string, RoomWindowResults>>;
  readonly surfaces: Readonly<Record<string, RoomSurfaceResults>>;
  /** Extension: area-weighted mean of the inside surface temperatures, °C per step. */
  readonly meanRadiantTemperature: readonly number[];
  readonly ground: Readonly<Record<string, GroundFloorResults>>;
  /** Present when the room names a heating scenario. */
  readonly heating?: RoomHeatingResults;
  /** W/K, present with `heating`. */
  readonly heatLossCoefficient?: number;
  /** Extension: statements of the methods and conventions applied. */
  readonly notes: readonly string[];
}
