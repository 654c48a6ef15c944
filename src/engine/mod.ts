/**
 * Dynamic conduction engine for layered walls and roofs: transmission matrices, poles, response factors,
 * CTFs (root and state-space routes), modal recursion, periodic response factors and ISO 13786 characteristics.
 * Pure functions of typed data.
 */
export type { ConstructionInput, Layer } from "./layer.ts";
export { type SteadyState, steadyState } from "./steady.ts";
export type { Unresolvable, UnresolvableReason } from "./engineError.ts";
export type { EngineCheck, MethodNote } from "./check.ts";
export {
  analyseConstruction,
  type AnalysisOptions,
  type DynamicAnalysis,
  isValidTimestep,
  type PeriodicFactors,
} from "./analyse.ts";
export {
  constructionChecksJson,
  type ConstructionDynamicJson,
  constructionDynamicJson,
  constructionMethodNotesJson,
} from "./resultsJson.ts";
export type { RootAnalysis } from "./rootAnalysis.ts";
export type { StateSpaceAnalysis } from "./stateSpaceAnalysis.ts";
export type { ResponseFactors } from "./responseFactors.ts";
export type { Ctf, CtfCandidate } from "./ctf.ts";
export { type FluxSeries, modalConvolve, type PulseModes } from "./pulseModes.ts";
export type { Iso13786Characteristics, PeriodicQuantity } from "./iso13786.ts";
export { type Complex } from "./complex.ts";
export { type ChainBoundary, type ConductionChain, conductionChain } from "./elements.ts";
export { scaledTransmission, transmission } from "./transmission.ts";
export { frequencyResponse, iso13786 } from "./iso13786.ts";
export { expm } from "./expm.ts";
export { type DenseMatrix, fromRows, toRows } from "./denseMatrix.ts";
