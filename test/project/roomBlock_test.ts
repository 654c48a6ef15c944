/**
 * The `room` block reader: every key of the room contract (issue 13) and fluxnote's extension keys, read into
 * `Model.rooms` in SI, and the references it resolves against the model. Unit factors are checked against their
 * definitions: 1 l = 1e-3 m³ (SI, the litre as defined by the CGPM 1964), 1 h = 3600 s, 1 ft = 0.3048 m exactly
 * (international yard and pound agreement, 1959), and NIST SP 811 (2008) Appendix B.8 for the Btu_IT factors.
 */
import assert from "node:assert/strict";
import { formatDiagnostic } from "../../src/project/diagnostic.ts";
import { resolveProject } from "../../src/project/resolveProject.ts";
import { parseRoomQuantity, type RoomQuantityKind } from "../../src/project/roomQuantity.ts";

const FRONT = `---
title: Room test
reference: T-1
revision: A
status: draft
prepared-by: A
checked-by: B
date: 2031-01-15
units: SI
---
`;

const INPUTS = `# Inputs

\`\`\`construction
id: EW-1
name: Test wall
layers:
  - { material: concrete-2200, thickness: 200 mm }
\`\`\`

\`\`\`scenario
id: july
kind: design-day
indoor: 24 degC
outdoor: { max-dry-bulb: 33 degC, daily-range: 11 K }
date: 07-21
sky: none
surfaces:
  - { id: s1, construction: EW-1, azimuth: 180 deg, tilt: 90 deg, area: 10 m^2, absorptance: 0.6 }
\`\`\`

\`\`\`scenario
id: winter
kind: heating
indoor: 21 degC
indoor-humidity: 0.5
outdoor: { design-temperature: -4 degC }
surfaces:
  - { id: s1, construction: EW-1, area: 10 m^2 }
\`\`\`
`;

/** The contract's example room (issue 13), on this file's constructions, with every extension key. */
const FULL_ROOM = `\`\`\`room
id: reading-room
name: Reading room, first floor
design-day: july
heating: winter
air-temperature: 24 degC
volume: 420 m^3
surfaces:
  - { id: south-wall, construction: EW-1, area: 36 m^2, azimuth: 180 deg, tilt: 90 deg, boundary: outdoor, absorptance: 0.6 }
  - { id: roof, construction: EW-1, area: 120 m^2, tilt: 0 deg, boundary: outdoor, absorptance: 0.85 }
  - { id: floor, construction: EW-1, area: 120 m^2, tilt: 180 deg, boundary: ground, exposed-perimeter: 44 m }
  - { id: corridor-wall, construction: EW-1, area: 20 m^2, tilt: 90 deg, boundary: { adjacent: 28 degC, heating-temperature: 16 degC } }
  - { id: partition, construction: EW-1, area: 30 m^2, tilt: 90 deg, boundary: same-as-room }
windows:
  - { id: south-glazing, in: south-wall, area: 12 m^2, u-value: 1.4 W/(m^2 K), solar-factor: 0.40, frame-fraction: 0.2, solar-factor-by-angle: { 0 deg: 1.0, 60 deg: 0.85, 90 deg: 0 } }
gains:
  - { name: occupants, sensible: 3 kW, radiant-fraction: 0.6, latent: 1500 W, schedule: [0, 0, 0, 0, 0, 0, 0, 0, 1, 1, 1, 1, 0.5, 1, 1, 1, 1, 1, 0, 0, 0, 0, 0, 0] }
  - { name: lighting, sensible: 800 W, radiant-fraction: 0.67 }
ventilation: { outdoor-air: 400 l/s }
thermal-bridges:
  - { name: "wall–roof junction", psi: 0.06 W/(m K), length: 30 m, source: "invented for the test" }
point-bridges:
  - { name: bracket, chi: 0.1 W/K, count: 4, source: "invented for the test" }
  - { name: fixing, chi: -0.002 W/K }
ground: { soil-conductivity: 2.0 W/(m K), temperature: 14 degC, annual-mean-outdoor: 10 degC, wall-thickness: 400 mm }
\`\`\`
`;

