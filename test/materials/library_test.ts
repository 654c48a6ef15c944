import assert from "node:assert/strict";
import {
  canonicalLibraryEntry,
  findLibraryMaterial,
  isResistiveLibraryMaterial,
  LIBRARY_MATERIALS,
  libraryIds,
  type LibraryMaterial,
} from "../../src/materials/library.ts";
import { findMaterialClass, isWithinRange } from "../../src/materials/classes.ts";

const KEBAB_CASE = /^[a-z0-9]+(-[a-z0-9]+)*$/;

Deno.test("LIBRARY_MATERIALS holds 35 to 50 entries", () => {
  // Size asked for in the materials-library brief; common practice, no source.
  assert.ok(LIBRARY_MATERIALS.length >= 35, `only ${LIBRARY_MATERIALS.length} entries`);
  assert.ok(LIBRARY_MATERIALS.length <= 50, `${LIBRARY_MATERIALS.length} entries`);
});

Deno.test("LIBRARY_MATERIALS ids are unique and kebab-case", () => {
  const seen = new Set<string>();
  for (const m of LIBRARY_MATERIALS) {
    assert.match(m.id, KEBAB_CASE, `id "${m.id}" is not kebab-case`);
    assert.ok(!seen.has(m.id), `id "${m.id}" appears twice`);
    seen.add(m.id);
  }
});

Deno.test("LIBRARY_MATERIALS every source names a table with its edition or says from memory", () => {
  for (const m of LIBRARY_MATERIALS) {
    assert.ok(m.source.trim().length > 0, `"${m.id}" has an empty source`);
    assert.ok(m.name.trim().length > 0, `"${m.id}" has an empty name`);
    const fromMemory = m.source.includes("from memory");
    const namesTable = /Table \d/.test(m.source) && /(19|20)\d\d|edition/.test(m.source);
    assert.ok(
      fromMemory || namesTable,
      `"${m.id}" source neither cites a table and edition nor says from memory`,
    );
  }
});

Deno.test("LIBRARY_MATERIALS values are positive and finite", () => {
  for (const m of LIBRARY_MATERIALS) {
    const values = isResistiveLibraryMaterial(m)
      ? [m.resistance]
      : [m.conductivity, m.density, m.specificHeat];
    for (const v of values) assert.ok(Number.isFinite(v) && v > 0, `"${m.id}" has value ${v}`);
  }
});

Deno.test("LIBRARY_MATERIALS values lie within their class envelope", () => {
  for (const m of LIBRARY_MATERIALS) {
    const c = findMaterialClass(m.materialClass);
    assert.ok(c !== undefined, `"${m.id}" names unknown class "${m.materialClass}"`);
    if (isResistiveLibraryMaterial(m)) {
      assert.equal(c.kind, "resistive", `"${m.id}" is massless but its class is not`);
      if (c.kind === "resistive") assert.ok(isWithinRange(m.resistance, c.resistance), `"${m.id}" R`);
    } else {
      assert.equal(c.kind, "massive", `"${m.id}" has mass but its class is massless`);
      if (c.kind !== "massive") continue;
      assert.ok(isWithinRange(m.conductivity, c.conductivity), `"${m.id}" λ ${m.conductivity}`);
      assert.ok(isWithinRange(m.density, c.density), `"${m.id}" ρ ${m.density}`);
      assert.ok(isWithinRange(m.specificHeat, c.specificHeat), `"${m.id}" c ${m.specificHeat}`);
    }
  }
});

Deno.test("findLibraryMaterial() returns the entry by id and undefined for an unknown id", () => {
  const concrete = findLibraryMaterial("concrete-2200");
  assert.ok(concrete !== undefined && !isResistiveLibraryMaterial(concrete));
  // from memory (believed ISO 10456:2007, Table 3, concrete 2200 kg/m3: λ 1.65, c 1000)
  assert.equal(concrete.conductivity, 1.65);
  assert.equal(concrete.density, 2200);
  const air = findLibraryMaterial("air-layer-25mm-horizontal");
  assert.ok(air !== undefined && isResistiveLibraryMaterial(air));
  // from memory (believed ISO 6946:2017, Table 8, 25 mm, horizontal: 0.18 m^2 K/W)
  assert.equal(air.resistance, 0.18);
  assert.equal(findLibraryMaterial("concrete"), undefined);
  assert.equal(findLibraryMaterial(""), undefined);
});

Deno.test("libraryIds() lists every id once, in library order", () => {
  assert.deepEqual(libraryIds(), LIBRARY_MATERIALS.map((m) => m.id));
  assert.equal(new Set(libraryIds()).size, LIBRARY_MATERIALS.length);
});

Deno.test("canonicalLibraryEntry() sorts keys and writes shortest round-trip numbers", () => {
  const entry: LibraryMaterial = {
    name: 'Test "quoted" ü',
    id: "test-entry",
    specificHeat: 450,
    materialClass: "steel",
    conductivity: 0.1 + 0.2,
    density: 1e21,
    source: "none",
  };
  // Expected text written by hand: keys in code-unit order, 0.1 + 0.2 = 0.30000000000000004, 1e21 → "1e+21".
  assert.equal(
    canonicalLibraryEntry(entry),
    '{"conductivity":0.30000000000000004,"density":1e+21,"id":"test-entry","materialClass":"steel",' +
      '"name":"Test \\"quoted\\" ü","source":"none","specificHeat":450}',
  );
});

Deno.test("canonicalLibraryEntry() does not depend on key insertion order", () => {
  const a: LibraryMaterial = {
    id: "a",
    name: "A",
    materialClass: "air-layer",
    resistance: 0.18,
    source: "s",
  };
  const b: LibraryMaterial = {
    source: "s",
    resistance: 0.18,
    materialClass: "air-layer",
    name: "A",
    id: "a",
  };
  assert.equal(canonicalLibraryEntry(a), canonicalLibraryEntry(b));
  assert.equal(
    canonicalLibraryEntry(a),
    '{"id":"a","materialClass":"air-layer","name":"A","resistance":0.18,"source":"s"}',
  );
});

Deno.test("canonicalLibraryEntry() round-trips every library entry through JSON.parse", () => {
  for (const m of LIBRARY_MATERIALS) assert.deepEqual(JSON.parse(canonicalLibraryEntry(m)), m);
});

Deno.test("canonicalLibraryEntry() rejects a non-finite number", () => {
  const bad: LibraryMaterial = {
    id: "bad",
    name: "Bad",
    materialClass: "air-layer",
    resistance: NaN,
    source: "s",
  };
  assert.throws(() => canonicalLibraryEntry(bad), RangeError);
});
