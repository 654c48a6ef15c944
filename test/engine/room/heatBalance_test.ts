import assert from "node:assert/strict";
import { type HeatBalanceResult, roomHeatBalance, type RoomInput } from "../../../src/engine/room/mod.ts";
import { AREAS, HEAVY, LIGHT, ordinaryRoom, R_SE, R_SI } from "./rooms.ts";

function balance(room: RoomInput): HeatBalanceResult {
  const r = roomHeatBalance(room);
  if (r.kind !== "heat-balance") throw new Error(r.message);
  return r;
}

const close = (a: number, b: number, relative: number, what: string) =>
  assert.ok(Math.abs(a - b) <= relative * Math.max(Math.abs(b), 1e-300), `${what}: ${a} vs ${b}`);

Deno.test("room heat balance in the steady limit: constant load equal to the sum of its conductions plus air-side terms", () => {
  const room = ordinaryRoom(HEAVY, { timestepS: 3600, steady: true });
  const r = balance(room);
  const load = r.loadW[0]!;
  // Constant in: nothing varies, so nothing may vary out (linear time-invariant system; no source needed).
  for (const v of r.loadW) close(v, load, 1e-9, "constant load");
  // Exactly: Σ conduction at the computed inside temperatures + ψ·L·ΔT + ventilation + gains (energy conservation;
  // the window conduction is among the faces).
  const conduction = r.faces.reduce((s, f) => s + f.conductionW[0]!, 0);
  close(load, conduction + 1.8 * 8 + 40 * 8 + 850, 1e-9, "load versus the sum of its parts");
  // Each opaque face conducts (θ_far − θ_s) / (R_se + Σ d/λ) at its own inside temperature (Fourier's law, series
  // resistances: steady state needs nothing more); the same-as-room partition conducts nothing.
  const layersR = {
    "outdoor-walls": [R_SE + 0.1 / 0.035 + 0.2 / 2.3, 32, AREAS.outdoorWalls],
    roof: [R_SE + 0.15 / 0.035 + 0.2 / 2.3, 32, AREAS.roof],
    floor: [0.1 / 0.035 + 0.15 / 2.3, 16, AREAS.floor],
    "corridor-wall": [R_SI.wall + 2 * (0.015 / 0.25) + 0.2 / 2.3, 28, AREAS.corridor],
  } as const;
  for (const [id, [resistance, far, area]] of Object.entries(layersR)) {
    const face = r.faces.find((f) => f.id === id)!;
    close(face.conductionW[0]!, (area * (far - face.insideSurfaceTemperatureC[0]!)) / resistance, 1e-9, id);
  }
  assert.ok(Math.abs(r.faces.find((f) => f.id === "partition")!.conductionW[0]!) < 1e-9 * load);
  // Exact steady identity (derived here; series resistances and one node per inside face): a face with conduction
  // resistance R_c to its far side and film h = h_c + h_r to an environment θ_env = (h_c θ_i + h_r θ_mrt)/h conducts
  //   q = U (θ_f − θ_env) − a U/h,   U = 1/(R_c + 1/h),   a = absorbed radiant gain per m²,
  // so   load = Σ A U (θ_f − θ_i) − (θ_mrt − θ_i) Σ A U h_r/h − Σ A a U/h + gains + ventilation + bridges.
  const hr = r.radiationWPerM2K;
  const mrt = r.meanRadiantTemperatureC[0]!;
  const totalArea = r.faces.reduce((s, f) => s + f.areaM2, 0);
  const absorbed = (0.6 * 450 + 0.5 * 400) / totalArea;
  const conducting = [
    ...Object.values(layersR),
    [1 / 1.4 - 1 / (2.5 + hr), 32, AREAS.window], // the window: U_w with its inside film taken out
  ];
  const hs = [2.5, 0.7, 5.0, 2.5, 2.5].map((hc) => hc + hr);
  let identity = 850 + 1.8 * 8 + 40 * 8;
  conducting.forEach(([rc, far, area], i) => {
    const h = hs[i]!;
    const u = 1 / (rc + 1 / h);
    identity += area * u * (far - 24) - (mrt - 24) * area * u * (hr / h) - area * absorbed * (u / h);
  });
  close(load, identity, 1e-9, "load versus the steady identity");
  // The hand sum with ISO 6946 U-values (R_si 0.13 / 0.17 / 0.10, R_se 0.04; Table 7, from memory):
  //   outdoor walls 36 m² / (0.04 + 0.1/0.035 + 0.2/2.3 + 0.13) × 8 K   =   92.48 W
  //   roof          48 m² / (0.04 + 0.15/0.035 + 0.2/2.3 + 0.17) × 8 K  =   83.79 W
  //   floor         48 m² / (0.1/0.035 + 0.15/2.3 + 0.10) × (−8 K)      = −127.05 W
  //   corridor wall 18 m² / (0.13 + 2·0.015/0.25 + 0.2/2.3 + 0.13) × 4 K =  154.19 W
  //   window 1.4 × 6 × 8 = 67.2; bridges 0.06 × 30 × 8 = 14.4; ventilation 40 × 8 = 320; gains 450 + 400 = 850 W
  //   total 1455.01 W
  const hand = (36 / (0.04 + 0.1 / 0.035 + 0.2 / 2.3 + 0.13)) * 8 +
    (48 / (0.04 + 0.15 / 0.035 + 0.2 / 2.3 + 0.17)) * 8 -
    (48 / (0.1 / 0.035 + 0.15 / 2.3 + 0.1)) * 8 +
    (18 / (0.13 + 2 * (0.015 / 0.25) + 0.2 / 2.3 + 0.13)) * 4 +
    1.4 * 6 * 8 + 0.06 * 30 * 8 + 40 * 8 + 850;
  close(hand, 1455.01, 1e-5, "the hand sum written out above");
  // The hand sum assumes every face exchanges with the air temperature and every gain reaches the air. The
  // difference is the long-wave share (θ_mrt ≠ θ_i) plus the radiant gains conducted out (a U/h): measured
  // here −8.1 % (−2.6 % with all gains convective; the uninsulated corridor wall and the ground floor take
  // up the radiation); issue 13's "under 2 %" does not hold for this room (reported).
  const longWave = (mrt - 24) *
    conducting.reduce((s, [rc, , area], i) => s + area * hr / hs[i]! / (rc + 1 / hs[i]!), 0);
  const radiantOut = conducting.reduce(
    (s, [rc, , area], i) => s + area * absorbed / hs[i]! / (rc + 1 / hs[i]!),
    0,
  );
  const filmRounding = Math.abs(hand - (identity + longWave + radiantOut));
  close(
    hand - load,
    longWave + radiantOut,
    filmRounding / (longWave + radiantOut) + 1e-9,
    "difference explained",
  );
  assert.ok(filmRounding < 0.005 * hand, `ISO films versus h_c + h_r: ${filmRounding} W`);
  console.log(
    `steady room: heat balance ${load.toFixed(1)} W, hand sum ${hand.toFixed(1)} W (${
      ((100 * (load - hand)) / hand).toFixed(2)
    } %): long-wave ${longWave.toFixed(1)} W, radiant gains conducted out ${radiantOut.toFixed(1)} W`,
  );
});

