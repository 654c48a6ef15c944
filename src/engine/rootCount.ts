import type { ConductionChain } from "./elements.ts";

/**
 * Exact number of poles s = −β_n of the chain with β_n < beta (Sturm oscillation count).
 * Marches T(x), q(x) at s = −beta from T = 0, q = 1 at the outside node and counts the zeros of T in (0, end].
 */
export function rootCountBelow(chain: ConductionChain, beta: number): number {
  let t = 0;
  let q = 1;
  let zeros = 0;
  for (const element of chain.elements) {
    switch (element.kind) {
      case "resistive": {
        const tNew = t - element.resistance * q;
        if ((t > 0 && tNew <= 0) || (t < 0 && tNew >= 0)) zeros++;
        t = tNew;
        break;
      }
      case "massive": {
        const w = Math.sqrt(beta / element.diffusivity);
        const kw = element.conductivity * w;
        const a = t;
        const b = -q / kw;
        const theta = w * element.thicknessM;
        const phi = Math.atan2(a, b);
        zeros += Math.floor((theta + phi) / Math.PI) - Math.floor(phi / Math.PI);
        const cos = Math.cos(theta);
        const sin = Math.sin(theta);
        t = a * cos + b * sin;
        q = kw * (a * sin - b * cos);
        break;
      }
    }
    const scale = Math.max(Math.abs(t), Math.abs(q));
    if (scale > 1e100 || (scale < 1e-100 && scale > 0)) {
      t /= scale;
      q /= scale;
    }
  }
  return zeros;
}
