import type { FiniteVolumeModel } from "./stateSpaceModel.ts";
import { tridiagonalEigen } from "./tridiagonalEigen.ts";

/**
 * Modes of the finite-volume model C dT/dt = −K T + g_o e_0 T_o + g_i e_(n−1) T_i. K is symmetric tridiagonal and
 * C diagonal, so A = −C⁻¹K = −C^(−1/2) S C^(1/2) with S = C^(−1/2) K C^(−1/2) symmetric tridiagonal; with
 * S = V Λ Vᵀ the modal amplitudes z = Vᵀ C^(1/2) T decouple: dz_m/dt = −λ_m z_m + w_o,m T_o + w_i,m T_i, and
 * the boundary fluxes read q_o = g_o T_o − Σ w_o,m z_m, q_i = Σ w_i,m z_m − g_i T_i. Only the end rows of V
 * enter (w_o,m = g_o V_0m / √c_0, w_i,m = g_i V_(n−1)m / √c_(n−1)).
 */
export interface ModelModes {
  /** λ_m, 1/s, ascending. */
  readonly rates: Float64Array;
  /** w_o,m: gain of mode m from T_o, and the weight of its amplitude in the outside flux. */
  readonly outside: Float64Array;
  /** w_i,m: gain of mode m from T_i, and the weight of its amplitude in the inside flux. */
  readonly inside: Float64Array;
}

/** The symmetrised system matrix S = C^(−1/2) K C^(−1/2) as diagonal and off-diagonal. */
export function symmetrisedSystem(model: FiniteVolumeModel): { diag: number[]; off: number[] } {
  const n = model.capacities.length;
  const c = model.capacities;
  const diag: number[] = [];
  const off: number[] = [];
  for (let i = 0; i < n; i++) {
    const left = i === 0 ? model.outsideConductance : model.links[i - 1]!;
    const right = i === n - 1 ? model.insideConductance : model.links[i]!;
    diag.push((left + right) / c[i]!);
    if (i < n - 1) off.push(-model.links[i]! / Math.sqrt(c[i]! * c[i + 1]!));
  }
  return { diag, off };
}

/** Modes of the model from the implicit QL eigen-decomposition of S, accumulating only V's two end rows. */
export function modelModes(model: FiniteVolumeModel): ModelModes {
  const n = model.capacities.length;
  const { diag, off } = symmetrisedSystem(model);
  const eigen = tridiagonalEigen(diag, off, [0, n - 1]);
  const scaleO = model.outsideConductance / Math.sqrt(model.capacities[0]!);
  const scaleI = model.insideConductance / Math.sqrt(model.capacities[n - 1]!);
  return {
    rates: eigen.values,
    outside: eigen.rows[0]!.map((v) => v * scaleO),
    inside: eigen.rows[1]!.map((v) => v * scaleI),
  };
}

/** (x − 1 + e^(−x)) / x², by its series Σ (−x)^k / (k + 2)! where the closed form cancels. */
function rampWeight(x: number): number {
  if (x >= 0.05) return (x + Math.expm1(-x)) / (x * x);
  let term = 0.5, sum = 0.5;
  for (let k = 1; k <= 8; k++) {
    term *= -x / (k + 2);
    sum += term;
  }
  return sum;
}

/**
 * Discrete pulse responses of the modes, exact for inputs linear between samples: a unit triangular pulse
 * (base 2Δ, peak at t = 0) gives z_m(jΔ) = γ_m,j · gain with γ_0 = Δ φ(λΔ), φ(x) = (x − 1 + e^(−x))/x², and
 * γ_j = q^(j−1) (1 − q)² / (λ²Δ) for j ≥ 1, q = e^(−λΔ) — the same sequence F^(j−1)(Γ0 − Γb + FΓb), Γb that the
 * discretisation x_(k+1) = F x_k + Γ0 u_k + Γb (u_(k+1) − u_k) produces, taken mode by mode.
 * Returns Σ_m a_m b_m γ_m,j for j < terms; modes stop once their remaining tail is below `floor`.
 */
export function modalPulseSeries(
  rates: Float64Array,
  a: Float64Array,
  b: Float64Array,
  timestepS: number,
  terms: number,
  floor: number,
): Float64Array {
  const out = new Float64Array(terms);
  for (let m = 0; m < rates.length; m++) {
    const lambda = rates[m]!;
    const x = lambda * timestepS;
    const weight = a[m]! * b[m]!;
    out[0] = out[0]! + weight * timestepS * rampWeight(x);
    const oneMinusQ = -Math.expm1(-x);
    const q = 1 - oneMinusQ;
    // (1 − q)² / (λ²Δ) = Δ ((1 − q)/x)²
    const ratio = x > 0 ? oneMinusQ / x : 1;
    let term = weight * timestepS * ratio * ratio;
    // Tail Σ_(k≥j) |term| q^(k−j) = |term| / (1 − q): stop once it is negligible.
    const tailFactor = oneMinusQ > 0 ? 1 / oneMinusQ : Infinity;
    for (let j = 1; j < terms; j++) {
      if (Math.abs(term) * tailFactor < floor) break;
      out[j] = out[j]! + term;
      term *= q;
    }
  }
  return out;
}
