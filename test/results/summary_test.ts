/**
 * The summary of results and the issue gate: results.json `summary` copies every verdict from the results
 * themselves, open items are collected (sources from memory, synthetic weather, defaults grouped by kind, unmet
 * limits, the user's open points), and `status: issued` is refused while a blocking open item is not acknowledged.
 * Projects are written at test time over wall EW-1 of test/fixtures/good/minimal (invented data).
 */
import assert from "node:assert/strict";
import { join } from "node:path";
import { runBuild } from "../../src/commands/build.ts";
import { runCheck } from "../../src/commands/check.ts";
import type { ResultsJson } from "../../src/results/types.ts";
import { parseDocument } from "../report/dom.ts";
import { designDayBlock, SOUTH_WALL, weatherScenarioBlock } from "../scenarios/_scenarioBlocks.ts";

const GOOD = new URL("../fixtures/good/minimal/", import.meta.url).pathname;

/** `days` × 24 hourly rows from 2031-01-01T01:00: a daily dry-bulb swing, no sun (invented). */
function hourlyCsv(days: number): string {
  const lines = ["time,dry-bulb,global-horizontal,diffuse-horizontal"];
  for (let k = 0; k < days * 24; k++) {
    const t = new Date(Date.UTC(2031, 0, 1, 1 + k)).toISOString().slice(0, 16);
    lines.push(`${t},${(5 + 3 * Math.sin((2 * Math.PI * k) / 24)).toFixed(1)},0,0`);
  }
  return `${lines.join("\n")}\n`;
}

const HEATING = [
  "```scenario",
  "id: winter",
  "kind: heating",
  "indoor: 21 degC",
  "indoor-humidity: 0.5",
  "outdoor: { design-temperature: -4 degC }",
  "surfaces:",
  "  - { id: w1, construction: EW-1, area: 10 m^2, azimuth: 180 deg, tilt: 90 deg }",
  "```",
  "",
].join("\n");

interface Options {
  readonly frontMatter?: readonly string[];
  readonly status?: "draft" | "for-review" | "issued";
  readonly synthetic?: boolean;
  readonly limits?: boolean;
}

/** The minimal project plus a design day, a 2-day weather period and a heating scenario; front matter extended. */
async function project(options: Options = {}): Promise<string> {
  const folder = await Deno.makeTempDir();
  const head = Deno.readTextFileSync(join(GOOD, "project.md"))
    .replace("status: draft", `status: ${options.status ?? "draft"}`)
    .replace("units: SI\n", `units: SI\n${(options.frontMatter ?? []).map((l) => `${l}\n`).join("")}`);
  Deno.writeTextFileSync(join(folder, "project.md"), head);
  const walls = Deno.readTextFileSync(join(GOOD, "walls.md"));
  Deno.writeTextFileSync(
    join(folder, "walls.md"),
    options.limits === true
      ? walls.replace("```\n", 'limits:\n  max-u: { value: "0.2 W/(m^2 K)", clause: test brief 1.1 }\n```\n')
      : walls,
  );
  Deno.writeTextFileSync(join(folder, "weather.csv"), hourlyCsv(2));
  const extra = [
    "period: 2 days",
    ...(options.synthetic === true ? ["synthetic: invented for the test"] : []),
  ];
  Deno.writeTextFileSync(
    join(folder, "scenarios.md"),
    `# Scenarios\n\n${designDayBlock("july", [SOUTH_WALL])}\n${
      weatherScenarioBlock("weather.csv", { id: "year", extra })
    }\n${HEATING}`,
  );
  return folder;
}

async function build(folder: string): Promise<{ code: number; stderr: string[]; out: string }> {
  const out = join(folder, "out");
  const stderr: string[] = [];
  const code = await runBuild({ project: folder, out }, { stdout: () => {}, stderr: (l) => stderr.push(l) });
  return { code, stderr, out };
}

function readResults(out: string): ResultsJson {
  return JSON.parse(Deno.readTextFileSync(join(out, "results.json"))) as ResultsJson;
}

