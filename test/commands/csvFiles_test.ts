/**
 * The CSV files of a build, read as a spreadsheet would: one naming scheme with a unit in every header, numbers
 * rounded to 6 significant figures that agree with results.json, constructions.csv with U_c, the ISO 13786 figures
 * and the limit verdicts, summary.csv, the `--csv-locale semicolon-comma` dialect, and a README that names every
 * file. Built end to end from projects/demo (every kind of CSV file: constructions, summary, factors, a design
 * day with a cooling load, a synthetic weather year with its daily file, a heating scenario).
 */
import assert from "node:assert/strict";
import { join } from "node:path";
import { runBuild } from "../../src/commands/build.ts";
import { main } from "../../src/cli.ts";
import type { ResultsJson } from "../../src/results/types.ts";
import type { HeatingResults } from "../../src/scenarios/heatingTypes.ts";
import { type ReadCsv, readCsv } from "./_csvRead.ts";

const DEMO = new URL("../../projects/demo/", import.meta.url).pathname;
const README = new URL("../../README.md", import.meta.url).pathname;
const quiet = { stdout: () => {}, stderr: () => {} };

/**
 * The units the README documents for column names (README, "Outputs"): ASCII spellings of °C, K, h, m², W,
 * W/m², W/(m²·K), m²·K/W, kJ/(m²·K), kWh and 1 for a pure number.
 */
const UNITS = ["degC", "K", "h", "m2", "W", "W_m2", "W_m2K", "m2K_W", "kJ_m2K", "kWh", "1"];
/** Columns without a unit (README): ids, names, time stamps, dates, the term index. */
const TEXT_COLUMNS = [
  "id",
  "name",
  "surface",
  "construction",
  "time",
  "date",
  "j",
  "group",
  "item",
  "formula",
];
/** summary.csv is a long table: `value` and `limit` are in the row's `unit` (README). */
const SUMMARY_HEADER = ["table", "subject", "quantity", "value", "unit", "limit", "verdict", "text", "at"];

const ID = "[A-Za-z0-9][A-Za-z0-9._-]*";
const UNIT_COLUMN = new RegExp(`^(?:${ID}:)?[A-Za-z][A-Za-z0-9]*(?:_[A-Za-z0-9]+)*?_(${UNITS.join("|")})$`);
const VERDICT_COLUMN = new RegExp(`^(?:${ID}:)?[a-z][a-z0-9_]*_verdict$`);
/** A plain decimal number: no exponent, no thousands separator. */
const DECIMAL = /^-?\d+(\.\d+)?$/;

interface Build {
  readonly out: string;
  readonly results: ResultsJson;
  /** csv/<name> → text */
  readonly files: ReadonlyMap<string, string>;
}

async function build(extra: readonly string[]): Promise<Build> {
  const out = join(await Deno.makeTempDir(), "out");
  const code = extra.length === 0
    ? await runBuild({ project: DEMO, out }, quiet)
    : await main(["build", DEMO, "--out", out, ...extra], quiet);
  assert.equal(code, 0);
  const files = new Map<string, string>();
  for (const entry of Deno.readDirSync(join(out, "csv"))) {
    files.set(entry.name, Deno.readTextFileSync(join(out, "csv", entry.name)));
  }
  const results = JSON.parse(Deno.readTextFileSync(join(out, "results.json"))) as ResultsJson;
  return { out, results, files: new Map([...files].sort(([a], [b]) => a.localeCompare(b))) };
}

let demoBuild: Promise<Build> | undefined;
const demo = () => (demoBuild ??= build([]));

function tables(b: Build): Map<string, ReadCsv> {
  return new Map([...b.files].map(([name, text]) => [name, readCsv(text, ",")]));
}

/** Column `name` of a table as numbers (empty cells → NaN). */
function column(t: ReadCsv, name: string): number[] {
  const i = t.header.indexOf(name);
  assert.ok(i >= 0, `no column ${name} in ${t.header.join(",")}`);
  return t.rows.map((r) => (r[i] === "" ? NaN : Number(r[i])));
}

