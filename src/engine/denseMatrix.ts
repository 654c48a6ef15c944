/** A dense real square matrix of order n, row-major. */
export interface DenseMatrix {
  readonly n: number;
  readonly data: Float64Array;
}

/** A zero matrix of order n. */
export function zeros(n: number): DenseMatrix {
  return { n, data: new Float64Array(n * n) };
}

/** The identity matrix of order n. */
export function identity(n: number): DenseMatrix {
  const m = zeros(n);
  for (let i = 0; i < n; i++) m.data[i * n + i] = 1;
  return m;
}

/** Builds a matrix from rows. */
export function fromRows(rows: readonly (readonly number[])[]): DenseMatrix {
  const n = rows.length;
  const m = zeros(n);
  rows.forEach((row, i) => row.forEach((v, j) => (m.data[i * n + j] = v)));
  return m;
}

/** Rows of a matrix as nested arrays. */
export function toRows(m: DenseMatrix): number[][] {
  return Array.from({ length: m.n }, (_, i) => Array.from(m.data.subarray(i * m.n, (i + 1) * m.n)));
}

/** Product a · b. */
export function matMul(a: DenseMatrix, b: DenseMatrix): DenseMatrix {
  const n = a.n;
  const out = zeros(n);
  const A = a.data, B = b.data, C = out.data;
  for (let i = 0; i < n; i++) {
    const rowOffset = i * n;
    for (let k = 0; k < n; k++) {
      const aik = A[rowOffset + k]!;
      if (aik === 0) continue;
      const bOffset = k * n;
      for (let j = 0; j < n; j++) C[rowOffset + j]! += aik * B[bOffset + j]!;
    }
  }
  return out;
}

/** Linear combination Σ c_k M_k of matrices of equal order. */
export function combine(terms: readonly (readonly [number, DenseMatrix])[]): DenseMatrix {
  const n = terms[0]![1].n;
  const out = zeros(n);
  for (const [c, m] of terms) {
    if (c === 0) continue;
    for (let i = 0; i < n * n; i++) out.data[i]! += c * m.data[i]!;
  }
  return out;
}

/** Maximum absolute column sum ‖M‖₁. */
export function norm1(m: DenseMatrix): number {
  let best = 0;
  for (let j = 0; j < m.n; j++) {
    let s = 0;
    for (let i = 0; i < m.n; i++) s += Math.abs(m.data[i * m.n + j]!);
    best = Math.max(best, s);
  }
  return best;
}

/** Solves a · X = b for X by LU decomposition with partial pivoting. */
export function solve(a: DenseMatrix, b: DenseMatrix): DenseMatrix {
  const n = a.n;
  const lu = Float64Array.from(a.data);
  const x = Float64Array.from(b.data);
  for (let k = 0; k < n; k++) {
    let pivot = k;
    for (let i = k + 1; i < n; i++) {
      if (Math.abs(lu[i * n + k]!) > Math.abs(lu[pivot * n + k]!)) pivot = i;
    }
    if (pivot !== k) {
      for (let j = 0; j < n; j++) {
        [lu[k * n + j], lu[pivot * n + j]] = [lu[pivot * n + j]!, lu[k * n + j]!];
        [x[k * n + j], x[pivot * n + j]] = [x[pivot * n + j]!, x[k * n + j]!];
      }
    }
    const diag = lu[k * n + k]!;
    for (let i = k + 1; i < n; i++) {
      const f = lu[i * n + k]! / diag;
      if (f === 0) continue;
      lu[i * n + k] = f;
      for (let j = k + 1; j < n; j++) lu[i * n + j]! -= f * lu[k * n + j]!;
      for (let j = 0; j < n; j++) x[i * n + j]! -= f * x[k * n + j]!;
    }
  }
  for (let k = n - 1; k >= 0; k--) {
    const diag = lu[k * n + k]!;
    for (let j = 0; j < n; j++) {
      let v = x[k * n + j]!;
      for (let i = k + 1; i < n; i++) v -= lu[k * n + i]! * x[i * n + j]!;
      x[k * n + j] = v / diag;
    }
  }
  return { n, data: x };
}