Deno.test("results.json summary copies U, dynamic figures, f_Rsi, peaks and verdicts from the results themselves", async () => {
  const { code, out, stderr } = await build(await project({ limits: true }));
  assert.equal(code, 0, stderr.join("\n"));
  const r = readResults(out);
  const summary = r.summary;
  assert.ok(summary !== undefined);
  const wall = r.constructions["EW-1"]!;
  const row = summary.constructions.find((c) => c.id === "EW-1");
  assert.ok(row !== undefined);
  // The summary must print the very numbers of the construction's results (no second computation).
  assert.equal(row.U, wall.U);
  assert.equal(row.correctedU, wall["correctedU"]);
  const dynamic = wall["dynamic"] as {
    decrementFactor: number;
    timeLag_h: number;
    arealHeatCapacityInside: number;
  };
  assert.equal(row.decrementFactor, dynamic.decrementFactor);
  assert.equal(row.timeLag_h, dynamic.timeLag_h);
  assert.equal(row.kappa1, dynamic.arealHeatCapacityInside);
  assert.equal(row.fRsi, wall["temperatureFactor"]);
  assert.ok(row.fRsiSurfaceResistance !== null && row.fRsiSurfaceResistance > 0);
  // Limit U ≤ 0.2: U of this wall is 1/R_T with R_T ≈ 3.40 m²K/W (ISO 6946 hand sum, build_test.ts) → 0.294, NOT MET.
  assert.deepEqual(row.limits.map((l) => [l.limitKey, l.pass]), [["max-u", false]]);
  const july = summary.scenarios.find((s) => s.id === "july");
  assert.deepEqual(july?.peakGain, {
    value: r.scenarios["july"]!.peak.heatGain,
    time_h: r.scenarios["july"]!.peak.time_h,
    time: null,
  });
  assert.equal(july?.dailyEnergy?.gain_J, r.scenarios["july"]!.totals.gain_J);
  const year = summary.scenarios.find((s) => s.id === "year");
  // A 2-day period: energy per day is the period's total over 2 days.
  assert.equal(year?.dailyEnergy?.loss_J, r.scenarios["year"]!.totals.loss_J / 2);
  assert.equal(year?.synthetic, false);
  const winter = summary.scenarios.find((s) => s.id === "winter");
  assert.equal(winter?.designHeatLoss, r.heating?.["winter"]?.totalHeatLoss);
  assert.deepEqual(winter?.surfaces.map((s) => [s.surface, s.mould.pass]), [
    ["w1", r.heating?.["winter"]?.surfaces["w1"]?.mould.pass],
  ]);
  assert.deepEqual(summary.failedChecks, []);
  const kinds = new Set(summary.openItems.map((i) => i.kind));
  for (const kind of ["from-memory-source", "default-in-use", "unmet-limit"]) {
    assert.ok(kinds.has(kind as never), kind);
  }
  const unmet = summary.openItems.find((i) => i.kind === "unmet-limit");
  assert.match(unmet?.at ?? "", /^walls\.md:\d+:\d+$/);
  // Defaults are grouped: one item per kind of default, naming what it applies to.
  const rsi = summary.openItems.filter((i) => i.id === "default-in-use:inside-surface-resistance");
  assert.equal(rsi.length, 1);
  assert.match(rsi[0]!.text, /applies to EW-1/);
  // mineral-wool-25 is a library entry whose source says "from memory" (src/materials/libraryInsulation.ts).
  const wool = summary.openItems.find((i) => i.id === "from-memory-source:material:mineral-wool-25");
  assert.match(wool?.at ?? "", /^walls\.md:\d+:\d+$/);
});

Deno.test("a weather scenario marked synthetic is an open item at its weather line and [SYNTHETIC DATA] in the summary", async () => {
  const { code, out } = await build(await project({ synthetic: true }));
  assert.equal(code, 0);
  const item = readResults(out).summary?.openItems.find((i) => i.kind === "synthetic-data");
  assert.equal(item?.id, "synthetic-data:year");
  // The weather line of the scenario block: line 4 of the block (```scenario, id, kind, weather) after the heading.
  const lines = Deno.readTextFileSync(join(out, "..", "scenarios.md")).split("\n");
  assert.equal(item?.at, `scenarios.md:${lines.indexOf("weather: weather.csv") + 1}:10`);
  const page = Deno.readTextFileSync(join(out, "package.html"));
  const summaryText = parseDocument(page).querySelector("section.summary-of-results")?.textContent ?? "";
  assert.match(summaryText, /year\s*weather\s*\[SYNTHETIC DATA\]/);
});

Deno.test("status issued with a source from memory is refused: exit 1, the item named with file:line, nothing written", async () => {
  const folder = await project({ status: "issued" });
  const { code, stderr, out } = await build(folder);
  assert.equal(code, 1);
  const text = stderr.join("\n");
  assert.match(
    text,
    /walls\.md:\d+:\d+: error: Cannot issue with the open item "from-memory-source:material:mineral-wool-25"/,
  );
  assert.match(text, /hint: resolve it, or acknowledge it in project\.md/);
  assert.throws(() => Deno.statSync(out));
  // `check` refuses the same way.
  const check: string[] = [];
  const checkCode = await runCheck({ project: folder, format: "text", strict: false }, {
    stdout: () => {},
    stderr: (l) => check.push(l),
  });
  assert.equal(checkCode, 1);
  assert.match(
    check.join("\n"),
    /error: Cannot issue with the open item "from-memory-source:material:mineral-wool-25"/,
  );
});

