import assert from "node:assert/strict";
import { SI_DISPLAY } from "../../src/report/page/displayUnits.ts";
import { renderSectionSvg } from "../../src/report/constructions/drawing/sectionSvg.ts";
import { assertNoLiveMarkup, parseFragment } from "./dom.ts";
import { HOSTILE, wall } from "./fixture.ts";

function layerRects(svg: Element): Element[] {
  return Array.from(svg.querySelectorAll("rect.layer"));
}

Deno.test("renderSectionSvg() draws massive layers to scale and gaps at nominal width", () => {
  const svg = parseFragment(renderSectionSvg(wall(), SI_DISPLAY).markup).querySelector("svg");
  assert.ok(svg !== null);
  const widths = layerRects(svg).map((r) => Number(r.getAttribute("width")));
  assert.equal(widths.length, 5);
  const [render, eps, gap, block, plaster] = widths as [number, number, number, number, number];
  // Thickness ratios of the invented wall, by hand: 120/15 = 8, 175/12.5 = 14.
  assert.ok(Math.abs(eps / render - 8) < 0.02, `EPS/render width ratio ${eps / render}`);
  assert.ok(Math.abs(block / plaster - 14) < 0.05, `block/plaster width ratio ${block / plaster}`);
  assert.equal(gap, 10);
  const gapRect = layerRects(svg)[2];
  assert.equal(gapRect?.getAttribute("stroke-dasharray"), "4 3");
});

Deno.test("renderSectionSvg() names the exterior face left of the interior face, tags layers, marks not to scale", () => {
  const markup = renderSectionSvg(wall(), SI_DISPLAY).markup;
  const svg = parseFragment(markup).querySelector("svg");
  assert.ok(svg !== null);
  assert.equal(svg.getAttribute("xmlns"), "http://www.w3.org/2000/svg");
  const texts = Array.from(svg.querySelectorAll("text"));
  const xOf = (label: string) => Number(texts.find((t) => t.textContent === label)?.getAttribute("x"));
  assert.ok(xOf("exterior face") < xOf("interior face"));
  const tags = Array.from(svg.querySelectorAll("g.layer-tag text")).map((t) => t.textContent);
  // Once above the drawing; the key below names the hatch families, not the layers again.
  assert.deepEqual(tags, ["1", "2", "3", "4", "5"]);
  // Overall massive thickness by hand: 15 + 120 + 175 + 12.5 = 322.5 mm.
  assert.ok(texts.some((t) => t.textContent?.startsWith("322.5\u2009mm overall")));
  assert.ok(texts.some((t) => t.textContent?.includes("NOT TO SCALE")));
  const ids = Array.from(svg.querySelectorAll("[id]")).map((e) => e.getAttribute("id") ?? "");
  assert.ok(ids.length > 0 && ids.every((id) => id.startsWith("hatch-EW_2d_9-")), ids.join(" "));
});

Deno.test("renderSectionSvg() escapes hostile construction ids", () => {
  const c = { ...wall(), id: HOSTILE.svg + HOSTILE.script };
  const markup = renderSectionSvg(c, SI_DISPLAY).markup;
  const body = parseFragment(markup);
  assertNoLiveMarkup(markup, body);
  assert.equal(body.querySelectorAll("svg").length, 1);
  assert.equal(body.querySelectorAll("a").length, 0);
});
