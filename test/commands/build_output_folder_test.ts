/**
 * What `build --out` may replace: nothing the user owns is renamed, replaced or deleted. The expected
 * outcomes are the rules of issue 10 ("Data loss") as README.md states them (§ Commands, Outputs).
 */
import assert from "node:assert/strict";
import { join } from "node:path";
import { runBuild } from "../../src/commands/build.ts";
import { OUTPUT_MARKER } from "../../src/commands/outputFolder.ts";
import type { ResultsJson } from "../../src/results/types.ts";
import { copyTree, listing } from "../hardening/bounded.ts";
import type { KilledBuildRequest, KillPoint } from "./killedBuildWorker.ts";

const MINIMAL = new URL("../fixtures/good/minimal/", import.meta.url).pathname;

async function build(project: string, out: string): Promise<{ code: number; err: string[] }> {
  const err: string[] = [];
  const code = await runBuild({ project, out }, { stdout: () => {}, stderr: (l) => err.push(l) });
  return { code, err };
}

/** Every file under `folder` with its bytes, by relative path (links recorded by their target). */
function snapshot(folder: string, prefix = ""): Map<string, string> {
  const all = new Map<string, string>();
  for (const entry of Deno.readDirSync(join(folder, prefix))) {
    const relative = prefix === "" ? entry.name : `${prefix}/${entry.name}`;
    const path = join(folder, relative);
    if (entry.isSymlink) all.set(relative, `link → ${Deno.readLinkSync(path)}`);
    else if (entry.isDirectory) { for (const [k, v] of snapshot(folder, relative)) all.set(k, v); }
    else all.set(relative, Deno.readTextFileSync(path));
  }
  return all;
}

/** A temp folder holding a copy of the minimal project as `project/`. */
async function workspace(): Promise<{ base: string; project: string }> {
  const base = await Deno.makeTempDir({ prefix: "fluxnote-out-" });
  const project = join(base, "project");
  copyTree(MINIMAL, project);
  return { base, project };
}

function assertRefused(result: { code: number; err: string[] }, folder: string, why: RegExp): void {
  assert.equal(result.code, 1, result.err.join("\n"));
  const line = result.err[0] ?? "";
  assert.ok(line.startsWith(`fluxnote build: refusing to write to "${folder}": `), line);
  assert.match(line, why);
  assert.match(result.err[1] ?? "", /^ {2}hint: /);
}

Deno.test("build refuses --out equal to the project folder and leaves the project intact", async () => {
  const { base, project } = await workspace();
  const before = snapshot(base);
  assertRefused(await build(project, project), project, /it is the project folder itself/);
  assertRefused(await build(project, `${project}/`), `${project}/`, /it is the project folder itself/);
  assert.deepEqual(snapshot(base), before);
});

Deno.test("build refuses --out that holds the project (parent, ancestor, spelled with ..)", async () => {
  const { base, project } = await workspace();
  Deno.writeTextFileSync(join(base, "letter.txt"), "a document of the user");
  const before = snapshot(base);
  for (const out of [base, `${project}/..`, `${project}/../project/..`]) {
    assertRefused(await build(project, out), out, /holds the project folder/);
  }
  assert.deepEqual(snapshot(base), before);
  // An earlier output folder into which the project was later moved is still refused.
  const out = join(base, "out");
  assert.equal((await build(project, out)).code, 0);
  const inside = join(out, "moved-project");
  copyTree(MINIMAL, inside);
  const withProject = snapshot(out);
  assertRefused(await build(inside, out), out, /holds the project folder/);
  assert.deepEqual(snapshot(out), withProject);
});

Deno.test("build refuses a folder of the user's documents and leaves it untouched", async () => {
  const { base, project } = await workspace();
  const documents = join(base, "documents");
  Deno.mkdirSync(join(documents, "2025"), { recursive: true });
  Deno.writeTextFileSync(join(documents, "2025", "invoice.txt"), "invoice");
  Deno.writeTextFileSync(join(documents, "package.html"), "the user's own page");
  const before = snapshot(base);
  assertRefused(await build(project, documents), documents, /files that fluxnote did not write/);
  assert.deepEqual(snapshot(base), before);
});

