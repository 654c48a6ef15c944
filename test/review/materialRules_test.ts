import assert from "node:assert/strict";
import { reviewMaterials } from "../../src/review/materialRules.ts";
import { hits, material, modelOf } from "./_project.ts";

/** Reviews one project material (not used by any construction) and returns its findings' rule ids. */
function rulesFor(conductivity: number, density: number, specificHeat: number, extra = ""): string[] {
  const body = `id: m\nname: Test material\n${extra}conductivity: ${conductivity} W/(m K)\n` +
    `density: ${density} kg/m^3\nspecific-heat: ${specificHeat} J/(kg K)\nsource: test values`;
  return reviewMaterials(modelOf(material(body))).map((f) => f.rule);
}

Deno.test("hard limits: λ ≤ 450, ρ ≤ 11 500, c ≥ 100 (just beyond copper, lead, lead: CIBSE Guide A 2006 Table 3.36, secondary copy)", () => {
  // λ 450 / 451 W/(m K) with lead-like ρ and c: at the limit nothing, above it an error.
  assert.deepStrictEqual(rulesFor(450, 8900, 385), []);
  assert.deepStrictEqual(rulesFor(451, 8900, 385), ["conductivity-hard-limit"]);
  // ρ 11 500 / 11 600 kg/m^3 (lead 11 340).
  assert.deepStrictEqual(rulesFor(35, 11500, 130), []);
  assert.deepStrictEqual(rulesFor(35, 11600, 130), ["density-hard-limit"]);
  // c 100 / 99 J/(kg K) (lead 130).
  assert.deepStrictEqual(rulesFor(35, 11340, 100), []);
  assert.deepStrictEqual(rulesFor(35, 11340, 99), ["specific-heat-hard-limit"]);
});

Deno.test("specific heat: ≤ 10 J/(kg K) is a kJ value (common practice: materials have 0.13–4.2 kJ/(kg K)); > 5000 is above water (4190, from memory)", () => {
  const kj = reviewMaterials(modelOf(material(
    "id: m\nname: Render\nconductivity: 0.7 W/(m K)\ndensity: 1800 kg/m^3\nspecific-heat: 0.84 J/(kg K)\nsource: t",
  )));
  assert.deepStrictEqual(kj.map((f) => f.rule), ["specific-heat-in-kj"]);
  assert.equal(kj[0]?.severity, "error");
  assert.match(kj[0]?.hint ?? "", /840 J\/\(kg K\)/);
  assert.deepStrictEqual(rulesFor(0.7, 1800, 10), ["specific-heat-in-kj"]);
  assert.deepStrictEqual(rulesFor(0.7, 1800, 11), ["specific-heat-hard-limit"]);
  assert.deepStrictEqual(rulesFor(0.2, 500, 4190), []);
  assert.deepStrictEqual(rulesFor(0.2, 500, 5001), ["specific-heat-high"]);
});

Deno.test("lb/ft³ slip: ρ × 16.018 inside the class band while ρ is below it (1 lb/ft³ = 16.018463 kg/m³, computed)", () => {
  // Dense concrete band 2000–2500 kg/m^3 (class envelope, ASHRAE HOF 2005 Ch. 30 Table 19, secondary copy).
  const cls = "class: dense-concrete\n";
  const slip = reviewMaterials(modelOf(material(
    `id: m\nname: Concrete\n${cls}conductivity: 1.65 W/(m K)\ndensity: 140 kg/m^3\nspecific-heat: 1000 J/(kg K)\nsource: t`,
  )));
  // 140 lb/ft^3 = 2243 kg/m^3: one error, not also a class-envelope or λ–ρ finding.
  assert.deepStrictEqual(slip.map((f) => `${f.severity} ${f.rule}`), ["error density-in-lb-per-ft3"]);
  assert.match(slip[0]?.hint ?? "", /2243 kg\/m³/);
  // 120 lb/ft^3 = 1922 kg/m^3 is outside the band too: a plain class-envelope warning.
  assert.deepStrictEqual(rulesFor(1.65, 120, 1000, cls), ["density-outside-class"]);
  // Without a class: λ > 0.5 W/(m K) and ρ × 16.018 ≥ 1200 kg/m^3 (mineral λ–ρ rule, ISO 10456 ladder from memory).
  assert.deepStrictEqual(rulesFor(0.51, 87, 1000), ["density-in-lb-per-ft3"]);
  assert.deepStrictEqual(rulesFor(0.5, 87, 1000), []);
});

Deno.test("class envelope of dense concrete: λ 1.1–2.5, ρ 2000–2500, c 840–1100 (ASHRAE HOF 2005 Ch. 30 Table 19, secondary copy)", () => {
  const cls = "class: dense-concrete\n";
  assert.deepStrictEqual(rulesFor(2.5, 2500, 1100, cls), []);
  assert.deepStrictEqual(rulesFor(1.1, 2000, 840, cls), []);
  assert.deepStrictEqual(rulesFor(2.6, 2400, 1000, cls), ["conductivity-outside-class"]);
  assert.deepStrictEqual(rulesFor(2.0, 2600, 1000, cls), ["density-outside-class"]);
  assert.deepStrictEqual(rulesFor(2.0, 2400, 1200, cls), ["specific-heat-outside-class"]);
  assert.deepStrictEqual(rulesFor(2.0, 2400, 1000, "class: concrete\n"), ["unknown-material-class"]);
});