/**
 * A CSV number agrees with the exact value within half a unit in its 6th significant figure: |v| ≥ 10^e gives a
 * rounding error ≤ 0.5·10^(e−5) ≤ 5e-6·|v| (plus the last bits of decimal parsing).
 */
function agrees(csv: number, exact: number, what: string): void {
  assert.ok(
    Math.abs(csv - exact) <= 5.000001e-6 * Math.abs(exact),
    `${what}: CSV ${csv} vs results.json ${exact}`,
  );
}

function agreeSeries(csv: readonly number[], exact: readonly number[], what: string): void {
  assert.equal(csv.length, exact.length, `${what}: length`);
  exact.forEach((v, k) => agrees(csv[k]!, v, `${what}[${k}]`));
}

/** Significant figures of a plain decimal: leading zeros never count, trailing zeros of an integer neither. */
function significantFigures(cell: string): number {
  const digits = cell.replace("-", "");
  if (digits.includes(".")) return digits.replace(".", "").replace(/^0+/, "").length;
  return digits.replace(/^0+/, "").replace(/0+$/, "").length;
}

Deno.test("every CSV file of the demo names its columns [<subject>:]<quantity>_<unit> with a documented unit", async () => {
  const t = tables(await demo());
  assert.ok(t.size >= 10, [...t.keys()].join(", "));
  for (const [name, table] of t) {
    assert.equal(new Set(table.header).size, table.header.length, `${name}: duplicate column`);
    if (name === "summary.csv") {
      assert.deepEqual(table.header, SUMMARY_HEADER);
      const unit = table.header.indexOf("unit");
      for (const row of table.rows) {
        assert.ok(row[unit] === "" || UNITS.includes(row[unit]!), `${name}: ${row}`);
      }
      continue;
    }
    for (const h of table.header) {
      assert.ok(
        TEXT_COLUMNS.includes(h) || VERDICT_COLUMN.test(h) || UNIT_COLUMN.test(h),
        `${name}: column "${h}" follows no documented form`,
      );
    }
  }
  // The two scenario files share one set of per-surface columns (the issue's example: sol-air in both).
  const day = t.get("scenario-july-design-day.csv")!.header;
  const year = t.get("scenario-weather-year-synthetic.csv")!.header;
  assert.ok(day.includes("ew1-west:sol_air_degC") && year.includes("ew1-west:sol_air_degC"));
  assert.ok(day.includes("outdoor_degC") && year.includes("outdoor_degC"));
});

Deno.test("every CSV number of the demo is a plain decimal of at most 6 significant figures", async () => {
  const t = tables(await demo());
  let numbers = 0;
  for (const [name, table] of t) {
    const numeric = table.header.map((h) =>
      name === "summary.csv" ? h === "value" || h === "limit" : UNIT_COLUMN.test(h) || h === "j"
    );
    for (const row of table.rows) {
      assert.equal(row.length, table.header.length, `${name}: row of ${row.length} cells`);
      row.forEach((cell, i) => {
        if (!numeric[i] || cell === "") return;
        numbers++;
        assert.match(cell, DECIMAL, `${name} ${table.header[i]}: "${cell}"`);
        assert.ok(
          significantFigures(cell) <= 6,
          `${name} ${table.header[i]}: "${cell}" has more than 6 figures`,
        );
        assert.doesNotMatch(
          cell,
          /\.\d*0$|^-0(\.0*)?$/,
          `${name} ${table.header[i]}: "${cell}" is not the shortest`,
        );
      });
    }
  }
  assert.ok(numbers > 100_000, `only ${numbers} numbers`);
});

