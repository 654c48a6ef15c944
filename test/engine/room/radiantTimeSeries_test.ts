import assert from "node:assert/strict";
import {
  type RadiantTimeSeries,
  roomCoolingLoad,
  roomHeatBalance,
  type RoomInput,
  roomRadiantTimeSeries,
  roomRtsMethod,
} from "../../../src/engine/room/mod.ts";
import { circularConvolution } from "../../../src/engine/room/dft.ts";
import { HEAVY, LIGHT, ordinaryRoom } from "./rooms.ts";

function series(room: RoomInput): RadiantTimeSeries {
  const s = roomRadiantTimeSeries(room);
  if (s.kind !== "radiant-time-series") throw new Error(s.message);
  return s;
}

const sum = (xs: readonly number[]) => xs.reduce((a, b) => a + b, 0);

Deno.test("room radiant time series sum to 1 and are non-negative", () => {
  for (const set of [HEAVY, LIGHT]) {
    const s = series(ordinaryRoom(set, { timestepS: 3600, steady: false }));
    for (const r of [s.nonsolar, s.solar]) {
      assert.equal(r.length, 24);
      // Σ r_j = 1 and r_j ≥ 0: the definition of a radiant time series (ASHRAE Handbook—Fundamentals, RTS method;
      // from memory).
      assert.ok(Math.abs(sum(r) - 1) < 1e-12);
      for (const v of r) assert.ok(v >= 0, `r_j = ${v}`);
    }
    assert.ok(s.checks.every((c) => c.pass));
    // Part of the pulse leaves through the envelope: 0 < retained < 1 (energy conservation).
    assert.ok(s.nonsolarRetained > 0.5 && s.nonsolarRetained < 1);
    assert.ok(s.solarRetained > 0.5 && s.solarRetained < 1);
  }
});

Deno.test("a heavier room gives a flatter radiant time series than a lighter one of the same areas", () => {
  const heavy = series(ordinaryRoom(HEAVY, { timestepS: 3600, steady: false }));
  const light = series(ordinaryRoom(LIGHT, { timestepS: 3600, steady: false }));
  const tail = (r: readonly number[]) => sum(r.slice(6));
  // More mass stores more of the pulse and returns it later (issue 13's check; the handbook's light / heavy
  // prototype series show the same order, from memory).
  for (const key of ["nonsolar", "solar"] as const) {
    assert.ok(heavy[key][0]! < light[key][0]!, `${key} r_0: heavy ${heavy[key][0]} light ${light[key][0]}`);
    assert.ok(tail(heavy[key]) > tail(light[key]), `${key} tail`);
  }
});

Deno.test("room radiant time series of a single massless surface is one pulse, the rest conducted out", () => {
  // 1 W absorbed on a face of conduction resistance R_c to a far side at 0 °C, film h_c to air at 0 °C:
  // convected h_c R_c / (1 + h_c R_c) at once, nothing stored (one node, no capacity; analytic).
  const room: RoomInput = {
    timestepS: 3600,
    airTemperatureC: new Array<number>(24).fill(0),
    outdoorAirC: new Array<number>(24).fill(0),
    surfaces: [{
      id: "sheet",
      construction: {
        layers: [{ kind: "resistive", resistance: 0.5 }],
        outsideResistance: 0.04,
        insideResistance: 0,
      },
      areaM2: 10,
      orientation: "floor",
      farSide: { kind: "temperature", temperatureC: new Array<number>(24).fill(0) },
    }],
    windows: [],
    gains: [],
    ventilationWPerK: 0,
    thermalBridgesWPerK: 0,
  };
  const s = series(room);
  const hcRc = 5.0 * 0.54;
  assert.ok(Math.abs(s.nonsolarRetained - hcRc / (1 + hcRc)) < 1e-12);
  assert.ok(Math.abs(s.nonsolar[0]! - 1) < 1e-12);
  for (const v of s.nonsolar.slice(1)) assert.ok(Math.abs(v) < 1e-12);
});

Deno.test("room radiant time series of a room with only same-as-room surfaces keeps the whole pulse", () => {
  const room = ordinaryRoom(HEAVY, { timestepS: 3600, steady: false });
  const s = series({
    ...room,
    surfaces: room.surfaces.map((x) => ({ ...x, farSide: { kind: "same-as-room" } as const })),
    windows: [],
  });
  // Nothing leaves: over a period all of the pulse reaches the air (energy conservation).
  assert.ok(Math.abs(s.nonsolarRetained - 1) < 1e-9);
  assert.ok(Math.abs(s.solarRetained - 1) < 1e-9);
});

