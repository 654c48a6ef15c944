import type { CoolingLoadResults, PeakAt } from "./heatingTypes.ts";

/** Scenario results as they appear in results.json (DESIGN.md §4); re-exported by src/results/types.ts. */

/** One surface of a scenario in results.json (DESIGN.md §4); series have one value per timestep. */
export interface SurfaceResults {
  readonly construction: string;
  /** m^2 */
  readonly area: number;
  readonly solAir: readonly number[];
  /** W/m^2, positive into the room */
  readonly insideFlux: readonly number[];
  /** W/m^2, positive from outside into the wall */
  readonly outsideFlux: readonly number[];
  /** W */
  readonly heatGain: readonly number[];
  readonly radiantGain: readonly number[];
  readonly convectiveGain: readonly number[];
  readonly peak: { readonly heatGain: number; readonly time_h: number };
  /** Extension: total irradiance on the surface, W/m^2 (empty when the surface gives sol-air values). */
  readonly incident: readonly number[];
  /** Extension: the values actually used for this surface. */
  readonly parameters: {
    readonly absorptance: number | null;
    readonly emittance: number;
    readonly outsideCoefficient: number;
    readonly longwaveCorrection: number;
    readonly radiantFraction: number;
    readonly groundReflectance: number;
  };
  /** Extension (design day): θ_si = θ_i + R_si·q_i per step, °C. */
  readonly insideSurfaceTemperature?: readonly number[];
  /** Extension (design day with a radiant time series): cooling load per full hour (24 values), W. */
  readonly coolingLoad?: readonly number[];
  /** Extension: peak of `coolingLoad`, W, and its hour. */
  readonly coolingLoadPeak?: PeakAt;
}

export interface EnergyTotals {
  /** J, sum of positive heat gain over the period */
  readonly gain_J: number;
  /** J, sum of heat loss (negative gain, as a positive number) */
  readonly loss_J: number;
  readonly monthly?: readonly { readonly gain_J: number; readonly loss_J: number }[];
}

/**
 * Extension (design day): the outside film used. `h_o` is the summer design film in W/(m²K) with its `source`; the
 * construction response of the day is computed with `response` (R_se = 1/h_o); `overridden` lists the surfaces that
 * give their own `outside-coefficient` (W/(m²K)), which then is their h_o and their 1/R_se.
 */
export interface OutsideFilmResults {
  readonly h_o: number;
  readonly source: string;
  readonly response: "R_se = 1/h_o";
  readonly overridden: readonly { readonly surface: string; readonly h_o: number }[];
}

/** A scenario in results.json (DESIGN.md §4). */
export interface ScenarioResults {
  readonly kind: "design-day" | "weather";
  readonly timestep_h: number;
  readonly outdoor: readonly number[];
  readonly indoor: readonly number[];
  readonly surfaces: Readonly<Record<string, SurfaceResults>>;
  readonly totalHeatGain: readonly number[];
  readonly peak: { readonly heatGain: number; readonly time_h: number };
  readonly totals: EnergyTotals;
  /** Extension: how the steady-periodic day was confirmed by the recursion. */
  readonly convergence?: { readonly days: number; readonly peakChange: number };
  /** Extension: sun position at each step (design day). */
  readonly sun?: readonly { readonly altitude_deg: number; readonly azimuth_deg: number }[];
  /** Extension (design day): the outside film used, see `OutsideFilmResults`. */
  readonly outsideFilm?: OutsideFilmResults;
  /** Extension: statements of the conventions and rules applied. */
  readonly notes: readonly string[];
  /** Extension (design day with a radiant time series): total cooling load per full hour and its peak. */
  readonly coolingLoad?: CoolingLoadResults;
  /**
   * Extension (weather): present when the weather is synthetic, marked by the scenario's `synthetic` key
   * (`from: "scenario"`, which wins) or by the file's first comment `# synthetic: <note>` (`from: "file"`).
   */
  readonly synthetic?: SyntheticWeatherResults;
}

/** How a weather scenario's data is marked synthetic (results.json `scenarios.<id>.synthetic`). */
export interface SyntheticWeatherResults {
  readonly note: string;
  readonly from: "scenario" | "file";
}
