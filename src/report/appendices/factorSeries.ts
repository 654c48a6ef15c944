/**
 * Appendix D's full response-factor series: every term of X_j, Y_j, Z_j (air to air and surface to surface)
 * in a table shown on screen (expandable) and left off the printout, which gives the leading terms and names
 * where the rest is: csv/factors-<id>.csv and results.json (with its SHA-256).
 */
import type { DynamicView } from "../constructions/dynamicData.ts";
import { PRINTED_TERMS } from "../constructions/dynamicTables.ts";
import { type DisplayUnits, toDisplay, unitLabel } from "../page/displayUnits.ts";
import { formatSig, formatTrim } from "../page/format.ts";
import { html, type Trusted } from "../page/html.ts";

/** Significant figures of every term in the full series (the printed leading terms use 4). */
export const SERIES_DIGITS = 6;

interface Series {
  readonly X: readonly number[];
  readonly Y: readonly number[];
  readonly Z: readonly number[];
}

function seriesTable(rf: Series, timestep_h: number, caption: string, d: DisplayUnits): Trusted {
  const u = (si: number | undefined) =>
    si === undefined ? "" : formatSig(toDisplay(d, "transmittance", si), SERIES_DIGITS);
  const length = Math.max(rf.X.length, rf.Y.length, rf.Z.length);
  // One line per row, cells right-aligned by the table's class: the series are long (about 150 rows each).
  const cell = (text: string) => html`<td>${text}</td>`;
  const rows = Array.from({ length }, (_, j) => {
    const cells = [String(j), formatTrim(j * timestep_h, 4), u(rf.X[j]), u(rf.Y[j]), u(rf.Z[j])].map(cell);
    return html`<tr>${cells}</tr>\n`;
  });
  return html`
    <table class="factor-series">
      <caption>${caption} (${unitLabel(d, "transmittance")}), all ${String(length)} terms.</caption>
      <thead>
        <tr>
          <th>j</th>
          <th>jΔ h</th>
          <th>X_j (outside)</th>
          <th>Y_j (cross)</th>
          <th>Z_j (inside)</th>
        </tr>
      </thead>
      <tbody>${rows}</tbody>
    </table>
  `;
}

/** The slowest decay ratio per step of the modal form (largest q_n), or undefined without modes. */
function slowestRatio(view: DynamicView): number | undefined {
  const ratios = view.modal.ratios;
  return ratios.length === 0 ? undefined : Math.max(...ratios);
}

/**
 * Every term of both response-factor series on screen; on paper, the count of terms not printed, the modal-form
 * statement of the tail and where every term is.
 */
export function renderFactorSeries(
  constructionId: string,
  view: DynamicView,
  resultsSha256: string,
  d: DisplayUnits,
): Trusted {
  const rf = view.responseFactors;
  const s2s = view.surfaceToSurface.responseFactors;
  const printed = Math.min(PRINTED_TERMS, rf.Y.length);
  const q = slowestRatio(view);
  const tail = q === undefined ? html`` : html`
    Beyond RF₁ each series is the modal form of section 3 (${String(
      view.modal.ratios.length,
    )} modes, results.json <code>modal</code>): a sum of geometric terms, the slowest shrinking by the ratio ${formatSig(
      q,
      4,
    )} per step.
  `;
  return html`
    <p
      class="print-only factor-pointer">Printed: the first ${String(printed)} of ${String(
        rf.Y.length,
      )} terms per series; the further ${String(rf.Y.length - printed)} air-to-air terms and all ${String(
        s2s.Y.length,
      )} surface-to-surface terms are in the electronic package (this appendix, on screen), csv/factors-${constructionId}.csv and results.json <code>constructions</code> entry ${constructionId}, SHA-256 <span
        class="hash">${resultsSha256}</span> (Appendix B).${tail}</p>
    <details class="screen-only factor-series-all">
      <summary>Every response-factor term of ${constructionId}: ${String(rf.Y.length)} air to air, ${String(
        s2s.Y.length,
      )} surface to surface</summary>
      ${seriesTable(rf, view.timestep_h, `Response factors of ${constructionId}, air to air`, d)}
      ${seriesTable(s2s, view.timestep_h, `Response factors of ${constructionId}, surface to surface`, d)}
    </details>
  `;
}
