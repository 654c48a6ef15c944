import { circularConvolution, type FourierDay, type Spectrum } from "./dft.ts";
import type { InsideSurface } from "./insideSurfaces.ts";

/**
 * The inside-face heat balance of a room over one periodic day, solved directly for the steady-periodic state.
 *
 * Per inside face i and step k (W/m²; Pedersen, Fisher & Spitler 1997, from memory):
 *   q_cond,i + a_i/A_i = h_c,i (T_i − T_air) + h_r (T_i − T_mrt),   q_cond,i = P_Y,i ⊛ T_far,i − P_Z,i ⊛ T_i,
 * with T_mrt = Σ_j A_j T_j / Σ_j A_j (long-wave exchange with view factors F_ij = A_j / ΣA, which satisfy
 * reciprocity A_i F_ij = A_j F_ji, so the exchange sums to zero over the room). An adiabatic face has a zero flux at
 * its far face: P_X ⊛ T_far − P_Y ⊛ T_i = 0. The system is linear and time-invariant over a repeating day, so the
 * discrete Fourier transform splits it into one small system per harmonic m: the diagonal (P_Z(m) + h_c + h_r)
 * (P_Z − P_Y²/P_X for an adiabatic face) plus the rank-one exchange term, solved exactly by the Sherman–Morrison
 * formula. No day is repeated: the result is the periodic state itself, verified in the time domain (`evaluateBalance`).
 */

/** The inputs of one run of the balance (one source at a time for the split, or all of them). */
export interface BalanceSources {
  /** Far-side temperature per face and step, °C (windows: the outdoor air); null = zero or an adiabatic face. */
  readonly farC: readonly (readonly number[] | null)[];
  /** Room air temperature per step, °C; null = zero. */
  readonly airC: readonly number[] | null;
  /** Radiant heat absorbed on each face per step, W; null = zero. */
  readonly absorbedW: readonly (readonly number[] | null)[];
}

/** Inside surface temperatures, and the far-face temperatures of adiabatic faces, °C per step. */
export interface BalanceSolution {
  readonly surfaceC: readonly (readonly number[])[];
  /** Far-face temperature of each adiabatic face (null for the others). */
  readonly farFaceC: readonly (readonly number[] | null)[];
}

const ZERO = (n: number): Spectrum => ({ re: new Float64Array(n), im: new Float64Array(n) });

/** Solves the inside surface temperatures of the steady-periodic day. */
export function solveBalance(
  faces: readonly InsideSurface[],
  radiation: number,
  sources: BalanceSources,
  day: FourierDay,
): BalanceSolution {
  const n = day.n;
  const count = faces.length;
  const totalArea = faces.reduce((s, f) => s + f.areaM2, 0);
  const far = sources.farC.map((x) => (x === null ? ZERO(n) : day.forward(x)));
  const air = sources.airC === null ? ZERO(n) : day.forward(sources.airC);
  const absorbed = sources.absorbedW.map((x) => (x === null ? ZERO(n) : day.forward(x)));
  const tRe = faces.map(() => new Float64Array(n));
  const tIm = faces.map(() => new Float64Array(n));
  const dRe = new Float64Array(count);
  const dIm = new Float64Array(count);
  const bRe = new Float64Array(count);
  const bIm = new Float64Array(count);
  for (let m = 0; m < n; m++) {
    // Σ f_i b_i / d_i and Σ f_i / d_i
    let sbRe = 0, sbIm = 0, sdRe = 0, sdIm = 0;
    for (let i = 0; i < count; i++) {
      const f = faces[i]!;
      let zr = f.Z.re[m]!, zi = f.Z.im[m]!;
      if (f.kind === "adiabatic") {
        // Z − Y² / X
        const yr = f.Y.re[m]!, yi = f.Y.im[m]!, xr = f.X.re[m]!, xi = f.X.im[m]!;
        const y2r = yr * yr - yi * yi, y2i = 2 * yr * yi;
        const den = xr * xr + xi * xi;
        zr -= (y2r * xr + y2i * xi) / den;
        zi -= (y2i * xr - y2r * xi) / den;
      }
      const dr = zr + f.convection + radiation, di = zi;
      let br = absorbed[i]!.re[m]! / f.areaM2 + f.convection * air.re[m]!;
      let bi = absorbed[i]!.im[m]! / f.areaM2 + f.convection * air.im[m]!;
      if (f.kind !== "adiabatic") {
        const yr = f.Y.re[m]!, yi = f.Y.im[m]!, tr = far[i]!.re[m]!, ti = far[i]!.im[m]!;
        br += yr * tr - yi * ti;
        bi += yr * ti + yi * tr;
      }
      dRe[i] = dr, dIm[i] = di, bRe[i] = br, bIm[i] = bi;
      const weight = f.areaM2 / totalArea;
      const den = dr * dr + di * di;
      // b / d and 1 / d
      sbRe += (weight * (br * dr + bi * di)) / den;
      sbIm += (weight * (bi * dr - br * di)) / den;
      sdRe += (weight * dr) / den;
      sdIm -= (weight * di) / den;
    }
    // g = Σ f b/d / (1 − h_r Σ f/d): the spectrum of T_mrt.
    const cr = 1 - radiation * sdRe, ci = -radiation * sdIm;
    const cden = cr * cr + ci * ci;
    const gr = (sbRe * cr + sbIm * ci) / cden, gi = (sbIm * cr - sbRe * ci) / cden;
    for (let i = 0; i < count; i++) {
      const nr = bRe[i]! + radiation * gr, ni = bIm[i]! + radiation * gi;
      const dr = dRe[i]!, di = dIm[i]!;
      const den = dr * dr + di * di;
      tRe[i]![m] = (nr * dr + ni * di) / den;
      tIm[i]![m] = (ni * dr - nr * di) / den;
    }
  }
  const surfaceC = faces.map((_, i) => day.inverse({ re: tRe[i]!, im: tIm[i]! }));
  const farFaceC = faces.map((f, i) => {
    if (f.kind !== "adiabatic") return null;
    // T_far = (Y / X) T_i
    const re = new Float64Array(n), im = new Float64Array(n);
    for (let m = 0; m < n; m++) {
      const yr = f.Y.re[m]!, yi = f.Y.im[m]!, xr = f.X.re[m]!, xi = f.X.im[m]!;
      const den = xr * xr + xi * xi;
      const rr = (yr * xr + yi * xi) / den, ri = (yi * xr - yr * xi) / den;
      const tr = tRe[i]![m]!, ti = tIm[i]![m]!;
      re[m] = rr * tr - ri * ti;
      im[m] = rr * ti + ri * tr;
    }
    return day.inverse({ re, im });
  });
  return { surfaceC, farFaceC };
}

