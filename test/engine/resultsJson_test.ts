import assert from "node:assert/strict";
import {
  analyseConstruction,
  constructionChecksJson,
  constructionDynamicJson,
} from "../../src/engine/mod.ts";
import { HEAVY_WALL } from "./walls.ts";

Deno.test("constructionDynamicJson() names the fields as DESIGN.md §4 (results.json contract)", () => {
  const a = analyseConstruction(HEAVY_WALL, 3600);
  if (a.kind !== "analysis") throw new Error(a.message);
  const json = constructionDynamicJson(a);
  for (
    const key of [
      "tau1_h",
      "responseFactors",
      "ctf",
      "ctfStateSpace",
      "surfaceToSurface",
      "periodic",
      "periodicX",
      "periodicZ",
      "cts",
      "dynamic",
    ]
  ) {
    assert.ok(key in json, key);
  }
  assert.deepEqual(Object.keys(json.responseFactors).sort(), ["X", "Y", "Z", "truncationResidual"]);
  assert.deepEqual(Object.keys(json.ctf!).sort(), ["Phi", "X", "Y", "Z"]);
  assert.deepEqual(Object.keys(json.ctfStateSpace!).sort(), ["Phi", "X", "Y", "Z", "cellsPerLayer"]);
  assert.equal(json.ctfStateSpace!.cellsPerLayer.length, HEAVY_WALL.layers.length);
  assert.equal(json.ctfStateSpace!.cellsPerLayer[2], 0, "resistive layer has no cells");
  // `modal` is an extension (the package embeds long series as their modal form).
  assert.deepEqual(Object.keys(json.surfaceToSurface).sort(), ["U", "ctf", "modal", "responseFactors"]);
  assert.deepEqual(Object.keys(json.dynamic).sort(), [
    "admittanceInside",
    "admittanceOutside",
    "arealHeatCapacityInside",
    "arealHeatCapacityOutside",
    "decrementFactor",
    "periodicTransmittance",
    "timeLag_h",
  ]);
  assert.equal(json.periodic.length, 24);
  assert.equal(json.cts.length, 24);
  // CTS sums to 1 (identity: periodic factors sum to U).
  assert.ok(Math.abs(json.cts.reduce((s, v) => s + v, 0) - 1) < 1e-12);
  // The contract's time shifts: negative = lag.
  assert.ok(json.dynamic.periodicTransmittance.timeShift_h < 0);
  assert.equal(json.dynamic.periodicTransmittance.timeShift_h, -json.dynamic.timeLag_h);
  const round = JSON.parse(JSON.stringify(json));
  assert.equal(round.responseFactors.X.length, a.airToAir.responseFactors.termCount);
  const checks = constructionChecksJson("EW-1", a);
  assert.ok(checks.every((c) => c.subject === "construction:EW-1"));
  for (
    const id of [
      "sum-rule-X",
      "sum-rule-Y",
      "sum-rule-Z",
      "ctf-identity",
      "root-count",
      "iso13786-harmonic-amplitude",
      "iso13786-harmonic-phase",
      "state-space-reciprocity",
      "transmission-determinant",
      "state-space-agreement",
    ]
  ) {
    assert.ok(checks.some((c) => c.id === id), id);
  }
});
