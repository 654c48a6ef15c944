import { isValidTimestep } from "../analyse.ts";
import type { InsideSurface } from "./insideSurfaces.ts";
import { type RoomFailure, roomFailure } from "./insideSurfaces.ts";
import { type RoomInput, STEFAN_BOLTZMANN } from "./roomInput.ts";

/** h_r = ε · 4σT_m³, W/(m² K) (ISO 6946:2017 Annex C, h_r = ε h_r0 with h_r0 = 4σT_m³; from memory). */
export function radiationCoefficient(room: RoomInput): number {
  const emissivity = room.options?.emissivity ?? 0.9;
  const meanK = room.options?.radiationMeanK ?? 293.15;
  return emissivity * 4 * STEFAN_BOLTZMANN * meanK ** 3;
}

/** Shares of a radiant gain absorbed by each face: by area over all faces. */
export function shareByArea(faces: readonly InsideSurface[]): number[] {
  const total = faces.reduce((s, f) => s + f.areaM2, 0);
  return faces.map((f) => f.areaM2 / total);
}

/** Shares of transmitted solar absorbed by each face: by area over the opaque floors, or over all faces without one. */
export function solarShare(faces: readonly InsideSurface[]): number[] {
  const floors = faces.map((f) => f.kind !== "window" && f.orientation === "floor");
  const floorArea = faces.reduce((s, f, i) => s + (floors[i] ? f.areaM2 : 0), 0);
  if (floorArea === 0) return shareByArea(faces);
  return faces.map((f, i) => (floors[i] ? f.areaM2 / floorArea : 0));
}

/** Spreads a series (W per step) over the faces by their shares; zero shares give null (no source). */
export function spread(series: readonly number[], shares: readonly number[]): (number[] | null)[] {
  return shares.map((s) => (s === 0 ? null : series.map((v) => v * s)));
}

/** Adds series step by step. */
export function sumSeries(n: number, series: readonly (readonly number[])[]): number[] {
  const out = new Array<number>(n).fill(0);
  for (const s of series) for (let k = 0; k < n; k++) out[k] = out[k]! + s[k]!;
  return out;
}

/** Checks every per-step series of the room has one value per step of the day, finite. */
export function checkRoomSeries(room: RoomInput): RoomFailure | null {
  if (!isValidTimestep(room.timestepS)) {
    return roomFailure(
      `Give the room a time step of whole seconds dividing 3600 s (at least 60 s), found time step ${room.timestepS} s`,
    );
  }
  const n = 86400 / room.timestepS;
  const series: [string, readonly number[], string?][] = [
    ["air temperature", room.airTemperatureC],
    ["outdoor air temperature", room.outdoorAirC],
    ...room.surfaces.flatMap((s): [string, readonly number[], string][] =>
      s.farSide.kind === "temperature"
        ? [[`far-side temperature of "${s.id}"`, s.farSide.temperatureC, s.id]]
        : []
    ),
    ...room.windows.map((w): [string, readonly number[], string] => [
      `transmitted solar of "${w.id}"`,
      w.transmittedSolarW,
      w.id,
    ]),
    ...room.gains.map((g): [string, readonly number[]] => [`sensible gain "${g.name}"`, g.sensibleW]),
  ];
  for (const [name, values, id] of series) {
    if (values.length !== n || !values.every(Number.isFinite)) {
      return roomFailure(`Give the ${name} as ${n} finite values (one per ${room.timestepS} s step)`, id);
    }
  }
  if (room.surfaces.length + room.windows.length === 0) {
    return roomFailure("Give the room at least one surface");
  }
  for (const g of room.gains) {
    if (!(g.radiantFraction >= 0 && g.radiantFraction <= 1)) {
      return roomFailure(`Give gain "${g.name}" a radiant fraction from 0 to 1, found ${g.radiantFraction}`);
    }
  }
  if (!(room.ventilationWPerK >= 0) || !(room.thermalBridgesWPerK >= 0)) {
    return roomFailure("Give ventilation and thermal bridges as W/K ≥ 0");
  }
  return null;
}
