import type { ConstructionInput, Layer } from "../../src/engine/layer.ts";

/** A massive layer from thickness (m), conductivity (W/(m K)), density (kg/m³) and specific heat (J/(kg K)). */
export function massive(
  thicknessM: number,
  conductivity: number,
  density: number,
  specificHeat: number,
): Layer {
  return { kind: "massive", thicknessM, conductivity, density, specificHeat };
}

/** A massless layer of resistance R (m² K/W). */
export function resistive(resistance: number): Layer {
  return { kind: "resistive", resistance };
}

/**
 * Wall surface films: outside 0.04, inside 0.13 m² K/W
 * (ISO 6946 conventional values, horizontal flow; from memory).
 */
export const FILMS = { outsideResistance: 0.04, insideResistance: 0.13 };

// Invented but ordinary layers (typical property values, common practice, no source).
/** 100 mm EPS insulation. */
export const EPS = massive(0.1, 0.035, 20, 1450);
/** 200 mm dense concrete. */
export const CONCRETE = massive(0.2, 2.3, 2300, 1000);

/** Homogeneous slab: L 0.2 m, k 1 W/(m K), ρc 2e6 J/(m³ K) (α = 5e-7 m²/s), no films. */
export const SLAB: ConstructionInput = {
  layers: [massive(0.2, 1, 2000, 1000)],
  outsideResistance: 0,
  insideResistance: 0,
};

/** Invented heavy six-layer wall (render, brick, cavity, EPS, dense concrete, plaster), films 0.04 / 0.13. */
export const HEAVY_WALL: ConstructionInput = {
  layers: [
    massive(0.015, 1.0, 1800, 1000),
    massive(0.105, 0.77, 1700, 800),
    resistive(0.18),
    massive(0.08, 0.035, 25, 1400),
    massive(0.15, 1.65, 2300, 1000),
    massive(0.013, 0.57, 1300, 1000),
  ],
  outsideResistance: 0.04,
  insideResistance: 0.13,
};

/** Invented light timber-frame wall with films 0.04 / 0.13. */
export const LIGHT_WALL: ConstructionInput = {
  layers: [
    massive(0.009, 0.14, 530, 900),
    resistive(0.15),
    massive(0.1, 0.04, 12, 840),
    massive(0.0125, 0.21, 700, 1000),
  ],
  outsideResistance: 0.04,
  insideResistance: 0.13,
};

/** Reverses a construction's layers, keeping the films where they are. */
export function reversed(c: ConstructionInput): ConstructionInput {
  return { ...c, layers: [...c.layers].reverse() };
}

/** Asserts |actual − expected| ≤ tolerance, with a message naming the quantity. */
export function assertClose(actual: number, expected: number, tolerance: number, what: string): void {
  if (!(Math.abs(actual - expected) <= tolerance)) {
    throw new Error(
      `${what}: expected ${expected} ± ${tolerance}, found ${actual} (diff ${actual - expected})`,
    );
  }
}
