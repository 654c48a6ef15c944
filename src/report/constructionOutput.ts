/** The computed output shown after a construction block: layer table, R and U, checks, section drawing. */
import type { Construction, ResolvedLayer } from "../project/model.ts";
import type { CheckResult, ConstructionResults } from "../results/types.ts";
import { formatSig, formatTrim } from "./format.ts";
import { html, type Trusted } from "./html.ts";
import { renderDynamicResponse } from "./dynamicOutput.ts";
import { renderSectionSvg } from "./sectionSvg.ts";

const DASH = "—";

function layerCells(layer: ResolvedLayer): Trusted {
  if (layer.kind === "resistive") {
    return html`
      <td class="num">${DASH}</td>
      <td class="num">${DASH}</td>
      <td class="num">${DASH}</td>
      <td class="num">${DASH}</td>
    `;
  }
  return html`
    <td class="num">${formatTrim(layer.thicknessM * 1000, 4)}</td>
    <td class="num">${formatTrim(layer.conductivity, 4)}</td>
    <td class="num">${formatTrim(layer.density, 4)}</td>
    <td class="num">${formatTrim(layer.specificHeat, 4)}</td>
  `;
}

function layerRow(layer: ResolvedLayer, index: number, results: ConstructionResults | undefined): Trusted {
  const computed = results?.steady.layers[index];
  const r = computed === undefined ? DASH : formatSig(computed.R, 3);
  const kappa = computed === undefined
    ? DASH
    : computed.arealHeatCapacity === 0
    ? "0"
    : formatSig(computed.arealHeatCapacity / 1000, 3);
  const material = layer.materialId === undefined
    ? html`
      <span class="muted">(inline)</span>
    `
    : html`
      <span class="muted">(${layer.materialId})</span>
    `;
  return html`<tr><td class="num">${String(index + 1)}</td><td>${layer.name}${material}</td>${
    layerCells(layer)
  }<td class="num">${r}</td><td class="num">${kappa}</td></tr>`;
}

function surfaceRow(label: string, value: number, defaulted: boolean): Trusted {
  const basis = defaulted ? "(default, ISO 6946)" : "(given in the input)";
  return html`
    <tr>
      <td></td>
      <td>${label} <span class="muted">${basis}</span></td>
      <td class="num">${DASH}</td>
      <td class="num">${DASH}</td>
      <td class="num">${DASH}</td>
      <td class="num">${DASH}</td>
      <td class="num">${formatTrim(value, 4)}</td>
      <td class="num">0</td>
    </tr>
  `;
}

function totalRows(results: ConstructionResults | undefined): Trusted {
  if (results === undefined) {
    return html`
      <tr class="total">
        <td colspan="8" class="fail">Not computed: no results for this construction (see section 4).</td>
      </tr>
    `;
  }
  return html`
    <tr class="total">
      <td></td>
      <td>Total resistance R, air to air (m²·K/W)</td>
      <td colspan="4"></td>
      <td class="num">${formatSig(results.R, 3)}</td>
      <td class="num">${formatSig(results.steady.arealHeatCapacity / 1000, 3)}</td>
    </tr>
    <tr class="total">
      <td></td>
      <td>Thermal transmittance U = 1/R (W/(m²·K))</td>
      <td colspan="4"></td>
      <td class="num">${formatSig(results.U, 3)}</td>
      <td></td>
    </tr>
  `;
}

/** Tables the automated checks on one subject: id, what is checked, value, limit and PASS/FAIL. */
export function subjectChecks(checks: readonly CheckResult[], subject: string): Trusted {
  return checksTable(checks.filter((c) => c.subject === subject));
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
        <td>${c.description}</td>
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

/**
 * Renders the output of a construction block, reading R, U and the dynamic response from its results
 * entry; `anchor` is the block's fragment id, used to keep the plots' ids unique.
 */
export function renderConstructionOutput(
  construction: Construction,
  results: ConstructionResults | undefined,
  checks: readonly CheckResult[],
  anchor = "c-construction",
): Trusted {
  const countMismatch = results !== undefined && results.steady.layers.length !== construction.layers.length
    ? html`
      <p
        class="fail">The results list ${String(
          results.steady.layers.length,
        )} layers but the input has ${String(construction.layers.length)}: the table cannot be trusted.</p>
    `
    : html``;
  const uLine = results === undefined
    ? html``
    : html`<p><strong>U = ${formatSig(results.U, 3)} W/(m²·K)</strong> (R = ${
      formatSig(results.R, 3)
    } m²·K/W, heat flow ${construction.heatFlow})</p>`;
  return html`
    <table class="layer-table">
      <caption>Construction ${construction.id}: ${construction
        .name}. Layers listed from outside to inside.</caption>
      <thead>
        <tr>
          <th>No.</th>
          <th>Layer</th>
          <th>Thickness mm</th>
          <th>λ W/(m·K)</th>
          <th>ρ kg/m³</th>
          <th>c J/(kg·K)</th>
          <th>R m²·K/W</th>
          <th>Areal heat capacity kJ/(m²·K)</th>
        </tr>
      </thead>
      <tbody>
    ${surfaceRow(
      "Outside surface resistance R_se",
      results?.steady.outsideSurfaceResistance ?? construction.outsideResistance,
      construction.outsideResistanceDefaulted,
    )}
    ${construction.layers.map((layer, i) => layerRow(layer, i, results))}
    ${surfaceRow(
      "Inside surface resistance R_si",
      results?.steady.insideSurfaceResistance ?? construction.insideResistance,
      construction.insideResistanceDefaulted,
    )}
    ${totalRows(results)}
      </tbody>
    </table>
    ${countMismatch}
    ${uLine}
    <figure>${renderSectionSvg(construction)}<figcaption>Section of ${construction
      .id}, drawn from outside (left) to inside (right); numbers refer to the table above.</figcaption></figure>
    ${renderDynamicResponse(
      construction,
      results,
      checks,
      anchor,
      subjectChecks(checks, `construction:${construction.id}`),
    )}
  `;
}
