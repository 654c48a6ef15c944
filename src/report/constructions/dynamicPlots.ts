/** The three plots of a construction's dynamic response, drawn with Observable Plot as inline SVG. */
import * as Plot from "@observablehq/plot";
import { stepResponse } from "./dynamicData.ts";
import type { DynamicView } from "./dynamicData.ts";
import { type DisplayUnits, toDisplay, unitLabel } from "../page/displayUnits.ts";
import { formatTrim, THIN_SPACE } from "../page/format.ts";
import type { Trusted } from "../page/html.ts";
import { renderPlotSvg } from "../page/plotSvg.ts";

/** Stroke colour and dash of each series, shared with the legend keys in the captions. */
export const SERIES_STYLE = {
  X: { stroke: "#1f5fa8", dash: "6 3" },
  Y: { stroke: "#111111", dash: "none" },
  Z: { stroke: "#b5470f", dash: "2 2" },
} as const;

/** Hours of response factors drawn (the table and Appendix B hold the rest). */
export const RESPONSE_FACTOR_WINDOW_H = 48;
const STEP_WINDOW_MIN_H = 48;
const STEP_WINDOW_MAX_H = 720;
const MAX_POINTS = 400;
const HEIGHT = 280;
const FONT_SIZE = "11";

interface Point {
  readonly t: number;
  readonly v: number;
}

const tick = (d: number) => formatTrim(d, 3);

/**
 * Points (jΔ, scale(values[j])) for jΔ ≤ windowH, thinned to at most MAX_POINTS but always keeping the last;
 * `scale` converts to the display unit.
 */
function points(
  values: readonly number[],
  timestepH: number,
  windowH: number,
  scale: (si: number) => number,
): Point[] {
  const last = Math.min(values.length - 1, Math.floor(windowH / timestepH + 1e-9));
  const stride = Math.max(1, Math.ceil((last + 1) / MAX_POINTS));
  const out: Point[] = [];
  for (let j = 0; j <= last; j += stride) out.push({ t: j * timestepH, v: scale(values[j]!) });
  if (out.length > 0 && out[out.length - 1]!.t !== last * timestepH) {
    out.push({ t: last * timestepH, v: scale(values[last]!) });
  }
  return out;
}

function finish(spec: Plot.PlotOptions): Plot.PlotOptions {
  return { height: HEIGHT, style: { fontSize: `${FONT_SIZE}px` }, marginBottom: 40, ...spec };
}

/** End-of-line names of the response-factor series. */
const SERIES_NAME = { X: "X (outside)", Y: "Y (cross)", Z: "Z (inside)" } as const;

/**
 * Response factors X, Y, Z (display unit of U) against time jΔ over the first 48 h on a linear scale, each
 * line named at its end. Series differ by dash as well as colour, so they read in greyscale.
 */
export function responseFactorPlot(view: DynamicView, idPrefix: string, d: DisplayUnits): Trusted {
  const rf = view.responseFactors;
  const scale = (si: number) => toDisplay(d, "transmittance", si);
  const series = (["X", "Y", "Z"] as const).map((key) => ({
    key,
    data: points(rf[key], view.timestep_h, RESPONSE_FACTOR_WINDOW_H, scale),
  }));
  const dots = series[0]!.data.length <= 60;
  const marks = series.flatMap(({ key, data }) => [
    Plot.line(data, {
      x: "t",
      y: "v",
      stroke: SERIES_STYLE[key].stroke,
      strokeDasharray: SERIES_STYLE[key].dash,
      strokeWidth: 1.5,
    }),
    ...(dots ? [Plot.dot(data, { x: "t", y: "v", r: 1.8, fill: SERIES_STYLE[key].stroke })] : []),
  ]);
  const ends = endLabels(
    series.map(({ key, data }) => ({ name: SERIES_NAME[key], end: data[data.length - 1] })),
    series.flatMap((s) => s.data.map((p) => p.v)),
  );
  return renderPlotSvg(
    finish({
      marginLeft: 62,
      marginTop: 30,
      marginRight: 78,
      x: {
        label: "Time after the pulse peak, jΔ (h)",
        labelAnchor: "center",
        labelArrow: "none",
        tickFormat: tick,
      },
      y: {
        tickFormat: tick,
        grid: true,
        label: `Response factor, ${unitLabel(d, "transmittance")}`,
        labelArrow: "none",
      },
      marks: [Plot.ruleY([0], { stroke: "#777" }), ...marks, ends],
    }),
    `${idPrefix}-rf`,
    "Response factors X, Y and Z against time, linear vertical scale",
  );
}

