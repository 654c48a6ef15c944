import { loadProject } from "../../src/commands/loadProject.ts";
import type { DiffSide } from "../../src/diff/diffProjects.ts";
import { decodeSource } from "../../src/project/sourceText.ts";
import { computeProject } from "../../src/results/buildResults.ts";

/** Folder of the diff fixtures: rev-b and rev-c of one invented project. */
export const FIXTURES = new URL("../fixtures/diff/", import.meta.url).pathname;

const cache = new Map<string, Promise<DiffSide>>();

async function load(name: string): Promise<DiffSide> {
  const loaded = await loadProject(`${FIXTURES}${name}`);
  if (loaded.model === undefined) throw new Error(`fixture ${name} does not load`);
  const computed = computeProject(loaded.model, loaded.inputRecords, loaded.dataTexts);
  if (!computed.ok) throw new Error(`fixture ${name} does not compute`);
  const sources = loaded.files.flatMap((f) => {
    const d = decodeSource(f.path, f.bytes);
    return d.ok ? [d.source] : [];
  });
  return { model: loaded.model, results: computed.computed.results, label: name, kind: "folder", sources };
}

/** Loads and computes a diff fixture revision once per test run ("rev-b" or "rev-c"). */
export function side(name: "rev-b" | "rev-c"): Promise<DiffSide> {
  let found = cache.get(name);
  if (found === undefined) {
    found = load(name);
    cache.set(name, found);
  }
  return found;
}
