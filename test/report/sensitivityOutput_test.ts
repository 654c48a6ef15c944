import assert from "node:assert/strict";
import { join } from "node:path";
import { DOMParser } from "linkedom";
import { runBuild } from "../../src/commands/build.ts";

const quiet = { stdout: () => {}, stderr: () => {} };

Deno.test("the package's sensitivity study ranks the effects of results.json and draws an inert bar chart", async () => {
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
