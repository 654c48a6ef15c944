/**
 * The demo's section drawings use drafting conventions: a square tag with a leader for every layer (thin
 * layers labelled by leader), a hatch pattern per material family, studs drawn in the framed layer, the roof
 * as a vertical stack with its exterior face on top, face labels of our own, no circled numbers.
 * Expected layers, thicknesses and materials are those written in projects/demo (20-walls.md, 30-roof.md).
 */
import assert from "node:assert/strict";
import { loadProject } from "../../src/commands/loadProject.ts";
import type { Construction } from "../../src/project/model.ts";
import { SI_DISPLAY } from "../../src/report/page/displayUnits.ts";
import { renderSectionSvg } from "../../src/report/constructions/drawing/sectionSvg.ts";
import { parseFragment } from "./dom.ts";

const DEMO = new URL("../../projects/demo/", import.meta.url).pathname;

let cached: Promise<readonly Construction[]> | undefined;
function demoConstructions(): Promise<readonly Construction[]> {
  cached ??= (async () => {
    const loaded = await loadProject(DEMO);
    assert.ok(loaded.model !== undefined);
    return loaded.model.constructions;
  })();
  return cached;
}

async function drawing(id: string): Promise<Element> {
  const c = (await demoConstructions()).find((x) => x.id === id);
  assert.ok(c !== undefined, id);
  const svg = parseFragment(renderSectionSvg(c, SI_DISPLAY).markup).querySelector("svg");
  assert.ok(svg !== null);
  return svg;
}

const texts = (el: Element, selector = "text") =>
  Array.from(el.querySelectorAll(selector)).map((t) => t.textContent ?? "");

Deno.test("section drawing: every layer of every demo construction has a square tag, every family a key swatch", async () => {
  for (const c of await demoConstructions()) {
    const svg = await drawing(c.id);
    const tags = texts(svg, "g.layer-tag text");
    const keys = texts(svg, "g.hatch-key text.key-label");
    c.layers.forEach((_, i) => assert.ok(tags.includes(String(i + 1)), `${c.id}: tag ${i + 1}`));
    // One swatch per hatch pattern drawn (families of the layers and of the studs), plus the blank air layer.
    const air = svg.querySelectorAll("rect.layer-air").length > 0 ? 1 : 0;
    assert.equal(keys.length, svg.querySelectorAll("pattern").length + air, `${c.id}: ${keys.join(" | ")}`);
    // Square tags: one rect per tag, no circles with numbers.
    assert.equal(svg.querySelectorAll("g.layer-tag rect").length, svg.querySelectorAll("g.layer-tag").length);
    assert.equal(svg.querySelectorAll("g.layer-tag circle").length, 0);
    assert.ok(!Array.from(svg.querySelectorAll("circle")).some((el) => Number(el.getAttribute("r")) >= 5));
  }
});

Deno.test("section drawing: thin layers (12.5 mm board, 1.5 mm membrane, 4 mm felt) carry leader labels", async () => {
  // EW-1 layer 5: gypsum plasterboard 12.5 mm; RF-1 layer 1: EPDM 1.5 mm, layer 3: bitumen felt 4 mm.
  const wall = texts(await drawing("EW-1"), "g.leader-label text");
  assert.ok(wall.some((t) => t === "5: 12.5\u2009mm"), wall.join(" | "));
  const roof = texts(await drawing("RF-1"), "g.leader-label text");
  assert.ok(roof.some((t) => t.startsWith("1.5\u2009mm") && t.includes("EPDM")), roof.join(" | "));
  assert.ok(roof.some((t) => t.startsWith("4\u2009mm") && t.includes("felt")), roof.join(" | "));
});

Deno.test("section drawing: one hatch pattern per material family, ids prefixed by the construction", async () => {
  const expected: Record<string, readonly string[]> = {
    // Thin-coat render, wood-fibre and glass-wool insulation, softwood studs, OSB and plasterboard.
    "EW-1": ["plaster", "insulation", "timber", "board"],
    // Render, EPS, reinforced concrete, gypsum plaster.
    "EW-2": ["plaster", "insulation", "concrete"],
    // Brick outer leaf and medium-density concrete block.
    "EW-4": ["masonry"],
    // EPDM and bitumen felt, PIR, concrete deck.
    "RF-1": ["membrane", "insulation", "concrete"],
  };
  const seen = new Set<string>();
  for (const [id, kinds] of Object.entries(expected)) {
    const svg = await drawing(id);
    const patterns = Array.from(svg.querySelectorAll("defs pattern"));
    for (const kind of kinds) {
      assert.ok(patterns.some((p) => p.getAttribute("class") === `hatch-${kind}`), `${id}: hatch-${kind}`);
    }
    for (const p of patterns) {
      const pid = p.getAttribute("id") ?? "";
      assert.ok(pid.startsWith(`hatch-${id.replace("-", "_2d_")}-`), pid);
      assert.ok(!seen.has(pid), `pattern id ${pid} unique`);
      seen.add(pid);
    }
    const refs = Array.from(svg.querySelectorAll("[fill^='url(#']")).map((el) =>
      (el.getAttribute("fill") ?? "").slice(5, -1)
    );
    for (const ref of refs) assert.ok(patterns.some((p) => p.getAttribute("id") === ref), `${id}: ${ref}`);
  }
  // The EW-4 cavity is a resistive layer: blank, labelled "air".
  assert.ok(texts(await drawing("EW-4"), "text.air-label").includes("air"));
});