function resolveRooms(rooms: string) {
  const resolved = resolveProject([
    { path: "project.md", text: FRONT },
    { path: "inputs.md", text: INPUTS },
    { path: "rooms.md", text: `# Rooms\n\n${rooms}` },
  ]);
  return { ...resolved, messages: resolved.diagnostics.map(formatDiagnostic) };
}

const near = (a: number | undefined, b: number) =>
  a !== undefined && Math.abs(a - b) <= 1e-12 * Math.max(1, Math.abs(b));

Deno.test("a room block with every contract and extension key resolves into Model.rooms in SI", () => {
  const { model, messages } = resolveRooms(FULL_ROOM);
  assert.deepStrictEqual(messages, []);
  const room = model?.rooms?.[0];
  assert.ok(room !== undefined);
  assert.equal(model?.rooms?.length, 1);
  assert.equal(room.id, "reading-room");
  assert.equal(room.name, "Reading room, first floor");
  assert.equal(room.designDay, "july");
  assert.deepStrictEqual(room.designDayAt, { file: "rooms.md", line: 6, col: 13 });
  assert.equal(room.heating, "winter");
  assert.deepStrictEqual(room.airTemperature, { kind: "constant", valueC: 24 });
  assert.equal(room.volumeM3, 420);
  assert.deepStrictEqual(
    room.surfaces.map((s) => [s.id, s.areaM2, s.tiltDeg, s.azimuthDeg, s.boundary.kind, s.absorptance]),
    [
      ["south-wall", 36, 90, 180, "outdoor", 0.6],
      ["roof", 120, 0, undefined, "outdoor", 0.85],
      ["floor", 120, 180, undefined, "ground", undefined],
      ["corridor-wall", 20, 90, undefined, "adjacent", undefined],
      ["partition", 30, 90, undefined, "same-as-room", undefined],
    ],
  );
  assert.equal(room.surfaces[2]?.exposedPerimeterM, 44);
  assert.deepStrictEqual(room.surfaces[3]?.boundary, {
    kind: "adjacent",
    temperature: { kind: "constant", valueC: 28 },
    heatingC: 16,
  });
  const window = room.windows[0];
  assert.deepStrictEqual(
    [window?.id, window?.in, window?.areaM2, window?.uValue, window?.solarFactor, window?.frameFraction],
    ["south-glazing", "south-wall", 12, 1.4, 0.4, 0.2],
  );
  // Angles pass through the unit library's radians, so 60 deg may come back as 59.99999999999999.
  const angles = window?.angleDependence ?? [];
  assert.deepStrictEqual(angles.map((p) => p.ratio), [1, 0.85, 0]);
  assert.ok([0, 60, 90].every((deg, i) => near(angles[i]?.incidenceDeg, deg)), JSON.stringify(angles));

  const [occupants, lighting] = room.gains;
  assert.equal(occupants?.sensibleW, 3000); // 3 kW = 3000 W (SI prefix)
  assert.equal(occupants?.latentW, 1500);
  assert.equal(occupants?.radiantFraction, 0.6);
  assert.equal(occupants?.schedule?.length, 24);
  assert.equal(occupants?.schedule?.[12], 0.5);
  assert.equal(lighting?.schedule, undefined);
  assert.equal(lighting?.latentW, undefined);
  assert.equal(room.ventilation?.kind, "outdoor-air");
  assert.ok(room.ventilation?.kind === "outdoor-air" && near(room.ventilation.flowM3PerS, 0.4)); // 400 l/s
  assert.deepStrictEqual(
    room.thermalBridges.map((b) => [b.name, b.psi, b.lengthM, b.source]),
    [["wall–roof junction", 0.06, 30, "invented for the test"]],
  );
  assert.deepStrictEqual(room.pointBridges.map((b) => [b.name, b.chi, b.count, b.source]), [
    ["bracket", 0.1, 4, "invented for the test"],
    ["fixing", -0.002, 1, undefined], // count defaults to 1
  ]);
  assert.equal(room.ground?.soilConductivity, 2);
  assert.equal(room.ground?.temperatureC, 14);
  assert.equal(room.ground?.annualMeanOutdoorC, 10);
  assert.ok(near(room.ground?.wallThicknessM, 0.4));
});

