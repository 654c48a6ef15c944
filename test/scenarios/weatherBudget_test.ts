/**
 * A weather scenario whose rows × surfaces would pass the 2 GB a run may use is refused before any series is made,
 * with the figure, at the scenario's weather line. The per-row and per-surface costs are measured with
 * scripts/scale-weather.ts (README "Reliability"; no outside source: they are this program's own figures).
 */
import assert from "node:assert/strict";
import { join } from "node:path";
import { loadProject } from "../../src/commands/loadProject.ts";
import { formatDiagnostic } from "../../src/project/diagnostic.ts";
import { computeProject } from "../../src/results/buildResults.ts";
import {
  BASE_BYTES,
  BYTES_PER_ROW,
  BYTES_PER_SURFACE_STEP,
  MEMORY_BUDGET_BYTES,
  orientationCount,
  weatherBudget,
} from "../../src/scenarios/weatherBudget.ts";
import { surface, weatherScenario } from "./_weatherFixture.ts";

const GOOD = new URL("../fixtures/good/minimal/", import.meta.url).pathname;

const walls = (count: number, azimuths: number) =>
  Array.from({ length: count }, (_, i) =>
    surface({
      id: `s${i}`,
      construction: "EW",
      areaM2: 1,
      tiltDeg: 90,
      azimuthDeg: (i % azimuths) * 45,
      absorptance: 0.5,
    }));

Deno.test("the reported case, 1,051,200 five-minute rows × 40 surfaces, fits the 2 GB budget", () => {
  // scripts/scale-weather.ts: 3650 days at 5 min, 40 surfaces in 9 orientations (8 azimuths and a roof).
  const scenario = weatherScenario([
    ...walls(30, 8),
    ...Array.from(
      { length: 10 },
      (_, i) => surface({ id: `r${i}`, construction: "EW", areaM2: 1, tiltDeg: 0 }),
    ),
  ]);
  assert.equal(orientationCount(scenario), 9);
  const budget = weatherBudget(scenario, 1_051_200);
  assert.ok(budget.ok);
  // By hand: 1,051,200 × (320 + 16 × (40 + 9)) = 1,160,524,800 B, plus the 400 MB base = 1.56 GB ≤ 2 GB.
  assert.equal(budget.bytes, 1_051_200 * (BYTES_PER_ROW + BYTES_PER_SURFACE_STEP * 49));
  assert.ok(BASE_BYTES + budget.bytes <= MEMORY_BUDGET_BYTES);
});

Deno.test("rows × surfaces above the budget are refused with the figure and how many surfaces would fit", () => {
  const scenario = weatherScenario(walls(40, 40));
  const budget = weatherBudget(scenario, 2_900_000);
  assert.equal(budget.ok, false);
  const text = budget.ok ? "" : formatDiagnostic(budget.diagnostic);
  // 2,900,000 × (320 + 16 × 80) = 4.64e9 B + 0.4e9 = 5.04 GB; room (2 − 0.4) GB − 2.9e6 × 320 B = 0.672 GB,
  // per surface (with its own orientation) 2.9e6 × 32 B = 92.8 MB → 7 surfaces.
  assert.match(
    text,
    /error: Split scenario "test-year": 2,900,000 rows × 40 surfaces = 116,000,000 surface-steps needs about 5\.0 GB, above the 2 GB a run may use\n {2}hint: give at most about 7 surfaces here/,
  );
  // A second scenario counts what the first still holds (its CSV is written at the end).
  const small = weatherScenario(walls(1, 1));
  assert.ok(weatherBudget(small, 1_000_000).ok);
  assert.equal(weatherBudget(small, 1_000_000, MEMORY_BUDGET_BYTES - BASE_BYTES).ok, false);
});

Deno.test("a project over the budget stops at the weather line before computing any series", async () => {
  // Three years at 5 min: 315,360 rows; 400 surfaces in 8 orientations: 315,360 × (320 + 16 × 408) = 2.16 GB, plus
  // the 0.4 GB base = 2.56 GB > 2 GB. Fitting: (2e9 − 0.4e9 − 315,360 × 320) / (315,360 × 32) = 148.5 → 148.
  const folder = await Deno.makeTempDir();
  for (const name of ["project.md", "walls.md"]) Deno.copyFileSync(join(GOOD, name), join(folder, name));
  const rows: string[] = ["time,dry-bulb,global-horizontal,diffuse-horizontal"];
  const start = Date.UTC(2031, 0, 1, 0, 5);
  for (let k = 0; k < 315_360; k++) {
    rows.push(`${new Date(start + k * 300_000).toISOString().slice(0, 16)},5,0,0`);
  }
  Deno.writeTextFileSync(join(folder, "weather.csv"), `${rows.join("\n")}\n`);
  const surfaces = Array.from(
    { length: 400 },
    (_, i) =>
      `  - { id: s${i}, construction: EW-1, azimuth: ${
        (i % 8) * 45
      } deg, tilt: 90 deg, area: 1 m^2, absorptance: 0.5 }`,
  );
  Deno.writeTextFileSync(
    join(folder, "big.md"),
    [
      "```scenario",
      "id: big",
      "kind: weather",
      "timestep: 5 min",
      "weather: weather.csv",
      "period: 1095 days",
      "indoor: 21 degC",
      "site: { latitude: 52.4 deg, longitude: -1.9 deg, time-zone: 0 h }",
      "surfaces:",
      ...surfaces,
      "```",
      "",
    ].join("\n"),
  );
  const loaded = await loadProject(folder);
  assert.ok(loaded.model !== undefined, loaded.diagnostics.map(formatDiagnostic).join("\n"));
  const outcome = computeProject(loaded.model, loaded.inputRecords, loaded.dataTexts);
  assert.equal(outcome.ok, false);
  assert.deepStrictEqual((outcome.ok ? [] : outcome.diagnostics).map(formatDiagnostic), [
    'big.md:5:10: error: Split scenario "big": 315,360 rows × 400 surfaces = 126,144,000 surface-steps needs about ' +
    "2.6 GB, above the 2 GB a run may use\n" +
    "  hint: give at most about 148 surfaces here, or use a coarser time step or a shorter file",
  ]);
});
