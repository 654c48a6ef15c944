import assert from "node:assert/strict";
import { join } from "node:path";
import { produceOutputs } from "../../src/commands/produce.ts";
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

/** Starts runServe on an ephemeral loopback port for a copy of the minimal project; `stop` ends it. */
async function startPreview(
  extra: Partial<Parameters<typeof runServe>[0]> = {},
): Promise<{ port: number; project: string; stop: () => Promise<void>; log: string[] }> {
  const project = await Deno.makeTempDir();
  for (const name of ["project.md", "walls.md"]) Deno.copyFileSync(join(MINIMAL, name), join(project, name));
  const controller = new AbortController();
  const listening = Promise.withResolvers<number>();
  const log: string[] = [];
  const io = { stdout: (l: string) => log.push(l), stderr: (l: string) => log.push(l) };
  const done = runServe(
    {
      project,
      port: 0,
      refreshS: 0,
      signal: controller.signal,
      onListen: (p) => listening.resolve(p),
      ...extra,
    },
    io,
  );
  const port = await listening.promise;
  return {
    port,
    project,
    log,
    stop: async () => {
      controller.abort();
      await done;
      await Deno.remove(project, { recursive: true });
    },
  };
}

/** Polls the page until `test` holds; at most 5 s. */
async function pageUntil(port: number, test: (page: string) => boolean): Promise<string> {
  let page = "";
  for (let attempt = 0; attempt < 50; attempt++) {
    page = await (await fetch(`http://127.0.0.1:${port}/`)).text();
    if (test(page)) return page;
    await new Promise((r) => setTimeout(r, 100));
  }
  return page;
}

Deno.test("runServe() shows a fault of a rebuild in the page, escaped, and keeps serving", async () => {
  let calls = 0;
  const preview = await startPreview({
    produce: (loaded) => {
      calls++;
      if (calls === 2) throw new TypeError("renderer broke on <script>alert(1)</script>\u001b[2J");
      return produceOutputs(loaded);
    },
  });
  try {
    assert.ok(
      (await pageUntil(preview.port, (p) => p.includes("Fixture project"))).includes("Fixture project"),
    );
    // Second build: the renderer throws.
    Deno.writeTextFileSync(join(preview.project, "notes.md"), "# Notes\n");
    const broken = await pageUntil(preview.port, (p) => p.includes("could not build the preview"));
    assert.ok(broken.includes("could not build the preview"), "the fault is not shown in the page");
    assert.ok(broken.includes("&lt;script&gt;alert(1)&lt;/script&gt;"), "the fault is not escaped");
    assert.ok(!/<script\b/i.test(broken));
    assert.ok(preview.log.some((l) => l.includes("could not build the preview")));
    // The server is still there, and the next change builds again.
    Deno.writeTextFileSync(
      join(preview.project, "project.md"),
      Deno.readTextFileSync(join(preview.project, "project.md")).replace(
        "Fixture project",
        "Recovered fixture",
      ),
    );
    const recovered = await pageUntil(preview.port, (p) => p.includes("Recovered fixture"));
    assert.ok(recovered.includes("Recovered fixture"), "the preview did not rebuild after the fault");
  } finally {
    await preview.stop();
  }
});

Deno.test("runServe() refuses requests whose Host is not the loopback name it listens on (DNS rebinding)", async () => {
  const preview = await startPreview();
  try {
    const status = async (host: string) => {
      // fetch() does not let a page set Host; a raw request does, as a rebinding browser would send it.
      const conn = await Deno.connect({ hostname: "127.0.0.1", port: preview.port });
      try {
        await conn.write(
          new TextEncoder().encode(`GET / HTTP/1.1\r\nHost: ${host}\r\nConnection: close\r\n\r\n`),
        );
        let text = "";
        const buffer = new Uint8Array(4096);
        for (let n = await conn.read(buffer); n !== null; n = await conn.read(buffer)) {
          text += new TextDecoder().decode(buffer.subarray(0, n));
          if (text.includes("\r\n")) break;
        }
        return Number(/^HTTP\/1\.1 (\d{3})/.exec(text)?.[1]);
      } finally {
        conn.close();
      }
    };
    assert.equal(await status(`127.0.0.1:${preview.port}`), 200);
    assert.equal(await status(`localhost:${preview.port}`), 200);
    assert.equal(await status(`attacker.example:${preview.port}`), 421);
    assert.equal(await status("attacker.example"), 421);
    assert.equal(await status(`127.0.0.1:${preview.port + 1}`), 421);
    assert.equal(await status(`127.0.0.1.attacker.example:${preview.port}`), 421);
  } finally {
    await preview.stop();
  }
});