/**
 * Text marks naming each line just right of its last point, moved apart vertically so no two overlap (at
 * least 7 % of the data range); the names are constants of this module.
 */
export function endLabels(
  lines: readonly { readonly name: string; readonly end: Point | undefined }[],
  values: readonly number[],
  fromData = false,
): Plot.Markish {
  const min = values.reduce((m, v) => Math.min(m, v), fromData ? Infinity : 0);
  const max = values.reduce((m, v) => Math.max(m, v), fromData ? -Infinity : 0);
  const gap = (max - min) * 0.07;
  const placed = lines.filter((l) => l.end !== undefined).map((l) => ({
    name: l.name,
    t: l.end!.t,
    v: l.end!.v,
  }))
    .sort((a, b) => a.v - b.v);
  for (let i = 1; i < placed.length; i++) {
    placed[i]!.v = Math.max(placed[i]!.v, placed[i - 1]!.v + gap);
  }
  return Plot.text(placed, { x: "t", y: "v", text: "name", textAnchor: "start", dx: 5, fill: "#111" });
}

/** The conduction time series as 24 bars, hour 0 to 23, in percent of the total (the same in every unit system). */
export function ctsPlot(view: DynamicView, idPrefix: string): Trusted {
  const data = view.cts.map((c, j) => ({ j, percent: c * 100 }));
  return renderPlotSvg(
    finish({
      marginLeft: 50,
      x: {
        type: "band",
        label: "Hours after the outside excitation, j (h)",
        labelAnchor: "center",
        tickFormat: tick,
      },
      y: { label: "Share of the daily conduction gain, %", labelArrow: "none", grid: true, tickFormat: tick },
      marks: [Plot.barY(data, { x: "j", y: "percent", fill: "#4d6f8f" }), Plot.ruleY([0])],
    }),
    `${idPrefix}-cts`,
    "Conduction time series, percent per hour",
  );
}

/** How many hours of the step response to draw: until within 0.5 % of U, between 48 h and 720 h. */
export function stepWindowH(steps: readonly number[], u: number, timestepH: number): number {
  let j = steps.length - 1;
  while (j > 0 && Math.abs(steps[j - 1]! - u) <= 0.005 * u) j--;
  const settled = j * timestepH * 1.2;
  return Math.min(STEP_WINDOW_MAX_H, Math.max(STEP_WINDOW_MIN_H, Math.ceil(settled / 12) * 12));
}

/**
 * Inside flux after a unit step of outside temperature (running sum of Y_j), with U as a reference line, in
 * the display unit of U.
 */
export function stepResponsePlot(view: DynamicView, idPrefix: string, d: DisplayUnits): Trusted {
  const steps = stepResponse(view.responseFactors.Y);
  const windowH = stepWindowH(steps, view.U, view.timestep_h);
  const scale = (si: number) => toDisplay(d, "transmittance", si);
  const data = points(steps, view.timestep_h, windowH, scale);
  const u = scale(view.U);
  const perDegree = unitLabel(d, "transmittance");
  const step = unitLabel(d, "temperatureDifference");
  const uText = `U = ${formatTrim(u, 3)}${THIN_SPACE}${perDegree}`;
  return renderPlotSvg(
    finish({
      marginLeft: 62,
      x: { label: "Time after the step, t (h)", labelAnchor: "center", labelArrow: "none", tickFormat: tick },
      y: {
        label: `Inside heat flux per ${step}, ${perDegree}`,
        labelArrow: "none",
        grid: true,
        domain: [0, u * 1.12],
        tickFormat: tick,
      },
      marks: [
        Plot.ruleY([u], { stroke: "#a40000", strokeDasharray: "5 4" }),
        Plot.text([uText], {
          x: data[data.length - 1]?.t ?? 0,
          y: u,
          dy: -8,
          textAnchor: "end",
          fill: "#a40000",
        }),
        Plot.line(data, { x: "t", y: "v", stroke: SERIES_STYLE.Y.stroke, strokeWidth: 1.8, curve: "linear" }),
        Plot.ruleY([0]),
      ],
    }),
    `${idPrefix}-step`,
    `Step response of the inside heat flux to a 1 ${step} step of outside temperature`,
  );
}
