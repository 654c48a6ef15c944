/** Reads `room` blocks (README, "Rooms") into `Room`s, with their references resolved against the model. */
import type { SplitFile } from "./blocks.ts";
import { brokenIds } from "./brokenBlocks.ts";
import { type Diagnostic, error, errorCount } from "./diagnostic.ts";
import { type Fields, readFields, readId, readText, withSuggestion } from "./fields.ts";
import { formatPosition, type Position } from "./position.ts";
import { describeCodePoints } from "./quantity.ts";
import { notAllowed, requirePositive } from "./roomFields.ts";
import { readGains, readGround, readPointBridges, readThermalBridges, readVentilation } from "./roomLoads.ts";
import type { Room } from "./roomModel.ts";
import { readRoomQuantity } from "./roomQuantity.ts";
import { readRoomSurfaces } from "./roomSurfaces.ts";
import { readRoomWindows } from "./roomWindows.ts";
import { readTemperatureProfile } from "./scenarioBlock.ts";
import type { YamlValue } from "./yamlTree.ts";

/** Allowed keys of a room block (`point-bridges` is fluxnote's extension). */
export const ROOM_KEYS = [
  "id",
  "name",
  "design-day",
  "heating",
  "air-temperature",
  "volume",
  "surfaces",
  "windows",
  "gains",
  "ventilation",
  "thermal-bridges",
  "point-bridges",
  "ground",
] as const;

/** What a room may name: constructions and scenarios by id, by kind; ids of blocks with errors of their own. */
export interface RoomReferences {
  /** Construction ids, those of constructions with errors included (they are reported at the construction). */
  readonly constructionIds: readonly string[];
  /** Scenario id → its kind (`design-day`, `weather`, `heating`), for the scenarios that were read. */
  readonly scenarioKinds: ReadonlyMap<string, string>;
  /** Ids of scenario blocks that have errors of their own. */
  readonly brokenScenarios: ReadonlySet<string>;
}

/** The references rooms are checked against, from the constructions and scenarios read before them. */
export function roomReferences(
  files: readonly SplitFile[],
  constructionIds: readonly string[],
  scenarios: readonly { readonly id: string; readonly kind: string }[],
): RoomReferences {
  const scenarioKinds = new Map(scenarios.map((s) => [s.id, s.kind]));
  return {
    constructionIds,
    scenarioKinds,
    brokenScenarios: brokenIds(files, "scenario", new Set(scenarioKinds.keys())),
  };
}

/** Reads every room block of the project in reading order; a room id used twice is an error at the second. */
export function readRooms(files: readonly SplitFile[], refs: RoomReferences, out: Diagnostic[]): Room[] {
  const rooms: Room[] = [];
  for (const file of files) {
    for (const piece of file.pieces) {
      if (piece.kind !== "input" || piece.blockKind !== "room" || piece.value === undefined) continue;
      const room = readRoomBlock(piece.value, refs, out);
      if (room === undefined) continue;
      const earlier = rooms.find((r) => r.id === room.id);
      if (earlier !== undefined) {
        out.push(
          error(
            room.at,
            "duplicate-id",
            `Duplicate room id "${room.id}": already defined at ${formatPosition(earlier.at)}`,
            "rename one of the two rooms or delete the copy",
          ),
        );
        continue;
      }
      rooms.push(room);
    }
  }
  return rooms;
}

