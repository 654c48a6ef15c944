import type { DynamicAnalysis } from "./analyse.ts";
import type { Ctf } from "./ctf.ts";
import type { PeriodicQuantity } from "./iso13786.ts";
import type { PulseModes } from "./pulseModes.ts";
import type { ResponseFactors } from "./responseFactors.ts";
import type { RootAnalysis } from "./rootAnalysis.ts";

/** results.json response-factor block (DESIGN.md §4). */
export interface ResponseFactorsJson {
  readonly X: readonly number[];
  readonly Y: readonly number[];
  readonly Z: readonly number[];
  readonly truncationResidual: number;
}

/** results.json CTF block: coefficients X, Y, Z and Φ_1 … Φ_N. */
export interface CtfJson {
  readonly X: readonly number[];
  readonly Y: readonly number[];
  readonly Z: readonly number[];
  readonly Phi: readonly number[];
}

/** Modal form (extension key): q_n and, per series, RF_0, RF_1 and the coefficients c_n. */
export interface ModalJson {
  readonly ratios: readonly number[];
  readonly X: { readonly rf0: number; readonly rf1: number; readonly coefficients: readonly number[] };
  readonly Y: { readonly rf0: number; readonly rf1: number; readonly coefficients: readonly number[] };
  readonly Z: { readonly rf0: number; readonly rf1: number; readonly coefficients: readonly number[] };
}

/** The dynamic fields of `constructions.<id>` in results.json, named as DESIGN.md §4 names them. */
export interface ConstructionDynamicJson {
  readonly tau1_h: number;
  readonly responseFactors: ResponseFactorsJson;
  readonly ctf: CtfJson | null;
  readonly ctfStateSpace: (CtfJson & { readonly cellsPerLayer: readonly number[] }) | null;
  readonly surfaceToSurface: {
    readonly U: number;
    readonly responseFactors: ResponseFactorsJson;
    readonly ctf: CtfJson | null;
    /** Extension: modal form of the surface-to-surface response (its series are this form expanded). */
    readonly modal: ModalJson;
  };
  readonly periodic: readonly number[];
  readonly periodicX: readonly number[];
  readonly periodicZ: readonly number[];
  readonly cts: readonly number[];
  readonly dynamic: {
    readonly decrementFactor: number;
    readonly timeLag_h: number;
    readonly periodicTransmittance: PeriodicQuantity;
    readonly admittanceInside: PeriodicQuantity;
    readonly admittanceOutside: PeriodicQuantity;
    readonly arealHeatCapacityInside: number;
    readonly arealHeatCapacityOutside: number;
  };
  /** Extension: modal form of the air-to-air response, the recursion to use when `ctf` is null. */
  readonly modal: ModalJson;
  /** Extension: number of poles used and the timestep the factors are for. */
  readonly poles: { readonly count: number; readonly betas_per_h: readonly number[] };
}

function rfJson(rf: ResponseFactors): ResponseFactorsJson {
  return { X: rf.X, Y: rf.Y, Z: rf.Z, truncationResidual: rf.truncationResidual };
}

function ctfJson(ctf: Ctf): CtfJson {
  return { X: ctf.X, Y: ctf.Y, Z: ctf.Z, Phi: ctf.Phi };
}

function rootCtf(root: RootAnalysis): CtfJson | null {
  return root.ctfAccepted ? ctfJson(root.ctfCandidate.ctf) : null;
}

function modalSeries(m: PulseModes) {
  return { rf0: m.rf0, rf1: m.rf1, coefficients: m.coefficients };
}

function modalJson(modes: RootAnalysis["modes"]): ModalJson {
  return {
    ratios: modes.Y.ratios,
    X: modalSeries(modes.X),
    Y: modalSeries(modes.Y),
    Z: modalSeries(modes.Z),
  };
}

/** Produces the results.json dynamic fields of one construction from its analysis. */
export function constructionDynamicJson(analysis: DynamicAnalysis): ConstructionDynamicJson {
  const air = analysis.airToAir;
  const ss = analysis.stateSpace;
  const iso = analysis.iso13786;
  return {
    tau1_h: air.tau1H,
    responseFactors: rfJson(air.responseFactors),
    ctf: rootCtf(air),
    ctfStateSpace: ss !== null && ss.ctfAccepted && analysis.cellsPerLayer !== null
      ? { ...ctfJson(ss.ctfCandidate.ctf), cellsPerLayer: analysis.cellsPerLayer }
      : null,
    surfaceToSurface: {
      U: analysis.surfaceToSurface.uValue,
      responseFactors: rfJson(analysis.surfaceToSurface.responseFactors),
      ctf: rootCtf(analysis.surfaceToSurface),
      modal: modalJson(analysis.surfaceToSurface.modes),
    },
    periodic: analysis.periodic.Y,
    periodicX: analysis.periodic.X,
    periodicZ: analysis.periodic.Z,
    cts: analysis.periodic.cts,
    dynamic: {
      decrementFactor: iso.decrementFactor,
      timeLag_h: iso.timeLag_h,
      periodicTransmittance: iso.periodicTransmittance,
      admittanceInside: iso.admittanceInside,
      admittanceOutside: iso.admittanceOutside,
      arealHeatCapacityInside: iso.arealHeatCapacityInside,
      arealHeatCapacityOutside: iso.arealHeatCapacityOutside,
    },
    modal: modalJson(air.modes),
    poles: { count: air.poles.betas.length, betas_per_h: air.poles.betas.map((b) => b * 3600) },
  };
}

/** The construction's checks as results.json `checks` entries with subject `construction:<id>`. */
export function constructionChecksJson(constructionId: string, analysis: DynamicAnalysis) {
  return analysis.checks.map((c) => ({
    id: c.id,
    subject: `construction:${constructionId}`,
    description: c.description,
    value: c.value,
    limit: c.limit,
    pass: c.pass,
  }));
}

/** The construction's method notes as results.json `methodNotes` entries with subject `construction:<id>`. */
export function constructionMethodNotesJson(constructionId: string, analysis: DynamicAnalysis) {
  return analysis.methodNotes.map((n) => ({
    id: n.id,
    subject: `construction:${constructionId}`,
    text: n.text,
    figures: n.figures.map((f) => ({ id: f.id, description: f.description, value: f.value, limit: f.limit })),
  }));
}
