/**
 * `diff` compares rooms like scenarios (issue 13): the room block's keys, surfaces, windows, gains and thermal bridges
 * with their places on each side, and the room results (results.json `rooms.<id>`) as effects.
 */
import assert from "node:assert/strict";
import { join } from "node:path";
import { loadProject } from "../../src/commands/loadProject.ts";
import { diffProjects, type DiffSide } from "../../src/diff/diffProjects.ts";
import { effectSide, effectSubject, quantityName } from "../../src/diff/display.ts";
import { compareResults } from "../../src/diff/effects.ts";
import { renderDiffText } from "../../src/diff/text.ts";
import type { Effect, EffectQuantity } from "../../src/diff/types.ts";
import { decodeSource } from "../../src/project/sourceText.ts";
import type { ResultsJson } from "../../src/results/types.ts";
import { computeProject } from "../../src/results/buildResults.ts";
import type { RoomResults } from "../../src/scenarios/room/roomTypes.ts";

const MINIMAL = new URL("../fixtures/good/minimal/", import.meta.url).pathname;

/** A room's results with the given peaks (load W at a clock hour), heat loss, H and one surface's temperatures. */
function room(p: {
  hb: [number, number];
  rts: [number, number];
  total: number;
  H: number;
  floorTemps: number[];
}): RoomResults {
  const hourly = (value: number) => Array.from({ length: 24 }, () => value);
  const surface = (temps: number[]) => ({
    construction: "EW-1",
    boundary: "ground" as const,
    grossArea: 120,
    netArea: 120,
    insideSurfaceTemperature: temps,
  });
  return {
    name: "Reading room",
    designDay: "july",
    timestep_h: 1,
    airTemperature: hourly(24),
    coolingLoad: {
      heatBalance: hourly(p.hb[0]),
      heatBalancePeak: { load: p.hb[0], time_h: p.hb[1] },
      radiantTimeSeries: {
        nonsolar: hourly(1 / 24),
        solar: hourly(1 / 24),
        retained: { nonsolar: 1, solar: 1 },
      },
      rtsMethod: hourly(p.rts[0]),
      rtsMethodPeak: { load: p.rts[0], time_h: p.rts[1] },
      difference: hourly(p.rts[0] - p.hb[0]),
      peakDifference: (p.rts[0] - p.hb[0]) / p.hb[0],
      bySource: {},
      latent: hourly(0),
    },
    outdoor: hourly(28),
    windows: {},
    surfaces: { floor: surface(p.floorTemps), roof: surface(hourly(27)) },
    meanRadiantTemperature: hourly(25),
    ground: {},
    heating: {
      transmission: p.total,
      windows: 0,
      ground: 0,
      thermalBridges: 0,
      ventilation: 0,
      total: p.total,
      scenario: "winter",
      indoor: 20,
      outdoor: -5,
      lines: [],
    },
    heatLossCoefficient: p.H,
    notes: [],
  };
}

/** A results.json holding only the given rooms (the comparison reads every other part as absent). */
function resultsWith(rooms: Record<string, RoomResults>): ResultsJson {
  return { rooms } as unknown as ResultsJson;
}

function effect(effects: readonly Effect[], subject: string, quantity: EffectQuantity): Effect {
  const found = effects.find((e) => e.subject === subject && e.quantity === quantity);
  assert.ok(found !== undefined, `no effect ${subject} ${quantity}`);
  return found;
}

Deno.test("compareResults() reports a room's load peaks and hours, design heat loss, H and surface temperatures", () => {
  const temps = (peak: number) => Array.from({ length: 24 }, (_, k) => (k === 15 ? peak : 22));
  const a = room({ hb: [5000, 23], rts: [5200, 15], total: 4000, H: 160, floorTemps: temps(26) });
  const b = room({ hb: [5500, 0], rts: [5200, 17], total: 3600, H: 144, floorTemps: temps(26.5) });
  const { effects, unchanged } = compareResults(resultsWith({ rr: a }), resultsWith({ rr: b }));
  // Relative change (new − old)/|old| (the scenario comparison's definition): 500/5000 = +0.1.
  assert.equal(effect(effects, "room:rr", "heatBalancePeak").relative, 0.1);
  // A clock hour moves the short way round: 23:00 → 00:00 is +1 h; 15:00 → 17:00 is +2 h.
  assert.equal(effect(effects, "room:rr", "heatBalancePeakTime_h").absolute, 1);
  assert.equal(effect(effects, "room:rr", "rtsMethodPeakTime_h").absolute, 2);
  assert.equal(effect(effects, "room:rr", "designHeatLoss").relative, -0.1); // (3600 − 4000)/4000
  assert.equal(effect(effects, "room:rr", "heatLossCoefficient").relative, -0.1); // (144 − 160)/160
  const floor = effect(effects, "room:rr/floor", "peakInsideSurfaceTemperature");
  assert.deepStrictEqual([floor.old, floor.new, floor.absolute, floor.relative], [26, 26.5, 0.5, null]);
  // Unchanged: the RTS method peak and the roof's highest inside temperature.
  assert.equal(effects.length, 6);
  assert.equal(unchanged, 2);
  assert.equal(effects.some((e) => e.quantity === "rtsMethodPeak"), false);
  // Shown as the package shows peaks: the hour as a clock time, the subject as a room and its surface.
  assert.equal(effectSide(effect(effects, "room:rr", "heatBalancePeakTime_h"), "old"), "23:00");
  assert.equal(effectSubject(floor), "room rr / surface floor");
  assert.equal(quantityName("rtsMethodPeak"), "peak cooling load, radiant time series method");
});

