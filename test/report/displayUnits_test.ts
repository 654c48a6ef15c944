/**
 * The display-unit constants against their exact definitions and against the factors NIST SP 811 (2008)
 * Appendix B.9 tabulates; every expected number is written out here, never taken from the module.
 */
import assert from "node:assert/strict";
import {
  DELTA_F_PER_K,
  displayUnitsFor,
  F_AT_0_C,
  IP_DISPLAY,
  J_PER_BTU,
  KG_PER_LB,
  M_PER_FT,
  M_PER_IN,
  type QuantityKind,
  S_PER_H,
  SI_DISPLAY,
  SI_PER_IP_UNIT,
  toDisplay,
  unitLabel,
} from "../../src/report/page/displayUnits.ts";

/** |actual − expected| ≤ half a unit in the last printed digit of `expected`. */
function assertPrinted(actual: number, expected: string, what: string): void {
  const [, decimals = ""] = expected.replace(/e.*$/i, "").split(".");
  const exponent = Number(/e([+-]?\d+)$/i.exec(expected)?.[1] ?? "0");
  const halfUlp = 0.5 * 10 ** (exponent - decimals.length);
  assert.ok(
    Math.abs(actual - Number(expected)) <= halfUlp,
    `${what}: ${actual} is not ${expected} to the printed digits`,
  );
}

Deno.test("the defining constants are exact", () => {
  // International yard and pound agreement (1959): 1 yd = 0.9144 m, so 1 ft = 0.3048 m and 1 in = 0.0254 m.
  assert.equal(M_PER_FT, 0.3048);
  assert.equal(M_PER_IN, 0.0254);
  assert.ok(Math.abs(M_PER_FT / 12 - M_PER_IN) < 1e-17, "12 in = 1 ft");
  // International yard and pound agreement (1959): 1 lb = 0.45359237 kg.
  assert.equal(KG_PER_LB, 0.45359237);
  // NIST SP 811 (2008), Appendix B.9: British thermal unit, International Table = 1.055 055 852 62 E+03 J.
  assert.equal(J_PER_BTU, 1055.05585262);
  assert.equal(S_PER_H, 3600);
  // °F = °C × 1.8 + 32 for temperatures; ×1.8 only for differences (NIST SP 811, 4.2.1.1 and B.9 note).
  assert.equal(DELTA_F_PER_K, 1.8);
  assert.equal(F_AT_0_C, 32);
});

Deno.test("every IP factor equals the NIST SP 811 Appendix B.9 value to its printed digits", () => {
  const sp811: Readonly<Record<Exclude<QuantityKind, "temperature">, string>> = {
    thickness: "2.54e-2", // in → m, exact
    length: "3.048e-1", // ft → m, exact
    area: "9.290304e-2", // ft² → m², exact
    conductivity: "1.442279e-1", // Btu_IT·in/(h·ft²·°F) → W/(m·K)
    density: "1.601846e1", // lb/ft³ → kg/m³
    specificHeat: "4.1868e3", // Btu_IT/(lb·°F) → J/(kg·K), exact
    resistance: "1.761102e-1", // h·ft²·°F/Btu_IT → m²·K/W
    transmittance: "5.678263", // Btu_IT/(h·ft²·°F) → W/(m²·K)
    arealHeatCapacity: "2.044175e4", // Btu_IT/(ft²·°F) → J/(m²·K): 1.135 653 E+04 J/m² per Btu_IT/ft² × 1.8
    temperatureDifference: "5.555556e-1", // °F (difference) → K, 5/9
    heatFlux: "3.154591", // Btu_IT/(h·ft²) → W/m²
    irradiance: "3.154591", // Btu_IT/(h·ft²) → W/m²
    heatGain: "2.930711e-1", // Btu_IT/h → W
    energy: "1.05505585262e6", // kBtu_IT → J, exact
    irradiation: "1.135653e7", // kBtu_IT/ft² → J/m²
    time: "1", // h stays h
    angle: "1", // degrees stay degrees
  };
  for (const [kind, expected] of Object.entries(sp811) as [keyof typeof sp811, string][]) {
    assertPrinted(SI_PER_IP_UNIT[kind], expected, kind);
  }
  // The exact ones exactly (up to one rounding of the division).
  assert.ok(Math.abs(SI_PER_IP_UNIT.specificHeat - 4186.8) < 1e-9);
  assert.ok(Math.abs(SI_PER_IP_UNIT.area - 0.09290304) < 1e-17);
});

