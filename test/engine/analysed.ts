import { analyseConstruction, type ConstructionInput, type DynamicAnalysis } from "../../src/engine/mod.ts";

/** Analyses a construction at a time step (s), with the state-space cross-check unless told not to; throws if refused. */
export function analyse(c: ConstructionInput, timestepS: number, stateSpace = true): DynamicAnalysis {
  const a = analyseConstruction(c, timestepS, { stateSpace });
  if (a.kind !== "analysis") throw new Error(a.message);
  return a;
}

/** The checks of an analysis that failed, as "id = value > limit" (empty when all pass). */
export function failedChecks(a: DynamicAnalysis): string[] {
  return a.checks.filter((c) => !c.pass).map((c) => `${c.id} = ${c.value} > ${c.limit}`);
}
