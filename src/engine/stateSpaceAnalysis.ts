import { ctfAccepted, type CtfCandidate, resynthesise, selectCtf } from "./ctf.ts";
import type { ConductionChain } from "./elements.ts";
import type { ResponseFactors } from "./responseFactors.ts";
import { gradedCellWidths } from "./stateSpaceMesh.ts";
import { type StateSpaceResponse, stateSpaceResponse } from "./stateSpaceResponse.ts";

/** The state-space method (second, independent route) for the air-to-air chain. */
export interface StateSpaceAnalysis {
  /** Cells in each chain element (0 for resistive elements and films). */
  readonly cellsPerElement: readonly number[];
  /** Relative cell widths of each massive element (graded towards the exposed faces). */
  readonly cellWidths: readonly (readonly number[])[];
  readonly response: StateSpaceResponse;
  /** max_j |RF_ss − RF_root| / U for X, Y, Z (compared terms plus a bound on the rest). */
  readonly agreement: { readonly X: number; readonly Y: number; readonly Z: number; readonly max: number };
  readonly ctfCandidate: CtfCandidate;
  readonly ctfAccepted: boolean;
  /** max_j |RF resynthesised from this CTF − root RF| / U. */
  readonly ctfVersusRoot: number;
}

/** Agreement limit (relative to U) the mesh is refined for. */
export const STATE_SPACE_AGREEMENT_LIMIT = 5e-3;
const MESH_TARGET = 0.6 * STATE_SPACE_AGREEMENT_LIMIT;
const MAX_CELLS = 260;

function agreementOf(ss: ResponseFactors, root: ResponseFactors, u: number) {
  const one = (a: readonly number[], b: readonly number[]) => {
    let worst = 0;
    for (let j = 0; j < b.length; j++) {
      const e = j < a.length ? Math.abs(a[j]! - b[j]!) : Math.abs(b[j]!);
      if (!(e <= worst)) worst = e;
    }
    return worst / u;
  };
  const X = one(ss.X, root.X), Y = one(ss.Y, root.Y), Z = one(ss.Z, root.Z);
  return { X, Y, Z, max: Math.max(X, Y, Z) };
}

/** Runs the state-space model on a graded mesh refined until it agrees with the root method (or the cap). */
export function stateSpaceAnalysis(
  chain: ConductionChain,
  timestepS: number,
  root: ResponseFactors,
  uValue: number,
): StateSpaceAnalysis {
  let refinement = 1;
  let result: { widths: number[][]; response: StateSpaceResponse; agreement: ReturnType<typeof agreementOf> };
  for (let attempt = 0;; attempt++) {
    const widths = gradedCellWidths(chain, timestepS, refinement);
    const cells = widths.reduce((s, w) => s + w.length, 0);
    const response = stateSpaceResponse(chain, widths, timestepS, Math.max(3, root.termCount));
    const agreement = agreementOf(response.responseFactors, root, uValue);
    result = { widths, response, agreement };
    if (agreement.max <= MESH_TARGET || attempt >= 3 || cells >= MAX_CELLS) break;
    // Error ~ h²: jump to the refinement predicted to meet the target, limited by the cell cap.
    const predicted = refinement * Math.sqrt(MESH_TARGET / agreement.max) * 0.9;
    refinement = Math.max(predicted, (refinement * cells) / MAX_CELLS);
  }
  const { widths, response, agreement } = result;
  const ctfCandidate = selectCtf(response.ratios, response.responseFactors, uValue);
  let ctfVersusRoot = 0;
  const d = [1, ...ctfCandidate.ctf.Phi.map((p) => -p)];
  for (const key of ["X", "Y", "Z"] as const) {
    const r = resynthesise(ctfCandidate.ctf[key], d, root.termCount);
    for (let j = 0; j < r.length; j++) {
      const e = Math.abs(r[j]! - root[key][j]!) / uValue;
      if (!(e <= ctfVersusRoot)) ctfVersusRoot = Number.isFinite(e) ? e : Infinity;
    }
  }
  return {
    cellsPerElement: response.model.cellsPerElement,
    cellWidths: widths,
    response,
    agreement,
    ctfCandidate,
    ctfAccepted: ctfAccepted(ctfCandidate),
    ctfVersusRoot,
  };
}
