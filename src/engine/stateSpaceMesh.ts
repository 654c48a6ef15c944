import type { ConductionChain } from "./elements.ts";

/**
 * Cell widths for the state-space model, graded from both exposed faces inwards.
 * In the depth coordinate τ = ∫ dx/√(αΔ) the target cell size is h·(a + b·min(τ, T − τ)), so cells are fine
 * where the surface responses are decided and coarse in the interior; `refinement` h scales all sizes.
 * Returns the relative widths of each massive element's cells (empty for resistive elements).
 */
export function gradedCellWidths(chain: ConductionChain, timestepS: number, refinement: number): number[][] {
  const a = 0.08 * refinement;
  const b = 0.15 * refinement;
  const depths = chain.elements.map((
    e,
  ) => (e.kind === "massive" ? e.thicknessM / Math.sqrt(e.diffusivity * timestepS) : 0));
  const total = depths.reduce((s, v) => s + v, 0);
  const half = total / 2;
  // Cell-count coordinate N(τ) = ∫ dτ / size(τ) and its inverse.
  const n1 = (t: number) => Math.log1p((b * t) / a) / b;
  const n1Inverse = (n: number) => (a / b) * Math.expm1(b * n);
  const nHalf = n1(half);
  const count = (t: number) => (t <= half ? n1(t) : 2 * nHalf - n1(total - t));
  const countInverse = (n: number) => (n <= nHalf ? n1Inverse(n) : total - n1Inverse(2 * nHalf - n));
  let start = 0;
  return chain.elements.map((element, e) => {
    if (element.kind !== "massive") return [];
    const depth = depths[e]!;
    const end = start + depth;
    const nStart = count(start);
    const span = count(end) - nStart;
    const cells = Math.max(1, Math.ceil(span - 1e-9));
    const bounds = Array.from(
      { length: cells + 1 },
      (_, k) => k === 0 ? start : k === cells ? end : countInverse(nStart + (span * k) / cells),
    );
    const widths = bounds.slice(1).map((t, k) => (t - bounds[k]!) / depth);
    start = end;
    return widths;
  });
}
