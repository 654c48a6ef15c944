/**
 * Engine benchmark: `npx -y deno@2.9.6 bench bench/engine_bench.ts`.
 * Parts of the analysis of an invented six-layer heavy wall at 1 h, 1000 random constructions (root route alone
 * and with the state-space route), and the fine-grid finite-difference reference (test/engine/fdReference.ts) at
 * the accuracy its test demands (response factors within 0.1 % of U), for the speed ratio.
 * Targets: whole analysis of one construction with state space < 5 ms; 1000 constructions with it < 3 s.
 * Group "state space" sets the modal (implicit QL) discretisation of the heavy-wall model beside the former
 * matrix-exponential route of the same mesh (kept as a test reference, test/engine/stateSpaceExpmRoute.ts).
 */
import { analyseConstruction } from "../src/engine/mod.ts";
import { conductionChain } from "../src/engine/elements.ts";
import type { ConstructionInput, Layer } from "../src/engine/layer.ts";
import { findPoles } from "../src/engine/roots.ts";
import { rampResponse } from "../src/engine/residues.ts";
import { responseFactors } from "../src/engine/responseFactors.ts";
import { selectCtf } from "../src/engine/ctf.ts";
import { periodicFromModes } from "../src/engine/periodic.ts";
import { pulseModes } from "../src/engine/pulseModes.ts";
import { iso13786 } from "../src/engine/iso13786.ts";
import { stateSpaceAnalysis } from "../src/engine/stateSpaceAnalysis.ts";
import { stateSpaceResponse } from "../src/engine/stateSpaceResponse.ts";
import { finiteVolumeModel } from "../src/engine/stateSpaceModel.ts";
import { fdResponseFactors } from "../test/engine/fdReference.ts";
import { expmPulseResponses } from "../test/engine/stateSpaceExpmRoute.ts";
import { HEAVY_WALL } from "../test/engine/walls.ts";

const chain = conductionChain(HEAVY_WALL, "air-to-air");
if (chain.kind !== "chain") throw new Error(chain.message);
const dt = 3600;
const poles = findPoles(chain, 40 / dt);
const ramp = rampResponse(chain, poles.betas);
const rf = responseFactors(ramp, dt);
const modes = pulseModes(ramp, "Y", dt);

Deno.bench("heavy wall: poles (count + bisection + Brent)", { group: "parts" }, () => {
  findPoles(chain, 40 / dt);
});
Deno.bench("heavy wall: residues + response factors X, Y, Z", { group: "parts" }, () => {
  responseFactors(rampResponse(chain, poles.betas), dt);
});
Deno.bench("heavy wall: root CTF (select, convolve, resynthesise)", { group: "parts" }, () => {
  selectCtf(modes.ratios, rf, ramp.uValue);
});
Deno.bench("heavy wall: periodic factors + ISO 13786 (unwrapped lag)", { group: "parts" }, () => {
  for (const key of ["X", "Y", "Z"] as const) periodicFromModes(pulseModes(ramp, key, 3600), 24);
  iso13786(chain);
});
const ss = stateSpaceAnalysis(chain, dt, rf, ramp.uValue);
const cells = ss.response.model.capacities.length;
Deno.bench(`heavy wall: state space whole (mesh, modes, RFs, reciprocity, CTF), ${cells} cells`, {
  group: "parts",
}, () => {
  stateSpaceAnalysis(chain, dt, rf, ramp.uValue);
});
Deno.bench(`heavy wall: state-space RFs, modal route (QL, both orientations), ${cells} cells`, {
  group: "state space",
  baseline: true,
}, () => {
  stateSpaceResponse(chain, ss.cellWidths, dt, rf.termCount);
});
Deno.bench(`heavy wall: state-space RFs, former expm route (test reference), ${cells} cells`, {
  group: "state space",
  n: 3,
  warmup: 1,
}, () => {
  expmPulseResponses(finiteVolumeModel(chain, ss.cellWidths), dt, rf.termCount);
});
Deno.bench("heavy wall: analyseConstruction, root route only", { group: "whole", baseline: true }, () => {
  analyseConstruction(HEAVY_WALL, dt, { stateSpace: false });
});
Deno.bench("heavy wall: analyseConstruction, with state space", { group: "whole" }, () => {
  analyseConstruction(HEAVY_WALL, dt);
});
Deno.bench("heavy wall: FD reference RFs (0.1 % of U)", { group: "whole", n: 3, warmup: 1 }, () => {
  fdResponseFactors(HEAVY_WALL, dt, 150, { dxM: 0.002, substeps: 240 });
});

/** Deterministic pseudo-random constructions (LCG). */
function randomConstructions(count: number): ConstructionInput[] {
  let s = 12345;
  const r = () => ((s = (1664525 * s + 1013904223) >>> 0) / 2 ** 32);
  const between = (lo: number, hi: number) => lo * (hi / lo) ** r();
  return Array.from({ length: count }, () => {
    const n = 1 + Math.floor(r() * 6);
    const layers: Layer[] = Array.from(
      { length: n },
      () =>
        r() < 0.15 ? { kind: "resistive", resistance: between(0.05, 0.5) } : {
          kind: "massive",
          thicknessM: between(0.005, 0.3),
          conductivity: between(0.03, 2.5),
          density: between(20, 2500),
          specificHeat: between(800, 1500),
        },
    );
    return { layers, outsideResistance: 0.04, insideResistance: 0.13 };
  });
}
const random = randomConstructions(1000);
Deno.bench("1000 random constructions, root route only, 1 h", {
  group: "batch",
  n: 3,
  warmup: 1,
  baseline: true,
}, () => {
  for (const c of random) analyseConstruction(c, 3600, { stateSpace: false });
});
Deno.bench("1000 random constructions, with state space, 1 h", { group: "batch", n: 3, warmup: 1 }, () => {
  for (const c of random) analyseConstruction(c, 3600);
});