for (const timestepS of [3600, 600]) {
  Deno.test(`room heat balance closes the energy balance at every step (Δ = ${timestepS} s)`, () => {
    const r = balance(ordinaryRoom(HEAVY, { timestepS, steady: false }));
    // Conduction + absorbed radiant − convection − long-wave per face, and the room's sum, to 1e-9 of the
    // largest flow (issue 13's check; energy conservation, no other source needed).
    assert.ok(r.balanceResidual < 1e-9, `residual ${r.balanceResidual}`);
    assert.ok(r.adiabaticResidual < 1e-9, `adiabatic far face ${r.adiabaticResidual}`);
    assert.deepEqual(r.checks.map((c) => [c.id, c.pass]), [
      ["room-energy-balance", true],
      ["room-load-split", true],
      ["room-adiabatic-far-face", true],
    ]);
    const peak = Math.max(...r.loadW);
    for (const w of r.balanceResidualW) assert.ok(Math.abs(w) < 1e-9 * peak);
  });
}

Deno.test("room heat balance split by source sums to the total load (superposition of a linear system)", () => {
  const room = ordinaryRoom(LIGHT, { timestepS: 1800, steady: false });
  const r = balance(room);
  assert.ok(r.splitResidual < 1e-9, `split residual ${r.splitResidual}`);
  const part = (kind: string) => r.split.find((p) => p.source.kind === kind)!.loadW;
  // Ventilation and bridges reach the air at once: ρcV̇·(θ_e − θ_i) and H_ψ·(θ_e − θ_i) exactly (definition).
  part("ventilation").forEach((v, k) => close(v, 40 * (room.outdoorAirC[k]! - 24), 1e-12, "ventilation"));
  part("thermal-bridges").forEach((v, k) => close(v, 1.8 * (room.outdoorAirC[k]! - 24), 1e-12, "bridges"));
  // A constant set point stores nothing: its part is zero (every temperature equal gives no flow).
  for (const v of part("set-point")) assert.ok(Math.abs(v) < 1e-9 * r.peak.loadW);
  assert.equal(r.split.length, 4 + 1 + 1 + 2 + 2 + 1);
});

