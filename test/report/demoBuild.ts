/** Test helper: builds projects/demo once per unit system (its `units:` set to SI or IP) into a temp folder. */
import assert from "node:assert/strict";
import { cp } from "node:fs/promises";
import { join } from "node:path";
import { runBuild } from "../../src/commands/build.ts";

const DEMO = new URL("../../projects/demo/", import.meta.url).pathname;

async function buildDemo(units: "SI" | "IP"): Promise<string> {
  const root = await Deno.makeTempDir();
  const project = join(root, "demo");
  await cp(DEMO, project, { recursive: true });
  const front = join(project, "project.md");
  const text = await Deno.readTextFile(front);
  await Deno.writeTextFile(front, text.replace(/^units: SI$/m, `units: ${units}`));
  const out = join(root, "out");
  assert.equal(await runBuild({ project, out }, { stdout: () => {}, stderr: () => {} }), 0);
  return join(out, "package.html");
}

const built = new Map<string, Promise<string>>();

/** The path of the demo's package.html built with `units`, built on first use. */
export function demoPackage(units: "SI" | "IP"): Promise<string> {
  if (!built.has(units)) built.set(units, buildDemo(units));
  return built.get(units)!;
}
