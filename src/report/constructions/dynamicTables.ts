/** Tables of a construction's dynamic response: summary, response factors, periodic factors and CTS. */
import type { DynamicView } from "./dynamicData.ts";
import { seriesSum } from "./dynamicData.ts";
import { type DisplayUnits, toDisplay, unitLabel } from "../page/displayUnits.ts";
import { formatFixed, formatSig, formatTrim } from "../page/format.ts";
import { html, type Trusted } from "../page/html.ts";

/** Response-factor terms printed in the table; the full series are in Appendix B. */
export const PRINTED_TERMS = 12;

type Row = readonly [quantity: string, symbol: string, value: string, unit: string];

function rowsOf(rows: readonly Row[], cls = ""): Trusted[] {
  return rows.map(([quantity, symbol, value, unit]) =>
    html`
      <tr class="${cls}">
        <td>${quantity}</td>
        <td>${symbol}</td>
        <td class="num">${value}</td>
        <td>${unit}</td>
      </tr>
    `
  );
}

function lagNote(view: DynamicView): Trusted {
  const lag = view.dynamic.timeLag_h;
  if (lag <= 12) return html``;
  return html`
    <p
      class="note">The time lag exceeds 12 h. ISO 13786 takes arg(Y12) as a principal value in (−12 h, 12 h], which for this construction would read +${formatSig(
        24 - lag,
        3,
      )} h; the unwrapped lag of ${formatSig(lag, 3)} h is the physical one and is printed above.</p>
  `;
}

/** Summary in the display units: U, τ1, poles, time step, response-factor terms and residual, ISO 13786 characteristics. */
export function dynamicSummaryTable(view: DynamicView, d: DisplayUnits): Trusted {
  const perDegree = unitLabel(d, "transmittance");
  const u = (si: number) => formatSig(toDisplay(d, "transmittance", si), 3);
  const kappa = (si: number) => formatSig(toDisplay(d, "arealHeatCapacity", si), 3);
  const betas = view.poles.betas_per_h;
  const range = betas.length === 0
    ? "none (no heat storage)"
    : `${formatSig(betas[0]!, 3)} to ${formatSig(betas[betas.length - 1]!, 3)} 1/h`;
  const iso13786 = view.dynamic;
  const method: Row[] = [
    ["Thermal transmittance, air to air", "U", u(view.U), perDegree],
    ["First time constant, 1/β₁", "τ₁", formatSig(view.tau1_h, 3), "h"],
    ["Poles used (zeros of B(s) at s = −β)", "N", String(view.poles.count), `β from ${range}`],
    ["Time step", "Δ", formatTrim(view.timestep_h, 4), "h"],
    ["Response-factor terms per series", "", String(view.responseFactors.Y.length), ""],
    [
      "Truncation residual, max |ΣRF − U| / U",
      "r",
      formatSig(view.responseFactors.truncationResidual, 2),
      "–",
    ],
  ];
  const iso: Row[] = [
    ["Periodic thermal transmittance", "|Y₁₂|", u(iso13786.periodicTransmittance.amplitude), perDegree],
    [
      "Time shift of Y₁₂ (− = lag, unwrapped)",
      "Δt₁₂",
      formatSig(iso13786.periodicTransmittance.timeShift_h, 3),
      "h",
    ],
    ["Decrement factor |Y₁₂| / U", "f", formatSig(iso13786.decrementFactor, 3), "–"],
    ["Time lag (unwrapped from ω → 0)", "φ", formatSig(iso13786.timeLag_h, 3), "h"],
    ["Inside admittance", "|Y₁₁|", u(iso13786.admittanceInside.amplitude), perDegree],
    ["Time shift of Y₁₁ (+ = lead)", "Δt₁₁", formatSig(iso13786.admittanceInside.timeShift_h, 3), "h"],
    ["Outside admittance", "|Y₂₂|", u(iso13786.admittanceOutside.amplitude), perDegree],
    [
      "Time shift of Y₂₂ (+ = lead)",
      "Δt₂₂",
      formatSig(iso13786.admittanceOutside.timeShift_h, 3),
      "h",
    ],
    [
      "Areal heat capacity, inside",
      "κ₁",
      kappa(iso13786.arealHeatCapacityInside),
      unitLabel(d, "arealHeatCapacity"),
    ],
    [
      "Areal heat capacity, outside",
      "κ₂",
      kappa(iso13786.arealHeatCapacityOutside),
      unitLabel(d, "arealHeatCapacity"),
    ],
  ];
  const head = html`
    <thead>
      <tr>
        <th>Quantity</th>
        <th>Symbol</th>
        <th>Value</th>
        <th>Unit / note</th>
      </tr>
    </thead>
  `;
  // Two tables side by side in print: transmittance, lag and inside capacity; then the admittances.
  return html`
    <p
      class="dynamic-summary-caption caption-like">Dynamic characteristics: ISO 13786:2017 at a period of 24 h, side 1 = inside, surface resistances included. On screen also the response-factor calculation (τ₁, poles, time step, terms, residual), as in results.json.</p>
    <div class="dynamic-summary-pair">
      <table
        class="dynamic-summary">${head}<tbody>${rowsOf(method.slice(0, 1))}${rowsOf(
          method.slice(1),
          "rf-detail screen-only",
        )}${rowsOf(iso.slice(0, 4), "group-start")}${rowsOf(iso.slice(8, 9))}</tbody></table>
      <table class="dynamic-summary">${head}<tbody>${rowsOf(iso.slice(4, 8))}${rowsOf(
        iso.slice(9),
      )}</tbody></table>
    </div>
    ${lagNote(view)}
  `;
}

