import { type EngineCheck, engineCheck, type MethodNote } from "./check.ts";
import { rootCtfOutcome, stateSpaceCtfOutcome } from "./ctfChecks.ts";
import { transmissionDeterminantError } from "./determinantCheck.ts";
import { type ConductionChain, conductionChain } from "./elements.ts";
import { type Unresolvable, unresolvable } from "./engineError.ts";
import { estimatedPoles, MAX_POLES } from "./poleBudget.ts";
import { harmonicErrors } from "./harmonicCheck.ts";
import { iso13786, type Iso13786Characteristics } from "./iso13786.ts";
import { type ConstructionInput, sameLayers } from "./layer.ts";
import { foldPeriodic, periodicFromModes } from "./periodic.ts";
import { foldedModalTail, modalTailSum, type PulseModes, pulseModes } from "./pulseModes.ts";
import { responseFactors } from "./responseFactors.ts";
import { type RootAnalysis, rootAnalysis } from "./rootAnalysis.ts";
import {
  STATE_SPACE_AGREEMENT_LIMIT,
  type StateSpaceAnalysis,
  stateSpaceAnalysis,
} from "./stateSpaceAnalysis.ts";
import { type SteadyState, steadyState } from "./steady.ts";

/** Options of the dynamic analysis. */
export interface AnalysisOptions {
  /** Run the state-space method as the second route (default true). */
  readonly stateSpace?: boolean;
  /**
   * An analysis already made of a construction with the same layers (its films may differ, as a design day's
   * outside film does). No film enters the surface-to-surface chain, so its root analysis at the same time step is
   * the one this analysis would compute (bit for bit: the same function of the same numbers) and is taken as it
   * is; with other layers or another time step it is computed afresh.
   */
  readonly sameLayers?: { readonly input: ConstructionInput; readonly analysis: DynamicAnalysis };
}

/** 24-hour periodic response factors at 1 h (air to air) and the conduction time series. */
export interface PeriodicFactors {
  readonly X: readonly number[];
  readonly Y: readonly number[];
  readonly Z: readonly number[];
  /** Y / U, sums to 1 */
  readonly cts: readonly number[];
}

/** Complete dynamic analysis of one construction. */
export interface DynamicAnalysis {
  readonly kind: "analysis";
  readonly timestepS: number;
  readonly steady: SteadyState;
  /** Films included (TFM, RTS/CTS, ISO 13786 convention). */
  readonly airToAir: RootAnalysis;
  /** No films (heat-balance convention). */
  readonly surfaceToSurface: RootAnalysis;
  /** Air-to-air root analysis at 1 h (the same object as airToAir when the timestep is 1 h). */
  readonly hourly: RootAnalysis;
  readonly periodic: PeriodicFactors;
  readonly stateSpace: StateSpaceAnalysis | null;
  /** State-space cells in each input layer (0 for resistive layers), or null without the state-space route. */
  readonly cellsPerLayer: readonly number[] | null;
  readonly iso13786: Iso13786Characteristics;
  readonly checks: readonly EngineCheck[];
  /** Method choices: each polynomial CTF that was not published and why (the modal form is used instead). */
  readonly methodNotes: readonly MethodNote[];
}

/** Timesteps accepted: whole seconds from 60 s to 3600 s that divide one hour. */
export function isValidTimestep(timestepS: number): boolean {
  return Number.isInteger(timestepS) && timestepS >= 60 && timestepS <= 3600 && 3600 % timestepS === 0;
}

/**
 * |Σ RF − U| / U over the listed terms plus the closed-form tail of the modal form past them: the listed series is cut
 * once its tail is below 1e-10 U or at `MAX_RESPONSE_FACTOR_TERMS` (very slow constructions), and that cut is
 * reported as `truncationResidual`, not as a failed identity.
 */
export function sumRuleWithTail(
  series: readonly number[],
  modes: PulseModes,
  uValue: number,
  tail = modalTailSum(modes, series.length),
): number {
  const listed = series.reduce((s, v) => s + v, 0);
  return Math.abs(listed + tail - uValue) / uValue;
}