Deno.test("CSV values of the demo agree with results.json within the 6-figure rounding", async () => {
  const b = await demo();
  const t = tables(b);
  const r = b.results;
  // Design day: every series of results.json.
  const dd = r.scenarios["july-design-day"]!;
  const day = t.get("scenario-july-design-day.csv")!;
  agreeSeries(column(day, "time_h"), dd.outdoor.map((_, k) => k * dd.timestep_h), "time_h");
  agreeSeries(column(day, "outdoor_degC"), dd.outdoor, "outdoor");
  agreeSeries(column(day, "indoor_degC"), dd.indoor, "indoor");
  agreeSeries(column(day, "total_heat_gain_W"), dd.totalHeatGain, "total heat gain");
  for (const [sid, s] of Object.entries(dd.surfaces)) {
    agreeSeries(column(day, `${sid}:sol_air_degC`), s.solAir, `${sid} sol-air`);
    agreeSeries(column(day, `${sid}:inside_flux_W_m2`), s.insideFlux, `${sid} inside flux`);
    agreeSeries(column(day, `${sid}:heat_gain_W`), s.heatGain, `${sid} heat gain`);
    agreeSeries(column(day, `${sid}:incident_W_m2`), s.incident, `${sid} incident`);
    agreeSeries(column(day, `${sid}:cooling_load_W`), s.coolingLoad!, `${sid} cooling load`);
  }
  agreeSeries(column(day, "total_cooling_load_W"), dd.coolingLoad!.total, "total cooling load");
  // Response factors.
  for (const id of Object.keys(r.constructions)) {
    const rf = r.constructions[id]!["responseFactors"] as { X: number[]; Y: number[]; Z: number[] };
    const f = t.get(`factors-${id}.csv`)!;
    for (const k of ["X", "Y", "Z"] as const) agreeSeries(column(f, `${k}_W_m2K`), rf[k], `${id} ${k}`);
  }
  // Heating: each surface row, then the total.
  const heating = r.heating!["winter-design"] as HeatingResults;
  const h = t.get("heating-winter-design.csv")!;
  const ids = Object.keys(heating.surfaces);
  agreeSeries(column(h, "heat_loss_W"), [
    ...ids.map((s) => heating.surfaces[s]!.heatLoss),
    heating.totalHeatLoss,
  ], "heat loss");
  agreeSeries(column(h, "f_Rsi_1").slice(0, -1), ids.map((s) => heating.surfaces[s]!.fRsi), "f_Rsi");
  agreeSeries(column(h, "U_c_W_m2K").slice(0, -1), ids.map((s) => heating.surfaces[s]!.correctedU), "U_c");
  // Weather year: the row at the peak time holds the peak; the largest daily maximum of a surface is its peak
  // (the daily summary is rounded to 0.01 W in results.json, hence the extra 0.005 W).
  const wy = r.scenarios["weather-year-synthetic"]! as unknown as {
    peakTime: string;
    peak: { heatGain: number };
    surfaces: Record<string, { peak: { heatGain: number } }>;
  };
  const year = t.get("scenario-weather-year-synthetic.csv")!;
  const peakRow = year.rows.findIndex((row) => row[0] === wy.peakTime);
  agrees(column(year, "total_heat_gain_W")[peakRow]!, wy.peak.heatGain, "weather peak");
  const daily = t.get("scenario-weather-year-synthetic-daily.csv")!;
  for (const [sid, s] of Object.entries(wy.surfaces)) {
    const max = Math.max(...column(daily, `${sid}:max_heat_gain_W`));
    assert.ok(
      Math.abs(max - s.peak.heatGain) <= 0.005 + 5e-6 * Math.abs(s.peak.heatGain),
      `${sid} daily max`,
    );
  }
  // summary.csv: the package's units (kJ/(m²·K), kWh = 3.6 MJ exactly).
  const summary = t.get("summary.csv")!;
  const value = (table: string, subject: string, quantity: string) => {
    const row = summary.rows.find((x) => x[0] === table && x[1] === subject && x[2] === quantity);
    assert.ok(row !== undefined, `${table} ${subject} ${quantity}`);
    return Number(row[3]);
  };
  for (const c of r.summary!.constructions) {
    agrees(value("constructions", c.id, "U_c"), c.correctedU, `${c.id} U_c`);
    agrees(value("constructions", c.id, "time_lag"), c.timeLag_h!, `${c.id} time lag`);
    agrees(value("constructions", c.id, "inside_areal_heat_capacity"), c.kappa1! / 1000, `${c.id} κ1`);
  }
  const sd = r.summary!.scenarios.find((s) => s.id === "july-design-day")!;
  agrees(value("scenarios", sd.id, "daily_heat_gain_energy"), sd.dailyEnergy!.gain_J / 3.6e6, "daily gain");
  agrees(value("scenarios", sd.id, "peak_heat_gain"), sd.peakGain!.value, "peak gain");
  const open = summary.rows.filter((x) => x[0] === "open-items");
  assert.equal(open.length, r.summary!.openItems.length);
});

