/**
 * A design day's outside film changes only the air-to-air chain: the surface-to-surface chain holds no film, so
 * the construction's own surface-to-surface root analysis is reused (src/engine/analyse.ts, `sameLayers`). The
 * reference of each check is a fresh analysis of the same construction at the same film, computed without reuse:
 * the reused analysis must equal it bit for bit (deepStrictEqual compares numbers with Object.is).
 */
import assert from "node:assert/strict";
import {
  analyseConstruction,
  constructionChecksJson,
  constructionDynamicJson,
  type DynamicAnalysis,
} from "../../src/engine/mod.ts";
import type { ConstructionInput } from "../../src/engine/layer.ts";
import { HEAVY_WALL, LIGHT_WALL, massive } from "./walls.ts";

function analysed(
  c: ConstructionInput,
  timestepS: number,
  reuse?: DynamicAnalysis,
  from = c,
): DynamicAnalysis {
  const a = analyseConstruction(
    c,
    timestepS,
    reuse === undefined ? {} : { sameLayers: { input: from, analysis: reuse } },
  );
  if (a.kind !== "analysis") throw new Error(a.message);
  return a;
}

Deno.test("an analysis at another outside film reuses the construction's surface-to-surface analysis, bit for bit", () => {
  // Outside films 0.02 and 0.07 m²·K/W: values a design day's wind speed gives (ISO 6946 Annex C form; from memory).
  for (const [name, wall] of [["heavy wall", HEAVY_WALL], ["light wall", LIGHT_WALL]] as const) {
    for (const timestepS of [3600, 900]) {
      const own = analysed(wall, timestepS);
      for (const film of [0.02, 0.07]) {
        const atFilm = { ...wall, outsideResistance: film };
        const reused = analysed(atFilm, timestepS, own, wall);
        const fresh = analysed(atFilm, timestepS);
        const at = `${name}, ${timestepS} s, R_se ${film}`;
        assert.equal(reused.surfaceToSurface, own.surfaceToSurface, `${at}: not reused`);
        assert.deepStrictEqual(reused, fresh, at);
        // What results.json and the package print of it, text for text.
        assert.equal(
          JSON.stringify([constructionDynamicJson(reused), constructionChecksJson("w", reused)]),
          JSON.stringify([constructionDynamicJson(fresh), constructionChecksJson("w", fresh)]),
          at,
        );
      }
    }
  }
});

Deno.test("the surface-to-surface analysis is not reused for other layers or another time step", () => {
  // A thicker inner leaf (0.2 m instead of 0.15 m of dense concrete): other poles, so a fresh analysis.
  const thicker: ConstructionInput = {
    ...HEAVY_WALL,
    layers: HEAVY_WALL.layers.map((l, i) => (i === 4 ? massive(0.2, 1.65, 2300, 1000) : l)),
  };
  const own = analysed(HEAVY_WALL, 3600);
  const other = analysed(thicker, 3600, own, HEAVY_WALL);
  assert.notEqual(other.surfaceToSurface, own.surfaceToSurface);
  assert.deepStrictEqual(other, analysed(thicker, 3600));
  // The same layers given as a copy (another array, equal values) are the same layers.
  const copy = { ...HEAVY_WALL, layers: HEAVY_WALL.layers.map((l) => ({ ...l })), outsideResistance: 0.02 };
  assert.equal(analysed(copy, 3600, own, HEAVY_WALL).surfaceToSurface, own.surfaceToSurface);
  // Another time step: the own analysis at 1 h is no use at 15 min.
  const quarter = analysed({ ...HEAVY_WALL, outsideResistance: 0.02 }, 900, own);
  assert.notEqual(quarter.surfaceToSurface, own.surfaceToSurface);
  assert.deepStrictEqual(quarter, analysed({ ...HEAVY_WALL, outsideResistance: 0.02 }, 900));
});
