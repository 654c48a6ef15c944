/** A complex number with real part `re` and imaginary part `im`. */
export interface Complex {
  readonly re: number;
  readonly im: number;
}

/** Builds a complex number from its real and imaginary parts. */
export function complex(re: number, im = 0): Complex {
  return { re, im };
}

/** Sum a + b. */
export function cAdd(a: Complex, b: Complex): Complex {
  return { re: a.re + b.re, im: a.im + b.im };
}

/** Difference a − b. */
export function cSub(a: Complex, b: Complex): Complex {
  return { re: a.re - b.re, im: a.im - b.im };
}

/** Product a · b. */
export function cMul(a: Complex, b: Complex): Complex {
  return { re: a.re * b.re - a.im * b.im, im: a.re * b.im + a.im * b.re };
}

/** Product of a complex number and a real factor. */
export function cScale(a: Complex, factor: number): Complex {
  return { re: a.re * factor, im: a.im * factor };
}

/** Quotient a / b (Smith's algorithm, avoids overflow of |b|²). */
export function cDiv(a: Complex, b: Complex): Complex {
  if (Math.abs(b.re) >= Math.abs(b.im)) {
    const r = b.im / b.re;
    const den = b.re + b.im * r;
    return { re: (a.re + a.im * r) / den, im: (a.im - a.re * r) / den };
  }
  const r = b.re / b.im;
  const den = b.re * r + b.im;
  return { re: (a.re * r + a.im) / den, im: (a.im * r - a.re) / den };
}

/** Modulus |a|. */
export function cAbs(a: Complex): number {
  return Math.hypot(a.re, a.im);
}

/** Principal argument of a, in (−π, π]. */
export function cArg(a: Complex): number {
  return Math.atan2(a.im, a.re);
}

/** Complex exponential e^a. */
export function cExp(a: Complex): Complex {
  const m = Math.exp(a.re);
  return { re: m * Math.cos(a.im), im: m * Math.sin(a.im) };
}

/** Principal square root (branch cut on the negative real axis, result with re ≥ 0). */
export function cSqrt(a: Complex): Complex {
  const r = cAbs(a);
  if (r === 0) return { re: 0, im: 0 };
  const re = Math.sqrt((r + Math.abs(a.re)) / 2);
  if (a.re >= 0) return { re, im: a.im / (2 * re) };
  return { re: Math.abs(a.im) / (2 * re), im: a.im >= 0 ? re : -re };
}

/** Hyperbolic cosine cosh a. */
export function cCosh(a: Complex): Complex {
  return { re: Math.cosh(a.re) * Math.cos(a.im), im: Math.sinh(a.re) * Math.sin(a.im) };
}

/** Hyperbolic sine sinh a. */
export function cSinh(a: Complex): Complex {
  return { re: Math.sinh(a.re) * Math.cos(a.im), im: Math.cosh(a.re) * Math.sin(a.im) };
}
