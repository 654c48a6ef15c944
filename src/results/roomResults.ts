/** The project's rooms, computed after its constructions and scenarios (results.json `rooms`). */
import type { SteadyState } from "../engine/steady.ts";
import { type Diagnostic, error } from "../project/diagnostic.ts";
import type { Assumption, Model, Scenario } from "../project/model.ts";
import { computeRoom } from "../scenarios/room/computeRoom.ts";
import type { RoomResults } from "../scenarios/room/roomTypes.ts";
import type { CheckResult } from "./types.ts";

type DesignDayScenario = Extract<Scenario, { kind: "design-day" }>;

export interface RoomParts {
  readonly results?: Record<string, RoomResults>;
  readonly checks: readonly CheckResult[];
  readonly assumptions: readonly Assumption[];
  readonly warnings: readonly { at: string; message: string }[];
  readonly problems: readonly Diagnostic[];
}

/** Computes every room block; a room that cannot be computed is an error at its block. */
export function computeRooms(
  model: Model,
  steady: Readonly<Record<string, SteadyState>>,
  correctedU: ReadonlyMap<string, number>,
): RoomParts {
  const rooms = model.rooms ?? [];
  if (rooms.length === 0) return { checks: [], assumptions: [], warnings: [], problems: [] };
  const context = {
    constructions: new Map(model.constructions.map((c) => [c.id, c])),
    designDays: new Map(
      model.scenarios.filter((s): s is DesignDayScenario => s.kind === "design-day").map((s) => [s.id, s]),
    ),
    heating: new Map((model.heatingScenarios ?? []).map((h) => [h.id, h])),
    designU: (id: string) => correctedU.get(id) ?? steady[id]?.uValue ?? NaN,
  };
  const results: Record<string, RoomResults> = {};
  const checks: CheckResult[] = [];
  const assumptions: Assumption[] = [];
  const warnings: { at: string; message: string }[] = [];
  const problems: Diagnostic[] = [];
  for (const room of rooms) {
    const outcome = computeRoom(room, context);
    if (!outcome.ok) {
      problems.push(error(
        outcome.at,
        "room-unresolvable",
        `Cannot compute room "${room.id}": ${outcome.message}`,
        "check the room's surfaces, windows and the constructions they name",
      ));
      continue;
    }
    results[room.id] = outcome.results;
    checks.push(...outcome.checks);
    assumptions.push(...outcome.assumptions);
    warnings.push(...outcome.warnings);
  }
  return { results, checks, assumptions, warnings, problems };
}

/**
 * The model with every design day's `radiant-time-series: { room }` filled in with that room's own non-solar
 * series (unchanged when no design day names a room).
 */
export function withRoomSeries(
  model: Model,
  rooms: Readonly<Record<string, RoomResults>> | undefined,
): Model {
  if (!model.scenarios.some((s) => s.kind === "design-day" && s.radiantTimeSeries?.room !== undefined)) {
    return model;
  }
  return {
    ...model,
    scenarios: model.scenarios.map((s) => {
      const room = s.kind === "design-day" ? s.radiantTimeSeries?.room : undefined;
      const series = room === undefined ? undefined : rooms?.[room]?.coolingLoad.radiantTimeSeries.nonsolar;
      return s.kind !== "design-day" || s.radiantTimeSeries === undefined || series === undefined
        ? s
        : { ...s, radiantTimeSeries: { ...s.radiantTimeSeries, values: [...series] } };
    }),
  };
}
