import assert from "node:assert/strict";
import { analyseConstruction, type DynamicAnalysis } from "../../src/engine/mod.ts";
import type { ConstructionInput } from "../../src/engine/layer.ts";
import { fdDecrementAndLag, fdResponseFactors } from "./fdReference.ts";
import { foldPeriodic } from "../../src/engine/periodic.ts";
import { HEAVY_WALL, LIGHT_WALL, massive, reversed } from "./walls.ts";

function analyse(c: ConstructionInput, dt: number): DynamicAnalysis {
  const a = analyseConstruction(c, dt, { stateSpace: false });
  if (a.kind !== "analysis") throw new Error(a.message);
  return a;
}

// Reference: the fine-grid finite-difference model in fdReference.ts (independent discretisation).
// Limits from the engine's specification: RF within 0.1 % of U (absolute), periodic within 0.5 % of U,
// decrement factor within 1 %, lag within 0.1 h.
const CASES: [string, ConstructionInput, number][] = [
  ["heavy wall, 1 h", HEAVY_WALL, 3600],
  ["heavy wall reversed, 1 h", reversed(HEAVY_WALL), 3600],
  ["light wall, 15 min", LIGHT_WALL, 900],
  ["steel skin on insulation, 1 h", {
    layers: [massive(0.0007, 50, 7800, 450), massive(0.1, 0.035, 30, 1400), massive(0.0007, 50, 7800, 450)],
    outsideResistance: 0.04,
    insideResistance: 0.13,
  }, 3600],
];

for (const [name, construction, dt] of CASES) {
  Deno.test(`fd reference agrees with the root method: ${name}`, () => {
    const a = analyse(construction, dt);
    const u = a.airToAir.uValue;
    const hours = Math.min(200, Math.ceil(8 * a.airToAir.tau1H) + 30);
    const terms = Math.round((hours * 3600) / dt);
    const fd = fdResponseFactors(construction, dt, terms, { dxM: 0.002, substeps: dt / 15 });
    for (const key of ["X", "Y", "Z"] as const) {
      const root = a.airToAir.responseFactors[key];
      fd[key].forEach((v, j) => {
        const r = root[j] ?? 0;
        assert.ok(Math.abs(v - r) <= 1e-3 * u, `${key}_${j}: fd ${v} root ${r} (U ${u})`);
      });
    }
    if (dt === 3600) {
      for (
        const [key, periodic] of [["X", a.periodic.X], ["Y", a.periodic.Y], ["Z", a.periodic.Z]] as const
      ) {
        const folded = foldPeriodic(fd[key], 24);
        folded.forEach((v, j) =>
          assert.ok(Math.abs(v - periodic[j]!) <= 5e-3 * u, `${key}P_${j}: fd ${v} root ${periodic[j]}`)
        );
      }
    }
  });
}

Deno.test("fd reference agrees with ISO 13786 decrement factor (1 %) and time lag (0.1 h): heavy and light wall", () => {
  for (const c of [HEAVY_WALL, LIGHT_WALL]) {
    const a = analyse(c, 3600);
    const days = Math.ceil((10 * a.airToAir.tau1H) / 24) + 2;
    const fd = fdDecrementAndLag(c, days, { dxM: 0.002, substeps: 16 }, a.airToAir.uValue);
    assert.ok(
      Math.abs(fd.decrement / a.iso13786.decrementFactor - 1) <= 0.01,
      `f fd ${fd.decrement} iso ${a.iso13786.decrementFactor}`,
    );
    assert.ok(
      Math.abs(fd.lagH - (a.iso13786.timeLag_h % 24)) <= 0.1,
      `lag fd ${fd.lagH} iso ${a.iso13786.timeLag_h}`,
    );
  }
});
