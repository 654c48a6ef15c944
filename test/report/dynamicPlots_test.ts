import assert from "node:assert/strict";
import { SI_DISPLAY } from "../../src/report/page/displayUnits.ts";
import * as Plot from "@observablehq/plot";
import {
  type DynamicView,
  readDynamic,
  seriesSum,
  stepResponse,
} from "../../src/report/constructions/dynamicData.ts";
import {
  ctsPlot,
  responseFactorPlot,
  stepResponsePlot,
} from "../../src/report/constructions/dynamicPlots.ts";
import { MINUS } from "../../src/report/page/format.ts";
import { renderPackage } from "../../src/report/package.ts";
import { PLOT_WIDTH, renderPlotSvg } from "../../src/report/page/plotSvg.ts";
import { assertNoLiveMarkup, parseDocument, parseFragment } from "./dom.ts";
import { ctfRejectingWall, engineEntry } from "./dynamicFixture.ts";
import { fixture, wall } from "./fixture.ts";

function wallView(): DynamicView {
  const view = readDynamic(engineEntry(wall()).results);
  assert.ok(view !== undefined);
  return view;
}

function svgOf(markup: string): Element {
  const svg = parseFragment(markup).querySelector("svg");
  assert.ok(svg !== null, "the markup holds an <svg>");
  return svg;
}

/** Pixel position and value of each y-axis tick label, read from the SVG. */
function yTicks(svg: Element): { px: number; value: number }[] {
  const labels = Array.from(svg.querySelectorAll('g[aria-label="y-axis tick label"] text'));
  return labels.map((t) => {
    const match = /translate\(([-\d.]+),([-\d.]+)\)/.exec(t.getAttribute("transform") ?? "");
    return { px: Number(match?.[2]), value: Number((t.textContent ?? "").replace(MINUS, "-")) };
  });
}

/** Linear map from pixel y to data value fitted through the first and last y tick. */
function valueAt(svg: Element): (px: number) => number {
  const ticks = yTicks(svg);
  const a = ticks[0]!, b = ticks[ticks.length - 1]!;
  return (px) => a.value + ((px - a.px) * (b.value - a.value)) / (b.px - a.px);
}

