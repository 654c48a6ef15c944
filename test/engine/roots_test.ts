import assert, { strictEqual as assertEquals } from "node:assert/strict";
import { conductionChain } from "../../src/engine/elements.ts";
import type { ConstructionInput } from "../../src/engine/layer.ts";
import { rootCountBelow } from "../../src/engine/rootCount.ts";
import { findPoles } from "../../src/engine/roots.ts";
import { realB } from "../../src/engine/transmission.ts";
import { assertClose, HEAVY_WALL, massive, resistive, SLAB } from "./walls.ts";

function chainOf(c: ConstructionInput) {
  const chain = conductionChain(c, "air-to-air");
  if (chain.kind !== "chain") throw new Error(chain.message);
  return chain;
}

Deno.test("findPoles() homogeneous slab: β_n = α(nπ/L)²", () => {
  // Source: Carslaw & Jaeger, Conduction of Heat in Solids (2nd ed., 1959), slab with zero surface
  // temperatures: eigenvalues α n²π²/L².
  const alpha = 1 / 2e6, l = 0.2;
  const poles = findPoles(chainOf(SLAB), 40 / 3600);
  const expectedCount = Math.floor((l / Math.PI) * Math.sqrt(40 / 3600 / alpha));
  assertEquals(poles.betas.length, expectedCount);
  assertEquals(poles.exactCount, expectedCount);
  poles.betas.forEach((beta, i) => {
    const exact = alpha * ((i + 1) * Math.PI / l) ** 2;
    assertClose(beta / exact, 1, 1e-12, `β_${i + 1}`);
  });
});

Deno.test("findPoles() slab with films matches the Robin eigen-condition", () => {
  // Source: Carslaw & Jaeger (1959) §3.10, slab with radiation at both faces: λ_n solve
  // sin(λL)(λ²k² − h1 h2) − λk(h1 + h2) cos(λL) = 0, β_n = α λ_n². Solved here by bisection on a fine grid.
  const k = 1, l = 0.2, alpha = 5e-7, h1 = 1 / 0.04, h2 = 1 / 0.13;
  const f = (lam: number) =>
    Math.sin(lam * l) * (lam * lam * k * k - h1 * h2) - lam * k * (h1 + h2) * Math.cos(lam * l);
  const lamMax = Math.sqrt(40 / 3600 / alpha);
  const expected: number[] = [];
  const steps = 200000;
  for (let i = 0; i < steps; i++) {
    let a = (lamMax * i) / steps + 1e-9, b = (lamMax * (i + 1)) / steps;
    if (f(a) * f(b) > 0) continue;
    for (let it = 0; it < 200; it++) {
      const m = 0.5 * (a + b);
      if (f(a) * f(m) <= 0) b = m;
      else a = m;
    }
    expected.push(alpha * (0.5 * (a + b)) ** 2);
  }
  const poles = findPoles(chainOf({ ...SLAB, outsideResistance: 0.04, insideResistance: 0.13 }), 40 / 3600);
  assertEquals(poles.betas.length, expected.length);
  poles.betas.forEach((beta, i) => assertClose(beta / expected[i]!, 1, 1e-10, `β_${i + 1}`));
});

Deno.test("rootCountBelow() equals sign changes of B(−β) on a dense scan (heavy wall)", () => {
  // Independent count: a 200 000-point scan in √β of the sign of B(−β) (common practice, no source),
  // fine enough here to separate every root pair of this wall.
  const chain = chainOf(HEAVY_WALL);
  const uMax = Math.sqrt(80 / 3600);
  let changes = 0;
  let previous = realB(chain, 1e-30);
  for (let i = 1; i <= 200000; i++) {
    const u = (uMax * i) / 200000;
    const v = realB(chain, u * u);
    if ((v > 0) !== (previous > 0)) changes++;
    previous = v;
  }
  assertEquals(rootCountBelow(chain, uMax * uMax), changes);
  const poles = findPoles(chain, uMax * uMax);
  assertEquals(poles.betas.length, changes);
  for (let i = 1; i < poles.betas.length; i++) assert(poles.betas[i]! > poles.betas[i - 1]!);
  for (const beta of poles.betas) {
    const scale = Math.abs(realB(chain, beta * (1 + 1e-6))) + Math.abs(realB(chain, beta * (1 - 1e-6)));
    assert(Math.abs(realB(chain, beta)) <= 1e-6 * scale, `B(−β) small at β = ${beta}`);
  }
});

Deno.test("findPoles() separates close root pairs of two identical slabs weakly coupled by a large resistance", () => {
  // Two identical slabs coupled through a large resistance have nearly double roots (each slab alone,
  // fixed temperature on one face and nearly insulated on the other: β ≈ α((n − ½)π/L)², Carslaw & Jaeger 1959);
  // a sign-change scan sees no change across such a pair.
  const layer = massive(0.1, 1, 2000, 1000);
  const chain = chainOf({
    layers: [layer, resistive(1000), layer],
    outsideResistance: 0,
    insideResistance: 0,
  });
  const poles = findPoles(chain, 40 / 3600);
  assertEquals(poles.betas.length, poles.exactCount);
  assertEquals(poles.unresolvedIntervals, 0);
  assertEquals(poles.bracketedCount, poles.exactCount);
  const gaps = poles.betas.slice(1).map((b, i) => b / poles.betas[i]! - 1);
  assert(Math.min(...gaps) < 1e-3, `expected a close pair, smallest relative gap ${Math.min(...gaps)}`);
});