Deno.test("a room's optional keys stay absent, hourly air temperatures and air changes are read", () => {
  const hourly = Array.from({ length: 24 }, (_, h) => `${22 + (h % 3)} degC`).join(", ");
  const { model, messages } = resolveRooms(`\`\`\`room
id: small
design-day: july
air-temperature: [${hourly}]
volume: 30 m^3
surfaces:
  - { id: roof, construction: EW-1, area: 12 m^2, tilt: 0 deg, boundary: outdoor }
  - { id: wall, construction: EW-1, area: 9 m^2, tilt: 90 deg, boundary: { adjacent: [${hourly}] } }
ventilation: { air-changes: 0.5 1/h }
\`\`\`
`);
  assert.deepStrictEqual(messages, []);
  const room = model?.rooms?.[0];
  assert.ok(room !== undefined);
  assert.equal(room.name, "small"); // name defaults to the id, as for a construction
  assert.equal(room.heating, undefined);
  assert.equal(room.airTemperature.kind, "hourly");
  assert.equal(room.airTemperature.kind === "hourly" ? room.airTemperature.hourlyC[2] : NaN, 24);
  const wall = room.surfaces[1]?.boundary;
  assert.ok(wall?.kind === "adjacent" && wall.temperature.kind === "hourly" && wall.heatingC === undefined);
  assert.deepStrictEqual(room.ventilation, {
    kind: "air-changes",
    perHour: 0.5,
    at: { file: "rooms.md", line: 11, col: 14 },
  });
  assert.deepStrictEqual([room.windows, room.gains, room.thermalBridges, room.pointBridges], [
    [],
    [],
    [],
    [],
  ]);
  assert.equal(room.ground, undefined);
});

Deno.test("a project without room blocks has no rooms in its model", () => {
  const { model, messages } = resolveRooms("No rooms here.\n");
  assert.deepStrictEqual(messages, []);
  assert.ok(model !== undefined);
  assert.equal(model.rooms, undefined);
});

Deno.test("windows that fill their surface exactly leave a zero net area and are accepted", () => {
  const { model, messages } = resolveRooms(`\`\`\`room
id: glazed
design-day: july
air-temperature: 24 degC
volume: 30 m^3
surfaces:
  - { id: facade, construction: EW-1, area: 10 m^2, azimuth: 90 deg, tilt: 90 deg, boundary: outdoor }
windows:
  - { id: w1, in: facade, area: 7.3 m^2, u-value: 1.1 W/(m^2 K), solar-factor: 0.5, frame-fraction: 0.1 }
  - { id: w2, in: facade, area: 2.7 m^2, u-value: 1.1 W/(m^2 K), solar-factor: 0.5, frame-fraction: 0.1 }
\`\`\`
`);
  assert.deepStrictEqual(messages, []);
  assert.deepStrictEqual(model?.rooms?.[0]?.windows.map((w) => w.id), ["w1", "w2"]);
});

Deno.test("a room naming a construction or scenario that has errors of its own adds no error", () => {
  const resolved = resolveProject([
    { path: "project.md", text: FRONT },
    {
      path: "inputs.md",
      text:
        `${INPUTS}\n\`\`\`construction\nid: EW-9\nlayers: []\n\`\`\`\n\n\`\`\`scenario\nid: august\nkind: design-day\n\`\`\`\n`,
    },
    {
      path: "rooms.md",
      text: `\`\`\`room
id: r1
design-day: august
air-temperature: 24 degC
volume: 30 m^3
surfaces:
  - { id: roof, construction: EW-9, area: 12 m^2, tilt: 0 deg, boundary: outdoor }
windows:
  - { id: w1, in: roof, area: 1 m^2, u-value: 1.1 W/(m^2 K), solar-factor: 0.5, frame-fraction: 0.1 }
\`\`\`

\`\`\`room
id: r2
design-day: july
air-temperature: 24 degC
volume: 30 m^3
surfaces:
  - { id: roof, construction: EW-7, area: 12 m^2, tilt: 0 deg, boundary: outdoor }
\`\`\`
`,
    },
  ]);
  const messages = resolved.diagnostics.map(formatDiagnostic);
  // Only r2's construction, which no block defines, is an error of the rooms file.
  assert.deepStrictEqual(messages.filter((m) => m.startsWith("rooms.md")), [
    'rooms.md:18:31: error: Unknown construction "EW-7" in surface roof\n  hint: did you mean "EW-1"? Constructions defined: EW-1, EW-9',
  ], messages.join("\n"));
});