Deno.test("heat balance load of a radiant gain equals its convective part plus the retained pulse response", () => {
  // The series is the room's own periodic pulse response divided by its sum; by linearity and time invariance the
  // heat balance's hourly load of any gain is (1 − f) q + retained · Σ_j r_j f q(h − j) (superposition).
  const room = ordinaryRoom(LIGHT, { timestepS: 3600, steady: false });
  const hb = roomHeatBalance(room);
  if (hb.kind !== "heat-balance") throw new Error(hb.message);
  const s = series(room);
  for (const g of room.gains) {
    const part = hb.split.find((p) => p.source.kind === "gain" && p.source.name === g.name)!.loadW;
    const delayed = circularConvolution(s.nonsolar, g.sensibleW.map((v) => v * g.radiantFraction));
    part.forEach((v, h) => {
      const expected = (1 - g.radiantFraction) * g.sensibleW[h]! + s.nonsolarRetained * delayed[h]!;
      assert.ok(Math.abs(v - expected) < 1e-9 * 850, `${g.name} hour ${h}: ${v} vs ${expected}`);
    });
  }
  const solar = hb.split.find((p) => p.source.kind === "solar")!.loadW;
  const delayed = circularConvolution(s.solar, room.windows[0]!.transmittedSolarW);
  solar.forEach((v, h) => assert.ok(Math.abs(v - s.solarRetained * delayed[h]!) < 1e-9 * 1000, `solar ${h}`));
});

Deno.test("radiant time series method in the steady limit equals the hand sum of U·A·ΔT and gains", () => {
  const room = ordinaryRoom(HEAVY, { timestepS: 3600, steady: true });
  const rts = roomRtsMethod(room, series(room));
  if (rts.kind !== "rts-method") throw new Error(rts.message);
  // Every series sums to 1 and every conduction time series to 1, so constant inputs give the steady sum:
  // 1455.01 W, written out in heatBalance_test.ts (ISO 6946 U-values with R_si 0.13 / 0.17 / 0.10).
  const hand = (36 / (0.04 + 0.1 / 0.035 + 0.2 / 2.3 + 0.13)) * 8 +
    (48 / (0.04 + 0.15 / 0.035 + 0.2 / 2.3 + 0.17)) * 8 -
    (48 / (0.1 / 0.035 + 0.15 / 2.3 + 0.1)) * 8 +
    (18 / (0.13 + 2 * (0.015 / 0.25) + 0.2 / 2.3 + 0.13)) * 4 +
    1.4 * 6 * 8 + 0.06 * 30 * 8 + 40 * 8 + 850;
  for (const v of rts.loadW) assert.ok(Math.abs(v - hand) < 1e-9 * hand, `${v} vs ${hand}`);
});

for (const [name, set] of [["heavy", HEAVY], ["light", LIGHT]] as const) {
  for (const timestepS of [3600, 600]) {
    Deno.test(`heat balance and radiant time series method agree on an ordinary ${name} room (Δ = ${timestepS} s)`, () => {
      const r = roomCoolingLoad(ordinaryRoom(set, { timestepS, steady: false }));
      if (r.kind !== "room-cooling-load") throw new Error(r.message);
      // Stated tolerance: the RTS method's peak is at or above the heat balance's and within 15 %. The method counts
      // all radiant heat as load (each series normalised to 1) while the room conducts part of it out again (here
      // 11–17 % of a radiant pulse: `nonsolarRetained`); it over-predicts for that reason (comparisons of the two
      // methods by Rees, Spitler et al., ASHRAE research ca. 1998, from memory). Measured: heavy 9.0 %, light 11.5 %.
      assert.ok(r.peakDifference >= 0 && r.peakDifference < 0.15, `peak difference ${r.peakDifference}`);
      const worst = Math.max(...r.differenceW.map(Math.abs)) / r.heatBalance.peak.loadW;
      assert.ok(worst < 0.2, `worst hourly difference ${worst}`);
      console.log(
        `${name} room Δ ${timestepS} s: heat balance peak ${
          r.heatBalance.peak.loadW.toFixed(0)
        } W at ${r.heatBalance.peak.timeH} h, ` +
          `RTS method ${r.rtsMethod.peak.loadW.toFixed(0)} W at ${r.rtsMethod.peak.timeH} h (${
            (100 * r.peakDifference).toFixed(1)
          } %), worst hour ${(100 * worst).toFixed(1)} % of the peak`,
      );
    });
  }
}

Deno.test("room radiant time series of a room without a floor puts the sun where the other radiant gains go", () => {
  // Stated distribution: without a floor, transmitted solar is spread over all inside surfaces by area, as the
  // non-solar gains are, so both series are the same pulse response (same inputs, same linear system).
  const room = ordinaryRoom(HEAVY, { timestepS: 3600, steady: false });
  const s = series({ ...room, surfaces: room.surfaces.filter((x) => x.orientation !== "floor") });
  s.solar.forEach((v, j) => assert.ok(Math.abs(v - s.nonsolar[j]!) < 1e-14, `r_${j}`));
  assert.ok(Math.abs(s.solarRetained - s.nonsolarRetained) < 1e-14);
});
