import { type DenseMatrix, zeros } from "./denseMatrix.ts";
import type { ConductionChain } from "./elements.ts";
import { expm } from "./expm.ts";

/** Finite-volume model of a chain: node capacities and the conductances of the links between them. */
export interface FiniteVolumeModel {
  /** Cells in each chain element (0 for a resistive element). */
  readonly cellsPerElement: readonly number[];
  /** Node capacities, J/(m^2 K), outside to inside. */
  readonly capacities: readonly number[];
  /** Conductance between node i and i+1, W/(m^2 K) (length n − 1). */
  readonly links: readonly number[];
  /** Conductance from the outside boundary temperature to node 0, W/(m^2 K). */
  readonly outsideConductance: number;
  /** Conductance from the last node to the inside boundary temperature, W/(m^2 K). */
  readonly insideConductance: number;
}

/**
 * Builds the cell-centred finite-volume model: `cellWidths[e]` gives the relative widths (summing to 1) of the
 * cells of massive element e; resistive elements carry no node and are folded into the link conductances.
 */
export function finiteVolumeModel(
  chain: ConductionChain,
  cellWidths: readonly (readonly number[])[],
): FiniteVolumeModel {
  const capacities: number[] = [];
  const links: number[] = [];
  let pendingResistance = 0;
  let outsideConductance = 0;
  for (const [e, element] of chain.elements.entries()) {
    switch (element.kind) {
      case "resistive":
        pendingResistance += element.resistance;
        break;
      case "massive": {
        const given = cellWidths[e] ?? [];
        const widths = given.length > 0 ? given : [1];
        for (const width of widths) {
          const halfCellResistance = (element.resistance * width) / 2;
          const linkResistance = pendingResistance + halfCellResistance;
          if (capacities.length === 0) outsideConductance = 1 / linkResistance;
          else links.push(1 / linkResistance);
          capacities.push(element.arealHeatCapacity * width);
          pendingResistance = halfCellResistance;
        }
        break;
      }
    }
  }
  const cells = chain.elements.map((
    e,
    i,
  ) => (e.kind === "massive" ? Math.max(1, cellWidths[i]?.length ?? 1) : 0));
  return {
    cellsPerElement: cells,
    capacities,
    links,
    outsideConductance: capacities.length === 0 ? 1 / chain.totalResistance : outsideConductance,
    insideConductance: 1 / pendingResistance,
  };
}

/** Discrete-time model with inputs linear between samples: x_(k+1) = F x_k + Γ0 u_k + Γb (u_(k+1) − u_k). */
export interface DiscreteModel {
  readonly n: number;
  readonly timestepS: number;
  readonly f: DenseMatrix;
  /** n × 2, row-major */
  readonly gamma0: Float64Array;
  /** n × 2, row-major */
  readonly gammaB: Float64Array;
}

/** Exact discretisation by one exponential of the augmented matrix [[Aδ, Bδ, 0], [0, 0, I], [0, 0, 0]]. */
export function discretise(model: FiniteVolumeModel, timestepS: number): DiscreteModel {
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
  if (n > 0) {
    set(0, n, (model.outsideConductance * timestepS) / model.capacities[0]!);
    add(n - 1, n + 1, (model.insideConductance * timestepS) / model.capacities[n - 1]!);
  }
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
  return { n, timestepS, f, gamma0, gammaB };
}
