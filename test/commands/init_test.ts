import assert from "node:assert/strict";
import { join } from "node:path";
import { runBuild } from "../../src/commands/build.ts";
import { runInit } from "../../src/commands/init.ts";

const quiet = { stdout: () => {}, stderr: () => {} };

Deno.test("runInit() writes a starter project that builds with every check passing", async () => {
  const base = await Deno.makeTempDir();
  const project = join(base, "new");
  assert.equal(await runInit(project, quiet), 0);
  assert.deepStrictEqual([...Deno.readDirSync(project)].map((e) => e.name).sort(), [
    "10-materials.md",
    "20-constructions.md",
    "30-scenarios.md",
    "project.md",
  ]);
  assert.equal(await runBuild({ project }, quiet), 0);
  const results = JSON.parse(Deno.readTextFileSync(join(project, "out", "results.json")));
  assert.ok(results.checks.length > 0 && results.checks.every((c: { pass: boolean }) => c.pass));
  await Deno.remove(base, { recursive: true });
});

Deno.test("runInit() refuses a folder that already holds files and leaves them alone", async () => {
  const base = await Deno.makeTempDir();
  Deno.writeTextFileSync(join(base, "notes.md"), "keep me");
  assert.equal(await runInit(base, quiet), 2);
  assert.equal(Deno.readTextFileSync(join(base, "notes.md")), "keep me");
  assert.deepStrictEqual([...Deno.readDirSync(base)].map((e) => e.name), ["notes.md"]);
  await Deno.remove(base, { recursive: true });
});
