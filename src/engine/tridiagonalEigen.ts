/** Number of eigenvalues below x of the symmetric tridiagonal matrix (diag, off), by the LDLᵀ pivot signs. */
export function tridiagonalCountBelow(diag: readonly number[], off: readonly number[], x: number): number {
  let count = 0;
  let pivot = 1;
  for (let i = 0; i < diag.length; i++) {
    const o = i > 0 ? off[i - 1]! : 0;
    pivot = diag[i]! - x - (i > 0 ? (o * o) / pivot : 0);
    if (pivot === 0) pivot = -1e-300;
    if (pivot < 0) count++;
  }
  return count;
}

/** Eigenvalues below `upper` of a symmetric positive definite tridiagonal matrix, ascending, by bisection. */
export function smallestEigenvalues(
  diag: readonly number[],
  off: readonly number[],
  upper: number,
): number[] {
  const m = tridiagonalCountBelow(diag, off, upper);
  const out: number[] = [];
  for (let k = 0; k < m; k++) {
    let lo = k === 0 ? 0 : out[k - 1]!;
    let hi = upper;
    for (let it = 0; it < 200 && hi - lo > 4 * Number.EPSILON * hi; it++) {
      const mid = 0.5 * (lo + hi);
      if (tridiagonalCountBelow(diag, off, mid) > k) hi = mid;
      else lo = mid;
    }
    out.push(0.5 * (lo + hi));
  }
  return out;
}
