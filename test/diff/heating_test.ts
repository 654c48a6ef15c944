import assert from "node:assert/strict";
import { join } from "node:path";
import { loadProject } from "../../src/commands/loadProject.ts";
import { diffProjects, type DiffSide } from "../../src/diff/diffProjects.ts";
import { decodeSource } from "../../src/project/sourceText.ts";
import { computeProject } from "../../src/results/buildResults.ts";

const MINIMAL = new URL("../fixtures/good/minimal/", import.meta.url).pathname;
const winter = (outdoor: string) =>
  "```scenario\nid: winter\nkind: heating\nindoor: 21 degC\nindoor-humidity: 0.5\n" +
  `outdoor: { design-temperature: ${outdoor} }\nsurfaces:\n  - { id: wall, construction: EW-1, area: 20 m^2 }\n` +
  "```\n";

async function sideWith(outdoor: string): Promise<DiffSide> {
  const folder = await Deno.makeTempDir();
  for (const name of ["project.md", "walls.md"]) Deno.copyFileSync(join(MINIMAL, name), join(folder, name));
  Deno.writeTextFileSync(join(folder, "winter.md"), winter(outdoor));
  const loaded = await loadProject(folder);
  assert.ok(loaded.model !== undefined);
  const computed = computeProject(loaded.model, loaded.inputRecords, loaded.dataTexts);
  assert.ok(computed.ok);
  const sources = loaded.files.flatMap((f) => {
    const d = decodeSource(f.path, f.bytes);
    return d.ok ? [d.source] : [];
  });
  return { model: loaded.model, results: computed.computed.results, label: outdoor, kind: "folder", sources };
}

Deno.test("diffProjects() reports a changed heating design condition and its effect on the design heat loss", async () => {
  const diff = diffProjects(await sideWith("-4 degC"), await sideWith("-6 degC"));
  const change = diff.changes.find((c) => c.key === "outdoor.design-temperature");
  assert.ok(change !== undefined);
  assert.deepStrictEqual([change.old, change.new], [-4, -6]);
  const loss = diff.effects.find((e) => e.subject === "heating:winter" && e.quantity === "designHeatLoss");
  assert.ok(loss !== undefined && loss.relative !== null);
  // Steady heat loss U·A·(θ_i − θ_e) (ISO 6946 U): relative change = (21 + 6)/(21 + 4) − 1 = 0.08.
  assert.ok(Math.abs(loss.relative - 0.08) < 1e-12);
});
