/**
 * Extreme inputs never pass `check --strict`: a physically impossible value is a reader error, an
 * unusual but possible one a review warning. Each case edits the minimal good project at test time.
 */
import assert from "node:assert/strict";
import { join } from "node:path";
import { runCheck } from "../../src/commands/check.ts";

const GOOD = new URL("../fixtures/good/minimal/", import.meta.url).pathname;

const SITE = "site: { latitude: 52.4 deg, longitude: -1.9 deg, time-zone: 0 h }";
const DESIGN_DAY = (surface: string, site = SITE, indoor = "24 degC") =>
  [
    "```scenario",
    "id: summer",
    "kind: design-day",
    `indoor: ${indoor}`,
    "outdoor: { max-dry-bulb: 30 degC, daily-range: 10 K }",
    "date: 07-21",
    "sky: { model: clear-sky, beam-optical-depth: 0.45, diffuse-optical-depth: 2.0 }",
    site,
    "surfaces:",
    `  - ${surface}`,
    "```",
    "",
  ].join("\n");
const SURFACE = (extra: string) =>
  `{ id: s1, construction: EW-1, azimuth: 180 deg, tilt: 90 deg, area: 10 m^2, absorptance: 0.6${extra} }`;
const HEATING = (indoor: string) =>
  [
    "```scenario",
    "id: winter",
    "kind: heating",
    `indoor: ${indoor}`,
    "indoor-humidity: 0.5",
    "outdoor: { design-temperature: -4 degC }",
    "surfaces:",
    "  - { id: s1, construction: EW-1, area: 10 m^2 }",
    "```",
    "",
  ].join("\n");
const CORRECTED_WALL = (deltaU: string) =>
  [
    "```construction",
    "id: EW-2",
    "name: Corrected wall",
    "layers:",
    "  - material: mineral-wool-25",
    "    thickness: 100 mm",
    `    corrections: { fasteners: "${deltaU}", source: invented test value }`,
    "```",
    "",
  ].join("\n");
const WALL = (extraKey: string) =>
  [
    "```construction",
    "id: EW-1",
    "name: Test wall",
    "heat-flow: horizontal",
    "timestep: 1 h",
    ...(extraKey === "" ? [] : [extraKey]),
    "layers:",
    "  - { material: concrete-2200, thickness: 200 mm }",
    "  - { material: mineral-wool-25, thickness: 100 mm }",
    "  - { name: cavity, resistance: 0.18 m^2 K/W, source: ISO 6946:2017 Table 8 (from memory) }",
    "```",
    "",
  ].join("\n");

/** The values a case may change; the defaults give a project that passes `check --strict`. */
interface Inputs {
  readonly wallKey: string;
  readonly surfaceExtra: string;
  readonly area: string;
  readonly site: string;
  readonly designIndoor: string;
  readonly heatingIndoor: string;
  readonly deltaU: string;
}

const DEFAULTS: Inputs = {
  wallKey: "",
  surfaceExtra: "",
  area: "10 m^2",
  site: SITE,
  designIndoor: "24 degC",
  heatingIndoor: "20 degC",
  deltaU: "0.02 W/(m^2 K)",
};

function project(change: Partial<Inputs>): string {
  const v = { ...DEFAULTS, ...change };
  return [
    "# Walls",
    "",
    WALL(v.wallKey),
    CORRECTED_WALL(v.deltaU),
    DESIGN_DAY(SURFACE(v.surfaceExtra).replace("area: 10 m^2", `area: ${v.area}`), v.site, v.designIndoor),
    HEATING(v.heatingIndoor),
  ].join("\n");
}

interface Case {
  readonly name: string;
  readonly change: Partial<Inputs>;
  /** A fragment of the finding that must be printed. */
  readonly printed: RegExp;
}

const CASES: readonly Case[] = [
  {
    name: "heating indoor 200 °C (review warning: design indoor temperatures are 12–30 °C, from memory)",
    change: { heatingIndoor: "200 degC" },
    printed: /Scenario winter has an indoor temperature above that of any heated building/,
  },
  {
    name: "design-day indoor 95 degF = 35 °C (review warning)",
    change: { designIndoor: "95 degF" },
    printed: /Scenario summer has an indoor temperature above/,
  },
  {
    name: "surface area 1e12 m² (reader error: above 1 km², from memory)",
    change: { area: "1e12 m^2" },
    printed: /Cannot use an area of 1000000000000 m\^2/,
  },
  {
    name: "elevation 100 km (reader error: ground lies between about −430 m and 8849 m, from memory)",
    change: { site: SITE.replace(" }", ", elevation: 100 km }") },
    printed: /Elevation 100000 m is outside -500 to 9000 m/,
  },
  {
    name: "fasteners ΔU 1e6 W/(m² K) (reader error: above 1/(0.04 + 0.13) = 5.9, ISO 6946:2017 Table 7)",
    change: { deltaU: "1e6 W/(m^2 K)" },
    printed: /Cannot use a fasteners ΔU_f of 1000000 W\/\(m\^2 K\)/,
  },
  {
    name: "longwave-correction 1e6 K (reader error: above 50 K, computed from εσT⁴/h_o)",
    change: { surfaceExtra: ", longwave-correction: 1e6 K" },
    printed: /Cannot use a longwave-correction of 1000000 K/,
  },
  {
    name: "longwave-correction 20 K (review warning: ASHRAE convention ≈ 3.9 K, from memory)",
    change: { surfaceExtra: ", longwave-correction: 20 K" },
    printed: /long-wave correction outside the usual sol-air convention/,
  },
  {
    name: "outside-surface-resistance 0 (reader error: h_o would be infinite)",
    change: { wallKey: "outside-surface-resistance: 0 m^2 K/W" },
    printed: /Expected outside-surface-resistance of at least 0.01 m\^2 K\/W, found 0/,
  },
];

async function strictCheck(walls: string): Promise<{ code: number; printed: string }> {
  const folder = await Deno.makeTempDir({ prefix: "fluxnote-extreme-" });
  try {
    Deno.copyFileSync(join(GOOD, "project.md"), join(folder, "project.md"));
    Deno.writeTextFileSync(join(folder, "walls.md"), walls);
    const lines: string[] = [];
    const code = await runCheck({ project: folder, format: "text", strict: true }, {
      stdout: (l) => lines.push(l),
      stderr: (l) => lines.push(l),
    });
    return { code, printed: lines.join("\n") };
  } finally {
    await Deno.remove(folder, { recursive: true });
  }
}

Deno.test("check --strict passes the base project (each case below changes one value of it)", async () => {
  const run = await strictCheck(project({ surfaceExtra: ", longwave-correction: 3.9 K" }));
  assert.equal(run.code, 0, run.printed);
});

for (const c of CASES) {
  Deno.test(`check --strict exits 1 with a finding for ${c.name}`, async () => {
    const run = await strictCheck(project(c.change));
    assert.match(run.printed, c.printed);
    assert.equal(run.code, 1, run.printed);
  });
}