/** The first twelve response factors X_j, Y_j, Z_j with time jΔ, their sums over all terms and U, in display units. */
export function responseFactorTable(view: DynamicView, d: DisplayUnits): Trusted {
  const rf = view.responseFactors;
  const u = (si: number, digits: number) => formatSig(toDisplay(d, "transmittance", si), digits);
  const count = Math.min(PRINTED_TERMS, rf.Y.length);
  const rows = Array.from({ length: count }, (_, j) =>
    html`
      <tr>
        <td class="num">${String(j)}</td>
        <td class="num">${formatTrim(j * view.timestep_h, 4)}</td>
        <td class="num">${u(rf.X[j] ?? NaN, 4)}</td>
        <td class="num">${u(rf.Y[j] ?? NaN, 4)}</td>
        <td class="num">${u(rf.Z[j] ?? NaN, 4)}</td>
      </tr>
    `);
  const more = rf.Y.length > count
    ? html`
      <tr>
        <td class="num">…</td>
        <td></td>
        <td></td>
        <td></td>
        <td></td>
      </tr>
    `
    : html``;
  return html`
    <table class="rf-table">
      <caption>Response factors, air to air, for a unit triangular temperature pulse of base 2Δ (${unitLabel(
        d,
        "transmittance",
      )}); index j is the value at jΔ after the pulse peak.</caption>
      <thead>
        <tr>
          <th>j</th>
          <th>jΔ h</th>
          <th>X_j (outside)</th>
          <th>Y_j (cross)</th>
          <th>Z_j (inside)</th>
        </tr>
      </thead>
      <tbody>${rows}${more}
        <tr class="total"><td colspan="2">Σ, all ${String(rf.Y.length)} terms</td><td class="num">${u(
          seriesSum(rf.X),
          6,
        )}</td><td class="num">${u(seriesSum(rf.Y), 6)}</td><td class="num">${u(
          seriesSum(rf.Z),
          6,
        )}</td></tr>
      </tbody>
    </table>
    <p
      class="muted">… ${String(rf.Y.length)} terms in all per series; Σ = U = ${u(
        view.U,
        6,
      )} ${unitLabel(d, "transmittance")} within the truncation residual ${formatSig(
        rf.truncationResidual,
        2,
      )} (relative); full series in Appendix B (responseFactors).</p>
  `;
}

/** The 24-hour periodic response factors Y_P, X_P, Z_P (display units) and the CTS, hours 0–11 beside 12–23. */
export function periodicTable(view: DynamicView, d: DisplayUnits): Trusted {
  const u = (si: number, digits: number) => formatSig(toDisplay(d, "transmittance", si), digits);
  const cell = (j: number) =>
    html`
      <td class="num">${String(j)}</td>
      <td class="num">${u(view.periodic[j] ?? NaN, 4)}</td>
      <td class="num">${u(view.periodicX[j] ?? NaN, 4)}</td>
      <td class="num">${u(view.periodicZ[j] ?? NaN, 4)}</td>
      <td class="num">${formatFixed((view.cts[j] ?? NaN) * 100, 2)}</td>
    `;
  const rows = Array.from({ length: 12 }, (_, j) => html`<tr>${cell(j)}${cell(j + 12)}</tr>`);
  const head = html`
    <th>j</th>
    <th>Y_P,j</th>
    <th>X_P,j</th>
    <th>Z_P,j</th>
    <th>CTS %</th>
  `;
  return html`
    <table class="periodic-table">
      <caption>24-hour periodic response factors at 1 h (${unitLabel(
        d,
        "transmittance",
      )}) and conduction time series (CTS = Y_P / U, %); hours 0–11 left, 12–23 right.</caption>
      <thead>
        <tr>${head}${head}</tr>
      </thead>
      <tbody>${rows}
        <tr class="total"><td colspan="5">Σ over 24 h: Y_P ${u(
          seriesSum(view.periodic),
          6,
        )}, CTS ${formatFixed(seriesSum(view.cts) * 100, 2)} %</td><td colspan="5">X_P ${u(
          seriesSum(view.periodicX),
          6,
        )}, Z_P ${u(seriesSum(view.periodicZ), 6)}</td></tr>
      </tbody>
    </table>
  `;
}
