/** The plots of a scenario's computed output, drawn with Observable Plot as inline SVG (numbers only inside). */
import * as Plot from "@observablehq/plot";
import type { ScenarioResults } from "../../results/types.ts";
import { type DisplayUnits, type QuantityKind, toDisplay, unitLabel } from "../page/displayUnits.ts";
import type { Trusted } from "../page/html.ts";
import { namePlaceholder, renderPlotSvg } from "../page/plotSvg.ts";
import { endLabels } from "../constructions/dynamicPlots.ts";
import { MONTH_NAMES } from "./scenarioData.ts";
import { DAY_PLOT_HEIGHT, daySpec, tick } from "./dayPlot.ts";
import {
  GAIN_STYLE,
  INDOOR_STYLE,
  LOSS_STYLE,
  OUTDOOR_STYLE,
  type SeriesStyle,
  surfaceStyle,
} from "./scenarioStyle.ts";

interface Point {
  readonly t: number;
  readonly v: number;
}

/**
 * Points (kΔ, values[k]) in the display unit of `kind`, plus a closing point at 24 h equal to the first (the
 * day repeats).
 */
function dayPoints(
  values: readonly number[],
  timestepH: number,
  d: DisplayUnits,
  kind: QuantityKind,
): Point[] {
  const out = values.map((v, k) => ({ t: k * timestepH, v: toDisplay(d, kind, v) }));
  if (values.length > 0) out.push({ t: values.length * timestepH, v: toDisplay(d, kind, values[0]!) });
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

/** (a) Outdoor and indoor air and each surface's sol-air temperature over the day, °C or °F. */
export function solAirPlot(results: ScenarioResults, idPrefix: string, d: DisplayUnits): Trusted {
  const dt = results.timestep_h;
  const points = (values: readonly number[]) => dayPoints(values, dt, d, "temperature");
  const ids = Object.keys(results.surfaces);
  const series = Object.values(results.surfaces).map((s) => points(s.solAir));
  const indoor = points(results.indoor);
  const outdoor = points(results.outdoor);
  const ends = endLabels(
    [
      ...series.map((p, i) => ({ name: namePlaceholder(i), end: p[p.length - 1] })),
      { name: "indoor air", end: indoor[indoor.length - 1] },
      { name: "outdoor air", end: outdoor[outdoor.length - 1] },
    ],
    [...series.flat(), ...indoor, ...outdoor].map((p) => p.v),
    true,
  );
  return renderPlotSvg(
    daySpec(`Temperature (${unitLabel(d, "temperature")})`, [
      ...series.map((p, i) => line(p, surfaceStyle(i))),
      line(indoor, INDOOR_STYLE, 1.4),
      line(outdoor, OUTDOOR_STYLE, 2.4),
      ends,
    ]),
    `${idPrefix}-solair`,
    "Outdoor, indoor and sol-air temperatures over the design day",
    ids,
  );
}

/** (b) Inside heat flux of each surface over the day, W/m² or Btu/(h·ft²), positive into the room. */
export function insideFluxPlot(results: ScenarioResults, idPrefix: string, d: DisplayUnits): Trusted {
  const dt = results.timestep_h;
  const ids = Object.keys(results.surfaces);
  const series = Object.values(results.surfaces).map((s) => dayPoints(s.insideFlux, dt, d, "heatFlux"));
  const ends = endLabels(
    series.map((p, i) => ({ name: namePlaceholder(i), end: p[p.length - 1] })),
    series.flat().map((p) => p.v),
    true,
  );
  return renderPlotSvg(
    daySpec(`Inside heat flux, into the room (${unitLabel(d, "heatFlux")})`, [
      Plot.ruleY([0], { stroke: "#444" }),
      ...series.map((p, i) => line(p, surfaceStyle(i))),
      ends,
    ]),
    `${idPrefix}-flux`,
    "Inside heat flux of each surface over the design day",
    ids,
  );
}

/**
 * (c) Heat gain per step (W or Btu/h) stacked by surface (gains above zero, losses below), with the total as
 * a line.
 */
export function stackedGainPlot(results: ScenarioResults, idPrefix: string, d: DisplayUnits): Trusted {
  const dt = results.timestep_h;
  const gainOf = (w: number) => toDisplay(d, "heatGain", w);
  // Bar k is centred on its time kΔ; the day repeats, so step 0 is drawn again at 24:00 and both halves are
  // clipped to the 0–24 h axis.
  const bars = Object.values(results.surfaces).flatMap((s, i) =>
    [...s.heatGain, s.heatGain[0] ?? 0].map((g, k) => ({
      t0: (k - 0.5) * dt,
      t1: (k + 0.5) * dt,
      gain: gainOf(g),
      order: i,
      colour: surfaceStyle(i).colour,
    }))
  );
  const totals = [...results.totalHeatGain, results.totalHeatGain[0] ?? 0];
  const total = totals.map((g, k) => ({ t: k * dt, gain: gainOf(g) }));
  const ids = Object.keys(results.surfaces);
  return renderPlotSvg(
    {
      ...daySpec(`Heat gain (${unitLabel(d, "heatGain")})`, []),
      color: { type: "identity" },
      marks: [
        Plot.rectY(bars, {
          x1: "t0",
          x2: "t1",
          y: "gain",
          fill: "colour",
          z: "order",
          stroke: "#fff",
          strokeWidth: 0.4,
          clip: true,
        }),
        Plot.ruleY([0], { stroke: "#111" }),
        Plot.line(total, { x: "t", y: "gain", stroke: "#111", strokeWidth: 1.6 }),
        Plot.dot(total, { x: "t", y: "gain", r: 2, fill: "#111" }),
        stackEndLabels(results, gainOf, total[total.length - 1]),
      ],
    },
    `${idPrefix}-stack`,
    "Heat gain stacked by surface with the total",
    ids,
  );
}

/**
 * Names at the right end of the stacked bars: each surface at the middle of its bar at 24:00 (gains stack up
 * from zero in input order, losses down), and the total at the end of its line.
 */
function stackEndLabels(
  results: ScenarioResults,
  gainOf: (w: number) => number,
  totalEnd: { t: number; gain: number } | undefined,
): Plot.Markish {
  let up = 0;
  let down = 0;
  const ends = Object.values(results.surfaces).map((s, i) => {
    const g = gainOf(s.heatGain[0] ?? 0);
    const middle = g >= 0 ? up + g / 2 : down + g / 2;
    if (g >= 0) up += g;
    else down += g;
    return { name: namePlaceholder(i), end: { t: 24, v: middle } };
  });
  const all = Object.values(results.surfaces).flatMap((s) => s.heatGain.map(gainOf));
  const total = totalEnd === undefined ? [] : [{ name: "total", end: { t: 24, v: totalEnd.gain } }];
  return endLabels([...ends, ...total], [...all, up, down, totalEnd?.gain ?? 0], true);
}

/** The months of largest gain and largest loss, where the monthly plot names its two bar series. */
function monthlyLabels(
  gain: readonly { month: string; energy: number }[],
  loss: readonly { month: string; energy: number }[],
): Plot.Markish[] {
  const largest = (rows: readonly { month: string; energy: number }[], sign: number) =>
    rows.reduce((best, r) => (sign * r.energy > sign * best.energy ? r : best), rows[0]!);
  if (gain.length === 0) return [];
  const up = largest(gain, 1);
  const down = largest(loss, -1);
  return [
    Plot.text([{ ...up, label: "heat gain" }], {
      x: "month",
      y: "energy",
      text: "label",
      dy: -8,
      fill: "#111",
    }),
    Plot.text([{ ...down, label: "heat loss" }], {
      x: "month",
      y: "energy",
      text: "label",
      dy: 10,
      fill: "#111",
    }),
  ];
}

/** (d) Monthly heat gain (above zero) and heat loss (below zero) of a weather year, kWh or kBtu. */
export function monthlyPlot(
  months: readonly { gain_J: number; loss_J: number }[],
  idPrefix: string,
  d: DisplayUnits,
): Trusted {
  const names = MONTH_NAMES.map((m) => m.slice(0, 3));
  const gain = months.map((m, i) => ({ month: names[i]!, energy: toDisplay(d, "energy", m.gain_J) }));
  const loss = months.map((m, i) => ({ month: names[i]!, energy: -toDisplay(d, "energy", m.loss_J) }));
  return renderPlotSvg(
    {
      height: DAY_PLOT_HEIGHT,
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
      y: {
        label: `Heat gain (+) and heat loss (−) (${unitLabel(d, "energy")})`,
        labelArrow: "none",
        grid: true,
        tickFormat: tick,
      },
      marks: [
        Plot.barY(gain, { x: "month", y: "energy", fill: GAIN_STYLE.colour }),
        Plot.barY(loss, { x: "month", y: "energy", fill: LOSS_STYLE.colour }),
        Plot.ruleY([0], { stroke: "#111" }),
        ...monthlyLabels(gain, loss),
      ],
    },
    `${idPrefix}-monthly`,
    "Monthly heat gain and heat loss",
  );
}
