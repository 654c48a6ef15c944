/** The `bridge:`, `corrections:` and `limits:` syntax: what is accepted, and each mistake at its file:line:col. */
import assert from "node:assert/strict";
import { formatPosition } from "../../src/project/position.ts";
import { resolveProject } from "../../src/project/resolveProject.ts";

const FRONT = (extra = "") =>
  `---\ntitle: T\nreference: T-1\nrevision: A\nstatus: draft\nprepared-by: P\nchecked-by: C\ndate: 2031-01-15\nunits: SI\n${extra}---\n\n# T\n`;

const WOOL = "material: mineral-wool-25, thickness: 140 mm";

function resolve(layers: readonly string[], extra = "", front = "") {
  const text = "```construction\nid: W-1\nname: Wall\nlayers:\n" + layers.map((l) => `  - ${l}\n`).join("") +
    extra + "```\n";
  return resolveProject([{ path: "project.md", text: FRONT(front) }, { path: "w.md", text }]);
}

function found(layers: readonly string[], extra = "", front = ""): string[] {
  return resolve(layers, extra, front).diagnostics.map((d) =>
    `${d.severity}:${d.rule}@${formatPosition(d.at)}`
  );
}

Deno.test("a bridged layer resolves to the equivalent layer and keeps what was written", () => {
  const r = resolve([`{ ${WOOL}, bridge: { material: timber-softwood-500, fraction: 0.15 } }`]);
  assert.deepStrictEqual(r.diagnostics, []);
  const layer = r.model!.constructions[0]!.layers[0]!;
  assert.equal(layer.kind, "massive");
  assert.equal(layer.bridge?.fraction, 0.15);
  assert.equal(layer.bridge?.base.conductivity, 0.035);
  assert.equal(layer.bridge?.bridge.materialId, "timber-softwood-500");
  // ρc = 0.85·25·1030 + 0.15·500·1600 = 21 887.5 + 120 000 (library values) — area-weighted
  if (layer.kind !== "massive") return;
  assert.ok(Math.abs(layer.density * layer.specificHeat - (0.85 * 25 * 1030 + 0.15 * 500 * 1600)) < 1e-9);
  // Not the infill's own λ any more: the studs raise it.
  assert.ok(layer.conductivity > 0.035 && layer.conductivity < 0.85 * 0.035 + 0.15 * 0.13);
});

Deno.test("bad bridges are errors at the offending value", () => {
  assert.deepStrictEqual(found([`{ ${WOOL}, bridge: { material: timber-softwood-500, fraction: 0 } }`]), [
    "error:bad-fraction@w.md:5:104",
  ]);
  assert.deepStrictEqual(found([`{ ${WOOL}, bridge: { material: timber-softwood-500, fraction: 15 } }`]), [
    "error:bad-fraction@w.md:5:104",
  ]);
  assert.deepStrictEqual(found([`{ ${WOOL}, bridge: { material: timber-softwood-500 } }`]), [
    "error:missing-key@w.md:5:61",
  ]);
  assert.deepStrictEqual(
    found([`{ ${WOOL}, bridge: { material: air-layer-25mm-horizontal, fraction: 0.1 } }`]),
    ["error:bridge-massless@w.md:5:73"],
  );
  assert.deepStrictEqual(found([`{ ${WOOL}, bridge: { material: timbr-softwood-500, fraction: 0.1 } }`]), [
    "error:unknown-material@w.md:5:73",
  ]);
  assert.deepStrictEqual(
    found([`{ ${WOOL}, bridge: { name: studs, density: 500 kg/m^3, fraction: 0.1 } }`]),
    [
      "error:missing-key@w.md:5:61",
      "error:missing-key@w.md:5:61",
    ],
  );
  assert.deepStrictEqual(
    found([
      `{ name: gap, resistance: 0.18 m^2 K/W, bridge: { material: timber-softwood-500, fraction: 0.1 } }`,
    ]),
    ["error:bridge-on-massless@w.md:5:44"],
  );
  const twice = `{ ${WOOL}, bridge: { material: timber-softwood-500, fraction: 0.1 } }`;
  assert.deepStrictEqual(found([twice, twice]), ["error:several-bridged-layers@w.md:6:61"]);
});

Deno.test("a large fraction is a warning; a steel stud warns that the combined method does not apply", () => {
  assert.deepStrictEqual(found([`{ ${WOOL}, bridge: { material: timber-softwood-500, fraction: 0.6 } }`]), [
    "warning:bridge-fraction-large@w.md:5:104",
  ]);
  assert.deepStrictEqual(found([`{ ${WOOL}, bridge: { material: steel-carbon, fraction: 0.05 } }`]), [
    "warning:combined-method-not-applicable@w.md:5:61",
  ]);
});

Deno.test("corrections need a source and a valid level; limits need a unit, a clause and a known key", () => {
  assert.deepStrictEqual(found([`{ ${WOOL}, corrections: { fasteners: "0.02 W/(m^2 K)" } }`]), [
    "error:missing-key@w.md:5:66",
  ]);
  assert.deepStrictEqual(
    found([`{ ${WOOL}, corrections: { air-gaps: { level: 3, delta-u: "0.01 W/(m^2 K)" }, source: s } }`]),
    ["error:bad-choice@w.md:5:87"],
  );
  assert.deepStrictEqual(found([`{ ${WOOL} }`], "limits:\n  max-u: { value: 0.18, clause: c }\n"), [
    "error:bad-quantity@w.md:7:19",
  ]);
  assert.deepStrictEqual(found([`{ ${WOOL} }`], 'limits:\n  max-u: { value: "0.18 W/(m^2 K)" }\n'), [
    "error:missing-key@w.md:7:10",
  ]);
  assert.deepStrictEqual(found([`{ ${WOOL} }`], "limits:\n  max-uvalue: { value: 1, clause: c }\n"), [
    "error:unknown-key@w.md:7:3",
  ]);
  assert.deepStrictEqual(found([`{ ${WOOL} }`], "", "limits:\n  min-time-lag: { value: 8, clause: c }\n"), [
    "error:bad-quantity@project.md:11:26",
  ]);
});

Deno.test("project-wide limits are read into the project info in SI (time lag in hours)", () => {
  const r = resolve(
    [`{ ${WOOL} }`],
    "",
    'limits:\n  min-time-lag: { value: "8 h", clause: "Brief, cl. 9" }\n',
  );
  assert.deepStrictEqual(r.diagnostics, []);
  assert.deepStrictEqual(r.model!.info.limits?.map((l) => [l.quantity, l.limit, l.clause, l.scope]), [
    ["min-time-lag", 8, "Brief, cl. 9", "project"],
  ]);
});
