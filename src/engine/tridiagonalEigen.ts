/** Eigenvalues (ascending) and the requested rows of the orthonormal eigenvector matrix V (S = V Λ Vᵀ). */
export interface TridiagonalEigen {
  readonly values: Float64Array;
  /** rows[r][k] = V[rowIndices[r], k]: component `rowIndices[r]` of the eigenvector of values[k]. */
  readonly rows: readonly Float64Array[];
}

const MAX_SWEEPS_PER_VALUE = 60;

/** √(a² + b²) without overflow or underflow (the rotation loop's fallback; Math.hypot is slower). */
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
 * (the QL form of the implicit symmetric QR step; Golub & Van Loan, Matrix Computations, §8.3). Every QL sweep is a chain of plane rotations V ← V·G, so
 * any subset of rows of V can be accumulated alone: `rowIndices` = all rows gives the full V (O(n³)), the two
 * end rows give what a chain's boundary responses need in O(n²). A value that fails to converge
 * (not seen in practice; 60 sweeps) is returned as NaN.
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
      if (sweep >= MAX_SWEEPS_PER_VALUE) {
        d[l] = NaN; // reported, never hidden: NaN fails every check it reaches
        break;
      }
      // Wilkinson shift from the leading 2 × 2 block of the unreduced block l … m.
      const theta = (d[l + 1]! - d[l]!) / (2 * e[l]!);
      const rho = pythag(theta, 1);
      let g = d[m]! - d[l]! + e[l]! / (theta + (theta >= 0 ? rho : -rho));
      let s = 1, c = 1, p = 0;
      let i = m - 1;
      for (; i >= l; i--) {
        const f = s * e[i]!;
        const b = c * e[i]!;
        // One square root and one division per rotation; the scaled form only where f² + g² leaves range.
        const square = f * f + g * g;
        const radius = square > 1e-290 && square < 1e290 ? Math.sqrt(square) : pythag(f, g);
        e[i + 1] = radius;
        if (radius === 0) {
          // Underflow: the block splits at i + 1; undo the pending shift and restart.
          d[i + 1] = d[i + 1]! - p;
          e[m] = 0;
          break;
        }
        const inverse = 1 / radius;
        s = f * inverse;
        c = g * inverse;
        const h = d[i + 1]! - p;
        const t = (d[i]! - h) * s + 2 * c * b;
        p = s * t;
        d[i + 1] = h + p;
        g = c * t - b;
        if (r === 2) {
          // The two end rows a chain's responses need, written out (the same operations as the loop below).
          const ai = v[i]!, aj = v[i + 1]!, bi = v[n + i]!, bj = v[n + i + 1]!;
          v[i + 1] = s * ai + c * aj;
          v[i] = c * ai - s * aj;
          v[n + i + 1] = s * bi + c * bj;
          v[n + i] = c * bi - s * bj;
        } else {
          for (let k = i; k < r * n; k += n) {
            const vi = v[k]!, vj = v[k + 1]!;
            v[k + 1] = s * vi + c * vj;
            v[k] = c * vi - s * vj;
          }
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
