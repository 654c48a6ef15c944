/** The "Dynamic response" after a construction's steady-state output (summary and checks line) and its factors for Appendix D. */
import type { Construction } from "../../project/model.ts";
import type { ConstructionResults, MethodNoteResult } from "../../results/types.ts";
import { COMPACT_ABOVE_CONSTRUCTIONS } from "../page/compact.ts";
import { ctfSection } from "./ctfTables.ts";
import { type DynamicView, readDynamic, seriesSum, stepResponse } from "./dynamicData.ts";
import { ctsPlot, RESPONSE_FACTOR_WINDOW_H, responseFactorPlot, stepResponsePlot } from "./dynamicPlots.ts";
import { dynamicSummaryTable, periodicTable, responseFactorTable } from "./dynamicTables.ts";
import { type DisplayUnits, toDisplay, unitLabel } from "../page/displayUnits.ts";
import { formatFixed, formatSig } from "../page/format.ts";
import { html, type Trusted } from "../page/html.ts";

function figure(svg: Trusted, title: string, caption: Trusted): Trusted {
  return html`
    <figure
      class="plot-figure">${svg}<figcaption><strong>${title}</strong> ${caption}</figcaption></figure>
  `;
}

function plots(construction: Construction, view: DynamicView, prefix: string, d: DisplayUnits): Trusted {
  const steps = stepResponse(view.responseFactors.Y);
  const last = toDisplay(d, "transmittance", steps[steps.length - 1] ?? NaN);
  const perDegree = unitLabel(d, "transmittance");
  return html`
    ${figure(
      responseFactorPlot(view, prefix, d),
      `Response factors of ${construction.id}, first ${String(RESPONSE_FACTOR_WINDOW_H)} h.`,
      html`Each line is named at its end: X_j outside, Y_j cross, Z_j inside. Linear vertical scale: X₀ and Z₀ reach far above the later terms, which the table in Appendix B lists. ${construction.name}.`,
    )}
    ${figure(
      ctsPlot(view, prefix),
      `Conduction time series of ${construction.id}.`,
      html`Share of a day's conduction heat gain reaching the inside j hours after it is driven at the outside; the 24 bars sum to ${
        formatFixed(seriesSum(view.cts) * 100, 2)
      } %. ${construction.name}.`,
    )}
    ${figure(
      stepResponsePlot(view, prefix, d),
      `Step response of ${construction.id}.`,
      html`Inside heat flux after a 1 ${
        unitLabel(d, "temperatureDifference")
      } step of outside temperature at t = 0 (running sum of Y_j, inputs linear between samples); dashed line U. Sum of all ${
        String(steps.length)
      } terms: ${formatSig(last, 6)} ${perDegree}. ${construction.name}.`,
    )}
  `;
}

function surfaceLine(view: DynamicView, d: DisplayUnits): Trusted {
  const s = view.surfaceToSurface;
  return html`
    <p
      class="muted">Surface to surface (no surface resistances, for heat-balance use): U_s = ${formatSig(
        toDisplay(d, "transmittance", s.U),
        3,
      )} ${unitLabel(d, "transmittance")}, ${String(
        s.responseFactors.Y.length,
      )} response-factor terms, truncation residual ${formatSig(
        s.responseFactors.truncationResidual,
        2,
      )}, polynomial CTF ${s.ctf === null
        ? "not published, modal form used (method note ctf-modal-form-surface, checks and findings)"
        : "accepted"}; series in Appendix B.</p>
  `;
}

/**
 * Renders the dynamic response of one construction from its results.json entry in the display units `d`;
 * `_notes` (results.json `methodNotes`) are read by its factors in Appendix D, not here; `anchor` names the
 * construction's Appendix D part, `checksList` is the construction's checks line, shown at the end.
 */
export function renderDynamicResponse(
  construction: Construction,
  results: ConstructionResults | undefined,
  _notes: readonly MethodNoteResult[],
  anchor: string,
  checksList: Trusted,
  d: DisplayUnits,
  compact = false,
): Trusted {
  const view = readDynamic(results);
  const body = view === undefined
    ? html`<p class="fail">No dynamic results: results.json holds no complete dynamic entry for ${construction.id}.</p>`
    : compact
    ? html`
      ${dynamicSummaryTable(view, d)}
      <p
        class="muted">Numbers as in results.json <code>constructions</code> entry for ${construction
          .id} (Appendix B); method in Appendix G. A large project (more than ${String(
            COMPACT_ABOVE_CONSTRUCTIONS,
          )} constructions): the response factors, CTF coefficients, periodic factors and plots of ${construction
          .id} are in results.json (Appendix B) and csv/factors-${construction.id}.csv.</p>
    `
    : html`
      ${dynamicSummaryTable(view, d)}
      <p
        class="muted">Numbers as in results.json <code>constructions</code> entry for ${construction
          .id} (Appendix B); method in Appendix G. Response factors, conduction transfer functions, periodic factors and plots: <a href="#d-${anchor}">Appendix D</a> (leading terms; every term in results.json and csv/factors-${construction
          .id}.csv).</p>
    `;
  return html`
    <div class="dynamic-response">
      <h4 class="output-heading">Dynamic response of ${construction.id}</h4>
      ${body}
      ${checksList.markup === ""
        ? html`<p>No automated check is recorded for this construction.</p>`
        : checksList}
    </div>
  `;
}

/**
 * Renders the factor tables of one construction for Appendix D: response factors (leading terms), the
 * surface-to-surface line, both CTFs, periodic factors and the plots; nothing without dynamic results.
 */
export function renderDynamicFactors(
  construction: Construction,
  results: ConstructionResults | undefined,
  notes: readonly MethodNoteResult[],
  anchor: string,
  d: DisplayUnits,
): Trusted {
  const view = readDynamic(results);
  if (view === undefined) {
    return html`<p class="fail">No dynamic results: results.json holds no complete dynamic entry for ${construction.id}.</p>`;
  }
  const subject = `construction:${construction.id}`;
  return html`
    <h4>Response factors</h4>
    ${responseFactorTable(view, d)}
    ${surfaceLine(view, d)}
    <h4>Conduction transfer functions</h4>
    ${ctfSection(view, notes, subject, d)}
    <h4>Periodic response factors and conduction time series</h4>
    ${periodicTable(view, d)}
    ${plots(construction, view, `${anchor}-fig`, d)}
  `;
}
