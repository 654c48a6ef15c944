/**
 * `check` as a QA gate: findings grouped by rule, `--severity`, reviewed findings acknowledged in project.md
 * (listed, marked, not counted by `--strict`), stale acknowledgements, and the template's placeholders.
 * Expected values come from the inputs themselves (the demo's files, the template's lines as read off
 * templates/new-project/*.md), not from the code under test.
 */
import assert from "node:assert/strict";
import { join } from "node:path";
import { parseDocument } from "../report/dom.ts";
import { main } from "../../src/cli.ts";
import { runBuild } from "../../src/commands/build.ts";
import { appliesTo } from "../../src/review/findingGroups.ts";
import { subjectMatches } from "../../src/project/acknowledgedFindings.ts";

const DEMO = new URL("../../projects/demo/", import.meta.url).pathname;

interface Run {
  readonly code: number;
  readonly out: string;
  readonly err: string;
}

const runs = new Map<string, Promise<Run>>();

/** Runs the CLI; the same arguments on the unchanged demo are run once per file (each run takes seconds). */
function run(args: string[]): Promise<Run> {
  if (!args.includes(DEMO)) return runOnce(args);
  const key = args.join("\u0000");
  if (!runs.has(key)) runs.set(key, runOnce(args));
  return runs.get(key)!;
}

async function runOnce(args: string[]): Promise<Run> {
  let out = "";
  let err = "";
  const code = await main(args, { stdout: (l) => (out += `${l}\n`), stderr: (l) => (err += `${l}\n`) });
  return { code, out, err };
}

interface JsonCheck {
  readonly findings: { rule: string; severity: string; at: string; subject: string; acknowledged: unknown }[];
  readonly groups: {
    severity: string;
    rule: string;
    count: number;
    subjects: string[];
    at: string;
    acknowledged: { by: string; reason: string; at: string } | null;
  }[];
}

async function json(args: string[]): Promise<JsonCheck> {
  const result = await run([...args, "--format", "json"]);
  return JSON.parse(result.out) as JsonCheck;
}

const MINIMAL = new URL("../fixtures/good/minimal/", import.meta.url).pathname;

/**
 * A copy of test/fixtures/good/minimal with a project-wide U limit of 0.18 W/(m²K), which its wall (200 mm
 * concrete, 100 mm mineral wool, a cavity without a source, a lining) does not meet, and extra front-matter
 * lines. Its two warnings: limit-not-met on EW-1/max-u and source-missing on EW-1/layer-3.
 */
async function projectWith(frontMatter: readonly string[]): Promise<string> {
  const dir = await Deno.makeTempDir({ prefix: "fluxnote-qa-" });
  for (const name of ["project.md", "walls.md"]) Deno.copyFileSync(join(MINIMAL, name), join(dir, name));
  const path = join(dir, "project.md");
  const text = Deno.readTextFileSync(path);
  const close = text.indexOf("\n---", 3);
  const added = [
    "limits:",
    '  max-u: { value: "0.18 W/(m^2 K)", clause: "Test brief, cl. 1" }',
    ...frontMatter,
  ];
  Deno.writeTextFileSync(path, `${text.slice(0, close)}\n${added.join("\n")}${text.slice(close)}`);
  return dir;
}

/** Line of the first `frontMatter` line in `projectWith` (minimal's front matter ends on line 10; 2 limit lines). */
const FIRST_ADDED_LINE = 12;

const ACCEPT_LIMIT =
  "  - { rule: limit-not-met, subject: EW-1/max-u, reason: client waiver letter of 2031-01-10, by: Test Checker }";
const ACCEPT_SOURCE =
  '  - { rule: source-missing, subject: "EW-1/layer-*", reason: cavity R from ISO 6946 Table 2, by: Test Checker }';

Deno.test("check prints the demo's default notes as one block per rule with its count, subjects and first file:line", async () => {
  const result = await run(["check", DEMO]);
  const found = await json(["check", DEMO]);
  const defaults = found.findings.filter((f) => f.rule === "default-used");
  // The demo has a default per surface and scenario (many dozens): one block, not one line each.
  assert.ok(defaults.length > 40, `${defaults.length} default-used findings`);
  const heads = result.err.split("\n").filter((l) => /^note +default-used /.test(l));
  assert.equal(heads.length, 1, result.err);
  assert.match(heads[0]!, new RegExp(`^note +default-used +${defaults.length} +a value the tool filled in`));
  assert.doesNotMatch(result.err, /: note: Default in use/);
  // Under the head: what it applies to, shortened, and where the first one is.
  assert.match(
    result.err,
    /\n +applies to +inside-surface-resistance:EW-1, .*, … and \d+ more\n +first at +20-walls\.md:37:1\n/,
  );
  // Head lines are aligned: every count column ends at the same character.
  const countEnds = result.err.split("\n").filter((l) => /^(error|warning|note) /.test(l)).map((l) =>
    /^\S+ +\S+ +\d+/.exec(l)![0].length
  );
  assert.equal(new Set(countEnds).size, 1, result.err);
  assert.equal(result.code, 0);
});

