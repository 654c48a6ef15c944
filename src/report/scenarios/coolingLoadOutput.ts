/** The cooling load part of a design day's output: the user's radiant time series, peaks, plots (hourly table: Appendix E). */
import * as Plot from "@observablehq/plot";
import type { CoolingLoadResults } from "../../scenarios/heatingTypes.ts";
import type { ScenarioResults } from "../../results/types.ts";
import { type DisplayUnits, toDisplay, unitLabel } from "../page/displayUnits.ts";
import { formatFixed, formatTrim } from "../page/format.ts";
import { coolingLoadAnchor } from "../page/anchors.ts";
import { html, type Trusted } from "../page/html.ts";
import { namePlaceholder, renderPlotSvg } from "../page/plotSvg.ts";
import { endLabels } from "../constructions/dynamicPlots.ts";
import { clockTime } from "./scenarioData.ts";
import { daySpec } from "./dayPlot.ts";
import { OUTDOOR_STYLE, type SeriesStyle, surfaceStyle } from "./scenarioStyle.ts";

const HOURS = Array.from({ length: 24 }, (_, h) => h);
const DASHED: SeriesStyle = { colour: "#b5470f", dash: "5 3" };

function gainAt(results: ScenarioResults, series: readonly number[], h: number): number {
  return series[Math.round(h / results.timestep_h)] ?? NaN;
}

function rtsTable(cl: CoolingLoadResults): Trusted {
  // The user's values as written (up to 4 figures); a room's own series in the package's 3 significant figures.
  const own = cl.radiantTimeSeries.room;
  const digits = own === undefined ? 4 : 3;
  // Two halves of twelve hours; the hour row of each is a header row, the first one the table's thead.
  const hours = (start: number) =>
    html`<tr><th scope="col">j</th>${
      HOURS.slice(start, start + 12).map((j) => html`<th scope="col" class="num">${String(j)}</th>`)
    }</tr>`;
  const shares = (start: number) =>
    html`<tr><th scope="row">r<sub>j</sub></th>${
      HOURS.slice(start, start + 12).map((j) =>
        html`<td class="num" data-q="rts">${formatTrim(cl.radiantTimeSeries.values[j] ?? NaN, digits)}</td>`
      )
    }</tr>`;
  return html`
    <table class="rts-table compact">
      <caption>Radiant time series used (r<sub>j</sub>: share of a radiant gain that becomes cooling load j hours later), ${own ===
          undefined
        ? "as given in the input"
        : `the non-solar series of room ${own}`}.</caption>
      <thead>${hours(0)}</thead>
      <tbody>${shares(0)}${hours(12)}${shares(12)}</tbody>
    </table>
  `;
}

function peakTable(results: ScenarioResults, cl: CoolingLoadResults, d: DisplayUnits): Trusted {
  const w = (v: number) => formatFixed(toDisplay(d, "heatGain", v), 0);
  const rows = Object.entries(results.surfaces).map(([sid, s]) => {
    const load = s.coolingLoadPeak;
    return html`
      <tr>
        <th scope="row">${sid}</th>
        <td class="num">${w(s.peak.heatGain)}</td>
        <td>${clockTime(s.peak.time_h)}</td>
        <td class="num" data-q="load-peak">${load === undefined ? "—" : w(load.value)}</td>
        <td>${load === undefined ? "—" : clockTime(load.time_h)}</td>
      </tr>
    `;
  });
  return html`
    <table class="cooling-peaks">
      <caption>Peak heat gain and peak cooling load per surface and in total (${unitLabel(
        d,
        "heatGain",
      )}; local standard time). Surface gain peaks are over all steps, the totals over the full hours.</caption>
      <thead>
        <tr>
          <th>Surface</th>
          <th>Peak heat gain</th>
          <th>at</th>
          <th>Peak cooling load</th>
          <th>at</th>
        </tr>
      </thead>
      <tbody>${rows}
        <tr class="total-row"><th scope="row">Total</th><td class="num">${w(
          cl.heatGainPeak.value,
        )}</td><td>${clockTime(cl.heatGainPeak.time_h)}</td><td class="num" data-q="total-load-peak">${w(
          cl.peak.value,
        )}</td><td data-q="total-load-time">${clockTime(cl.peak.time_h)}</td></tr>
      </tbody>
    </table>
  `;
}

/** The hourly heat gain and cooling load per surface and in total (printed in Appendix E). */
export function coolingLoadHourlyTable(
  id: string,
  results: ScenarioResults,
  cl: CoolingLoadResults,
  d: DisplayUnits,
): Trusted {
  const w = (v: number) => formatFixed(toDisplay(d, "heatGain", v), 0);
  const surfaces = Object.entries(results.surfaces);
  const body = HOURS.map((h) =>
    html`<tr><td class="num" data-q="time">${clockTime(h)}</td>${
      surfaces.map(([, s]) =>
        html`
          <td class="num" data-q="gain">${w(gainAt(results, s.heatGain, h))}</td>
          <td class="num" data-q="load">${w(s.coolingLoad?.[h] ?? NaN)}</td>
        `
      )
    }<td class="num total-col" data-q="total-gain">${
      w(cl.totalHeatGain[h] ?? NaN)
    }</td><td class="num total-col" data-q="total-load">${w(cl.total[h] ?? NaN)}</td></tr>`
  );
  return html`
    <table class="hourly cooling-load compact">
      <caption>Scenario ${id} at the full hours: heat gain (HG) and cooling load (CL) per surface and in total, ${unitLabel(
        d,
        "heatGain",
      )}.</caption>
      <thead>
        <tr><th rowspan="2">Time</th>${surfaces.map(([sid]) =>
          html`<th colspan="2">${sid}</th>`
        )}<th colspan="2">Total</th></tr>
        <tr>${surfaces.map(() =>
          html`
            <th>HG</th>
            <th>CL</th>
          `
        )}<th>HG</th><th>CL</th></tr>
      </thead>
      <tbody>${body}</tbody>
    </table>
  `;
}

