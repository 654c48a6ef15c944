/**
 * Long division of CTF numerators by their shared denominator: the response factors a CTF implies, term k as
 * b_k − Σ_(n=1…min(N,k)) d_n out_(k−n) in that order (so every route gives the same bits).
 */

/** Writes the first `terms` terms of b(z)/d(z) into `out`; reads b only inside its length (no slow path). */
export function longDivision(
  b: readonly number[],
  d: readonly number[],
  out: Float64Array,
  terms: number,
): void {
  const nb = b.length;
  const top = d.length - 1;
  for (let k = 0; k < terms; k++) {
    let v = k < nb ? b[k]! : 0;
    const last = k < top ? k : top;
    for (let n = 1; n <= last; n++) v -= d[n]! * out[k - n]!;
    out[k] = v;
  }
}

/** The three long divisions of a CTF against its response factors. */
export interface Resynthesis {
  /** max_k |long division − RF_k| / U per series (X, Y, Z), each stopped once it exceeds the stop value. */
  readonly errors: readonly [number, number, number];
  /** The divisions, when every term of all three was computed (none stopped early). */
  readonly series?: DivisionSeries;
}

/** Work counter for tests: terms of long division computed (one per series and term). */
export interface DivisionCounter {
  terms: number;
}

/** Three series of division terms (X, Y, Z). */
export type DivisionSeries = readonly [Float64Array, Float64Array, Float64Array];

/** Space for three divisions of `terms` terms, to be reused from candidate to candidate. */
export function divisionSpace(terms: number): DivisionSeries {
  return [new Float64Array(terms), new Float64Array(terms), new Float64Array(terms)];
}

/**
 * The long divisions of the numerators `b` (X, Y, Z) by `d` against the response factors `rf` (equal lengths), in
 * one pass with the three independent chains side by side. Each series' error is what dividing it alone and
 * stopping once its worst exceeds `stopAbove` gives; the pass ends when all three have stopped. The terms are
 * written into `space` when given (every term is written before it is read), else into new arrays.
 */
export function resynthesis(
  b: readonly [readonly number[], readonly number[], readonly number[]],
  d: readonly number[],
  rf: readonly [readonly number[], readonly number[], readonly number[]],
  u: number,
  stopAbove: number,
  counter?: DivisionCounter,
  space?: DivisionSeries,
): Resynthesis {
  const terms = rf[0].length;
  const [bx, by, bz] = b;
  const [rx, ry, rz] = rf;
  const out = space !== undefined && space.every((s) => s.length === terms) ? space : divisionSpace(terms);
  const [ox, oy, oz] = out;
  if (ry.length !== terms || rz.length !== terms) {
    const one = (i: 0 | 1 | 2) => seriesError(b[i], d, rf[i], u, stopAbove, counter);
    return { errors: [one(0), one(1), one(2)] };
  }
  const nx = bx.length, ny = by.length, nz = bz.length;
  const top = d.length - 1;
  let wx = 0, wy = 0, wz = 0;
  let runX = true, runY = true, runZ = true;
  let k = 0;
  for (; k < terms && (runX || runY || runZ); k++) {
    let vx = k < nx ? bx[k]! : 0;
    let vy = k < ny ? by[k]! : 0;
    let vz = k < nz ? bz[k]! : 0;
    const last = k < top ? k : top;
    for (let n = 1; n <= last; n++) {
      const dn = d[n]!;
      vx -= dn * ox[k - n]!;
      vy -= dn * oy[k - n]!;
      vz -= dn * oz[k - n]!;
    }
    ox[k] = vx;
    oy[k] = vy;
    oz[k] = vz;
    if (runX) {
      const e = Math.abs(vx - rx[k]!) / u;
      if (!(e <= wx)) wx = Number.isFinite(e) ? e : Infinity;
      if (wx > stopAbove) runX = false;
    }
    if (runY) {
      const e = Math.abs(vy - ry[k]!) / u;
      if (!(e <= wy)) wy = Number.isFinite(e) ? e : Infinity;
      if (wy > stopAbove) runY = false;
    }
    if (runZ) {
      const e = Math.abs(vz - rz[k]!) / u;
      if (!(e <= wz)) wz = Number.isFinite(e) ? e : Infinity;
      if (wz > stopAbove) runZ = false;
    }
  }
  if (counter !== undefined) counter.terms += 3 * k;
  return { errors: [wx, wy, wz], ...(k === terms ? { series: out } : {}) };
}

/** max_k |b(z)/d(z) − RF_k| / U of one series, stopping once it exceeds `stopAbove`. */
function seriesError(
  b: readonly number[],
  d: readonly number[],
  rf: readonly number[],
  u: number,
  stopAbove: number,
  counter?: DivisionCounter,
): number {
  const out = new Float64Array(rf.length);
  const nb = b.length;
  const top = d.length - 1;
  let worst = 0;
  let k = 0;
  while (k < rf.length) {
    let v = k < nb ? b[k]! : 0;
    const last = k < top ? k : top;
    for (let n = 1; n <= last; n++) v -= d[n]! * out[k - n]!;
    out[k] = v;
    const e = Math.abs(v - rf[k]!) / u;
    if (!(e <= worst)) worst = Number.isFinite(e) ? e : Infinity;
    k++;
    if (worst > stopAbove) break;
  }
  if (counter !== undefined) counter.terms += k;
  return worst;
}