Deno.test("an unclosed room fence is reported, never read to the end of the file in silence", () => {
  const { messages } = resolveRooms("```room\nid: r1\n\nMore prose.\n");
  assert.ok(
    messages.some((m) => m.startsWith("rooms.md:3:1: error: The room block opened here")),
    messages.join("\n"),
  );
});

Deno.test("room quantities convert by their unit definitions", () => {
  const cases: [string, RoomQuantityKind, number][] = [
    ["400 l/s", "airFlow", 0.4], // 1 l = 1e-3 m³
    ["1440 m^3/h", "airFlow", 0.4], // 1 h = 3600 s
    ["0.4 m^3/s", "airFlow", 0.4],
    ["100 cfm", "airFlow", 100 * 0.3048 ** 3 / 60], // 1 ft = 0.3048 m exactly
    ["100 ft^3 / min", "airFlow", 100 * 0.3048 ** 3 / 60],
    ["0.5 1/h", "airChangeRate", 0.5],
    ["0.5 h^-1", "airChangeRate", 0.5],
    ["3.5 kW", "power", 3500],
    ["1000 BTU/h", "power", 293.07107017], // NIST SP 811 B.8: 1 Btu_IT/h = 0.293 071 1 W
    ["420 m^3", "volume", 420],
    ["500 L", "volume", 0.5],
    ["1000 ft^3", "volume", 28.316846592], // (0.3048 m)³ × 1000
    ["0.06 W/(m K)", "linearTransmittance", 0.06],
    ["0.06 W/(m*K)", "linearTransmittance", 0.06],
    ["1 BTU/(h ft degF)", "linearTransmittance", 1.730735], // NIST SP 811 B.8: 1.730 735 W/(m·K)
    ["0.1 W/K", "pointTransmittance", 0.1],
    ["1 BTU/(h degF)", "pointTransmittance", 0.5275279], // 0.2930711 W / (5/9 K)
  ];
  for (const [text, kind, expected] of cases) {
    const result = parseRoomQuantity(text, kind);
    assert.ok(result.ok, `${text}: ${result.ok ? "" : result.message}`);
    assert.ok(
      Math.abs(result.value - expected) <= 1e-6 * expected,
      `${text} → ${result.value}, expected ${expected}`,
    );
  }
});

Deno.test("room quantities refuse bare numbers, decimal commas, other units and hidden characters", () => {
  const refused: [string, RoomQuantityKind, RegExp][] = [
    ["400", "airFlow", /^Missing unit in an air flow rate "400"/],
    ["0,5 1/h", "airChangeRate", /a comma is not accepted/],
    ["400 l/min", "airFlow", /^Cannot read the unit "l\/min" of an air flow rate$/],
    ["3 kg", "power", /^Cannot read the unit "kg"/],
    ["0x10 W", "power", /only decimal numbers/],
    ["W 10", "power", /does not start with a number/],
    ["1e13 W", "power", /out of range/],
    ["10\u200B W", "power", /invisible or direction-control/],
  ];
  for (const [text, kind, pattern] of refused) {
    const result = parseRoomQuantity(text, kind);
    assert.ok(!result.ok, text);
    assert.match(result.message, pattern);
    assert.ok(result.hint.length > 0);
  }
});
