import assert from "node:assert/strict";
import { join } from "node:path";
import { loadProject } from "../../src/commands/loadProject.ts";
import { computeProject } from "../../src/results/buildResults.ts";

const PROJECT = `---
title: Sensitivity fixture
reference: T-2
revision: A
status: draft
prepared-by: Test Preparer
checked-by: Test Checker
date: 2031-01-15
units: SI
sensitivity: { variation: 0.2 }
---
`;
const WALL =
  "```construction\nid: W\nlayers:\n  - { name: block, thickness: 200 mm, conductivity: 0.5 W/(m K), " +
  "density: 1400 kg/m^3, specific-heat: 1000 J/(kg K), source: test }\n```\n";

Deno.test("sensitivityStudy() gives the closed-form change of U and equal effects of density and specific heat", async () => {
  const folder = await Deno.makeTempDir();
  Deno.writeTextFileSync(join(folder, "project.md"), PROJECT);
  Deno.writeTextFileSync(join(folder, "wall.md"), WALL);
  const loaded = await loadProject(folder);
  assert.ok(loaded.model !== undefined);
  const outcome = computeProject(loaded.model, loaded.inputRecords);
  assert.ok(outcome.ok);
  const study = outcome.computed.results.sensitivity;
  assert.ok(study !== undefined);
  assert.equal(study.variation, 0.2);
  // ISO 6946 (homogeneous layers, Table 7 films for horizontal flow): U(λ) = 1 / (0.04 + d/λ + 0.13).
  const u = (lambda: number) => 1 / (0.04 + 0.2 / lambda + 0.13);
  const byProperty = new Map(study.constructions.W?.U.map((e) => [e.property, e]));
  const conductivity = byProperty.get("conductivity");
  assert.ok(conductivity !== undefined);
  assert.ok(Math.abs(conductivity.minus - (u(0.4) - u(0.5))) < 1e-12);
  assert.ok(Math.abs(conductivity.plus - (u(0.6) - u(0.5))) < 1e-12);
  // U does not depend on density or specific heat (steady state): both effects are zero, below the threshold,
  // left out of the list and counted.
  assert.equal(byProperty.has("density"), false);
  assert.equal(byProperty.has("specificHeat"), false);
  assert.equal(study.constructions.W?.dropped.U, 2);
  // The transient response depends on ρ and c only through ρc (Fourier equation), so their effects on the lag agree.
  const lag = new Map(study.constructions.W?.timeLag_h.map((e) => [e.property, e]));
  assert.ok(Math.abs((lag.get("density")?.plus ?? NaN) - (lag.get("specificHeat")?.plus ?? NaN)) < 1e-9);
  assert.ok((lag.get("density")?.plus ?? 0) > 0, "more mass, longer lag");
  await Deno.remove(folder, { recursive: true });
});
