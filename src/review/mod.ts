/**
 * Plausibility review of a project: the checks a checking engineer runs on a colleague's assumptions.
 * Pure: it reads the model (and computed results, when given) and returns findings; it does no I/O.
 */

import { type Diagnostic, sortDiagnostics } from "../project/diagnostic.ts";
import type { Model } from "../project/model.ts";
import type { ResultsJson } from "../results/types.ts";
import { reviewConditions } from "./conditionRules.ts";
import { reviewElements } from "./elementRules.ts";
import { reviewLayers } from "./layerRules.ts";
import { reviewLimits } from "./limitRules.ts";
import { reviewMaterials } from "./materialRules.ts";
import { reviewOrder } from "./orderRules.ts";
import { reviewProvenance } from "./provenanceRules.ts";
import { reviewRooms } from "./roomRules.ts";
import { reviewScenarios } from "./scenarioRules.ts";

export { REVIEW_RULES, type ReviewRule } from "./catalogue.ts";
export { formatFinding, formatFindings } from "./format.ts";

/** Reviews a resolved project and returns its findings, sorted by file, line and column. */
export function reviewProject(model: Model, results?: ResultsJson): Diagnostic[] {
  const findings = [
    ...reviewMaterials(model),
    ...reviewLayers(model),
    ...reviewOrder(model),
    ...reviewProvenance(model, results),
    ...reviewScenarios(model, results),
    ...reviewConditions(model),
    ...reviewRooms(model),
    ...(results === undefined ? [] : reviewElements(model, results)),
    ...(results === undefined ? [] : reviewLimits(model, results)),
  ];
  return sortDiagnostics(findings);
}

/** Counts findings by severity, for a summary line or the package's checks table. */
export function countFindings(findings: readonly Diagnostic[]): Record<Diagnostic["severity"], number> {
  const counts = { error: 0, warning: 0, note: 0 };
  for (const f of findings) counts[f.severity]++;
  return counts;
}
