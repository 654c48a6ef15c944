/**
 * U-value worked examples through the engine's steadyState(), using library materials and the ISO 6946
 * default surface resistances. Each expected value is derived by hand in the comment beside it.
 */
import assert from "node:assert/strict";
import type { Layer } from "../../src/engine/layer.ts";
import { steadyState } from "../../src/engine/steady.ts";
import { findLibraryMaterial, isResistiveLibraryMaterial } from "../../src/materials/library.ts";
import { defaultSurfaceResistances } from "../../src/materials/surfaceResistance.ts";

function libraryLayer(id: string, thicknessM: number): Layer {
  const m = findLibraryMaterial(id);
  if (m === undefined) throw new Error(`Cannot find library material "${id}"`);
  if (isResistiveLibraryMaterial(m)) return { kind: "resistive", resistance: m.resistance };
  return {
    kind: "massive",
    thicknessM,
    conductivity: m.conductivity,
    density: m.density,
    specificHeat: m.specificHeat,
  };
}

function assertClose(actual: number, expected: number, tolerance: number, what: string): void {
  assert.ok(
    Math.abs(actual - expected) <= tolerance,
    `${what}: got ${actual}, expected ${expected} ± ${tolerance}`,
  );
}

Deno.test("steadyState() of 100 mm EPS on 200 mm concrete gives the hand-derived U", () => {
  const films = defaultSurfaceResistances("horizontal");
  const result = steadyState({
    layers: [libraryLayer("eps-20", 0.1), libraryLayer("concrete-2200", 0.2)], // outside → inside
    outsideResistance: films.outsideM2KPerW,
    insideResistance: films.insideM2KPerW,
  });
  // λ_EPS = 0.036 (eps-20, from memory), λ_concrete = 1.65 (believed ISO 10456:2007 Table 3, from memory);
  // R_se 0.04, R_si 0.13 (ISO 6946:2017 Table 7, horizontal).
  // R = 0.04 + 0.100/0.036 + 0.200/1.65 + 0.13
  //   = 0.04 + 2.7777778 + 0.1212121 + 0.13 = 3.0689899 m^2 K/W
  // U = 1 / 3.0689899 = 0.3258401 W/(m^2 K)
  assertClose(result.layerResistances[0] ?? NaN, 2.7777778, 1e-7, "R_EPS");
  assertClose(result.layerResistances[1] ?? NaN, 0.1212121, 1e-7, "R_concrete");
  assertClose(result.totalResistance, 3.0689899, 1e-7, "R_total");
  assertClose(result.uValue, 0.3258401, 1e-7, "U");
  // κ = ρ c d: EPS 20 × 1450 × 0.1 = 2 900; concrete 2200 × 1000 × 0.2 = 440 000; sum 442 900 J/(m^2 K)
  assertClose(result.arealHeatCapacity, 442_900, 1e-6, "areal heat capacity");
});

Deno.test("steadyState() of the ASHRAE Standard 140 lightweight wall reproduces its published U = 0.514", () => {
  // from memory: ANSI/ASHRAE Standard 140, case 600 lightweight exterior wall, outside → inside:
  // wood siding 9 mm (0.14 W/(m K), 530 kg/m^3, 900 J/(kg K)); fiberglass quilt 66 mm (0.04, 12, 840);
  // plasterboard 12 mm (0.16, 950, 840); combined film coefficients 29.3 W/(m^2 K) outside and
  // 8.29 W/(m^2 K) inside; the standard tabulates U = 0.514 W/(m^2 K) (surface to surface 0.559).
  const result = steadyState({
    layers: [
      { kind: "massive", thicknessM: 0.009, conductivity: 0.14, density: 530, specificHeat: 900 },
      libraryLayer("mineral-wool-12", 0.066), // same values as the standard's fiberglass quilt
      { kind: "massive", thicknessM: 0.012, conductivity: 0.16, density: 950, specificHeat: 840 },
    ],
    outsideResistance: 1 / 29.3,
    insideResistance: 1 / 8.29,
  });
  // R = 1/29.3 + 0.009/0.14 + 0.066/0.04 + 0.012/0.16 + 1/8.29
  //   = 0.0341297 + 0.0642857 + 1.65 + 0.075 + 0.1206273 = 1.9440427 m^2 K/W
  // U = 1 / 1.9440427 = 0.5143920 W/(m^2 K); surface to surface 1 / 1.7892857 = 0.5588822
  assertClose(result.totalResistance, 1.9440427, 1e-7, "R_total");
  assertClose(result.uValue, 0.514392, 1e-7, "U (hand derivation)");
  assertClose(result.uValue, 0.514, 0.0005, "U (published, three decimals)");
  assertClose(result.surfaceToSurfaceU, 0.559, 0.0005, "surface-to-surface U (published, three decimals)");
});

