import { ctfAccepted, type CtfCandidate, selectCtf } from "./ctf.ts";
import type { ConductionChain } from "./elements.ts";
import { type PulseModes, pulseModes } from "./pulseModes.ts";
import { type RampResponse, rampResponse } from "./residues.ts";
import { type ResponseFactors, responseFactors } from "./responseFactors.ts";
import { findPoles, type PoleSet } from "./roots.ts";

/** Everything the root method gives for one chain at one timestep. */
export interface RootAnalysis {
  readonly boundary: ConductionChain["boundary"];
  /** W/(m^2 K) */
  readonly uValue: number;
  readonly poles: PoleSet;
  readonly ramp: RampResponse;
  /** 1/β_1 in hours (0 for a purely resistive chain). */
  readonly tau1H: number;
  readonly responseFactors: ResponseFactors;
  /** Modal form of X, Y, Z at the timestep: one first-order term per pole. */
  readonly modes: { readonly X: PulseModes; readonly Y: PulseModes; readonly Z: PulseModes };
  /** Best polynomial CTF found (accepted or not). */
  readonly ctfCandidate: CtfCandidate;
  readonly ctfAccepted: boolean;
}

/** e^(−βΔ) exponent up to which poles are always included. */
const POLE_EXPONENT = 40;
/** Largest neglected-pole contribution to RF_0, relative to U. */
const NEGLECTED_POLE_LIMIT = 1e-10;

/** Poles up to β Δ = 40, extended until the first neglected pole's term is below 1e-10 U. */
export function polesAndRamp(
  chain: ConductionChain,
  timestepS: number,
): { poles: PoleSet; ramp: RampResponse } {
  let betaMax = POLE_EXPONENT / timestepS;
  for (let attempt = 0;; attempt++) {
    const poles = findPoles(chain, betaMax);
    const ramp = rampResponse(chain, poles.betas);
    const n = poles.betas.length;
    if (n === 0 || attempt >= 4) return { poles, ramp };
    const last = poles.betas[n - 1]!;
    const a = Math.max(
      Math.abs(ramp.residuesX[n - 1]!),
      Math.abs(ramp.residuesY[n - 1]!),
      Math.abs(ramp.residuesZ[n - 1]!),
    );
    const term = (a * Math.exp(-last * timestepS)) / timestepS;
    if (term < NEGLECTED_POLE_LIMIT * ramp.uValue) return { poles, ramp };
    betaMax *= 2;
  }
}

/** Root method for one chain: poles, exact constant terms, response factors, modal form and polynomial CTF. */
export function rootAnalysis(chain: ConductionChain, timestepS: number): RootAnalysis {
  const { poles, ramp } = polesAndRamp(chain, timestepS);
  const rf = responseFactors(ramp, timestepS);
  const modes = {
    X: pulseModes(ramp, "X", timestepS),
    Y: pulseModes(ramp, "Y", timestepS),
    Z: pulseModes(ramp, "Z", timestepS),
  };
  const ctfCandidate = selectCtf(modes.Y.ratios, rf, ramp.uValue);
  const first = poles.betas[0];
  return {
    boundary: chain.boundary,
    uValue: ramp.uValue,
    poles,
    ramp,
    tau1H: first === undefined ? 0 : 1 / first / 3600,
    responseFactors: rf,
    modes,
    ctfCandidate,
    ctfAccepted: ctfAccepted(ctfCandidate),
  };
}
