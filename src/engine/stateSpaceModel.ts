import type { ConductionChain } from "./elements.ts";

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
