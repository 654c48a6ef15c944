import type { ConductionChain } from "./elements.ts";
import type { ResponseFactors } from "./responseFactors.ts";
import { sumRuleResidual } from "./responseFactors.ts";
import {
  type DiscreteModel,
  discretise,
  type FiniteVolumeModel,
  finiteVolumeModel,
} from "./stateSpaceModel.ts";
import { smallestEigenvalues } from "./tridiagonalEigen.ts";

/** Response factors of the discrete state-space model, with the reciprocity residual of its cross terms. */
export interface StateSpaceResponse {
  readonly model: FiniteVolumeModel;
  readonly responseFactors: ResponseFactors;
  /** max_j |h_j[1,0] + h_j[0,1]| / U: the cross response both ways (reciprocity). */
  readonly reciprocityError: number;
  /** e^(λ_k Δ) of the model's slow modes (> 1e-12), descending. */
  readonly ratios: readonly number[];
}

/** Eigenvalue ratios e^(λΔ) > 1e-12 of the model's system matrix (symmetrised tridiagonal form). */
export function modelRatios(model: FiniteVolumeModel, timestepS: number): number[] {
  const n = model.capacities.length;
  const c = model.capacities;
  const diag: number[] = [];
  const off: number[] = [];
  for (let i = 0; i < n; i++) {
    const left = i === 0 ? model.outsideConductance : model.links[i - 1]!;
    const right = i === n - 1 ? model.insideConductance : model.links[i]!;
    diag.push((left + right) / c[i]!);
    if (i < n - 1) off.push(-model.links[i]! / Math.sqrt(c[i]! * c[i + 1]!));
  }
  const rateMax = -Math.log(1e-12) / timestepS;
  return smallestEigenvalues(diag, off, rateMax).map((rate) => Math.exp(-rate * timestepS));
}

function impulseResponse(model: FiniteVolumeModel, discrete: DiscreteModel, terms: number) {
  const n = discrete.n;
  const go = model.outsideConductance;
  const gi = model.insideConductance;
  const h00: number[] = [], h10: number[] = [], h01: number[] = [], h11: number[] = [];
  const record = (x: Float64Array, first: boolean) => {
    h00.push(-go * x[0]! + (first ? go : 0));
    h01.push(-go * x[1]!);
    h10.push(gi * x[(n - 1) * 2]!);
    h11.push(gi * x[(n - 1) * 2 + 1]! - (first ? gi : 0));
  };
  const { f, gamma0, gammaB } = discrete;
  record(gammaB, true);
  // x_1 = Γ0 − Γb + F Γb
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
      const row = i * n;
      for (let j = 0; j < n; j++) {
        const fij = f.data[row + j]!;
        v0 += fij * x[j * 2]!;
        v1 += fij * x[j * 2 + 1]!;
      }
      next[i * 2] = v0;
      next[i * 2 + 1] = v1;
    }
    x = next;
  }
  return { h00, h01, h10, h11 };
}

/** Builds, discretises and runs the finite-volume state-space model for `terms` response factors. */
export function stateSpaceResponse(
  chain: ConductionChain,
  cellWidths: readonly (readonly number[])[],
  timestepS: number,
  terms: number,
): StateSpaceResponse {
  const model = finiteVolumeModel(chain, cellWidths);
  const u = 1 / chain.totalResistance;
  if (model.capacities.length === 0) {
    const rf = [u, ...new Array<number>(Math.max(0, terms - 1)).fill(0)];
    return {
      model,
      responseFactors: { timestepS, X: rf, Y: rf, Z: rf, truncationResidual: 0, termCount: rf.length },
      reciprocityError: 0,
      ratios: [],
    };
  }
  const discrete = discretise(model, timestepS);
  const { h00, h01, h10, h11 } = impulseResponse(model, discrete, terms);
  const Z = h11.map((v) => -v);
  let reciprocityError = 0;
  for (let j = 0; j < terms; j++) {
    reciprocityError = Math.max(reciprocityError, Math.abs(h10[j]! + h01[j]!) / u);
  }
  return {
    model,
    responseFactors: {
      timestepS,
      X: h00,
      Y: h10,
      Z,
      truncationResidual: Math.max(sumRuleResidual(h00, u), sumRuleResidual(h10, u), sumRuleResidual(Z, u)),
      termCount: terms,
    },
    reciprocityError,
    ratios: modelRatios(model, timestepS),
  };
}
