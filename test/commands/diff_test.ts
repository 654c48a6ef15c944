import assert from "node:assert/strict";
import { join } from "node:path";
import { main } from "../../src/cli.ts";
import { runBuild } from "../../src/commands/build.ts";
import { runDiff } from "../../src/commands/diff.ts";
import type { ProjectDiff } from "../../src/diff/types.ts";

const FIXTURES = new URL("../fixtures/diff/", import.meta.url).pathname;
const REV_B = join(FIXTURES, "rev-b");
const REV_C = join(FIXTURES, "rev-c");

function capture() {
  const out: string[] = [];
  const err: string[] = [];
  return { out, err, io: { stdout: (l: string) => out.push(l), stderr: (l: string) => err.push(l) } };
}

async function diffJson(a: string, b: string): Promise<ProjectDiff> {
  const { out, io } = capture();
  assert.equal(await runDiff({ a, b, format: "json" }, io), 0);
  return JSON.parse(out.join("\n")) as ProjectDiff;
}

Deno.test("runDiff() on the two fixture folders prints the changes and exits 0", async () => {
  const { out, err, io } = capture();
  assert.equal(await runDiff({ a: REV_B, b: REV_C, format: "text" }, io), 0);
  const text = out.join("\n");
  assert.deepEqual(err, []);
  assert.ok(text.includes("project.md · revision: B → C"));
  assert.ok(text.includes("W-1 · layer 2 · thickness: 100 → 120\u2009mm"));
  assert.ok(text.includes("a 20-constructions.md:10:25, b 20-constructions.md:10:25"));
});

Deno.test("runDiff() of an issued package against a folder gives the same changes as folder against folder", async () => {
  const outDir = join(await Deno.makeTempDir(), "out");
  assert.equal(await runBuild({ project: REV_B, out: outDir }, capture().io), 0);
  const fromPackage = await diffJson(join(outDir, "package.html"), REV_C);
  const fromFolder = await diffJson(REV_B, REV_C);
  assert.equal(fromPackage.a.kind, "package");
  assert.equal(fromFolder.a.kind, "folder");
  assert.equal(fromPackage.a.inputsSha256, fromFolder.a.inputsSha256);
  assert.deepEqual(fromPackage.changes, fromFolder.changes);
  assert.deepEqual(fromPackage.files, fromFolder.files);
  assert.deepEqual(fromPackage.effects, fromFolder.effects);
  assert.equal(fromFolder.changes.length, 8);
});

Deno.test("runDiff() of identical inputs says so and exits 0", async () => {
  const { out, io } = capture();
  assert.equal(await runDiff({ a: REV_B, b: REV_B, format: "text" }, io), 0);
  assert.ok(out.join("\n").includes("no differences"));
  const json = await diffJson(REV_C, REV_C);
  assert.equal(json.identical, true);
  assert.deepEqual(json.changes, []);
});

Deno.test("runDiff() refuses a file that is not a package with exit 2", async () => {
  const dir = await Deno.makeTempDir();
  const notPackage = join(dir, "notes.html");
  Deno.writeTextFileSync(notPackage, "<html><body>not a package</body></html>");
  const { err, io } = capture();
  assert.equal(await runDiff({ a: notPackage, b: REV_C, format: "text" }, io), 2);
  assert.ok(err.some((l) => l.startsWith("fluxnote diff: a: ") && l.includes("not a fluxnote package")));
  assert.equal(await runDiff({ a: REV_B, b: join(dir, "missing"), format: "text" }, capture().io), 2);
});

Deno.test("runDiff() prints input errors of a side prefixed with that side and exits 1", async () => {
  const dir = await Deno.makeTempDir();
  for (const entry of Deno.readDirSync(REV_C)) {
    Deno.copyFileSync(join(REV_C, entry.name), join(dir, entry.name));
  }
  const materials = join(dir, "10-materials.md");
  Deno.writeTextFileSync(materials, Deno.readTextFileSync(materials).replace("0.032 W/(m K)", "0.032"));
  const { out, err, io } = capture();
  assert.equal(await runDiff({ a: REV_B, b: dir, format: "text" }, io), 1);
  assert.deepEqual(out, []);
  // line 17 of 10-materials.md is `conductivity: 0.032 W/(m K)` in rev-c
  assert.ok(err.some((l) => /^b: 10-materials\.md:17:\d+: error: /.test(l)), err.join("\n"));
});