Deno.test("insulation floor λ ≥ 0.018 W/(m K) (PUR/PIR class lower bound, CIBSE Guide A Table 3.37 secondary copy, lowered from memory)", () => {
  const pir = "class: polyurethane-phenolic\n";
  assert.deepStrictEqual(rulesFor(0.018, 45, 1470, pir), []);
  assert.deepStrictEqual(rulesFor(0.0179, 45, 1470, pir), ["conductivity-below-insulation-limit"]);
  assert.deepStrictEqual(rulesFor(0.0031, 15, 1450), ["conductivity-below-insulation-limit"]);
  // A vacuum panel says so in its name: 0.007 W/(m K), ρ 200, c 900 (from memory) is accepted.
  const vip = reviewMaterials(modelOf(material(
    "id: m\nname: Vacuum insulation panel\nconductivity: 0.007 W/(m K)\ndensity: 200 kg/m^3\nspecific-heat: 900 J/(kg K)\nsource: t",
  )));
  assert.deepStrictEqual(vip, []);
});

Deno.test("λ–ρ consistency for mineral materials: ρ < 1200 with λ > 1.0, ρ > 2000 with λ < 0.5 (ISO 10456 ladder, from memory)", () => {
  assert.deepStrictEqual(rulesFor(1.01, 1199, 1000), ["conductivity-density-mismatch"]);
  assert.deepStrictEqual(rulesFor(1.01, 1200, 1000), []);
  assert.deepStrictEqual(rulesFor(0.49, 2001, 1000), ["conductivity-density-mismatch"]);
  assert.deepStrictEqual(rulesFor(0.49, 2000, 1000), []);
  // With a mineral class the rule still applies (aerated concrete band ρ 300–800, here inside it).
  assert.deepStrictEqual(rulesFor(0.25, 800, 1000, "class: aerated-concrete\n"), []);
});

Deno.test("derived bands for materials without a class (common practice, no source): a 5e-8–3e-6 m²/s (2.5e-5 below 100 kg/m³, still air from memory), ρc ≤ 3.0e6, b 10–4000", () => {
  // a = λ/(ρc): 0.31/(100·1000) = 3.1e-6 > 3e-6; 0.29/(100·1000) = 2.9e-6 inside.
  assert.deepStrictEqual(rulesFor(0.31, 100, 1000), ["diffusivity-implausible"]);
  assert.deepStrictEqual(rulesFor(0.29, 100, 1000), []);
  // Below 100 kg/m^3 the bound is 2.5e-5: 0.5/(50·390) = 2.56e-5 out, 0.5/(50·410) = 2.44e-5 in.
  assert.deepStrictEqual(rulesFor(0.5, 50, 390), ["diffusivity-implausible"]);
  assert.deepStrictEqual(rulesFor(0.5, 50, 410), []);
  // a = 0.02/(1000·1000) = 2e-8 < 5e-8.
  assert.deepStrictEqual(rulesFor(0.05, 1000, 1100), ["diffusivity-implausible"]);
  // ρc = 2000·1600 = 3.2e6 > 3.0e6; 2000·1500 = 3.0e6 at the limit.
  assert.deepStrictEqual(rulesFor(2.0, 2000, 1600), ["volumetric-heat-capacity-high"]);
  assert.deepStrictEqual(rulesFor(2.0, 2000, 1500), []);
  // b = √(6·2900·1000) = 4171 > 4000; √(5.5·2900·1000) = 3994.
  assert.deepStrictEqual(rulesFor(6, 2900, 1000), ["effusivity-implausible"]);
  assert.deepStrictEqual(rulesFor(5.5, 2900, 1000), []);
  // b = √(0.03·3·1000) = 9.5 < 10; √(0.034·3·1000) = 10.1.
  assert.deepStrictEqual(rulesFor(0.03, 3, 1000), ["effusivity-implausible"]);
  assert.deepStrictEqual(rulesFor(0.034, 3, 1000), []);
  // A class replaces the derived bands: 2000·1600 is outside the concrete c band instead.
  assert.deepStrictEqual(rulesFor(2.0, 2000, 1600, "class: dense-concrete\n"), [
    "specific-heat-outside-class",
  ]);
});

Deno.test("findings carry value, expected and source, and sit at the material block", () => {
  const found = reviewMaterials(modelOf(material(
    "id: m\nname: Concrete\nclass: dense-concrete\nconductivity: 2.6 W/(m K)\ndensity: 2400 kg/m^3\nspecific-heat: 1000 J/(kg K)\nsource: t",
  )));
  assert.deepStrictEqual(hits(found, "conductivity-outside-class"), [
    "conductivity-outside-class@input.md:2:1",
  ]);
  const f = found[0];
  assert.equal(f?.value, "λ = 2.6 W/(m·K)");
  assert.equal(f?.expected, "1.1–2.5 W/(m·K)");
  assert.match(f?.source ?? "", /ASHRAE Handbook—Fundamentals 2005/);
});

Deno.test("inline massive layers are checked and reported at the layer", () => {
  const md = "```construction\nid: W\nname: Wall\nlayers:\n" +
    "  - { name: block, thickness: 100 mm, conductivity: 0.51 W/(m K), density: 87 kg/m^3, specific-heat: 1000 J/(kg K), source: t }\n" +
    "```\n";
  assert.deepStrictEqual(hits(reviewMaterials(modelOf(md)), "density-in-lb-per-ft3"), [
    "density-in-lb-per-ft3@input.md:5:5",
  ]);
});
