import assert from "node:assert/strict";
import {
  civilFromDays,
  dayOfYearOf,
  daysFromCivil,
  formatLocalTime,
  localTimeAt,
  secondsOf,
} from "../../src/climate/weatherTime.ts";

Deno.test("daysFromCivil matches Unix time: 2000-01-01T00:00Z is 946684800 s = 10957 days after 1970-01-01", () => {
  // 946684800 is the POSIX timestamp of 2000-01-01T00:00:00Z (POSIX time counts 86400 s per day).
  assert.equal(daysFromCivil(1970, 1, 1), 0);
  assert.equal(daysFromCivil(2000, 1, 1), 946684800 / 86400);
  assert.equal(secondsOf({ year: 2000, month: 1, day: 1, hour: 0, minute: 0 }), 946684800);
  // 1969-12-31 is day −1; 2000-03-01 follows 29 February 2000 (divisible by 400: leap), 10957 + 31 + 29.
  assert.equal(daysFromCivil(1969, 12, 31), -1);
  assert.equal(daysFromCivil(2000, 3, 1), 10957 + 31 + 29);
});

Deno.test("civilFromDays inverts daysFromCivil day by day across leap and century years", () => {
  let expected = { year: 1899, month: 12, day: 31 };
  const lengths = (
    y: number,
  ) => [
    31,
    (y % 4 === 0 && y % 100 !== 0) || y % 400 === 0 ? 29 : 28,
    31,
    30,
    31,
    30,
    31,
    31,
    30,
    31,
    30,
    31,
  ];
  for (let days = daysFromCivil(1899, 12, 31); days <= daysFromCivil(2101, 1, 1); days++) {
    assert.deepEqual(civilFromDays(days), expected);
    const next = expected.day < lengths(expected.year)[expected.month - 1]!
      ? { ...expected, day: expected.day + 1 }
      : expected.month < 12
      ? { year: expected.year, month: expected.month + 1, day: 1 }
      : { year: expected.year + 1, month: 1, day: 1 };
    expected = next;
  }
});

Deno.test("day of year counts 29 February in leap years; local time formats as YYYY-MM-DDTHH:MM", () => {
  assert.equal(dayOfYearOf(2031, 12, 31), 365);
  assert.equal(dayOfYearOf(2032, 12, 31), 366);
  assert.equal(dayOfYearOf(2031, 7, 21), 31 + 28 + 31 + 30 + 31 + 30 + 21);
  const t = localTimeAt(secondsOf({ year: 2031, month: 12, day: 31, hour: 23, minute: 0 }) + 3600);
  assert.equal(formatLocalTime(t), "2032-01-01T00:00");
});
