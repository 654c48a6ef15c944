import { ctfAccepted, type CtfCandidate, resynthesise, selectCtfWithSeries } from "./ctf.ts";
import type { DivisionCounter } from "./longDivision.ts";
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
  /**
   * max_j |RF_ss − RF_root| / max(U, max_j |RF_root|) for X, Y, Z: each series against its own magnitude. The
   * self responses X, Z of a well-insulated wall start far above U (X_0/U of several hundred), and a mesh whose
   * X_0 is right to 1e-5 of X_0 still misses by several 1e-3 U; the check compares like with like.
   */
  readonly relativeAgreement: {
    readonly X: number;
    readonly Y: number;
    readonly Z: number;
    readonly max: number;
  };
  readonly ctfCandidate: CtfCandidate;
  readonly ctfAccepted: boolean;
  /** max_j |RF resynthesised from this CTF − root RF| / U. */
  readonly ctfVersusRoot: number;
}

/** Agreement limit (relative to U) the mesh is sized for. */
export const STATE_SPACE_AGREEMENT_LIMIT = 5e-3;

/**
 * Mesh error model: max_j |RF_ss − RF_root| / U ≈ κ b² S / U (second order in space), where the early surface
 * response S = X_0 of the outside face decides the outer spacing b_o and Z_0 the inner spacing b_i. Over several
 * hundred random constructions (thickness 1 mm–0.4 m, k 0.02–230 W/(m K), ρ 10–8000 kg/m³, films 0–0.17 m² K/W,
 * Δ 60–3600 s) κ stayed below 0.21, with 90 % below 0.134; κ = 0.14 sizes the first mesh for 0.7 of the limit,
 * and the few constructions above 0.9 of it are re-meshed once from their measured error. Sizing each face for
 * its own response needs 35–50 % less eigen-solver work (∝ cells²) than one spacing for both.
 */
const ERROR_CONSTANT = 0.14;
const SIZE_FOR = 0.7 * STATE_SPACE_AGREEMENT_LIMIT;
const REMESH_ABOVE = 0.9 * STATE_SPACE_AGREEMENT_LIMIT;
const COARSEST_SPACING = 0.3;
const MAX_CELLS = 400;

/**
 * max_j |RF_ss − RF_root| for X, Y, Z, divided by U, or with `relative` by max(U, max_j |RF_root|) of each series
 * (terms past the state-space listing count in full).
 */
export function agreementOf(ss: ResponseFactors, root: ResponseFactors, u: number, relative = false) {
  const one = (a: readonly number[], b: readonly number[]) => {
    let worst = 0;
    let magnitude = u;
    for (let j = 0; j < b.length; j++) {
      const e = j < a.length ? Math.abs(a[j]! - b[j]!) : Math.abs(b[j]!);
      if (!(e <= worst)) worst = e;
      if (relative) magnitude = Math.max(magnitude, Math.abs(b[j]!));
    }
    return worst / magnitude;
  };
  const X = one(ss.X, root.X), Y = one(ss.Y, root.Y), Z = one(ss.Z, root.Z);
  return { X, Y, Z, max: Math.max(X, Y, Z) };
}

/** Graded mesh of the given face spacings, coarsened if it would exceed the cell cap (cells ∝ 1/spacing). */
function cappedMesh(chain: ConductionChain, timestepS: number, outside: number, inside: number): number[][] {
  const widths = gradedCellWidths(chain, timestepS, outside, inside);
  const cells = widths.reduce((s, w) => s + w.length, 0);
  if (cells <= MAX_CELLS) return widths;
  const coarsen = cells / MAX_CELLS;
  return gradedCellWidths(chain, timestepS, outside * coarsen, inside * coarsen);
}

/** Face spacing b for an early surface response RF_0 (error model above). */
function faceSpacing(rf0: number | undefined, uValue: number): number {
  const scale = Math.max(1, Math.abs(rf0 ?? 0) / uValue);
  return Math.min(COARSEST_SPACING, Math.sqrt(SIZE_FOR / (ERROR_CONSTANT * scale)));
}

/**
 * Runs the state-space model on a graded mesh sized once from the error model (re-meshed once if the error
 * model was optimistic) and compares its response factors with the root method's. `counter` counts the terms of
 * CTF long division done (for tests).
 */
export function stateSpaceAnalysis(
  chain: ConductionChain,
  timestepS: number,
  root: ResponseFactors,
  uValue: number,
  counter?: DivisionCounter,
): StateSpaceAnalysis {
  const terms = Math.max(3, root.termCount);
  let outside = faceSpacing(root.X[0], uValue);
  let inside = faceSpacing(root.Z[0], uValue);
  let result: { widths: number[][]; response: StateSpaceResponse; agreement: ReturnType<typeof agreementOf> };
  for (let attempt = 0;; attempt++) {
    const widths = cappedMesh(chain, timestepS, outside, inside);
    const response = stateSpaceResponse(chain, widths, timestepS, terms);
    const agreement = agreementOf(response.responseFactors, root, uValue);
    result = { widths, response, agreement };
    const cells = response.model.capacities.length;
    if (!(agreement.max > REMESH_ABOVE) || attempt >= 1 || cells >= MAX_CELLS) break;
    // Error ∝ b²: the spacings predicted to meet SIZE_FOR from the measured error.
    const shrink = Math.sqrt(SIZE_FOR / agreement.max);
    outside *= shrink;
    inside *= shrink;
  }
  const { widths, response, agreement } = result;
  const chosen = selectCtfWithSeries(response.ratios, response.responseFactors, uValue, counter);
  const ctfCandidate = chosen.candidate;
  let ctfVersusRoot = 0;
  const d = [1, ...ctfCandidate.ctf.Phi.map((p) => -p)];
  for (const [index, key] of (["X", "Y", "Z"] as const).entries()) {
    // The selection's own division of these coefficients by the same d, when it ran over at least the root's
    // terms: term k depends on the terms before it only, so its first terms are this division.
    const done = chosen.series?.[index];
    let r: ArrayLike<number>;
    if (done !== undefined && done.length >= root.termCount) r = done.subarray(0, root.termCount);
    else {
      r = resynthesise(ctfCandidate.ctf[key], d, root.termCount);
      if (counter !== undefined) counter.terms += root.termCount;
    }
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
    relativeAgreement: agreementOf(response.responseFactors, root, uValue, true),
    ctfCandidate,
    ctfAccepted: ctfAccepted(ctfCandidate),
    ctfVersusRoot,
  };
}
