/** Valid constructions at valid time steps build without a failed check (a tool that cries wolf is not used). */
import assert from "node:assert/strict";
import { constructionDynamicJson, type ConstructionInput } from "../../src/engine/mod.ts";
import { analyse, failedChecks } from "./analysed.ts";
import { CONCRETE, EPS, FILMS, massive } from "./walls.ts";

// Invented but ordinary wall and roof build-ups (typical property values, common practice, no source).
const BRICK = massive(0.215, 0.77, 1700, 800);
const MINERAL_WOOL = massive(0.12, 0.035, 30, 1030);
const TIMBER = massive(0.1, 0.13, 500, 1600);

/** A warm-deck roof of the demo's kind: membrane, 200 mm PIR, felt, 225 mm concrete; films 0.04 / 0.10. */
const WARM_DECK_ROOF: ConstructionInput = {
  layers: [
    massive(0.0015, 0.25, 1150, 1000),
    massive(0.2, 0.03, 45, 1470),
    massive(0.004, 0.19, 960, 840),
    massive(0.225, 2.3, 2300, 1000),
  ],
  outsideResistance: 0.04,
  insideResistance: 0.1,
};

Deno.test("a warm-deck roof at 5, 10 and 15 min has no failed check; an unfit polynomial CTF is a method note", () => {
  for (const step of [300, 600, 900]) {
    const a = analyse(WARM_DECK_ROOF, step);
    assert.deepEqual(failedChecks(a), [], `${step} s`);
    const json = constructionDynamicJson(a);
    for (
      const [id, ctf] of [["ctf-modal-form", json.ctf], ["ctf-modal-form-surface", json.surfaceToSurface.ctf]]
    ) {
      // Either the polynomial is published, or a method note says why the modal form is used.
      const note = a.methodNotes.find((n) => n.id === id);
      assert.equal(ctf === null, note !== undefined, `${step} s ${id}`);
      if (note !== undefined) {
        assert.match(note.text, /^Method choice: modal form used/);
        assert.ok(note.figures.some((f) => !f.pass), "the note names the figure over its limit");
      }
    }
  }
});

Deno.test("ordinary two-layer walls at a 5 min step build with no failed check", () => {
  const walls: ConstructionInput[] = [
    { layers: [EPS, CONCRETE], ...FILMS },
    { layers: [CONCRETE, EPS], ...FILMS },
    { layers: [BRICK, MINERAL_WOOL], ...FILMS },
    { layers: [MINERAL_WOOL, TIMBER], ...FILMS },
  ];
  for (const [i, wall] of walls.entries()) {
    assert.deepEqual(failedChecks(analyse(wall, 300)), [], `wall ${i}`);
  }
});

Deno.test("a single 1.2 to 2 m stone or concrete layer at 1 h builds with no failed check", () => {
  // Stone ρ 2600 kg/m³, c 900 J/(kg K), λ 2.3; dense concrete λ 1.65, ρ 2300, c 1000 (typical, common practice).
  for (const thickness of [1.2, 1.5, 2.0]) {
    for (const layer of [massive(thickness, 2.3, 2600, 900), massive(thickness, 1.65, 2300, 1000)]) {
      const a = analyse({ layers: [layer], ...FILMS }, 3600);
      assert.deepEqual(failedChecks(a), [], `${thickness} m`);
    }
  }
});