Deno.test("room heat balance of a single massless surface equals the closed-form film-and-wall series circuit", () => {
  // One surface: no long-wave exchange (θ_mrt = θ_s). Inside face balance (θ_f − θ_s)/R + a/A = h_c (θ_s − θ_i):
  //   θ_s = (θ_f/R + h_c θ_i + a/A) / (1/R + h_c),   load = h_c A (θ_s − θ_i) + convective gain
  // (series resistances and a heat balance at one node; analytic).
  const n = 24;
  const far = Array.from({ length: n }, (_, k) => 25 + 10 * Math.sin((2 * Math.PI * k) / n));
  const gain = Array.from({ length: n }, (_, k) => (k >= 9 && k < 17 ? 300 : 0));
  const area = 12;
  const resistance = 0.04 + 0.5;
  const hc = 3.1; // given for the surface, replacing the wall default 2.5
  const r = balance({
    timestepS: 3600,
    airTemperatureC: new Array<number>(n).fill(22),
    outdoorAirC: new Array<number>(n).fill(0),
    surfaces: [{
      id: "sheet",
      construction: {
        layers: [{ kind: "resistive", resistance: 0.5 }],
        outsideResistance: 0.04,
        insideResistance: 0.13,
      },
      areaM2: area,
      orientation: "wall",
      farSide: { kind: "temperature", temperatureC: far },
      convectionWPerM2K: hc,
    }],
    windows: [],
    gains: [{ name: "equipment", sensibleW: gain, radiantFraction: 0.4 }],
    ventilationWPerK: 0,
    thermalBridgesWPerK: 0,
  });
  for (let k = 0; k < n; k++) {
    const surface = (far[k]! / resistance + hc * 22 + (0.4 * gain[k]!) / area) / (1 / resistance + hc);
    close(r.faces[0]!.insideSurfaceTemperatureC[k]!, surface, 1e-12, `surface ${k}`);
    close(r.loadW[k]!, hc * area * (surface - 22) + 0.6 * gain[k]!, 1e-10, `load ${k}`);
  }
});

Deno.test("room heat balance of a room with only same-as-room surfaces turns the whole day's gain into load", () => {
  // Nothing passes out of the room, so over the periodic day the load removes exactly the heat put in
  // (energy conservation over one period: the stored heat returns to its start).
  const room = ordinaryRoom(HEAVY, { timestepS: 900, steady: false });
  const inner: RoomInput = {
    ...room,
    surfaces: room.surfaces.map((s) => ({ ...s, farSide: { kind: "same-as-room" } as const })),
    windows: [],
    ventilationWPerK: 0,
    thermalBridgesWPerK: 0,
  };
  const r = balance(inner);
  const sum = (xs: readonly number[]) => xs.reduce((a, b) => a + b, 0);
  const gains = sum(inner.gains.flatMap((g) => g.sensibleW));
  close(sum(r.loadW), gains, 1e-9, "daily load versus daily gains");
  // Stored and released: the peak is below the peak gain (mass) but the load never stops at night.
  assert.ok(r.peak.loadW < 850 && Math.min(...r.loadW) > 0);
});

