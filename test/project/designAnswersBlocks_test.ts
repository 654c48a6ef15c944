import assert from "node:assert/strict";
import { join } from "node:path";
import { loadProject } from "../../src/commands/loadProject.ts";
import { formatDiagnostic } from "../../src/project/diagnostic.ts";

const FIXTURES = new URL("../fixtures/design-answers/", import.meta.url).pathname;

/** Each broken folder holds expected.txt: the exact diagnostics (file:line:col, message, hint), in order. */
for (const name of ["broken-rts", "broken-heating"]) {
  Deno.test(`loadProject() reports the exact diagnostics for design-answers/${name}`, async () => {
    const folder = join(FIXTURES, name);
    const expected = Deno.readTextFileSync(join(folder, "expected.txt")).trimEnd();
    const loaded = await loadProject(folder);
    assert.equal(loaded.model, undefined);
    assert.equal(loaded.diagnostics.map(formatDiagnostic).join("\n"), expected);
  });
}

Deno.test("a heating block resolves into model.heatingScenarios, a design day keeps its radiant time series", async () => {
  const loaded = await loadProject(join(FIXTURES, "good"));
  assert.deepStrictEqual(loaded.diagnostics.filter((d) => d.severity === "error"), []);
  const model = loaded.model!;
  assert.deepStrictEqual(model.scenarios.map((s) => s.id), ["summer"]);
  const summer = model.scenarios[0]!;
  assert.ok(summer.kind === "design-day");
  assert.equal(summer.radiantTimeSeries?.values.length, 24);
  assert.equal(summer.radiantTimeSeries?.source, "Invented test series <b>not</b> from any table");
  const winter = model.heatingScenarios?.[0];
  assert.equal(winter?.id, "winter");
  assert.equal(winter?.indoorC, 20);
  assert.equal(winter?.outdoorC, 0);
  assert.equal(winter?.indoorRelativeHumidity, 0.5);
  assert.equal(winter?.moistureSurfaceResistance, 0.13);
  assert.deepStrictEqual(winter?.surfaces.map((s) => [s.id, s.areaM2, s.azimuthDeg]), [
    ["south", 20, undefined],
    ["north", 10, 0],
  ]);
});

Deno.test("a heating scenario and a design day may not share an id", async () => {
  const folder = await Deno.makeTempDir();
  for (const file of ["project.md", "walls.md"]) {
    Deno.copyFileSync(join(FIXTURES, "good", file), join(folder, file));
  }
  const text = Deno.readTextFileSync(join(FIXTURES, "good", "scenario.md")).replace(
    "id: winter",
    "id: summer",
  );
  Deno.writeTextFileSync(join(folder, "scenario.md"), text);
  const loaded = await loadProject(folder);
  assert.equal(loaded.model, undefined);
  const messages = loaded.diagnostics.map(formatDiagnostic);
  assert.ok(
    messages.some((m) => m.startsWith("scenario.md:19:1: error:") && m.includes("summer")),
    messages.join("\n"),
  );
  await Deno.remove(folder, { recursive: true });
});
