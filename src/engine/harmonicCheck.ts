import { cAbs, cAdd, cArg, cDiv, type Complex, cScale } from "./complex.ts";
import type { ConductionChain } from "./elements.ts";
import { frequencyResponse } from "./iso13786.ts";

/** First DFT harmonic H₁ = Σ_j P_j e^(−i2πj/N) of N periodic response factors. */
export function firstHarmonic(periodic: readonly number[]): Complex {
  const n = periodic.length;
  let re = 0, im = 0;
  periodic.forEach((v, j) => {
    re += v * Math.cos((2 * Math.PI * j) / n);
    im -= v * Math.sin((2 * Math.PI * j) / n);
  });
  return { re, im };
}

/**
 * What the first harmonic of hourly triangular-pulse periodic factors must equal: Y(iω)·sinc²(π/24) plus the
 * aliased harmonics 24m + 1 (Poisson summation), which matter only for light or purely resistive walls.
 */
export function expectedFirstHarmonic(
  chain: ConductionChain,
  periodS = 86400,
  samples = 24,
  aliases = 60,
): Complex {
  const omega = (2 * Math.PI) / periodS;
  let sum: Complex = { re: 0, im: 0 };
  for (let m = -aliases; m <= aliases; m++) {
    const k = 1 + samples * m;
    const x = (Math.PI * k) / samples;
    const sinc2 = (Math.sin(x) / x) ** 2;
    const y = frequencyResponse(chain, Math.abs(k) * omega).y;
    const yk = k > 0 ? y : { re: y.re, im: -y.im };
    sum = cAdd(sum, cScale(yk, sinc2));
  }
  return sum;
}

/** Amplitudes below this fraction of U are compared absolutely (round-off floor of the 24 summed factors). */
export const HARMONIC_FLOOR = 1e-6;

/**
 * Amplitude error ||H₁| − |E|| / max(|E|, 1e-6 U) and phase error (h, weighted by min(1, |E| / 1e-6 U)) of the
 * hourly cross periodic factors' first harmonic H₁ against its expected value E.
 */
export function harmonicErrors(
  chain: ConductionChain,
  periodicY: readonly number[],
): { amplitude: number; phaseH: number; plainAmplitude: number } {
  const h1 = firstHarmonic(periodicY);
  const expected = expectedFirstHarmonic(chain);
  const floor = HARMONIC_FLOOR / chain.totalResistance;
  const ratio = cDiv(h1, expected);
  const weight = Math.min(1, cAbs(expected) / floor);
  const plain = cScale(
    frequencyResponse(chain, (2 * Math.PI) / 86400).y,
    (Math.sin(Math.PI / 24) / (Math.PI / 24)) ** 2,
  );
  return {
    amplitude: (cAbs(h1) - cAbs(expected)) / Math.max(cAbs(expected), floor),
    phaseH: (weight * cArg(ratio) * 24) / (2 * Math.PI),
    plainAmplitude: cAbs(h1) / cAbs(plain) - 1,
  };
}