Deno.test("steadyState() of an uninsulated 215 mm solid brick wall gives the hand-derived U", () => {
  const films = defaultSurfaceResistances("horizontal");
  const result = steadyState({
    layers: [
      libraryLayer("clay-brick-outer-leaf-1700", 0.215),
      libraryLayer("plaster-lime-sand-1600", 0.013),
    ],
    outsideResistance: films.outsideM2KPerW,
    insideResistance: films.insideM2KPerW,
  });
  // λ_brick 0.77 (believed CIBSE Guide A (2006), outer leaf, from memory), λ_lime plaster 0.80 (believed
  // ISO 10456:2007 Table 3, from memory).
  // R = 0.04 + 0.215/0.77 + 0.013/0.80 + 0.13 = 0.04 + 0.2792208 + 0.01625 + 0.13 = 0.4654708 m^2 K/W
  // U = 1 / 0.4654708 = 2.1483626 W/(m^2 K)
  assertClose(result.totalResistance, 0.4654708, 1e-7, "R_total");
  assertClose(result.uValue, 2.1483626, 1e-7, "U");
});

Deno.test("steadyState() of a concrete-deck roof uses the upward R_si of 0.10", () => {
  const films = defaultSurfaceResistances("upward");
  const result = steadyState({
    layers: [
      libraryLayer("bitumen-roofing-felt", 0.01),
      libraryLayer("pir-board-45", 0.15),
      libraryLayer("concrete-2400", 0.2),
    ],
    outsideResistance: films.outsideM2KPerW,
    insideResistance: films.insideM2KPerW,
  });
  // λ felt 0.19 and PIR 0.030 (CIBSE Guide A Tables 3.36/3.37, secondary copy), concrete 2.0 (believed
  // ISO 10456:2007 Table 3, from memory); R_si 0.10 upward, R_se 0.04 (ISO 6946:2017 Table 7).
  // R = 0.04 + 0.010/0.19 + 0.150/0.030 + 0.200/2.0 + 0.10
  //   = 0.04 + 0.0526316 + 5.0 + 0.1 + 0.10 = 5.2926316 m^2 K/W
  // U = 1 / 5.2926316 = 0.1889419 W/(m^2 K)
  assertClose(result.totalResistance, 5.2926316, 1e-7, "R_total");
  assertClose(result.uValue, 0.1889419, 1e-7, "U");
});

Deno.test("steadyState() of a cavity wall counts the air layer as a resistance without mass", () => {
  const films = defaultSurfaceResistances("horizontal");
  const result = steadyState({
    layers: [
      libraryLayer("clay-brick-outer-leaf-1700", 0.1025),
      libraryLayer("air-layer-50mm-horizontal", 0.05),
      libraryLayer("concrete-block-medium-1400", 0.1),
      libraryLayer("plaster-gypsum-1000", 0.013),
    ],
    outsideResistance: films.outsideM2KPerW,
    insideResistance: films.insideM2KPerW,
  });
  // R_air 0.18 (believed ISO 6946:2017 Table 8, 50 mm horizontal, from memory), λ block 0.51 (believed
  // ANSI/ASHRAE Standard 140 case 900, from memory), λ gypsum plaster 0.40 (believed ISO 10456:2007 Table 3).
  // R = 0.04 + 0.1025/0.77 + 0.18 + 0.100/0.51 + 0.013/0.40 + 0.13
  //   = 0.04 + 0.1331169 + 0.18 + 0.1960784 + 0.0325 + 0.13 = 0.7116953 m^2 K/W
  // U = 1 / 0.7116953 = 1.4050957 W/(m^2 K)
  assert.equal(result.layerResistances[1], 0.18);
  assert.equal(result.layerArealHeatCapacities[1], 0);
  assertClose(result.totalResistance, 0.7116953, 1e-7, "R_total");
  assertClose(result.uValue, 1.4050957, 1e-7, "U");
});
