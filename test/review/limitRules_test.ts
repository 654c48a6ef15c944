import assert from "node:assert/strict";
import { computeProject } from "../../src/results/buildResults.ts";
import { reviewProject } from "../../src/review/mod.ts";
import { construction, hits, modelOf } from "./_project.ts";

const BOARD =
  "{ name: board, thickness: 100 mm, conductivity: 0.04 W/(m K), density: 30 kg/m^3, specific-heat: 1000 J/(kg K), source: invented }";

Deno.test("reviewProject() reports each written limit as limit-met (note) or limit-not-met (warning)", () => {
  // U = 1/(0.04 + 0.1/0.04 + 0.13) = 1/2.67 = 0.3745 W/(m²K) (ISO 6946 homogeneous layers, defaults R_se, R_si)
  const model = modelOf(
    construction(
      "W-1",
      "Board wall",
      [BOARD],
      [
        "limits:",
        '  max-u: { value: "0.30 W/(m^2 K)", clause: "Brief X, cl. 1" }',
        '  min-temperature-factor: { value: 0.9, clause: "Brief X, cl. 2" }',
        "",
      ].join("\n"),
    ),
  );
  const computed = computeProject(model, []);
  assert.ok(computed.ok);
  const findings = reviewProject(model, computed.computed.results);
  assert.deepStrictEqual(hits(findings, "limit-not-met"), ["limit-not-met@input.md:2:1"]);
  assert.deepStrictEqual(hits(findings, "limit-met"), ["limit-met@input.md:2:1"]);
  const unmet = findings.find((f) => f.rule === "limit-not-met")!;
  assert.equal(unmet.severity, "warning");
  assert.equal(unmet.value, "U (incl. ΔU corrections) = 0.3745 W/(m²K)");
  assert.equal(unmet.expected, "≤ 0.3 W/(m²K)");
  assert.equal(unmet.source, "Brief X, cl. 1");
  const met = findings.find((f) => f.rule === "limit-met")!;
  assert.equal(met.severity, "note");
  // f_Rsi = 1 − 0.25/(2.67 − 0.13 + 0.25) = 0.9104 with the ISO 13788 default moisture R_si 0.25 (from memory)
  assert.equal(met.value, "temperature factor f_Rsi (R_si = 0.25 m²·K/W) = 0.9104");
  assert.equal(met.expected, "≥ 0.9");
});

Deno.test("reviewProject() reports no limit findings when no limit is written", () => {
  const model = modelOf(construction("W-1", "Board wall", [BOARD]));
  const computed = computeProject(model, []);
  assert.ok(computed.ok);
  const findings = reviewProject(model, computed.computed.results);
  assert.deepStrictEqual(hits(findings, "limit-met").concat(hits(findings, "limit-not-met")), []);
});
