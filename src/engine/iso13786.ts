import { cAbs, cArg, cDiv, cExp, type Complex, cScale, cSub } from "./complex.ts";
import type { ConductionChain } from "./elements.ts";
import { scaledTransmission } from "./transmission.ts";

/** Amplitude and ISO 13786 time shift (positive = lead, negative = lag) of a periodic quantity. */
export interface PeriodicQuantity {
  /** W/(m^2 K) */
  readonly amplitude: number;
  /** h */
  readonly timeShift_h: number;
}

/** ISO 13786 dynamic thermal characteristics at one period, side 1 = inside, films included. */
export interface Iso13786Characteristics {
  readonly periodS: number;
  /** Heat transfer matrix in ISO form [[Z11, Z12], [Z21, Z22]] (side 1 = inside). */
  readonly heatTransferMatrix: {
    readonly z11: Complex;
    readonly z12: Complex;
    readonly z21: Complex;
    readonly z22: Complex;
  } | null;
  /** Y12 = −1/Z12; its time shift is the unwrapped one (−timeLag_h). */
  readonly periodicTransmittance: PeriodicQuantity;
  /** Principal-value ISO time shift of Y12 in (−P/2, P/2], h, as the standard's arg() would give it. */
  readonly periodicTransmittanceWrappedShift_h: number;
  /** Y11 = −Z11/Z12, W/(m^2 K) */
  readonly admittanceInside: PeriodicQuantity;
  /** Y22 = −Z22/Z12, W/(m^2 K) */
  readonly admittanceOutside: PeriodicQuantity;
  /** |Y12| / U */
  readonly decrementFactor: number;
  /** Lag of Y12 following the phase continuously from ω → 0, h, ≥ 0 for physical walls. */
  readonly timeLag_h: number;
  /** κ1 = (P/2π) |(Z11 − 1)/Z12|, J/(m^2 K) */
  readonly arealHeatCapacityInside: number;
  /** κ2 = (P/2π) |(Z22 − 1)/Z12|, J/(m^2 K) */
  readonly arealHeatCapacityOutside: number;
}

/** X(iω), Y(iω), Z(iω) of a chain: outside admittance D/B, cross 1/B, inside admittance A/B. */
export function frequencyResponse(
  chain: ConductionChain,
  omega: number,
): { x: Complex; y: Complex; z: Complex } {
  const { scaled, logScale } = scaledTransmission(chain, { re: 0, im: omega });
  return {
    x: cDiv(scaled.d, scaled.b),
    y: cDiv(cExp(cScale(logScale, -1)), scaled.b),
    z: cDiv(scaled.a, scaled.b),
  };
}

/** Phase of Y(iω) = 1/B(iω), unwrapped continuously from ω → 0 (where it is 0), rad. */
export function unwrappedCrossPhase(chain: ConductionChain, omega: number): number {
  for (let samples = 64; samples <= 1 << 16; samples *= 4) {
    let previous = 0;
    let unwrapped = 0;
    let smooth = true;
    for (let k = 1; k <= samples; k++) {
      const w = omega * (k / samples) ** 2;
      const { scaled, logScale } = scaledTransmission(chain, { re: 0, im: w });
      const argB = cArg(scaled.b);
      let step = argB - previous;
      step -= 2 * Math.PI * Math.round(step / (2 * Math.PI));
      if (Math.abs(step) > Math.PI / 4) smooth = false;
      unwrapped += step;
      previous = argB;
      if (k === samples && smooth) return -logScale.im - unwrapped;
    }
  }
  const { scaled, logScale } = scaledTransmission(chain, { re: 0, im: omega });
  return -logScale.im - cArg(scaled.b);
}

function wrapShiftH(phase: number, periodS: number): number {
  let p = phase;
  while (p <= -Math.PI) p += 2 * Math.PI;
  while (p > Math.PI) p -= 2 * Math.PI;
  return (p * periodS) / (2 * Math.PI) / 3600;
}

/** ISO 13786 characteristics of an air-to-air chain at the given period (default 24 h). */
export function iso13786(chain: ConductionChain, periodS = 86400): Iso13786Characteristics {
  const omega = (2 * Math.PI) / periodS;
  const { scaled, logScale } = scaledTransmission(chain, { re: 0, im: omega });
  const inverseScale = cExp(cScale(logScale, -1));
  const y12 = cDiv(inverseScale, scaled.b);
  const y11 = cDiv(scaled.a, scaled.b);
  const y22 = cDiv(scaled.d, scaled.b);
  const uValue = 1 / chain.totalResistance;
  const factor = periodS / (2 * Math.PI);
  const lagPhase = unwrappedCrossPhase(chain, omega);
  const timeLag_h = (-lagPhase * factor) / 3600;
  const finite = Math.abs(logScale.re) < 600;
  const full = (m: Complex) => finite ? cDiv(m, inverseScale) : null;
  const a = full(scaled.a), b = full(scaled.b), c = full(scaled.c), d = full(scaled.d);
  return {
    periodS,
    heatTransferMatrix: a && b && c && d ? { z11: a, z12: cScale(b, -1), z21: cScale(c, -1), z22: d } : null,
    periodicTransmittance: { amplitude: cAbs(y12), timeShift_h: -timeLag_h },
    periodicTransmittanceWrappedShift_h: wrapShiftH(cArg(y12), periodS),
    admittanceInside: { amplitude: cAbs(y11), timeShift_h: wrapShiftH(cArg(y11), periodS) },
    admittanceOutside: { amplitude: cAbs(y22), timeShift_h: wrapShiftH(cArg(y22), periodS) },
    decrementFactor: cAbs(y12) / uValue,
    timeLag_h,
    arealHeatCapacityInside: (factor * cAbs(cSub(scaled.a, inverseScale))) / cAbs(scaled.b),
    arealHeatCapacityOutside: (factor * cAbs(cSub(scaled.d, inverseScale))) / cAbs(scaled.b),
  };
}
