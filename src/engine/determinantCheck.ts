import { cAbs, cMul, cSub } from "./complex.ts";
import type { ConductionChain } from "./elements.ts";
import { realTransmission, transmission } from "./transmission.ts";

/**
 * Largest |AD − BC − 1| / max(1, |AD|) of the chain matrix over sample points: s = iω·{1, 10} (24 h period),
 * s = 1e-6·(1 + i), and real s = −β between and beyond the first poles.
 */
export function transmissionDeterminantError(chain: ConductionChain, betas: readonly number[]): number {
  const omega = (2 * Math.PI) / 86400;
  let worst = 0;
  for (const s of [{ re: 0, im: omega }, { re: 0, im: 10 * omega }, { re: 1e-6, im: 1e-6 }]) {
    const m = transmission(chain, s);
    const ad = cMul(m.a, m.d);
    const det = cSub(ad, cMul(m.b, m.c));
    const e = cAbs(cSub(det, { re: 1, im: 0 })) / Math.max(1, cAbs(ad));
    if (!(e <= worst)) worst = e;
  }
  const b1 = betas[0] ?? 1e-5;
  const b2 = betas[1] ?? 3 * b1;
  for (const beta of [0.5 * b1, 0.5 * (b1 + b2), 1.5 * b2]) {
    const { m } = realTransmission(chain, beta);
    const e = Math.abs(m.a * m.d - m.b * m.c - 1) / Math.max(1, Math.abs(m.a * m.d));
    if (!(e <= worst)) worst = e;
  }
  return worst;
}
