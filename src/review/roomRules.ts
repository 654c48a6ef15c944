/**
 * Room plausibility rules on the geometry of a `room` block: surface areas against the volume, the ceiling height the
 * floor implies, windows that fill their surface, ground floors (tilt, exposed perimeter), outdoor surfaces facing
 * down, and a room that nothing outside drives. Gains and ventilation are in roomGainRules.ts.
 *
 * Subjects (`Diagnostic.subject`, for `acknowledged: [{ rule, subject }]`): the room id for the room as a whole,
 * `<room>/<surface id>` or `<room>/<window id>` for one of its surfaces or windows, `<room>/<gain name>` for a gain.
 */

import type { Diagnostic } from "../project/diagnostic.ts";
import type { Model } from "../project/model.ts";
import type { Room, RoomSurface } from "../project/roomModel.ts";
import { about, finding, num } from "./finding.ts";
import { reviewRoomGains } from "./roomGainRules.ts";
import { ROOM } from "./roomLimits.ts";

/** Σ area of the surfaces that face down (tilt ≥ 150°): the room's floor area, m² (0 when none is given). */
export function floorArea(room: Room): number {
  return room.surfaces.filter((s) => s.tiltDeg >= ROOM.floorTilt.value).reduce((sum, s) => sum + s.areaM2, 0);
}

/** Checks every room of the model. */
export function reviewRooms(model: Model): Diagnostic[] {
  return (model.rooms ?? []).flatMap((room) => [
    ...about(room.id, [...enclosingArea(room), ...ceilingHeight(room), ...nothingOutside(room)]),
    ...room.surfaces.flatMap((s) =>
      about(`${room.id}/${s.id}`, [...groundFloor(s), ...outdoorFacingDown(s)])
    ),
    ...windowShares(room),
    ...reviewRoomGains(room, floorArea(room)),
  ]);
}

function enclosingArea(room: Room): Diagnostic[] {
  const area = room.surfaces.reduce((sum, s) => sum + s.areaM2, 0);
  const v = room.volumeM3;
  const least = ROOM.minAreaFactor.value * Math.cbrt(v * v);
  const h = ROOM.minSide.value;
  const most = (1 + ROOM.areaMargin.value) * (2 * h * h + 4 * v / h);
  const value = `Σ A = ${num(area)} m² for V = ${num(v)} m³`;
  if (area < least) {
    return [finding({
      severity: "warning",
      at: room.at,
      rule: "room-area-below-volume",
      message:
        `Add the missing surfaces of room ${room.id} or check its volume: its surfaces enclose less area than ` +
        `any box of ${num(v)} m³ has`,
      hint:
        "list every surface around the room (partitions to similar rooms as `boundary: same-as-room`), each with its gross area",
      value,
      expected: `Σ A ≥ ${num(least)} m² (0.9 × 6·V^(2/3), a cube)`,
      source: ROOM.minAreaFactor.source,
    })];
  }
  if (area > most) {
    return [finding({
      severity: "note",
      at: room.at,
      rule: "room-area-above-volume",
      message:
        `Check the volume and the surface areas of room ${room.id}: its surfaces have more area than a box ` +
        `of ${num(v)} m³ with no side under ${num(h)} m can have`,
      hint:
        "a surface counted twice, an area in ft² written as m², or a volume too small; internal mass listed as a surface adds area too",
      value,
      expected: `Σ A ≤ ${num(most)} m² (1.1 × (2h² + 4V/h), h = ${num(h)} m)`,
      source: ROOM.minSide.source,
    })];
  }
  return [];
}

function ceilingHeight(room: Room): Diagnostic[] {
  const floor = floorArea(room);
  if (floor <= 0) return [];
  const height = room.volumeM3 / floor;
  const lo = ROOM.minCeilingHeight.value;
  const hi = ROOM.maxCeilingHeight.value;
  if (height >= lo && height <= hi) return [];
  return [finding({
    severity: "note",
    at: room.at,
    rule: "room-height-unusual",
    message: `Check the volume and the floor area of room ${room.id}: together they give a mean height of ` +
      `${num(height)} m`,
    hint: height < lo
      ? "the volume may be the floor area, or a floor surface may be counted twice"
      : "a tall hall is possible; otherwise a floor surface may be missing or the volume is too large",
    value: `V / A_floor = ${num(room.volumeM3)} m³ / ${num(floor)} m² = ${num(height)} m`,
    expected: `${num(lo)}–${num(hi)} m`,
    source: height < lo ? ROOM.minCeilingHeight.source : ROOM.maxCeilingHeight.source,
  })];
}

