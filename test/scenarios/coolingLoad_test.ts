/**
 * Radiant time series cooling load, checked against properties of the method itself (ASHRAE Handbook—Fundamentals,
 * nonresidential cooling load chapter: Q(h) = q_conv(h) + Σ_j r_j q_rad(h − j), Σ r_j = 1) and small cases by hand.
 */
import assert from "node:assert/strict";
import type { RadiantTimeSeries } from "../../src/project/model.ts";
import { atFullHours, radiantTimeSeriesLoad } from "../../src/scenarios/coolingLoad.ts";
import { computeDesignDay } from "../../src/scenarios/designDay.ts";
import { designDay, scenarioContext, surface } from "../report/scenarioFixture.ts";

const AT = { file: "scenario.md", line: 1, col: 1 };
const UNIT_PULSE = [1, ...new Array<number>(23).fill(0)];

function rts(values: readonly number[]): RadiantTimeSeries {
  return { values, source: "test series", at: AT };
}

/** A deterministic non-negative series summing to 1 (a decaying shape with a bump, invented for the test). */
function someSeries(): number[] {
  const raw = Array.from({ length: 24 }, (_, j) => Math.exp(-j / 3) + (j === 5 ? 0.3 : 0));
  const sum = raw.reduce((a, b) => a + b, 0);
  return raw.map((v) => v / sum);
}

function surfaces() {
  return [
    surface({
      id: "south",
      construction: "EW-9",
      areaM2: 42,
      azimuthDeg: 180,
      tiltDeg: 90,
      absorptance: 0.6,
    }),
    surface({ id: "flat", construction: "RF-9", areaM2: 120, tiltDeg: 0, absorptance: 0.9 }),
  ];
}

const sum = (xs: readonly number[]) => xs.reduce((a, b) => a + b, 0);

Deno.test("RTS [1, 0, …, 0]: the cooling load of every surface and the total equal the heat gain, hour by hour", () => {
  const r = computeDesignDay(designDay(surfaces(), { radiantTimeSeries: rts(UNIT_PULSE) }), scenarioContext())
    .results;
  for (const s of Object.values(r.surfaces)) {
    assert.equal(s.coolingLoad?.length, 24);
    s.coolingLoad!.forEach((q, h) =>
      assert.ok(Math.abs(q - s.heatGain[h]!) <= 1e-9 * (1 + Math.abs(q)), `${h}`)
    );
  }
  r.coolingLoad!.total.forEach((q, h) =>
    assert.ok(Math.abs(q - r.totalHeatGain[h]!) <= 1e-9 * (1 + Math.abs(q)))
  );
  assert.deepStrictEqual(r.coolingLoad!.peak, {
    value: r.coolingLoad!.total[r.peak.time_h],
    time_h: r.peak.time_h,
  });
});

Deno.test("any series with Σ r = 1 conserves the daily energy: Σ cooling load = Σ heat gain per surface and total", () => {
  const series = someSeries();
  const r =
    computeDesignDay(designDay(surfaces(), { radiantTimeSeries: rts(series) }), scenarioContext()).results;
  for (const s of Object.values(r.surfaces)) {
    const gain = sum(s.heatGain);
    assert.ok(Math.abs(sum(s.coolingLoad!) - gain) <= 1e-9 * sum(s.heatGain.map(Math.abs)));
  }
  assert.ok(
    Math.abs(sum(r.coolingLoad!.total) - sum(r.totalHeatGain)) <= 1e-9 * sum(r.totalHeatGain.map(Math.abs)),
  );
  // The series delays the radiant part, so the load differs from the gain somewhere (else the test would be empty).
  assert.ok(r.coolingLoad!.total.some((q, h) => Math.abs(q - r.totalHeatGain[h]!) > 1));
});

Deno.test("constant gain gives a constant load equal to it, whatever the series", () => {
  const load = radiantTimeSeriesLoad(new Array(24).fill(30), new Array(24).fill(70), someSeries());
  for (const q of load) assert.ok(Math.abs(q - 100) < 1e-12);
});

Deno.test("a radiant pulse is spread by r_j, wrapping past midnight (worked by hand)", () => {
  const series = [0.5, 0.3, 0.2, ...new Array<number>(21).fill(0)];
  const radiant = new Array<number>(24).fill(0);
  radiant[5] = 100;
  radiant[23] = 10;
  const convective = new Array<number>(24).fill(0);
  convective[6] = 7;
  const load = radiantTimeSeriesLoad(convective, radiant, series);
  // 05:00: 0.5·100; 06:00: 0.3·100 + 7; 07:00: 0.2·100; 23:00: 0.5·10; 00:00: 0.3·10; 01:00: 0.2·10.
  const expected = new Array<number>(24).fill(0);
  expected[5] = 50;
  expected[6] = 37;
  expected[7] = 20;
  expected[23] = 5;
  expected[0] = 3;
  expected[1] = 2;
  load.forEach((q, h) => assert.ok(Math.abs(q - expected[h]!) < 1e-12, `${h}: ${q}`));
});

Deno.test("sub-hourly design day: the load is hourly, from the gains at the full hours; RTS [1, 0, …] gives them back", () => {
  const scenario = designDay(surfaces(), { timestepS: 900, radiantTimeSeries: rts(UNIT_PULSE) });
  const r = computeDesignDay(scenario, scenarioContext()).results;
  assert.equal(r.totalHeatGain.length, 96);
  assert.equal(r.coolingLoad!.timestep_h, 1);
  const atHours = atFullHours(r.totalHeatGain, 4);
  r.coolingLoad!.total.forEach((q, h) => assert.ok(Math.abs(q - atHours[h]!) <= 1e-9 * (1 + Math.abs(q))));
  assert.ok(r.notes.some((n) => n.includes("taken at the full hours")));
});

Deno.test("without a radiant time series there is no cooling load key", () => {
  const r = computeDesignDay(designDay(surfaces()), scenarioContext()).results;
  assert.equal(r.coolingLoad, undefined);
  assert.ok(Object.values(r.surfaces).every((s) => s.coolingLoad === undefined));
});

Deno.test("inside surface temperature of a design day: θ_si = θ_i + R_si·q_i (R_si of EW-9 = 0.13, RF-9 = 0.10)", () => {
  const r = computeDesignDay(designDay(surfaces()), scenarioContext()).results;
  const rsi: Record<string, number> = { south: 0.13, flat: 0.10 };
  for (const [id, s] of Object.entries(r.surfaces)) {
    s.insideSurfaceTemperature!.forEach((t, k) =>
      assert.ok(Math.abs(t - (24 + rsi[id]! * s.insideFlux[k]!)) < 1e-12, `${id} ${k}`)
    );
  }
});