function sumRuleChecks(root: RootAnalysis, suffix: string): EngineCheck[] {
  const rf = root.responseFactors;
  return (["X", "Y", "Z"] as const).map((key) => {
    const tail = modalTailSum(root.modes[key], rf.termCount);
    // The tail past the listed terms, summed once for the description and the value.
    const value = rf[key].length === rf.termCount
      ? sumRuleWithTail(rf[key], root.modes[key], root.uValue, tail)
      : sumRuleWithTail(rf[key], root.modes[key], root.uValue);
    return engineCheck(
      `sum-rule-${key}${suffix}`,
      `|Σ ${key}_j − U| / U of ${rf.termCount} ${root.boundary} response factors (Δ = ${rf.timestepS} s) plus their closed-form tail (${
        (Math.abs(tail) / root.uValue).toExponential(1)
      } U)`,
      value,
      1e-8,
    );
  });
}

function rootChecks(
  root: RootAnalysis,
  suffix: string,
): { checks: EngineCheck[]; notes: readonly MethodNote[] } {
  const ctf = rootCtfOutcome(root, suffix);
  return {
    checks: [
      ...sumRuleChecks(root, suffix),
      engineCheck(
        `root-count${suffix}`,
        `Poles found minus the exact oscillation count below β = ${
          root.poles.betaMax.toExponential(4)
        } 1/s (plus unresolved intervals)`,
        Math.abs(root.poles.bracketedCount - root.poles.exactCount) + root.poles.unresolvedIntervals,
        0,
      ),
      ...ctf.checks,
    ],
    notes: ctf.notes,
  };
}

function stateSpaceChecks(ss: StateSpaceAnalysis): { checks: EngineCheck[]; notes: readonly MethodNote[] } {
  const ctf = stateSpaceCtfOutcome(ss);

  return {
    checks: [
      engineCheck(
        "state-space-agreement",
        `max_j |RF state space − RF roots| / max(U, max_j |RF roots|), each of X, Y, Z against its own magnitude (${ss.response.model.capacities.length} graded cells; / U alone: ${
          ss.agreement.max.toExponential(2)
        })`,
        ss.relativeAgreement.max,
        STATE_SPACE_AGREEMENT_LIMIT,
      ),
      engineCheck(
        "state-space-reciprocity",
        "max_j |q_i per T_o pulse + q_o per T_i pulse| / U of the state-space model",
        ss.response.reciprocityError,
        1e-9,
      ),
      ...ctf.checks,
    ],
    notes: ctf.notes,
  };
}

function periodicFactors(hourly: RootAnalysis): PeriodicFactors {
  const periodic = (key: "X" | "Y" | "Z") => periodicFromModes(hourly.modes[key], 24);
  const Y = periodic("Y");
  return { X: periodic("X"), Y, Z: periodic("Z"), cts: Y.map((v) => v / hourly.uValue) };
}

/** Closed-form periodic factors versus the folded hourly response factors plus their folded tail, max / U. */
export function periodicFoldError(hourly: RootAnalysis, periodic: PeriodicFactors): number {
  let worst = 0;
  for (const key of ["X", "Y", "Z"] as const) {
    const tail = foldedModalTail(hourly.modes[key], hourly.responseFactors.termCount, 24);
    const folded = foldPeriodic(hourly.responseFactors[key], 24).map((v, j) => v + tail[j]!);
    folded.forEach((v, j) => (worst = Math.max(worst, Math.abs(v - periodic[key][j]!) / hourly.uValue)));
  }
  return worst;
}

function hourlyAnalysis(airToAir: RootAnalysis): RootAnalysis {
  if (airToAir.responseFactors.timestepS === 3600) return airToAir;
  const modes = {
    X: pulseModes(airToAir.ramp, "X", 3600),
    Y: pulseModes(airToAir.ramp, "Y", 3600),
    Z: pulseModes(airToAir.ramp, "Z", 3600),
  };
  return { ...airToAir, responseFactors: responseFactors(airToAir.ramp, 3600), modes };
}

/** The surface-to-surface root analysis of `sameLayers`, when it is of these layers at this time step. */
function reusableSurface(
  input: ConstructionInput,
  timestepS: number,
  given: AnalysisOptions["sameLayers"],
): RootAnalysis | undefined {
  if (given === undefined || given.analysis.timestepS !== timestepS) return undefined;
  return sameLayers(given.input.layers, input.layers) ? given.analysis.surfaceToSurface : undefined;
}

