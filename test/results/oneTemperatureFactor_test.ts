/**
 * One f_Rsi per construction: the construction-level `temperatureFactor` (and so a `min-temperature-factor`
 * limit) uses the same moisture inside surface resistance as the heating scenario's ISO 13788 surface checks,
 * and every label names that R_si. Projects are written to a temporary folder and built end to end.
 */
import assert from "node:assert/strict";
import { join } from "node:path";
import { runBuild } from "../../src/commands/build.ts";
import { quantityName } from "../../src/diff/display.ts";
import type { ResultsJson } from "../../src/results/types.ts";
import { parseDocument } from "../report/dom.ts";

const quiet = { stdout: () => {}, stderr: () => {} };

const FRONT = `---
title: f_Rsi fixture
reference: T-FRSI
revision: A
status: draft
prepared-by: Test Preparer
checked-by: Test Checker
date: 2031-01-15
units: SI
---

# f_Rsi fixture (invented values)
`;

// A solid wall: 220 mm at λ = 0.5 W/(m·K) → R = 0.44 m²·K/W; with R_si 0.13 and R_se 0.04 (ISO 6946 Table 7,
// horizontal heat flow, from memory) R_T = 0.61 m²·K/W.
const WALL = `
\`\`\`construction
id: SW-1
name: Solid wall
layers:
  - { name: solid masonry, thickness: 220 mm, conductivity: 0.5 W/(m K), density: 1800 kg/m^3, specific-heat: 1000 J/(kg K), source: invented test layer }
limits:
  min-temperature-factor: { value: 0.7, clause: "Invented test brief, cl. 3" }
\`\`\`

\`\`\`construction
id: SW-2
name: Solid wall, not in any heating scenario
layers:
  - { name: solid masonry, thickness: 220 mm, conductivity: 0.5 W/(m K), density: 1800 kg/m^3, specific-heat: 1000 J/(kg K), source: invented test layer }
\`\`\`
`;

function heating(id: string, rsi?: string): string {
  return `
\`\`\`scenario
id: ${id}
kind: heating
indoor: 21 degC
indoor-humidity: 0.5
outdoor: { design-temperature: -4 degC }
${rsi === undefined ? "" : `moisture-surface-resistance: ${rsi}\n`}surfaces:
  - { id: wall, construction: SW-1, area: 10 m^2 }
\`\`\`
`;
}

async function build(scenarios: string): Promise<{ results: ResultsJson; page: string }> {
  const dir = await Deno.makeTempDir();
  Deno.writeTextFileSync(join(dir, "project.md"), FRONT);
  Deno.writeTextFileSync(join(dir, "walls.md"), `# Walls\n${WALL}`);
  Deno.writeTextFileSync(join(dir, "winter.md"), `# Winter\n${scenarios}`);
  const out = join(dir, "out");
  assert.equal(await runBuild({ project: dir, out }, quiet), 0);
  return {
    results: JSON.parse(Deno.readTextFileSync(join(out, "results.json"))) as ResultsJson,
    page: Deno.readTextFileSync(join(out, "package.html")),
  };
}

const R_T = 0.61; // m²·K/W with the construction's own R_si = 0.13

Deno.test("the f_Rsi limit and the heating mould verdict agree: both use the moisture R_si 0.25", async () => {
  const { results, page } = await build(heating("winter"));
  const wall = results.constructions["SW-1"]!;
  // f_Rsi = 1 − R_si/R_T' with R_T' = R_T − 0.13 + 0.25 = 0.73 (ISO 13788 default R_si 0.25, from memory);
  // with the wall's own 0.13 it would be 1 − 0.13/0.61 = 0.787, above the limit 0.7.
  const expected = 1 - 0.25 / (R_T - 0.13 + 0.25);
  assert.ok(Math.abs((wall["temperatureFactor"] as number) - expected) < 1e-12);
  assert.equal(wall["temperatureFactorRsi"], 0.25);
  const surface = results.heating!["winter"]!.surfaces["wall"]!;
  assert.ok(Math.abs(surface.fRsi - (wall["temperatureFactor"] as number)) < 1e-12, "one f_Rsi");
  // θ_i 21 °C, θ_e −4 °C, φ 50 %: f_Rsi,min ≈ 0.70 (ISO 13788 mould criterion, 80 % surface humidity): mould risk
  assert.equal(surface.mould.pass, false);
  const limit = (wall["limits"] as { limitKey: string; pass: boolean; value: number }[])
    .find((l) => l.limitKey === "min-temperature-factor")!;
  assert.equal(limit.pass, false, "the limit is NOT MET where the heating table says mould risk");
  assert.equal(limit.value, wall["temperatureFactor"]);
  // Labels name the R_si: the Requirements row and the heating table's f_Rsi column.
  const doc = parseDocument(page);
  const row = Array.from(doc.querySelectorAll("table.requirements td")).map((td) => td.textContent ?? "");
  assert.ok(row.some((t) => /f_Rsi \(R_si = 0\.250? m²·K\/W/.test(t)), row.join(" | "));
  const heads = Array.from(doc.querySelectorAll("table.heating-surfaces th")).map((th) =>
    th.textContent ?? ""
  );
  assert.ok(heads.some((t) => /^fRsi \(R_si = 0\.250? m²·K\/W\)$/.test(t.trim())), heads.join(" | "));
});

Deno.test("f_Rsi takes the scenario's stated moisture R_si; a construction in no heating scenario takes the project's", async () => {
  const { results } = await build(heating("winter", "0.2 m^2 K/W"));
  const wall = results.constructions["SW-1"]!;
  assert.equal(wall["temperatureFactorRsi"], 0.2);
  assert.ok(Math.abs((wall["temperatureFactor"] as number) - (1 - 0.2 / (R_T - 0.13 + 0.2))) < 1e-12);
  assert.equal(
    results.constructions["SW-2"]!["temperatureFactorRsi"],
    0.2,
    "the project's one moisture R_si",
  );
});

Deno.test("heating scenarios with different R_si: the construction's f_Rsi uses the largest, and says so", async () => {
  const { results } = await build(heating("mild", "0.17 m^2 K/W") + heating("severe", "0.25 m^2 K/W"));
  assert.equal(results.constructions["SW-1"]!["temperatureFactorRsi"], 0.25);
  assert.equal(
    results.constructions["SW-2"]!["temperatureFactorRsi"],
    0.25,
    "ISO 13788 default when they differ",
  );
  assert.ok(
    results.assumptions.some((a) => a.id === "temperature-factor-rsi:SW-1" && /mild, severe/.test(a.text)),
  );
});

Deno.test("diff names f_Rsi with its moisture R_si, so one label means one quantity", () => {
  assert.match(quantityName("temperatureFactor"), /f_Rsi \(moisture R_si, ISO 13788 default 0\.25 m²·K\/W\)/);
});
