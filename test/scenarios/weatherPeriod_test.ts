/**
 * What a weather file covers is stated and checked: exactly one calendar year (8760 h, or 8784 h across 29 February,
 * Gregorian calendar) is a weather year; anything shorter is refused unless the scenario says `period:` and the file
 * covers exactly that, and then every label says the period. (Static cases: test/fixtures/hostile/weather-one-row,
 * weather-ten-days-no-period, weather-period-mismatch.)
 */
import assert from "node:assert/strict";
import { join } from "node:path";
import { weatherSpan } from "../../src/climate/weatherSpan.ts";
import { runBuild } from "../../src/commands/build.ts";
import { loadProject } from "../../src/commands/loadProject.ts";
import { formatDiagnostic } from "../../src/project/diagnostic.ts";
import { computeProject } from "../../src/results/buildResults.ts";
import { computeWeatherYear } from "../../src/scenarios/weatherYear.ts";
import { parseDocument } from "../report/dom.ts";
import { weatherScenarioBlock } from "./_scenarioBlocks.ts";
import { construction, context, surface, weather, weatherScenario, yearCsv } from "./_weatherFixture.ts";

const GOOD = new URL("../fixtures/good/minimal/", import.meta.url).pathname;
const HOUR = 3600;
const time = (y: number, mo: number, d: number, h: number) => ({
  year: y,
  month: mo,
  day: d,
  hour: h,
  minute: 0,
});

/** `rows` hourly rows from 2031-01-01T01:00 with a plain daily dry-bulb swing and no sun. */
function hourlyCsv(rows: number): string {
  const lines = ["time,dry-bulb,global-horizontal,diffuse-horizontal"];
  for (let k = 0; k < rows; k++) {
    const s = Date.UTC(2031, 0, 1, 1 + k) / 1000;
    const t = new Date(s * 1000).toISOString().slice(0, 16);
    lines.push(`${t},${(5 + 3 * Math.sin((2 * Math.PI * k) / 24)).toFixed(1)},0,0`);
  }
  return `${lines.join("\n")}\n`;
}

async function project(csv: string, extra = ""): Promise<string> {
  const folder = await Deno.makeTempDir();
  for (const name of ["project.md", "walls.md"]) Deno.copyFileSync(join(GOOD, name), join(folder, name));
  Deno.writeTextFileSync(join(folder, "weather.csv"), csv);
  Deno.writeTextFileSync(
    join(folder, "short.md"),
    `# Short\n\n${weatherScenarioBlock("weather.csv", { id: "short", extra: extra === "" ? [] : [extra] })}`,
  );
  return folder;
}

Deno.test("weatherSpan(): a year is 8760 h, or 8784 h when the year holds 29 February (Gregorian calendar)", () => {
  assert.equal(weatherSpan(time(2031, 1, 1, 1), 8760, HOUR).isYear, true);
  assert.equal(weatherSpan(time(2031, 1, 1, 1), 8759, HOUR).isYear, false);
  assert.equal(weatherSpan(time(2031, 1, 1, 1), 8784, HOUR).isYear, false);
  // 2032 is a leap year: 366 days × 24 h = 8784 h.
  assert.equal(weatherSpan(time(2032, 1, 1, 1), 8784, HOUR).isYear, true);
  assert.equal(weatherSpan(time(2032, 1, 1, 1), 8760, HOUR).isYear, false);
  // July 2031 → July 2032 holds 29 February 2032.
  assert.equal(weatherSpan(time(2031, 7, 1, 1), 8784, HOUR).isYear, true);
  // Sub-hourly: 8760 × 4 rows at 15 min from 2031-01-01T00:15.
  const quarter = { year: 2031, month: 1, day: 1, hour: 0, minute: 15 };
  assert.equal(weatherSpan(quarter, 8760 * 4, 900).isYear, true);
  const span = weatherSpan(time(2031, 1, 1, 1), 240, HOUR);
  assert.deepStrictEqual([span.first, span.last, span.spanS], [
    "2031-01-01T01:00",
    "2031-01-11T00:00",
    240 * HOUR,
  ]);
});

Deno.test("a weather file one hour short of a year is refused at the weather line, naming what it covers", async () => {
  const loaded = await loadProject(await project(hourlyCsv(8759)));
  const outcome = computeProject(loaded.model!, loaded.inputRecords, loaded.dataTexts);
  assert.equal(outcome.ok, false);
  const lines = (outcome.ok ? [] : outcome.diagnostics).map(formatDiagnostic);
  assert.deepStrictEqual(lines, [
    'short.md:6:10: error: Give a whole year of weather or state the period: "weather.csv" covers 8759 h ' +
    "(364.96 days), 2031-01-01T01:00 … 2031-12-31T23:00, 8759 rows at 1 h\n" +
    "  hint: add `period: 8759 h` to the scenario if this repeating period is meant; a year is 8760 h (8784 h " +
    "across 29 February) of rows ending one year after the first interval begins",
  ]);
});

Deno.test("a 10-day file with `period: 10 days` builds, and every label says the period, not a year", async () => {
  const folder = await project(hourlyCsv(240), "period: 10 days");
  const out = join(folder, "out");
  const lines: string[] = [];
  assert.equal(
    await runBuild({ project: folder, out }, { stdout: () => {}, stderr: (l) => lines.push(l) }),
    0,
  );
  const results = JSON.parse(Deno.readTextFileSync(join(out, "results.json")));
  const short = results.scenarios.short;
  assert.deepStrictEqual(short.period, {
    kind: "period",
    days: 10,
    first: "2031-01-01T01:00",
    last: "2031-01-11T00:00",
  });
  assert.equal(short.weather.steps, 240); // existing keys kept
  assert.ok(
    short.notes.some((n: string) =>
      /^Weather period, not a year: the file covers a period of 10 days/.test(n)
    ),
  );
  const warmUp = results.assumptions.find((a: { id: string }) => a.id === "rule:weather-warm-up:short");
  assert.match(warmUp.text, /as if the period of 10 days repeated/);
  assert.doesNotMatch(warmUp.text, /year/);
  const doc = parseDocument(Deno.readTextFileSync(join(out, "package.html")));
  const output = doc.querySelector(".scenario-output")!;
  const text = output.textContent!;
  assert.match(text, /Weather period of 10 days \(not a year/);
  assert.match(
    text,
    /No monthly totals or monthly plot: the weather file of short covers a period of 10 days/,
  );
  assert.match(text, /a period of 10 days that repeats for the warm-up/);
  assert.equal(output.querySelector("table.monthly"), null, "a monthly table for a 10-day period");
  assert.equal(output.querySelector("[id$='-monthly']"), null, "a January–December plot for a 10-day period");
  assert.doesNotMatch(text, /January|weather year|periodic-year/i);
});

Deno.test("a whole-year weather file is labelled a year in results.json", () => {
  const wall = construction("EW", {
    layers: [{ kind: "massive", thicknessM: 0.2, conductivity: 1.8, density: 2300, specificHeat: 900 }],
    outsideResistance: 0.04,
    insideResistance: 0.13,
  });
  const scenario = weatherScenario([
    surface({ id: "s", construction: "EW", areaM2: 1, tiltDeg: 90, azimuthDeg: 180, absorptance: 0.5 }),
  ]);
  const results = computeWeatherYear(scenario, weather(yearCsv(() => [5, 0, 0])), context([wall])).results;
  assert.deepStrictEqual(results.period, {
    kind: "year",
    days: 365,
    first: "2031-01-01T01:00",
    last: "2032-01-01T00:00",
  });
});
