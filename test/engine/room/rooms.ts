import type { ConstructionInput, Layer } from "../../../src/engine/layer.ts";
import type { RoomInput, RoomSurfaceInput } from "../../../src/engine/room/mod.ts";

// Invented rooms and constructions for the room tests (typical property values: common practice, no source).

const massive = (thicknessM: number, conductivity: number, density: number, specificHeat: number): Layer => ({
  kind: "massive",
  thicknessM,
  conductivity,
  density,
  specificHeat,
});
const resistive = (resistance: number): Layer => ({ kind: "resistive", resistance });

/** 100 mm EPS λ 0.035; 200 mm concrete λ 2.3; 150 mm EPS; 15 mm gypsum λ 0.25; 100 mm XPS λ 0.035; 150 mm slab. */
export const EPS100 = massive(0.1, 0.035, 20, 1450);
export const CONCRETE200 = massive(0.2, 2.3, 2300, 1000);
export const EPS150 = massive(0.15, 0.035, 20, 1450);
export const GYPSUM = massive(0.015, 0.25, 900, 1000);
export const XPS100 = massive(0.1, 0.035, 30, 1450);
export const SLAB150 = massive(0.15, 2.3, 2300, 1000);
export const TIMBER = massive(0.012, 0.13, 500, 1600);
export const MINERAL_WOOL = massive(0.1, 0.04, 30, 1030);

/**
 * Inside surface resistances of ISO 6946:2017 Table 7 (from memory): horizontal 0.13, downward 0.17, upward 0.10
 * m² K/W; outside 0.04. A ground-side face has no film (the far side is the ground temperature itself).
 */
export const R_SI = { wall: 0.13, ceiling: 0.17, floor: 0.1 } as const;
export const R_SE = 0.04;

function construction(layers: Layer[], outside: number, inside: number): ConstructionInput {
  return { layers, outsideResistance: outside, insideResistance: inside };
}

/** Heavy set: insulation outside a concrete core. */
export const HEAVY = {
  wall: construction([EPS100, CONCRETE200], R_SE, R_SI.wall),
  roof: construction([EPS150, CONCRETE200], R_SE, R_SI.ceiling),
  floor: construction([XPS100, SLAB150], 0, R_SI.floor),
  corridor: construction([GYPSUM, CONCRETE200, GYPSUM], R_SI.wall, R_SI.wall),
  partition: construction([GYPSUM, CONCRETE200, GYPSUM], R_SI.wall, R_SI.wall),
};

/** Light set: the same areas in timber frame, a light roof, a timber floor on insulation, stud partitions. */
export const LIGHT = {
  wall: construction([TIMBER, MINERAL_WOOL, resistive(0.1), GYPSUM], R_SE, R_SI.wall),
  roof: construction([TIMBER, EPS150, GYPSUM], R_SE, R_SI.ceiling),
  floor: construction([XPS100, TIMBER], 0, R_SI.floor),
  corridor: construction([GYPSUM, resistive(0.17), GYPSUM], R_SI.wall, R_SI.wall),
  partition: construction([GYPSUM, resistive(0.17), GYPSUM], R_SI.wall, R_SI.wall),
};

/** An invented design day at `n` steps: hour of step k, and a cosine with its peak at 15:00. */
export const hourOf = (k: number, n: number) => (24 * k) / n;
const daily = (n: number, mean: number, swing: number) =>
  Array.from({ length: n }, (_, k) => mean + swing * Math.cos((2 * Math.PI * (hourOf(k, n) - 15)) / 24));
const constant = (n: number, v: number) => new Array<number>(n).fill(v);

/** Areas of the ordinary room (m²): 6 m × 8 m floor, 3 m high; window 6 m² in the outdoor walls. */
export const AREAS = {
  outdoorWalls: 36,
  roof: 48,
  floor: 48,
  corridor: 18,
  partition: 24,
  window: 6,
} as const;

/**
 * An ordinary 6 × 8 × 3 m room: two outdoor walls (net 36 m² after the 6 m² window), a roof, a floor on the
 * ground, a wall to a corridor and a partition to a room like this one. `steady` makes every input constant
 * (outdoor 32 °C, no sun, constant gains); otherwise an invented July-like day.
 */
export function ordinaryRoom(
  set: typeof HEAVY,
  options: { timestepS: number; steady: boolean },
): RoomInput {
  const n = 86400 / options.timestepS;
  const steady = options.steady;
  const outdoor = steady ? constant(n, 32) : daily(n, 26, 6);
  const wallSolAir = steady ? outdoor : daily(n, 30, 12);
  const roofSolAir = steady ? outdoor : daily(n, 36, 22);
  const sun = (peakW: number) =>
    Array.from({ length: n }, (_, k) => {
      const h = hourOf(k, n);
      return steady ? 0 : h > 7 && h < 19 ? peakW * Math.sin((Math.PI * (h - 7)) / 12) : 0;
    });
  const occupied = (w: number) =>
    Array.from({ length: n }, (_, k) => (steady || (hourOf(k, n) >= 8 && hourOf(k, n) < 18) ? w : 0));
  const surface = (
    id: string,
    c: ConstructionInput,
    areaM2: number,
    orientation: RoomSurfaceInput["orientation"],
    far: readonly number[] | null,
  ): RoomSurfaceInput => ({
    id,
    construction: c,
    areaM2,
    orientation,
    farSide: far === null ? { kind: "same-as-room" } : { kind: "temperature", temperatureC: far },
  });
  return {
    timestepS: options.timestepS,
    airTemperatureC: constant(n, 24),
    outdoorAirC: outdoor,
    surfaces: [
      surface("outdoor-walls", set.wall, AREAS.outdoorWalls, "wall", wallSolAir),
      surface("roof", set.roof, AREAS.roof, "ceiling", roofSolAir),
      surface("floor", set.floor, AREAS.floor, "floor", constant(n, 16)),
      surface("corridor-wall", set.corridor, AREAS.corridor, "wall", constant(n, 28)),
      surface("partition", set.partition, AREAS.partition, "wall", null),
    ],
    windows: [{ id: "window", areaM2: AREAS.window, uValue: 1.4, transmittedSolarW: sun(1000) }],
    gains: [
      { name: "occupants", sensibleW: occupied(450), radiantFraction: 0.6 },
      { name: "lighting", sensibleW: occupied(400), radiantFraction: 0.5 },
    ],
    ventilationWPerK: 40,
    thermalBridgesWPerK: 0.06 * 30,
  };
}