Deno.test("status issued with synthetic weather is refused at the weather line", async () => {
  const { code, stderr } = await build(
    await project({
      status: "issued",
      synthetic: true,
      frontMatter: [
        "acknowledged:",
        "  - { item: from-memory-source, reason: library values accepted for this check, by: Test Checker }",
      ],
    }),
  );
  assert.equal(code, 1);
  const errors = stderr.flatMap((l) => l.split("\n")).filter((l) => l.includes(": error: "));
  assert.deepEqual(errors.map((l) => l.replace(/: error: .*/, "")), ["scenarios.md:17:10"]);
  assert.match(errors[0]!, /synthetic-data:year/);
});

Deno.test("acknowledged open items let an issued package build and print on the cover with reason and name", async () => {
  const { code, out } = await build(
    await project({
      status: "issued",
      synthetic: true,
      frontMatter: [
        "client: Invented Client Ltd",
        "project: Test extension",
        "checked-date: 2031-01-20",
        "acknowledged:",
        "  - { item: from-memory-source, reason: library values accepted for this check, by: Test Checker }",
        '  - { item: "synthetic-data:year", reason: illustration only, by: Test Checker }',
      ],
    }),
  );
  assert.equal(code, 0);
  const doc = parseDocument(Deno.readTextFileSync(join(out, "package.html")));
  const cover = doc.querySelector("section.cover")?.textContent?.replace(/\s+/g, " ") ?? "";
  assert.match(cover, /Open items acknowledged for issue/);
  assert.match(cover, /synthetic-data:year: .* acknowledged by Test Checker: illustration only/);
  assert.match(cover, /Client Invented Client Ltd/);
  assert.match(cover, /Project Test extension/);
  // Issued: each role with its own date (checked-date), none pending.
  assert.match(cover, /Checked by Test Checker — 2031-01-20/);
  assert.doesNotMatch(cover, /pending/);
  const acked = readResults(out).summary?.openItems.find((i) => i.id === "synthetic-data:year");
  assert.equal(acked?.acknowledged?.by, "Test Checker");
});

Deno.test("checked-by and approved-by print as pending until the package is issued", async () => {
  const { code, out } = await build(
    await project({
      status: "for-review",
      frontMatter: ["approved-by: Test Approver", "checked-date: 2031-01-20"],
    }),
  );
  assert.equal(code, 0);
  const cover = parseDocument(Deno.readTextFileSync(join(out, "package.html"))).querySelector("section.cover")
    ?.textContent?.replace(/\s+/g, " ") ?? "";
  assert.match(cover, /Checked by Test Checker — pending/);
  assert.match(cover, /Approved by Test Approver — pending/);
  assert.doesNotMatch(cover, /2031-01-20/);
});

Deno.test("open points of the front matter are open items and are listed in the summary", async () => {
  const { code, out } = await build(
    await project({
      frontMatter: [
        "open-points:",
        "  - Confirm the lining board with the contractor",
        '  - { text: Survey the cavity, at: "walls.md:8:3" }',
      ],
    }),
  );
  assert.equal(code, 0);
  const points = readResults(out).summary?.openItems.filter((i) => i.kind === "open-point");
  assert.deepEqual(points?.map((p) => [p.id, p.text, p.at]), [
    ["open-point:1", "Confirm the lining board with the contractor", "project.md:11:5"],
    ["open-point:2", "Survey the cavity", "walls.md:8:3"],
  ]);
  const section = parseDocument(Deno.readTextFileSync(join(out, "package.html")))
    .querySelector("section.summary-of-results")?.textContent ?? "";
  assert.match(section, /Confirm the lining board with the contractor/);
});

Deno.test("the summary tables print in the project's display units (IP: Btu/(h·ft²·°F), Btu/h)", async () => {
  const folder = await project();
  const text = Deno.readTextFileSync(join(folder, "project.md")).replace("units: SI", "units: IP");
  Deno.writeTextFileSync(join(folder, "project.md"), text);
  const { code, out } = await build(folder);
  assert.equal(code, 0);
  const r = readResults(out);
  const doc = parseDocument(Deno.readTextFileSync(join(out, "package.html")));
  // The two tables of figures (the open items quote assumption texts as written, in SI).
  const section = ["table.summary-constructions", "table.summary-scenarios"]
    .map((q) => doc.querySelector(q)?.textContent?.replace(/\s+/g, " ") ?? "").join(" ");
  // 1 Btu/(h·ft²·°F) = 5.678263 W/(m²·K) (exact from the international foot, pound and Btu_IT, as in displayUnits.ts).
  const uIp = r.constructions["EW-1"]!.U / 5.678263;
  assert.ok(section.includes(`${uIp.toPrecision(3)} Btu/(h·ft²·°F)`), section.slice(0, 400));
  assert.match(section, /Btu\/h/);
  assert.doesNotMatch(section, /W\/\(m²·K\)/);
});
