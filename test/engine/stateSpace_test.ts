import assert from "node:assert/strict";
import { eigs, expm as mathjsExpm, inv, matrix, multiply, subtract } from "mathjs";
import { analyseConstruction } from "../../src/engine/mod.ts";
import { conductionChain } from "../../src/engine/elements.ts";
import type { ConstructionInput } from "../../src/engine/layer.ts";
import { tridiagonalEigen } from "../../src/engine/tridiagonalEigen.ts";
import { gradedCellWidths } from "../../src/engine/stateSpaceMesh.ts";
import { type FiniteVolumeModel, finiteVolumeModel } from "../../src/engine/stateSpaceModel.ts";
import { modalPulseSeries, modelModes, symmetrisedSystem } from "../../src/engine/stateSpaceModal.ts";
import { reversedModel, stateSpaceResponse } from "../../src/engine/stateSpaceResponse.ts";
import { expmPulseResponses } from "./stateSpaceExpmRoute.ts";
import { assertClose, HEAVY_WALL, LIGHT_WALL, massive } from "./walls.ts";

function chainOf(c: ConstructionInput) {
  const chain = conductionChain(c, "air-to-air");
  if (chain.kind !== "chain") throw new Error(chain.message);
  return chain;
}

function modelOf(c: ConstructionInput, timestepS: number, spacing: number): FiniteVolumeModel {
  const chain = chainOf(c);
  return finiteVolumeModel(chain, gradedCellWidths(chain, timestepS, spacing));
}

function denseSymmetric(diag: readonly number[], off: readonly number[]): number[][] {
  return diag.map((d, i) =>
    diag.map((_, j) => (i === j ? d : Math.abs(i - j) === 1 ? off[Math.min(i, j)]! : 0))
  );
}

Deno.test("tridiagonalEigen() matches mathjs eigs: values and full eigenvectors (random and stiff model matrices)", () => {
  // Reference: mathjs 15.2.0 `eigs`, a general-purpose symmetric eigen-solver (dense Jacobi).
  let s = 11;
  const rand = () => ((s = (1664525 * s + 1013904223) >>> 0) / 2 ** 32);
  const random = { diag: Array.from({ length: 12 }, () => 1 + 3 * rand()), off: [] as number[] };
  random.off = Array.from({ length: 11 }, () => rand() - 0.5);
  const stiff = symmetrisedSystem(modelOf(HEAVY_WALL, 3600, 0.3));
  for (const [name, { diag, off }] of [["random", random], ["heavy-wall model", stiff]] as const) {
    const n = diag.length;
    const ours = tridiagonalEigen(diag, off, Array.from({ length: n }, (_, i) => i));
    const ref = eigs(matrix(denseSymmetric(diag, off)));
    const values = (ref.values as unknown as { toArray(): number[] }).toArray();
    const scale = Math.max(...values.map(Math.abs));
    values.forEach((v, k) => assertClose(ours.values[k]!, v, 1e-12 * scale, `${name} λ_${k}`));
    ref.eigenvectors.forEach(({ vector }, k) => {
      const v = (vector as unknown as { toArray(): number[] }).toArray();
      const norm = Math.hypot(...v);
      const sign = Math.sign(v.reduce((acc, x, i) => acc + x * ours.rows[i]![k]!, 0));
      v.forEach((x, i) => assertClose(ours.rows[i]![k]!, (sign * x) / norm, 1e-9, `${name} V[${i}][${k}]`));
    });
  }
});

Deno.test("modal route equals the expm (augmented matrix) route of the same model to 1e-10 of U", () => {
  // Reference: test/engine/stateSpaceExpmRoute.ts — Van Loan's augmented-matrix exponential (expm is checked
  // against mathjs in expm_test.ts) and dense stepping x_(j+1) = F x_j; the same finite-volume model.
  for (
    const [name, c, dt, spacing] of [
      ["heavy wall, 1 h", HEAVY_WALL, 3600, 0.1],
      ["heavy wall, 15 min", HEAVY_WALL, 900, 0.15],
      ["light wall, 10 min", LIGHT_WALL, 600, 0.1],
    ] as const
  ) {
    const chain = chainOf(c);
    const widths = gradedCellWidths(chain, dt, spacing);
    const u = 1 / chain.totalResistance;
    const modal = stateSpaceResponse(chain, widths, dt, 200).responseFactors;
    const stepped = expmPulseResponses(finiteVolumeModel(chain, widths), dt, 200);
    for (const key of ["X", "Y", "Z"] as const) {
      stepped[key].forEach((v, j) => assertClose(modal[key][j]!, v, 1e-10 * u, `${name} ${key}_${j}`));
    }
  }
});

