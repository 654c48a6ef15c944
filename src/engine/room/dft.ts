/**
 * Discrete Fourier transform of one periodic day. Convention: X_m = Σ_k x_k e^(−2πi mk/N); a circular convolution p ⊛ x becomes the product P_m · X_m.
 */

/** A complex spectrum as two arrays (real and imaginary parts), index m = 0 … N−1. */
export interface Spectrum {
  readonly re: Float64Array;
  readonly im: Float64Array;
}

/** Smallest prime factor of n ≥ 2. */
function smallestFactor(n: number): number {
  for (let p = 2; p * p <= n; p++) if (n % p === 0) return p;
  return n;
}

/**
 * Mixed-radix decimation in time (Cooley–Tukey), out of place: the p sub-transforms of x_r, x_(r+p), … (p the smallest
 * prime factor of n) are written side by side into the output, then combined,
 * X_(q + s·n/p) = Σ_r W^(r(q + s·n/p)) A_r(q), W = e^(sign·2πi/n), taken from the day's table of e^(2πi j/N).
 */
class Transform {
  readonly #n: number;
  readonly #cos: Float64Array;
  readonly #sin: Float64Array;
  readonly #scratchRe = new Float64Array(64);
  readonly #scratchIm = new Float64Array(64);

  constructor(n: number) {
    this.#n = n;
    this.#cos = new Float64Array(n);
    this.#sin = new Float64Array(n);
    for (let j = 0; j < n; j++) {
      this.#cos[j] = Math.cos((2 * Math.PI * j) / n);
      this.#sin[j] = Math.sin((2 * Math.PI * j) / n);
    }
  }

  run(re: ArrayLike<number>, im: ArrayLike<number>, sign: number): Spectrum {
    const out = { re: new Float64Array(this.#n), im: new Float64Array(this.#n) };
    this.#step(re, im, 0, 1, this.#n, out, 0, sign);
    return out;
  }

  #step(
    re: ArrayLike<number>,
    im: ArrayLike<number>,
    offset: number,
    stride: number,
    n: number,
    out: Spectrum,
    at: number,
    sign: number,
  ): void {
    if (n === 1) {
      out.re[at] = re[offset]!;
      out.im[at] = im[offset]!;
      return;
    }
    const p = smallestFactor(n);
    const m = n / p;
    for (let r = 0; r < p; r++) this.#step(re, im, offset + r * stride, stride * p, m, out, at + r * m, sign);
    const big = this.#n;
    const unit = big / n;
    const wr = p <= 64 ? this.#scratchRe : new Float64Array(p);
    const wi = p <= 64 ? this.#scratchIm : new Float64Array(p);
    for (let q = 0; q < m; q++) {
      for (let r = 0; r < p; r++) {
        wr[r] = out.re[at + r * m + q]!;
        wi[r] = out.im[at + r * m + q]!;
      }
      for (let s = 0; s < p; s++) {
        const k = q + s * m;
        let sr = 0;
        let si = 0;
        for (let r = 0; r < p; r++) {
          const j = ((r * k) % n) * unit;
          const c = this.#cos[j]!;
          const t = sign * this.#sin[j]!;
          sr += wr[r]! * c - wi[r]! * t;
          si += wr[r]! * t + wi[r]! * c;
        }
        out.re[at + k] = sr;
        out.im[at + k] = si;
      }
    }
  }
}

/** Transforms of one day of N steps (N = 86400 / Δ: its factors are 2, 3 and 5, so the fast transform applies). */
export class FourierDay {
  readonly n: number;
  readonly #transform: Transform;
  readonly #zeros: Float64Array;

  constructor(n: number) {
    this.n = n;
    this.#transform = new Transform(n);
    this.#zeros = new Float64Array(n);
  }

  /** Spectrum of a real series of length N. */
  forward(x: readonly number[]): Spectrum {
    return this.#transform.run(x, this.#zeros, -1);
  }

  /** The real series whose spectrum is given (the imaginary part of the sum, zero for a Hermitian spectrum, dropped). */
  inverse(s: Spectrum): number[] {
    const t = this.#transform.run(s.re, s.im, 1);
    return Array.from(t.re, (v) => v / this.n);
  }
}

/** Circular convolution (p ⊛ x)_k = Σ_j p_j x_((k − j) mod N), in the time domain (used to verify the solution). */
export function circularConvolution(p: readonly number[], x: readonly number[]): number[] {
  const n = x.length;
  const out = new Array<number>(n);
  for (let k = 0; k < n; k++) {
    let sum = 0;
    for (let j = 0; j < n; j++) {
      const i = k - j;
      sum += p[j]! * x[i < 0 ? i + n : i]!;
    }
    out[k] = sum;
  }
  return out;
}