Deno.test("constructions.csv carries U, U_c, areal heat capacity in kJ, decrement factor, time lag and limit verdicts as results.json", async () => {
  const b = await demo();
  const table = tables(b).get("constructions.csv")!;
  assert.equal(table.rows.length, Object.keys(b.results.constructions).length);
  const cell = (row: readonly string[], name: string) => row[table.header.indexOf(name)]!;
  const verdicts: string[] = [];
  for (const row of table.rows) {
    const id = cell(row, "id");
    const c = b.results.constructions[id]! as Record<string, unknown> & ResultsJson["constructions"][string];
    const dynamic = c["dynamic"] as {
      decrementFactor: number;
      timeLag_h: number;
      periodicTransmittance: { amplitude: number };
    };
    agrees(Number(cell(row, "U_W_m2K")), c.U, `${id} U`);
    agrees(Number(cell(row, "R_m2K_W")), c.R, `${id} R`);
    agrees(Number(cell(row, "U_c_W_m2K")), c["correctedU"] as number, `${id} U_c`);
    // results.json holds J/(m²K); the package prints kJ/(m²·K), and so does the CSV.
    agrees(Number(cell(row, "areal_heat_capacity_kJ_m2K")), c.steady.arealHeatCapacity / 1000, `${id} κ`);
    agrees(Number(cell(row, "decrement_factor_1")), dynamic.decrementFactor, `${id} f`);
    agrees(Number(cell(row, "time_lag_h")), dynamic.timeLag_h, `${id} time lag`);
    agrees(
      Number(cell(row, "periodic_transmittance_W_m2K")),
      dynamic.periodicTransmittance.amplitude,
      `${id} Y12`,
    );
    agrees(Number(cell(row, "f_Rsi_1")), c["temperatureFactor"] as number, `${id} f_Rsi`);
    const limits = c["limits"] as { limitKey: string; limit: number; pass: boolean }[];
    for (const key of ["max-u", "max-periodic-transmittance", "min-time-lag", "min-temperature-factor"]) {
      const name = `limit_${key.replaceAll("-", "_")}`;
      const limitColumn = table.header.find((h) => h.startsWith(`${name}_`) && !h.endsWith("_verdict"))!;
      const limit = limits.find((l) => l.limitKey === key);
      if (limit === undefined) {
        assert.equal(cell(row, limitColumn), "", `${id} ${key}`);
        assert.equal(cell(row, `${name}_verdict`), "", `${id} ${key}`);
      } else {
        agrees(Number(cell(row, limitColumn)), limit.limit, `${id} ${key}`);
        assert.equal(cell(row, `${name}_verdict`), limit.pass ? "pass" : "fail");
        verdicts.push(`${id} ${key} ${cell(row, `${name}_verdict`)}`);
      }
    }
  }
  // projects/demo/20-walls.md: EW-1 (U_c ≈ 0.209) misses its 0.18 W/(m²K) limit, EW-2 (≈ 0.164) meets it.
  assert.ok(
    verdicts.includes("EW-1 max-u fail") && verdicts.includes("EW-2 max-u pass"),
    verdicts.join("; "),
  );
  assert.ok(Deno.readTextFileSync(join(b.out, "package.html")).includes("kJ/(m²·K)"));
});

