/**
 * The room's design heat loss against hand sums. Basis (src/engine/room/designHeatLoss.ts):
 *   transmission Φ = U·A_net·b·(θ_int − θ_e), b = 1 outdoor, (θ_int − θ_adj)/(θ_int − θ_e) adjacent, 0 same-as-room
 *   (temperature adjustment factor as in ISO 13789:2017, from memory); windows U_w·A_w·b·(θ_int − θ_e);
 *   ground U_g·A·(θ_int − θ_m,annual) (ISO 13370:2017 steady-state part); bridges ψ·L·ΔT and χ·n·ΔT;
 *   ventilation ρc·V̇·ΔT with ρc = 1200 J/(m³ K) (ISO 13789:2017, from memory) and V̇ = n·V/3600.
 */
import assert from "node:assert/strict";
import {
  type DesignHeatLoss,
  designHeatLoss,
  type DesignHeatLossInput,
  type LossSurface,
} from "../../../src/engine/room/designHeatLoss.ts";
import { netOpaqueAreas } from "../../../src/engine/room/netOpaqueAreas.ts";
import { groundFloorU } from "../../../src/engine/room/groundFloor.ts";

const EPS = 1e-9;

function near(actual: number, expected: number, what: string): void {
  assert.ok(
    Math.abs(actual - expected) <= EPS * Math.max(1, Math.abs(expected)),
    `${what}: ${actual} vs ${expected}`,
  );
}

function ok(r: ReturnType<typeof designHeatLoss>): DesignHeatLoss {
  if (r.kind !== "design-heat-loss") throw new Error(`rejected: ${r.message}`);
  return r;
}

/**
 * The small room: θ_int = 20 °C, θ_e = −10 °C (ΔT = 30 K), θ_m,annual = 10 °C (ground ΔT = 10 K).
 * Gross areas; the 4 m² window sits in the south wall.
 */
const GROSS = [
  { id: "south-wall", grossAreaM2: 20 },
  { id: "roof", grossAreaM2: 40 },
  { id: "corridor-wall", grossAreaM2: 12 },
  { id: "partition", grossAreaM2: 15 },
  { id: "floor", grossAreaM2: 40 },
];
const WINDOWS = [{ id: "south-glazing", hostId: "south-wall", areaM2: 4, uValueWPerM2K: 1.4 }];

function smallRoom(): DesignHeatLossInput {
  const net = netOpaqueAreas(GROSS, WINDOWS);
  if (net.kind !== "net-areas") throw new Error(net.message);
  const area = (id: string) => net.areas.find((a) => a.id === id)!.netAreaM2;
  const surfaces: LossSurface[] = [
    { id: "south-wall", uValueWPerM2K: 0.3, netAreaM2: area("south-wall"), boundary: { kind: "outdoor" } },
    { id: "roof", uValueWPerM2K: 0.2, netAreaM2: area("roof"), boundary: { kind: "outdoor" } },
    {
      id: "corridor-wall",
      uValueWPerM2K: 0.5,
      netAreaM2: area("corridor-wall"),
      boundary: { kind: "adjacent", temperatureC: 14 },
    },
    { id: "partition", uValueWPerM2K: 0.4, netAreaM2: area("partition"), boundary: { kind: "same-as-room" } },
    { id: "floor", uValueWPerM2K: 0.35, netAreaM2: area("floor"), boundary: { kind: "ground" } },
  ];
  return {
    indoorC: 20,
    outdoorC: -10,
    annualMeanOutdoorC: 10,
    surfaces,
    windows: WINDOWS,
    linearBridges: [{ name: "wall–roof junction", psiWPerMK: 0.06, lengthM: 26 }],
    pointBridges: [{ name: "balcony anchors", chiWPerK: 0.05, count: 4 }],
    ventilation: { kind: "air-changes", perHour: 0.5, volumeM3: 100 },
  };
}

