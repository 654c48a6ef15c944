import assert from "node:assert/strict";
import { join } from "node:path";
import { DOMParser } from "linkedom";
import { runBuild } from "../../src/commands/build.ts";

const BRIDGED = new URL("../fixtures/bridged/", import.meta.url).pathname;
const quiet = { stdout: () => {}, stderr: () => {} };

Deno.test("the Requirements table follows the project's IP display units", async () => {
  const folder = await Deno.makeTempDir();
  Deno.writeTextFileSync(
    join(folder, "project.md"),
    Deno.readTextFileSync(join(BRIDGED, "project.md")).replace("units: SI", "units: IP"),
  );
  Deno.copyFileSync(join(BRIDGED, "walls.md"), join(folder, "walls.md"));
  await runBuild({ project: folder }, quiet);
  const doc = new DOMParser().parseFromString(
    Deno.readTextFileSync(join(folder, "out", "package.html")),
    "text/html",
  );
  const limits = [...doc.querySelectorAll("table.requirements td")].map((td) => td.textContent ?? "");
  // 1 W/(m²·K) = 0.17611 Btu/(h·ft²·°F) (1 Btu = 1055.05585262 J, NIST SP 811 App. B; 1 ft = 0.3048 m; 1 K = 1.8 °F):
  // the 0.49 W/(m²K) limit of walls.md is 0.08629, printed to three significant figures.
  assert.ok(limits.some((t) => t.includes("0.0863") && t.includes("Btu/(h·ft²·°F)")), limits.join(" | "));
  assert.ok(!limits.some((t) => t.includes("W/(m²K)")));
  await Deno.remove(folder, { recursive: true });
});