Deno.test("build --csv-locale semicolon-comma writes ';'-separated files with decimal commas that read as the default files", async () => {
  const [base, local] = await Promise.all([demo(), build(["--csv-locale", "semicolon-comma"])]);
  assert.deepEqual([...local.files.keys()], [...base.files.keys()]);
  let commas = 0;
  for (const [name, text] of local.files) {
    const l = readCsv(text, ";");
    const d = readCsv(base.files.get(name)!, ",");
    assert.ok(l.byteOrderMark && !d.byteOrderMark, `${name}: byte-order mark only in the locale variant`);
    assert.deepEqual(l.comments, d.comments, name);
    assert.deepEqual(l.header, d.header, name);
    assert.equal(l.rows.length, d.rows.length, name);
    l.rows.forEach((row, k) => {
      assert.equal(row.length, l.header.length, `${name} row ${k}: not rectangular`);
      row.forEach((cell, i) => {
        const plain = d.rows[k]![i]!;
        if (DECIMAL.test(plain)) {
          assert.equal(cell, plain.replace(".", ","), `${name} row ${k} ${l.header[i]}`);
          if (cell.includes(",")) commas++;
        } else assert.equal(cell, plain, `${name} row ${k} ${l.header[i]}`);
      });
    });
  }
  assert.ok(commas > 1000, `only ${commas} decimal commas`);
  // The demo's construction names hold commas: quoted in both dialects (RFC 4180, section 2, rule 6), and read
  // back whole above.
  assert.match(
    base.files.get("constructions.csv")!,
    /\nEW-1,"Extension wall, timber frame, rendered wood-fibre sheathing",/,
  );
  assert.match(
    local.files.get("constructions.csv")!,
    /\nEW-1;"Extension wall, timber frame, rendered wood-fibre sheathing";/,
  );
});

Deno.test("build --csv-locale refuses an unknown dialect as a usage error and names the choices", async () => {
  const lines: string[] = [];
  const io = { stdout: () => {}, stderr: (line: string) => lines.push(line) };
  const out = join(await Deno.makeTempDir(), "out");
  assert.equal(await main(["build", DEMO, "--out", out, "--csv-locale", "de"], io), 2);
  assert.match(lines.join("\n"), /--csv-locale must be one of comma-point, semicolon-comma, found "de"/);
  assert.throws(() => Deno.statSync(out));
});

Deno.test("the README names every file a build of the demo writes", async () => {
  const b = await demo();
  const readme = Deno.readTextFileSync(README);
  const outputs = readme.slice(
    readme.indexOf("- **Outputs** (`build`)"),
    readme.indexOf("- **What `--out` may replace**"),
  );
  // `csv/scenario-<scenario>-daily.csv` → /^csv\/scenario-[^/]+-daily\.csv$/
  const patterns = [...outputs.matchAll(/`(csv\/[^`]+\.csv)`/g)].map((m) =>
    new RegExp(`^${m[1]!.replace(/[.]/g, "\\.").replace(/<[a-z]+>/g, "[^/]+")}$`)
  );
  const written = ["package.html", "results.json", ...[...b.files.keys()].map((f) => `csv/${f}`)];
  for (const file of written) {
    assert.ok(
      file.startsWith("csv/") ? patterns.some((p) => p.test(file)) : outputs.includes(`\`${file}\``),
      `${file} is not in the README`,
    );
  }
  // Each documented kind of CSV file is written by the demo (so none is documented that no longer exists).
  for (const p of patterns) assert.ok(written.some((f) => p.test(f)), `${p} matches no file of the demo`);
});
