/**
 * Where Appendix D's response-factor terms beyond the printed ones are: the package's embedded results write the
 * first `LEADING_TERMS` of each series and keep the modal form the rest expand from exactly (results/packageCopy.ts),
 * and results.json (named by its SHA-256) and csv/factors-<id>.csv beside the package hold every term. The terms
 * are not repeated as HTML tables: a heavy wall has about a thousand per series.
 */
import type { DynamicView } from "../constructions/dynamicData.ts";
import { PRINTED_TERMS } from "../constructions/dynamicTables.ts";
import { formatSig } from "../page/format.ts";
import { html, type Trusted } from "../page/html.ts";
import { LEADING_TERMS } from "../../results/packageCopy.ts";

/** The slowest decay ratio per step of the modal form (largest q_n), or undefined without modes. */
function slowestRatio(view: DynamicView): number | undefined {
  const ratios = view.modal.ratios;
  return ratios.length === 0 ? undefined : Math.max(...ratios);
}

/** The count of terms not printed, the modal-form statement of the tail and where every term is. */
export function renderFactorSeries(
  constructionId: string,
  view: DynamicView,
  resultsSha256: string,
): Trusted {
  const rf = view.responseFactors;
  const s2s = view.surfaceToSurface.responseFactors;
  const printed = Math.min(PRINTED_TERMS, rf.Y.length);
  const q = slowestRatio(view);
  const tail = q === undefined ? html`` : html`
    Beyond RF₁ each series is the modal form set out in the calculation methods (Appendix G; ${String(
      view.modal.ratios.length,
    )} modes, results.json <code>modal</code>): a sum of geometric terms, the slowest shrinking by the ratio ${formatSig(
      q,
      4,
    )} per step.
  `;
  return html`
    <p
      class="factor-pointer">Printed: the first ${String(printed)} of ${String(
        rf.Y.length,
      )} terms per series. Every term, air to air and all ${String(
        s2s.Y.length,
      )} surface to surface, is in csv/factors-${constructionId}.csv and in results.json <code>constructions</code> entry ${constructionId}, SHA-256 <span
      class="hash">${resultsSha256}</span>; the results embedded in this package (Appendix B) write the first ${String(
        LEADING_TERMS,
      )} of each series and the modal form the rest expand from exactly.${tail}</p>
  `;
}