/** Dynamic conduction analysis of a construction at the given timestep (s), or why it cannot be resolved. */
export function analyseConstruction(
  input: ConstructionInput,
  timestepS: number,
  options: AnalysisOptions = {},
): DynamicAnalysis | Unresolvable {
  if (!isValidTimestep(timestepS)) {
    return unresolvable(
      "invalid-timestep",
      `Cannot analyse at timestep ${timestepS} s: expected whole seconds dividing 3600 s, at least 60 s`,
    );
  }
  const air = conductionChain(input, "air-to-air");
  if (air.kind === "unresolvable") return air;
  const poles = estimatedPoles(input, timestepS);
  if (poles.count > MAX_POLES) {
    return unresolvable(
      "too-many-poles",
      `Cannot analyse: about ${poles.count} poles would be needed at a ${timestepS} s step (the limit is ${MAX_POLES}); ` +
        `layer ${
          poles.worstLayer + 1
        } is far thicker or less conductive than any real building layer — check its thickness and conductivity`,
    );
  }
  const surface = conductionChain(input, "surface-to-surface");
  if (surface.kind === "unresolvable") return surface;
  const airToAir = rootAnalysis(air, timestepS);
  const surfaceToSurface = reusableSurface(input, timestepS, options.sameLayers) ??
    rootAnalysis(surface, timestepS);
  const hourly = hourlyAnalysis(airToAir);
  const periodic = periodicFactors(hourly);
  const stateSpace = options.stateSpace === false
    ? null
    : stateSpaceAnalysis(air, timestepS, airToAir.responseFactors, airToAir.uValue);
  const iso = iso13786(air);
  return {
    kind: "analysis",
    timestepS,
    steady: steadyState(input),
    airToAir,
    surfaceToSurface,
    hourly,
    periodic,
    stateSpace,
    cellsPerLayer: stateSpace === null ? null : stateSpace.cellsPerElement.slice(
      input.outsideResistance > 0 ? 1 : 0,
      (input.outsideResistance > 0 ? 1 : 0) + input.layers.length,
    ),
    iso13786: iso,
    ...buildChecks(air, surface, airToAir, surfaceToSurface, hourly, periodic, stateSpace),
  };
}

function buildChecks(
  air: ConductionChain,
  surface: ConductionChain,
  airToAir: RootAnalysis,
  surfaceToSurface: RootAnalysis,
  hourly: RootAnalysis,
  periodic: PeriodicFactors,
  stateSpace: StateSpaceAnalysis | null,
): { checks: EngineCheck[]; methodNotes: MethodNote[] } {
  const harmonic = harmonicErrors(air, periodic.Y);
  const air2 = rootChecks(airToAir, "");
  const surface2 = rootChecks(surfaceToSurface, "-surface");
  const ss = stateSpace === null ? { checks: [], notes: [] } : stateSpaceChecks(stateSpace);
  const checks = [
    ...air2.checks,
    ...surface2.checks,
    engineCheck(
      "transmission-determinant",
      "max |det M − 1| / max(1, |AD|) at sampled s, air to air and surface to surface",
      Math.max(
        transmissionDeterminantError(air, airToAir.poles.betas),
        transmissionDeterminantError(surface, surfaceToSurface.poles.betas),
      ),
      1e-9,
    ),
    engineCheck(
      "iso13786-harmonic-amplitude",
      "|H₁| of hourly periodic Y versus |Y(iω)| sinc²(π/24) (+ aliases 24m+1), relative (floor 1e-6 U)",
      harmonic.amplitude,
      1e-3,
    ),
    engineCheck(
      "iso13786-harmonic-phase",
      "Phase of H₁ of hourly periodic Y versus arg Y(iω), h",
      harmonic.phaseH,
      0.01,
    ),
    engineCheck(
      "periodic-fold",
      "Closed-form periodic factors versus folded hourly response factors (plus their folded closed-form tail), max / U",
      periodicFoldError(hourly, periodic),
      1e-8,
    ),
    ...ss.checks,
  ];
  return { checks, methodNotes: [...air2.notes, ...surface2.notes, ...ss.notes] };
}
