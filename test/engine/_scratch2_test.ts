import { conductionChain } from "../../src/engine/elements.ts";
import { findPoles } from "../../src/engine/roots.ts";
import { rampResponse } from "../../src/engine/residues.ts";
import { responseFactors } from "../../src/engine/responseFactors.ts";
import { stateSpaceResponse } from "../../src/engine/stateSpaceResponse.ts";
import type { Layer } from "../../src/engine/layer.ts";
const m = (thicknessM: number, conductivity: number, density: number, specificHeat: number): Layer => ({ kind: "massive", thicknessM, conductivity, density, specificHeat });
const slab = { layers: [m(0.015, 1.0, 1800, 1000), m(0.105, 0.77, 1700, 800), { kind: "resistive", resistance: 0.18 } as Layer, m(0.08, 0.035, 25, 1400), m(0.15, 1.65, 2300, 1000), m(0.013, 0.57, 1300, 1000)], outsideResistance: 0.04, insideResistance: 0.13 };
Deno.test("scratch", () => {
  const dt = 3600;
  const chain = conductionChain(slab, "air-to-air");
  if (chain.kind === "unresolvable") throw new Error();
  const poles = findPoles(chain, 40 / dt);
  const ramp = rampResponse(chain, poles.betas);
  const rf = responseFactors(ramp, dt);
  console.log("root X", rf.X.slice(0, 4), "Y", rf.Y.slice(0, 4), "U", ramp.uValue);
  for (const n of [1, 2, 4, 8]) {
    const ss = stateSpaceResponse(chain, [0, 2*n, 10*n, 0, 4*n, 10*n, 2*n, 0], dt, rf.termCount);
    console.log(n, "dX", ss.responseFactors.X.slice(0, 4).map((v, j) => (v - rf.X[j]!) / ramp.uValue), "dY", ss.responseFactors.Y.slice(0, 4).map((v, j) => (v - rf.Y[j]!) / ramp.uValue));
  }
});
