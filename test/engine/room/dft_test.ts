import assert from "node:assert/strict";
import { circularConvolution, FourierDay } from "../../../src/engine/room/dft.ts";

for (const n of [24, 144, 1440]) {
  Deno.test(`day transform of ${n} steps: a cosine has N/2 at its harmonic and the convolution theorem holds`, () => {
    const day = new FourierDay(n);
    // Σ_k cos(2π·3k/N + φ) e^(−2πi mk/N) = (N/2) e^(iφ) at m = 3 and its mirror, 0 elsewhere (orthogonality).
    const phi = 0.7;
    const s = day.forward(Array.from({ length: n }, (_, k) => Math.cos((2 * Math.PI * 3 * k) / n + phi)));
    for (let m = 0; m < n; m++) {
      const re = m === 3 || m === n - 3 ? (n / 2) * Math.cos(phi) : 0;
      const im = m === 3 ? (n / 2) * Math.sin(phi) : m === n - 3 ? -(n / 2) * Math.sin(phi) : 0;
      assert.ok(Math.abs(s.re[m]! - re) < 1e-10 * n && Math.abs(s.im[m]! - im) < 1e-10 * n, `m = ${m}`);
    }
    // p ⊛ x by the transform equals the direct sum (convolution theorem).
    const p = Array.from({ length: n }, (_, k) => Math.exp(-k / 5));
    const x = Array.from({ length: n }, (_, k) => Math.sin(k * 0.37) + (k % 7));
    const P = day.forward(p);
    const X = day.forward(x);
    const product = {
      re: P.re.map((v, m) => v * X.re[m]! - P.im[m]! * X.im[m]!),
      im: P.re.map((v, m) => v * X.im[m]! + P.im[m]! * X.re[m]!),
    };
    const direct = circularConvolution(p, x);
    day.inverse(product).forEach((v, k) => assert.ok(Math.abs(v - direct[k]!) < 1e-10 * 10, `k = ${k}`));
  });
}
