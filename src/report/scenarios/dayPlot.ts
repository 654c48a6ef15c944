/** The frame every plot over one day shares: 0–24 h in 3 h steps at local standard time, the y axis titled. */
import type * as Plot from "@observablehq/plot";
import { formatTrim } from "../page/format.ts";
import type { PlotSpec } from "../page/plotSvg.ts";
import { clockTime } from "./scenarioData.ts";

/** Height of a day plot, px (before scaling to the page). */
export const DAY_PLOT_HEIGHT = 300;
const DAY_TICKS = [0, 3, 6, 9, 12, 15, 18, 21, 24];
const TIME_LABEL = "Time of day, local standard time (hh:mm)";

/** Axis tick text: up to four significant figures, trailing zeros trimmed. */
export const tick = (value: number) => formatTrim(value, 4);

/** A day plot's specification: the shared x axis, `yLabel` on the y axis, the given marks. */
export function daySpec(yLabel: string, marks: Plot.Markish[], height = DAY_PLOT_HEIGHT): PlotSpec {
  return {
    height,
    marginLeft: 56,
    marginRight: 96,
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
