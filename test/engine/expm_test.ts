import { expm as mathjsExpm, matrix } from "mathjs";
import { expm, fromRows, toRows } from "../../src/engine/mod.ts";
import { assertClose } from "./walls.ts";

/** Deterministic pseudo-random numbers (LCG) so the test is reproducible. */
function lcg(seed: number) {
  let s = seed >>> 0;
  return () => ((s = (1664525 * s + 1013904223) >>> 0) / 2 ** 32);
}

function compare(rows: number[][], what: string, tol: number) {
  const ours = toRows(expm(fromRows(rows)));
  const ref = mathjsExpm(matrix(rows)).toArray() as number[][];
  const scale = Math.max(1, ...ref.flat().map(Math.abs));
  ours.forEach((row, i) =>
    row.forEach((v, j) => assertClose(v / scale, ref[i]![j]! / scale, tol, `${what}[${i}][${j}]`))
  );
}

Deno.test("expm() agrees with mathjs expm on random, rotation, nilpotent and stiff matrices", () => {
  // Reference: mathjs 15.2.0 `expm` (Padé approximant with scaling and squaring), a general-purpose library.
  const rand = lcg(7);
  for (const n of [1, 2, 5, 12]) {
    for (const scale of [0.1, 1, 10]) {
      const rows = Array.from({ length: n }, () => Array.from({ length: n }, () => (rand() - 0.5) * scale));
      compare(rows, `random n=${n} scale=${scale}`, 1e-11);
    }
  }
  compare([[0, 1], [-1, 0]], "rotation", 1e-14);
  compare([[0, 1, 0], [0, 0, 1], [0, 0, 0]], "nilpotent", 1e-15);
  // Stiff diffusion-like tridiagonal matrix (as in the state-space model), eigenvalues spread over 1e-2 … 1e3.
  const n = 10;
  const stiff = Array.from({ length: n }, (_, i) =>
    Array.from({ length: n }, (_, j) => {
      const w = 10 ** (i / 3);
      return i === j ? -2 * w : Math.abs(i - j) === 1 ? w : 0;
    }));
  compare(stiff, "stiff", 1e-10);
});

Deno.test("expm() of a diagonal matrix is the elementwise exponential", () => {
  // Definition of the matrix exponential.
  const e = toRows(expm(fromRows([[-30, 0], [0, 2.5]])));
  assertClose(e[0]![0]!, Math.exp(-30), 1e-25, "e^-30");
  assertClose(e[1]![1]! / Math.exp(2.5), 1, 1e-14, "e^2.5");
});
