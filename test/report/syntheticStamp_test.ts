/**
 * Synthetic weather is marked wherever it reaches: a weather file whose first comment is `# synthetic: <note>`
 * makes its scenario synthetic without the scenario key (results.json, open item, caution), and every table, plot
 * and box of a synthetic scenario's output carries the stamp "SYNTHETIC WEATHER — illustration only", as do its CSV
 * files; a scenario on measured-looking weather carries none. Projects are written at test time over wall EW-1 of
 * test/fixtures/good/minimal; the weather is invented (a daily sine swing, no sun).
 */
import assert from "node:assert/strict";
import { join } from "node:path";
import { runBuild } from "../../src/commands/build.ts";
import type { ResultsJson } from "../../src/results/types.ts";
import { parseDocument } from "./dom.ts";
import { weatherScenarioBlock } from "../scenarios/_scenarioBlocks.ts";

const GOOD = new URL("../fixtures/good/minimal/", import.meta.url).pathname;
const STAMP = "SYNTHETIC WEATHER — illustration only";

/** One year (8760 hourly rows from 2031-01-01T01:00) of invented weather, after the given leading lines. */
function yearCsv(leading: readonly string[]): string {
  const lines = [...leading, "time,dry-bulb,global-horizontal,diffuse-horizontal"];
  for (let k = 0; k < 8760; k++) {
    const t = new Date(Date.UTC(2031, 0, 1, 1 + k)).toISOString().slice(0, 16);
    lines.push(`${t},${(8 + 6 * Math.sin((2 * Math.PI * k) / 24)).toFixed(1)},0,0`);
  }
  return `${lines.join("\n")}\n`;
}

async function buildYear(
  leading: readonly string[],
  key: readonly string[] = [],
): Promise<{ code: number; stderr: string[]; out: string }> {
  const folder = await Deno.makeTempDir();
  Deno.writeTextFileSync(join(folder, "project.md"), Deno.readTextFileSync(join(GOOD, "project.md")));
  Deno.writeTextFileSync(join(folder, "walls.md"), Deno.readTextFileSync(join(GOOD, "walls.md")));
  Deno.writeTextFileSync(join(folder, "weather.csv"), yearCsv(leading));
  Deno.writeTextFileSync(
    join(folder, "scenarios.md"),
    `# Scenarios\n\n${weatherScenarioBlock("weather.csv", { id: "year", extra: key })}`,
  );
  const out = join(folder, "out");
  const stderr: string[] = [];
  const code = await runBuild({ project: folder, out }, { stdout: () => {}, stderr: (l) => stderr.push(l) });
  return { code, stderr, out };
}

function results(out: string): ResultsJson {
  return JSON.parse(Deno.readTextFileSync(join(out, "results.json"))) as ResultsJson;
}

function page(out: string): Document {
  return parseDocument(Deno.readTextFileSync(join(out, "package.html")));
}

Deno.test("a weather file whose first comment says synthetic makes its scenario synthetic without the scenario key", async () => {
  const { code, stderr, out } = await buildYear(["# synthetic: sine swing invented for the test"]);
  assert.equal(code, 0, stderr.join("\n"));
  const r = results(out);
  assert.deepEqual(r.scenarios["year"]?.synthetic, {
    note: "sine swing invented for the test",
    from: "file",
  });
  const item = r.summary?.openItems.find((i) => i.id === "synthetic-data:year");
  assert.equal(item?.kind, "synthetic-data");
  assert.equal(item?.blocking, true);
  assert.match(item?.text ?? "", /first comment.*sine swing invented for the test/);
  assert.equal(r.summary?.scenarios.find((s) => s.id === "year")?.synthetic, true);
  const doc = page(out);
  assert.match(doc.querySelector(".caution-synthetic")?.textContent ?? "", /scenario year/);
});

Deno.test("the scenario key wins over the file's comment as the source of the synthetic mark", async () => {
  const { code, stderr, out } = await buildYear(["# synthetic: from the file"], ["synthetic: from the key"]);
  assert.equal(code, 0, stderr.join("\n"));
  assert.deepEqual(results(out).scenarios["year"]?.synthetic, { note: "from the key", from: "scenario" });
});

Deno.test("every table, plot and box of a synthetic scenario's output carries the synthetic stamp, and its CSVs too", async () => {
  const { code, stderr, out } = await buildYear(["# a free comment line", "# synthetic: true"]);
  assert.equal(code, 0, stderr.join("\n"));
  const output = page(out).querySelector(".scenario-output");
  assert.ok(output !== null);
  const tables = [...output.querySelectorAll("table")];
  // Conditions, surfaces, peak per surface, monthly totals (a full year gives the monthly table and plot).
  assert.ok(tables.length >= 4, `tables: ${tables.length}`);
  for (const table of tables) {
    assert.ok(
      (table.querySelector("caption")?.textContent ?? "").includes(STAMP),
      table.outerHTML.slice(0, 120),
    );
  }
  const plots = [...output.querySelectorAll("svg.plot")];
  assert.ok(plots.length >= 1, `plots: ${plots.length}`);
  for (const plot of plots) {
    const marks = [...plot.querySelectorAll("text.synthetic-stamp")].map((t) => t.textContent);
    assert.deepEqual(marks, [STAMP]);
  }
  for (const box of output.querySelectorAll(".peak-summary, .caution-box")) {
    assert.ok((box.textContent ?? "").includes(STAMP), box.className);
  }
  assert.match(output.querySelector(".synthetic-banner")?.textContent ?? "", /weather file's first comment/);
  for (const path of ["csv/scenario-year.csv", "csv/scenario-year-daily.csv"]) {
    const first = Deno.readTextFileSync(join(out, path)).split("\n")[0]!;
    assert.ok(first.startsWith(`# ${STAMP}`), `${path}: ${first}`);
  }
});

Deno.test("a scenario on weather not marked synthetic carries no stamp, open item or caution", async () => {
  const { code, stderr, out } = await buildYear(["# measured at the test site, 2031"]);
  assert.equal(code, 0, stderr.join("\n"));
  const r = results(out);
  assert.equal(r.scenarios["year"]?.synthetic, undefined);
  assert.equal(r.summary?.openItems.some((i) => i.kind === "synthetic-data"), false);
  const markup = Deno.readTextFileSync(join(out, "package.html"));
  assert.equal(markup.includes("SYNTHETIC WEATHER"), false);
  assert.equal(markup.includes("caution-synthetic"), false);
  assert.equal(Deno.readTextFileSync(join(out, "csv/scenario-year.csv")).startsWith("time,"), true);
});