Deno.test("build leaves a user file named out untouched", async () => {
  const { base, project } = await workspace();
  const out = join(base, "out");
  Deno.writeTextFileSync(out, "the user's notes, in a file called out");
  const before = snapshot(base);
  assertRefused(await build(project, out), out, /it is a file, not a folder/);
  assert.deepEqual(snapshot(base), before);
});

Deno.test("build leaves a symbolic link out and its target untouched, even a link to its own output", async () => {
  const { base, project } = await workspace();
  const documents = join(base, "documents");
  Deno.mkdirSync(documents);
  Deno.writeTextFileSync(join(documents, "report.txt"), "report");
  const out = join(base, "out");
  Deno.symlinkSync(documents, out);
  const before = snapshot(base);
  assertRefused(await build(project, out), out, /symbolic link/);
  assert.deepEqual(snapshot(base), before);
  // A link to an earlier output set: replacing it would turn the link into a folder.
  Deno.removeSync(out);
  const earlier = join(base, "earlier");
  assert.equal((await build(project, earlier)).code, 0);
  Deno.symlinkSync(earlier, out);
  const withLink = snapshot(base);
  assertRefused(await build(project, out), out, /symbolic link/);
  assert.deepEqual(snapshot(base), withLink);
});

Deno.test("build refuses its earlier output once the user has added a file to it", async () => {
  const { base, project } = await workspace();
  const out = join(base, "out");
  assert.equal((await build(project, out)).code, 0);
  Deno.writeTextFileSync(join(out, "csv", "my-notes.csv"), "kept");
  const before = snapshot(base);
  assertRefused(await build(project, out), out, /"csv\/my-notes\.csv", which is not one of the files/);
  assert.deepEqual(snapshot(base), before);
});

Deno.test("build checks the folder again at the swap and keeps a file the user put there meanwhile", async () => {
  const { base, project } = await workspace();
  const out = join(base, "out");
  assert.equal((await build(project, out)).code, 0);
  const err: string[] = [];
  const beforeSwap = () => Deno.writeTextFileSync(join(out, "draft.txt"), "written during the build");
  const code = await runBuild({ project, out, beforeSwap }, { stdout: () => {}, stderr: (l) => err.push(l) });
  assertRefused({ code, err }, out, /"draft\.txt", which is not one of the files/);
  assert.equal(Deno.readTextFileSync(join(out, "draft.txt")), "written during the build");
  assert.ok(listing(out).includes("package.html"));
  assert.deepEqual(listing(base), ["out", "project"]);
});

Deno.test("build writes into an existing empty folder", async () => {
  const { base, project } = await workspace();
  const out = join(base, "empty");
  Deno.mkdirSync(out);
  assert.equal((await build(project, out)).code, 0);
  assert.deepEqual(listing(out), [OUTPUT_MARKER, "csv", "package.html", "results.json"]);
});

Deno.test("build replaces its own earlier output, marked with the schema, inputs hash and file list", async () => {
  const { base, project } = await workspace();
  const out = join(base, "out");
  assert.equal((await build(project, out)).code, 0);
  Deno.writeTextFileSync(join(out, ".DS_Store"), "file-browser litter");
  Deno.writeTextFileSync(
    join(project, "project.md"),
    `${Deno.readTextFileSync(join(project, "project.md"))}\n`,
  );
  assert.equal((await build(project, out)).code, 0);
  const results = JSON.parse(Deno.readTextFileSync(join(out, "results.json"))) as ResultsJson;
  const marker = JSON.parse(Deno.readTextFileSync(join(out, OUTPUT_MARKER)));
  const written = [...snapshot(out).keys()].filter((p) => p !== OUTPUT_MARKER).sort();
  assert.deepEqual(marker, {
    schema: "fluxnote-output/1",
    tool: marker.tool,
    inputs: results.inputs.sha256,
    files: written,
  });
  assert.match(marker.tool, /^fluxnote \d+\.\d+\.\d+$/);
  assert.deepEqual(listing(base), ["out", "project"]);
});

