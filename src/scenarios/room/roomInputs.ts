/** The engine inputs of a room built from its block: surfaces with their far side, windows, gains, air-side terms. */
import type {
  RoomGainInput,
  RoomInput,
  RoomSurfaceInput,
  RoomWindowInput,
  SurfaceOrientation,
} from "../../engine/room/mod.ts";
import { DEFAULT_AIR_HEAT_CAPACITY_J_PER_M3K } from "../../engine/room/designHeatLoss.ts";
import type { NetOpaqueArea } from "../../engine/room/netOpaqueAreas.ts";
import type { Construction } from "../../project/model.ts";
import type { Room, RoomGain, RoomSurface } from "../../project/roomModel.ts";
import { temperatureSteps } from "../designDay.ts";
import type { RoomDay } from "./roomBoundary.ts";

/** Inside orientation from the outward tilt: up to 60° a ceiling, from 120° a floor, else a wall (a stated rule). */
export function orientationOf(tiltDeg: number): SurfaceOrientation {
  return tiltDeg <= 60 ? "ceiling" : tiltDeg >= 120 ? "floor" : "wall";
}

/** Hourly fractions held over each hour (k:00 to k+1:00), one value per step; 1 when there is no schedule. */
export function scheduleSteps(schedule: readonly number[] | undefined, timestepS: number): number[] {
  const steps = Math.round(86400 / timestepS);
  return Array.from({ length: steps }, (_, k) => schedule?.[Math.floor((k * timestepS) / 3600)] ?? 1);
}

/** Sensible gain of one gain per step, W. */
export function gainSteps(gain: RoomGain, timestepS: number): number[] {
  return scheduleSteps(gain.schedule, timestepS).map((f) => f * gain.sensibleW);
}

/** ρ·c·V̇ of the room's outdoor air, W/K, with ρc the stated air heat capacity. */
export function ventilationConductance(room: Room): number {
  const v = room.ventilation;
  if (v === undefined) return 0;
  const flow = v.kind === "outdoor-air" ? v.flowM3PerS : (v.perHour * room.volumeM3) / 3600;
  return DEFAULT_AIR_HEAT_CAPACITY_J_PER_M3K * flow;
}

/** Σ ψ·L + Σ χ·n, W/K. */
export function bridgeConductance(room: Room): number {
  return room.thermalBridges.reduce((s, b) => s + b.psi * b.lengthM, 0) +
    room.pointBridges.reduce((s, b) => s + b.chi * b.count, 0);
}

/** The far-side temperatures the room's opaque surfaces see on the design day. */
export interface FarSideTemperatures {
  readonly groundC: number;
}

function surfaceInput(
  surface: RoomSurface,
  construction: Construction,
  netAreaM2: number,
  day: RoomDay,
  far: FarSideTemperatures,
  timestepS: number,
): RoomSurfaceInput {
  const steps = Math.round(86400 / timestepS);
  const b = surface.boundary;
  const outsideResistance = b.kind === "outdoor"
    ? day.responseOutsideResistance.get(surface.id)!
    : construction.outsideResistance;
  return {
    id: surface.id,
    construction: {
      layers: construction.layers,
      outsideResistance,
      insideResistance: construction.insideResistance,
    },
    areaM2: netAreaM2,
    orientation: orientationOf(surface.tiltDeg),
    farSide: b.kind === "same-as-room" ? { kind: "same-as-room" } : {
      kind: "temperature",
      temperatureC: b.kind === "outdoor"
        ? day.solAirC.get(surface.id)!
        : b.kind === "ground"
        ? new Array<number>(steps).fill(far.groundC)
        : temperatureSteps(b.temperature, timestepS),
    },
  };
}

/** The engine input of the room on its design day. */
export function roomInput(
  room: Room,
  constructions: ReadonlyMap<string, Construction>,
  netAreas: readonly NetOpaqueArea[],
  day: RoomDay,
  far: FarSideTemperatures,
): RoomInput {
  const timestepS = day.boundary.timestepS;
  const net = new Map(netAreas.map((a) => [a.id, a.netAreaM2]));
  const hosts = new Map(room.surfaces.map((s) => [s.id, s]));
  const windows: RoomWindowInput[] = room.windows.map((w) => ({
    id: w.id,
    areaM2: w.areaM2,
    uValue: w.uValue,
    transmittedSolarW: day.transmittedSolarW.get(w.id)!,
    orientation: orientationOf(hosts.get(w.in)!.tiltDeg),
  }));
  const gains: RoomGainInput[] = room.gains.map((g) => ({
    name: g.name,
    sensibleW: gainSteps(g, timestepS),
    radiantFraction: g.radiantFraction,
  }));
  return {
    timestepS,
    airTemperatureC: temperatureSteps(room.airTemperature, timestepS),
    outdoorAirC: day.boundary.outdoorC,
    surfaces: room.surfaces.map((s) =>
      surfaceInput(s, constructions.get(s.construction)!, net.get(s.id)!, day, far, timestepS)
    ),
    windows,
    gains,
    ventilationWPerK: ventilationConductance(room),
    thermalBridgesWPerK: bridgeConductance(room),
  };
}

/** Latent gains per step, W (reported apart from the sensible load). */
export function latentSteps(room: Room, timestepS: number): number[] {
  const steps = Math.round(86400 / timestepS);
  const out = new Array<number>(steps).fill(0);
  for (const g of room.gains) {
    if (g.latentW === undefined) continue;
    scheduleSteps(g.schedule, timestepS).forEach((f, k) => (out[k]! += f * g.latentW!));
  }
  return out;
}
