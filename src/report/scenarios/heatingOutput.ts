/** The computed output of a heating scenario: design heat loss and the ISO 13788 surface checks per surface. */
import type { HeatingScenario } from "../../project/model.ts";
import type { HeatingResults, Verdict } from "../../scenarios/heatingTypes.ts";
import { type DisplayUnits, toDisplay, unitBreakable, unitHead, unitLabel } from "../page/displayUnits.ts";
import { DELTA_F_PER_K } from "../page/displayUnits.ts";
import { formatFixed, formatSig } from "../page/format.ts";
import { heatingAnchor } from "../page/anchors.ts";
import { html, type Trusted } from "../page/html.ts";
import { PA_PER_IN_HG, quotedNumbers } from "../page/quotedText.ts";
import type { RenderContext } from "../page/packageInput.ts";

/** What the heating output reads: the block's scenario, its `heating.<id>` entry, anchor and display units. */
export interface HeatingOutputInput {
  readonly scenario: HeatingScenario;
  readonly results: HeatingResults | undefined;
  readonly anchor: string;
  readonly display: DisplayUnits;
}

function verdictCell(v: Verdict, q: string, failText: string): Trusted {
  return v.pass
    ? html`<td class="pass" data-q="${q}">pass</td>`
    : html`<td class="fail" data-q="${q}">${failText}</td>`;
}

/** A vapour pressure in Pa, or in in. Hg in IP (ASHRAE's inch-pound unit for vapour pressure, from memory). */
function vapourPressureText(pa: number, d: DisplayUnits): string {
  return d.system === "SI" ? `${formatFixed(pa, 0)} Pa` : `${formatSig(pa / PA_PER_IN_HG, 3)} in. Hg`;
}

function conditions(r: HeatingResults, d: DisplayUnits): Trusted {
  const t = (c: number) => `${formatFixed(toDisplay(d, "temperature", c), 1)} ${unitLabel(d, "temperature")}`;
  return html`
    <table class="conditions heating-conditions">
      <caption>Design condition and ISO 13788 limits</caption>
      <tbody>
        <tr>
          <th scope="row">Indoor air θ<sub>i</sub></th>
          <td>${t(r.indoor)}</td>
        </tr>
        <tr>
          <th scope="row">Outdoor design θ<sub>e</sub></th>
          <td>${t(r.outdoor)}</td>
        </tr>
        <tr>
          <th scope="row">Indoor relative humidity φ<sub>i</sub></th>
          <td>${formatFixed(r.indoorRelativeHumidity * 100, 0)} %</td>
        </tr>
        <tr>
          <th scope="row">Indoor vapour pressure p<sub>i</sub></th>
          <td data-q="vapour-pressure">${vapourPressureText(r.indoorVapourPressure, d)}</td>
        </tr>
        <tr>
          <th scope="row">Indoor dew point θ<sub>dew</sub></th>
          <td data-q="dew-point">${t(r.indoorDewPoint)}</td>
        </tr>
        <tr>
          <th scope="row">Surface relative humidity limit (mould)</th>
          <td>${formatFixed(r.mouldCriterion.surfaceRelativeHumidity * 100, 0)} %</td>
        </tr>
        <tr>
          <th scope="row">Lowest acceptable surface temperature θ<sub>si,min</sub></th>
          <td>${t(r.mouldCriterion.minimumSurfaceTemperature)}</td>
        </tr>
        <tr>
          <th scope="row">f<sub>Rsi,min</sub></th>
          <td data-q="frsi-min">${formatFixed(r.mouldCriterion.fRsiMin, 3)}</td>
        </tr>
      </tbody>
    </table>
  `;
}

/** The R_si of the f_Rsi column under its head, with the unit on its own line so that the column stays narrow. */
function rsiHead(r: HeatingResults, d: DisplayUnits): Trusted {
  const rsi = Object.values(r.surfaces)[0]?.moistureSurfaceResistance;
  if (rsi === undefined) return html``;
  const value = formatSig(toDisplay(d, "resistance", rsi), 3);
  const unit = unitBreakable(d, "resistance");
  return html`<span class="unit">(R_si = ${value} ${unit})</span>`;
}

