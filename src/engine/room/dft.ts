/**
 * Discrete Fourier transform of one periodic day (direct sums with a shared twiddle table; the days here have at most
 * 1440 steps). Convention: X_m = Σ_k x_k e^(−2πi mk/N); a circular convolution p ⊛ x becomes the product P_m · X_m.
 */

/** A complex spectrum as two arrays (real and imaginary parts), index m = 0 … N−1. */
export interface Spectrum {
  readonly re: Float64Array;
  readonly im: Float64Array;
}

/** cos and sin of 2π j / N for j = 0 … N−1, shared by all transforms of length N. */
export class FourierDay {
  readonly n: number;
  readonly #cos: Float64Array;
  readonly #sin: Float64Array;

  constructor(n: number) {
    this.n = n;
    this.#cos = new Float64Array(n);
    this.#sin = new Float64Array(n);
    for (let j = 0; j < n; j++) {
      this.#cos[j] = Math.cos((2 * Math.PI * j) / n);
      this.#sin[j] = Math.sin((2 * Math.PI * j) / n);
    }
  }

  /** Spectrum of a real series of length N. */
  forward(x: readonly number[]): Spectrum {
    const n = this.n;
    const re = new Float64Array(n);
    const im = new Float64Array(n);
    for (let m = 0; m < n; m++) {
      let sr = 0;
      let si = 0;
      let j = 0;
      for (let k = 0; k < n; k++) {
        const v = x[k]!;
        sr += v * this.#cos[j]!;
        si -= v * this.#sin[j]!;
        j += m;
        if (j >= n) j -= n;
      }
      re[m] = sr;
      im[m] = si;
    }
    return { re, im };
  }

  /** The real series whose spectrum is given (the imaginary part of the sum, zero for a Hermitian spectrum, dropped). */
  inverse(s: Spectrum): number[] {
    const n = this.n;
    const out = new Array<number>(n);
    for (let k = 0; k < n; k++) {
      let sum = 0;
      let j = 0;
      for (let m = 0; m < n; m++) {
        sum += s.re[m]! * this.#cos[j]! - s.im[m]! * this.#sin[j]!;
        j += k;
        if (j >= n) j -= n;
      }
      out[k] = sum / n;
    }
    return out;
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
