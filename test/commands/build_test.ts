import assert from "node:assert/strict";
import { join } from "node:path";
import { runBuild } from "../../src/commands/build.ts";
import type { ResultsJson } from "../../src/results/types.ts";

const MINIMAL = new URL("../fixtures/good/minimal/", import.meta.url).pathname;
const quiet = { stdout: () => {}, stderr: () => {} };

async function build(project: string, out: string, beforeSwap?: () => void): Promise<number> {
  return await runBuild(beforeSwap === undefined ? { project, out } : { project, out, beforeSwap }, quiet);
}

async function copyFolder(from: string, to: string): Promise<void> {
  await Deno.mkdir(to, { recursive: true });
  for (const entry of Deno.readDirSync(from)) {
    if (entry.isFile) Deno.copyFileSync(join(from, entry.name), join(to, entry.name));
  }
}

Deno.test("runBuild() computes U of the minimal wall as the hand sum of ISO 6946 resistances", async () => {
  const out = join(await Deno.makeTempDir(), "out");
  assert.deepStrictEqual(await build(MINIMAL, out), 0);
  const results = JSON.parse(Deno.readTextFileSync(join(out, "results.json"))) as ResultsJson;
  // ISO 6946:2017 (component of homogeneous layers): R_T = R_se + sum(d/lambda) + R_si, U = 1/R_T, with Table 7 R_se = 0.04, R_si = 0.13
  // (horizontal heat flow). Layers: 0.200/1.65 (concrete-2200), 0.100/0.035 (mineral-wool-25),
  // 0.18 (cavity given as a resistance), 0.013/0.21 (lining given inline).
  const expectedR = 0.04 + 0.2 / 1.65 + 0.1 / 0.035 + 0.18 + 0.013 / 0.21 + 0.13;
  const wall = results.constructions["EW-1"];
  assert.ok(wall !== undefined);
  assert.ok(Math.abs(wall.R - expectedR) < 1e-12);
  assert.ok(Math.abs(wall.U - 1 / expectedR) < 1e-12);
  // Areal heat capacity = sum rho c d: 2200*1000*0.2 + 25*1030*0.1 + 700*1000*0.013 (closed form)
  assert.ok(
    Math.abs(wall.steady.arealHeatCapacity - (2200 * 1000 * 0.2 + 25 * 1030 * 0.1 + 700 * 1000 * 0.013)) <
      1e-6,
  );
  assert.deepStrictEqual(results.inputs.files.map((f) => f.path), [
    "project.md",
    "walls.md",
    "builtin-library/concrete-2200",
    "builtin-library/mineral-wool-25",
  ]);
  assert.ok(results.assumptions.some((a) => a.id === "default:inside-surface-resistance:EW-1"));
});

Deno.test("runBuild() gives byte-identical output on a second run and under another time zone", async () => {
  const base = await Deno.makeTempDir();
  assert.deepStrictEqual(await build(MINIMAL, join(base, "a")), 0);
  const tz = Deno.env.get("TZ");
  Deno.env.set("TZ", "Pacific/Chatham");
  try {
    assert.deepStrictEqual(await build(MINIMAL, join(base, "b")), 0);
  } finally {
    if (tz === undefined) Deno.env.delete("TZ");
    else Deno.env.set("TZ", tz);
  }
  for (const file of ["package.html", "results.json", "csv/constructions.csv"]) {
    assert.deepStrictEqual(
      Deno.readFileSync(join(base, "a", file)),
      Deno.readFileSync(join(base, "b", file)),
      file,
    );
  }
});

Deno.test("runBuild() keeps the previous output set intact when a build fails after rendering", async () => {
  const out = join(await Deno.makeTempDir(), "out");
  assert.deepStrictEqual(await build(MINIMAL, out), 0);
  const before = Deno.readFileSync(join(out, "package.html"));
  await assert.rejects(() =>
    build(MINIMAL, out, () => {
      throw new Error("simulated failure after rendering");
    })
  );
  assert.deepStrictEqual(Deno.readFileSync(join(out, "package.html")), before);
  assert.deepStrictEqual([...Deno.readDirSync(join(out, ".."))].map((e) => e.name), ["out"]);
});

Deno.test("runBuild() of BOM and CRLF copies gives the same results as the LF original", async () => {
  const base = await Deno.makeTempDir();
  const twin = join(base, "twin");
  await copyFolder(MINIMAL, twin);
  for (const name of ["project.md", "walls.md"]) {
    const text = Deno.readTextFileSync(join(twin, name));
    Deno.writeTextFileSync(join(twin, name), `\uFEFF${text.replaceAll("\n", "\r\n")}`);
  }
  assert.deepStrictEqual(await build(MINIMAL, join(base, "lf")), 0);
  assert.deepStrictEqual(await build(twin, join(base, "crlf")), 0);
  const lf = JSON.parse(Deno.readTextFileSync(join(base, "lf", "results.json"))) as ResultsJson;
  const crlf = JSON.parse(Deno.readTextFileSync(join(base, "crlf", "results.json"))) as ResultsJson;
  assert.deepStrictEqual(crlf.constructions, lf.constructions);
  assert.deepStrictEqual(crlf.assumptions, lf.assumptions);
  // The hashes are of the exact bytes, so they differ.
  assert.notDeepStrictEqual(crlf.inputs.sha256, lf.inputs.sha256);
});

Deno.test("runBuild() writes the package with no script element and with the CSP meta", async () => {
  const out = join(await Deno.makeTempDir(), "out");
  assert.deepStrictEqual(await build(MINIMAL, out), 0);
  const page = Deno.readTextFileSync(join(out, "package.html"));
  assert.ok(!/<script\b/i.test(page));
  assert.match(page, /<meta http-equiv="Content-Security-Policy" content="default-src &#39;none&#39;/);
});

Deno.test("runBuild() three times at once on one project leaves one complete, uncorrupted output set", async () => {
  const base = await Deno.makeTempDir();
  const out = join(base, "out");
  const codes = await Promise.all([build(MINIMAL, out), build(MINIMAL, out), build(MINIMAL, out)]);
  assert.deepStrictEqual(codes, [0, 0, 0]);
  const reference = join(base, "reference");
  assert.equal(await build(MINIMAL, reference), 0);
  for (const file of ["package.html", "results.json", "csv/constructions.csv"]) {
    assert.deepStrictEqual(
      Deno.readFileSync(join(out, file)),
      Deno.readFileSync(join(reference, file)),
      file,
    );
  }
  assert.deepStrictEqual([...Deno.readDirSync(base)].map((e) => e.name).sort(), ["out", "reference"]);
});
