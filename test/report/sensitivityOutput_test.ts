import assert from "node:assert/strict";
import { join } from "node:path";
import { DOMParser } from "linkedom";
import { runBuild } from "../../src/commands/build.ts";

const quiet = { stdout: () => {}, stderr: () => {} };

/** The minimal fixture with a ±10 % sensitivity study, built into a temporary folder (its output in out/). */
async function builtMinimalWithStudy(): Promise<string> {
  const folder = await Deno.makeTempDir();
  const minimal = new URL("../fixtures/good/minimal/", import.meta.url).pathname;
  Deno.writeTextFileSync(
    join(folder, "project.md"),
    Deno.readTextFileSync(join(minimal, "project.md")).replace(
      "units: SI\n",
      "units: SI\nsensitivity: { variation: 0.1 }\n",
    ),
  );
  Deno.copyFileSync(join(minimal, "walls.md"), join(folder, "walls.md"));
  assert.equal(await runBuild({ project: folder }, quiet), 0);
  return folder;
}

Deno.test("the package's sensitivity study ranks the effects of results.json and draws an inert bar chart", async () => {
  const folder = await builtMinimalWithStudy();
  const results = JSON.parse(Deno.readTextFileSync(join(folder, "out", "results.json")));
  const top = results.sensitivity.constructions["EW-1"].U[0];
  // The largest effect on U of the minimal wall is the mineral wool's conductivity: its layer holds most of R_T
  // (0.1/0.035 of 3.39 m²K/W, ISO 6946 sum in build_test.ts).
  assert.equal(top.material, "mineral-wool-25");
  assert.equal(top.property, "conductivity");
  const page = Deno.readTextFileSync(join(folder, "out", "package.html"));
  const doc = new DOMParser().parseFromString(page, "text/html");
  const section = [...doc.querySelectorAll("h2")].find((h) => h.textContent === "Sensitivity study");
  assert.ok(section !== undefined);
  const firstRow = section.parentNode?.querySelector("table tbody tr");
  assert.ok(firstRow?.textContent?.includes("mineral-wool-25"));
  assert.ok(page.includes("lowered and raised by 10 %"));
  await Deno.remove(folder, { recursive: true });
});

Deno.test("the sensitivity appendix prints each construction's two tables side by side, units in the captions", async () => {
  const folder = await builtMinimalWithStudy();
  const page = Deno.readTextFileSync(join(folder, "out", "package.html"));
  const doc = new DOMParser().parseFromString(page, "text/html");
  const pairs = [...doc.querySelectorAll("#s-f .table-pair")];
  assert.ok(pairs.length > 0, "Appendix F pairs its tables");
  for (const pair of pairs) {
    const cells = [...pair.children];
    assert.equal(cells.length, 2);
    for (const cell of cells) {
      // Each half holds one table (or the note that no effect reached the threshold).
      assert.ok(cell.querySelectorAll("table").length <= 1);
    }
  }
  // The unit is stated once in the caption, so the narrow half-width headers carry no long unit.
  const uTable = [...doc.querySelectorAll("#s-f table")].find((t) =>
    t.querySelector("caption")?.textContent?.startsWith("Effect on the U-value of EW-1")
  );
  assert.ok(uTable?.querySelector("caption")?.textContent?.includes("(changes in W/(m²·K))"));
  assert.ok([...uTable.querySelectorAll("th")].every((th) => !(th.textContent ?? "").includes("W/")));
  // Printed two a row: a two-column grid in the print rules.
  const css = [...doc.querySelectorAll("style")].map((s) => s.textContent ?? "").join("\n");
  assert.match(
    css,
    /#s-f \.table-pair \{ display: grid; grid-template-columns: minmax\(0, 1fr\) minmax\(0, 1fr\)/,
  );
  await Deno.remove(folder, { recursive: true });
});
