import assert from "node:assert/strict";
import { analyseConstruction, type DynamicAnalysis, modalConvolve } from "../../src/engine/mod.ts";
import type { ConstructionInput } from "../../src/engine/layer.ts";
import { assertClose, HEAVY_WALL, massive, resistive, SLAB } from "./walls.ts";

function analyse(c: ConstructionInput, dt = 3600, stateSpace = false): DynamicAnalysis {
  const a = analyseConstruction(c, dt, { stateSpace });
  if (a.kind !== "analysis") throw new Error(a.message);
  return a;
}

/**
 * Slab without films, temperature boundary conditions: ramp responses from the Carslaw & Jaeger (1959)
 * eigen-expansion, r_X(t) = U t + C/3 − Σ 2C/(n²π²) e^(−β_n t), r_Y(t) = U t − C/6 + Σ (−1)^(n+1) 2C/(n²π²) e^(−β_n t),
 * β_n = α(nπ/L)²; triangular-pulse factors RF_j = [r(j+1) − 2 r(j) + r(j−1)]/δ (r = 0 for t ≤ 0).
 */
function slabSeries(kind: "X" | "Y", j: number, dt: number): number {
  const l = 0.2, k = 1, rhoC = 2e6, alpha = k / rhoC, c = rhoC * l, u = k / l;
  const ramp = (t: number) => {
    if (t <= 0) return 0;
    let sum = kind === "X" ? c / 3 : -c / 6;
    for (let n = 1; n <= 4000; n++) {
      const term = (2 * c) / (n * n * Math.PI * Math.PI) * Math.exp(-alpha * (n * Math.PI / l) ** 2 * t);
      sum += kind === "X" ? -term : (n % 2 === 1 ? term : -term);
      if (term < 1e-30) break;
    }
    return u * t + sum;
  };
  return (ramp((j + 1) * dt) - 2 * ramp(j * dt) + ramp((j - 1) * dt)) / dt;
}

Deno.test("responseFactors slab X, Y, Z match the analytic eigen-series (1 h and 15 min)", () => {
  for (const dt of [3600, 900]) {
    const rf = analyse(SLAB, dt).airToAir.responseFactors;
    for (let j = 0; j < 30; j++) {
      // Carslaw & Jaeger eigen-series above; relative 1e-9 of U = 5 W/(m² K).
      assertClose(rf.X[j]!, slabSeries("X", j, dt), 5e-9, `X_${j} at ${dt} s`);
      assertClose(rf.Y[j]!, slabSeries("Y", j, dt), 5e-9, `Y_${j} at ${dt} s`);
      assertClose(rf.Z[j]!, slabSeries("X", j, dt), 5e-9, `Z_${j} (= X by symmetry) at ${dt} s`);
    }
  }
});

Deno.test("responseFactors thick layer early response equals the semi-infinite solid: X0 = 2e/√(πΔ)", () => {
  // Carslaw & Jaeger (1959) §2.5: step flux q = e ΔT/√(πt), e = √(kρc); ramp → 2e√t/√π, so
  // X0 = 2e/√(πΔ), X1 = X0(√2 − 2), X2 = X0(√3 − 2√2 + 1).
  for (const dt of [3600, 600]) {
    const c: ConstructionInput = {
      layers: [massive(1.0, 1.4, 2300, 880)],
      outsideResistance: 0,
      insideResistance: 0,
    };
    const e = Math.sqrt(1.4 * 2300 * 880);
    const x0 = (2 * e) / Math.sqrt(Math.PI * dt);
    const rf = analyse(c, dt).airToAir.responseFactors;
    assertClose(rf.X[0]! / x0, 1, 1e-9, `X0 at ${dt} s`);
    assertClose(rf.X[1]! / (x0 * (Math.SQRT2 - 2)), 1, 1e-9, `X1 at ${dt} s`);
    assertClose(rf.X[2]! / (x0 * (Math.sqrt(3) - 2 * Math.SQRT2 + 1)), 1, 1e-8, `X2 at ${dt} s`);
  }
});

