/**
 * Plausibility rules for rooms (issue 13, `check` gains room rules). Each room below is the README's reading room
 * (V = 420 m³, floor 120 m², surfaces 326 m²) with one value changed; the thresholds and their sources are in
 * src/review/roomLimits.ts and repeated beside each check.
 */
import assert from "node:assert/strict";
import type { Diagnostic } from "../../src/project/diagnostic.ts";
import { reviewProject } from "../../src/review/mod.ts";
import { reviewRooms } from "../../src/review/roomRules.ts";
import { construction, modelOf } from "./_project.ts";

const WALL = construction("EW-1", "External wall", ["{ material: concrete-2200, thickness: 200 mm }"]);
const DAY = "```scenario\nid: dd\nkind: design-day\nindoor: 24 degC\n" +
  "outdoor: { max-dry-bulb: 28 degC, daily-range: 10 K }\ndate: 07-21\nsky: none\nsurfaces:\n" +
  "  - { id: s, construction: EW-1, area: 1 m^2, azimuth: 180 deg, tilt: 90 deg, absorptance: 0.6 }\n```\n";

interface RoomParts {
  volume?: string;
  surfaces?: readonly string[];
  windows?: readonly string[];
  gains?: readonly string[];
  ventilation?: string;
}

const SURFACES = [
  "{ id: south-wall, construction: EW-1, area: 36 m^2, azimuth: 180 deg, tilt: 90 deg, boundary: outdoor }",
  "{ id: roof, construction: EW-1, area: 120 m^2, tilt: 0 deg, boundary: outdoor }",
  "{ id: floor, construction: EW-1, area: 120 m^2, tilt: 180 deg, boundary: ground, exposed-perimeter: 44 m }",
  "{ id: corridor-wall, construction: EW-1, area: 20 m^2, tilt: 90 deg, boundary: { adjacent: 28 degC } }",
  "{ id: partition, construction: EW-1, area: 30 m^2, tilt: 90 deg, boundary: same-as-room }",
];
const WINDOWS = [
  "{ id: south-glazing, in: south-wall, area: 12 m^2, u-value: 1.4 W/(m^2 K), solar-factor: 0.4, frame-fraction: 0.2 }",
];
const GAINS = ["{ name: occupants, sensible: 3000 W, radiant-fraction: 0.6 }"];

function list(key: string, items: readonly string[]): string {
  return items.length === 0 ? "" : `${key}:\n${items.map((i) => `  - ${i}`).join("\n")}\n`;
}

function roomBlock(p: RoomParts): string {
  return "```room\nid: rr\ndesign-day: dd\nair-temperature: 24 degC\n" +
    `volume: ${p.volume ?? "420 m^3"}\n` + list("surfaces", p.surfaces ?? SURFACES) +
    list("windows", p.windows ?? WINDOWS) + list("gains", p.gains ?? GAINS) +
    `ventilation: ${p.ventilation ?? "{ outdoor-air: 400 l/s }"}\n` + "```\n";
}

function findings(p: RoomParts): Diagnostic[] {
  return reviewRooms(modelOf(WALL + DAY + roomBlock(p)));
}

function rules(p: RoomParts): string[] {
  return findings(p).map((f) => f.rule);
}

/** The reading room with one surface replaced (by index). */
function withSurface(index: number, surface: string): string[] {
  return SURFACES.map((s, i) => (i === index ? surface : s));
}

Deno.test("the README's reading room raises no room finding", () => {
  assert.deepStrictEqual(rules({}), []);
});

Deno.test("room-area-below-volume: surfaces enclosing less than 0.9 × 6·V^(2/3) (the cube, the least-area box) are a warning", () => {
  // 0.9 × 6 × 500^(2/3) = 340.2 m² > 326 m² (computed); 0.9 × 6 × 450^(2/3) = 317.1 m² < 326 m².
  assert.deepStrictEqual(rules({ volume: "500 m^3" }), ["room-area-below-volume"]);
  assert.deepStrictEqual(rules({ volume: "450 m^3" }), []);
  const [f] = findings({ volume: "500 m^3" });
  assert.equal(f?.severity, "warning");
  assert.equal(f?.subject, "rr");
  assert.match(f?.source ?? "", /computed: a cube/);
});

