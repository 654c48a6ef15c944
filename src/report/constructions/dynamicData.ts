/** Reads the dynamic fields of one construction's results.json entry, checking their shape once. */
import type { ConstructionDynamicJson } from "../../engine/mod.ts";
import type { ConstructionResults } from "../../results/types.ts";

/** The dynamic results of one construction as the package prints them, with U and the timestep. */
export interface DynamicView extends ConstructionDynamicJson {
  /** W/(m²·K), air to air */
  readonly U: number;
  /** h */
  readonly timestep_h: number;
}

type Json = Readonly<Record<string, unknown>>;

function isObject(value: unknown): value is Json {
  return typeof value === "object" && value !== null && !Array.isArray(value);
}

function isNumber(value: unknown): value is number {
  return typeof value === "number";
}

function isNumbers(value: unknown, length?: number): value is readonly number[] {
  return Array.isArray(value) && value.every(isNumber) && (length === undefined || value.length === length);
}

function isResponseFactors(value: unknown): boolean {
  return isObject(value) && isNumbers(value.X) && isNumbers(value.Y) && isNumbers(value.Z) &&
    isNumber(value.truncationResidual);
}

function isCtf(value: unknown): boolean {
  return value === null ||
    (isObject(value) && isNumbers(value.X) && isNumbers(value.Y) && isNumbers(value.Z) &&
      isNumbers(value.Phi));
}

function isPeriodicQuantity(value: unknown): boolean {
  return isObject(value) && isNumber(value.amplitude) && isNumber(value.timeShift_h);
}

function isDynamic(value: unknown): boolean {
  return isObject(value) && isNumber(value.decrementFactor) && isNumber(value.timeLag_h) &&
    isPeriodicQuantity(value.periodicTransmittance) && isPeriodicQuantity(value.admittanceInside) &&
    isPeriodicQuantity(value.admittanceOutside) && isNumber(value.arealHeatCapacityInside) &&
    isNumber(value.arealHeatCapacityOutside);
}

function isModalSeries(value: unknown): boolean {
  return isObject(value) && isNumber(value.rf0) && isNumber(value.rf1) && isNumbers(value.coefficients);
}

function isModal(value: unknown): boolean {
  return isObject(value) && isNumbers(value.ratios) && isModalSeries(value.X) && isModalSeries(value.Y) &&
    isModalSeries(value.Z);
}

function isStateSpaceCtf(value: unknown): boolean {
  return value === null || (isCtf(value) && isObject(value) && isNumbers(value.cellsPerLayer));
}

function isSurfaceToSurface(value: unknown): boolean {
  return isObject(value) && isNumber(value.U) && isResponseFactors(value.responseFactors) && isCtf(value.ctf);
}

/** The dynamic fields of a construction's results, or undefined when they are absent or malformed. */
export function readDynamic(results: ConstructionResults | undefined): DynamicView | undefined {
  if (results === undefined) return undefined;
  const r: Json = results;
  const poles = r.poles;
  const valid = isNumber(r.U) && isNumber(r.timestep_h) && isNumber(r.tau1_h) &&
    isResponseFactors(r.responseFactors) && isCtf(r.ctf) && isStateSpaceCtf(r.ctfStateSpace) &&
    isSurfaceToSurface(r.surfaceToSurface) && isNumbers(r.periodic, 24) && isNumbers(r.periodicX, 24) &&
    isNumbers(r.periodicZ, 24) && isNumbers(r.cts, 24) && isDynamic(r.dynamic) && isModal(r.modal) &&
    isObject(poles) && isNumber(poles.count) && isNumbers(poles.betas_per_h);
  return valid ? (results as unknown as DynamicView) : undefined;
}

/** Sum of a series, added in index order. */
export function seriesSum(values: readonly number[]): number {
  let sum = 0;
  for (const v of values) sum += v;
  return sum;
}

/** Running sums S_j = Σ_(k ≤ j) Y_k: the inside flux after a 1 K step of outside temperature at t = 0. */
export function stepResponse(crossFactors: readonly number[]): number[] {
  let sum = 0;
  return crossFactors.map((v) => (sum += v));
}
