/**
 * Reference discretisation of the state-space model for tests: the former production route, kept as an
 * independent check of the modal route. F, Γ0, Γb come from one matrix exponential (scaling and squaring,
 * Padé [13/13]) of the augmented matrix [[AΔ, BΔ, 0], [0, 0, I], [0, 0, 0]] (Van Loan 1978), and the pulse
 * responses by stepping x_(j+1) = F x_j in dense arithmetic.
 */
import { type DenseMatrix, zeros } from "../../src/engine/denseMatrix.ts";
import { expm } from "../../src/engine/expm.ts";
import type { FiniteVolumeModel } from "../../src/engine/stateSpaceModel.ts";

/** Discrete-time model with inputs linear between samples: x_(k+1) = F x_k + Γ0 u_k + Γb (u_(k+1) − u_k). */
export interface DiscreteModel {
  readonly n: number;
  readonly f: DenseMatrix;
  /** n × 2, row-major */
  readonly gamma0: Float64Array;
  /** n × 2, row-major */
  readonly gammaB: Float64Array;
}

/** Exact discretisation by one exponential of the augmented matrix. */
export function discretiseByExpm(model: FiniteVolumeModel, timestepS: number): DiscreteModel {
  const n = model.capacities.length;
  const size = n + 4;
  const m = zeros(size);
  const set = (i: number, j: number, v: number) => (m.data[i * size + j] = v);
  const add = (i: number, j: number, v: number) => (m.data[i * size + j]! += v);
  for (let i = 0; i < n; i++) {
    const c = model.capacities[i]!;
    const left = i === 0 ? model.outsideConductance : model.links[i - 1]!;
    const right = i === n - 1 ? model.insideConductance : model.links[i]!;
    add(i, i, (-(left + right) * timestepS) / c);
    if (i > 0) set(i, i - 1, (left * timestepS) / c);
    if (i < n - 1) set(i, i + 1, (right * timestepS) / c);
  }
  set(0, n, (model.outsideConductance * timestepS) / model.capacities[0]!);
  add(n - 1, n + 1, (model.insideConductance * timestepS) / model.capacities[n - 1]!);
  set(n, n + 2, 1);
  set(n + 1, n + 3, 1);
  const e = expm(m);
  const f = zeros(n);
  const gamma0 = new Float64Array(n * 2);
  const gammaB = new Float64Array(n * 2);
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) f.data[i * n + j] = e.data[i * size + j]!;
    for (let k = 0; k < 2; k++) {
      gamma0[i * 2 + k] = e.data[i * size + n + k]!;
      gammaB[i * 2 + k] = e.data[i * size + n + 2 + k]!;
    }
  }
  return { n, f, gamma0, gammaB };
}

/** Boundary flux responses h_j (outputs q_o, q_i; inputs T_o, T_i) to unit triangular pulses, by stepping. */
export function expmPulseResponses(model: FiniteVolumeModel, timestepS: number, terms: number) {
  const { n, f, gamma0, gammaB } = discretiseByExpm(model, timestepS);
  const go = model.outsideConductance;
  const gi = model.insideConductance;
  const h00: number[] = [], h10: number[] = [], h01: number[] = [], h11: number[] = [];
  const record = (x: Float64Array, first: boolean) => {
    h00.push(-go * x[0]! + (first ? go : 0));
    h01.push(-go * x[1]!);
    h10.push(gi * x[(n - 1) * 2]!);
    h11.push(gi * x[(n - 1) * 2 + 1]! - (first ? gi : 0));
  };
  record(gammaB, true);
  // x_1 = Γ0 − Γb + F Γb, then x_(j+1) = F x_j.
  let x = new Float64Array(n * 2);
  for (let i = 0; i < n; i++) {
    for (let k = 0; k < 2; k++) {
      let v = gamma0[i * 2 + k]! - gammaB[i * 2 + k]!;
      for (let j = 0; j < n; j++) v += f.data[i * n + j]! * gammaB[j * 2 + k]!;
      x[i * 2 + k] = v;
    }
  }
  for (let step = 1; step < terms; step++) {
    record(x, false);
    const next = new Float64Array(n * 2);
    for (let i = 0; i < n; i++) {
      let v0 = 0, v1 = 0;
      for (let j = 0; j < n; j++) {
        const fij = f.data[i * n + j]!;
        v0 += fij * x[j * 2]!;
        v1 += fij * x[j * 2 + 1]!;
      }
      next[i * 2] = v0;
      next[i * 2 + 1] = v1;
    }
    x = next;
  }
  return { X: h00, Y: h10, Z: h11.map((v) => -v), yFromInside: h01.map((v) => -v) };
}