Deno.test("check --format json carries the groups: one per rule with count, subjects and first position", async () => {
  const found = await json(["check", DEMO]);
  const group = found.groups.find((g) => g.rule === "limit-met");
  // 20-walls.md:74 and 30-roof.md:36 state max-u limits that EW-2 and RF-1 meet (the demo's own input).
  assert.deepEqual(group, {
    severity: "note",
    rule: "limit-met",
    count: 2,
    message: "a code limit the user wrote (with its clause) is met",
    subjects: ["EW-2/max-u", "RF-1/max-u"],
    at: "20-walls.md:63:1",
    acknowledged: null,
  });
  const total = found.groups.reduce((n, g) => n + g.count, 0);
  assert.equal(total, found.findings.length);
});

Deno.test("check --severity warning hides notes and --severity error hides warnings; the exit code stays", async () => {
  const warnings = await run(["check", DEMO, "--severity", "warning"]);
  assert.equal(warnings.code, 0);
  assert.match(warnings.err, /^warning +limit-not-met +1 /m);
  assert.doesNotMatch(warnings.err, /^note /m);
  const errorsOnly = await run(["check", DEMO, "--severity", "error", "--strict"]);
  assert.equal(errorsOnly.err.trim(), "");
  assert.equal(errorsOnly.code, 1, "the unmet limit still fails --strict");
  const onlyWarnings = await json(["check", DEMO, "--severity", "warning"]);
  assert.deepEqual([...new Set(onlyWarnings.findings.map((f) => f.severity))], ["warning"]);
  assert.equal((await run(["check", DEMO, "--severity", "info"])).code, 2);
});

Deno.test("a warning acknowledged by rule and subject no longer fails check --strict and is listed with reason and name", async () => {
  const before = await projectWith([]);
  const dir = await projectWith(["acknowledged:", ACCEPT_LIMIT, ACCEPT_SOURCE]);
  try {
    assert.equal((await run(["check", before, "--strict"])).code, 1, "the two warnings fail --strict");
    const result = await run(["check", dir, "--strict"]);
    assert.equal(result.code, 0, result.err);
    assert.match(result.err, /^warning +limit-not-met +1 +\[acknowledged\] EW-1 does NOT meet max-u/m);
    assert.match(
      result.err,
      new RegExp(
        `acknowledged by Test Checker: client waiver letter of 2031-01-10 \\(project\\.md:${
          FIRST_ADDED_LINE + 1
        }:5\\)`,
      ),
    );
    assert.match(result.err, /^warning +source-missing +1 +\[acknowledged\] The inline layer 3/m);
    assert.match(result.out, /^0 error\(s\), 0 warning\(s\), \d+ note\(s\), 2 acknowledged/);
    const found = await json(["check", dir]);
    const limit = found.findings.find((f) => f.rule === "limit-not-met");
    assert.equal(limit?.subject, "EW-1/max-u");
    assert.deepEqual(limit?.acknowledged, {
      reason: "client waiver letter of 2031-01-10",
      by: "Test Checker",
      at: `project.md:${FIRST_ADDED_LINE + 1}:5`,
    });
  } finally {
    await Deno.remove(before, { recursive: true });
    await Deno.remove(dir, { recursive: true });
  }
});

Deno.test("an acknowledgement that matches no finding is a stale-acknowledgement warning at its file:line", async () => {
  const dir = await projectWith([
    "acknowledged:",
    ACCEPT_LIMIT,
    ACCEPT_SOURCE,
    "  - { rule: limit-not-met, subject: EW-9/max-u, reason: old wall, by: Test Checker }",
  ]);
  try {
    const result = await run(["check", dir, "--strict"]);
    assert.equal(result.code, 1);
    assert.match(result.err, /Acknowledged finding "limit-not-met" for "EW-9\/max-u" matches no finding/);
    const found = await json(["check", dir]);
    const stale = found.findings.filter((f) => f.rule === "acknowledged-nothing");
    assert.deepEqual(stale.map((f) => [f.severity, f.at]), [[
      "warning",
      `project.md:${FIRST_ADDED_LINE + 3}:5`,
    ]]);
  } finally {
    await Deno.remove(dir, { recursive: true });
  }
});