Deno.test("dynamic plots are inline SVG with xmlns, a fixed width and nothing live or external", () => {
  const view = wallView();
  for (
    const markup of [
      responseFactorPlot(view, "p", SI_DISPLAY),
      ctsPlot(view, "p"),
      stepResponsePlot(view, "p", SI_DISPLAY),
    ]
  ) {
    const root = parseFragment(markup.markup);
    assertNoLiveMarkup(markup.markup, root);
    const svg = svgOf(markup.markup);
    assert.equal(svg.getAttribute("xmlns"), "http://www.w3.org/2000/svg");
    assert.equal(svg.getAttribute("width"), String(PLOT_WIDTH));
    assert.ok(svg.getAttribute("aria-label"));
    assert.equal(root.querySelectorAll("foreignObject, foreignobject, style, canvas, image, use").length, 0);
    assert.doesNotMatch(markup.markup, /href=|url\((?!#)|<script/i);
    assert.ok(
      svg.querySelectorAll('g[aria-label="x-axis label"] text, g[aria-label="y-axis label"] text').length >=
        2,
      "labelled axes",
    );
  }
});

Deno.test("dynamic plots are byte-identical when rendered twice", () => {
  const view = wallView();
  assert.equal(
    responseFactorPlot(view, "p", SI_DISPLAY).markup,
    responseFactorPlot(view, "p", SI_DISPLAY).markup,
  );
  assert.equal(ctsPlot(view, "p").markup, ctsPlot(view, "p").markup);
  assert.equal(
    stepResponsePlot(view, "p", SI_DISPLAY).markup,
    stepResponsePlot(view, "p", SI_DISPLAY).markup,
  );
});

Deno.test("renderPlotSvg() renames Plot's generated clip-path ids so output is stable", () => {
  // Plot numbers clip paths with a module-wide counter; two renders differ unless the ids are renamed.
  const spec = { height: 100, marks: [Plot.lineY([1, 3, 2], { clip: true })] };
  const a = renderPlotSvg(spec, "c-x-fig", "test").markup;
  const b = renderPlotSvg(spec, "c-x-fig", "test").markup;
  assert.equal(a, b);
  const svg = svgOf(a);
  const ids = Array.from(svg.querySelectorAll("[id]")).map((el) => el.getAttribute("id"));
  assert.ok(ids.length >= 1, "the clip path has an id");
  assert.ok(ids.every((id) => id?.startsWith("c-x-fig-")), ids.join(" "));
  const refs = a.match(/url\(#([^)]+)\)/g) ?? [];
  assert.ok(refs.length >= 1 && refs.every((r) => ids.some((id) => r === `url(#${id})`)), refs.join(" "));
});

Deno.test("ctsPlot() draws 24 bars summing to 100 % (identity Σ CTS = 1)", () => {
  // Σ CTS = Σ Y_P / U = 1: periodic response factors sum to U (Spitler & Fisher 1999, from memory).
  const view = wallView();
  const svg = svgOf(ctsPlot(view, "p").markup);
  const bars = Array.from(svg.querySelectorAll('g[aria-label="bar"] rect'));
  assert.equal(bars.length, 24);
  const at = valueAt(svg);
  const percent = bars.map((r) => {
    const y = Number(r.getAttribute("y")), h = Number(r.getAttribute("height"));
    return at(y) - at(y + h);
  });
  // Coordinates are kept to 0.01 px, so each bar is read to about 0.01 %.
  assert.ok(Math.abs(seriesSum(percent) - 100) < 0.3, `bars sum to ${seriesSum(percent)} %`);
  assert.ok(Math.abs(seriesSum(view.cts) - 1) < 1e-9);
});

Deno.test("stepResponsePlot() ends at U within the truncation residual (identity Σ Y_j = U)", () => {
  // Sum rule of response factors: Σ_j Y_j = U (Stephenson & Mitalas 1971; Hittle 1981, from memory).
  for (const view of [wallView(), readDynamic(engineEntry(ctfRejectingWall()).results)!]) {
    const steps = stepResponse(view.responseFactors.Y);
    const residual = Math.abs(steps[steps.length - 1]! - view.U) / view.U;
    assert.ok(
      residual <= view.responseFactors.truncationResidual * (1 + 1e-6) + 1e-12,
      `residual ${residual}`,
    );
    const svg = svgOf(stepResponsePlot(view, "p", SI_DISPLAY).markup);
    const path = svg.querySelector('g[aria-label="line"] path')?.getAttribute("d") ?? "";
    const lastY = Number(/,([-\d.]+)$/.exec(path)?.[1]);
    const ruleY = Number(
      svg.querySelector('g[aria-label="rule"][stroke="#a40000"] line')?.getAttribute("y1"),
    );
    const at = valueAt(svg);
    assert.ok(Math.abs(at(ruleY) - view.U) < 1e-3 * view.U, "reference line drawn at U");
    // The plot runs until the response is within 0.5 % of U, or for at most 720 h.
    const drawnEnd = at(lastY);
    assert.ok(drawnEnd <= view.U * 1.0001 && drawnEnd > 0.5 * view.U, `last point ${drawnEnd}, U ${view.U}`);
  }
});

Deno.test("renderPackage() keeps every element id unique with plots for each construction", () => {
  const doc = parseDocument(renderPackage(fixture()));
  const ids = Array.from(doc.querySelectorAll("[id]")).map((el) => el.getAttribute("id"));
  assert.equal(new Set(ids).size, ids.length);
  assert.equal(doc.querySelectorAll("figure.plot-figure svg").length, 3);
});
