/** The computed output shown after a construction block: layer table, R and U, checks, section drawing. */
import type { Construction, ResolvedLayer } from "../../project/model.ts";
import type { CheckResult, ConstructionResults, MethodNoteResult } from "../../results/types.ts";
import { checksOfSubject } from "../page/checksBySubject.ts";
import {
  type DisplayUnits,
  formatThickness,
  siEquivalent,
  toDisplay,
  unitHead,
  unitLabel,
} from "../page/displayUnits.ts";
import { formatSig, formatTrim } from "../page/format.ts";
import { html, type Trusted } from "../page/html.ts";
import { quotedNumbers } from "../page/quotedText.ts";
import { renderDynamicResponse } from "./dynamicOutput.ts";
import { renderSectionSvg } from "./drawing/sectionSvg.ts";
import { bridgedLayerLabel, bridgedLayerName, renderBridgedOutput } from "./bridgedOutput.ts";
import { renderLimitsOutput } from "./limitsOutput.ts";

const DASH = "—";

function layerCells(layer: ResolvedLayer, d: DisplayUnits): Trusted {
  if (layer.kind === "resistive") {
    return html`
      <td class="num">${DASH}</td>
      <td class="num">${DASH}</td>
      <td class="num">${DASH}</td>
      <td class="num">${DASH}</td>
    `;
  }
  return html`
    <td class="num thickness">${formatThickness(d, layer.thicknessM)}</td>
    <td class="num">${formatTrim(toDisplay(d, "conductivity", layer.conductivity), 3)}</td>
    <td class="num">${formatTrim(toDisplay(d, "density", layer.density), 3)}</td>
    <td class="num">${formatTrim(toDisplay(d, "specificHeat", layer.specificHeat), 3)}</td>
  `;
}

function layerRow(
  layer: ResolvedLayer,
  index: number,
  results: ConstructionResults | undefined,
  d: DisplayUnits,
): Trusted {
  const computed = results?.steady.layers[index];
  const r = computed === undefined ? DASH : formatSig(toDisplay(d, "resistance", computed.R), 3);
  const kappa = computed === undefined
    ? DASH
    : computed.arealHeatCapacity === 0
    ? "0"
    : formatSig(toDisplay(d, "arealHeatCapacity", computed.arealHeatCapacity), 3);
  const material = bridgedLayerLabel(layer) ?? (layer.materialId === undefined
    ? html`
      <span class="muted">(inline)</span>
    `
    : html`
      <span class="muted">(${layer.materialId})</span>
    `);
  return html`<tr><td class="num">${String(index + 1)}</td><td>${
    bridgedLayerName(layer) ?? layer.name
  }${material}</td>${layerCells(layer, d)}<td class="num">${r}</td><td class="num">${kappa}</td></tr>`;
}

function surfaceRow(label: string, value: number, defaulted: boolean, d: DisplayUnits): Trusted {
  const basis = defaulted ? "(default, ISO 6946)" : "(given in the input)";
  return html`
    <tr>
      <td></td>
      <td>${label} <span class="muted">${basis}</span></td>
      <td class="num">${DASH}</td>
      <td class="num">${DASH}</td>
      <td class="num">${DASH}</td>
      <td class="num">${DASH}</td>
      <td class="num">${formatTrim(toDisplay(d, "resistance", value), 3)}</td>
      <td class="num">0</td>
    </tr>
  `;
}

function totalRows(results: ConstructionResults | undefined, d: DisplayUnits): Trusted {
  if (results === undefined) {
    return html`
      <tr class="total">
        <td colspan="8" class="fail">Not computed: no results for this construction (see checks and findings).</td>
      </tr>
    `;
  }
  return html`
    <tr class="total">
      <td></td>
      <td>Total resistance R, air to air (${unitLabel(d, "resistance")})</td>
      <td colspan="4"></td>
      <td class="num">${formatSig(toDisplay(d, "resistance", results.R), 3)}${siEquivalent(
        d,
        "resistance",
        results.R,
        (v) => formatSig(v, 3),
        true,
      )}</td>
      <td class="num">${formatSig(
        toDisplay(d, "arealHeatCapacity", results.steady.arealHeatCapacity),
        3,
      )}</td>
    </tr>
    <tr class="total">
      <td></td>
      <td>Thermal transmittance U = 1/R (${unitLabel(d, "transmittance")})</td>
      <td colspan="4"></td>
      <td class="num">${formatSig(toDisplay(d, "transmittance", results.U), 3)}${siEquivalent(
        d,
        "transmittance",
        results.U,
        (v) => formatSig(v, 3),
        true,
      )}</td>
      <td></td>
    </tr>
  `;
}

/** Tables the automated checks on one subject: id, what is checked, value, limit and PASS/FAIL. */
export function subjectChecks(checks: readonly CheckResult[], subject: string): Trusted {
  return checksTable(checksOfSubject(checks, subject));
}

/**
 * Tables the given checks (nothing when the list is empty); with `subjectLabel`, a first column names each
 * check's subject under the heading `subjectHeading`.
 */