Deno.test("runDiff() --out writes the chosen format to the file, and nothing else beside it", async () => {
  const dir = await Deno.makeTempDir();
  const target = join(dir, "b-to-c.html");
  Deno.writeTextFileSync(target, "old contents");
  const { out, io } = capture();
  assert.equal(await runDiff({ a: REV_B, b: REV_C, format: "html", out: target }, io), 0);
  const page = Deno.readTextFileSync(target);
  assert.ok(page.startsWith("<!DOCTYPE html>"));
  assert.ok(!/<script/i.test(page));
  assert.deepEqual([...Deno.readDirSync(dir)].map((e) => e.name), ["b-to-c.html"]);
  assert.ok(out[0]?.startsWith("wrote "));
});

Deno.test("runDiff() --out refuses a folder, a symbolic link and a revision being compared, changing none", async () => {
  const dir = await Deno.makeTempDir();
  const folder = join(dir, "results");
  Deno.mkdirSync(folder);
  Deno.writeTextFileSync(join(folder, "kept.txt"), "the user's file");
  const target = join(dir, "notes.txt");
  Deno.writeTextFileSync(target, "the link's target");
  const link = join(dir, "link.html");
  Deno.symlinkSync(target, link);
  const revision = join(dir, "rev-b.html");
  const built = join(dir, "built");
  assert.equal(await runBuild({ project: REV_B, out: built }, capture().io), 0);
  Deno.copyFileSync(join(built, "package.html"), revision);
  const packageBytes = Deno.readFileSync(revision);
  const cases: [string, RegExp][] = [
    [folder, /it is a folder, not a file/],
    [link, /it is a symbolic link/],
    [revision, /it is revision ".*rev-b\.html", which is being compared/],
  ];
  for (const [out, why] of cases) {
    const { out: printed, err, io } = capture();
    assert.equal(await runDiff({ a: revision, b: REV_C, format: "html", out }, io), 1);
    assert.deepEqual(printed, []);
    assert.ok(err[0]?.startsWith(`fluxnote diff: refusing to write to "${out}": `), err.join("\n"));
    assert.match(err[0] ?? "", why);
  }
  assert.equal(Deno.readTextFileSync(join(folder, "kept.txt")), "the user's file");
  assert.equal(Deno.readLinkSync(link), target);
  assert.equal(Deno.readTextFileSync(target), "the link's target");
  assert.deepEqual(Deno.readFileSync(revision), packageBytes);
  assert.deepEqual([...Deno.readDirSync(dir)].map((e) => e.name).sort(), [
    "built",
    "link.html",
    "notes.txt",
    "results",
    "rev-b.html",
  ]);
});

Deno.test("fluxnote diff: usage errors exit 2, --help exits 0", async () => {
  assert.equal(await main(["diff", REV_B], capture().io), 2);
  assert.equal(await main(["diff", REV_B, REV_C, "--format", "xml"], capture().io), 2);
  assert.equal(await main(["diff", REV_B, REV_C, "--colour"], capture().io), 2);
  const help = capture();
  assert.equal(await main(["diff", "--help"], help.io), 0);
  assert.ok(help.out.join("\n").includes("fluxnote diff <a> <b>"));
  const json = capture();
  assert.equal(await main(["diff", REV_B, REV_C, "--format", "json"], json.io), 0);
  assert.equal(JSON.parse(json.out.join("\n")).schema, "fluxnote-diff/1");
});