function line(values: readonly number[], style: SeriesStyle, d: DisplayUnits, width = 1.6): Plot.Markish {
  const points = values.map((v, h) => ({ h, v: toDisplay(d, "heatGain", v) }));
  return Plot.line(points, {
    x: "h",
    y: "v",
    stroke: style.colour,
    strokeDasharray: style.dash,
    strokeWidth: width,
  });
}

/** Names at the right ends of hourly lines (hour 23), spread apart so that they do not overlap. */
function hourEnds(
  lines: readonly { name: string; values: readonly number[] }[],
  d: DisplayUnits,
): Plot.Markish {
  const shown = lines.map((l) => l.values.map((v) => toDisplay(d, "heatGain", v)));
  return endLabels(
    lines.map((l, i) => {
      const v = shown[i]!;
      return { name: l.name, end: v.length === 0 ? undefined : { t: v.length - 1, v: v[v.length - 1]! } };
    }),
    shown.flat(),
    true,
  );
}

function plots(
  id: string,
  results: ScenarioResults,
  cl: CoolingLoadResults,
  prefix: string,
  d: DisplayUnits,
) {
  const y = `Heat gain, cooling load (${unitLabel(d, "heatGain")})`;
  const totalSvg = renderPlotSvg(
    daySpec(y, [
      Plot.ruleY([0], { stroke: "#444" }),
      line(cl.totalHeatGain, DASHED, d),
      line(cl.total, OUTDOOR_STYLE, d, 2.2),
      hourEnds(
        [{ name: "heat gain", values: cl.totalHeatGain }, { name: "cooling load", values: cl.total }],
        d,
      ),
    ]),
    `${prefix}-cooling-total`,
    "Total heat gain and total cooling load over the design day",
  );
  const entries = Object.values(results.surfaces);
  const surfaceSvg = renderPlotSvg(
    daySpec(y, [
      Plot.ruleY([0], { stroke: "#444" }),
      ...entries.map((s, i) =>
        line(HOURS.map((h) => gainAt(results, s.heatGain, h)), { ...surfaceStyle(i), dash: "2 3" }, d, 1.1)
      ),
      ...entries.map((s, i) => line(s.coolingLoad ?? [], { ...surfaceStyle(i), dash: "none" }, d)),
      hourEnds(entries.map((s, i) => ({ name: namePlaceholder(i), values: s.coolingLoad ?? [] })), d),
    ]),
    `${prefix}-cooling-surfaces`,
    "Heat gain and cooling load of each surface over the design day",
    Object.keys(results.surfaces),
  );
  return html`
    <figure
      class="plot-figure">${totalSvg}<figcaption><strong>Total heat gain and cooling load, scenario ${id}.</strong> Each line is named at its right end: heat gain dashed, cooling load solid and thicker. At the full hours.</figcaption></figure>
    <figure
      class="plot-figure">${surfaceSvg}<figcaption><strong>Heat gain (dotted) and cooling load (solid) by surface, scenario ${id}.</strong> Each surface's cooling load line is named at its right end by surface id; its heat gain is the dotted line of the same colour.</figcaption></figure>
  `;
}

function limits(cl: CoolingLoadResults): Trusted {
  return html`
    <div class="caution-box cooling-limits" role="note">
      <p><strong>Limits of this cooling load.</strong> The radiant time series method assumes a steady-periodic day (the same day repeated) and continuous operation at the stated indoor temperature; with intermittent plant the peak is usually higher. It covers conduction through the opaque surfaces listed here only: glazing, internal gains, ventilation and infiltration are not included. The radiant share of each gain is the radiant fraction shown in the conditions.</p>
      ${rtsSourceNote(cl)}
    </div>
  `;
}

/** Where the series comes from: the user's, with its source, or a room's own (generated by this package). */
function rtsSourceNote(cl: CoolingLoadResults): Trusted {
  const room = cl.radiantTimeSeries.room;
  return room === undefined
    ? html`<p>The radiant time series is the user's input, not the tool's; it must suit the room it is applied to. Its source as given: <q class="rts-source">${cl.radiantTimeSeries.source}</q>.</p>`
    : html`<p>The radiant time series is the non-solar series this package generates for room ${room} from its own constructions (see that room's output, under its block); it must suit the surfaces it is applied to, which the user chose by naming the room.</p>`;
}

/** The cooling load section of a design day, or nothing when the scenario gives no radiant time series. */
export function renderCoolingLoad(
  id: string,
  results: ScenarioResults,
  prefix: string,
  d: DisplayUnits,
): Trusted {
  const cl = results.coolingLoad;
  if (cl === undefined) return html``;
  return html`
    <section class="cooling-load-output">
      <h5 id="${coolingLoadAnchor(prefix)}">Cooling load (radiant time series method)</h5>
      <p>Cooling load of each surface = convective part of its heat gain + Σ r<sub>j</sub> × radiant part j hours earlier (ASHRAE Handbook—Fundamentals, nonresidential cooling load chapter). Values are per hour, at the full hours; results.json key <code>coolingLoad</code>.</p>
      ${rtsTable(cl)}
      ${peakTable(results, cl, d)}
      ${plots(id, results, cl, prefix, d)}
      ${limits(cl)}
    </section>
  `;
}