/** Heat flows of each face per step, W, recomputed in the time domain from the solved temperatures. */
export interface FaceFlows {
  /** Conduction arriving at the inside surface from the construction (into the room positive). */
  readonly conductionW: readonly number[];
  /** Convection from the surface into the room air. */
  readonly convectionW: readonly number[];
  /** Net long-wave radiation leaving the surface to the other inside surfaces. */
  readonly radiationW: readonly number[];
  /** Radiant gains absorbed. */
  readonly absorbedW: readonly number[];
  /** conduction + absorbed − convection − radiation. */
  readonly residualW: readonly number[];
  /** Flux through the far face of an adiabatic face (zero by its boundary condition), W; zeros otherwise. */
  readonly farFaceW: readonly number[];
}

/** Area-weighted mean of the inside surface temperatures per step, °C. */
export function meanRadiantTemperature(
  faces: readonly InsideSurface[],
  surfaceC: readonly (readonly number[])[],
) {
  const total = faces.reduce((s, f) => s + f.areaM2, 0);
  return surfaceC[0]!.map((_, k) => faces.reduce((s, f, i) => s + f.areaM2 * surfaceC[i]![k]!, 0) / total);
}

/** Every face's flows by direct time-domain convolution of the periodic response factors (independent of the solve). */
export function evaluateBalance(
  faces: readonly InsideSurface[],
  radiation: number,
  sources: BalanceSources,
  solution: BalanceSolution,
): FaceFlows[] {
  const n = solution.surfaceC[0]?.length ?? 0;
  const zeros = new Array<number>(n).fill(0);
  const mrt = meanRadiantTemperature(faces, solution.surfaceC);
  const air = sources.airC ?? zeros;
  return faces.map((f, i) => {
    const t = solution.surfaceC[i]!;
    const farSide = f.kind === "adiabatic" ? solution.farFaceC[i]! : sources.farC[i] ?? zeros;
    const y = circularConvolution(f.pY, farSide);
    const z = circularConvolution(f.pZ, t);
    const conductionW = y.map((v, k) => f.areaM2 * (v - z[k]!));
    const convectionW = t.map((v, k) => f.areaM2 * f.convection * (v - air[k]!));
    const radiationW = t.map((v, k) => f.areaM2 * radiation * (v - mrt[k]!));
    const absorbedW = sources.absorbedW[i] ?? zeros;
    const residualW = conductionW.map((c, k) => c + absorbedW[k]! - convectionW[k]! - radiationW[k]!);
    let farFaceW = zeros;
    if (f.kind === "adiabatic") {
      const x = circularConvolution(f.pX, farSide);
      const yi = circularConvolution(f.pY, t);
      farFaceW = x.map((v, k) => f.areaM2 * (v - yi[k]!));
    }
    return { conductionW, convectionW, radiationW, absorbedW, residualW, farFaceW };
  });
}
