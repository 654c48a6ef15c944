import type { ConductionChain } from "./elements.ts";
import type { ResponseFactors } from "./responseFactors.ts";
import { sumRuleResidual } from "./responseFactors.ts";
import { modalPulseSeries, type ModelModes, modelModes } from "./stateSpaceModal.ts";
import { type FiniteVolumeModel, finiteVolumeModel } from "./stateSpaceModel.ts";

/** Response factors of the discrete state-space model, with the reciprocity residual of its cross terms. */
export interface StateSpaceResponse {
  readonly model: FiniteVolumeModel;
  readonly responseFactors: ResponseFactors;
  /**
   * max_j |q_i per T_o pulse − q_o per T_i pulse| / U (reciprocity): the first from the model as built, the
   * second from the same model with its nodes in reverse order (own eigen-decomposition).
   */
  readonly reciprocityError: number;
  /** e^(λ_k Δ) of the model's slow modes (> 1e-12), descending. */
  readonly ratios: readonly number[];
}

/** The same model with its nodes numbered from the inside: T_i becomes its first input. */
export function reversedModel(model: FiniteVolumeModel): FiniteVolumeModel {
  return {
    cellsPerElement: [...model.cellsPerElement].reverse(),
    capacities: [...model.capacities].reverse(),
    links: [...model.links].reverse(),
    outsideConductance: model.insideConductance,
    insideConductance: model.outsideConductance,
  };
}

/** Magnitude below which a mode's remaining geometric tail is dropped, relative to U. */
const TAIL_FLOOR = 1e-17;

/** −v term by term, as a plain array (a loop: Array.from with a mapping function is slow on long series). */
function negated(series: Float64Array): number[] {
  const out: number[] = [];
  for (let j = 0; j < series.length; j++) out.push(-series[j]!);
  return out;
}

/** Outside-pulse (X, Y) and inside-pulse (Z) response factors of the model from its modes. */
function modalResponseFactors(
  modes: ModelModes,
  model: FiniteVolumeModel,
  timestepS: number,
  terms: number,
  floor: number,
) {
  const { rates, outside, inside } = modes;
  const xo = modalPulseSeries(rates, outside, outside, timestepS, terms, floor);
  const y = modalPulseSeries(rates, inside, outside, timestepS, terms, floor);
  const zi = modalPulseSeries(rates, inside, inside, timestepS, terms, floor);
  const X = negated(xo);
  const Z = negated(zi);
  X[0] = X[0]! + model.outsideConductance;
  Z[0] = Z[0]! + model.insideConductance;
  return { X, Y: Array.from(y), Z };
}

/**
 * Builds the finite-volume model, takes its modes and sums the exact discrete response mode by mode. The modal
 * form is the same exact discretisation as one exponential of the augmented matrix (agreement 1e-10 of U in the
 * tests) at O(n²) for the QL sweeps plus O(modes × terms) for the series, instead of O(n³) for the exponential
 * and O(n² × terms) for stepping the dense F.
 */
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
  const modes = modelModes(model);
  const floor = TAIL_FLOOR * u;
  const { X, Y, Z } = modalResponseFactors(modes, model, timestepS, terms, floor);
  const reversed = reversedModel(model);
  const back = modelModes(reversed);
  const yBack = modalPulseSeries(back.rates, back.inside, back.outside, timestepS, terms, floor);
  let reciprocityError = 0;
  for (let j = 0; j < terms; j++) {
    const e = Math.abs(Y[j]! - yBack[j]!) / u;
    if (!(e <= reciprocityError)) reciprocityError = Number.isNaN(e) ? Infinity : e;
  }
  const ratios: number[] = [];
  for (const rate of modes.rates) {
    const q = Math.exp(-rate * timestepS);
    if (q > 1e-12) ratios.push(q);
  }
  return {
    model,
    responseFactors: {
      timestepS,
      X,
      Y,
      Z,
      truncationResidual: Math.max(sumRuleResidual(X, u), sumRuleResidual(Y, u), sumRuleResidual(Z, u)),
      termCount: terms,
    },
    reciprocityError,
    ratios,
  };
}
