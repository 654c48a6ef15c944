/** The room's steady parts: ISO 13370 ground floors and the design heat loss table of its heating scenario. */
import { designHeatLoss, type DesignHeatLossResult } from "../../engine/room/designHeatLoss.ts";
import { type GroundFloorU, groundFloorU } from "../../engine/room/groundFloor.ts";
import type { NetOpaqueArea } from "../../engine/room/netOpaqueAreas.ts";
import { steadyState } from "../../engine/steady.ts";
import type { Construction, HeatingScenario } from "../../project/model.ts";
import type { Room } from "../../project/roomModel.ts";
import type { GroundFloorResults, RoomHeatingResults } from "./roomTypes.ts";

/** ISO 13370 U of each ground surface of the room, or the message of the first input it rejects. */
export function roomGroundFloors(
  room: Room,
  constructions: ReadonlyMap<string, Construction>,
): { readonly floors: Map<string, GroundFloorU> } | { readonly failure: string; readonly surface: string } {
  const floors = new Map<string, GroundFloorU>();
  for (const surface of room.surfaces) {
    if (surface.boundary.kind !== "ground") continue;
    const result = groundFloorU({
      areaM2: surface.areaM2,
      exposedPerimeterM: surface.exposedPerimeterM ?? NaN,
      // R_f: the floor's layers, surface films excluded.
      floorResistanceM2KPerW: steadyState(constructions.get(surface.construction)!).layersResistance,
      ...(room.ground?.soilConductivity === undefined
        ? {}
        : { soilConductivityWPerMK: room.ground.soilConductivity }),
      ...(room.ground?.wallThicknessM === undefined ? {} : { wallThicknessM: room.ground.wallThicknessM }),
    });
    if (result.kind === "rejected") return { failure: result.message, surface: surface.id };
    floors.set(surface.id, result);
  }
  return { floors };
}

/** results.json form of an ISO 13370 floor. */
export function groundFloorResults(floor: GroundFloorU, designDayGroundC: number): GroundFloorResults {
  const inputs = Object.fromEntries(
    Object.entries(floor.inputs).map(([key, used]) => [key, { ...used }]),
  );
  return {
    U: floor.uValueWPerM2K,
    characteristicDimension: floor.characteristicDimensionM,
    equivalentThickness: floor.equivalentThicknessM,
    branch: floor.branch,
    inputs,
    designDayGroundTemperature: designDayGroundC,
  };
}

/** The design heat loss of the room under its heating scenario (U_c of each construction, ISO 13370 U of floors). */
export function roomHeatLoss(
  room: Room,
  heating: HeatingScenario,
  designU: (constructionId: string) => number,
  netAreas: readonly NetOpaqueArea[],
  floors: ReadonlyMap<string, GroundFloorU>,
  annualMeanOutdoorC: number,
): DesignHeatLossResult {
  const net = new Map(netAreas.map((a) => [a.id, a.netAreaM2]));
  return designHeatLoss({
    indoorC: heating.indoorC,
    outdoorC: heating.outdoorC,
    annualMeanOutdoorC,
    surfaces: room.surfaces.map((s) => ({
      id: s.id,
      uValueWPerM2K: s.boundary.kind === "ground" ? floors.get(s.id)!.uValueWPerM2K : designU(s.construction),
      netAreaM2: net.get(s.id)!,
      boundary: s.boundary.kind === "adjacent"
        ? { kind: "adjacent", temperatureC: s.boundary.heatingC ?? heating.indoorC }
        : { kind: s.boundary.kind },
    })),
    windows: room.windows.map((w) => ({ id: w.id, hostId: w.in, areaM2: w.areaM2, uValueWPerM2K: w.uValue })),
    linearBridges: room.thermalBridges.map((b) => ({ name: b.name, psiWPerMK: b.psi, lengthM: b.lengthM })),
    pointBridges: room.pointBridges.map((b) => ({ name: b.name, chiWPerK: b.chi, count: b.count })),
    ...(room.ventilation === undefined ? {} : {
      ventilation: room.ventilation.kind === "outdoor-air"
        ? { kind: "outdoor-air", flowM3PerS: room.ventilation.flowM3PerS }
        : { kind: "air-changes", perHour: room.ventilation.perHour, volumeM3: room.volumeM3 },
    }),
  });
}

/** results.json form of the heat loss table. */
export function heatingResults(
  loss: Extract<DesignHeatLossResult, { kind: "design-heat-loss" }>,
  heating: HeatingScenario,
): RoomHeatingResults {
  return {
    ...loss.subtotalsW,
    scenario: heating.id,
    indoor: heating.indoorC,
    outdoor: heating.outdoorC,
    lines: loss.lines.map((line) => ({
      group: line.group,
      id: line.id,
      formula: line.formula,
      quantities: line.quantities.map((q) => ({ ...q })),
      H: line.hWPerK,
      deltaT: line.deltaTK,
      phi: line.phiW,
    })),
  };
}