Deno.test("design heat loss of a small room equals its hand sum line by line", () => {
  // Hand sum (ΔT = 20 − (−10) = 30 K):
  //   south-wall     U 0.30 × A (20 − 4 = 16) × b 1          = 4.8 W/K  × 30 = 144 W
  //   roof           U 0.20 × A 40 × b 1                      = 8.0 W/K  × 30 = 240 W
  //   corridor-wall  U 0.50 × A 12 × b (20 − 14)/30 = 0.2     = 1.2 W/K  × 30 =  36 W  (= 0.5 × 12 × 6)
  //   partition      U 0.40 × A 15 × b 0                      = 0   W/K        =   0 W
  //   transmission                                                             = 420 W
  //   south-glazing  U_w 1.4 × A_w 4 × b 1                    = 5.6 W/K  × 30 = 168 W
  //   floor (ground) U_g 0.35 × A 40 = 14 W/K × (20 − 10) = 10 K               = 140 W
  //   ψ 0.06 × L 26 = 1.56 W/K × 30 = 46.8 W;  χ 0.05 × n 4 = 0.2 W/K × 30 = 6 W → bridges 52.8 W
  //   ventilation    1200 × 0.5 × 100 / 3600 = 16.6667 W/K × 30                = 500 W
  //   total = 420 + 168 + 140 + 52.8 + 500 = 1280.8 W;  H = 1280.8 / 30 = 42.69333 W/K
  const r = ok(designHeatLoss(smallRoom()));
  const expected: readonly [string, string, number, number, number][] = [
    ["transmission", "south-wall", 4.8, 30, 144],
    ["transmission", "roof", 8.0, 30, 240],
    ["transmission", "corridor-wall", 1.2, 30, 36],
    ["transmission", "partition", 0, 30, 0],
    ["windows", "south-glazing", 5.6, 30, 168],
    ["ground", "floor", 14, 10, 140],
    ["thermalBridges", "wall–roof junction", 1.56, 30, 46.8],
    ["thermalBridges", "balcony anchors", 0.2, 30, 6],
    ["ventilation", "ventilation", 1200 * 0.5 * 100 / 3600, 30, 500],
  ];
  assert.equal(r.lines.length, expected.length);
  expected.forEach(([group, id, h, dT, phi], k) => {
    const l = r.lines[k]!;
    assert.equal(l.group, group);
    assert.equal(l.id, id);
    near(l.hWPerK, h, `${id} H`);
    near(l.deltaTK, dT, `${id} ΔT`);
    near(l.phiW, phi, `${id} Φ`);
  });
  near(r.subtotalsW.transmission, 420, "transmission");
  near(r.subtotalsW.windows, 168, "windows");
  near(r.subtotalsW.ground, 140, "ground");
  near(r.subtotalsW.thermalBridges, 52.8, "thermal bridges");
  near(r.subtotalsW.ventilation, 500, "ventilation");
  near(r.subtotalsW.total, 1280.8, "total");
  near(r.heatLossCoefficientWPerK, 1280.8 / 30, "H");
  assert.equal(r.designDeltaTK, 30);
  assert.equal(r.airHeatCapacity.valueJPerM3K, 1200);
  assert.equal(r.airHeatCapacity.defaulted, true);
  assert.ok(r.statements.some((s) => s.includes("periodic") && s.includes("stated simplification")));
});

Deno.test("design heat loss: the lines add up to the total exactly", () => {
  const r = ok(designHeatLoss(smallRoom()));
  let sum = 0;
  for (const l of r.lines) sum += l.phiW;
  assert.equal(sum, r.subtotalsW.total);
  for (const l of r.lines) assert.equal(l.phiW, l.hWPerK * l.deltaTK, `${l.id}: Φ = H·ΔT`);
  const product = (l: (typeof r.lines)[number]) => l.quantities.reduce((p, q) => p * q.value, 1);
  for (const l of r.lines.filter((x) => x.group !== "ventilation")) {
    near(l.hWPerK, product(l), `${l.id}: H = product of its quantities`);
  }
});

