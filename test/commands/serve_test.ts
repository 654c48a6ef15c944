import assert from "node:assert/strict";
import { join } from "node:path";
import { runServe } from "../../src/commands/serve.ts";

const MINIMAL = new URL("../fixtures/good/minimal/", import.meta.url).pathname;

Deno.test("runServe() answers on loopback and rebuilds after a file change (bounded, stops by itself)", async () => {
  const project = await Deno.makeTempDir();
  for (const name of ["project.md", "walls.md"]) Deno.copyFileSync(join(MINIMAL, name), join(project, name));
  const controller = new AbortController();
  let port = 0;
  const listening = Promise.withResolvers<void>();
  const quiet = { stdout: () => {}, stderr: () => {} };
  const done = runServe({
    project,
    port: 0,
    signal: controller.signal,
    onListen: (p) => {
      port = p;
      listening.resolve();
    },
  }, quiet);
  try {
    await listening.promise;
    const first = await (await fetch(`http://127.0.0.1:${port}/`)).text();
    assert.ok(first.includes("Fixture project"));
    assert.ok(!/<script\b/i.test(first));
    Deno.writeTextFileSync(
      join(project, "project.md"),
      Deno.readTextFileSync(join(project, "project.md")).replace("Fixture project", "Renamed fixture"),
    );
    let changed = false;
    for (let attempt = 0; attempt < 50 && !changed; attempt++) {
      await new Promise((r) => setTimeout(r, 100));
      changed = (await (await fetch(`http://127.0.0.1:${port}/`)).text()).includes("Renamed fixture");
    }
    assert.ok(changed, "the preview did not rebuild within 5 s");
    Deno.writeTextFileSync(join(project, "walls.md"), "```construction\nid: EW-1\nlayers: []\n```\n");
    let showsError = false;
    for (let attempt = 0; attempt < 50 && !showsError; attempt++) {
      await new Promise((r) => setTimeout(r, 100));
      showsError = (await (await fetch(`http://127.0.0.1:${port}/`)).text()).includes("has no layers");
    }
    assert.ok(showsError, "the preview did not show the input error within 5 s");
    assert.equal((await fetch(`http://127.0.0.1:${port}/elsewhere`)).status, 404);
  } finally {
    controller.abort();
    await done;
    await Deno.remove(project, { recursive: true });
  }
});
