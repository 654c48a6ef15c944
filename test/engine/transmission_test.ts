import assert from "node:assert/strict";
import { conductionChain } from "../../src/engine/elements.ts";
import type { ConstructionInput } from "../../src/engine/layer.ts";
import { realB, realTransmission, transmission } from "../../src/engine/transmission.ts";
import { cAbs, cMul, cSub } from "../../src/engine/complex.ts";
import { assertClose, HEAVY_WALL, LIGHT_WALL } from "./walls.ts";

function chainOf(c: ConstructionInput) {
  const chain = conductionChain(c, "air-to-air");
  if (chain.kind !== "chain") throw new Error(chain.message);
  return chain;
}

Deno.test("realTransmission() at s = 0: A = D = 1, B = R, C = 0 and the closed-form derivatives", () => {
  // Pipes (1957) layer matrix expanded at s = 0; multilayer derivatives by the product rule give
  // B'(0) = Σ C_i [R_a,i R_b,i + (R_a,i + R_b,i) R_i/2 + R_i²/6], A'(0) = Σ C_i (R_a,i + R_i/2),
  // D'(0) = Σ C_i (R_b,i + R_i/2) (R_a,i, R_b,i: resistance outside / inside element i, films included).
  const chain = chainOf(HEAVY_WALL);
  const { m, dmds } = realTransmission(chain, 0);
  const rs = chain.elements.map((e) => e.resistance);
  const cs = chain.elements.map((e) => (e.kind === "massive" ? e.arealHeatCapacity : 0));
  const total = rs.reduce((a, b) => a + b, 0);
  let bPrime = 0, aPrime = 0, dPrime = 0, before = 0;
  rs.forEach((r, i) => {
    const after = total - before - r;
    bPrime += cs[i]! * (before * after + ((before + after) * r) / 2 + (r * r) / 6);
    aPrime += cs[i]! * (before + r / 2);
    dPrime += cs[i]! * (after + r / 2);
    before += r;
  });
  assert.equal(m.a.toFixed(14), (1).toFixed(14));
  assertClose(m.b, total, 1e-14, "B(0)");
  assertClose(m.c, 0, 0, "C(0)");
  assertClose(dmds.b / bPrime, 1, 1e-13, "B'(0)");
  assertClose(dmds.a / aPrime, 1, 1e-13, "A'(0)");
  assertClose(dmds.d / dPrime, 1, 1e-13, "D'(0)");
});

Deno.test("realTransmission() derivative agrees with a central difference; complex and real forms agree", () => {
  // Numerical differentiation (central difference, step 1e-4 β) as an independent check of dM/ds at s = −β,
  // and cosh/sinh at s = −β equal cos/sin (identity cosh(ix) = cos x).
  const chain = chainOf(HEAVY_WALL);
  for (const beta of [1e-6, 3e-5, 4e-4]) {
    const h = 1e-4 * beta;
    const plus = realTransmission(chain, beta - h).m, minus = realTransmission(chain, beta + h).m;
    const { m, dmds } = realTransmission(chain, beta);
    for (const key of ["a", "b", "c", "d"] as const) {
      const numeric = (plus[key] - minus[key]) / (2 * h);
      assertClose(
        dmds[key],
        numeric,
        1e-6 * Math.max(Math.abs(numeric), Math.abs(m[key]) / beta),
        `d${key}/ds at β = ${beta}`,
      );
    }
    const complexM = transmission(chain, { re: -beta, im: 0 });
    for (const key of ["a", "b", "c", "d"] as const) {
      assertClose(complexM[key].re, m[key], 1e-9 * Math.max(1, Math.abs(m[key])), `${key} complex vs real`);
    }
  }
});

Deno.test("transmission() determinant AD − BC = 1 (reciprocity) at complex s", () => {
  // Pipes (1957): every layer matrix has unit determinant, hence so does the product.
  const chain = chainOf(HEAVY_WALL);
  for (const s of [{ re: 0, im: 7.27e-5 }, { re: -2e-5, im: 3e-4 }, { re: 1e-4, im: 1e-4 }]) {
    const m = transmission(chain, s);
    const det = cSub(cMul(m.a, m.d), cMul(m.b, m.c));
    assert.ok(cAbs(cSub(det, { re: 1, im: 0 })) < 1e-9 * Math.max(1, cAbs(cMul(m.a, m.d))));
  }
});

Deno.test("realB() is B of realTransmission() bit for bit, films or none, across the poles' range of β", () => {
  // Reference: realTransmission (its B is checked against closed forms and the complex form above). realB forms
  // the same product without the derivatives, for the root polish; the poles it finds must not move by a bit.
  for (const wall of [HEAVY_WALL, LIGHT_WALL]) {
    for (const boundary of ["air-to-air", "surface-to-surface"] as const) {
      const chain = conductionChain(wall, boundary);
      if (chain.kind !== "chain") throw new Error(chain.message);
      for (let k = 0; k <= 400; k++) {
        // β from 0 to 0.3 1/s (β Δ = 40 at a 2-minute step), dense at the small end where the slow poles lie.
        const beta = k === 0 ? 0 : 1e-9 * Math.pow(1.05, k);
        assert.ok(Object.is(realB(chain, beta), realTransmission(chain, beta).m.b), `${boundary} β ${beta}`);
      }
    }
  }
});