function nothingOutside(room: Room): Diagnostic[] {
  if (room.surfaces.some((s) => s.boundary.kind === "outdoor" || s.boundary.kind === "ground")) return [];
  return [finding({
    severity: "note",
    at: room.at,
    rule: "room-without-outdoor-surface",
    message:
      `Confirm that room ${room.id} is an inner room: none of its surfaces is outdoor or on the ground`,
    hint:
      "its load comes only from gains, ventilation and adjacent spaces; add the outer wall or roof if the room has one",
  })];
}

function windowShares(room: Room): Diagnostic[] {
  return room.surfaces.flatMap((surface) => {
    const windows = room.windows.filter((w) => w.in === surface.id);
    const first = windows[0];
    if (first === undefined) return [];
    const share = windows.reduce((sum, w) => sum + w.areaM2, 0) / surface.areaM2;
    if (share <= ROOM.maxWindowShare.value) return [];
    return about(`${room.id}/${surface.id}`, [finding({
      severity: "note",
      at: first.at,
      rule: "window-fills-surface",
      message: `Check that the area of surface ${surface.id} in room ${room.id} is gross: its windows take ` +
        `${num(share * 100)} % of it`,
      hint:
        "a surface's area includes its windows; if you wrote the net wall area, add the windows' area to it",
      value: `${num(share * 100)} % of ${num(surface.areaM2)} m²`,
      expected: `≤ ${num(ROOM.maxWindowShare.value * 100)} %`,
      source: ROOM.maxWindowShare.source,
    })]);
  });
}

function groundFloor(surface: RoomSurface): Diagnostic[] {
  if (surface.boundary.kind !== "ground") return [];
  const out: Diagnostic[] = [];
  const tol = ROOM.groundTiltTolerance.value;
  if (surface.tiltDeg < 180 - tol) {
    out.push(finding({
      severity: "warning",
      at: surface.at,
      rule: "ground-surface-not-floor",
      message:
        `Check surface ${surface.id}: it is on the ground but tilted ${num(surface.tiltDeg)}°, while the ` +
        "ground loss is computed for a floor slab (tilt 180°)",
      hint:
        "a floor on the ground has tilt 180 deg; a wall against the ground is not a slab on ground, use an adjacent temperature for it",
      value: `tilt = ${num(surface.tiltDeg)}°`,
      expected: `${num(180 - tol)}–180°`,
      source: ROOM.groundTiltTolerance.source,
    }));
  }
  const p = surface.exposedPerimeterM;
  const r = ROOM.maxFloorAspect.value;
  const most = 2 * Math.sqrt(surface.areaM2) * (Math.sqrt(r) + 1 / Math.sqrt(r));
  if (p !== undefined && p > most) {
    out.push(finding({
      severity: "warning",
      at: surface.at,
      rule: "exposed-perimeter-too-long",
      message:
        `Check the exposed perimeter of surface ${surface.id}: ${num(p)} m is longer than the outline of ` +
        `any floor of ${num(surface.areaM2)} m² up to ${num(r)} times longer than wide`,
      hint:
        "the exposed perimeter is the length of this floor's edge along outside walls; the building's whole perimeter over one room's area is a common slip",
      value: `P = ${num(p)} m, A = ${num(surface.areaM2)} m²`,
      expected: `P ≤ ${num(most)} m (2·√A·(√${num(r)} + 1/√${num(r)}))`,
      source: ROOM.maxFloorAspect.source,
    }));
  }
  return out;
}

function outdoorFacingDown(surface: RoomSurface): Diagnostic[] {
  if (surface.boundary.kind !== "outdoor" || surface.tiltDeg <= ROOM.outdoorDownTilt.value) return [];
  return [finding({
    severity: "note",
    at: surface.at,
    rule: "outdoor-surface-facing-down",
    message: `Confirm that surface ${surface.id} is a floor over outdoor air: it is outdoor and faces down ` +
      `(tilt ${num(surface.tiltDeg)}°)`,
    hint: "a floor on the ground takes `boundary: ground` with its exposed perimeter; a roof has tilt 0 deg",
    value: `tilt = ${num(surface.tiltDeg)}°`,
    expected: `≤ ${num(ROOM.outdoorDownTilt.value)}° for an outdoor surface`,
    source: ROOM.outdoorDownTilt.source,
  })];
}
