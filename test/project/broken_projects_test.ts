import assert from "node:assert/strict";
import { join } from "node:path";
import { runBuild } from "../../src/commands/build.ts";
import { formatDiagnostic } from "../../src/project/diagnostic.ts";
import { loadProject } from "../../src/commands/loadProject.ts";

const BROKEN = new URL("../fixtures/broken/", import.meta.url).pathname;

/** Each folder under fixtures/broken holds a project and expected.txt: its exact diagnostics, in order. */
const cases = [...Deno.readDirSync(BROKEN)].filter((e) => e.isDirectory).map((e) => e.name).sort();

Deno.test("the broken-project corpus has at least 25 cases", () => {
  assert.ok(cases.length >= 25, `${cases.length} cases`);
});

for (const name of cases) {
  Deno.test(`loadProject() reports the exact diagnostics for broken/${name}`, async () => {
    const folder = join(BROKEN, name);
    const expected = Deno.readTextFileSync(join(folder, "expected.txt")).trimEnd();
    const loaded = await loadProject(folder);
    assert.deepStrictEqual(loaded.model, undefined);
    assert.deepStrictEqual(loaded.diagnostics.map(formatDiagnostic).join("\n"), expected);
  });
}

Deno.test("runBuild() on a broken project exits 1 and writes nothing", async () => {
  const out = await Deno.makeTempDir();
  const target = join(out, "result");
  const lines: string[] = [];
  const code = await runBuild({ project: join(BROKEN, "missing-unit"), out: target }, {
    stdout: (l) => lines.push(l),
    stderr: (l) => lines.push(l),
  });
  assert.deepStrictEqual(code, 1);
  assert.deepStrictEqual([...Deno.readDirSync(out)], []);
  assert.ok(lines.some((l) => l.startsWith("walls.md:7:43: error: Missing unit")));
  await Deno.remove(out, { recursive: true });
});

Deno.test("readProject() refuses a Markdown file over 1 MiB and names the limit", async () => {
  const folder = await Deno.makeTempDir();
  Deno.copyFileSync(join(BROKEN, "../good/minimal/project.md"), join(folder, "project.md"));
  Deno.writeTextFileSync(join(folder, "big.md"), "x".repeat(1024 * 1024 + 1));
  const loaded = await loadProject(folder);
  assert.deepStrictEqual(
    loaded.diagnostics.map(formatDiagnostic)[0],
    'big.md:1:1: error: Cannot read "big.md": 1048577 bytes is more than the limit of 1048576 bytes (1 MiB)\n' +
      "  hint: split the file into several smaller files",
  );
  await Deno.remove(folder, { recursive: true });
});
