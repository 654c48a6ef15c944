import type { ConductionChain } from "./elements.ts";
import { rootCountBelow } from "./rootCount.ts";
import { realB } from "./transmission.ts";

/** Poles of a chain: s_n = −β_n with 0 < β_1 < β_2 < … ≤ betaMax. */
export interface PoleSet {
  /** β_n in 1/s, ascending. */
  readonly betas: readonly number[];
  /** Upper end of the search, 1/s. */
  readonly betaMax: number;
  /** Exact number of poles below betaMax from the oscillation count. */
  readonly exactCount: number;
  /** Intervals in which bisection could not separate two roots (a numerically double root). */
  readonly unresolvedIntervals: number;
  /** Roots confirmed by a sign change of B(−β) across their isolating interval. */
  readonly bracketedCount: number;
}

/** Brent's method on f over [a, b] with f(a), f(b) of opposite sign; returns the root. */
export function brentRoot(
  f: (x: number) => number,
  a0: number,
  b0: number,
  fa0: number,
  fb0: number,
): number {
  let a = a0, b = b0, fa = fa0, fb = fb0;
  let c = a, fc = fa, d = b - a, e = d;
  for (let iteration = 0; iteration < 200; iteration++) {
    if ((fb > 0 && fc > 0) || (fb < 0 && fc < 0)) {
      c = a, fc = fa, d = b - a, e = d;
    }
    if (Math.abs(fc) < Math.abs(fb)) {
      a = b, b = c, c = a, fa = fb, fb = fc, fc = fa;
    }
    const tol = 2 * Number.EPSILON * Math.abs(b) + 1e-300;
    const m = 0.5 * (c - b);
    if (Math.abs(m) <= tol || fb === 0) return b;
    if (Math.abs(e) >= tol && Math.abs(fa) > Math.abs(fb)) {
      const s = fb / fa;
      let p: number, q: number;
      if (a === c) {
        p = 2 * m * s;
        q = 1 - s;
      } else {
        const qq = fa / fc, r = fb / fc;
        p = s * (2 * m * qq * (qq - r) - (b - a) * (r - 1));
        q = (qq - 1) * (r - 1) * (s - 1);
      }
      if (p > 0) q = -q;
      else p = -p;
      if (2 * p < Math.min(3 * m * q - Math.abs(tol * q), Math.abs(e * q))) {
        e = d;
        d = p / q;
      } else {
        d = m, e = m;
      }
    } else {
      d = m, e = m;
    }
    a = b, fa = fb;
    b += Math.abs(d) > tol ? d : (m > 0 ? tol : -tol);
    fb = f(b);
  }
  return b;
}

/** Finds every pole with β ≤ betaMax: exact count, isolation by bisection on the count, Brent polish. */
export function findPoles(chain: ConductionChain, betaMax: number): PoleSet {
  const uMax = Math.sqrt(betaMax);
  const count = (u: number) => rootCountBelow(chain, u * u);
  const exactCount = count(uMax);
  const intervals: [number, number][] = [];
  let unresolvedIntervals = 0;
  // Iterative bisection on the count, in u = √β where homogeneous-slab roots are equally spaced.
  const stack: [number, number, number, number][] = [[0, uMax, 0, exactCount]];
  while (stack.length > 0) {
    const [lo, hi, nLo, nHi] = stack.pop()!;
    if (nHi === nLo) continue;
    if (nHi - nLo === 1) {
      intervals.push([lo, hi]);
      continue;
    }
    const mid = 0.5 * (lo + hi);
    if (mid <= lo || mid >= hi || hi - lo < 1e-14 * hi) {
      unresolvedIntervals++;
      for (let i = nLo; i < nHi; i++) intervals.push([lo, hi]);
      continue;
    }
    const nMid = count(mid);
    stack.push([mid, hi, nMid, nHi], [lo, mid, nLo, nMid]);
  }
  intervals.sort((x, y) => x[0] - y[0]);
  const f = (u: number) => realB(chain, u * u);
  let bracketedCount = 0;
  const betas = intervals.map(([lo, hi]) => {
    const fLo = f(lo), fHi = f(hi);
    if (fLo === 0 || fHi === 0 || (fLo > 0) !== (fHi > 0)) bracketedCount++;
    if (fLo === 0) return lo * lo;
    if (fHi === 0) return hi * hi;
    const u = (fLo > 0) !== (fHi > 0) ? brentRoot(f, lo, hi, fLo, fHi) : 0.5 * (lo + hi);
    return u * u;
  });
  return { betas, betaMax, exactCount, unresolvedIntervals, bracketedCount };
}