Deno.test("modal route equals F = e^(AΔ), Γ0 = A⁻¹(F − I)B, Γb = A⁻¹(Γ0/Δ − B) built with mathjs", () => {
  // Reference: the discretisation formulas of the state-space method (Ouyang & Haghighat 1991; METHODS.md §2.3)
  // evaluated with mathjs expm, inv and multiply on a small model (light wall, 8 cells); impulse response
  // h_0 = C Γb + D, h_j = C F^(j−1) (Γ0 − Γb + F Γb).
  const dt = 3600;
  const model = modelOf(LIGHT_WALL, dt, 0.6);
  const n = model.capacities.length;
  assert.ok(n >= 4 && n <= 12, `cells ${n}`);
  const go = model.outsideConductance, gi = model.insideConductance;
  const a = Array.from({ length: n }, (_, i) =>
    Array.from({ length: n }, (_, j) => {
      const left = i === 0 ? go : model.links[i - 1]!;
      const right = i === n - 1 ? gi : model.links[i]!;
      const k = i === j ? -(left + right) : j === i - 1 ? left : j === i + 1 ? right : 0;
      return k / model.capacities[i]!;
    }));
  const b = Array.from({ length: n }, (_, i) => [
    i === 0 ? go / model.capacities[0]! : 0,
    i === n - 1 ? gi / model.capacities[n - 1]! : 0,
  ]);
  const f = mathjsExpm(matrix(a.map((row) => row.map((v) => v * dt)))).toArray() as number[][];
  const aInv = inv(a);
  const fMinusI = subtract(f, f.map((row, i) => row.map((_, j) => (i === j ? 1 : 0)))) as number[][];
  const g0 = multiply(aInv, multiply(fMinusI, b)) as number[][];
  const gb = multiply(aInv, subtract(g0.map((r) => r.map((v) => v / dt)), b)) as number[][];
  let x = (subtract(g0, gb) as number[][]).map((r, i) =>
    r.map((v, k) => v + f[i]!.reduce((s, fij, j) => s + fij * gb[j]![k]!, 0))
  );
  const ref = { X: [go - go * gb[0]![0]!], Y: [gi * gb[n - 1]![0]!], Z: [gi - gi * gb[n - 1]![1]!] };
  for (let j = 1; j < 40; j++) {
    ref.X.push(-go * x[0]![0]!);
    ref.Y.push(gi * x[n - 1]![0]!);
    ref.Z.push(-gi * x[n - 1]![1]!);
    x = multiply(f, x) as number[][];
  }
  const chain = chainOf(LIGHT_WALL);
  const modal = stateSpaceResponse(chain, gradedCellWidths(chain, dt, 0.6), dt, 40).responseFactors;
  const u = 1 / chain.totalResistance;
  for (const key of ["X", "Y", "Z"] as const) {
    ref[key].forEach((v, j) => assertClose(modal[key][j]!, v, 1e-10 * u, `${key}_${j}`));
  }
});

Deno.test("modal response factors of the model sum to U = 1/ΣR (steady state of the finite-volume model)", () => {
  // Closed form: the model's links are the layer and film resistances in series, so its steady conductance is
  // U = 1/ΣR exactly; Σ_j RF_j is the response to a unit step, i.e. U, once the series has decayed.
  const chain = chainOf(HEAVY_WALL);
  const u = 1 / chain.totalResistance;
  const rf = stateSpaceResponse(chain, gradedCellWidths(chain, 3600, 0.1), 3600, 600).responseFactors;
  for (const key of ["X", "Y", "Z"] as const) {
    assertClose(rf[key].reduce((acc, v) => acc + v, 0) / u, 1, 1e-10, `Σ ${key} / U`);
  }
});

Deno.test("reciprocity residual compares two decompositions and detects a model that is not reversed exactly", () => {
  // Reciprocity of a conduction chain: q_i per T_o pulse = q_o per T_i pulse. The residual is ≈ 1e-12 (rounding
  // of two QL runs in opposite orientation), not structurally zero; a 1e-4 change of one capacity in the reversed
  // copy must raise it far above the check's 1e-9.
  const chain = chainOf(HEAVY_WALL);
  const widths = gradedCellWidths(chain, 3600, 0.1);
  const response = stateSpaceResponse(chain, widths, 3600, 300);
  assert.ok(
    response.reciprocityError > 0 && response.reciprocityError < 1e-9,
    `${response.reciprocityError}`,
  );
  const back = reversedModel(response.model);
  const tampered = { ...back, capacities: back.capacities.map((c, i) => (i === 3 ? c * (1 + 1e-4) : c)) };
  const u = 1 / chain.totalResistance;
  const deviation = (m: FiniteVolumeModel) => {
    const modes = modelModes(m);
    const y = modalPulseSeries(modes.rates, modes.inside, modes.outside, 3600, 300, 0);
    return Math.max(...response.responseFactors.Y.map((v, j) => Math.abs(v - y[j]!) / u));
  };
  assert.ok(deviation(back) < 1e-9, `reversed ${deviation(back)}`);
  assert.ok(deviation(tampered) > 1e-9, `tampered ${deviation(tampered)}`);
});

Deno.test("analyseConstruction() state space: agreement within 0.5 % of U, cells per layer reported, checks pass", () => {
  // Reference: the root method of the same analysis (independent route); limits from the engine's checks.
  const steelSkin: ConstructionInput = {
    layers: [massive(0.0007, 50, 7800, 450), massive(0.1, 0.035, 30, 1400), massive(0.0007, 50, 7800, 450)],
    outsideResistance: 0.04,
    insideResistance: 0.13,
  };
  for (
    const [name, c, dt] of [
      ["heavy wall, 1 h", HEAVY_WALL, 3600],
      ["heavy wall, 15 min", HEAVY_WALL, 900],
      ["light wall, 1 min", LIGHT_WALL, 60],
      ["steel skin on insulation, 1 h", steelSkin, 3600],
    ] as const
  ) {
    const a = analyseConstruction(c, dt);
    if (a.kind !== "analysis") throw new Error(a.message);
    const ss = a.stateSpace!;
    assert.ok(ss.agreement.max <= 5e-3, `${name}: agreement ${ss.agreement.max}`);
    assert.equal(a.cellsPerLayer!.length, c.layers.length, name);
    c.layers.forEach((layer, i) =>
      assert.ok(
        layer.kind === "massive" ? a.cellsPerLayer![i]! >= 1 : a.cellsPerLayer![i] === 0,
        `${name} ${i}`,
      )
    );
    for (const id of ["state-space-agreement", "state-space-reciprocity"]) {
      const check = a.checks.find((x) => x.id === id)!;
      assert.ok(check.pass, `${name}: ${id} = ${check.value}`);
    }
  }
});
