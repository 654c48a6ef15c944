/**
 * Room plausibility rules on what heats or cools the air besides the envelope: internal gains per floor area, their
 * radiant fraction and schedule, and the ventilation rate in air changes. Subjects as in roomRules.ts.
 */

import type { Diagnostic } from "../project/diagnostic.ts";
import type { Room, RoomGain } from "../project/roomModel.ts";
import { about, finding, num, range } from "./finding.ts";
import { ROOM } from "./roomLimits.ts";

/** Checks the gains and the ventilation of one room; `floorM2` is its floor area (0: none given, densities skipped). */
export function reviewRoomGains(room: Room, floorM2: number): Diagnostic[] {
  return [
    ...about(room.id, [...gainDensity(room, floorM2), ...ventilation(room)]),
    ...room.gains.flatMap((g) =>
      about(`${room.id}/${g.name}`, [...lowGain(room, g, floorM2), ...radiantFraction(g), ...neverOn(g)])
    ),
  ];
}

function gainDensity(room: Room, floorM2: number): Diagnostic[] {
  if (floorM2 <= 0 || room.gains.length === 0) return [];
  const total = room.gains.reduce((sum, g) => sum + g.sensibleW, 0);
  const density = total / floorM2;
  if (density <= ROOM.maxGainDensity.value) return [];
  return [finding({
    severity: "warning",
    at: room.gains[0]?.at ?? room.at,
    rule: "gain-density-high",
    message:
      `Check the internal gains of room ${room.id}: ${num(total)} W over ${num(floorM2)} m² of floor is ` +
      `${num(density)} W/m²`,
    hint:
      "peak sensible gains of offices and reading rooms add up to a few tens of W/m²; check the units (kW for W) and that no gain is listed twice",
    value: `${num(density)} W/m²`,
    expected: `≤ ${num(ROOM.maxGainDensity.value)} W/m²`,
    source: ROOM.maxGainDensity.source,
  })];
}

function lowGain(room: Room, gain: RoomGain, floorM2: number): Diagnostic[] {
  if (floorM2 <= 0 || gain.sensibleW <= 0) return [];
  const density = gain.sensibleW / floorM2;
  if (density >= ROOM.minGainDensity.value) return [];
  return [finding({
    severity: "note",
    at: gain.at,
    rule: "gain-density-low",
    message: `Check the unit of gain "${gain.name}" in room ${room.id}: ${num(gain.sensibleW)} W is ` +
      `${num(density)} W/m² of floor`,
    hint: "write `3 kW` rather than `3 W` for a room full of people; a small fixed gain is fine",
    value: `${num(density)} W/m²`,
    expected: `≥ ${num(ROOM.minGainDensity.value)} W/m²`,
    source: ROOM.minGainDensity.source,
  })];
}

function radiantFraction(gain: RoomGain): Diagnostic[] {
  const f = gain.radiantFraction;
  const lo = ROOM.minRadiantFraction;
  const hi = ROOM.maxRadiantFraction;
  if (f >= lo.value && f <= hi.value) return [];
  return [finding({
    severity: "note",
    at: gain.at,
    rule: "radiant-fraction-unusual",
    message:
      `Check the radiant fraction of gain "${gain.name}": ${num(f)} is outside what handbooks give for ` +
      "internal gains",
    hint:
      "people about 0.6, lighting 0.5–0.7, fan-cooled equipment 0.1–0.2; the rest of a gain is convective",
    value: `radiant fraction = ${num(f)}`,
    expected: range(lo.value, hi.value, "").trim(),
    source: f < lo.value ? lo.source : hi.source,
  })];
}

function neverOn(gain: RoomGain): Diagnostic[] {
  const schedule = gain.schedule;
  if (schedule === undefined || schedule.some((x) => x !== 0)) return [];
  if (gain.sensibleW === 0 && (gain.latentW ?? 0) === 0) return [];
  return [finding({
    severity: "warning",
    at: gain.at,
    rule: "gain-schedule-all-zero",
    message: `Fill in the schedule of gain "${gain.name}": all 24 fractions are 0, so the gain never acts`,
    hint:
      "fraction k is the share of the peak from k:00 to k+1:00; leave `schedule` out for a gain that is always on",
    value: "schedule = 24 × 0",
    expected: "at least one fraction above 0",
    source: "common practice, no source",
  })];
}

function ventilation(room: Room): Diagnostic[] {
  const v = room.ventilation;
  if (v === undefined) return [];
  const perHour = v.kind === "air-changes" ? v.perHour : (v.flowM3PerS * 3600) / room.volumeM3;
  if (perHour === 0) return [];
  const lo = ROOM.minAirChanges;
  const hi = ROOM.maxAirChanges;
  if (perHour >= lo.value && perHour <= hi.value) return [];
  const shown = v.kind === "air-changes"
    ? `${num(perHour)} 1/h`
    : `${num(v.flowM3PerS * 1000)} l/s in ${num(room.volumeM3)} m³ = ${num(perHour)} 1/h`;
  return [finding({
    severity: perHour > hi.value ? "warning" : "note",
    at: v.at,
    rule: "ventilation-rate-unusual",
    message: `Check the ventilation of room ${room.id}: ${shown} is ${
      perHour > hi.value ? "more" : "less"
    } than rooms usually have`,
    hint: perHour > hi.value
      ? "check the unit (m^3/h against l/s is a factor 3.6; cfm against l/s 0.47) and the room's volume"
      : "a sealed room still has some infiltration; check the unit and the volume",
    value: `${num(perHour)} air changes per hour`,
    expected: range(lo.value, hi.value, "1/h"),
    source: perHour > hi.value ? hi.source : lo.source,
  })];
}
