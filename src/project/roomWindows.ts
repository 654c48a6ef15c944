/** Reads the `windows` of a `room` block and checks each sits in an outdoor surface of the room that can hold it. */
import { type Diagnostic, error, errorCount } from "./diagnostic.ts";
import {
  describe,
  type Fields,
  missing,
  quantityOf,
  readFields,
  readId,
  readNumber,
  readText,
  withSuggestion,
} from "./fields.ts";
import type { Position } from "./position.ts";
import { describeCodePoints, parseQuantity } from "./quantity.ts";
import { readItems, requirePositive, shown, valueAt } from "./roomFields.ts";
import type { RoomSurface, RoomWindow } from "./roomModel.ts";
import type { YamlValue } from "./yamlTree.ts";

/** Allowed keys of a window (`solar-factor-by-angle` is fluxnote's extension). */
export const ROOM_WINDOW_KEYS = [
  "id",
  "in",
  "area",
  "u-value",
  "solar-factor",
  "frame-fraction",
  "solar-factor-by-angle",
] as const;
const WINDOW_EXAMPLE =
  "{ id: south-glazing, in: south-wall, area: 12 m^2, u-value: 1.4 W/(m^2 K), solar-factor: 0.40, frame-fraction: 0.2 }";
const U_VALUE = { unit: "W/(m^2 K)", example: "1.4 W/(m^2 K)" };
const ANGLE_EXAMPLE =
  "`solar-factor-by-angle: { 0 deg: 1.0, 40 deg: 0.97, 60 deg: 0.85, 80 deg: 0.45, 90 deg: 0 }`";
/** Relative slack on the gross area when windows fill a surface exactly (rounding of areas written by hand). */
const AREA_SLACK = 1e-9;

/** What the windows are checked against: the room's surfaces as read, and every surface id written (read or not). */
export interface WindowHosts {
  readonly surfaces: readonly RoomSurface[];
  readonly writtenIds: ReadonlySet<string>;
}

/** Reads the room's windows; ids share `seen` with the surfaces. */
export function readRoomWindows(
  fields: Fields,
  hosts: WindowHosts,
  seen: Map<string, string>,
  out: Diagnostic[],
): RoomWindow[] {
  const windows = readItems(
    fields,
    "windows",
    WINDOW_EXAMPLE,
    out,
    (item, index) => readWindow(item, index, hosts, out),
    { seen, idOf: (w) => w.id, what: "window" },
  );
  checkNetAreas(windows, hosts.surfaces, out);
  return windows;
}

function readWindow(
  item: YamlValue,
  index: number,
  hosts: WindowHosts,
  out: Diagnostic[],
): RoomWindow | undefined {
  const window = readFields(item, ROOM_WINDOW_KEYS, `window ${index + 1}`, out);
  if (window === undefined) return undefined;
  const before = errorCount(out);
  const id = readId(window, "id", out)?.id;
  const host = readHost(window, id ?? String(index + 1), hosts, out);
  const areaEntry = window.entries.get("area");
  const areaM2 = areaEntry === undefined
    ? missing(window, "area", "12 m^2", out)
    : quantityOf(areaEntry.value, "area", `"area" in the ${window.what}`, out);
  requirePositive(window, "area", areaM2, "m^2", "give the whole window's area, frame included", out);
  const uEntry = window.entries.get("u-value");
  const uValue = uEntry === undefined
    ? missing(window, "u-value", U_VALUE.example, out)
    : quantityOf(uEntry.value, "coefficient", `"u-value" in the ${window.what}`, out, U_VALUE);
  requirePositive(window, "u-value", uValue, "W/(m^2 K)", "give the window's U_w, frame included", out);
  const solarFactor = requiredFraction(window, "solar-factor", "0.40", out);
  const frameFraction = requiredFraction(window, "frame-fraction", "0.2", out);
  const angleDependence = readAngleDependence(window, out);
  if (
    errorCount(out) > before || id === undefined || host === undefined || areaM2 === undefined ||
    uValue === undefined || solarFactor === undefined || frameFraction === undefined
  ) return undefined;
  return {
    id,
    in: host,
    areaM2,
    uValue,
    solarFactor,
    frameFraction,
    at: window.at,
    ...(angleDependence === undefined ? {} : { angleDependence }),
  };
}

function requiredFraction(
  fields: Fields,
  key: string,
  example: string,
  out: Diagnostic[],
): number | undefined {
  if (!fields.entries.has(key)) return missing(fields, key, example, out);
  return readNumber(fields, key, 0, 1, out);
}

