import type { ConstructionInput } from "../layer.ts";

/**
 * Engine input of a room's cooling-load computation: plain series, SI units, one value per time step over one
 * design day (the day repeats: steady-periodic). Step k covers the instant k·Δ after midnight.
 */

/** Orientation class of an inside surface, from its tilt: it sets the default inside convection coefficient. */
export type SurfaceOrientation = "wall" | "ceiling" | "floor";

/** What lies on the far side of an opaque surface. */
export type FarSide =
  /** A temperature per step, °C: sol-air for outdoor surfaces, the ground temperature, an adjacent space. */
  | { readonly kind: "temperature"; readonly temperatureC: readonly number[] }
  /** A space like this one: adiabatic far face (the construction stores heat, passes none across). */
  | { readonly kind: "same-as-room" };

/** One opaque surface of the room. */
export interface RoomSurfaceInput {
  readonly id: string;
  /**
   * Layers outside to inside; `outsideResistance` is the far-side film (1/h_o of the summer film for outdoor
   * surfaces, the one the sol-air temperature was computed with). `insideResistance` is used only by the radiant
   * time series method (the conduction time series runs air to air); the heat balance models the inside film itself.
   */
  readonly construction: ConstructionInput;
  /** Net area (windows taken out), m². */
  readonly areaM2: number;
  readonly orientation: SurfaceOrientation;
  readonly farSide: FarSide;
  /** Inside convection coefficient h_c, W/(m² K); absent = the default of the orientation (see `DEFAULT_CONVECTION`). */
  readonly convectionWPerM2K?: number;
}

/** One window: massless, conduction by U_w between the outdoor air and the room. */
export interface RoomWindowInput {
  readonly id: string;
  /** m² */
  readonly areaM2: number;
  /** U_w (air to air), W/(m² K) */
  readonly uValue: number;
  /** Solar transmitted into the room per step, W. */
  readonly transmittedSolarW: readonly number[];
  /** Orientation of its inside face; absent = wall. */
  readonly orientation?: SurfaceOrientation;
}

/** One internal gain: sensible heat per step and its radiant fraction (latent gains are kept apart, not here). */
export interface RoomGainInput {
  readonly name: string;
  /** W per step */
  readonly sensibleW: readonly number[];
  /** 0…1 */
  readonly radiantFraction: number;
}

/** Fractions of conduction heat gain taken as radiant by the radiant time series method (the rest is convective). */
export interface RadiantSplit {
  /** Walls and floors. */
  readonly wallOrFloor: number;
  /** Roofs and ceilings. */
  readonly ceiling: number;
  /** Window conduction. */
  readonly window: number;
}

/** Modelling constants; every absent one takes the stated default (`roomNotes.ts`). */
export interface RoomOptions {
  /** Long-wave emissivity of all inside surfaces (default 0.9). */
  readonly emissivity?: number;
  /** Mean temperature for the linearised radiation coefficient h_r = 4σT_m³ ε, K (default 293.15). */
  readonly radiationMeanK?: number;
  /** Radiant fractions of conduction gains for the radiant time series method. */
  readonly radiantSplit?: Partial<RadiantSplit>;
}

/** A room for the heat balance and the radiant time series: everything in plain series of one day. */
export interface RoomInput {
  /** Time step, s: whole seconds dividing 3600, at least 60. */
  readonly timestepS: number;
  /** Room air set point per step, °C. */
  readonly airTemperatureC: readonly number[];
  /** Outdoor air temperature per step, °C (windows, ventilation, thermal bridges). */
  readonly outdoorAirC: readonly number[];
  readonly surfaces: readonly RoomSurfaceInput[];
  readonly windows: readonly RoomWindowInput[];
  readonly gains: readonly RoomGainInput[];
  /** ρ·c·V̇ of the outdoor air supplied, W/K. */
  readonly ventilationWPerK: number;
  /** H_ψ = Σ ψ·L (+ Σ χ), W/K, to the outdoor air. */
  readonly thermalBridgesWPerK: number;
  readonly options?: RoomOptions;
}

/** Inside convection coefficients, W/(m² K) (ISO 6946:2017 Annex C, from memory; direction per `roomNotes.ts`). */
export const DEFAULT_CONVECTION: Readonly<Record<SurfaceOrientation, number>> = {
  /** horizontal heat flow */
  wall: 2.5,
  /** downward heat flow: a ceiling warmer than the room air on a cooling design day */
  ceiling: 0.7,
  /** upward heat flow: a floor warmed by the sun and radiant gains above the room air */
  floor: 5.0,
};

/** Radiant fractions of conduction heat gain (ASHRAE Handbook—Fundamentals, RTS method split table; from memory). */
export const DEFAULT_RADIANT_SPLIT: RadiantSplit = { wallOrFloor: 0.46, ceiling: 0.6, window: 0.46 };

/** Stefan–Boltzmann constant, W/(m² K⁴) (CODATA 2018: 5.670374419e-8). */
export const STEFAN_BOLTZMANN = 5.670374419e-8;
