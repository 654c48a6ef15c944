import { cAdd, cDiv, cExp, cMul, type Complex, cScale, cSqrt, cSub } from "./complex.ts";
import {
  cMatMul,
  COMPLEX_IDENTITY2,
  type ComplexMatrix2,
  type RealMatrix2,
  rMatMul,
} from "./complexMatrix.ts";
import { REAL_IDENTITY2 } from "./complexMatrix.ts";
import type { ConductionChain, ConductionElement } from "./elements.ts";

/** A transmission matrix stored as e^logScale · scaled, so that thick layers at high frequency cannot overflow. */
export interface ScaledTransmission {
  readonly scaled: ComplexMatrix2;
  readonly logScale: Complex;
}

const ONE: Complex = { re: 1, im: 0 };
const ZERO: Complex = { re: 0, im: 0 };

function elementScaled(element: ConductionElement, s: Complex): ScaledTransmission {
  switch (element.kind) {
    case "resistive":
      return { scaled: { a: ONE, b: { re: element.resistance, im: 0 }, c: ZERO, d: ONE }, logScale: ZERO };
    case "massive": {
      const { thicknessM, conductivity, diffusivity } = element;
      const q = cSqrt(cScale(s, 1 / diffusivity));
      const z = cScale(q, thicknessM);
      if (Math.hypot(z.re, z.im) < 1e-3) {
        // Series: cosh z = 1 + z²/2 + z⁴/24, sinh z / z = 1 + z²/6 + z⁴/120.
        const z2 = cMul(z, z);
        const z4 = cMul(z2, z2);
        const cosh = cAdd(cAdd(ONE, cScale(z2, 0.5)), cScale(z4, 1 / 24));
        const sinhOverZ = cAdd(cAdd(ONE, cScale(z2, 1 / 6)), cScale(z4, 1 / 120));
        return {
          scaled: {
            a: cosh,
            b: cScale(sinhOverZ, element.resistance),
            c: cMul(cScale(s, element.arealHeatCapacity), sinhOverZ),
            d: cosh,
          },
          logScale: ZERO,
        };
      }
      const e2 = cExp(cScale(z, -2));
      const coshScaled = cScale(cAdd(ONE, e2), 0.5);
      const sinhScaled = cScale(cSub(ONE, e2), 0.5);
      const kq = cScale(q, conductivity);
      return {
        scaled: { a: coshScaled, b: cDiv(sinhScaled, kq), c: cMul(kq, sinhScaled), d: coshScaled },
        logScale: z,
      };
    }
  }
}

/** Transmission matrix [[A, B], [C, D]] of a chain at complex Laplace variable s, in scaled form. */
export function scaledTransmission(chain: ConductionChain, s: Complex): ScaledTransmission {
  let scaled = COMPLEX_IDENTITY2;
  let logScale = ZERO;
  for (const element of chain.elements) {
    const m = elementScaled(element, s);
    scaled = cMatMul(scaled, m.scaled);
    logScale = cAdd(logScale, m.logScale);
  }
  return { scaled, logScale };
}

/** Transmission matrix of a chain at complex s, unscaled (use only where entries cannot overflow). */
export function transmission(chain: ConductionChain, s: Complex): ComplexMatrix2 {
  const { scaled, logScale } = scaledTransmission(chain, s);
  const f = cExp(logScale);
  return { a: cMul(f, scaled.a), b: cMul(f, scaled.b), c: cMul(f, scaled.c), d: cMul(f, scaled.d) };
}

/** sin θ / θ, accurate for small θ. */
function sinc(theta: number): number {
  if (Math.abs(theta) < 1e-4) return 1 - (theta * theta) / 6;
  return Math.sin(theta) / theta;
}

/** (sin θ − θ cos θ) / θ³, accurate for small θ. */
function sinMinusThetaCosOverCube(theta: number): number {
  if (Math.abs(theta) < 0.05) {
    const t2 = theta * theta;
    return 1 / 3 - t2 / 30 + (t2 * t2) / 840 - (t2 * t2 * t2) / 45360;
  }
  return (Math.sin(theta) - theta * Math.cos(theta)) / (theta * theta * theta);
}

/** A real transmission matrix and its derivative with respect to s. */
export interface RealTransmission {
  readonly m: RealMatrix2;
  readonly dmds: RealMatrix2;
}

/** One element's matrix and d/ds at real s = −β (β ≥ 0), using the real cos/sin forms. */
export function elementRealTransmission(element: ConductionElement, beta: number): RealTransmission {
  switch (element.kind) {
    case "resistive":
      return { m: { a: 1, b: element.resistance, c: 0, d: 1 }, dmds: { a: 0, b: 0, c: 0, d: 0 } };
    case "massive": {
      const { thicknessM: l, conductivity: k, diffusivity: alpha } = element;
      const theta = l * Math.sqrt(beta / alpha);
      const cos = Math.cos(theta);
      const sc = sinc(theta);
      const a = cos;
      const b = (l / k) * sc;
      const c = -((k * theta * theta) / l) * sc;
      const da = (l * l * sc) / (2 * alpha);
      const db = (l * l * l * sinMinusThetaCosOverCube(theta)) / (2 * alpha * k);
      const dc = (k * l * (sc + cos)) / (2 * alpha);
      return { m: { a, b, c, d: a }, dmds: { a: da, b: db, c: dc, d: da } };
    }
  }
}

/** Whole-chain matrix and its exact derivative d/ds at s = −β (β ≥ 0), by the product rule. */
export function realTransmission(chain: ConductionChain, beta: number): RealTransmission {
  let m = REAL_IDENTITY2;
  let dm: RealMatrix2 = { a: 0, b: 0, c: 0, d: 0 };
  for (const element of chain.elements) {
    const e = elementRealTransmission(element, beta);
    const left = rMatMul(dm, e.m);
    const right = rMatMul(m, e.dmds);
    dm = { a: left.a + right.a, b: left.b + right.b, c: left.c + right.c, d: left.d + right.d };
    m = rMatMul(m, e.m);
  }
  return { m, dmds: dm };
}

/**
 * Value B(−β) of the chain, the function whose zeros are the poles: the product of the elements' matrices as in
 * `realTransmission`, the same operations in the same order, without the derivatives (the root polish calls it
 * some ten times per pole).
 */
export function realB(chain: ConductionChain, beta: number): number {
  let a = REAL_IDENTITY2.a, b = REAL_IDENTITY2.b, c = REAL_IDENTITY2.c, d = REAL_IDENTITY2.d;
  for (const element of chain.elements) {
    let ea: number, eb: number, ec: number;
    if (element.kind === "resistive") {
      ea = 1, eb = element.resistance, ec = 0;
    } else {
      const { thicknessM: l, conductivity: k, diffusivity: alpha } = element;
      const theta = l * Math.sqrt(beta / alpha);
      const sc = sinc(theta);
      ea = Math.cos(theta), eb = (l / k) * sc, ec = -((k * theta * theta) / l) * sc;
    }
    // rMatMul([[a, b], [c, d]], [[ea, eb], [ec, ea]])
    const na = a * ea + b * ec, nb = a * eb + b * ea, nc = c * ea + d * ec, nd = c * eb + d * ea;
    a = na, b = nb, c = nc, d = nd;
  }
  return b;
}