Deno.test("room heat balance refuses bad input with the series, window or step named", () => {
  const room = ordinaryRoom(HEAVY, { timestepS: 3600, steady: true });
  const message = (input: RoomInput) => {
    const r = roomHeatBalance(input);
    assert.equal(r.kind, "room-failure");
    return r.kind === "room-failure" ? r.message : "";
  };
  assert.match(
    message({ ...room, outdoorAirC: room.outdoorAirC.slice(0, 23) }),
    /outdoor air temperature as 24 finite values/,
  );
  // A window cannot conduct more than its inside film passes: U_w < 1/R_si (ISO 6946 series resistances).
  assert.match(
    message({ ...room, windows: room.windows.map((w) => ({ ...w, uValue: 9 })) }),
    /Give window "window" a U-value between 0 and 7\.6\d W\/\(m² K\)/,
  );
  assert.match(message({ ...room, timestepS: 7 * 60 }), /time step 420 s/);
  assert.match(
    message({
      ...room,
      gains: [{ name: "lamp", sensibleW: room.gains[0]!.sensibleW, radiantFraction: 1.5 }],
    }),
    /Give gain "lamp" a radiant fraction from 0 to 1, found 1\.5/,
  );
});

Deno.test("room heat balance of one massive same-as-room slab under a swinging air temperature matches its admittance", () => {
  // One face (no long-wave exchange): a homogeneous slab with an adiabatic back has the surface admittance
  // Y = λ m tanh(m L), m = √(iω/a) (Carslaw & Jaeger, periodic conduction in a slab; ISO 13786's matrix method gives
  // the same). With the air at θ_i = 24 + 5 cos ωt and film h_c: θ_s = h_c θ_i / (h_c + Y), load = h_c A (θ_s − θ_i).
  // Response factors act on temperatures linear between steps, so the discrete harmonic carries sinc²(π/N)
  // (triangular pulse). The aliases at ω + 2πj/Δ add about (1/(N j))²·|Y(2πj/Δ)|/|Y(ω)| ≈ 6e-4 for j = ±1 at N = 144,
  // partly cancelling: compared to 1e-3 of the amplitude.
  const n = 144;
  const omega = (2 * Math.PI) / 86400;
  const [thickness, conductivity, volumetric] = [0.2, 1.0, 2.0e6];
  const diffusivity = conductivity / volumetric;
  const a = Math.sqrt(omega / (2 * diffusivity)); // m = a (1 + i)
  const [x, y] = [2 * a * thickness, 2 * a * thickness]; // tanh(u + iv) = (sinh 2u + i sin 2v) / (cosh 2u + cos 2v)
  const den = Math.cosh(x) + Math.cos(y);
  const [tr, ti] = [Math.sinh(x) / den, Math.sin(y) / den];
  const sinc = Math.sin(Math.PI / n) / (Math.PI / n);
  // Y = λ a (1 + i)(tr + i ti) · sinc²
  const yRe = conductivity * a * (tr - ti) * sinc * sinc;
  const yIm = conductivity * a * (tr + ti) * sinc * sinc;
  const hc = 2.5;
  const area = 20;
  // load amplitude = −A h_c · 5 · Y / (h_c + Y)
  const dRe = hc + yRe;
  const dd = dRe * dRe + yIm * yIm;
  const ratioRe = (yRe * dRe + yIm * yIm) / dd;
  const ratioIm = (yIm * dRe - yRe * yIm) / dd;
  const air = Array.from({ length: n }, (_, k) => 24 + 5 * Math.cos((2 * Math.PI * k) / n));
  const r = balance({
    timestepS: 600,
    airTemperatureC: air,
    outdoorAirC: new Array<number>(n).fill(24),
    surfaces: [{
      id: "slab",
      construction: {
        layers: [{ kind: "massive", thicknessM: thickness, conductivity, density: 2000, specificHeat: 1000 }],
        outsideResistance: 0.13,
        insideResistance: 0.13,
      },
      areaM2: area,
      orientation: "wall",
      farSide: { kind: "same-as-room" },
    }],
    windows: [],
    gains: [],
    ventilationWPerK: 0,
    thermalBridgesWPerK: 0,
  });
  const amplitude = area * hc * 5 * Math.hypot(ratioRe, ratioIm);
  r.loadW.forEach((v, k) => {
    const phase = (2 * Math.PI * k) / n;
    const expected = -area * hc * 5 * (ratioRe * Math.cos(phase) - ratioIm * Math.sin(phase));
    assert.ok(Math.abs(v - expected) < 1e-3 * amplitude, `step ${k}: ${v} vs ${expected}`);
  });
});
