/** The plots of a scenario's computed output, drawn with Observable Plot as inline SVG (numbers only inside). */
import * as Plot from "@observablehq/plot";
import type { ScenarioResults } from "../results/types.ts";
import { formatTrim } from "./format.ts";
import type { Trusted } from "./html.ts";
import { type PlotSpec, renderPlotSvg } from "./plotSvg.ts";
import { clockTime, J_PER_KWH, MONTH_NAMES } from "./scenarioData.ts";
import {
  GAIN_STYLE,
  INDOOR_STYLE,
  LOSS_STYLE,
  OUTDOOR_STYLE,
  type SeriesStyle,
  surfaceStyle,
} from "./scenarioStyle.ts";

const HEIGHT = 300;
const DAY_TICKS = [0, 3, 6, 9, 12, 15, 18, 21, 24];
const TIME_LABEL = "Time of day, local standard time (hh:mm)";

interface Point {
  readonly t: number;
  readonly v: number;
}

const tick = (d: number) => formatTrim(d, 4);

/** Points (kΔ, values[k]) plus a closing point at 24 h equal to the first (the day repeats). */
function dayPoints(values: readonly number[], timestepH: number): Point[] {
  const out = values.map((v, k) => ({ t: k * timestepH, v }));
  if (values.length > 0) out.push({ t: values.length * timestepH, v: values[0]! });
  return out;
}

function line(points: readonly Point[], style: SeriesStyle, width = 1.6): Plot.Markish {
  return Plot.line(points, {
    x: "t",
    y: "v",
    stroke: style.colour,
    strokeDasharray: style.dash,
    strokeWidth: width,
  });
}

function daySpec(yLabel: string, marks: Plot.Markish[]): PlotSpec {
  return {
    height: HEIGHT,
    marginLeft: 56,
    marginBottom: 40,
    style: { fontSize: "11px" },
    x: {
      domain: [0, 24],
      ticks: DAY_TICKS,
      tickFormat: clockTime,
      label: TIME_LABEL,
      labelAnchor: "center",
      labelArrow: "none",
    },
    y: { label: yLabel, labelArrow: "none", grid: true, tickFormat: tick, nice: true },
    marks,
  };
}

/** (a) Outdoor and indoor air and each surface's sol-air temperature over the day, °C. */
export function solAirPlot(results: ScenarioResults, idPrefix: string): Trusted {
  const dt = results.timestep_h;
  const surfaces = Object.values(results.surfaces).map((s, i) =>
    line(dayPoints(s.solAir, dt), surfaceStyle(i))
  );
  return renderPlotSvg(
    daySpec("Temperature (°C)", [
      ...surfaces,
      line(dayPoints(results.indoor, dt), INDOOR_STYLE, 1.4),
      line(dayPoints(results.outdoor, dt), OUTDOOR_STYLE, 2.4),
    ]),
    `${idPrefix}-solair`,
    "Outdoor, indoor and sol-air temperatures over the design day",
  );
}

/** (b) Inside heat flux of each surface over the day, W/m², positive into the room. */
export function insideFluxPlot(results: ScenarioResults, idPrefix: string): Trusted {
  const dt = results.timestep_h;
  const surfaces = Object.values(results.surfaces).map((s, i) =>
    line(dayPoints(s.insideFlux, dt), surfaceStyle(i))
  );
  return renderPlotSvg(
    daySpec("Inside heat flux, into the room (W/m²)", [Plot.ruleY([0], { stroke: "#444" }), ...surfaces]),
    `${idPrefix}-flux`,
    "Inside heat flux of each surface over the design day",
  );
}

/** (c) Heat gain per step stacked by surface (gains above zero, losses below), with the total as a line. */
export function stackedGainPlot(results: ScenarioResults, idPrefix: string): Trusted {
  const dt = results.timestep_h;
  const n = results.totalHeatGain.length;
  const bars = Object.values(results.surfaces).flatMap((s, i) =>
    s.heatGain.map((g, k) => ({ k, gain: g, order: i, colour: surfaceStyle(i).colour }))
  );
  const total = results.totalHeatGain.map((g, k) => ({ k, gain: g }));
  const every = Math.max(1, Math.round(3 / dt));
  const ticks = Array.from({ length: n }, (_, k) => k).filter((k) => k % every === 0);
  return renderPlotSvg(
    {
      height: HEIGHT,
      marginLeft: 56,
      marginBottom: 40,
      style: { fontSize: "11px" },
      x: {
        type: "band",
        domain: Array.from({ length: n }, (_, k) => k),
        ticks,
        tickFormat: (k: number) => clockTime(k * dt),
        label: TIME_LABEL,
        labelAnchor: "center",
        labelArrow: "none",
        padding: 0.12,
      },
      y: { label: "Heat gain (W)", labelArrow: "none", grid: true, tickFormat: tick, nice: true },
      color: { type: "identity" },
      marks: [
        Plot.barY(bars, { x: "k", y: "gain", fill: "colour", z: "order", stroke: "#fff", strokeWidth: 0.4 }),
        Plot.ruleY([0], { stroke: "#111" }),
        Plot.line(total, { x: "k", y: "gain", stroke: "#111", strokeWidth: 1.6 }),
        Plot.dot(total, { x: "k", y: "gain", r: 2, fill: "#111" }),
      ],
    },
    `${idPrefix}-stack`,
    "Heat gain stacked by surface with the total",
  );
}

/** (d) Monthly heat gain (above zero) and heat loss (below zero) of a weather year, kWh. */
export function monthlyPlot(
  months: readonly { gain_J: number; loss_J: number }[],
  idPrefix: string,
): Trusted {
  const names = MONTH_NAMES.map((m) => m.slice(0, 3));
  const gain = months.map((m, i) => ({ month: names[i]!, kWh: m.gain_J / J_PER_KWH }));
  const loss = months.map((m, i) => ({ month: names[i]!, kWh: -m.loss_J / J_PER_KWH }));
  return renderPlotSvg(
    {
      height: HEIGHT,
      marginLeft: 62,
      marginBottom: 40,
      style: { fontSize: "11px" },
      x: {
        type: "band",
        domain: names,
        label: "Month",
        labelAnchor: "center",
        labelArrow: "none",
        padding: 0.2,
      },
      y: { label: "Heat gain (+) and heat loss (−) (kWh)", labelArrow: "none", grid: true, tickFormat: tick },
      marks: [
        Plot.barY(gain, { x: "month", y: "kWh", fill: GAIN_STYLE.colour }),
        Plot.barY(loss, { x: "month", y: "kWh", fill: LOSS_STYLE.colour }),
        Plot.ruleY([0], { stroke: "#111" }),
      ],
    },
    `${idPrefix}-monthly`,
    "Monthly heat gain and heat loss",
  );
}
