/** results.json extensions of the design-answers work: cooling load of design days and heating scenarios. */

/** A peak of a series: its value and the time after 00:00 local standard time, h. */
export interface PeakAt {
  readonly value: number;
  readonly time_h: number;
}

/** `scenarios.<id>.coolingLoad`: the radiant time series result, hourly whatever the scenario's timestep. */
export interface CoolingLoadResults {
  /** Always 1: one value per full hour, index h = h:00 (sub-hourly gains are taken at the full hours). */
  readonly timestep_h: 1;
  /** W, all surfaces, per hour */
  readonly total: readonly number[];
  readonly peak: PeakAt;
  /** W, total heat gain at the same full hours, for comparison */
  readonly totalHeatGain: readonly number[];
  readonly heatGainPeak: PeakAt;
  /** The user's series r_0 … r_23 and its source, as given. */
  /** The series used; `room` (extension) names the room of the project whose own series it is. */
  readonly radiantTimeSeries: {
    readonly values: readonly number[];
    readonly source: string;
    readonly room?: string;
  };
}

/** Pass or fail of one ISO 13788 criterion on a surface, with its margin (positive = on the safe side). */
export interface Verdict {
  readonly pass: boolean;
  readonly margin: number;
}

/** One surface of a heating scenario in results.json (`heating.<id>.surfaces.<sid>`). */
export interface HeatingSurfaceResults {
  readonly construction: string;
  /** m² */
  readonly area: number;
  /** W/(m²K), air to air, of the construction (its own surface resistances) */
  readonly U: number;
  /** W/(m²K), U_c = U + ΔU of the user's corrections (equal to U without corrections); used for the heat loss */
  readonly correctedU: number;
  /** W, U_c·A·(θ_i − θ_e), positive = heat leaving the room */
  readonly heatLoss: number;
  /** m²K/W, R_si used for the surface temperature */
  readonly moistureSurfaceResistance: number;
  /** °C, θ_si at the design condition */
  readonly insideSurfaceTemperature: number;
  /** f_Rsi = (θ_si − θ_e)/(θ_i − θ_e) */
  readonly fRsi: number;
  /** f_Rsi,min of the mould criterion (same for every surface of the scenario) */
  readonly fRsiMin: number;
  /** °C, indoor dew point (same for every surface) */
  readonly dewPoint: number;
  /** θ_si ≥ θ_dew; margin θ_si − θ_dew in K */
  readonly surfaceCondensation: Verdict;
  /** f_Rsi ≥ f_Rsi,min; margin f_Rsi − f_Rsi,min */
  readonly mould: Verdict;
}

/** A heating scenario in results.json (`heating.<id>`): steady design heat loss and ISO 13788 surface checks. */
export interface HeatingResults {
  readonly kind: "heating";
  /** θ_i, °C */
  readonly indoor: number;
  /** θ_e, °C */
  readonly outdoor: number;
  /** φ_i, fraction */
  readonly indoorRelativeHumidity: number;
  /** p_i = φ_i·p_sat(θ_i), Pa */
  readonly indoorVapourPressure: number;
  /** θ_dew, °C */
  readonly indoorDewPoint: number;
  readonly mouldCriterion: {
    /** surface relative humidity limit, fraction (0.8) */
    readonly surfaceRelativeHumidity: number;
    /** Pa */
    readonly minimumSaturationPressure: number;
    /** θ_si,min, °C */
    readonly minimumSurfaceTemperature: number;
    readonly fRsiMin: number;
  };
  readonly surfaces: Readonly<Record<string, HeatingSurfaceResults>>;
  /** W */
  readonly totalHeatLoss: number;
  /** W/K, Σ U_c·A */
  readonly totalUA: number;
  readonly notes: readonly string[];
}
