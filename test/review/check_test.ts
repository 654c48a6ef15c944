import assert from "node:assert/strict";
import { join } from "node:path";
import { runCheck } from "../../src/commands/check.ts";
import { REVIEW_RULES } from "../../src/review/mod.ts";

const PLANTED = new URL("../fixtures/review/planted/", import.meta.url).pathname;
const DEMO = new URL("../../projects/demo/", import.meta.url).pathname;

interface JsonFinding {
  readonly severity: string;
  readonly rule: string;
  readonly at: string;
  readonly message: string;
  readonly value: string | null;
  readonly expected: string | null;
  readonly source: string | null;
  readonly hint: string | null;
}

/** Copies a project folder (Markdown and data files, not the `out` folder) into another folder. */
function copyProject(from: string, to: string): void {
  for (const entry of Deno.readDirSync(from)) {
    if (entry.isDirectory && entry.name !== "out") {
      Deno.mkdirSync(join(to, entry.name));
      copyProject(join(from, entry.name), join(to, entry.name));
    } else if (entry.isFile) Deno.copyFileSync(join(from, entry.name), join(to, entry.name));
  }
}

async function check(project: string, format: "text" | "json", strict = false) {
  const stdout: string[] = [];
  const stderr: string[] = [];
  const code = await runCheck({ project, format, strict }, {
    stdout: (l) => stdout.push(l),
    stderr: (l) => stderr.push(l),
  });
  return { code, stdout: stdout.join("\n"), stderr: stderr.join("\n") };
}

async function findings(project: string): Promise<JsonFinding[]> {
  const run = await check(project, "json");
  const parsed = JSON.parse(run.stdout) as { schema: string; findings: JsonFinding[] };
  assert.equal(parsed.schema, "fluxnote-check/1");
  return parsed.findings;
}

/**
 * The planted mistakes (test/fixtures/review/PLANTED.md describes each), as `rule@file:line:col`.
 * Thresholds: see the rule's unit test for each value and its source.
 */
const PLANTED_PROBLEMS = [
  "conductivity-below-insulation-limit@10-materials.md:33:1", // P1 EPS λ 0.0031 (< 0.018)
  "specific-heat-in-kj@10-materials.md:47:1", // P2 render c 1.0 J/(kg K) (≤ 10: a kJ value)
  "source-missing@10-materials.md:62:1", // P3 wood-fibre board without source
  "unknown-material-class@10-materials.md:78:1", // P4 class "clay-brick" (library class is clay-masonry)
  "density-in-lb-per-ft3@10-materials.md:93:1", // P5 precast, dense-concrete class, ρ 150 (= 2403 kg/m³)
  "layer-resistance-large@20-walls.md:36:5", // P6 batt "R-19" as 19 m²K/W (> 10)
  "surface-resistance-twice@20-walls.md:39:5", // P7 "internal surface film (Rsi)" 0.13 + default R_si
  "layer-order-reversed@20-walls.md:61:5", // P8 ETICS wall listed inside → outside
  "layer-resistance-large@20-walls.md:61:5", // P1 again: 180 mm at λ 0.0031 is R 58 (> 10)
  "masonry-layer-thin@20-walls.md:84:5", // P9 brick 0.328 mm (< 5 mm)
  "density-in-lb-per-ft3@20-walls.md:109:5", // P10 inline block ρ 87 (= 1394 kg/m³) with λ 0.51
  "sol-air-too-high@40-scenarios.md:53:5", // P14 sol-air in °F written as degC: max 137 (> 90 °C)
  "sol-air-range-large@40-scenarios.md:53:5", // P14 range 72 K (> 60 K)
];

const PLANTED_NOTES = [
  "insulation-exposed-inside@20-walls.md:124:5", // P11 plant-room wall with bare stone wool inside
  "absorptance-extreme@40-scenarios.md:50:5", // P12 red brick α 0.07 (< 0.2)
  "surface-orientation-name@40-scenarios.md:52:5", // P13 flat roof with tilt 90 deg
];