Deno.test("design heat loss: an adjacent space enters with b = (θ_int − θ_adj)/(θ_int − θ_e)", () => {
  // Corridor at 14 °C: b = (20 − 14)/(20 − (−10)) = 0.2. A warmer neighbour at 23 °C: b = −3/30 = −0.1,
  // Φ = 0.5 × 12 × (−0.1) × 30 = −18 W (a gain, counted as such).
  const r = ok(designHeatLoss(smallRoom()));
  const corridor = r.lines.find((l) => l.id === "corridor-wall")!;
  near(corridor.quantities.find((q) => q.symbol === "b")!.value, 0.2, "b");
  const warmer = smallRoom();
  const surfaces = warmer.surfaces.map((s) =>
    s.id === "corridor-wall" ? { ...s, boundary: { kind: "adjacent" as const, temperatureC: 23 } } : s
  );
  const w = ok(designHeatLoss({ ...warmer, surfaces }));
  near(w.lines.find((l) => l.id === "corridor-wall")!.phiW, -18, "warmer neighbour");
});

Deno.test("design heat loss: a same-as-room surface contributes nothing, whatever its U and area", () => {
  const base = smallRoom();
  const bigger = base.surfaces.map((s) =>
    s.id === "partition" ? { ...s, uValueWPerM2K: 3, netAreaM2: 500 } : s
  );
  const r0 = ok(designHeatLoss(base));
  const r1 = ok(designHeatLoss({ ...base, surfaces: bigger }));
  const partition = r1.lines.find((l) => l.id === "partition")!;
  assert.equal(partition.phiW, 0);
  assert.equal(partition.hWPerK, 0);
  assert.equal(r1.subtotalsW.total, r0.subtotalsW.total);
});

Deno.test("net opaque areas: window areas come out of their host, a window larger than its host is refused", () => {
  // south-wall 20 − 4 = 16 m²; two windows 3 + 5 in a 10 m² wall leave 2 m²; 6 + 5 = 11 > 10 is refused.
  const net = netOpaqueAreas(GROSS, WINDOWS);
  assert.equal(net.kind, "net-areas");
  if (net.kind !== "net-areas") return;
  assert.deepEqual(net.areas[0], { id: "south-wall", grossAreaM2: 20, windowAreaM2: 4, netAreaM2: 16 });
  assert.equal(net.areas[1]!.netAreaM2, 40, "no window in the roof");
  const wall = [{ id: "w", grossAreaM2: 10 }];
  const two = netOpaqueAreas(wall, [{ id: "a", hostId: "w", areaM2: 3 }, {
    id: "b",
    hostId: "w",
    areaM2: 5,
  }]);
  assert.equal(two.kind === "net-areas" && two.areas[0]!.netAreaM2, 2);
  const over = netOpaqueAreas(wall, [{ id: "a", hostId: "w", areaM2: 6 }, {
    id: "b",
    hostId: "w",
    areaM2: 5,
  }]);
  assert.equal(over.kind, "rejected");
  assert.equal(over.kind === "rejected" && over.reason, "windows-exceed-host");
  assert.ok(over.kind === "rejected" && over.message.includes("11") && over.message.includes("10"));
  const unknown = netOpaqueAreas(wall, [{ id: "a", hostId: "nowhere", areaM2: 1 }]);
  assert.equal(unknown.kind === "rejected" && unknown.reason, "unknown-host");
  // 0.1 + 0.2 = 0.30000000000000004 in floating point: a fully glazed 0.3 m² panel is not refused.
  const full = netOpaqueAreas([{ id: "p", grossAreaM2: 0.3 }], [
    { id: "a", hostId: "p", areaM2: 0.1 },
    { id: "b", hostId: "p", areaM2: 0.2 },
  ]);
  assert.equal(full.kind === "net-areas" && full.areas[0]!.netAreaM2, 0);
});