/** Reads and validates one room block. */
export function readRoomBlock(value: YamlValue, refs: RoomReferences, out: Diagnostic[]): Room | undefined {
  const fields = readFields(value, ROOM_KEYS, "room block", out);
  if (fields === undefined) return undefined;
  const before = errorCount(out);
  const id = readId(fields, "id", out);
  const name = readText(fields, "name", out) ?? id?.id ?? "";
  const designDay = readScenarioRef(fields, "design-day", refs, out, true);
  const heating = readScenarioRef(fields, "heating", refs, out, false);
  const airTemperature = readTemperatureProfile(fields, "air-temperature", out);
  const volumeM3 = readRoomQuantity(fields, "volume", "volume", out, true);
  requirePositive(
    fields,
    "volume",
    volumeM3,
    "m^3",
    "give the room's air volume, e.g. `volume: 420 m^3`",
    out,
  );
  const seen = new Map<string, string>();
  const surfaces = readRoomSurfaces(fields, refs.constructionIds, seen, out);
  const windows = readRoomWindows(fields, { surfaces, writtenIds: writtenSurfaceIds(fields) }, seen, out);
  const gains = readGains(fields, out);
  const ventilation = readVentilation(fields, out);
  const thermalBridges = readThermalBridges(fields, out);
  const pointBridges = readPointBridges(fields, out);
  const ground = readGround(fields, out);
  if (!writtenBoundaries(fields).includes("ground")) {
    notAllowed(
      fields,
      "ground",
      "a room with no surface on the ground",
      "remove `ground`, or give the floor `boundary: ground` and its `exposed-perimeter`",
      out,
    );
  }
  if (
    errorCount(out) > before || id === undefined || designDay === undefined || airTemperature === undefined ||
    volumeM3 === undefined
  ) return undefined;
  return {
    id: id.id,
    name,
    designDay: designDay.id,
    designDayAt: designDay.at,
    ...(heating === undefined ? {} : { heating: heating.id, heatingAt: heating.at }),
    airTemperature,
    volumeM3,
    surfaces,
    windows,
    gains,
    ...(ventilation === undefined ? {} : { ventilation }),
    thermalBridges,
    pointBridges,
    ...(ground === undefined ? {} : { ground }),
    at: fields.at,
  };
}

const WANTED_KIND = { "design-day": "design-day", "heating": "heating" } as const;

/** A scenario named by `design-day` (a `kind: design-day` scenario) or `heating` (a `kind: heating` one). */
function readScenarioRef(
  fields: Fields,
  key: keyof typeof WANTED_KIND,
  refs: RoomReferences,
  out: Diagnostic[],
  required: boolean,
): { id: string; at: Position } | undefined {
  const named = readId(fields, key, out, false);
  if (named === undefined) {
    if (required && !fields.entries.has(key)) {
      out.push(
        error(
          fields.at,
          "missing-key",
          `Missing required key "${key}" in the room block`,
          "name the design-day scenario that drives the room, e.g. `design-day: july-design-day`",
        ),
      );
    }
    return undefined;
  }
  const wanted = WANTED_KIND[key];
  const kind = refs.scenarioKinds.get(named.id);
  if (kind === wanted) return named;
  if (refs.brokenScenarios.has(named.id)) return undefined;
  if (kind !== undefined) {
    out.push(
      error(
        named.at,
        "wrong-scenario-kind",
        `Cannot use scenario "${named.id}" as the room's ${key}: it is a ${kind} scenario, not a ${wanted} one`,
        `name a scenario of \`kind: ${wanted}\`${key === "heating" ? ", or remove `heating`" : ""}`,
      ),
    );
    return undefined;
  }
  const candidates = [...refs.scenarioKinds].filter(([, k]) => k === wanted).map(([id]) => id);
  out.push(
    error(
      named.at,
      "unknown-scenario",
      `Unknown scenario "${describeCodePoints(named.id)}" for "${key}" in the room block`,
      withSuggestion(
        named.id,
        candidates,
        `${wanted} scenarios defined: ${
          candidates.join(", ") || `none (add a scenario block with \`kind: ${wanted}\`)`
        }`,
      ),
    ),
  );
  return undefined;
}

/** The surfaces' YAML items as written (mappings only). */
function writtenSurfaces(fields: Fields): Extract<YamlValue, { kind: "map" }>[] {
  const list = fields.entries.get("surfaces")?.value;
  if (list?.kind !== "list") return [];
  return list.items.filter((item): item is Extract<YamlValue, { kind: "map" }> => item.kind === "map");
}

function scalarOf(item: Extract<YamlValue, { kind: "map" }>, key: string): string | undefined {
  const value = item.entries.find((e) => e.key === key)?.value;
  return value?.kind === "scalar" && value.value !== null ? String(value.value) : undefined;
}

/** Every surface id written in the block, whether or not its surface was read without errors. */
function writtenSurfaceIds(fields: Fields): Set<string> {
  return new Set(writtenSurfaces(fields).map((s) => scalarOf(s, "id")).filter((id) => id !== undefined));
}

/** Every boundary word written in the block (a surface with errors counts, so `ground` adds no second error). */
function writtenBoundaries(fields: Fields): string[] {
  return writtenSurfaces(fields).map((s) => scalarOf(s, "boundary")).filter((b) => b !== undefined);
}
