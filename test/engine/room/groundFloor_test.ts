/**
 * ISO 13370:2017 slab-on-ground floor (clause numbers from memory, see src/engine/room/groundFloor.ts):
 *   B′ = A / (0.5 P)                                   characteristic dimension
 *   d_t = w + λ (R_si + R_f + R_se)                    equivalent thickness
 *   d_t < B′:  U = 2λ / (πB′ + d_t) · ln(πB′/d_t + 1)  uninsulated and moderately insulated floors
 *   d_t ≥ B′:  U = λ / (0.457 B′ + d_t)                well-insulated floors
 * with R_si = 0.17 m² K/W (downward heat flow) and R_se = 0.04 m² K/W (ISO 6946:2017 Table 7, from memory).
 */
import assert from "node:assert/strict";
import { type GroundFloorU, groundFloorU } from "../../../src/engine/room/groundFloor.ts";

function close(actual: number, expected: number, relTol: number, what: string): void {
  const rel = Math.abs(actual - expected) / Math.abs(expected);
  assert.ok(
    rel <= relTol,
    `${what}: ${actual} vs ${expected} (relative ${rel.toExponential(2)} > ${relTol})`,
  );
}

function ok(result: ReturnType<typeof groundFloorU>): GroundFloorU {
  if (result.kind !== "ground-floor") throw new Error(`rejected: ${result.message}`);
  return result;
}

Deno.test("ground floor, d_t < B′: U by the logarithmic formula matches the hand calculation", () => {
  // Hand calculation: A = 120 m², P = 44 m, R_f = 0.10 m² K/W, λ = 2.0 (default), w = 0.3 m (default).
  //   B′ = 120 / (0.5 × 44) = 120 / 22 = 5.454545 m
  //   d_t = 0.3 + 2.0 × (0.17 + 0.10 + 0.04) = 0.3 + 0.62 = 0.92 m  (< B′: logarithmic branch)
  //   πB′ = 17.135960;  πB′ + d_t = 18.055960;  2λ / (πB′ + d_t) = 4 / 18.055960 = 0.2215335
  //   πB′/d_t + 1 = 19.626043;  ln(19.626043) = 2.9768574
  //   U = 0.2215335 × 2.9768574 = 0.6594736 W/(m² K)
  const r = ok(groundFloorU({ areaM2: 120, exposedPerimeterM: 44, floorResistanceM2KPerW: 0.1 }));
  assert.equal(r.branch, "thin");
  close(r.characteristicDimensionM, 5.454545, 1e-6, "B′");
  close(r.equivalentThicknessM, 0.92, 1e-12, "d_t");
  close(r.uValueWPerM2K, 0.6594736, 1e-6, "U");
  assert.equal(r.inputs.soilConductivityWPerMK.defaulted, true);
  assert.equal(r.inputs.soilConductivityWPerMK.value, 2.0);
  assert.equal(r.inputs.wallThicknessM.defaulted, true);
  assert.equal(r.inputs.wallThicknessM.value, 0.3);
  assert.equal(r.inputs.insideResistanceM2KPerW.value, 0.17);
  assert.equal(r.inputs.outsideResistanceM2KPerW.value, 0.04);
  assert.equal(r.inputs.floorResistanceM2KPerW.defaulted, false);
  assert.ok(r.statements.some((s) => s.includes("B′ = A / (0.5 P)") && s.includes("5.4545")));
  assert.ok(r.statements.some((s) => s.includes("d_t < B′") && s.includes("0.65947")));
  assert.ok(r.statements.every((s) => !s.includes("Eq.") || s.includes("from memory")));
});

