/**
 * The room's hourly sensible load by both methods in one plot, the table of their peaks and largest difference,
 * and the heat balance load split by source at its peak step.
 */
import * as Plot from "@observablehq/plot";
import type { RoomResults } from "../../scenarios/room/roomTypes.ts";
import type { DisplayUnits } from "../page/displayUnits.ts";
import { unitHead } from "../page/displayUnits.ts";
import { formatFixed, formatSig, MINUS } from "../page/format.ts";
import { html, type Trusted } from "../page/html.ts";
import { renderPlotSvg } from "../page/plotSvg.ts";
import { daySpec } from "../scenarios/dayPlot.ts";
import { clockTime } from "../scenarios/scenarioData.ts";
import { lineSwatch, type SeriesStyle } from "../scenarios/scenarioStyle.ts";
import { label, shown, sig } from "./roomUnits.ts";

const HB_STYLE: SeriesStyle = { colour: "#111111", dash: "none" };
const RTS_STYLE: SeriesStyle = { colour: "#b5470f", dash: "6 3" };
const DIFF_STYLE: SeriesStyle = { colour: "#777777", dash: "2 2" };
const LATENT_STYLE: SeriesStyle = { colour: "#2e6b30", dash: "8 3 2 3" };

/** The heat balance load at the full hour h (its step series sampled at whole hours). */
export function heatBalanceAtHour(r: RoomResults, h: number): number {
  return r.coolingLoad.heatBalance[Math.round(h / r.timestep_h)] ?? NaN;
}

/** A relative difference in percent with its sign (+7.7 %). */
export function percent(fraction: number): string {
  const text = formatSig(fraction * 100, 2);
  return `${fraction > 0 ? "+" : ""}${text} %`;
}

/** The hour and value of the largest |RTS method − heat balance| at the full hours. */
export function largestDifference(r: RoomResults): { readonly hour: number; readonly value: number } {
  const d = r.coolingLoad.difference;
  const hour = d.reduce((best, v, k) => (Math.abs(v) > Math.abs(d[best]!) ? k : best), 0);
  return { hour, value: d[hour] ?? NaN };
}

function loadPlot(r: RoomResults, prefix: string, d: DisplayUnits): Trusted {
  const cl = r.coolingLoad;
  const line = (xs: readonly { t: number; v: number }[], s: SeriesStyle, width: number) =>
    Plot.line(xs.map((p) => ({ t: p.t, v: shown(d, "heatGain", p.v) })), {
      x: "t",
      y: "v",
      stroke: s.colour,
      strokeDasharray: s.dash,
      strokeWidth: width,
    });
  const steps = cl.heatBalance.map((v, k) => ({ t: k * r.timestep_h, v }));
  const hours = (xs: readonly number[]) => xs.map((v, h) => ({ t: h, v }));
  const marks = [
    Plot.ruleY([0], { stroke: "#444" }),
    line(steps, HB_STYLE, 2.2),
    line(hours(cl.rtsMethod), RTS_STYLE, 2),
    line(hours(cl.difference), DIFF_STYLE, 1.2),
  ];
  if (cl.latent.some((v) => v !== 0)) {
    marks.push(line(cl.latent.map((v, k) => ({ t: k * r.timestep_h, v })), LATENT_STYLE, 1.2));
  }
  return renderPlotSvg(
    // Drawn beside the split by source, at about two thirds of a day plot's printed width: larger type.
    {
      ...daySpec(`Sensible cooling load (${label(d, "heatGain")})`, marks, 400),
      style: { fontSize: "16px" },
      marginLeft: 72,
      marginRight: 24,
      marginBottom: 48,
    },
    `${prefix}-load`,
    "Sensible cooling load by the heat balance and by the radiant time series method over the design day",
  );
}

