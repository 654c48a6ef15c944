import { conductionChain } from "../../src/engine/elements.ts";
import { findPoles } from "../../src/engine/roots.ts";
import { rampResponse } from "../../src/engine/residues.ts";
import { responseFactors } from "../../src/engine/responseFactors.ts";
import { stateSpaceResponse } from "../../src/engine/stateSpaceResponse.ts";
import { selectCtf } from "../../src/engine/ctf.ts";
import type { Layer } from "../../src/engine/layer.ts";
const m = (thicknessM: number, conductivity: number, density: number, specificHeat: number): Layer => ({ kind: "massive", thicknessM, conductivity, density, specificHeat });
const heavy = { layers: [m(0.015, 1.0, 1800, 1000), m(0.105, 0.77, 1700, 800), { kind: "resistive", resistance: 0.18 } as Layer, m(0.08, 0.035, 25, 1400), m(0.15, 1.65, 2300, 1000), m(0.013, 0.57, 1300, 1000)], outsideResistance: 0.04, insideResistance: 0.13 };
Deno.test("scratch", () => {
  for (const dt of [3600, 900]) {
  const chain = conductionChain(heavy, "air-to-air");
  if (chain.kind === "unresolvable") throw new Error();
  let t0 = performance.now();
  const poles = findPoles(chain, 40 / dt);
  const ramp = rampResponse(chain, poles.betas);
  const rf = responseFactors(ramp, dt);
  const ctfRoot = selectCtf(poles.betas.map((b) => Math.exp(-b * dt)), rf, ramp.uValue);
  console.log("root", dt, poles.exactCount, poles.betas.length, rf.termCount, rf.truncationResidual, (performance.now() - t0).toFixed(2), "ms", ctfRoot.ctf.Phi.length, ctfRoot.maxAbsCoefficient, ctfRoot.resynthesisError, ctfRoot.identityError);
  for (const [f, g] of [[0.5, 1], [0.5, 1.5], [0.3, 1.5], [0.5, 2], [0.3, 2],[0.2,2]]) {
    t0 = performance.now();
    const cells = chain.elements.map((e) => e.kind === "massive" ? Math.max(1, Math.ceil(e.thicknessM / (f * Math.sqrt(e.diffusivity * dt)))) : 0);
    const ss = stateSpaceResponse(chain, cells.map((c) => c > 0 ? c + 2 : 0), dt, rf.termCount, g);
    const dtm = performance.now() - t0;
    let worst = 0; let where = "";
    for (const k of ["X", "Y", "Z"] as const) for (let j = 0; j < rf.termCount; j++) { const e = Math.abs(ss.responseFactors[k][j]! - rf[k][j]!) * 1 / ramp.uValue; if (e > worst) { worst = e; where = k + j; } }
    const c = selectCtf(ss.ratios, ss.responseFactors, ramp.uValue);
    console.log(f, g, ss.model.capacities.length, cells.join(","), dtm.toFixed(2), "ms", worst, where, ss.reciprocityError, ss.responseFactors.truncationResidual, "ctf", c.ctf.Phi.length, c.maxAbsCoefficient, c.resynthesisError);
  }}
});