Deno.test("compareResults() lists a room present on one side only with its values against none", () => {
  const a = room({ hb: [5000, 15], rts: [5200, 15], total: 4000, H: 160, floorTemps: [26] });
  const { effects } = compareResults(resultsWith({}), resultsWith({ rr: a }));
  const peak = effect(effects, "room:rr", "heatBalancePeak");
  assert.deepStrictEqual([peak.old, peak.new, peak.relative], [null, 5000, null]);
  // A results.json written before rooms existed has no `rooms` at all.
  assert.deepStrictEqual(compareResults({} as ResultsJson, {} as ResultsJson).effects, []);
});

const DAY = "```scenario\nid: july\nkind: design-day\nindoor: 24 degC\n" +
  "outdoor: { max-dry-bulb: 28 degC, daily-range: 10 K }\ndate: 07-21\nsky: none\nsurfaces:\n" +
  "  - { id: s, construction: EW-1, area: 1 m^2, azimuth: 180 deg, tilt: 90 deg, absorptance: 0.6 }\n```\n";

/** The README's reading room on the minimal fixture's wall; `edit` rewrites its text for revision b. */
const ROOM = `# Rooms

\`\`\`room
id: reading-room
name: Reading room
design-day: july
air-temperature: 24 degC
volume: 420 m^3
surfaces:
  - { id: south-wall, construction: EW-1, area: 36 m^2, azimuth: 180 deg, tilt: 90 deg, boundary: outdoor, absorptance: 0.6 }
  - { id: roof, construction: EW-1, area: 120 m^2, tilt: 0 deg, boundary: outdoor, absorptance: 0.85 }
  - { id: floor, construction: EW-1, area: 120 m^2, tilt: 180 deg, boundary: ground, exposed-perimeter: 44 m }
  - { id: partition, construction: EW-1, area: 30 m^2, tilt: 90 deg, boundary: same-as-room }
windows:
  - { id: south-glazing, in: south-wall, area: 12 m^2, u-value: 1.4 W/(m^2 K), solar-factor: 0.40, frame-fraction: 0.2 }
gains:
  - { name: occupants, sensible: 3000 W, radiant-fraction: 0.6 }
ventilation: { outdoor-air: 400 l/s }
\`\`\`
`;

async function sideWith(rooms: string, label: string): Promise<DiffSide> {
  const folder = await Deno.makeTempDir({ prefix: "fluxnote-roomdiff-" });
  for (const name of ["project.md", "walls.md"]) Deno.copyFileSync(join(MINIMAL, name), join(folder, name));
  Deno.writeTextFileSync(join(folder, "day.md"), DAY);
  Deno.writeTextFileSync(join(folder, "rooms.md"), rooms);
  const loaded = await loadProject(folder);
  assert.ok(loaded.model !== undefined, JSON.stringify(loaded.diagnostics));
  const computed = computeProject(loaded.model, loaded.inputRecords, loaded.dataTexts);
  assert.ok(computed.ok);
  const sources = loaded.files.flatMap((f) => {
    const d = decodeSource(f.path, f.bytes);
    return d.ok ? [d.source] : [];
  });
  Deno.removeSync(folder, { recursive: true });
  return { model: loaded.model, results: computed.computed.results, label, kind: "folder", sources };
}

