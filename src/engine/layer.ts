/**
 * Engine input: one layer of a construction in SI units, listed outside to inside.
 * A massive layer stores heat; a resistive layer (air gap, membrane, surface film) does not.
 */
export type Layer =
  | {
    readonly kind: "massive";
    /** m */
    readonly thicknessM: number;
    /** W/(m K) */
    readonly conductivity: number;
    /** kg/m^3 */
    readonly density: number;
    /** J/(kg K) */
    readonly specificHeat: number;
  }
  | {
    readonly kind: "resistive";
    /** m^2 K/W */
    readonly resistance: number;
  };

/** Engine input: a construction's layers (outside to inside) and its two surface resistances. */
export interface ConstructionInput {
  readonly layers: readonly Layer[];
  /** R_se, m^2 K/W */
  readonly outsideResistance: number;
  /** R_si, m^2 K/W */
  readonly insideResistance: number;
}

/** Whether two constructions' layers are the same, value for value (the films are not compared). */
export function sameLayers(a: readonly Layer[], b: readonly Layer[]): boolean {
  if (a === b) return true;
  if (a.length !== b.length) return false;
  return a.every((layer, i) => {
    const other = b[i]!;
    if (layer.kind === "resistive" || other.kind === "resistive") {
      return layer.kind === "resistive" && other.kind === "resistive" &&
        Object.is(layer.resistance, other.resistance);
    }
    return Object.is(layer.thicknessM, other.thicknessM) &&
      Object.is(layer.conductivity, other.conductivity) &&
      Object.is(layer.density, other.density) && Object.is(layer.specificHeat, other.specificHeat);
  });
}