Deno.test({
  name: "runDiff() refuses a device or an oversized file as a package at once, with exit 2",
  ignore: Deno.build.os === "windows",
  fn: async () => {
    const huge = join(await Deno.makeTempDir(), "huge.html");
    Deno.writeTextFileSync(huge, "");
    Deno.truncateSync(huge, 200 * 1024 * 1024 + 1); // sparse; the stated limit is 200 MiB (README, verify)
    for (const [path, expected] of [["/dev/zero", "character device"], [huge, "larger than the limit"]]) {
      const { err, io } = capture();
      assert.equal(await runDiff({ a: path!, b: REV_C, format: "text" }, io), 2);
      assert.ok(err.some((l) => l.startsWith("fluxnote diff: a: ") && l.includes(expected!)), err.join("\n"));
    }
  },
});

const BRIDGED = new URL("../fixtures/bridged/", import.meta.url).pathname;

/** A copy of the bridged fixture with the homogeneous wall's board thinned from 100 mm to `mm`. */
async function bridgedWithBoard(mm: number): Promise<string> {
  const dir = await Deno.makeTempDir();
  for (const entry of Deno.readDirSync(BRIDGED)) {
    Deno.copyFileSync(join(BRIDGED, entry.name), join(dir, entry.name));
  }
  const walls = join(dir, "walls.md");
  const text = Deno.readTextFileSync(walls);
  const edited = text.replace("{ name: board, thickness: 100 mm", `{ name: board, thickness: ${mm} mm`);
  assert.notEqual(edited, text, "the fixture still has the board line");
  Deno.writeTextFileSync(walls, edited);
  return dir;
}

Deno.test("runDiff() puts a limit going MET → NOT MET first, with its clause, in text, JSON and HTML", async () => {
  // EW-H: U = 1/(0.04 + d/0.04 + 0.13) (ISO 6946 layer sum). 100 mm: 1/2.67 = 0.375 ≤ 0.60, MET; 50 mm:
  // 1/1.42 = 0.704 > 0.60 (project-wide max-u, "Invented test brief, cl. 1"), NOT MET.
  const thin = await bridgedWithBoard(50);
  const { out, io } = capture();
  assert.equal(await runDiff({ a: BRIDGED, b: thin, format: "text" }, io), 0);
  const text = out.join("\n");
  const verdict = text.indexOf(
    "construction EW-H · max-u (Invented test brief, cl. 1 (project-wide)): MET → NOT MET",
  );
  assert.ok(verdict > 0, text);
  for (const later of ["Files:", "Constructions:", "Effects on results:"]) {
    assert.ok(text.indexOf(later) > verdict, `${later} comes after the verdict\n${text}`);
  }
  // Counts are whole numbers: limits not met 0 → 2 (max-u, and min-temperature-factor, whose f_Rsi uses the
  // moisture R_si = 0.25 m²·K/W of ISO 13788: 1 − 0.25 / R_T′ falls below 0.9 with the thinner board).
  assert.match(text, /construction EW-H\s+limits not met\s+0\s+2\s+\+2\s+—/);
  // EW-H has no correction on either side: no "U-value with corrections" line for it; U is there.
  assert.ok(!/construction EW-H\s+U-value with corrections/.test(text), text);
  assert.match(text, /construction EW-H\s+U-value\s/);

  const json = await diffJson(BRIDGED, thin);
  const keys = Object.keys(json);
  assert.ok(
    keys.indexOf("verdicts") < keys.indexOf("files") && keys.indexOf("checks") < keys.indexOf("effects"),
  );
  assert.deepEqual(json.verdicts.map((v) => [v.subject, v.limit, v.old, v.new]), [
    ["construction:EW-H", "max-u", "MET", "NOT MET"],
    ["construction:EW-H", "min-temperature-factor", "MET", "NOT MET"],
  ]);
  assert.ok(Math.abs((json.verdicts[0]!.newValue ?? NaN) - 1 / 1.42) < 1e-9);
  assert.deepEqual(json.checks, []);

  const page = capture();
  assert.equal(await runDiff({ a: BRIDGED, b: thin, format: "html" }, page.io), 0);
  const html = page.out.join("\n");
  const first = html.indexOf("<h2>Verdicts changed</h2>");
  assert.ok(
    first > 0 && first < html.indexOf("<h2>Inputs</h2>") && first < html.indexOf("<h2>Effects on results"),
  );
  assert.ok(html.includes("MET → NOT MET"));
});
