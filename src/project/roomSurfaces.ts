/** Reads the `surfaces` of a `room` block: each with its construction, gross area, orientation and boundary. */
import { type Diagnostic, error, errorCount } from "./diagnostic.ts";
import {
  type Fields,
  readFields,
  readId,
  readNumber,
  readQuantity,
  textOf,
  withSuggestion,
} from "./fields.ts";
import { MAX_SURFACE_AREA, withinBound } from "./physicalBounds.ts";
import { describeCodePoints } from "./quantity.ts";
import { notAllowed, readItems, readMetres, requirePositive, requireWithin, valueAt } from "./roomFields.ts";
import type { RoomBoundary, RoomSurface } from "./roomModel.ts";
import { readTemperatureProfile } from "./scenarioBlock.ts";
import { readKnownConstruction } from "./surfaceList.ts";
import type { YamlValue } from "./yamlTree.ts";

/** Allowed keys of a room surface. */
export const ROOM_SURFACE_KEYS = [
  "id",
  "construction",
  "area",
  "azimuth",
  "tilt",
  "boundary",
  "absorptance",
  "exposed-perimeter",
] as const;
/** Allowed keys of an `adjacent` boundary (`heating-temperature` is fluxnote's extension). */
export const ADJACENT_KEYS = ["adjacent", "heating-temperature"] as const;
const BOUNDARY_WORDS = ["outdoor", "ground", "same-as-room"] as const;
const SURFACE_EXAMPLE =
  "{ id: south-wall, construction: EW-2, area: 36 m^2, azimuth: 180 deg, tilt: 90 deg, boundary: outdoor, absorptance: 0.6 }";

/** Reads the room's surfaces; their ids go into `seen` (surface and window ids share one name space). */
export function readRoomSurfaces(
  fields: Fields,
  constructionIds: readonly string[],
  seen: Map<string, string>,
  out: Diagnostic[],
): RoomSurface[] {
  return readItems(
    fields,
    "surfaces",
    SURFACE_EXAMPLE,
    out,
    (item, index) => readRoomSurface(item, index, constructionIds, out),
    { seen, idOf: (s) => s.id, what: "surface" },
    true,
  );
}

function readRoomSurface(
  item: YamlValue,
  index: number,
  constructionIds: readonly string[],
  out: Diagnostic[],
): RoomSurface | undefined {
  const surface = readFields(item, ROOM_SURFACE_KEYS, `surface ${index + 1}`, out);
  if (surface === undefined) return undefined;
  const before = errorCount(out);
  const id = readId(surface, "id", out)?.id;
  const label = id ?? String(index + 1);
  const construction = readKnownConstruction(surface, label, constructionIds, out);
  const areaM2 = readQuantity(surface, "area", "area", out, true);
  withinBound(areaM2, MAX_SURFACE_AREA, "an area of", valueAt(surface, "area"), out);
  requirePositive(
    surface,
    "area",
    areaM2,
    "m^2",
    "give the gross area of the surface, windows in it included",
    out,
  );
  const tiltDeg = readQuantity(surface, "tilt", "angle", out, true);
  requireWithin(surface, "tilt", tiltDeg, { min: 0, max: 180, unit: "deg" }, out);
  const azimuthDeg = readQuantity(surface, "azimuth", "angle", out);
  requireWithin(surface, "azimuth", azimuthDeg, { min: 0, max: 360, unit: "deg" }, out);
  const boundary = readBoundary(surface, out);
  const absorptance = readNumber(surface, "absorptance", 0, 1, out);
  const exposedPerimeterM = readMetres(surface, "exposed-perimeter", "44 m", out);
  requirePositive(
    surface,
    "exposed-perimeter",
    exposedPerimeterM,
    "m",
    "give the floor's exposed perimeter P",
    out,
  );
  checkBoundaryKeys(surface, label, boundary, tiltDeg, out);
  if (
    errorCount(out) > before || id === undefined || construction === undefined || areaM2 === undefined ||
    tiltDeg === undefined || boundary === undefined
  ) return undefined;
  return {
    id,
    construction,
    areaM2,
    tiltDeg,
    boundary,
    at: surface.at,
    ...(azimuthDeg === undefined ? {} : { azimuthDeg }),
    ...(absorptance === undefined ? {} : { absorptance }),
    ...(exposedPerimeterM === undefined ? {} : { exposedPerimeterM }),
  };
}

