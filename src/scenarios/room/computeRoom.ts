/**
 * A room on its design day and in its heating scenario: heat balance cooling load, the room's own radiant time
 * series and the radiant time series method load beside it, ISO 13370 ground floors and the design heat loss.
 */
import { roomCoolingLoad } from "../../engine/room/mod.ts";
import { netOpaqueAreas } from "../../engine/room/netOpaqueAreas.ts";
import type { CheckResult } from "../../engine/checkResult.ts";
import type { Assumption, Construction, HeatingScenario, Scenario } from "../../project/model.ts";
import type { Room } from "../../project/roomModel.ts";
import type { SurfaceWarning } from "../surfaceParameters.ts";
import { roomDay } from "./roomBoundary.ts";
import { latentSteps, roomInput } from "./roomInputs.ts";
import { groundFloorResults, heatingResults, roomGroundFloors, roomHeatLoss } from "./roomSteady.ts";
import { roomAssumptions } from "./roomAssumptions.ts";
import { steadyLimitChecks } from "./steadyLimit.ts";
import type { RoomResults, RoomSurfaceResults } from "./roomTypes.ts";
import { sourceLabel } from "./sourceLabel.ts";
import { peakOf } from "../seriesStats.ts";

type DesignDayScenario = Extract<Scenario, { kind: "design-day" }>;

/** What computing a room needs from the project. */
export interface RoomContext {
  readonly constructions: ReadonlyMap<string, Construction>;
  readonly designDays: ReadonlyMap<string, DesignDayScenario>;
  readonly heating: ReadonlyMap<string, HeatingScenario>;
  /** U_c of a construction for the heat loss (its U with the user's ΔU corrections), W/(m²K). */
  designU(constructionId: string): number;
}

export type RoomOutcome =
  | {
    readonly ok: true;
    readonly results: RoomResults;
    readonly checks: readonly CheckResult[];
    readonly assumptions: readonly Assumption[];
    readonly warnings: readonly SurfaceWarning[];
  }
  | { readonly ok: false; readonly message: string; readonly at: Room["at"] };

/** A load peak in results.json form: W and the clock time of its step. */
const loadPeak = (xs: readonly number[], stepH: number) => {
  const peak = peakOf(xs);
  return { load: peak.value, time_h: peak.index * stepH };
};

/** Computes one room; references were checked by the reader, so a missing one is a failure, not a throw. */
export function computeRoom(room: Room, context: RoomContext): RoomOutcome {
  /** A failure at the surface or window it concerns, when there is one, else at the room block. */
  const fail = (message: string, id?: string) => ({
    ok: false as const,
    message,
    at: [...room.surfaces, ...room.windows].find((item) => item.id === id)?.at ?? room.at,
  });
  const scenario = context.designDays.get(room.designDay);
  if (scenario === undefined) return fail(`design day "${room.designDay}" was not computed`);
  const areas = netOpaqueAreas(
    room.surfaces.map((s) => ({ id: s.id, grossAreaM2: s.areaM2 })),
    room.windows.map((w) => ({ id: w.id, hostId: w.in, areaM2: w.areaM2 })),
  );
  if (areas.kind === "rejected") return fail(areas.message);
  const floors = roomGroundFloors(room, context.constructions);
  if ("failure" in floors) return fail(`ground floor ${floors.surface}: ${floors.failure}`, floors.surface);
  const assumptions: Assumption[] = [];
  const warnings: SurfaceWarning[] = [];
  const day = roomDay(room, scenario, context.constructions, assumptions, warnings);
  const heating = room.heating === undefined ? undefined : context.heating.get(room.heating);
  const temperatures = roomAssumptions(room, day.boundary.outdoorC, heating, floors.floors, assumptions);
  const input = roomInput(room, context.constructions, areas.areas, day, { groundC: temperatures.groundC });
  const cooling = roomCoolingLoad(input);
  if (cooling.kind !== "room-cooling-load") {
    return fail(`${cooling.id === undefined ? "" : `${cooling.id}: `}${cooling.message}`, cooling.id);
  }
  const subject = `room:${room.id}`;
  const loss = heating === undefined ? undefined : roomHeatLoss(
    room,
    heating,
    context.designU,
    areas.areas,
    floors.floors,
    temperatures.annualMeanOutdoorC,
  );
  if (loss?.kind === "rejected") return fail(loss.message);
  const steady = steadyLimitChecks(input, subject);
  const stepH = day.boundary.timestepS / 3600;
  const hb = cooling.heatBalance;
  const net = new Map(areas.areas.map((a) => [a.id, a.netAreaM2]));
  const faces = new Map(hb.faces.map((f) => [f.id, f]));
  const surfaces: Record<string, RoomSurfaceResults> = Object.fromEntries(room.surfaces.map((s) => [s.id, {
    construction: s.construction,
    boundary: s.boundary.kind,
    grossArea: s.areaM2,
    netArea: net.get(s.id)!,
    insideSurfaceTemperature: faces.get(s.id)!.insideSurfaceTemperatureC,
  }]));
  const results: RoomResults = {
    name: room.name,
    designDay: room.designDay,
    timestep_h: stepH,
    airTemperature: input.airTemperatureC,
    outdoor: input.outdoorAirC,
    coolingLoad: {
      heatBalance: hb.loadW,
      heatBalancePeak: loadPeak(hb.loadW, stepH),
      radiantTimeSeries: {
        nonsolar: cooling.radiantTimeSeries.nonsolar,
        solar: cooling.radiantTimeSeries.solar,
        retained: {
          nonsolar: cooling.radiantTimeSeries.nonsolarRetained,
          solar: cooling.radiantTimeSeries.solarRetained,
        },
      },
      rtsMethod: cooling.rtsMethod.loadW,
      rtsMethodPeak: loadPeak(cooling.rtsMethod.loadW, 1),
      difference: cooling.differenceW,
      peakDifference: cooling.peakDifference,
      bySource: Object.fromEntries(hb.split.map((part) => [sourceLabel(part.source), part.loadW])),
      latent: latentSteps(room, day.boundary.timestepS),
    },
    windows: Object.fromEntries(room.windows.map((w) => [w.id, {
      in: w.in,
      area: w.areaM2,
      transmittedSolar: day.transmittedSolarW.get(w.id)!,
    }])),
    surfaces,
    meanRadiantTemperature: hb.meanRadiantTemperatureC,
    ground: Object.fromEntries(
      [...floors.floors].map(([id, floor]) => [id, groundFloorResults(floor, temperatures.groundC)]),
    ),
    ...(loss === undefined || heating === undefined ? {} : {
      heating: heatingResults(loss, heating),
      heatLossCoefficient: loss.heatLossCoefficientWPerK,
    }),
    notes: [
      ...hb.notes.map((n) => n.text),
      ...cooling.rtsMethod.notes.map((n) => n.text),
      ...[...floors.floors.values()].flatMap((f) => f.statements),
      ...(loss === undefined ? [] : loss.statements),
      ...(steady.statement === undefined ? [] : [steady.statement]),
    ],
  };
  const checks: CheckResult[] = [
    ...hb.checks.map((c) => ({ ...c, subject })),
    ...cooling.radiantTimeSeries.checks.map((c) => ({ ...c, subject })),
    ...steady.checks,
  ];
  return { ok: true, results, checks, assumptions, warnings };
}
