/**
 * `check` on a project with planted room mistakes (test/fixtures/review/planted-room/rooms.md tells each): every room
 * rule is reported at its place with its subject, and an acknowledgement by rule and subject in project.md accepts
 * one of them. Thresholds and their sources: test/review/roomRules_test.ts and src/review/roomLimits.ts.
 */
import assert from "node:assert/strict";
import { runCheck } from "../../src/commands/check.ts";

const PLANTED = new URL("../fixtures/review/planted-room/", import.meta.url).pathname;

interface JsonFinding {
  readonly severity: string;
  readonly rule: string;
  readonly at: string;
  readonly subject: string;
  readonly acknowledged: unknown;
}

const EXPECTED = [
  "note room-height-unusual@rooms.md:9:1 office", // 100 m³ / 130 m² = 0.77 m (< 2.2 m)
  "note room-area-above-volume@rooms.md:9:1 office", // 263 m² > 1.1 × (2·2² + 4·100/2) = 228.8 m²
  "warning exposed-perimeter-too-long@rooms.md:16:5 office/floor", // 140 m > 6.96·√120 = 76.2 m
  "note outdoor-surface-facing-down@rooms.md:17:5 office/soffit", // tilt 180° > 135°
  "note window-fills-surface@rooms.md:19:5 office/south-wall", // 12 / 13 = 92 % (> 90 %)
  "warning gain-density-high@rooms.md:21:5 office", // 16 200 W / 130 m² = 125 W/m² (> 100)
  "note radiant-fraction-unusual@rooms.md:21:5 office/equipment", // 0.95 > 0.8
  "warning gain-schedule-all-zero@rooms.md:22:5 office/lighting",
  "warning ventilation-rate-unusual@rooms.md:23:14 office", // 1.44 m³/s × 3600 / 100 m³ = 51.8 1/h (> 20)
  "warning room-area-below-volume@rooms.md:29:1 store", // 100 m² < 0.9 × 6 × 80^(2/3) = 100.5 m²
  "note room-without-outdoor-surface@rooms.md:29:1 store",
  "warning ground-surface-not-floor@rooms.md:48:5 plant/retaining-wall", // tilt 90° < 170°
  "note gain-density-low@rooms.md:53:5 plant/controls", // 2 W / 50 m² = 0.04 W/m² (< 0.5)
];

Deno.test("check reports each planted room mistake at its place with its room subject, and honours an acknowledgement", async () => {
  const stdout: string[] = [];
  const code = await runCheck({ project: PLANTED, format: "json", strict: false }, {
    stdout: (l) => stdout.push(l),
    stderr: () => {},
  });
  assert.equal(code, 0);
  const found = (JSON.parse(stdout.join("\n")) as { findings: JsonFinding[] }).findings;
  // The room rules' findings; defaults logged when the rooms are computed (`default-used`) are not under test here.
  const room = found.filter((f) => f.at.startsWith("rooms.md") && f.rule !== "default-used");
  assert.deepStrictEqual(room.map((f) => `${f.severity} ${f.rule}@${f.at} ${f.subject}`), EXPECTED);
  const acknowledged = room.filter((f) => f.acknowledged !== null).map((f) => `${f.rule} ${f.subject}`);
  assert.deepStrictEqual(acknowledged, ["room-without-outdoor-surface store"]);
  // Nothing else but notes outside the rooms: the walls and the design day are clean apart from logged defaults.
  assert.deepStrictEqual(found.filter((f) => !f.at.startsWith("rooms.md") && f.severity !== "note"), []);
});