/** `outdoor`, `ground`, `same-as-room`, or `{ adjacent: <temperature or 24 values>, heating-temperature: <temperature> }`. */
function readBoundary(surface: Fields, out: Diagnostic[]): RoomBoundary | undefined {
  const entry = surface.entries.get("boundary");
  if (entry === undefined) {
    out.push(
      error(
        surface.at,
        "missing-key",
        `Missing required key "boundary" in the ${surface.what}`,
        "add what lies beyond it: `boundary: outdoor`, `ground`, `same-as-room` or `{ adjacent: 28 degC }`",
      ),
    );
    return undefined;
  }
  if (entry.value.kind === "map") return readAdjacent(entry.value, out);
  const word = textOf(entry.value, `"boundary" in the ${surface.what}`, out);
  if (word === undefined) return undefined;
  const kind = BOUNDARY_WORDS.find((w) => w === word);
  if (kind === undefined) {
    out.push(
      error(
        entry.value.at,
        "bad-choice",
        `Unknown value "${describeCodePoints(word)}" for "boundary" in the ${surface.what}`,
        withSuggestion(
          word,
          [...BOUNDARY_WORDS, "adjacent"],
          "write one of: outdoor, ground, same-as-room, or `{ adjacent: 28 degC }` for a space at a given temperature",
        ),
      ),
    );
    return undefined;
  }
  return { kind };
}

function readAdjacent(value: YamlValue, out: Diagnostic[]): RoomBoundary | undefined {
  const adjacent = readFields(value, ADJACENT_KEYS, "adjacent boundary", out);
  if (adjacent === undefined) return undefined;
  if (!adjacent.entries.has("adjacent")) {
    out.push(
      error(
        adjacent.at,
        "missing-key",
        'Missing required key "adjacent" in the adjacent boundary',
        "give the temperature of the space beyond, e.g. `boundary: { adjacent: 28 degC }` (or 24 hourly values)",
      ),
    );
    return undefined;
  }
  const before = errorCount(out);
  const temperature = readTemperatureProfile(adjacent, "adjacent", out);
  const heatingC = readQuantity(adjacent, "heating-temperature", "temperature", out);
  if (errorCount(out) > before || temperature === undefined) return undefined;
  return { kind: "adjacent", temperature, ...(heatingC === undefined ? {} : { heatingC }) };
}

/** The keys whose presence depends on the boundary: exposed perimeter (ground only), absorptance and azimuth (outdoor). */
function checkBoundaryKeys(
  surface: Fields,
  label: string,
  boundary: RoomBoundary | undefined,
  tiltDeg: number | undefined,
  out: Diagnostic[],
): void {
  if (boundary === undefined) return;
  if (boundary.kind === "ground" && !surface.entries.has("exposed-perimeter")) {
    out.push(
      error(
        surface.at,
        "missing-key",
        `Missing "exposed-perimeter" for surface ${label} on the ground: ISO 13370 needs it`,
        "add the length of the floor's edge against the outside, e.g. `exposed-perimeter: 44 m`",
      ),
    );
  }
  if (boundary.kind !== "ground") {
    notAllowed(
      surface,
      "exposed-perimeter",
      `a surface with boundary ${boundary.kind}`,
      "remove `exposed-perimeter`, or set `boundary: ground` if the surface lies on the ground",
      out,
    );
  }
  if (boundary.kind !== "outdoor") {
    notAllowed(
      surface,
      "absorptance",
      `a surface with boundary ${boundary.kind} (no sun reaches its far side)`,
      "remove `absorptance`, or set `boundary: outdoor` if the surface faces the outdoor air",
      out,
    );
    return;
  }
  if (tiltDeg !== undefined && tiltDeg > 0 && tiltDeg < 180 && !surface.entries.has("azimuth")) {
    out.push(
      error(
        surface.at,
        "missing-key",
        `Missing "azimuth" for the outdoor surface ${label} tilted at ${tiltDeg} deg: the sun on it depends on it`,
        "add e.g. `azimuth: 180 deg` (clockwise from north); only a horizontal surface (tilt 0 or 180 deg) needs none",
      ),
    );
  }
}
