import { combine, type DenseMatrix, identity, matMul, norm1, solve } from "./denseMatrix.ts";

// Padé [13/13] coefficients and θ_13 (Higham 2005, "The scaling and squaring method for the matrix
// exponential revisited", SIAM J. Matrix Anal. Appl. 26(4), Table 2.3 and eq. 2.5).
const B13 = [
  64764752532480000,
  32382376266240000,
  7771770303897600,
  1187353796428800,
  129060195264000,
  10559470521600,
  670442572800,
  33522128640,
  1323241920,
  40840800,
  960960,
  16380,
  182,
  1,
];
const THETA13 = 5.371920351148152;

/** Matrix exponential e^M by scaling and squaring with a [13/13] Padé approximant. */
export function expm(m: DenseMatrix): DenseMatrix {
  const n = m.n;
  if (n === 0) return m;
  const norm = norm1(m);
  const squarings = norm > THETA13 ? Math.ceil(Math.log2(norm / THETA13)) : 0;
  const scale = 2 ** -squarings;
  const a = combine([[scale, m]]);
  const id = identity(n);
  const a2 = matMul(a, a);
  const a4 = matMul(a2, a2);
  const a6 = matMul(a4, a2);
  const b = (k: number) => B13[k]!;
  const uInner = matMul(a6, combine([[b(13), a6], [b(11), a4], [b(9), a2]]));
  const u = matMul(
    a,
    combine([[1, uInner], [b(7), a6], [b(5), a4], [b(3), a2], [b(1), id]]),
  );
  const vInner = matMul(a6, combine([[b(12), a6], [b(10), a4], [b(8), a2]]));
  const v = combine([[1, vInner], [b(6), a6], [b(4), a4], [b(2), a2], [b(0), id]]);
  let r = solve(combine([[1, v], [-1, u]]), combine([[1, v], [1, u]]));
  for (let k = 0; k < squarings; k++) r = matMul(r, r);
  return r;
}