function surfaceTable(id: string, r: HeatingResults, d: DisplayUnits): Trusted {
  const t = (c: number) => formatFixed(toDisplay(d, "temperature", c), 1);
  const w = (v: number) => formatFixed(toDisplay(d, "heatGain", v), 0);
  const rows = Object.entries(r.surfaces).map(([sid, s]) =>
    html`
      <tr><th scope="row">${sid}</th><td>${s.construction}</td><td class="num" data-q="u">${formatSig(
        toDisplay(d, "transmittance", s.U),
        3,
      )}</td><td class="num" data-q="u-c">${formatSig(
        toDisplay(d, "transmittance", s.correctedU ?? s.U),
        3,
      )}</td><td class="num" data-q="area">${formatSig(
        toDisplay(d, "area", s.area),
        3,
      )}</td><td class="num" data-q="loss">${w(s.heatLoss)}</td><td class="num" data-q="theta-si">${t(
        s.insideSurfaceTemperature,
      )}</td><td class="num" data-q="frsi">${formatFixed(s.fRsi, 3)}</td><td class="num">${formatFixed(
        s.fRsiMin,
        3,
      )}</td><td class="num">${t(s.dewPoint)}</td>${verdictCell(
        s.surfaceCondensation,
        "condensation",
        "condensation",
      )}${verdictCell(s.mould, "mould", "mould risk")}</tr>
    `
  );
  return html`
    <table class="heating-surfaces compact">
      <caption>Scenario ${id}: steady heat loss U<sub>c</sub>·A·(θ<sub>i</sub> − θ<sub>e</sub>) (U<sub>c</sub> = U + ΔU of the corrections given) and ISO 13788 surface checks per surface.</caption>
      <thead>
        <tr>
          <th>Surface</th>
          <th>Con&shy;struc&shy;tion</th>
          <th>U ${unitHead(d, "transmittance")}</th>
          <th>U<sub>c</sub> ${unitHead(d, "transmittance")}</th>
          <th>Area ${unitHead(d, "area")}</th>
          <th>Heat loss ${unitHead(d, "heatGain")}</th>
          <th>θ<sub>si</sub> ${unitHead(d, "temperature")}</th>
          <th>f<sub>Rsi</sub> ${rsiHead(r, d)}</th>
          <th>f<sub>Rsi,min</sub></th>
          <th>Dew point ${unitHead(d, "temperature")}</th>
          <th>Surface conden&shy;sation</th>
          <th>Mould</th>
        </tr>
      </thead>
      <tbody>${rows}
        <tr class="total-row"><th scope="row">Total</th><td></td><td></td><td></td><td class="num">${formatSig(
          toDisplay(d, "area", Object.values(r.surfaces).reduce((a, s) => a + s.area, 0)),
          3,
        )}</td><td class="num" data-q="total-loss">${w(r.totalHeatLoss)}</td><td colspan="6"></td></tr>
      </tbody>
    </table>
  `;
}

/** Renders a heating scenario's output from its results.json entry; missing results give a plain failure note. */
export function renderHeatingOutput(input: HeatingOutputInput): Trusted {
  const { scenario, results: r, anchor, display: d } = input;
  if (r === undefined) {
    return html`
      <div class="scenario-output heating-output" id="${anchor}">
        <p class="fail">Not computed: results.json holds no <code>heating</code> entry for scenario ${scenario
          .id}.</p>
      </div>
    `;
  }
  const failures =
    Object.values(r.surfaces).filter((s) => !s.surfaceCondensation.pass || !s.mould.pass).length;
  const rsi = Object.values(r.surfaces)[0]?.moistureSurfaceResistance;
  return html`
    <div class="scenario-output heating-output" id="${anchor}">
      <h4 class="output-heading">Results of heating scenario ${scenario.id}</h4>
      <p class="muted">Numbers as in results.json <code>heating</code> entry for ${scenario
        .id} (Appendix B) and <code>csv/heating-${scenario.id}.csv</code>.</p>
      <p class="peak-summary">Design heat loss through these surfaces: <strong data-q="total-loss-summary">${formatFixed(
        toDisplay(d, "heatGain", r.totalHeatLoss),
        0,
      )} ${unitLabel(d, "heatGain")}</strong> (Σ U<sub>c</sub>·A = ${d.system === "SI"
        ? `${formatSig(r.totalUA, 3)} W/K`
        : `${
          formatSig(toDisplay(d, "heatGain", r.totalUA) / DELTA_F_PER_K, 3)
        } Btu/(h·°F)`}). ${failures === 0
        ? "Every surface passes the surface-condensation and mould checks at this condition."
        : `${failures} surface(s) fail a check: see the table.`}</p>
      ${conditions(r, d)}
      ${surfaceTable(scenario.id, r, d)}
      <ul class="scenario-notes">${r.notes.map((n) => html`<li>${quotedNumbers(n, d)}</li>`)}</ul>
      <div class="caution-box" role="note">
        <p><strong>Limits:</strong> a steady-state screening at one design condition for the plane elements listed; ${rsi ===
            undefined
          ? ""
          : `surface temperatures use R_si = ${formatSig(toDisplay(d, "resistance", rsi), 3)} ${
            unitLabel(d, "resistance")
          }; `}thermal bridges, corners, ground contact, air leakage and interstitial condensation are not assessed, and the heat loss excludes ventilation and infiltration. The ISO 13788 constants used are logged in the assumptions register, with the clauses named from memory where so.</p>
        </div>
    </div>
  `;
}

/** The output after a heating scenario block, read from the rendering context (anchor `hs-<id>`). */
export function renderHeatingBlock(scenario: HeatingScenario, ctx: RenderContext): Trusted {
  const heating = ctx.input.results.heating ?? {};
  return renderHeatingOutput({
    scenario,
    results: Object.hasOwn(heating, scenario.id) ? heating[scenario.id] : undefined,
    anchor: heatingAnchor(scenario.id),
    display: ctx.display,
  });
}