export function checksTable(
  mine: readonly CheckResult[],
  subjectLabel?: (check: CheckResult) => string,
  subjectHeading = "Subject",
): Trusted {
  if (mine.length === 0) return html``;
  const rows = mine.map((c) =>
    html`
      <tr class="${c.pass ? "pass" : "fail"}">
        <td class="result">${c.pass ? "PASS" : "FAIL"}</td>
        ${subjectLabel === undefined ? html`` : html`<td>${subjectLabel(c)}</td>`}
        <td><code>${c.id}</code></td>
        <td>${quotedNumbers(c.description)}</td>
        <td class="num">${formatSig(c.value, 3)}</td>
        <td class="num">${formatSig(c.limit, 3)}</td>
      </tr>
    `
  );
  return html`
    <table class="subject-checks">
      <thead>
        <tr>
          <th>Result</th>
          ${subjectLabel === undefined ? html`` : html`<th>${subjectHeading}</th>`}
          <th>Check</th>
          <th>What is checked</th>
          <th>Value</th>
          <th>Limit</th>
        </tr>
      </thead>
      <tbody>${rows}</tbody>
    </table>
  `;
}

function uLine(
  construction: Construction,
  results: ConstructionResults | undefined,
  d: DisplayUnits,
): Trusted {
  if (results === undefined) return html``;
  const sig3 = (v: number) => formatSig(v, 3);
  return html`<p><strong>U = ${formatSig(toDisplay(d, "transmittance", results.U), 3)} ${
    unitLabel(d, "transmittance")
  }</strong>${siEquivalent(d, "transmittance", results.U, sig3)} (R = ${
    formatSig(toDisplay(d, "resistance", results.R), 3)
  } ${unitLabel(d, "resistance")}${
    siEquivalent(d, "resistance", results.R, sig3)
  }, heat flow ${construction.heatFlow})</p>`;
}

/**
 * Renders the output of a construction block, reading R, U and the dynamic response from its results
 * entry, in the display units `d`; `anchor` is the block's fragment id, used to keep the plots' ids unique.
 */
export function renderConstructionOutput(
  construction: Construction,
  results: ConstructionResults | undefined,
  checks: readonly CheckResult[],
  anchor: string,
  d: DisplayUnits,
  compact = false,
  notes: readonly MethodNoteResult[] = [],
): Trusted {
  const countMismatch = results !== undefined && results.steady.layers.length !== construction.layers.length
    ? html`
      <p
        class="fail">The results list ${String(
          results.steady.layers.length,
        )} layers but the input has ${String(construction.layers.length)}: the table cannot be trusted.</p>
    `
    : html``;
  return html`
    <table class="layer-table">
      <caption>Construction ${construction.id}: ${construction
        .name}. Layers listed from outside to inside.</caption>
      <thead>
        <tr>
          <th>No.</th>
          <th>Layer</th>
          <th>Thickness ${unitHead(d, "thickness")}</th>
          <th>λ ${unitHead(d, "conductivity")}</th>
          <th>ρ ${unitHead(d, "density")}</th>
          <th>c ${unitHead(d, "specificHeat")}</th>
          <th>R ${unitHead(d, "resistance")}</th>
          <th>ρ·c·d, heat capacity per area (total row: Σ ρ·c·d) ${unitHead(d, "arealHeatCapacity")}</th>
        </tr>
      </thead>
      <tbody>
    ${surfaceRow(
      "Outside surface resistance R_se",
      results?.steady.outsideSurfaceResistance ?? construction.outsideResistance,
      construction.outsideResistanceDefaulted,
      d,
    )}
    ${construction.layers.map((layer, i) => layerRow(layer, i, results, d))}
    ${surfaceRow(
      "Inside surface resistance R_si",
      results?.steady.insideSurfaceResistance ?? construction.insideResistance,
      construction.insideResistanceDefaulted,
      d,
    )}
    ${totalRows(results, d)}
      </tbody>
    </table>
    ${countMismatch}${renderBridgedOutput(results, d)}
    ${uLine(construction, results, d)}${renderLimitsOutput(results, d)}
    <figure>${renderSectionSvg(construction, d)}<figcaption>Section of ${construction
      .id}, drawn from outside (${construction.heatFlow === "horizontal"
      ? "left"
      : "top"}) to inside (${construction.heatFlow === "horizontal"
      ? "right"
      : "bottom"}); numbers refer to the table above.</figcaption></figure>
    ${renderDynamicResponse(
      construction,
      results,
      notes,
      anchor,
      bodyChecks(checks, `construction:${construction.id}`),
      d,
      compact,
    )}
  `;
}

/**
 * The body's line on a subject's numerical checks: failures tabled beside their values, then
 * "N numerical checks passed (Appendix C)"; nothing when the subject has no check.
 */
export function bodyChecks(checks: readonly CheckResult[], subject: string): Trusted {
  const own = checksOfSubject(checks, subject);
  if (own.length === 0) return html``;
  const failed = own.filter((c) => !c.pass);
  const passed = own.length - failed.length;
  return failed.length === 0
    ? html`<p class="pass checks-line">${
      String(passed)
    } numerical checks passed (<a href="#s-c">Appendix C</a>).</p>`
    : html`
      ${checksTable(failed)}<p
        class="checks-line">${String(passed)} of ${String(
          own.length,
        )} numerical checks passed (<a href="#s-c">Appendix C</a>); the ${String(
          failed.length,
        )} failed above.</p>
    `;
}
