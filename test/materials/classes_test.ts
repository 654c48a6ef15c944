import assert from "node:assert/strict";
import { findMaterialClass, isWithinRange, MATERIAL_CLASSES } from "../../src/materials/classes.ts";

Deno.test("MATERIAL_CLASSES ids are unique and kebab-case, with sources", () => {
  const seen = new Set<string>();
  for (const c of MATERIAL_CLASSES) {
    assert.match(c.id, /^[a-z0-9]+(-[a-z0-9]+)*$/);
    assert.ok(!seen.has(c.id), `class "${c.id}" appears twice`);
    seen.add(c.id);
    assert.ok(c.source.trim().length > 0, `class "${c.id}" has no source`);
  }
});

Deno.test("MATERIAL_CLASSES envelopes are ordered, finite and positive", () => {
  for (const c of MATERIAL_CLASSES) {
    const ranges = c.kind === "massive" ? [c.conductivity, c.density, c.specificHeat] : [c.resistance];
    for (const r of ranges) {
      assert.ok(Number.isFinite(r.min) && Number.isFinite(r.max), `class "${c.id}"`);
      assert.ok(r.min <= r.max, `class "${c.id}" has min ${r.min} > max ${r.max}`);
      assert.ok(c.kind === "resistive" ? r.min >= 0 : r.min > 0, `class "${c.id}" has min ${r.min}`);
    }
  }
});

/** Rows read in secondary copies of the named tables: [class, λ W/(m K), ρ kg/m^3, c J/(kg K), source]. */
const ANCHOR_ROWS: ReadonlyArray<readonly [string, number, number, number, string]> = [
  ["steel", 45, 7800, 480, "CIBSE Guide A Table 3.36, steel (secondary copy)"],
  ["steel", 50, 7800, 450, "prEN 12524 design-value table, steel (secondary copy)"],
  ["stainless-steel", 16, 8000, 480, "CIBSE Guide A Table 3.36, stainless steel 20 % Ni (secondary copy)"],
  ["stainless-steel", 17, 7900, 460, "prEN 12524 design-value table, stainless steel (secondary copy)"],
  ["aluminium", 230, 2700, 880, "CIBSE Guide A Table 3.36, aluminium (secondary copy)"],
  ["aluminium", 160, 2800, 880, "prEN 12524 design-value table, aluminium Si alloys (secondary copy)"],
  ["copper", 384, 8600, 390, "CIBSE Guide A Table 3.36, copper (secondary copy)"],
  ["copper", 380, 8900, 380, "prEN 12524 design-value table, copper (secondary copy)"],
  ["zinc", 113, 7000, 390, "CIBSE Guide A Table 3.36, zinc (secondary copy)"],
  ["lead", 35, 11340, 130, "CIBSE Guide A Table 3.36, lead (secondary copy)"],
  ["glass", 1.05, 2500, 840, "CIBSE Guide A Table 3.36, glass solid soda-lime (secondary copy)"],
  ["glass", 1.0, 2500, 750, "prEN 12524 design-value table, soda lime glass (secondary copy)"],
  ["cellular-glass", 0.048, 140, 840, "CIBSE Guide A Table 3.36, glass cellular sheet (secondary copy)"],
  ["bitumen-asphalt", 0.19, 960, 840, "CIBSE Guide A Table 3.36, roofing felt (secondary copy)"],
  ["bitumen-asphalt", 1.15, 2330, 840, "CIBSE Guide A Table 3.36, asphalt roofing mastic (secondary copy)"],
  ["bitumen-asphalt", 0.2, 1000, 1700, "CIBSE Guide A Table 3.36, bitumen insulation (secondary copy)"],
  ["ceramic-tile", 1.4, 2500, 840, "CIBSE Guide A Table 3.36, ceramic glazed (secondary copy)"],
  ["carpet-linoleum", 0.19, 1200, 1470, "CIBSE Guide A Table 3.36, linoleum (secondary copy)"],
  ["polyurethane-phenolic", 0.03, 45, 1470, "CIBSE Guide A Table 3.37, polyisocyanate (secondary copy)"],
  ["polyurethane-phenolic", 0.028, 30, 1470, "CIBSE Guide A Table 3.37, polyurethane (secondary copy)"],
  ["plastics-rubber", 0.17, 1390, 900, "prEN 12524 design-value table, PVC rigid (secondary copy)"],
  ["plastics-rubber", 0.2, 1200, 1200, "prEN 12524 design-value table, polycarbonates (secondary copy)"],
  ["softwood", 0.13, 500, 1600, "prEN 12524 design-value table, softwood 500 (secondary copy)"],
  ["hardwood", 0.18, 700, 1600, "prEN 12524 design-value table, hardwood 700 (secondary copy)"],
];

Deno.test("MATERIAL_CLASSES envelopes contain the rows read in the named tables", () => {
  for (const [id, conductivity, density, specificHeat, source] of ANCHOR_ROWS) {
    const c = findMaterialClass(id);
    assert.ok(c !== undefined && c.kind === "massive", `no massive class "${id}"`);
    assert.ok(isWithinRange(conductivity, c.conductivity), `${source}: λ ${conductivity}`);
    assert.ok(isWithinRange(density, c.density), `${source}: ρ ${density}`);
    assert.ok(isWithinRange(specificHeat, c.specificHeat), `${source}: c ${specificHeat}`);
  }
});

Deno.test("findMaterialClass() flags a lb/ft^3 density typed as kg/m^3 for dense concrete", () => {
  const c = findMaterialClass("dense-concrete");
  assert.ok(c !== undefined && c.kind === "massive");
  // 140 lb/ft^3 concrete (ASHRAE layer "heavyweight concrete", from memory) entered as 140 kg/m^3.
  assert.equal(isWithinRange(140, c.density), false);
  assert.equal(isWithinRange(140 * 16.018463, c.density), true); // 1 lb/ft^3 = 16.018463 kg/m^3 (exact definition)
  assert.equal(findMaterialClass("no-such-class"), undefined);
});

Deno.test("isWithinRange() includes both bounds and excludes values outside", () => {
  const r = { min: 0.1, max: 0.2 };
  assert.equal(isWithinRange(0.1, r), true);
  assert.equal(isWithinRange(0.2, r), true);
  assert.equal(isWithinRange(0.0999, r), false);
  assert.equal(isWithinRange(0.2001, r), false);
  assert.equal(isWithinRange(NaN, r), false);
});
