/**
 * The design day seen by a room: sol-air temperatures of its outdoor surfaces (summer film, as the surfaces of a
 * design-day scenario) and the solar transmitted by its windows.
 */
import { type BoundarySurface, type DesignDayBoundary, designDayBoundary } from "../../climate/mod.ts";
import { designDayInput, solarBoundarySurface } from "../designDay.ts";
import type { Assumption, Construction, Scenario, ScenarioSurface } from "../../project/model.ts";
import type { Room, RoomSurface, RoomWindow } from "../../project/roomModel.ts";
import { DEFAULT_RADIANT_SPLIT } from "../../engine/room/mod.ts";
import {
  DEFAULT_GROUND_REFLECTANCE,
  ROOF_TILT_LIMIT_DEG,
  surfaceParameters,
  type SurfaceWarning,
} from "../surfaceParameters.ts";

type DesignDayScenario = Extract<Scenario, { kind: "design-day" }>;

/** The design-day series of one room. */
export interface RoomDay {
  readonly boundary: DesignDayBoundary;
  /** Sol-air temperature of each outdoor surface, °C per step. */
  readonly solAirC: ReadonlyMap<string, readonly number[]>;
  /** R_se = 1/h_o of each outdoor surface's construction response, m²K/W. */
  readonly responseOutsideResistance: ReadonlyMap<string, number>;
  /** Solar transmitted by each window, W per step. */
  readonly transmittedSolarW: ReadonlyMap<string, readonly number[]>;
}

/** A room surface as a design-day scenario surface (ids prefixed by the room, so assumptions name the room). */
function asScenarioSurface(surface: RoomSurface, absorptance: number | undefined): ScenarioSurface {
  const tilt = surface.tiltDeg;
  return {
    id: surface.id,
    construction: surface.construction,
    areaM2: surface.areaM2,
    tiltDeg: tilt,
    ...(surface.azimuthDeg === undefined ? {} : { azimuthDeg: surface.azimuthDeg }),
    ...(absorptance === undefined ? {} : { absorptance }),
    // The room's radiant time series method uses the engine's split (stated in its notes), not this one.
    radiantFraction: tilt < ROOF_TILT_LIMIT_DEG
      ? DEFAULT_RADIANT_SPLIT.ceiling
      : DEFAULT_RADIANT_SPLIT.wallOrFloor,
    at: surface.at,
  };
}

/** g(θ)/g(0) at an angle of incidence, by linear interpolation in the user's table (constant 1 when absent). */
export function solarFactorRatio(window: RoomWindow, incidenceDeg: number): number {
  const table = window.angleDependence;
  if (table === undefined || table.length === 0) return 1;
  if (incidenceDeg <= table[0]!.incidenceDeg) return table[0]!.ratio;
  for (let i = 1; i < table.length; i++) {
    const a = table[i - 1]!;
    const b = table[i]!;
    if (incidenceDeg <= b.incidenceDeg) {
      return a.ratio +
        ((b.ratio - a.ratio) * (incidenceDeg - a.incidenceDeg)) / (b.incidenceDeg - a.incidenceDeg);
    }
  }
  return table[table.length - 1]!.ratio;
}

/**
 * The ratio for isotropic diffuse irradiance: the hemispherical mean 2∫ r(θ) sin θ cos θ dθ over 0…90°, by the
 * trapezoidal rule on 0.5° steps (1 when the solar factor is constant).
 */
export function diffuseSolarFactorRatio(window: RoomWindow): number {
  if (window.angleDependence === undefined) return 1;
  const steps = 180;
  let sum = 0;
  for (let i = 0; i <= steps; i++) {
    const theta = (i / steps) * (Math.PI / 2);
    const weight = i === 0 || i === steps ? 0.5 : 1;
    sum += weight * solarFactorRatio(window, (theta * 180) / Math.PI) * Math.sin(2 * theta);
  }
  return sum * (Math.PI / 2 / steps);
}

/** Sol-air temperatures of the outdoor surfaces and the windows' transmitted solar on the room's design day. */
export function roomDay(
  room: Room,
  scenario: DesignDayScenario,
  constructions: ReadonlyMap<string, Construction>,
  assumptions: Assumption[],
  warnings: SurfaceWarning[],
): RoomDay {
  const tag = `${scenario.id}/${room.id}`;
  const outdoor = room.surfaces.filter((s) => s.boundary.kind === "outdoor");
  const solarSurfaces: BoundarySurface[] = [];
  const filmResistance = new Map<string, number>();
  for (const surface of outdoor) {
    const construction = constructions.get(surface.construction)!;
    const p = surfaceParameters(
      tag,
      asScenarioSurface(surface, surface.absorptance),
      construction,
      assumptions,
      warnings,
      "summer-design",
    );
    filmResistance.set(surface.id, p.responseOutsideResistance);
    solarSurfaces.push(solarBoundarySurface(surface.id, p));
  }
  const hosts = new Map(room.surfaces.map((s) => [s.id, s]));
  for (const window of room.windows) {
    const host = hosts.get(window.in)!;
    solarSurfaces.push({
      kind: "solar",
      id: `window:${window.id}`,
      azimuthDeg: host.azimuthDeg ?? 180,
      tiltDeg: host.tiltDeg,
      absorptance: 0,
      outsideCoefficientWPerM2K: 1,
      groundReflectance: DEFAULT_GROUND_REFLECTANCE,
      longwave: { kind: "given", correctionK: 0 },
    });
  }
  const boundary = designDayBoundary(designDayInput(scenario, solarSurfaces));
  const byId = new Map(boundary.surfaces.map((b) => [b.id, b]));
  const solAirC = new Map(outdoor.map((s) => [s.id, byId.get(s.id)!.solAirC]));
  const transmittedSolarW = new Map(room.windows.map((window) => {
    const bound = byId.get(`window:${window.id}`)!;
    const glazedG = window.areaM2 * (1 - window.frameFraction) * window.solarFactor;
    const diffuseRatio = diffuseSolarFactorRatio(window);
    const series = bound.kind === "solar"
      ? bound.irradiance.map((e) => {
        const incidence = (Math.acos(Math.min(1, Math.max(-1, e.cosIncidence))) * 180) / Math.PI;
        const beam = e.beamWPerM2 * solarFactorRatio(window, incidence);
        return glazedG * (beam + (e.skyDiffuseWPerM2 + e.groundReflectedWPerM2) * diffuseRatio);
      })
      : bound.solAirC.map(() => 0);
    return [window.id, series] as const;
  }));
  return { boundary, solAirC, responseOutsideResistance: filmResistance, transmittedSolarW };
}