Deno.test("check finds every planted problem at its file:line:col with its rule, and no other warning or error", async () => {
  const found = await findings(PLANTED);
  const problems = found.filter((f) => f.severity !== "note").map((f) => `${f.rule}@${f.at}`);
  assert.deepStrictEqual(problems, PLANTED_PROBLEMS);
  const notes = new Set(found.filter((f) => f.severity === "note").map((f) => `${f.rule}@${f.at}`));
  for (const n of PLANTED_NOTES) assert.ok(notes.has(n), `missing note ${n}`);
  const severities = Object.fromEntries(found.map((f) => [`${f.rule}@${f.at}`, f.severity]));
  assert.equal(severities["specific-heat-in-kj@10-materials.md:47:1"], "error");
  assert.equal(severities["density-in-lb-per-ft3@10-materials.md:93:1"], "error");
  assert.equal(severities["density-in-lb-per-ft3@20-walls.md:109:5"], "warning");
});

Deno.test("check raises nothing beyond notes and EW-1's unmet U target on the demo; --strict reports it", async () => {
  const found = await findings(DEMO);
  // The one warning is a compliance finding: EW-1 with its studs (combined method) misses the client's 0.18.
  assert.deepStrictEqual(found.filter((f) => f.severity !== "note").map((f) => `${f.rule}@${f.at}`), [
    "limit-not-met@20-walls.md:37:1",
  ]);
  // The demo's defaults are listed (one note per `default:` assumption) and its cavity cites ISO 6946 in prose.
  assert.ok(found.some((f) => f.rule === "default-used" && f.at === "20-walls.md:37:1"));
  assert.ok(found.some((f) => f.rule === "source-in-prose-only" && f.at === "20-walls.md:117:5"));
  assert.equal((await check(DEMO, "text")).code, 0);
  assert.equal((await check(DEMO, "text", true)).code, 1);
});

Deno.test("JSON findings have the fluxnote-check/1 shape; plausibility findings fill value, expected and source", async () => {
  const found = await findings(PLANTED);
  // The first eight keys are the original contract; `subject` and `acknowledged` extend it.
  const keys = [
    "severity",
    "rule",
    "at",
    "message",
    "value",
    "expected",
    "source",
    "hint",
    "subject",
    "acknowledged",
  ];
  const ruleIds = new Set(REVIEW_RULES.map((r) => r.id));
  for (const f of found) {
    assert.deepStrictEqual(Object.keys(f), keys);
    assert.match(f.at, /^[^:]+\.md:\d+:\d+$/);
    assert.match(f.severity, /^(error|warning|note)$/);
    assert.ok(ruleIds.has(f.rule), `rule ${f.rule} is not in REVIEW_RULES`);
    if (f.expected !== null) {
      assert.ok(f.value !== null && f.source !== null, `${f.rule}@${f.at} has expected but no value/source`);
    }
  }
  const envelope = found.find((f) => f.rule === "density-in-lb-per-ft3" && f.at === "10-materials.md:93:1");
  assert.equal(envelope?.value, "ρ = 150 kg/m³");
  assert.equal(envelope?.expected, "2000–2500 kg/m³");
  assert.match(envelope?.source ?? "", /ASHRAE Handbook—Fundamentals 2005 Ch\. 30 Table 19/);
});

Deno.test("--strict turns a review warning into exit 1; without it the exit code is 0", async () => {
  const dir = await Deno.makeTempDir();
  copyProject(DEMO, dir);
  // Drop the source of one project material: one source-missing warning besides EW-1's limit-not-met.
  const path = join(dir, "10-materials.md");
  const text = Deno.readTextFileSync(path);
  const edited = text.replace(/^source: "From memory: typical values for thin-coat.*\n/m, "");
  assert.notEqual(edited, text);
  Deno.writeTextFileSync(path, edited);
  const loose = await check(dir, "text");
  assert.equal(loose.code, 0);
  assert.match(
    loose.stderr,
    /^warning +source-missing +1 +Material "render-thin-coat" gives no source.*\n +applies to +render-thin-coat\n +at +10-materials\.md:47:1$/m,
  );
  assert.match(loose.stdout, /^0 error\(s\), 2 warning\(s\), \d+ note\(s\)/);
  assert.equal((await check(dir, "text", true)).code, 1);
});

Deno.test("text output prints the value line under a plausibility finding", async () => {
  const run = await check(PLANTED, "text");
  assert.equal(run.code, 1);
  assert.match(
    run.stderr,
    /10-materials\.md:93:1: error: .*lb\/ft³\n {2}hint: 150 lb\/ft³ is 2403 kg\/m³; write the density in kg\/m³\n {2}value: ρ = 150 kg\/m³ expected: 2000–2500 kg\/m³ \(source: .*\)/,
  );
});
