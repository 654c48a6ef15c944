/**
 * The heating loss of a construction with ΔU corrections uses U_c, the same U as the U-limit of the run, and the
 * heating table shows U and U_c side by side. The construction is the stud wall of test/fixtures/bridged (ISO 6946
 * combined method with fastener and air-gap corrections), worked by hand in test/engine/bridgedLayer_test.ts.
 */
import assert from "node:assert/strict";
import { join } from "node:path";
import { runBuild } from "../../src/commands/build.ts";
import type { HeatingResults } from "../../src/scenarios/heatingTypes.ts";
import type { ResultsJson } from "../../src/results/types.ts";
import { parseDocument } from "../report/dom.ts";

const BRIDGED = new URL("../fixtures/bridged/", import.meta.url).pathname;
const quiet = { stdout: () => {}, stderr: () => {} };

// Hand derivation (test/engine/bridgedLayer_test.ts): R'_T = 77/36, R''_T = 117.1/57, R_T = their mean.
const R_T = (77 / 36 + 117.1 / 57) / 2;
// ΔU = ΔU_f + ΔU''·(R_1/R_T)² with R_1 = R_T − 0.30 m²K/W, ISO 6946:2017 Annex F (from memory); values invented.
const DELTA_U = 0.02 + 0.01 * ((R_T - 0.3) / R_T) ** 2;
const U = 1 / R_T;
const U_C = U + DELTA_U;

const HEATING = [
  "# Winter",
  "",
  "```scenario",
  "id: winter",
  "kind: heating",
  "indoor: 21 degC",
  "indoor-humidity: 0.5",
  "outdoor: { design-temperature: -4 degC }",
  "surfaces:",
  "  - { id: stud, construction: EW-B, area: 40 m^2 }",
  "  - { id: board, construction: EW-H, area: 10 m^2 }",
  "```",
  "",
].join("\n");

async function build(): Promise<
  { heating: HeatingResults; results: ResultsJson; doc: Document; csv: string }
> {
  const project = await Deno.makeTempDir();
  for (const name of ["project.md", "walls.md"]) Deno.copyFileSync(join(BRIDGED, name), join(project, name));
  Deno.writeTextFileSync(join(project, "winter.md"), HEATING);
  const out = join(project, "out");
  assert.equal(await runBuild({ project, out }, quiet), 0);
  const results = JSON.parse(Deno.readTextFileSync(join(out, "results.json"))) as ResultsJson;
  return {
    heating: results.heating!["winter"]!,
    results,
    doc: parseDocument(Deno.readTextFileSync(join(out, "package.html"))),
    csv: Deno.readTextFileSync(join(out, "csv", "heating-winter.csv")),
  };
}

const close = (a: number | undefined, b: number, what: string) =>
  assert.ok(a !== undefined && Math.abs(a - b) <= 1e-9 * Math.abs(b), `${what}: ${a} ≠ ${b}`);

Deno.test("heating loss of a wall with ΔU corrections is U_c·A·ΔT, the U of the U-limit", async () => {
  const { heating, results, csv } = await build();
  const stud = heating.surfaces["stud"]!;
  // The run's U-limit compares correctedU; the heating loss must use the same U_c.
  close(results.constructions["EW-B"]!["correctedU"] as number, U_C, "constructions.EW-B.correctedU");
  close(stud.U, U, "U");
  close(stud.correctedU, U_C, "U_c");
  close(stud.heatLoss, U_C * 40 * 25, "heat loss U_c·A·(21 − (−4))");
  // Without corrections U_c = U: 100 mm at 0.04 W/(m K) between films 0.04 and 0.13 → U = 1/2.67 by hand.
  const board = heating.surfaces["board"]!;
  close(board.correctedU, 1 / 2.67, "U_c of the plain board");
  close(board.heatLoss, (1 / 2.67) * 10 * 25, "board heat loss");
  close(heating.totalHeatLoss, U_C * 40 * 25 + (1 / 2.67) * 10 * 25, "total");
  close(heating.totalUA, U_C * 40 + 10 / 2.67, "Σ U_c·A");
  // The surface temperature keeps the plane-element U: θ_si = θ_i − R_si·U·ΔT with R_si = 0.25 (ISO 13788 default).
  const rT = 1 / U - 0.13 + 0.25;
  close(stud.insideSurfaceTemperature, 21 - (0.25 * 25) / rT, "θ_si");
  const [header, row] = csv.split("\n");
  // Existing columns keep their places; U_c is appended.
  assert.match(header!, /^surface,construction,area_m2,U_W_m2K,heat_loss_W,.*,mould_verdict,U_c_W_m2K$/);
  const cells = row!.split(",");
  // CSV numbers carry 6 significant figures (src/results/csvTable.ts): within half a unit of the 6th figure.
  const six = (a: number, b: number, what: string) =>
    assert.ok(Math.abs(a - b) <= 5e-6 * Math.abs(b), `${what}: ${a} ≠ ${b}`);
  six(Number(cells[4]), U_C * 40 * 25, "CSV heat loss");
  six(Number(cells.at(-1)), U_C, "CSV U_c");
});

Deno.test("heating table shows U and U_c for each surface", async () => {
  const { doc } = await build();
  const table = doc.querySelector("table.heating-surfaces")!;
  const heads = [...table.querySelectorAll("thead th")].map((th) => th.textContent!.trim());
  assert.ok(heads.some((h) => /^U W/.test(h)), heads.join(" | "));
  assert.ok(heads.some((h) => /^Uc W/.test(h)), heads.join(" | "));
  const u = table.querySelector("tr td[data-q='u']")!.textContent!.trim();
  const uc = table.querySelector("tr td[data-q='u-c']")!.textContent!.trim();
  assert.equal(u, U.toPrecision(3));
  assert.equal(uc, U_C.toPrecision(3));
  assert.match(table.querySelector("caption")!.textContent!, /Uc·A/);
});
