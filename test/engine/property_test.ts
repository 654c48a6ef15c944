import assert from "node:assert/strict";
import fc from "fast-check";
import { analyseConstruction } from "../../src/engine/mod.ts";
import type { ConstructionInput, Layer } from "../../src/engine/layer.ts";

// Property sweep over random walls (identities, no invented numbers): Σ X = Σ Y = Σ Z = U (sum rules, 1e-8),
// ΣCTF/(1 − ΣΦ) = U (z-transform identity, 1e-6) whenever a CTF is accepted, found poles = exact count,
// det M = 1 (reciprocity), periodic factors sum to U, the ISO harmonic cross-check, and U = 1/ΣR (ISO 6946).
const layerArb: fc.Arbitrary<Layer> = fc.oneof(
  {
    weight: 4,
    arbitrary: fc.record({
      kind: fc.constant("massive" as const),
      thicknessM: fc.double({ min: 0.001, max: 0.4, noNaN: true }),
      conductivity: fc.double({ min: 0.02, max: 230, noNaN: true }),
      density: fc.double({ min: 10, max: 8000, noNaN: true }),
      specificHeat: fc.double({ min: 400, max: 2000, noNaN: true }),
    }),
  },
  {
    weight: 1,
    arbitrary: fc.record({
      kind: fc.constant("resistive" as const),
      resistance: fc.double({ min: 0, max: 3, noNaN: true }),
    }),
  },
);

const wallArb: fc.Arbitrary<ConstructionInput> = fc.record({
  layers: fc.array(layerArb, { minLength: 1, maxLength: 8 }),
  outsideResistance: fc.constantFrom(0.04, 0.0, 0.1),
  insideResistance: fc.constantFrom(0.13, 0.1, 0.17),
});

Deno.test("analyseConstruction() identities hold on random walls (fast-check)", () => {
  const ids = [
    "sum-rule-X",
    "sum-rule-Y",
    "sum-rule-Z",
    "sum-rule-X-surface",
    "sum-rule-Y-surface",
    "sum-rule-Z-surface",
    "root-count",
    "root-count-surface",
    "transmission-determinant",
    "iso13786-harmonic-amplitude",
    "iso13786-harmonic-phase",
    "periodic-fold",
  ];
  fc.assert(
    fc.property(wallArb, fc.constantFrom(3600, 1800, 900, 600), (wall, dt) => {
      const a = analyseConstruction(wall, dt, { stateSpace: false });
      if (a.kind !== "analysis") return a.reason === "zero-resistance";
      for (const id of ids) {
        const c = a.checks.find((x) => x.id === id)!;
        assert.ok(c.pass, `${id} = ${c.value} > ${c.limit}`);
      }
      if (a.airToAir.ctfAccepted) {
        assert.ok(a.checks.find((x) => x.id === "ctf-identity")!.pass);
      }
      const rTotal = wall.outsideResistance + wall.insideResistance +
        wall.layers.reduce(
          (s, l) => s + (l.kind === "massive" ? l.thicknessM / l.conductivity : l.resistance),
          0,
        );
      assert.ok(Math.abs(a.airToAir.uValue * rTotal - 1) < 1e-12);
      const sumP = a.periodic.Y.reduce((s, v) => s + v, 0);
      assert.ok(
        Math.abs(sumP / a.airToAir.uValue - 1) < 1e-9,
        `Σ periodic Y / U = ${sumP / a.airToAir.uValue}`,
      );
      return true;
    }),
    { numRuns: 150, seed: 20310721 },
  );
});

Deno.test("analyseConstruction() state-space route agrees on random moderate walls (fast-check)", () => {
  fc.assert(
    fc.property(fc.array(layerArb, { minLength: 1, maxLength: 4 }), (layers) => {
      const a = analyseConstruction({ layers, outsideResistance: 0.04, insideResistance: 0.13 }, 3600);
      if (a.kind !== "analysis") return false;
      for (const id of ["state-space-agreement", "state-space-reciprocity"]) {
        const c = a.checks.find((x) => x.id === id)!;
        assert.ok(c.pass, `${id} = ${c.value} > ${c.limit}`);
      }
      return true;
    }),
    { numRuns: 12, seed: 5 },
  );
});
