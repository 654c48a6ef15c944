/** Types of material classes and their plausibility envelopes, SI units. */

/** A closed interval [min, max] in SI units. */
export interface ValueRange {
  readonly min: number;
  readonly max: number;
}

/** A class of materials with mass and its envelopes for conductivity, density and specific heat. */
export interface MassiveMaterialClass {
  readonly kind: "massive";
  readonly id: string;
  readonly name: string;
  /** W/(m K) */
  readonly conductivity: ValueRange;
  /** kg/m^3 */
  readonly density: ValueRange;
  /** J/(kg K) */
  readonly specificHeat: ValueRange;
  readonly source: string;
}

/** A class of massless layers and its envelope for thermal resistance. */
export interface ResistiveMaterialClass {
  readonly kind: "resistive";
  readonly id: string;
  readonly name: string;
  /** m^2 K/W */
  readonly resistance: ValueRange;
  readonly source: string;
}

/** A material class with its plausibility envelope. */
export type MaterialClass = MassiveMaterialClass | ResistiveMaterialClass;

/** Tells whether a value lies inside a range, bounds included. */
export function isWithinRange(value: number, range: ValueRange): boolean {
  return value >= range.min && value <= range.max;
}