function differenceTable(r: RoomResults, d: DisplayUnits): Trusted {
  const cl = r.coolingLoad;
  const big = largestDifference(r);
  const hbThen = heatBalanceAtHour(r, big.hour);
  const w = unitHead(d, "heatGain");
  return html`
    <table class="compact room-difference">
      <caption>Both methods at their peaks, and their largest difference over the full hours (RTS − HB).</caption>
      <thead>
        <tr>
          <th>Heat balance peak ${w}</th>
          <th>at</th>
          <th>RTS method peak ${w}</th>
          <th>at</th>
          <th>Peak difference</th>
          <th>Largest |RTS − HB| ${w}</th>
          <th>at</th>
          <th>of HB then</th>
        </tr>
      </thead>
      <tbody>
        <tr>
          <td class="num" data-q="hb-peak">${sig(d, "heatGain", cl.heatBalancePeak.load)}</td>
          <td data-q="hb-time">${clockTime(cl.heatBalancePeak.time_h)}</td>
          <td class="num" data-q="rts-peak">${sig(d, "heatGain", cl.rtsMethodPeak.load)}</td>
          <td data-q="rts-time">${clockTime(cl.rtsMethodPeak.time_h)}</td>
          <td class="num" data-q="peak-difference">${percent(cl.peakDifference)}</td>
          <td class="num" data-q="max-difference">${sig(d, "heatGain", big.value)}</td>
          <td>${clockTime(big.hour)}</td>
          <td class="num">${Number.isFinite(hbThen) && hbThen !== 0
            ? percent(big.value / Math.abs(hbThen))
            : "—"}</td>
        </tr>
      </tbody>
    </table>
  `;
}

/** A load source key of results.json as the table names it (`surface:roof` → `roof (conduction)`). */
function sourceName(key: string): string {
  if (key.startsWith("surface:")) return `${key.slice(8)} (conduction)`;
  if (key.startsWith("gain:")) return `${key.slice(5)} (gain)`;
  const named: Record<string, string> = {
    windows: "windows (conduction)",
    solar: "transmitted solar",
    ventilation: "ventilation",
    "thermal-bridges": "thermal bridges",
    "set-point": "set point (change over the day)",
  };
  return named[key] ?? key;
}

function bySourceTable(r: RoomResults, d: DisplayUnits): Trusted {
  const cl = r.coolingLoad;
  const k = Math.round(cl.heatBalancePeak.time_h / r.timestep_h);
  const entries = Object.entries(cl.bySource);
  const total = entries.reduce((a, [, xs]) => a + (xs[k] ?? 0), 0);
  const w = (v: number) => formatFixed(shown(d, "heatGain", v), 0).replace(/^−0$/, "0");
  const rows = entries.map(([key, xs]) =>
    html`
      <tr>
        <th scope="row">${sourceName(key)}</th>
        <td class="num" data-q="by-source">${w(xs[k] ?? NaN)}</td>
      </tr>
    `
  );
  return html`
    <table class="compact room-by-source">
      <caption>Heat balance load by source at its peak, ${clockTime(
        cl.heatBalancePeak.time_h,
      )} (each source run alone; the parts add to the load).</caption>
      <thead>
        <tr>
          <th>Source</th>
          <th>Load ${unitHead(d, "heatGain")}</th>
        </tr>
      </thead>
      <tbody>${rows}<tr class="total-row"><th scope="row">Sum</th><td class="num" data-q="by-source-total">${w(
        total,
      )}</td></tr></tbody>
    </table>
  `;
}

/** The plot, then the difference table and the split by source side by side. */
export function renderRoomLoad(r: RoomResults, prefix: string, d: DisplayUnits): Trusted {
  const latent = r.coolingLoad.latent.some((v) => v !== 0)
    ? html`
      <span class="legend-entry">${lineSwatch(LATENT_STYLE)} latent (apart)</span>
    `
    : html``;
  return html`
    <div class="room-pair room-load">
    <figure class="plot-figure">${loadPlot(
      r,
      prefix,
      d,
    )}<figcaption><strong>Sensible cooling load over the design day.</strong> <span
      class="legend-entry">${lineSwatch(HB_STYLE)} heat balance (every step)</span> <span
      class="legend-entry">${lineSwatch(RTS_STYLE)} radiant time series method (hourly)</span> <span
      class="legend-entry">${lineSwatch(
        DIFF_STYLE,
      )} difference RTS ${MINUS} HB</span>${latent}. Negative: the room loses heat at that hour.</figcaption></figure>
    ${bySourceTable(r, d)}</div>
    ${differenceTable(r, d)}
  `;
}