Deno.test("the older `item: finding:<rule>` acknowledgement also clears check --strict", async () => {
  const dir = await projectWith([
    "acknowledged:",
    '  - { item: "finding:limit-not-met", reason: client waiver letter, by: Test Checker }',
    '  - { item: "finding:source-missing", reason: cavity R from ISO 6946, by: Test Checker }',
  ]);
  try {
    const result = await run(["check", dir, "--strict"]);
    assert.equal(result.code, 0, result.err);
  } finally {
    await Deno.remove(dir, { recursive: true });
  }
});

Deno.test("the package lists an acknowledged finding with its reason and name in the findings and the open items", async () => {
  const dir = await projectWith(["acknowledged:", ACCEPT_LIMIT]);
  const out = join(dir, "out");
  try {
    const code = await runBuild({ project: dir, out }, { stdout: () => {}, stderr: () => {} });
    assert.equal(code, 0);
    const page = parseDocument(Deno.readTextFileSync(join(out, "package.html")));
    const row = [...page.querySelectorAll("table.checks-list tr")].find((tr) =>
      (tr.textContent ?? "").includes("limit-not-met")
    );
    assert.match(row?.textContent ?? "", /acknowledged by Test Checker: client waiver letter of 2031-01-10/);
    const items = page.querySelector("table.summary-open-items")?.textContent ?? "";
    assert.match(items, /finding:limit-not-met:EW-1\/max-u/);
    assert.match(items, /acknowledged by Test Checker: client waiver letter of 2031-01-10/);
    const results = JSON.parse(Deno.readTextFileSync(join(out, "results.json"))) as {
      summary: { openItems: { id: string; kind: string; acknowledged: { by: string } | null }[] };
    };
    const item = results.summary.openItems.find((i) => i.id === "finding:limit-not-met:EW-1/max-u");
    assert.equal(item?.kind, "acknowledged-finding");
    assert.equal(item?.acknowledged?.by, "Test Checker");
  } finally {
    await Deno.remove(dir, { recursive: true });
  }
});

Deno.test("the untouched template fails check --strict with a placeholder-text warning at each placeholder", async () => {
  const parent = await Deno.makeTempDir({ prefix: "fluxnote-qa-" });
  const dir = join(parent, "job");
  try {
    assert.equal((await run(["init", dir])).code, 0);
    const found = await json(["check", dir]);
    const placeholders = found.findings.filter((f) => f.rule === "placeholder-text");
    // Read off templates/new-project/*.md: the title, job number and role names of the front matter, the
    // instructions under Purpose, Scope and Basis of design, the material source marked "Placeholder:" and the
    // instruction to replace the design-day climate.
    assert.deepEqual(placeholders.map((f) => f.at).sort(), [
      "10-materials.md:12:10",
      "30-scenarios.md:3:1",
      "project.md:16:1",
      "project.md:20:1",
      "project.md:25:1",
      "project.md:2:8",
      "project.md:3:12",
      "project.md:6:14",
      "project.md:7:13",
    ]);
    assert.ok(placeholders.every((f) => f.severity === "warning"));
    const roles = placeholders.filter((f) =>
      f.at.startsWith("project.md:") && !f.subject.startsWith("project.md")
    );
    assert.deepEqual(roles.map((f) => f.subject), ["title", "reference", "prepared-by", "checked-by"]);
    const strict = await run(["check", dir, "--strict"]);
    assert.equal(strict.code, 1);
    assert.match(strict.err, /^warning +placeholder-text +9 /m);
  } finally {
    await Deno.remove(parent, { recursive: true });
  }
});

Deno.test("subject patterns: exact text, or * for any run of characters", () => {
  assert.ok(subjectMatches(undefined, "EW-1/max-u"));
  assert.ok(subjectMatches("EW-1/max-u", "EW-1/max-u"));
  assert.ok(!subjectMatches("EW-1", "EW-1/max-u"));
  assert.ok(subjectMatches("timestep:*", "timestep:EW-4"));
  assert.ok(subjectMatches("*:EW-1", "inside-surface-resistance:EW-1"));
  assert.ok(!subjectMatches("*:EW-1", "inside-surface-resistance:EW-10"));
  assert.ok(!subjectMatches("EW.1", "EW-1"), "a dot is a dot, not any character");
});

Deno.test("applies-to lists a few subjects and counts the rest", () => {
  assert.equal(appliesTo(["a", "b"]), "a, b");
  assert.equal(appliesTo(["a", "b", "c", "d", "e", "f"]), "a, b, c, d, e, f");
  assert.equal(appliesTo(["a", "b", "c", "d", "e", "f", "g", "h"]), "a, b, c, d, e, … and 3 more");
});