Deno.test("IP conversions: U ÷ 5.678263, W × 3.412142, °C × 1.8 + 32, K × 1.8", () => {
  // 1 W/(m²·K) = 0.176110 Btu/(h·ft²·°F): divide by 5.678263.
  assertPrinted(toDisplay(IP_DISPLAY, "transmittance", 1), "0.176110", "1 W/(m²·K)");
  assertPrinted(toDisplay(IP_DISPLAY, "transmittance", 0.238), "0.0419142", "0.238 W/(m²·K)");
  // R scales the other way: 1 m²·K/W = 5.678263 h·ft²·°F/Btu.
  assertPrinted(toDisplay(IP_DISPLAY, "resistance", 1), "5.678263", "1 m²·K/W");
  // 1 W = 3.412142 Btu/h.
  assertPrinted(toDisplay(IP_DISPLAY, "heatGain", 1), "3.412142", "1 W");
  // Temperatures: the freezing and boiling points of water, and −40, where the two scales meet.
  assert.equal(toDisplay(IP_DISPLAY, "temperature", 0), 32);
  assert.equal(toDisplay(IP_DISPLAY, "temperature", 100), 212);
  assert.equal(toDisplay(IP_DISPLAY, "temperature", -40), -40);
  // Differences: an 11 K daily range is 19.8 °F, never 11 × 1.8 + 32 = 51.8.
  assertPrinted(toDisplay(IP_DISPLAY, "temperatureDifference", 11), "19.8", "11 K");
  assert.equal(toDisplay(IP_DISPLAY, "temperatureDifference", 0), 0);
  // 1 kWh = 3600 kJ = 3.412142 kBtu; 25.4 mm = 1 in; 1 m² = 10.76391 ft².
  assertPrinted(toDisplay(IP_DISPLAY, "energy", 3.6e6), "3.412142", "1 kWh");
  assertPrinted(toDisplay(IP_DISPLAY, "thickness", 0.0254), "1", "25.4 mm");
  assertPrinted(toDisplay(IP_DISPLAY, "area", 1), "10.76391", "1 m²");
  // 0.035 W/(m·K) = 0.2427 Btu·in/(h·ft²·°F); 1000 kg/m³ = 62.42796 lb/ft³; 1000 J/(kg·K) = 0.2388459 Btu/(lb·°F).
  assertPrinted(toDisplay(IP_DISPLAY, "conductivity", 0.035), "0.2427", "0.035 W/(m·K)");
  assertPrinted(toDisplay(IP_DISPLAY, "density", 1000), "62.42796", "1000 kg/m³");
  assertPrinted(toDisplay(IP_DISPLAY, "specificHeat", 1000), "0.2388459", "1000 J/(kg·K)");
});

Deno.test("the SI display prints what the package always printed: mm, kJ/(m²·K), kWh, the rest as stored", () => {
  assert.equal(toDisplay(SI_DISPLAY, "thickness", 0.015), 15);
  assert.equal(toDisplay(SI_DISPLAY, "arealHeatCapacity", 12600), 12.6);
  assert.equal(toDisplay(SI_DISPLAY, "energy", 7.2e6), 2);
  assert.equal(toDisplay(SI_DISPLAY, "temperature", 24), 24);
  assert.equal(toDisplay(SI_DISPLAY, "temperatureDifference", 11), 11);
  assert.equal(unitLabel(SI_DISPLAY, "transmittance"), "W/(m²·K)");
  assert.equal(displayUnitsFor("SI"), SI_DISPLAY);
  assert.equal(displayUnitsFor("IP"), IP_DISPLAY);
});

Deno.test("IP labels carry no SI unit, and a difference is labelled apart from a temperature", () => {
  const kinds = Object.keys(SI_DISPLAY.units) as QuantityKind[];
  for (const kind of kinds) {
    const label = unitLabel(IP_DISPLAY, kind);
    if (kind === "time" || kind === "angle") {
      assert.equal(label, unitLabel(SI_DISPLAY, kind), kind);
      continue;
    }
    assert.notEqual(label, unitLabel(SI_DISPLAY, kind), kind);
    assert.doesNotMatch(label, /W|J|kg|°C|K|m/, `${kind}: ${label}`);
  }
  assert.equal(unitLabel(IP_DISPLAY, "temperature"), "°F");
  assert.equal(unitLabel(IP_DISPLAY, "temperatureDifference"), "Δ°F");
});
