import assert from "node:assert/strict";
import { LIBRARY_MATERIALS } from "../../src/materials/library.ts";
import { reviewLayers } from "../../src/review/layerRules.ts";
import { reviewMaterials } from "../../src/review/materialRules.ts";
import { construction, hits, modelOf } from "./_project.ts";

function layerRules(layers: readonly string[], extra = "heat-flow: horizontal\n"): string[] {
  return reviewLayers(modelOf(construction("W", "Wall", layers, extra))).map((f) => f.rule);
}

Deno.test("masonry leaf thinner than 5 mm (common practice, no source) is flagged at the layer", () => {
  assert.deepStrictEqual(layerRules(["{ material: concrete-2200, thickness: 5 mm }"]), []);
  const found = reviewLayers(
    modelOf(construction("W", "Wall", ["{ material: concrete-2200, thickness: 0.2 mm }"])),
  );
  assert.deepStrictEqual(hits(found, "masonry-layer-thin"), ["masonry-layer-thin@input.md:5:5"]);
  assert.equal(found[0]?.value, "d = 0.2 mm");
  // Without a class the name decides: "brick" is masonry, "render" is not.
  const inline = (name: string) =>
    `{ name: ${name}, thickness: 4 mm, conductivity: 0.8 W/(m K), density: 1800 kg/m^3, specific-heat: 900 J/(kg K), source: t }`;
  assert.deepStrictEqual(layerRules([inline("brick slip")]), ["masonry-layer-thin"]);
  assert.deepStrictEqual(layerRules([inline("thin render")]), []);
});

Deno.test("single layer R > 10 m²K/W (common practice, no source; R-19 IP = 3.35 m²K/W)", () => {
  assert.deepStrictEqual(layerRules(["{ name: batt, resistance: 10 m^2 K/W, source: t }"]), []);
  assert.deepStrictEqual(layerRules(["{ name: batt R-19, resistance: 19 m^2 K/W, source: t }"]), [
    "layer-resistance-large",
  ]);
  // mineral-wool-25 has λ 0.035 W/(m K): 340 mm gives R 9.7, 360 mm gives R 10.3.
  assert.deepStrictEqual(layerRules(["{ material: mineral-wool-25, thickness: 340 mm }"]), []);
  assert.deepStrictEqual(layerRules(["{ material: mineral-wool-25, thickness: 360 mm }"]), [
    "layer-resistance-large",
  ]);
});

Deno.test("a layer named like a surface film while R_si/R_se apply (ISO 6946:2017 Table 7 values 0.04/0.10/0.13/0.17)", () => {
  const wall = "{ material: concrete-2200, thickness: 200 mm }";
  const film = "{ name: inside surface resistance, resistance: 0.13 m^2 K/W, source: ISO 6946 }";
  const found = reviewLayers(modelOf(construction("W", "Wall", [wall, film])));
  assert.deepStrictEqual(hits(found, "surface-resistance-twice"), ["surface-resistance-twice@input.md:6:5"]);
  assert.match(found[0]?.message ?? "", /conventional surface-resistance value/);
  // Outside: "Rse" at the first layer with the default R_se 0.04.
  assert.deepStrictEqual(layerRules(["{ name: Rse, resistance: 0.04 m^2 K/W, source: t }", wall]), [
    "surface-resistance-twice",
  ]);
  // The hint no longer offers a zero surface resistance: the reader refuses R below 0.01 m²K/W.
  assert.doesNotMatch(found[0]?.hint ?? "", /resistance: 0/);
  // The value alone does not count: a cavity of 0.13, or a membrane called "film".
  assert.deepStrictEqual(layerRules([wall, "{ name: cavity, resistance: 0.13 m^2 K/W, source: t }"]), []);
  assert.deepStrictEqual(
    layerRules([wall, "{ name: vapour control film, resistance: 0.01 m^2 K/W, source: t }"]),
    [],
  );
});

Deno.test("air layers: R within 0–0.23 m²K/W (ISO 6946:2017 Table 8, from memory)", () => {
  assert.deepStrictEqual(layerRules(["{ name: cavity, resistance: 0.23 m^2 K/W, source: t }"]), []);
  assert.deepStrictEqual(layerRules(["{ name: cavity, resistance: 0.24 m^2 K/W, source: t }"]), [
    "resistance-outside-class",
  ]);
});

Deno.test("no false alarms on the built-in library: every entry, 100 mm thick, gives no finding", () => {
  const layers = LIBRARY_MATERIALS.map((m) =>
    "resistance" in m ? `{ material: ${m.id} }` : `{ material: ${m.id}, thickness: 100 mm }`
  );
  const half = Math.ceil(layers.length / 2);
  const md = construction("A", "Library A", layers.slice(0, half)) +
    construction("B", "Library B", layers.slice(half));
  const model = modelOf(md);
  assert.equal(model.materials.length, LIBRARY_MATERIALS.length);
  assert.deepStrictEqual([...reviewMaterials(model), ...reviewLayers(model)].map((f) => f.message), []);
});