Deno.test("build replaces an output set written by a fluxnote from before the marker", async () => {
  const { base, project } = await workspace();
  const out = join(base, "out");
  assert.equal((await build(project, out)).code, 0);
  Deno.removeSync(join(out, OUTPUT_MARKER));
  assert.equal((await build(project, out)).code, 0);
  assert.ok(listing(out).includes(OUTPUT_MARKER));
  // The same shape with a results.json that is not fluxnote's is the user's.
  Deno.removeSync(join(out, OUTPUT_MARKER));
  Deno.writeTextFileSync(join(out, "results.json"), '{"mine": true}');
  assertRefused(await build(project, out), out, /files that fluxnote did not write/);
});

Deno.test("the next build removes a killed build's staging and retired folders, never a user's look-alike", async () => {
  const { base, project } = await workspace();
  const reference = join(base, "reference");
  assert.equal((await build(project, reference)).code, 0);
  const partial = join(base, ".out.staging-a1b2c3");
  copyTree(reference, partial);
  Deno.removeSync(join(partial, "package.html"));
  copyTree(reference, join(base, ".out.retired-d4e5f6-0"));
  Deno.mkdirSync(join(base, ".out.staging-empty"));
  Deno.mkdirSync(join(base, ".out.staging-marker-only"));
  Deno.writeTextFileSync(join(base, ".out.staging-marker-only", OUTPUT_MARKER), '{"schema": "flux');
  const lookAlike = join(base, ".out.retired-holiday");
  Deno.mkdirSync(lookAlike);
  Deno.writeTextFileSync(join(lookAlike, "photo.txt"), "a user's folder that only looks like ours");
  const unmarked = join(base, ".out.staging-x");
  Deno.mkdirSync(unmarked);
  Deno.writeTextFileSync(join(unmarked, "results.json"), "{}");
  assert.equal((await build(project, join(base, "out"))).code, 0);
  assert.deepEqual(listing(base), [".out.retired-holiday", ".out.staging-x", "out", "project", "reference"]);
  assert.equal(
    Deno.readTextFileSync(join(lookAlike, "photo.txt")),
    "a user's folder that only looks like ours",
  );
  assert.equal(Deno.readTextFileSync(join(unmarked, "results.json")), "{}");
});

/** Runs a build in a worker, stops it for good at `killAt` and terminates the worker (a kill). */
async function killedBuild(request: KilledBuildRequest): Promise<void> {
  const worker = new Worker(new URL("./killedBuildWorker.ts", import.meta.url).href, { type: "module" });
  try {
    const reached = await new Promise<string>((resolve, reject) => {
      worker.onmessage = (event: MessageEvent<string>) => resolve(event.data);
      worker.onerror = (event) => {
        event.preventDefault();
        reject(new Error(event.message));
      };
      worker.postMessage(request);
    });
    assert.equal(reached, request.killAt);
  } finally {
    worker.terminate();
  }
}

for (const killAt of ["beforeSwap", "afterRetire"] satisfies KillPoint[]) {
  Deno.test(`a build killed at ${killAt} leaves the old set or none at the target, and the next build recovers`, async () => {
    const { base, project } = await workspace();
    const out = join(base, "out");
    assert.equal((await build(project, out)).code, 0);
    const old = snapshot(out);
    Deno.writeTextFileSync(
      join(project, "project.md"),
      `${Deno.readTextFileSync(join(project, "project.md"))}\n`,
    );
    await killedBuild({ project, out, killAt });
    if (killAt === "beforeSwap") {
      assert.deepEqual(snapshot(out), old);
    } else {
      // Between the two renames the target is absent; the old set waits, whole, in its retired folder.
      assert.ok(!listing(base).includes("out"));
      const retired = listing(base).filter((n) => n.startsWith(".out.retired-"));
      assert.equal(retired.length, 1);
      assert.deepEqual(snapshot(join(base, retired[0] ?? "")), old);
    }
    assert.equal(listing(base).filter((n) => n.startsWith(".out.staging-")).length, 1);
    assert.equal((await build(project, out)).code, 0);
    assert.deepEqual(listing(base), ["out", "project"]);
    const fresh = snapshot(out);
    assert.notEqual(fresh.get("package.html"), old.get("package.html"));
    assert.deepEqual([...fresh.keys()].sort(), [...old.keys()].sort());
  });
}
