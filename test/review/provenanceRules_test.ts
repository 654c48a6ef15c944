import assert from "node:assert/strict";
import { reviewProvenance } from "../../src/review/provenanceRules.ts";
import { construction, material, modelOf } from "./_project.ts";

const M =
  "id: m\nname: Board\nconductivity: 0.04 W/(m K)\ndensity: 150 kg/m^3\nspecific-heat: 2100 J/(kg K)\n";

Deno.test("a project material without source is a warning at its block; with one, nothing", () => {
  const found = reviewProvenance(modelOf(material(M)));
  assert.deepStrictEqual(found.map((f) => `${f.severity} ${f.rule} ${f.at.line}`), [
    "warning source-missing 2",
  ]);
  assert.deepStrictEqual(reviewProvenance(modelOf(material(`${M}source: EN 13171 declaration`))), []);
});

Deno.test("an inline layer without source: warning, or a note when the prose above cites it", () => {
  const layers = [
    "{ material: concrete-2200, thickness: 200 mm }",
    "{ name: cavity, resistance: 0.18 m^2 K/W }",
  ];
  const extra = "heat-flow: horizontal\ninside-surface-resistance: 0.13 m^2 K/W\n" +
    "outside-surface-resistance: 0.04 m^2 K/W\ntimestep: 1 h\n";
  const bare = reviewProvenance(modelOf(construction("W", "Wall", layers, extra)));
  assert.deepStrictEqual(bare.map((f) => `${f.severity} ${f.rule}`), ["warning source-missing"]);
  const prose = "The cavity is taken as 0.18 m² K/W from ISO 6946 Table 8.\n\n";
  const cited = reviewProvenance(modelOf(prose + construction("W", "Wall", layers, extra)));
  assert.deepStrictEqual(cited.map((f) => `${f.severity} ${f.rule}`), ["note source-in-prose-only"]);
  const vague = "The cavity is as found.\n\n";
  const notCited = reviewProvenance(modelOf(vague + construction("W", "Wall", layers, extra)));
  assert.deepStrictEqual(notCited.map((f) => f.rule), ["source-missing"]);
});

Deno.test("one note per default in use, at the assumption's position, with its source", () => {
  const model = modelOf(construction("W", "Wall", ["{ material: concrete-2200, thickness: 200 mm }"]));
  const defaults = model.assumptions.filter((a) => a.id.startsWith("default:"));
  // heat-flow, R_si, R_se and timestep are not given: four defaults.
  assert.equal(defaults.length, 4);
  const found = reviewProvenance(model);
  assert.deepStrictEqual(found.map((f) => f.value), defaults.map((a) => a.id));
  assert.ok(found.every((f) => f.severity === "note" && f.rule === "default-used"));
  assert.deepStrictEqual(found[0]?.at, { file: "input.md", line: 2, col: 1 });
  assert.ok(found.some((f) => /ISO 6946:2017, Table 7/.test(f.source ?? "")));
});
