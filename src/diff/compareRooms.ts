/**
 * Compares the `room` blocks of two revisions like scenarios: rooms by id with their own keys, then their surfaces
 * and windows by id, their gains and thermal bridges by name, each change with its place on each side.
 */
import type { Position } from "../project/position.ts";
import type { Room } from "../project/roomModel.ts";
import { compareById, type InputSide } from "./compareInputs.ts";
import type { Field } from "./fields.ts";
import {
  pointBridgeFields,
  roomFields,
  roomGainFields,
  roomSurfaceFields,
  roomWindowFields,
  thermalBridgeFields,
} from "./roomFields.ts";
import type { Change } from "./types.ts";

/** An item of a room's list under the key that identifies it (an id, or a name for gains and bridges). */
interface Keyed<T> {
  readonly id: string;
  readonly at: Position;
  readonly item: T;
}

function keyed<T extends { readonly at: Position }>(
  items: readonly T[],
  key: (item: T) => string,
): Keyed<T>[] {
  return items.map((item) => ({ id: key(item), at: item.at, item }));
}

/** Compares one list of two revisions of a room, each item as the part `<label> <key>` of the room. */
function compareList<T extends { readonly at: Position }>(
  a: InputSide,
  b: InputSide,
  room: string,
  label: string,
  lists: { readonly before: readonly T[]; readonly after: readonly T[] },
  key: (item: T) => string,
  fieldsOf: (item: T) => Field[],
  summary: (item: T) => string,
): Change[] {
  return compareById(
    "room",
    { side: a, items: keyed(lists.before, key) },
    { side: b, items: keyed(lists.after, key) },
    (k) => fieldsOf(k.item),
    (k) => summary(k.item),
    () => [],
    (id) => ({ subject: room, part: `${label} ${id}` }),
    true,
  );
}

function compareRoomLists(a: InputSide, b: InputSide, id: string, o: Room, n: Room): Change[] {
  const byId = (x: { readonly id: string }) => x.id;
  const byName = (x: { readonly name: string }) => x.name;
  return [
    ...compareList(
      a,
      b,
      id,
      "surface",
      { before: o.surfaces, after: n.surfaces },
      byId,
      roomSurfaceFields,
      (s) => `${s.boundary.kind} surface on ${s.construction}, ${s.areaM2} m²`,
    ),
    ...compareList(
      a,
      b,
      id,
      "window",
      { before: o.windows, after: n.windows },
      byId,
      roomWindowFields,
      (w) => `window in ${w.in}, ${w.areaM2} m²`,
    ),
    ...compareList(
      a,
      b,
      id,
      "gain",
      { before: o.gains, after: n.gains },
      byName,
      roomGainFields,
      (g) => `${g.sensibleW} W sensible`,
    ),
    ...compareList(
      a,
      b,
      id,
      "thermal bridge",
      { before: o.thermalBridges, after: n.thermalBridges },
      byName,
      thermalBridgeFields,
      (t) => `ψ = ${t.psi} W/(m·K) over ${t.lengthM} m`,
    ),
    ...compareList(
      a,
      b,
      id,
      "point bridge",
      { before: o.pointBridges, after: n.pointBridges },
      byName,
      pointBridgeFields,
      (p) => `χ = ${p.chi} W/K × ${p.count}`,
    ),
  ];
}

/** Lists every changed key of the two revisions' rooms. */
export function compareRooms(a: InputSide, b: InputSide): Change[] {
  return compareById(
    "room",
    { side: a, items: a.model.rooms ?? [] },
    { side: b, items: b.model.rooms ?? [] },
    (r) => roomFields(r),
    (r) => `room "${r.name}", ${r.volumeM3} m³, ${r.surfaces.length} surface(s)`,
    (id, o, n) => compareRoomLists(a, b, id, o, n),
  );
}