Deno.test("ground floor, d_t ≥ B′: U by the well-insulated formula matches the hand calculation", () => {
  // Hand calculation: A = 100 m², P = 40 m, R_f = 4.0 m² K/W (insulated slab), λ = 2.0, w = 0.3 m.
  //   B′ = 100 / 20 = 5 m;  d_t = 0.3 + 2.0 × (0.17 + 4.0 + 0.04) = 0.3 + 8.42 = 8.72 m  (≥ B′)
  //   U = 2.0 / (0.457 × 5 + 8.72) = 2.0 / 11.005 = 0.1817356 W/(m² K)
  const r = ok(groundFloorU({
    areaM2: 100,
    exposedPerimeterM: 40,
    floorResistanceM2KPerW: 4.0,
    soilConductivityWPerMK: 2.0,
    wallThicknessM: 0.3,
  }));
  assert.equal(r.branch, "thick");
  close(r.equivalentThicknessM, 8.72, 1e-12, "d_t");
  close(r.uValueWPerM2K, 0.1817356, 1e-6, "U");
  assert.equal(r.inputs.soilConductivityWPerMK.defaulted, false);
  assert.equal(r.inputs.wallThicknessM.defaulted, false);
  assert.ok(r.statements.some((s) => s.includes("d_t ≥ B′")));
});

Deno.test("ground floor, tiny exposed perimeter: B′ grows, the log branch applies and U tends to 0", () => {
  // P → 0 makes B′ = A/(0.5 P) → ∞, so d_t < B′ (logarithmic branch), and for πB′ ≫ d_t
  // U ≈ 2λ/(πB′) · ln(πB′/d_t) → 0: a floor with almost no exposed edge loses almost nothing (heat leaves at the
  // edge). A = 100 m², P = 0.001 m, R_f = 0, λ = 2, w = 0.3: B′ = 2×10⁵ m, d_t = 0.72 m,
  // asymptote 4/(π·2×10⁵) · ln(π·2×10⁵/0.72) = 8.70852×10⁻⁵ W/(m² K).
  const r = ok(groundFloorU({ areaM2: 100, exposedPerimeterM: 0.001, floorResistanceM2KPerW: 0 }));
  assert.equal(r.branch, "thin");
  close(r.uValueWPerM2K, 8.70852e-5, 1e-5, "U against the large-B′ asymptote");
  const larger = ok(groundFloorU({ areaM2: 100, exposedPerimeterM: 0.01, floorResistanceM2KPerW: 0 }));
  assert.ok(r.uValueWPerM2K < larger.uValueWPerM2K, "less exposed perimeter, less loss");
});

Deno.test("ground floor, B′ → 0: the well-insulated branch tends to the one-dimensional λ/d_t", () => {
  // B′ → 0 (a long perimeter around a small area) puts every floor in the d_t ≥ B′ branch, and
  // U = λ/(0.457 B′ + d_t) → λ/d_t = 1/(w/λ + R_si + R_f + R_se). λ = 2, w = 0.3, R_f = 0:
  // d_t = 0.3 + 2 × 0.21 = 0.72 m, λ/d_t = 2.777778 W/(m² K).
  const r = ok(groundFloorU({ areaM2: 1, exposedPerimeterM: 1e6, floorResistanceM2KPerW: 0 }));
  assert.equal(r.branch, "thick");
  close(r.uValueWPerM2K, 2.777778, 1e-5, "U → λ/d_t");
});

