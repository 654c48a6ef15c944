import { cAdd, cMul, type Complex, cSub } from "./complex.ts";

/** A 2×2 complex matrix [[a, b], [c, d]]. */
export interface ComplexMatrix2 {
  readonly a: Complex;
  readonly b: Complex;
  readonly c: Complex;
  readonly d: Complex;
}

/** The 2×2 identity matrix. */
export const COMPLEX_IDENTITY2: ComplexMatrix2 = {
  a: { re: 1, im: 0 },
  b: { re: 0, im: 0 },
  c: { re: 0, im: 0 },
  d: { re: 1, im: 0 },
};

/** Matrix product m · n. */
export function cMatMul(m: ComplexMatrix2, n: ComplexMatrix2): ComplexMatrix2 {
  return {
    a: cAdd(cMul(m.a, n.a), cMul(m.b, n.c)),
    b: cAdd(cMul(m.a, n.b), cMul(m.b, n.d)),
    c: cAdd(cMul(m.c, n.a), cMul(m.d, n.c)),
    d: cAdd(cMul(m.c, n.b), cMul(m.d, n.d)),
  };
}

/** Determinant ad − bc. */
export function cMatDet(m: ComplexMatrix2): Complex {
  return cSub(cMul(m.a, m.d), cMul(m.b, m.c));
}

/** A real 2×2 matrix [[a, b], [c, d]]. */
export interface RealMatrix2 {
  readonly a: number;
  readonly b: number;
  readonly c: number;
  readonly d: number;
}

/** The real 2×2 identity matrix. */
export const REAL_IDENTITY2: RealMatrix2 = { a: 1, b: 0, c: 0, d: 1 };

/** Real matrix product m · n. */
export function rMatMul(m: RealMatrix2, n: RealMatrix2): RealMatrix2 {
  return {
    a: m.a * n.a + m.b * n.c,
    b: m.a * n.b + m.b * n.d,
    c: m.c * n.a + m.d * n.c,
    d: m.c * n.b + m.d * n.d,
  };
}

/** Real matrix sum m + n. */
export function rMatAdd(m: RealMatrix2, n: RealMatrix2): RealMatrix2 {
  return { a: m.a + n.a, b: m.b + n.b, c: m.c + n.c, d: m.d + n.d };
}