Deno.test("diffProjects() lists changed room keys, surfaces, windows and gains with their places on each side", async () => {
  const revised = ROOM.replace("volume: 420 m^3", "volume: 450 m^3")
    .replace("area: 120 m^2, tilt: 0 deg", "area: 126 m^2, tilt: 0 deg")
    .replace("solar-factor: 0.40", "solar-factor: 0.35")
    .replace("sensible: 3000 W", "sensible: 3.5 kW")
    .replace(
      "  - { id: partition, construction: EW-1, area: 30 m^2, tilt: 90 deg, boundary: same-as-room }\n",
      "",
    )
    .replace("ventilation:", "  - { name: lighting, sensible: 1200 W, radiant-fraction: 0.5 }\nventilation:");
  const diff = diffProjects(await sideWith(ROOM, "a"), await sideWith(revised, "b"));
  const rows = diff.changes.filter((c) => c.section === "room").map((
    c,
  ) => [c.subject, c.part, c.key, c.change, c.old, c.new, c.oldAt, c.newAt]);
  // Each place is the key's own line and column in that revision's text (1-based).
  const at = (text: string, line: number, key: string) =>
    `rooms.md:${line}:${(text.split("\n")[line - 1] ?? "").indexOf(`${key}:`) + 1}`;
  assert.deepStrictEqual(rows, [
    ["reading-room", null, "volume", "changed", 420, 450, at(ROOM, 8, "volume"), at(revised, 8, "volume")],
    [
      "reading-room",
      "surface roof",
      "area",
      "changed",
      120,
      126,
      at(ROOM, 11, "area"),
      at(revised, 11, "area"),
    ],
    [
      "reading-room",
      "surface partition",
      null,
      "removed",
      "same-as-room surface on EW-1, 30 m²",
      null,
      "rooms.md:13:5",
      null,
    ],
    [
      "reading-room",
      "window south-glazing",
      "solar-factor",
      "changed",
      0.4,
      0.35,
      at(ROOM, 15, "solar-factor"),
      at(revised, 14, "solar-factor"),
    ],
    [
      "reading-room",
      "gain occupants",
      "sensible",
      "changed",
      3000,
      3500,
      at(ROOM, 17, "sensible"),
      at(revised, 16, "sensible"),
    ],
    ["reading-room", "gain lighting", null, "added", null, "1200 W sensible", null, "rooms.md:17:5"],
  ]);
  assert.equal(diff.identical, false);
  // The text report gives the rooms their own section.
  assert.match(renderDiffText(diff), /^Rooms: 6 change\(s\)$/m);
});

Deno.test("diffProjects() of a project with a room against itself finds no room change", async () => {
  const a = await sideWith(ROOM, "a");
  assert.deepStrictEqual(diffProjects(a, a).changes, []);
});

Deno.test("diffProjects() compares a room's ventilation, boundaries, thermal bridges, and whole rooms added or removed", async () => {
  const bridged = ROOM.replace(
    "ventilation: { outdoor-air: 400 l/s }",
    "ventilation: { outdoor-air: 400 l/s }\nthermal-bridges:\n" +
      '  - { name: "wall–roof junction", psi: 0.06 W/(m K), length: 30 m, source: "invented" }',
  );
  const revised = bridged.replace("{ outdoor-air: 400 l/s }", "{ air-changes: 3 1/h }")
    .replace("tilt: 90 deg, boundary: same-as-room", "tilt: 90 deg, boundary: { adjacent: 26 degC }")
    .replace("psi: 0.06", "psi: 0.08") +
    ROOM.replace("id: reading-room", "id: annex").replace("name: Reading room", "name: Annex");
  const diff = diffProjects(await sideWith(bridged, "a"), await sideWith(revised, "b"));
  const rows = diff.changes.filter((c) => c.section === "room").map((
    c,
  ) => [c.subject, c.part, c.key, c.change, c.old, c.new, c.unit]);
  assert.deepStrictEqual(rows, [
    ["reading-room", null, "ventilation.air-changes", "added", null, 3, "1/h"],
    ["reading-room", null, "ventilation.outdoor-air", "removed", 0.4, null, "m³/s"], // 400 l/s = 0.4 m³/s
    ["reading-room", "surface partition", "boundary", "changed", "same-as-room", "adjacent", ""],
    ["reading-room", "surface partition", "adjacent", "added", null, 26, "°C"],
    ["reading-room", "thermal bridge wall–roof junction", "psi", "changed", 0.06, 0.08, "W/(m·K)"],
    ["annex", null, null, "added", null, 'room "Annex", 420 m³, 4 surface(s)', ""],
  ]);
  const removed = diffProjects(await sideWith(revised, "b"), await sideWith(bridged, "a")).changes
    .filter((c) => c.subject === "annex");
  assert.deepStrictEqual(removed.map((c) => [c.change, c.oldAt]), [["removed", "rooms.md:25:1"]]);
});