Deno.test("ground floor, near d_t = B′ the two formulas differ by the standard's own 0.0136 % jump", () => {
  // At d_t = B′ the log formula gives U = 2λ ln(π + 1)/((π + 1) B′) = 0.6862483 λ/B′ and the well-insulated
  // formula U = λ/(1.457 B′) = 0.6863418 λ/B′: the standard's pair jumps up by (π+1)/(2·1.457·ln(π+1)) − 1 =
  // 1.3628×10⁻⁴ (0.0136 %) when d_t reaches B′. λ = 2, w = 0.3, R_f = 0: d_t = 0.72 m; P = 10 m, so B′ = d_t
  // needs A = 0.72 × 5 = 3.6 m².
  const below = ok(
    groundFloorU({ areaM2: 3.6 * (1 + 1e-9), exposedPerimeterM: 10, floorResistanceM2KPerW: 0 }),
  );
  const at = ok(groundFloorU({ areaM2: 3.6 * (1 - 1e-9), exposedPerimeterM: 10, floorResistanceM2KPerW: 0 }));
  assert.equal(below.branch, "thin"); // B′ slightly above d_t
  assert.equal(at.branch, "thick"); // B′ slightly below d_t
  close(below.uValueWPerM2K, (0.6862483 * 2) / 0.72, 1e-6, "log formula at B′ = d_t");
  close(at.uValueWPerM2K, (0.6863418 * 2) / 0.72, 1e-6, "well-insulated formula at B′ = d_t");
  close(at.uValueWPerM2K / below.uValueWPerM2K - 1, 1.3628e-4, 1e-3, "jump");
  // Exactly d_t = B′ belongs to the well-insulated formula ("d_t ≥ B′"): with R_si = R_se = 0 given, R_f = 0.25,
  // λ = 2, w = 0.5: d_t = 0.5 + 2 × 0.25 = 1 m; A = 5, P = 10: B′ = 5/5 = 1 m (both exact in binary).
  const exact = ok(groundFloorU({
    areaM2: 5,
    exposedPerimeterM: 10,
    floorResistanceM2KPerW: 0.25,
    soilConductivityWPerMK: 2,
    wallThicknessM: 0.5,
    insideResistanceM2KPerW: 0,
    outsideResistanceM2KPerW: 0,
  }));
  assert.equal(exact.characteristicDimensionM, exact.equivalentThicknessM);
  assert.equal(exact.branch, "thick");
  close(exact.uValueWPerM2K, 2 / 1.457, 1e-12, "λ/(1.457 B′) at d_t = B′ = 1 m");
});

Deno.test("ground floor: the uninsulated floors on clay of the UK handbook table", () => {
  // UK Approved Document L table "U-values of uninsulated solid ground floors on clay" (computed with
  // BS EN ISO 13370, λ = 1.5 W/(m K), w = 0.3 m), from memory: P/A = 0.10 → 0.22, 0.50 → 0.70,
  // 1.00 → 1.05 W/(m² K), printed to 2 decimals (tolerance half a unit in the last place).
  const table: readonly [number, number][] = [[0.1, 0.22], [0.5, 0.7], [1.0, 1.05]];
  for (const [perimeterPerArea, u] of table) {
    const r = ok(groundFloorU({
      areaM2: 100,
      exposedPerimeterM: 100 * perimeterPerArea,
      floorResistanceM2KPerW: 0,
      soilConductivityWPerMK: 1.5,
      wallThicknessM: 0.3,
    }));
    assert.ok(Math.abs(r.uValueWPerM2K - u) <= 0.005, `P/A ${perimeterPerArea}: ${r.uValueWPerM2K} vs ${u}`);
  }
});

Deno.test("ground floor: a zero or negative perimeter or area is a typed rejection, not a throw", () => {
  const base = { areaM2: 100, exposedPerimeterM: 40, floorResistanceM2KPerW: 0 };
  const cases = [
    [{ ...base, exposedPerimeterM: 0 }, "non-positive-perimeter", "exposedPerimeterM"],
    [{ ...base, exposedPerimeterM: -5 }, "non-positive-perimeter", "exposedPerimeterM"],
    [{ ...base, areaM2: 0 }, "non-positive-area", "areaM2"],
    [{ ...base, areaM2: -1 }, "non-positive-area", "areaM2"],
    [{ ...base, areaM2: Number.NaN }, "non-positive-area", "areaM2"],
    [{ ...base, soilConductivityWPerMK: 0 }, "invalid-input", "soilConductivityWPerMK"],
    [{ ...base, floorResistanceM2KPerW: -0.1 }, "invalid-input", "floorResistanceM2KPerW"],
  ] as const;
  for (const [input, reason, field] of cases) {
    const r = groundFloorU(input);
    assert.equal(r.kind, "rejected");
    if (r.kind !== "rejected") continue;
    assert.equal(r.reason, reason);
    assert.equal(r.field, field);
    assert.ok(r.message.length > 0 && !r.message.endsWith("."));
  }
});
