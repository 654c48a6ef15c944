/**
 * The demo package's plots: daily plots on a 0–24 h axis, axis titles without appended arrows, lines named
 * at their ends instead of caption legends, the tornado chart labelled by material and property, response
 * factors on a linear scale. Surface ids and materials are those of projects/demo (40-scenarios.md).
 */
import assert from "node:assert/strict";
import { join } from "node:path";
import { runBuild } from "../../src/commands/build.ts";
import * as Plot from "@observablehq/plot";
import { namePlaceholder, renderPlotSvg } from "../../src/report/page/plotSvg.ts";
import { assertNoLiveMarkup, parseDocument, parseFragment } from "./dom.ts";
import { HOSTILE } from "./fixture.ts";

const DEMO = new URL("../../projects/demo/", import.meta.url).pathname;

let cached: Promise<Document> | undefined;
function built(): Promise<Document> {
  cached ??= (async () => {
    const out = join(await Deno.makeTempDir(), "out");
    assert.equal(await runBuild({ project: DEMO, out }, { stdout: () => {}, stderr: () => {} }), 0);
    return parseDocument(Deno.readTextFileSync(join(out, "package.html")));
  })();
  return cached;
}

const plots = (doc: Document, labelStart: string) =>
  Array.from(doc.querySelectorAll("svg.plot")).filter((p) =>
    (p.getAttribute("aria-label") ?? "").startsWith(labelStart)
  );
const textsOf = (el: Element, selector = "text") =>
  Array.from(el.querySelectorAll(selector)).map((t) => (t.textContent ?? "").replace(/[\u2068\u2069]/g, ""));

Deno.test("plots: every daily plot runs from 00:00 to 24:00", async () => {
  const doc = await built();
  const daily = [
    "Outdoor, indoor and sol-air",
    "Inside heat flux of each",
    "Heat gain stacked",
    "Total heat gain and total cooling load",
    "Heat gain and cooling load of each",
  ].flatMap((l) => plots(doc, l));
  assert.ok(daily.length >= 5);
  for (const p of daily) {
    const ticks = textsOf(p, "g[aria-label='x-axis tick label'] text");
    assert.equal(ticks[0], "00:00", p.getAttribute("aria-label") ?? "");
    assert.equal(ticks[ticks.length - 1], "24:00", p.getAttribute("aria-label") ?? "");
  }
});

Deno.test("plots: an x-axis title on every plot and no arrows appended to axis titles", async () => {
  const doc = await built();
  for (const p of Array.from(doc.querySelectorAll("svg.plot"))) {
    const name = p.getAttribute("aria-label") ?? "";
    const x = textsOf(p, "g[aria-label='x-axis label'] text").join("");
    assert.ok(x.length > 3, `${name}: x-axis title`);
    for (const t of textsOf(p)) assert.doesNotMatch(t, /[←↑→↓]/, `${name}: ${t}`);
  }
});

Deno.test("plots: lines are named at their ends, not in caption legends", async () => {
  const doc = await built();
  // Surfaces of the demo's design-day scenario (projects/demo/40-scenarios.md).
  const surfaces = ["ew1-south", "ew1-west", "ew2-east", "ew3-north", "ew4-west", "roof"];
  const solAir = plots(doc, "Outdoor, indoor and sol-air")[0];
  assert.ok(solAir !== undefined);
  const names = textsOf(solAir);
  for (const n of [...surfaces, "outdoor air", "indoor air"]) assert.ok(names.includes(n), n);
  const flux = plots(doc, "Inside heat flux of each")[0];
  assert.ok(flux !== undefined);
  for (const n of surfaces) assert.ok(textsOf(flux).includes(n), n);
  const rf = plots(doc, "Response factors")[0];
  assert.ok(rf !== undefined);
  for (const n of ["X (outside)", "Y (cross)", "Z (inside)"]) assert.ok(textsOf(rf).includes(n), n);
  for (const p of [solAir, flux, rf]) {
    const figure = p.closest("figure");
    assert.equal(figure?.querySelectorAll(".legend, .key").length, 0, p.getAttribute("aria-label") ?? "");
  }
});