/** The id of the outdoor surface of this room the window sits in. */
function readHost(window: Fields, label: string, hosts: WindowHosts, out: Diagnostic[]): string | undefined {
  const host = readText(window, "in", out, { example: "south-wall" });
  if (host === undefined) return undefined;
  const surface = hosts.surfaces.find((s) => s.id === host);
  if (surface === undefined) {
    // A surface with errors of its own was reported there; naming it adds nothing.
    if (hosts.writtenIds.has(host)) return undefined;
    const ids = [...hosts.writtenIds];
    out.push(
      error(
        valueAt(window, "in"),
        "unknown-surface",
        `Unknown surface "${
          describeCodePoints(host)
        }" for window ${label}: "in" names a surface of this room`,
        withSuggestion(host, ids, `surfaces of this room: ${ids.join(", ") || "none"}`),
      ),
    );
    return undefined;
  }
  if (surface.boundary.kind !== "outdoor") {
    out.push(
      error(
        valueAt(window, "in"),
        "window-not-outdoor",
        `Cannot place window ${label} in surface ${host}: its boundary is ${surface.boundary.kind}, not outdoor`,
        "put the window in an outdoor surface; glazing in an inside wall belongs to that wall's construction",
      ),
    );
    return undefined;
  }
  return host;
}

/** `{ 0 deg: 1.0, 60 deg: 0.85, … }`: g(θ)/g(0) at incidence angles from 0 deg, increasing, up to 90 deg. */
function readAngleDependence(window: Fields, out: Diagnostic[]): RoomWindow["angleDependence"] {
  const entry = window.entries.get("solar-factor-by-angle");
  if (entry === undefined) return undefined;
  const what = `"solar-factor-by-angle" in the ${window.what}`;
  const fail = (at: Position, message: string): undefined => {
    out.push(
      error(
        at,
        "angle-table",
        message,
        `write the ratio g(θ)/g(0) at increasing angles, e.g. ${ANGLE_EXAMPLE}`,
      ),
    );
    return undefined;
  };
  if (entry.value.kind !== "map") {
    return fail(
      entry.value.at,
      `Expected a mapping of incidence angles to ratios for ${what}, found ${describe(entry.value)}`,
    );
  }
  const points: { incidenceDeg: number; ratio: number }[] = [];
  for (const pair of entry.value.entries) {
    const angle = parseQuantity(pair.key, "angle");
    if (!angle.ok) {
      out.push(error(pair.keyAt, "bad-quantity", `${angle.message} (for an angle of ${what})`, angle.hint));
      return undefined;
    }
    const ratio = pair.value;
    if (ratio.kind !== "scalar" || typeof ratio.value !== "number" || ratio.value < 0 || ratio.value > 1) {
      return fail(
        ratio.at,
        `Expected a plain number from 0 to 1 at ${pair.key} of ${what}, found ${describe(ratio)}`,
      );
    }
    const previous = points.at(-1);
    if (angle.value < 0 || angle.value > 90) {
      return fail(pair.keyAt, `Incidence angle ${shown(angle.value)} deg of ${what} is outside 0 to 90 deg`);
    }
    if (previous !== undefined && !(angle.value > previous.incidenceDeg)) {
      return fail(
        pair.keyAt,
        `Incidence angle ${shown(angle.value)} deg of ${what} does not follow ${
          shown(previous.incidenceDeg)
        } deg`,
      );
    }
    points.push({ incidenceDeg: angle.value, ratio: ratio.value });
  }
  const first = points[0];
  if (points.length < 2 || first === undefined || first.incidenceDeg !== 0 || first.ratio !== 1) {
    return fail(
      entry.value.at,
      `Expected ${what} to start at 0 deg with the ratio 1 and give at least one more angle, found ${points.length} point(s)${
        first === undefined ? "" : ` starting at ${shown(first.incidenceDeg)} deg with ${shown(first.ratio)}`
      }`,
    );
  }
  return points;
}

/** The windows of one surface together may not exceed its gross area (the opaque net area would be negative). */
function checkNetAreas(
  windows: readonly RoomWindow[],
  surfaces: readonly RoomSurface[],
  out: Diagnostic[],
): void {
  const used = new Map<string, number>();
  const reported = new Set<string>();
  for (const window of windows) {
    const surface = surfaces.find((s) => s.id === window.in);
    if (surface === undefined || reported.has(surface.id)) continue;
    const total = (used.get(surface.id) ?? 0) + window.areaM2;
    used.set(surface.id, total);
    if (total <= surface.areaM2 * (1 + AREA_SLACK)) continue;
    reported.add(surface.id);
    const message = total === window.areaM2
      ? `Window ${window.id} is larger than surface ${surface.id}: ${
        shown(total)
      } m^2 against a gross area of ${shown(surface.areaM2)} m^2`
      : `Windows in surface ${surface.id} total ${
        shown(total)
      } m^2 with window ${window.id}, more than its gross area of ${shown(surface.areaM2)} m^2`;
    out.push(
      error(
        window.at,
        "window-larger-than-surface",
        message,
        "the surface's area is gross (windows included): enlarge the surface's area or make the windows smaller",
      ),
    );
  }
}
