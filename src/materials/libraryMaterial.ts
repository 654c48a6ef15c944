/**
 * Types of the built-in materials library. Values are SI and every entry names its source:
 * a document, edition, table and row, or "from memory" with the document it is believed to come from.
 */

/** A library material with mass: conductivity, density and specific heat. */
export interface LibraryMassiveMaterial {
  /** Kebab-case id, unique in the library, used by `material:` in a construction layer. */
  readonly id: string;
  readonly name: string;
  /** Id of a class in `MATERIAL_CLASSES`, used for plausibility envelopes. */
  readonly materialClass: string;
  /** W/(m K) */
  readonly conductivity: number;
  /** kg/m^3 */
  readonly density: number;
  /** J/(kg K) */
  readonly specificHeat: number;
  /** Document, edition, table and row; or "from memory (believed …)". */
  readonly source: string;
}

/** A massless library material (an unventilated air layer) given by its thermal resistance. */
export interface LibraryResistiveMaterial {
  readonly id: string;
  readonly name: string;
  readonly materialClass: string;
  /** m^2 K/W */
  readonly resistance: number;
  readonly source: string;
}

/** One entry of the built-in materials library. */
export type LibraryMaterial = LibraryMassiveMaterial | LibraryResistiveMaterial;

/** Tells whether a library entry is massless (given by a resistance). */
export function isResistiveLibraryMaterial(m: LibraryMaterial): m is LibraryResistiveMaterial {
  return "resistance" in m;
}
