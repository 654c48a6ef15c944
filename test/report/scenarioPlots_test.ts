import assert from "node:assert/strict";
import { SI_DISPLAY } from "../../src/report/page/displayUnits.ts";
import { PLOT_WIDTH } from "../../src/report/page/plotSvg.ts";
import {
  insideFluxPlot,
  monthlyPlot,
  solAirPlot,
  stackedGainPlot,
} from "../../src/report/scenarios/scenarioPlots.ts";
import type { ScenarioResults } from "../../src/results/types.ts";
import { computeDesignDay } from "../../src/scenarios/designDay.ts";
import { assertNoLiveMarkup, parseFragment } from "./dom.ts";
import { designDay, scenarioContext, surface } from "./scenarioFixture.ts";

/** A design day with three surfaces whose totals go both above and below zero (indoor 24 °C, outdoor 20–31 °C). */
function mixedDay(): ScenarioResults {
  const scenario = designDay([
    surface({
      id: "south",
      construction: "EW-9",
      areaM2: 42,
      azimuthDeg: 180,
      tiltDeg: 90,
      absorptance: 0.6,
    }),
    surface({ id: "east", construction: "EW-9", areaM2: 20, azimuthDeg: 90, tiltDeg: 90, absorptance: 0.3 }),
    surface({ id: "flat", construction: "RF-9", areaM2: 60, tiltDeg: 0, absorptance: 0.9 }),
  ], { sky: { kind: "none" } });
  return computeDesignDay(scenario, scenarioContext()).results;
}

const MONTHS = Array.from({ length: 12 }, (_, m) => ({ gain_J: m * 3.6e6, loss_J: (11 - m) * 7.2e6 }));

function plots(results: ScenarioResults, prefix: string) {
  return [
    solAirPlot(results, prefix, SI_DISPLAY),
    insideFluxPlot(results, prefix, SI_DISPLAY),
    stackedGainPlot(results, prefix, SI_DISPLAY),
    monthlyPlot(MONTHS, prefix, SI_DISPLAY),
  ];
}

Deno.test("scenario plots are inline SVG with xmlns, fixed width, labelled axes and nothing live or external", () => {
  for (const plot of plots(mixedDay(), "sc-x-fig")) {
    const root = parseFragment(plot.markup);
    assertNoLiveMarkup(plot.markup, root);
    const svg = root.querySelector("svg");
    assert.ok(svg !== null);
    assert.equal(svg.getAttribute("xmlns"), "http://www.w3.org/2000/svg");
    assert.equal(svg.getAttribute("width"), String(PLOT_WIDTH));
    assert.ok(svg.getAttribute("aria-label"));
    assert.equal(root.querySelectorAll("foreignObject, foreignobject, style, script, image, use").length, 0);
    assert.doesNotMatch(plot.markup, /href=|url\((?!#)|<script/i);
    const labels = Array.from(
      svg.querySelectorAll('g[aria-label="x-axis label"] text, g[aria-label="y-axis label"] text'),
    ).map((t) => t.textContent ?? "");
    assert.equal(labels.length, 2, "both axes labelled");
    assert.ok(labels.some((l) => /\((°C|W\/m²|W|kWh)\)$/.test(l)), `a unit in ${labels.join(" | ")}`);
    for (const el of Array.from(svg.querySelectorAll("[id]"))) {
      assert.match(el.getAttribute("id") ?? "", /^sc-x-fig-/);
    }
  }
});

Deno.test("scenario plots are byte-identical when rendered twice", () => {
  const a = plots(mixedDay(), "p").map((p) => p.markup);
  const b = plots(mixedDay(), "p").map((p) => p.markup);
  assert.deepEqual(a, b);
});

Deno.test("the stacked gain plot draws one bar per surface and step, above and below the zero line", () => {
  const results = mixedDay();
  const svg = parseFragment(stackedGainPlot(results, "p", SI_DISPLAY).markup).querySelector("svg")!;
  const bars = Array.from(svg.querySelectorAll('g[aria-label="rect"] rect'));
  // 24 steps per surface plus step 0 repeated at 24:00 (the day repeats; both half bars clipped to 0–24 h).
  assert.equal(bars.length, 25 * 3);
  const zero = Number(svg.querySelector('g[aria-label="rule"] line')?.getAttribute("y1"));
  assert.ok(Number.isFinite(zero));
  const top = (r: Element) => Number(r.getAttribute("y"));
  const bottom = (r: Element) => top(r) + Number(r.getAttribute("height"));
  const signs = Object.values(results.surfaces).flatMap((s) => s.heatGain);
  assert.ok(signs.some((g) => g < -1) && signs.some((g) => g > 1), "the fixture has gains and losses");
  assert.ok(bars.some((r) => bottom(r) < zero - 1), "a bar above zero");
  assert.ok(bars.some((r) => top(r) > zero + 1), "a bar below zero");
  assert.ok(bars.every((r) => bottom(r) <= zero + 0.02 || top(r) >= zero - 0.02), "no bar crosses zero");
  assert.equal(svg.querySelectorAll('g[aria-label="dot"] circle').length, 25, "a dot per step and at 24:00");
});

Deno.test("the monthly plot draws twelve gain bars above and twelve loss bars below zero", () => {
  const svg = parseFragment(monthlyPlot(MONTHS, "p", SI_DISPLAY).markup).querySelector("svg")!;
  const groups = Array.from(svg.querySelectorAll('g[aria-label="bar"]'));
  assert.equal(groups.length, 2);
  // January has no gain (0 J), so eleven gain bars have height; every month has a loss except December.
  const heights = groups.map((g) =>
    Array.from(g.querySelectorAll("rect")).filter((r) => Number(r.getAttribute("height")) > 0)
  );
  assert.equal(heights[0]!.length, 11);
  assert.equal(heights[1]!.length, 11);
});
