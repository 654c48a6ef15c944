/** The room's defaults, each logged in the assumptions register with its basis. */
import { DEFAULT_AIR_HEAT_CAPACITY_J_PER_M3K } from "../../engine/room/designHeatLoss.ts";
import type { GroundFloorU } from "../../engine/room/groundFloor.ts";
import type { Assumption, HeatingScenario } from "../../project/model.ts";
import { formatPosition } from "../../project/position.ts";
import type { Room } from "../../project/roomModel.ts";
import { meanOf } from "../seriesStats.ts";

/** How the ISO 13370 inputs that can default are named in the assumptions register. */
const GROUND_INPUT_NAMES: Readonly<Record<string, { key: string; text: string; unit: string }>> = {
  soilConductivityWPerMK: { key: "soil-conductivity", text: "soil conductivity λ_g", unit: "W/(m·K)" },
  wallThicknessM: { key: "ground-wall-thickness", text: "wall thickness w", unit: "m" },
  insideResistanceM2KPerW: {
    key: "ground-inside-resistance",
    text: "inside surface resistance R_si",
    unit: "m²·K/W",
  },
  outsideResistanceM2KPerW: {
    key: "ground-outside-resistance",
    text: "outside surface resistance R_se",
    unit: "m²·K/W",
  },
};

/** The temperatures the room's ground floors see, after defaults. */
export interface RoomTemperatures {
  /** Under the slab on the design day, °C. */
  readonly groundC: number;
  /** Annual mean outdoor temperature for the ISO 13370 heating loss, °C. */
  readonly annualMeanOutdoorC: number;
}

/** Fills and logs the room's defaults; returns the ground temperatures used. */
export function roomAssumptions(
  room: Room,
  outdoorC: readonly number[],
  heating: HeatingScenario | undefined,
  floors: ReadonlyMap<string, GroundFloorU>,
  assumptions: Assumption[],
): RoomTemperatures {
  const at = formatPosition(room.at);
  const log = (key: string, text: string, source: string) =>
    assumptions.push({ id: `default:${key}:${room.id}`, text, source, at });
  const hasGround = floors.size > 0;
  const dayMean = meanOf(outdoorC);
  const groundC = room.ground?.temperatureC ?? dayMean;
  if (hasGround && room.ground?.temperatureC === undefined) {
    log(
      "ground-temperature",
      `Ground temperature under the floor of ${room.id} on the design day: the day's mean outdoor temperature, ${
        dayMean.toFixed(1)
      } °C (warmer than the ground normally is, so the floor takes less heat out: conservative for cooling)`,
      "fluxnote default (common practice, no source); give ground: { temperature } from site data",
    );
  }
  const annualMeanOutdoorC = room.ground?.annualMeanOutdoorC ?? heating?.outdoorC ?? dayMean;
  if (hasGround && heating !== undefined && room.ground?.annualMeanOutdoorC === undefined) {
    log(
      "annual-mean-outdoor",
      `Annual mean outdoor temperature for the ground loss of ${room.id}: the heating design temperature, ${heating.outdoorC} °C (overstates the ground loss: conservative for heating)`,
      "fluxnote default (common practice, no source); give ground: { annual-mean-outdoor } from site data",
    );
  }
  for (const [id, floor] of floors) {
    for (const [key, used] of Object.entries(floor.inputs)) {
      const named = GROUND_INPUT_NAMES[key];
      if (!used.defaulted || named === undefined) continue;
      log(`${named.key}:${id}`, `ISO 13370 ${named.text} of ${id}: ${used.value} ${named.unit}`, used.source);
    }
  }
  for (const window of room.windows) {
    if (window.angleDependence !== undefined) continue;
    log(
      `solar-factor-angle:${window.id}`,
      `Solar factor of ${window.id} constant with the angle of incidence (g = ${window.solarFactor} for beam and diffuse; overstates the solar gain at oblique sun: conservative for cooling)`,
      "fluxnote default (common practice, no source); give solar-factor-by-angle from the glazing data",
    );
  }
  if (room.ventilation === undefined) {
    log(
      "ventilation",
      `No outdoor air for ${room.id}: ventilation and infiltration are taken as zero`,
      "no ventilation key in the room block",
    );
  } else {
    log(
      "air-heat-capacity",
      `Heat capacity of the outdoor air of ${room.id}: ρ·c = ${DEFAULT_AIR_HEAT_CAPACITY_J_PER_M3K} J/(m³·K)`,
      "ISO 13789:2017 (from memory)",
    );
  }
  for (const surface of room.surfaces) {
    const b = surface.boundary;
    if (heating === undefined || b.kind !== "adjacent" || b.heatingC !== undefined) continue;
    log(
      `adjacent-heating:${surface.id}`,
      `Space behind ${surface.id} in the heating case: at the room's set point ${heating.indoorC} °C (b = 0, no loss)`,
      "fluxnote default; give boundary: { adjacent, heating-temperature } when the space is colder",
    );
  }
  return { groundC, annualMeanOutdoorC };
}
