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
  /** Extension: heat balance at the full hours minus the radiant time series method, W (24 values). */
  readonly difference: readonly number[];
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
}

export interface RoomHeatingResults {
  /** W */
  readonly transmission: number;
  readonly windows: number;
  readonly ground: number;
  readonly thermalBridges: number;
  readonly ventilation: number;
  readonly total: number;
}

export interface RoomResults {
  readonly name: string;
  readonly designDay: string;
  readonly timestep_h: number;
  /** Room air set point, °C per step. */
  readonly airTemperature: readonly number[];
  readonly coolingLoad: RoomCoolingLoadResults;
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