Deno.test("room-area-above-volume: more area than 1.1 × (2h² + 4V/h) with h = 2 m (the thinnest box) is a note", () => {
  // V = 140 m³: 1.1 × (8 + 280) = 316.8 m² < 326 m²; V = 150 m³: 1.1 × 308 = 338.8 m² (computed).
  // Both volumes also give a mean height V/120 m² below 2.2 m.
  assert.deepStrictEqual(rules({ volume: "140 m^3" }), ["room-area-above-volume", "room-height-unusual"]);
  assert.deepStrictEqual(rules({ volume: "150 m^3" }), ["room-height-unusual"]);
});

Deno.test("room-height-unusual: volume over the floor area (surfaces with tilt ≥ 150°) outside 2.2–6 m is a note", () => {
  // 250 / 120 = 2.08 m; 270 / 120 = 2.25 m (common practice, no source).
  assert.deepStrictEqual(rules({ volume: "250 m^3" }), ["room-height-unusual"]);
  assert.deepStrictEqual(rules({ volume: "270 m^3" }), []);
  // A 60 m² floor with a tall 130 m² partition: 370 / 60 = 6.17 m; 355 / 60 = 5.92 m.
  const tall = withSurface(2, SURFACES[2]!.replace("120 m^2", "60 m^2")).map((s, i) =>
    i === 4 ? s.replace("30 m^2", "130 m^2") : s
  );
  assert.deepStrictEqual(rules({ volume: "370 m^3", surfaces: tall }), ["room-height-unusual"]);
  assert.deepStrictEqual(rules({ volume: "355 m^3", surfaces: tall }), []);
});

Deno.test("room-without-outdoor-surface: a room with neither an outdoor nor a ground surface is a note", () => {
  const inner = [
    "{ id: north, construction: EW-1, area: 36 m^2, tilt: 90 deg, boundary: { adjacent: 26 degC } }",
    "{ id: ceiling, construction: EW-1, area: 120 m^2, tilt: 0 deg, boundary: same-as-room }",
    "{ id: floor, construction: EW-1, area: 120 m^2, tilt: 180 deg, boundary: same-as-room }",
    "{ id: partition, construction: EW-1, area: 50 m^2, tilt: 90 deg, boundary: same-as-room }",
  ];
  assert.deepStrictEqual(rules({ surfaces: inner, windows: [] }), ["room-without-outdoor-surface"]);
  assert.deepStrictEqual(rules({ surfaces: withSurface(1, inner[1]!), windows: WINDOWS }), []);
});

Deno.test("window-fills-surface: windows over 90 % of their surface's gross area are a note on the window", () => {
  const window = (area: number) => [WINDOWS[0]!.replace("12 m^2", `${area} m^2`)];
  // 33 / 36 = 91.7 %; 32 / 36 = 88.9 % (common practice, no source).
  const model = modelOf(WALL + DAY + roomBlock({ windows: window(33) }));
  const found = reviewRooms(model);
  assert.deepStrictEqual(found.map((f) => f.rule), ["window-fills-surface"]);
  assert.equal(found[0]?.subject, "rr/south-wall");
  assert.deepStrictEqual(found[0]?.at, model.rooms?.[0]?.windows[0]?.at);
  assert.deepStrictEqual(rules({ windows: window(32) }), []);
});

Deno.test("ground-surface-not-floor: a ground surface tilted below 170° (not a slab on ground) is a warning", () => {
  const floor = (tilt: number) => withSurface(2, SURFACES[2]!.replace("180 deg", `${tilt} deg`));
  // ISO 13370 slab on ground is a floor (tilt 180); ±10° tolerance is common practice, no source.
  assert.deepStrictEqual(rules({ surfaces: floor(169) }), ["ground-surface-not-floor"]);
  assert.deepStrictEqual(rules({ surfaces: floor(170) }), []);
  assert.equal(findings({ surfaces: floor(90) })[0]?.subject, "rr/floor");
});

Deno.test("exposed-perimeter-too-long: P above 2·√A·(√10 + 1/√10) (a 10:1 rectangle) is a warning", () => {
  const perimeter = (p: number) => withSurface(2, SURFACES[2]!.replace("44 m", `${p} m`));
  // A = 120 m²: 2 × √120 × (√10 + 1/√10) = 76.21 m (computed).
  assert.deepStrictEqual(rules({ surfaces: perimeter(77) }), ["exposed-perimeter-too-long"]);
  assert.deepStrictEqual(rules({ surfaces: perimeter(76) }), []);
});