Deno.test("section drawing: the framed layer of EW-1 shows its timber studs", async () => {
  const svg = await drawing("EW-1");
  const layer3 = svg.querySelectorAll("rect.layer")[2];
  assert.ok(layer3 !== undefined);
  const x = Number(layer3.getAttribute("x"));
  const w = Number(layer3.getAttribute("width"));
  const studs = Array.from(svg.querySelectorAll("g.stud rect"));
  assert.ok(studs.length >= 1);
  for (const s of studs) {
    assert.equal(Number(s.getAttribute("x")), x);
    assert.equal(Number(s.getAttribute("width")), w);
    assert.match(s.getAttribute("fill") ?? "", /-timber\)$/);
  }
});

Deno.test("section drawing: the roof (heat flow upward) is a vertical stack, exterior face on top", async () => {
  const svg = await drawing("RF-1");
  assert.match(svg.getAttribute("class") ?? "", /section-stack/);
  const rects = Array.from(svg.querySelectorAll("rect.layer"));
  assert.equal(rects.length, 4);
  const xs = new Set(rects.map((r) => r.getAttribute("x")));
  assert.equal(xs.size, 1, "layers share one x: stacked");
  const ys = rects.map((r) => Number(r.getAttribute("y")));
  for (let i = 1; i < ys.length; i++) assert.ok((ys[i] ?? 0) > (ys[i - 1] ?? 0), "layer 1 (EPDM) on top");
  // 200 mm PIR and 225 mm concrete to scale: heights 200 : 225.
  const h = rects.map((r) => Number(r.getAttribute("height")));
  assert.ok(Math.abs((h[3] ?? 0) / (h[1] ?? 1) - 225 / 200) < 0.01);
  const faceY = (t: string) =>
    Number(
      Array.from(svg.querySelectorAll("text.face-label")).find((e) => e.textContent === t)?.getAttribute("y"),
    );
  assert.ok(faceY("exterior face") < faceY("interior face"));
});

Deno.test("section drawing: walls name their faces, no OUTSIDE/INSIDE strip labels", async () => {
  for (const c of await demoConstructions()) {
    const all = texts(await drawing(c.id));
    assert.ok(!all.includes("OUTSIDE") && !all.includes("INSIDE"), c.id);
    assert.ok(all.includes("exterior face") && all.includes("interior face"), c.id);
  }
});

Deno.test("section drawing: a floor (heat flow downward) is stacked with its exterior face on top too, faces noted", async () => {
  const roof = (await demoConstructions()).find((x) => x.id === "RF-1");
  assert.ok(roof !== undefined);
  // The demo roof's layers read as a floor: same build-up, heat flow downward (exterior = the underside).
  const floor: Construction = { ...roof, id: "FL-1", heatFlow: "downward" };
  const svg = parseFragment(renderSectionSvg(floor, SI_DISPLAY).markup).querySelector("svg");
  assert.ok(svg !== null);
  const rects = Array.from(svg.querySelectorAll("rect.layer"));
  const ys = rects.map((r) => Number(r.getAttribute("y")));
  for (let i = 1; i < ys.length; i++) {
    assert.ok((ys[i] ?? 0) > (ys[i - 1] ?? 0), "layer 1 (the exterior) on top");
  }
  const faceY = (t: string) =>
    Number(
      Array.from(svg.querySelectorAll("text.face-label")).find((e) => e.textContent === t)?.getAttribute("y"),
    );
  assert.ok(faceY("exterior face") < faceY("interior face"));
  const notes = texts(svg, "text.face-note");
  assert.ok(notes.some((n) => /underside in place/.test(n)), notes.join(" | "));
  assert.ok(notes.some((n) => /floor surface/.test(n)), notes.join(" | "));
});
