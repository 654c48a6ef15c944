import assert from "node:assert/strict";
import fc from "fast-check";
import {
  designDayHourlyC,
  designDayStepsC,
  expandHourlyToSteps,
  FRACTION_OF_DAILY_RANGE_AT_HOUR,
  FRACTION_OF_DAILY_RANGE_BY_HANDBOOK_HOUR,
  interpolateHourly,
  stepsPerDay,
} from "../../src/climate/designDayProfile.ts";
import { assertNear } from "./_assert.ts";

// ASHRAE Handbook—Fundamentals (2009 and later) Ch. 14, Table 6 "Fraction of daily temperature range", hours 1…24
// (edition, table number and values from memory; confirm against the printed table).
// deno-fmt-ignore
const HANDBOOK_TABLE = [
  0.87, 0.92, 0.96, 0.99, 1.00, 0.98, 0.93, 0.84, 0.71, 0.56, 0.39, 0.23,
  0.11, 0.03, 0.00, 0.03, 0.10, 0.21, 0.34, 0.47, 0.58, 0.68, 0.76, 0.82,
];

Deno.test("FRACTION_OF_DAILY_RANGE_BY_HANDBOOK_HOUR matches the handbook table", () => {
  assert.deepEqual([...FRACTION_OF_DAILY_RANGE_BY_HANDBOOK_HOUR], HANDBOOK_TABLE);
});

Deno.test("FRACTION_OF_DAILY_RANGE_AT_HOUR maps handbook hour 24 to index 0 and hour h to index h", () => {
  // DESIGN.md §2 convention: index k = value at k:00; the printed hour 24 (midnight) is index 0.
  assert.equal(FRACTION_OF_DAILY_RANGE_AT_HOUR[0], 0.82);
  for (let h = 1; h <= 23; h++) assert.equal(FRACTION_OF_DAILY_RANGE_AT_HOUR[h], HANDBOOK_TABLE[h - 1]);
  assert.equal(FRACTION_OF_DAILY_RANGE_AT_HOUR.length, 24);
});

Deno.test("designDayHourlyC() minimum at 05:00, maximum at 15:00, T = Tmax − f·range", () => {
  // Handbook profile: f = 1.00 at hour 5, 0.00 at hour 15. With Tmax = 33 °C, range 11 K (DESIGN.md example inputs):
  // 05:00 → 22.0 °C, 15:00 → 33.0 °C, 00:00 → 33 − 0.82 × 11 = 23.98 °C, 09:00 → 33 − 0.71 × 11 = 25.19 °C.
  const t = designDayHourlyC({ maxDryBulbC: 33, dailyRangeK: 11 });
  assertNear(t[5]!, 22, 1e-12, "05:00");
  assertNear(t[15]!, 33, 1e-12, "15:00");
  assertNear(t[0]!, 23.98, 1e-12, "00:00");
  assertNear(t[9]!, 25.19, 1e-12, "09:00");
  assertNear(Math.min(...t), 22, 1e-12, "daily minimum");
  assertNear(Math.max(...t), 33, 1e-12, "daily maximum");
  assert.throws(() => designDayHourlyC({ maxDryBulbC: 33, dailyRangeK: -1 }), RangeError);
});

Deno.test("interpolateHourly() is a straight line between hours and periodic over the day", () => {
  const hourly = Array.from({ length: 24 }, (_, k) => k * 10);
  // Straight line: 10:15 → 100 + 0.25 × 10 = 102.5; 23:30 → 230 + 0.5 × (0 − 230) = 115 (wraps to index 0).
  assertNear(interpolateHourly(hourly, 10.25), 102.5, 1e-12, "10:15");
  assertNear(interpolateHourly(hourly, 23.5), 115, 1e-12, "23:30");
  assertNear(interpolateHourly(hourly, 24), 0, 0, "24:00 = 00:00");
  assertNear(interpolateHourly(hourly, -0.5), 115, 1e-12, "−0:30 = 23:30");
  fc.assert(fc.property(fc.integer({ min: 0, max: 23 }), (k) => {
    assert.equal(interpolateHourly(hourly, k), hourly[k]);
  }));
  assert.throws(() => interpolateHourly([1, 2, 3], 1), RangeError);
});

Deno.test("expandHourlyToSteps() keeps hourly values at whole hours and rejects steps not dividing 1 h", () => {
  const hourly = designDayHourlyC({ maxDryBulbC: 33, dailyRangeK: 11 });
  const quarter = expandHourlyToSteps(hourly, 900);
  assert.equal(quarter.length, 96);
  for (let k = 0; k < 24; k++) assert.equal(quarter[4 * k], hourly[k]);
  // Midway between 14:00 (33 − 0.03 × 11 = 32.67) and 15:00 (33.0): 14:30 → 32.835 °C.
  assertNear(quarter[58]!, 32.835, 1e-12, "14:30");
  assert.deepEqual(designDayStepsC({ maxDryBulbC: 33, dailyRangeK: 11 }, 3600), hourly);
  assert.equal(stepsPerDay(600), 144);
  assert.throws(() => stepsPerDay(7200), RangeError);
  assert.throws(() => stepsPerDay(700), RangeError);
});