Deno.test("responseFactors first moments equal the exact ramp intercepts (Σ jΔ RF_j = −G'(0))", () => {
  // Closed form for a slab without films (from the eigen-series above): X'(0) = C/3, Y'(0) = −C/6,
  // so the mean cross delay Σ jΔ Y_j / U = R C / 6.
  const rf = analyse(SLAB).airToAir.responseFactors;
  const moment = (s: readonly number[]) => s.reduce((acc, v, j) => acc + j * 3600 * v, 0);
  assertClose(moment(rf.X) / (-4e5 / 3), 1, 1e-8, "Σ jΔ X_j");
  assertClose(moment(rf.Y) / (4e5 / 6), 1, 1e-8, "Σ jΔ Y_j");
  assertClose(moment(rf.Y) / 5 / 3600, (0.2 * 4e5) / 6 / 3600, 1e-7, "mean cross delay, h");
});

Deno.test("responseFactors R–C–R lumped wall match the first-order closed form", () => {
  // Closed form for R1 = R2 = 0.5 m²K/W around a capacity C = 1e5 J/(m²K): one pole β = (R1+R2)/(R1 R2 C),
  // q = e^(−βΔ), Y0 = U[1 − (1−q)/(βΔ)], Y_j = U(1−q)² q^(j−1)/(βΔ) (triangular pulse on a first-order system).
  // The capacity is a 1 mm layer with k = 200 W/(m K) (internal resistance 5e-6 m²K/W, Biot ≈ 1e-5).
  const layerR = 0.001 / 200;
  const c: ConstructionInput = {
    layers: [resistive(0.5 - layerR / 2), massive(0.001, 200, 8000, 12500), resistive(0.5 - layerR / 2)],
    outsideResistance: 0,
    insideResistance: 0,
  };
  const a = analyse(c);
  const beta = 1 / (0.25 * 1e5), q = Math.exp(-beta * 3600);
  const rf = a.airToAir.responseFactors;
  assertClose(rf.Y[0]!, 1 - (1 - q) / (beta * 3600), 2e-5, "Y0");
  for (let j = 1; j < 10; j++) {
    assertClose(rf.Y[j]!, (1 - q) ** 2 * q ** (j - 1) / (beta * 3600), 2e-5, `Y_${j}`);
  }
  // Only one pole with βΔ < 40: the layer's own first internal pole is far beyond it.
  assert.equal(a.airToAir.poles.betas.length, 1);
  assertClose(a.airToAir.poles.betas[0]! / beta, 1, 2e-5, "β");
});

Deno.test("responseFactors purely resistive construction: RF_0 = U, later terms 0", () => {
  // Identity: without storage B(s) = R for all s, so the flux follows the temperature instantly.
  const c: ConstructionInput = {
    layers: [resistive(0.18), resistive(2.5)],
    outsideResistance: 0.04,
    insideResistance: 0.13,
  };
  const a = analyse(c, 900, true);
  const u = 1 / (0.04 + 0.18 + 2.5 + 0.13);
  for (const key of ["X", "Y", "Z"] as const) {
    const rf = a.airToAir.responseFactors[key];
    assertClose(rf[0]!, u, 1e-15, `${key}0`);
    for (const v of rf.slice(1)) assert.ok(v === 0, `later term ${v}`);
  }
  assert.deepEqual(a.periodic.cts.map((v) => Math.round(v * 1e12) / 1e12), [1, ...new Array(23).fill(0)]);
  assert.equal(a.iso13786.decrementFactor.toFixed(12), (1).toFixed(12));
  assertClose(a.iso13786.timeLag_h, 0, 1e-12, "lag");
  assert.ok(a.checks.every((c) => c.pass), JSON.stringify(a.checks.filter((c) => !c.pass)));
});

Deno.test("modalConvolve() reproduces direct convolution with the response factors", () => {
  // Identity: RF_j = Σ_n c_n q_n^(j−1) (j ≥ 2), so the first-order recursion equals the convolution sum.
  const a = analyse(HEAVY_WALL);
  const input = Array.from({ length: 400 }, (_, t) => 10 * Math.sin((2 * Math.PI * t) / 24) + (t % 7) - 3);
  for (const key of ["X", "Y", "Z"] as const) {
    const rf = a.airToAir.responseFactors[key];
    const modal = modalConvolve(a.airToAir.modes[key], input);
    input.forEach((_, t) => {
      let direct = 0;
      for (let j = 0; j <= t && j < rf.length; j++) direct += rf[j]! * input[t - j]!;
      assertClose(modal[t]!, direct, 1e-9 * 10 * a.airToAir.uValue, `${key} flux at step ${t}`);
    });
  }
});
