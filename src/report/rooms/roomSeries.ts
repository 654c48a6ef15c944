/** The room's own radiant time series: the 24 shares of both series in a table, and a plot of them beside it. */
import * as Plot from "@observablehq/plot";
import type { RoomCoolingLoadResults } from "../../scenarios/room/roomTypes.ts";
import { formatSig } from "../page/format.ts";
import { html, type Trusted } from "../page/html.ts";
import { renderPlotSvg } from "../page/plotSvg.ts";
import { tick } from "../scenarios/dayPlot.ts";
import { lineSwatch, type SeriesStyle } from "../scenarios/scenarioStyle.ts";

export const NONSOLAR_STYLE: SeriesStyle = { colour: "#1f4e79", dash: "none" };
export const SOLAR_STYLE: SeriesStyle = { colour: "#c77c0e", dash: "6 3" };

const sum = (xs: readonly number[]) => xs.reduce((a, x) => a + x, 0);

function seriesTable(rts: RoomCoolingLoadResults["radiantTimeSeries"]): Trusted {
  // Three significant figures, as every number of the package: the printed 24 add to 1 within their rounding.
  const share = (v: number | undefined) => formatSig(v ?? NaN, 3);
  const cells = (j: number) =>
    html`
      <td class="num j">${String(j)}</td>
      <td class="num" data-q="rts-nonsolar">${share(rts.nonsolar[j])}</td>
      <td class="num" data-q="rts-solar">${share(rts.solar[j])}</td>
    `;
  const half = Math.ceil(rts.nonsolar.length / 2);
  const rows = Array.from({ length: half }, (_, j) => html`<tr>${cells(j)}${cells(j + half)}</tr>`);
  return html`
    <table class="compact room-rts">
      <caption>r<sub>j</sub>: share of a radiant gain that becomes load j hours later.</caption>
      <thead>
        <tr>
          <th>j (h)</th>
          <th>Non-solar</th>
          <th>Solar</th>
          <th>j (h)</th>
          <th>Non-solar</th>
          <th>Solar</th>
        </tr>
      </thead>
      <tbody>${rows}
        <tr class="total-row"><th scope="row" colspan="4">Σ r<sub>j</sub></th><td class="num" data-q="rts-sum-nonsolar">${share(
          sum(rts.nonsolar),
        )}</td><td class="num" data-q="rts-sum-solar">${share(sum(rts.solar))}</td></tr>
        <tr><th scope="row" colspan="4">Retained share of the pulse</th><td class="num" data-q="retained-nonsolar">${formatSig(
          rts.retained.nonsolar,
          3,
        )}</td><td class="num" data-q="retained-solar">${formatSig(rts.retained.solar, 3)}</td></tr>
      </tbody>
    </table>
  `;
}

function seriesPlot(rts: RoomCoolingLoadResults["radiantTimeSeries"], prefix: string): Trusted {
  const points = (xs: readonly number[]) => xs.map((v, j) => ({ j, v: v * 100 }));
  const line = (xs: readonly number[], s: SeriesStyle) => [
    Plot.line(points(xs), { x: "j", y: "v", stroke: s.colour, strokeDasharray: s.dash, strokeWidth: 2.4 }),
    Plot.dot(points(xs), { x: "j", y: "v", fill: s.colour, r: 3 }),
  ];
  return renderPlotSvg(
    {
      height: 400,
      marginLeft: 64,
      marginRight: 20,
      marginBottom: 52,
      style: { fontSize: "19px" },
      x: {
        domain: [0, 23],
        ticks: [0, 3, 6, 9, 12, 15, 18, 21],
        label: "Hours after the radiant pulse, j (h)",
        labelAnchor: "center",
        labelArrow: "none",
        tickFormat: tick,
      },
      y: { label: "Share r_j, %", labelArrow: "none", grid: true, tickFormat: tick, nice: true, zero: true },
      marks: [
        Plot.ruleY([0], { stroke: "#444" }),
        ...line(rts.nonsolar, NONSOLAR_STYLE),
        ...line(rts.solar, SOLAR_STYLE),
      ],
    },
    `${prefix}-rts`,
    "The room's own radiant time series, non-solar and solar, percent per hour",
  );
}

/** Table and plot side by side, with the statement of what the series are. */
export function renderRoomSeries(cl: RoomCoolingLoadResults, prefix: string): Trusted {
  const rts = cl.radiantTimeSeries;
  return html`
    <div class="room-pair room-series">
      ${seriesTable(rts)}
      <figure class="plot-figure room-series-plot">${seriesPlot(
        rts,
        prefix,
      )}<figcaption><strong>The room's radiant time series.</strong> <span
        class="legend-entry">${lineSwatch(NONSOLAR_STYLE)} non-solar (gains, conduction)</span> <span
        class="legend-entry">${lineSwatch(
          SOLAR_STYLE,
        )} solar (onto the floor)</span>. A periodic unit radiant pulse through this room's heat balance; each series sums to 1; "retained": the share of the pulse that reaches the air before normalising (the rest is conducted out).</figcaption></figure>
    </div>
  `;
}