Deno.test("plots: the tornado chart labels each bar by material and property", async () => {
  const doc = await built();
  const tornado = plots(doc, "Sensitivity of the peak heat gain")[0];
  assert.ok(tornado !== undefined);
  const ticks = textsOf(tornado, "g[aria-label='y-axis tick label'] text");
  assert.ok(ticks.length >= 3);
  for (const t of ticks) {
    assert.match(t, /^.+: (conductivity λ|density ρ|specific heat c|thermal resistance R)/, t);
  }
  // The 200 mm PIR board dominates the roof's peak gain (projects/demo/30-roof.md).
  assert.equal(ticks[0], "pir-board-45: conductivity λ");
  assert.ok(!textsOf(tornado).includes("Rank"));
});

Deno.test("plots: response factors use a linear vertical scale by default", async () => {
  const doc = await built();
  const rf = plots(doc, "Response factors")[0];
  assert.ok(rf !== undefined);
  const ys = Array.from(rf.querySelectorAll("g[aria-label='y-axis tick label'] text"));
  const values = ys.map((t) => Number((t.textContent ?? "").replace("\u2212", "-")));
  const steps = values.slice(1).map((v, i) => v - (values[i] ?? 0));
  assert.ok(steps.length >= 2);
  for (const s of steps) {
    assert.ok(Math.abs(s - (steps[0] ?? 0)) < 1e-9, `even tick steps ${values.join(", ")}`);
  }
});

Deno.test("plots: hostile surface names at line ends are escaped text", () => {
  const names = [HOSTILE.svg, HOSTILE.attr, HOSTILE.script];
  const markup = renderPlotSvg(
    {
      x: { label: "t" },
      marks: [
        Plot.text(names.map((_, i) => ({ x: i, y: i, n: namePlaceholder(i) })), {
          x: "x",
          y: "y",
          text: "n",
        }),
      ],
    },
    "hostile",
    "hostile names",
    names,
  ).markup;
  const body = parseFragment(markup);
  assertNoLiveMarkup(markup, body);
  const texts = Array.from(body.querySelectorAll("text")).map((t) => t.textContent ?? "");
  for (const n of names) assert.ok(texts.includes(`\u2068${n}\u2069`), n);
});

Deno.test("plots: y-axis titles run along the axis (rotated beside the ticks), not at the top left", async () => {
  const doc = await built();
  for (const p of Array.from(doc.querySelectorAll("svg.plot"))) {
    const title = p.querySelector("g[aria-label='y-axis label'] text");
    if (title === null) continue; // the tornado chart names its bars instead
    assert.match(title.getAttribute("transform") ?? "", /rotate\(-90\)/, p.getAttribute("aria-label") ?? "");
  }
});

Deno.test("plots: stacked gain, monthly and cooling-load plots name their series in the plot, no caption legends", async () => {
  const doc = await built();
  // Surfaces of the demo's design-day scenario (projects/demo/40-scenarios.md).
  const surfaces = ["ew1-south", "ew1-west", "ew2-east", "ew3-north", "ew4-west", "roof"];
  const stacked = plots(doc, "Heat gain stacked")[0];
  assert.ok(stacked !== undefined);
  for (const n of [...surfaces, "total"]) assert.ok(textsOf(stacked).includes(n), `stacked: ${n}`);
  const total = plots(doc, "Total heat gain and total cooling load")[0];
  assert.ok(total !== undefined);
  for (const n of ["heat gain", "cooling load"]) assert.ok(textsOf(total).includes(n), `cooling total: ${n}`);
  const bySurface = plots(doc, "Heat gain and cooling load of each")[0];
  assert.ok(bySurface !== undefined);
  for (const n of surfaces) assert.ok(textsOf(bySurface).includes(n), `cooling by surface: ${n}`);
  const monthly = plots(doc, "Monthly heat gain and heat loss")[0];
  assert.ok(monthly !== undefined);
  for (const n of ["heat gain", "heat loss"]) assert.ok(textsOf(monthly).includes(n), `monthly: ${n}`);
  for (const p of [stacked, total, bySurface, monthly]) {
    const figure = p.closest("figure");
    assert.equal(
      figure?.querySelectorAll(".legend, .legend-entry, svg.swatch").length,
      0,
      p.getAttribute("aria-label") ?? "",
    );
  }
});
