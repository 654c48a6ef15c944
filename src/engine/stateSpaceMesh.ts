import type { ConductionChain } from "./elements.ts";

/**
 * Cell widths for the state-space model, graded from both exposed faces inwards.
 * In the depth coordinate τ = ∫ dx/√(αΔ) (total depth T) the target cell size is b_o·(1/2 + τ) from the outside
 * face and b_i·(1/2 + T − τ) from the inside face, whichever is smaller: cells of b/2 at each face, growing
 * linearly (ratio ≈ 1 + b per cell) towards the interior. Measured over random constructions, this grading needs
 * fewer cells for a given accuracy than a uniform mesh or a much finer face cell; the spacings b_o, b_i alone set
 * the size (outside responses X are decided by the outer cells, inside responses Z by the inner ones).
 * Returns the relative widths of each massive element's cells (empty for resistive elements).
 */
export function gradedCellWidths(
  chain: ConductionChain,
  timestepS: number,
  spacingOutside: number,
  spacingInside: number = spacingOutside,
): number[][] {
  const bo = spacingOutside, bi = spacingInside;
  const depths = chain.elements.map((
    e,
  ) => (e.kind === "massive" ? e.thicknessM / Math.sqrt(e.diffusivity * timestepS) : 0));
  const total = depths.reduce((s, v) => s + v, 0);
  // Where both size laws meet; the cell-count coordinate N(τ) = ∫ dτ / size(τ) and its inverse.
  const meet = Math.min(total, Math.max(0, (bi * (0.5 + total) - 0.5 * bo) / (bo + bi)));
  const fromFace = (t: number, b: number) => Math.log1p(2 * t) / b;
  const fromFaceInverse = (n: number, b: number) => 0.5 * Math.expm1(b * n);
  const nMeet = fromFace(meet, bo);
  const nTotal = nMeet + fromFace(total - meet, bi);
  const count = (t: number) => (t <= meet ? fromFace(t, bo) : nTotal - fromFace(total - t, bi));
  const countInverse = (n: number) =>
    n <= nMeet ? fromFaceInverse(n, bo) : total - fromFaceInverse(nTotal - n, bi);
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