Deno.test("outdoor-surface-facing-down: an outdoor surface tilted beyond 135° is a note", () => {
  const roof = (tilt: number) =>
    withSurface(1, SURFACES[1]!.replace("tilt: 0 deg", `azimuth: 0 deg, tilt: ${tilt} deg`));
  assert.deepStrictEqual(rules({ surfaces: roof(136) }), ["outdoor-surface-facing-down"]);
  assert.deepStrictEqual(rules({ surfaces: roof(135) }), []);
});

Deno.test("gain-density-high: sensible gains above 100 W/m² of floor are a warning (offices 20–60 W/m², from memory)", () => {
  // 12 001 W / 120 m² = 100.008 W/m²; 12 000 W / 120 m² = 100 W/m².
  const gain = (w: number) => [`{ name: occupants, sensible: ${w} W, radiant-fraction: 0.6 }`];
  assert.deepStrictEqual(rules({ gains: gain(12001) }), ["gain-density-high"]);
  assert.deepStrictEqual(rules({ gains: gain(12000) }), []);
});

Deno.test("gain-density-low: one gain below 0.5 W/m² of floor is a note on that gain (kW written as W)", () => {
  // 59 W / 120 m² = 0.49 W/m²; 60 W / 120 m² = 0.5 W/m² (common practice, no source).
  const gains = (w: number) => [...GAINS, `{ name: lighting, sensible: ${w} W, radiant-fraction: 0.6 }`];
  const found = findings({ gains: gains(59) });
  assert.deepStrictEqual(found.map((f) => f.rule), ["gain-density-low"]);
  assert.equal(found[0]?.subject, "rr/lighting");
  assert.deepStrictEqual(rules({ gains: gains(60) }), []);
});

Deno.test("radiant-fraction-unusual: a gain's radiant fraction outside 0.1–0.8 is a note (ASHRAE RTS tables, from memory)", () => {
  const gain = (f: number) => [`{ name: occupants, sensible: 3000 W, radiant-fraction: ${f} }`];
  assert.deepStrictEqual(rules({ gains: gain(0.09) }), ["radiant-fraction-unusual"]);
  assert.deepStrictEqual(rules({ gains: gain(0.1) }), []);
  assert.deepStrictEqual(rules({ gains: gain(0.8) }), []);
  assert.deepStrictEqual(rules({ gains: gain(0.85) }), ["radiant-fraction-unusual"]);
});

Deno.test("gain-schedule-all-zero: a gain whose 24 schedule fractions are all 0 never acts, a warning", () => {
  const gain = (first: number) => [
    `{ name: occupants, sensible: 3000 W, radiant-fraction: 0.6, schedule: [${first}${", 0".repeat(23)}] }`,
  ];
  assert.deepStrictEqual(rules({ gains: gain(0) }), ["gain-schedule-all-zero"]);
  assert.deepStrictEqual(rules({ gains: gain(0.5) }), []);
});

Deno.test("ventilation-rate-unusual: outside 0.1–20 air changes per hour (flows by the room's volume)", () => {
  // 2400 l/s × 3600 s/h / 420 m³ = 20.6 1/h (a warning); 0.05 1/h is a note; 0 (no ventilation) is fine.
  const found = findings({ ventilation: "{ outdoor-air: 2400 l/s }" });
  assert.deepStrictEqual(found.map((f) => [f.rule, f.severity]), [["ventilation-rate-unusual", "warning"]]);
  assert.deepStrictEqual(rules({ ventilation: "{ air-changes: 20 1/h }" }), []);
  assert.deepStrictEqual(
    findings({ ventilation: "{ air-changes: 0.05 1/h }" }).map((f) => [f.rule, f.severity]),
    [["ventilation-rate-unusual", "note"]],
  );
  assert.deepStrictEqual(rules({ ventilation: "{ air-changes: 0 1/h }" }), []);
});

Deno.test("reviewProject runs the room rules", () => {
  const model = modelOf(WALL + DAY + roomBlock({ volume: "500 m^3" }));
  assert.ok(reviewProject(model).some((f) => f.rule === "room-area-below-volume" && f.subject === "rr"));
});