Deno.test("design heat loss: outdoor-air ventilation and a given ρc", () => {
  // 0.02 m³/s × 1206 J/(m³ K) = 24.12 W/K × 30 K = 723.6 W; ρc flagged as given.
  const r = ok(designHeatLoss({
    ...smallRoom(),
    ventilation: { kind: "outdoor-air", flowM3PerS: 0.02 },
    airHeatCapacityJPerM3K: 1206,
  }));
  near(r.subtotalsW.ventilation, 723.6, "ventilation");
  assert.equal(r.airHeatCapacity.defaulted, false);
});

Deno.test("design heat loss: a ground floor from groundFloorU loses to the annual mean outdoor temperature", () => {
  // U_g of a 40 m² floor with P = 26 m, R_f = 0.1, λ = 2, w = 0.3 (ISO 13370): B′ = 40/13 = 3.0769 m,
  // d_t = 0.3 + 2 × 0.31 = 0.92 m < B′, πB′ = 9.666439, 4/(9.666439 + 0.92) = 0.3778419,
  // ln(9.666439/0.92 + 1) = ln(11.506999) = 2.4429554, U = 0.3778419 × 2.4429554 = 0.9230509 W/(m² K)
  // (hand calculation); Φ = 0.9230509 × 40 × (20 − 10) = 369.2204 W.
  const g = groundFloorU({ areaM2: 40, exposedPerimeterM: 26, floorResistanceM2KPerW: 0.1 });
  assert.equal(g.kind, "ground-floor");
  if (g.kind !== "ground-floor") return;
  const bPrime = 40 / 13, dt = 0.92;
  const uHand = (4 / (Math.PI * bPrime + dt)) * Math.log((Math.PI * bPrime) / dt + 1);
  near(g.uValueWPerM2K, uHand, "U_g");
  assert.ok(Math.abs(uHand - 0.9230509) < 1e-7);
  const base = smallRoom();
  const surfaces = base.surfaces.map((s) => s.id === "floor" ? { ...s, uValueWPerM2K: g.uValueWPerM2K } : s);
  const r = ok(designHeatLoss({ ...base, surfaces }));
  near(r.subtotalsW.ground, uHand * 40 * 10, "ground");
  assert.ok(Math.abs(r.subtotalsW.ground - 369.2204) < 1e-4);
});

Deno.test("design heat loss: impossible input is a typed rejection, not a throw", () => {
  const base = smallRoom();
  const cases: [DesignHeatLossInput, string][] = [
    [{ ...base, indoorC: -10 }, "indoor-not-above-outdoor"],
    [{ ...base, annualMeanOutdoorC: undefined } as unknown as DesignHeatLossInput, "missing-annual-mean"],
    [{ ...base, windows: [{ ...WINDOWS[0]!, hostId: "floor" }] }, "window-in-ground-surface"],
    [{ ...base, windows: [{ ...WINDOWS[0]!, hostId: "nowhere" }] }, "unknown-window-host"],
    [{ ...base, windows: [{ ...WINDOWS[0]!, areaM2: -1 }] }, "invalid-input"],
    [{ ...base, ventilation: { kind: "outdoor-air", flowM3PerS: Number.NaN } }, "invalid-input"],
    [{ ...base, airHeatCapacityJPerM3K: 0 }, "invalid-input"],
  ];
  for (const [input, reason] of cases) {
    const r = designHeatLoss(input);
    assert.equal(r.kind, "rejected", reason);
    assert.equal(r.kind === "rejected" && r.reason, reason);
    assert.ok(r.kind === "rejected" && !r.message.endsWith("."));
  }
  // Without any ground surface the annual mean is not needed.
  const noGround = { ...base, surfaces: base.surfaces.filter((s) => s.boundary.kind !== "ground") };
  const { annualMeanOutdoorC: _unused, ...rest } = noGround;
  assert.equal(designHeatLoss(rest).kind, "design-heat-loss");
});
