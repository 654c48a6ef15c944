import { analyseConstruction } from "../../src/engine/mod.ts";
import type { Layer } from "../../src/engine/layer.ts";
const m = (thicknessM: number, conductivity: number, density: number, specificHeat: number): Layer => ({ kind: "massive", thicknessM, conductivity, density, specificHeat });
const heavy = { layers: [m(0.015, 1.0, 1800, 1000), m(0.105, 0.77, 1700, 800), { kind: "resistive", resistance: 0.18 } as Layer, m(0.08, 0.035, 25, 1400), m(0.15, 1.65, 2300, 1000), m(0.013, 0.57, 1300, 1000)], outsideResistance: 0.04, insideResistance: 0.13 };
Deno.test("scratch", () => {
  for (const dt of [3600, 3600, 900, 600]) {
    const t0 = performance.now();
    const a = analyseConstruction(heavy, dt);
    const t1 = performance.now();
    if (a.kind !== "analysis") throw new Error(a.message);
    console.log(dt, (t1 - t0).toFixed(1), "ms", a.cellsPerLayer, a.airToAir.tau1H, a.iso13786.timeLag_h, a.iso13786.decrementFactor);
    for (const c of a.checks) if (!c.pass || dt === 900) console.log(c.pass ? "  ok " : "  FAIL", c.id, c.value, c.limit);
  }
});
