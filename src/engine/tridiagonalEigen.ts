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

/** Eigenvalues (ascending) and the requested rows of the orthonormal eigenvector matrix V (S = V Λ Vᵀ). */
export interface TridiagonalEigen {
  readonly values: Float64Array;
  /** rows[r][k] = V[rowIndices[r], k]: component `rowIndices[r]` of the eigenvector of values[k]. */
  readonly rows: readonly Float64Array[];
}

const MAX_SWEEPS_PER_VALUE = 60;

/** √(a² + b²) without overflow; much cheaper than Math.hypot in the rotation loop. */
function pythag(a: number, b: number): number {
  const x = Math.abs(a), y = Math.abs(b);
  if (x > y) {
    const t = y / x;
    return x * Math.sqrt(1 + t * t);
  }
  if (y === 0) return 0;
  const t = x / y;
  return y * Math.sqrt(1 + t * t);
}

/**
 * Eigen-decomposition of a symmetric tridiagonal matrix by the implicit QL algorithm with Wilkinson shifts
 * (Golub & Van Loan, Matrix Computations, §8.3). Every QL sweep is a chain of plane rotations V ← V·G, so
 * any subset of rows of V can be accumulated alone: `rowIndices` = all rows gives the full V (O(n³)), the two
 * end rows give what a chain's boundary responses need in O(n²). Throws if a value fails to converge.
 */
export function tridiagonalEigen(
  diag: readonly number[],
  off: readonly number[],
  rowIndices: readonly number[],
): TridiagonalEigen {
  const n = diag.length;
  const d = Float64Array.from(diag);
  const e = new Float64Array(n); // e[i] couples i and i + 1; e[n − 1] = 0
  for (let i = 0; i < n - 1; i++) e[i] = off[i]!;
  // The requested rows of V, row-major in one array (starting as rows of the identity).
  const r = rowIndices.length;
  const v = new Float64Array(r * n);
  rowIndices.forEach((row, k) => (v[k * n + row] = 1));
  for (let l = 0; l < n; l++) {
    for (let sweep = 0;; sweep++) {
      // Split point: the first negligible coupling at or below l.
      let m = l;
      while (m < n - 1 && Math.abs(e[m]!) > Number.EPSILON * (Math.abs(d[m]!) + Math.abs(d[m + 1]!))) m++;
      if (m === l) break;
      if (sweep >= MAX_SWEEPS_PER_VALUE) throw new Error(`tridiagonalEigen: no convergence for value ${l}`);
      // Wilkinson shift from the leading 2 × 2 block of the unreduced block l … m.
      const theta = (d[l + 1]! - d[l]!) / (2 * e[l]!);
      const rho = pythag(theta, 1);
      let g = d[m]! - d[l]! + e[l]! / (theta + (theta >= 0 ? rho : -rho));
      let s = 1, c = 1, p = 0;
      let i = m - 1;
      for (; i >= l; i--) {
        const f = s * e[i]!;
        const b = c * e[i]!;
        const radius = pythag(f, g);
        e[i + 1] = radius;
        if (radius === 0) {
          // Underflow: the block splits at i + 1; undo the pending shift and restart.
          d[i + 1] = d[i + 1]! - p;
          e[m] = 0;
          break;
        }
        s = f / radius;
        c = g / radius;
        const h = d[i + 1]! - p;
        const t = (d[i]! - h) * s + 2 * c * b;
        p = s * t;
        d[i + 1] = h + p;
        g = c * t - b;
        for (let k = i; k < r * n; k += n) {
          const vi = v[k]!, vj = v[k + 1]!;
          v[k + 1] = s * vi + c * vj;
          v[k] = c * vi - s * vj;
        }
      }
      if (i >= l) continue;
      d[l] = d[l]! - p;
      e[l] = g;
      e[m] = 0;
    }
  }
  // Ascending order by insertion sort of an index (QL leaves the values nearly ordered), columns alike.
  const order = new Int32Array(n);
  for (let k = 0; k < n; k++) {
    let j = k;
    while (j > 0 && d[order[j - 1]!]! > d[k]!) {
      order[j] = order[j - 1]!;
      j--;
    }
    order[j] = k;
  }
  const values = new Float64Array(n);
  const rows = rowIndices.map(() => new Float64Array(n));
  for (let k = 0; k < n; k++) {
    const from = order[k]!;
    values[k] = d[from]!;
    rows.forEach((row, q) => (row[k] = v[q * n + from]!));
  }
  return { values, rows };
}
