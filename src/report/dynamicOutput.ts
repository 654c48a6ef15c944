/** The "Dynamic response" part after a construction's steady-state output: tables, CTFs, plots and checks. */
import type { Construction } from "../project/model.ts";
import type { ConstructionResults, MethodNoteResult } from "../results/types.ts";
import { COMPACT_ABOVE_CONSTRUCTIONS } from "./compact.ts";
import { ctfSection } from "./ctfTables.ts";
import { type DynamicView, readDynamic, seriesSum, stepResponse } from "./dynamicData.ts";
import { ctsPlot, RESPONSE_FACTOR_WINDOW_H, responseFactorPlot, stepResponsePlot } from "./dynamicPlots.ts";
import { dynamicSummaryTable, periodicTable, responseFactorTable } from "./dynamicTables.ts";
import { type DisplayUnits, toDisplay, unitLabel } from "./displayUnits.ts";
import { formatFixed, formatSig } from "./format.ts";
import { html, type Trusted } from "./html.ts";

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
        ? "not published, modal form used (method note ctf-modal-form-surface, section 4)"
        : "accepted"}; series in Appendix B.</p>
  `;
}

/**
 * Renders the dynamic response of one construction from its results.json entry in the display units `d`;
 * `notes` are results.json `methodNotes` (why a polynomial CTF is not published), `anchor` prefixes the plots'
 * ids, `checksList` is the construction's list of checks, shown at the end.
 */
export function renderDynamicResponse(
  construction: Construction,
  results: ConstructionResults | undefined,
  notes: readonly MethodNoteResult[],
  anchor: string,
  checksList: Trusted,
  d: DisplayUnits,
  compact = false,
): Trusted {
  const view = readDynamic(results);
  const subject = `construction:${construction.id}`;
  const body = view === undefined
    ? html`<p class="fail">No dynamic results: results.json holds no complete dynamic entry for ${construction.id}.</p>`
    : compact
    ? html`
      ${dynamicSummaryTable(view, d)}
      <p
        class="muted">A large project (more than ${String(
          COMPACT_ABOVE_CONSTRUCTIONS,
        )} constructions): the response factors, CTF coefficients, periodic factors and plots of ${construction
          .id} are in results.json (Appendix B) and csv/factors-${construction.id}.csv.</p>
    `
    : html`
      ${dynamicSummaryTable(view, d)}
      <h5>Response factors</h5>
      ${responseFactorTable(view, d)}
      ${surfaceLine(view, d)}
      <h5>Conduction transfer functions</h5>
      ${ctfSection(view, notes, subject, d)}
      <h5>Periodic response factors and conduction time series</h5>
      ${periodicTable(view, d)}
      ${plots(construction, view, `${anchor}-fig`, d)}
    `;
  return html`
    <div class="dynamic-response">
      <h4 class="output-heading">Dynamic response of ${construction.id}</h4>
      <p class="muted">Numbers as in results.json <code>constructions</code> entry for ${construction
        .id} (Appendix B); method in section 3.</p>
      ${body}
      <h5>Checks on ${construction.id}</h5>
      ${checksList.markup === ""
        ? html`<p>No automated check is recorded for this construction.</p>`
        : checksList}
    </div>
  `;
}
