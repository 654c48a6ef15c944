import assert from "node:assert/strict";
import { reviewOrder } from "../../src/review/orderRules.ts";
import { construction, hits, modelOf } from "./_project.ts";

const CONCRETE = "{ material: concrete-2200, thickness: 200 mm }";
const EPS = "{ material: eps-20, thickness: 100 mm }";
const WOOL = "{ material: mineral-wool-25, thickness: 60 mm }";
const BOARD = "{ material: gypsum-plasterboard-700, thickness: 12.5 mm }";

function orderRules(name: string, layers: readonly string[], prose = "", extra = ""): string[] {
  return reviewOrder(modelOf(prose + construction("W", name, layers, extra))).map((f) => f.rule);
}

// Threshold for "insulation": λ < 0.065 W/(m K) (from memory, usual definition) or an insulation class.

Deno.test("externally insulated (name or prose) with insulation inside the heaviest layer is reversed", () => {
  const found = reviewOrder(modelOf(construction("W", "Wall, externally insulated", [CONCRETE, EPS, BOARD])));
  assert.deepStrictEqual(hits(found, "layer-order-reversed"), ["layer-order-reversed@input.md:6:5"]);
  assert.deepStrictEqual(orderRules("Wall, externally insulated", [EPS, CONCRETE, BOARD]), []);
  assert.deepStrictEqual(orderRules("Wall", [CONCRETE, EPS, BOARD], "An ETICS on concrete.\n\n"), [
    "layer-order-reversed",
  ]);
  assert.deepStrictEqual(orderRules("Wall", [CONCRETE, EPS, BOARD]), []);
});

Deno.test("internally insulated with insulation outside the heaviest layer is reversed", () => {
  assert.deepStrictEqual(orderRules("Wall with internal insulation", [WOOL, CONCRETE, BOARD]), [
    "layer-order-reversed",
  ]);
  assert.deepStrictEqual(orderRules("Wall with internal insulation", [CONCRETE, WOOL, BOARD]), []);
  // Both words: ambiguous, no finding.
  assert.deepStrictEqual(
    orderRules("Wall, external insulation and internal insulation", [WOOL, CONCRETE, BOARD]),
    [],
  );
});

Deno.test("a wall whose inside layer is insulation with no lining gets a note; roofs and lined walls do not", () => {
  const found = reviewOrder(modelOf(construction("W", "Wall", [CONCRETE, WOOL])));
  assert.deepStrictEqual(found.map((f) => `${f.severity} ${f.rule}`), ["note insulation-exposed-inside"]);
  assert.deepStrictEqual(orderRules("Wall", [CONCRETE, WOOL, BOARD]), []);
  assert.deepStrictEqual(orderRules("Roof", [CONCRETE, WOOL], "", "heat-flow: upward\n"), []);
});
