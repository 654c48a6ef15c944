import assert from "node:assert/strict";
import * as SunCalc from "suncalc";
import { dayOfYear, DESIGN_REFERENCE_YEAR, julianDay } from "../../src/climate/calendar.ts";
import {
  horizontalCoordinates,
  meeusSunDeclinationAndTime,
  solarPosition,
} from "../../src/climate/solarPosition.ts";
import { handbookSunDeclinationAndTime } from "../../src/climate/solarPositionHandbook.ts";
import { angleDiffDeg, assertNear } from "./_assert.ts";

const RAD = Math.PI / 180;

/**
 * Refraction added to a geometric altitude, as suncalc 2.x applies it (Meeus, Astronomical Algorithms 2nd ed.,
 * Eq. 16.4: R = 1.02′ / tan(h + 10.3° / (h + 5.11°))), so our geometric altitude can be compared with its apparent one.
 */
function refractionDeg(altitudeDeg: number): number {
  const h = Math.max(altitudeDeg, 0) * RAD;
  return 0.0002967 / Math.tan(h + 0.00312536 / (h + 0.08901179)) / RAD;
}

/** suncalc 2.0.2 position: apparent altitude in degrees, azimuth in degrees clockwise from north. */
function suncalcPosition(
  year: number,
  day: number,
  universalTimeH: number,
  latitudeDeg: number,
  longitudeDeg: number,
): { altitudeDeg: number; azimuthDeg: number } {
  const date = new Date(Date.UTC(year, 0, day) + universalTimeH * 3_600_000);
  const p = SunCalc.getPosition(date, latitudeDeg, longitudeDeg);
  return { altitudeDeg: p.altitude, azimuthDeg: ((p.azimuth % 360) + 360) % 360 };
}

Deno.test("dayOfYear() counts days in the non-leap design year", () => {
  // Calendar arithmetic (non-leap year): 21 July = 31+28+31+30+31+30+21 = 202; 31 December = 365.
  assert.equal(dayOfYear(1, 1), 1);
  assert.equal(dayOfYear(7, 21), 202);
  assert.equal(dayOfYear(12, 31), 365);
  assert.throws(() => dayOfYear(2, 29), RangeError);
  assert.throws(() => dayOfYear(13, 1), RangeError);
});

Deno.test("julianDay() reproduces published Julian Days", () => {
  // IAU definition of the J2000.0 epoch: 2000 January 1.5 = JD 2451545.0.
  assertNear(julianDay(2000, 1, 12), 2451545.0, 1e-9, "J2000.0");
  // Meeus, Astronomical Algorithms, 2nd ed. (1998), Example 7.a (from memory): 1957 October 4.81 = JD 2436116.31.
  // 4 October 1957 is day 277 of that non-leap year.
  assertNear(julianDay(1957, 277, 0.81 * 24), 2436116.31, 1e-6, "Meeus Example 7.a");
  // Meeus (1998) Example 25.a (from memory): 1992 October 13.0 = JD 2448908.5; day 287 of leap year 1992.
  assertNear(julianDay(1992, 287, 0), 2448908.5, 1e-9, "Meeus Example 25.a date");
});

Deno.test("meeusSunDeclinationAndTime() reproduces Meeus Examples 25.a and 28.a/28.b", () => {
  const sun = meeusSunDeclinationAndTime(2448908.5);
  // Meeus (1998) Example 25.a (from memory): apparent declination δ = −7.78507° (−7°47′06″).
  assertNear(sun.declinationDeg, -7.78507, 2e-5, "declination");
  // Meeus (1998) Examples 28.a and 28.b (from memory), same instant: E = +13m42.6s (Eq. 28.1 with VSOP87
  // coordinates) and +13m42.7s (Smart's formula, Eq. 28.3). Our Eq. 28.1 uses the low-accuracy α of Ch. 25
  // (≈ 0.01° = 2.4 s of time), so the bound is 0.02 min (1.2 s).
  assertNear(sun.equationOfTimeMin, 13.711, 0.02, "equation of time");
});

Deno.test("meeusSunDeclinationAndTime() puts the 2026 March equinox where the almanac does", () => {
  // March equinox 2026: 20 March, 14:46 UT (published almanac tables, from memory); day 79 of 2026.
  // The sun's declination changes by ≈ 0.0165°/h there, so ±0.02° allows about ±1 h in the remembered time.
  const sun = meeusSunDeclinationAndTime(julianDay(2026, 79, 14 + 46 / 60));
  assertNear(sun.declinationDeg, 0, 0.02, "declination at the equinox");
});

Deno.test("solarPosition() hour angle agrees with the sidereal-time route", () => {
  // Independent route for the same instant: H = θ0 + λ − α, with θ0 the Greenwich mean sidereal time
  // (Meeus 1998 Eq. 12.4) turned apparent by Δψ cos ε (Ch. 12), and α the sun's apparent right ascension (Meeus
  // Eq. 25.6), worked here from the Julian Day. The module instead goes through local standard time, the equation of
  // time (Eq. 28.1) and the longitude correction; the two must agree to rounding.
  for (
    const [day, lst, lon, tz] of [[15, 9.5, -9.1, 0], [110, 14.25, 151.2, 10], [200, 7, -122.4, -8], [
      300,
      16,
      77.2,
      5.5,
    ]]
  ) {
    const p = solarPosition({
      latitudeDeg: 40,
      longitudeDeg: lon!,
      timeZoneH: tz!,
      dayOfYear: day!,
      localStandardTimeH: lst!,
    });
    const jd = julianDay(DESIGN_REFERENCE_YEAR, day!, lst! - tz!);
    const t = (jd - 2451545) / 36525;
    const gmstDeg = 280.46061837 + 360.98564736629 * (jd - 2451545) + 0.000387933 * t * t -
      (t * t * t) / 38710000;
    const l0 = 280.46646 + 36000.76983 * t + 0.0003032 * t * t;
    const m = (357.52911 + 35999.05029 * t - 0.0001537 * t * t) * RAD;
    const c = (1.914602 - 0.004817 * t - 0.000014 * t * t) * Math.sin(m) +
      (0.019993 - 0.000101 * t) * Math.sin(2 * m) +
      0.000289 * Math.sin(3 * m);
    const omega = (125.04 - 1934.136 * t) * RAD;
    const lambda = (l0 + c - 0.00569 - 0.00478 * Math.sin(omega)) * RAD;
    const eps = (23.4392911 - 0.0130042 * t + 0.00256 * Math.cos(omega)) * RAD;
    const alphaDeg = Math.atan2(Math.cos(eps) * Math.sin(lambda), Math.cos(lambda)) / RAD;
    const gastDeg = gmstDeg - 0.00478 * Math.sin(omega) * Math.cos(eps);
    // 1e-4° ≈ 0.02 s of time: both routes use the same solar coordinates, so only the time chain differs.
    assertNear(angleDiffDeg(p.hourAngleDeg, gastDeg + lon! - alphaDeg), 0, 1e-4, `hour angle, day ${day}`);
  }
});

Deno.test("solarPosition() agrees with suncalc over dates, times and latitudes", () => {
  // Reference: npm suncalc 2.0.2 (a general-purpose library; apparent altitude, so its refraction formula is added to
  // our geometric altitude before comparing). Required: 0.1°; held here to 0.01° (Meeus low-accuracy sun ~0.01°).
  // Azimuth is compared as the great-circle shift (Δazimuth·cos altitude), which is ill-conditioned at the zenith.
  let worstAltitudeDeg = 0;
  let worstAzimuthDeg = 0;
  for (let latitudeDeg = -75; latitudeDeg <= 75; latitudeDeg += 15) {
    for (let day = 1; day <= 365; day += 11) {
      for (let lst = 0.25; lst < 24; lst += 1.7) {
        const longitudeDeg = -175 + ((day * 37 + latitudeDeg * 7 + 400) % 350);
        const timeZoneH = Math.round(longitudeDeg / 15);
        const ours = solarPosition({
          latitudeDeg,
          longitudeDeg,
          timeZoneH,
          dayOfYear: day,
          localStandardTimeH: lst,
        });
        const ref = suncalcPosition(DESIGN_REFERENCE_YEAR, day, lst - timeZoneH, latitudeDeg, longitudeDeg);
        worstAltitudeDeg = Math.max(
          worstAltitudeDeg,
          Math.abs(ours.altitudeDeg + refractionDeg(ours.altitudeDeg) - ref.altitudeDeg),
        );
        if (ref.altitudeDeg < 85) {
          const shift = Math.abs(angleDiffDeg(ours.azimuthDeg, ref.azimuthDeg)) *
            Math.cos(ref.altitudeDeg * RAD);
          worstAzimuthDeg = Math.max(worstAzimuthDeg, shift);
        }
      }
    }
  }
  assertNear(worstAltitudeDeg, 0, 0.01, "worst altitude difference");
  assertNear(worstAzimuthDeg, 0, 0.01, "worst azimuth difference (great-circle)");
});

Deno.test("handbookSunDeclinationAndTime() reproduces the handbook's 21 July values", () => {
  // ASHRAE Fundamentals 2013 Ch. 14 Example 1 (from memory), 21 July (n = 202): ET = −6.4 min, δ = 20.4°, printed to
  // one decimal; the formulas give −6.354 min and 20.442° (worked by hand).
  const sun = handbookSunDeclinationAndTime(202);
  assertNear(sun.equationOfTimeMin, -6.4, 0.05, "equation of time");
  assertNear(sun.declinationDeg, 20.4, 0.05, "declination");
});

Deno.test("solarPosition() handbook option agrees with suncalc within its looser bound", () => {
  // The handbook's day-of-year declination and equation of time ignore the year and the time of day; measured worst
  // case here ≈ 1.5°. Bound 1.6°: our acceptance limit for that option (common practice, no source).
  let worstAltitudeDeg = 0;
  for (let latitudeDeg = -60; latitudeDeg <= 60; latitudeDeg += 20) {
    for (let day = 3; day <= 365; day += 9) {
      for (let lst = 5; lst <= 19; lst += 2) {
        const ours = solarPosition({
          latitudeDeg,
          longitudeDeg: 10,
          timeZoneH: 1,
          dayOfYear: day,
          localStandardTimeH: lst,
        }, "handbook");
        const ref = suncalcPosition(DESIGN_REFERENCE_YEAR, day, lst - 1, latitudeDeg, 10);
        worstAltitudeDeg = Math.max(
          worstAltitudeDeg,
          Math.abs(ours.altitudeDeg + refractionDeg(ours.altitudeDeg) - ref.altitudeDeg),
        );
      }
    }
  }
  assertNear(worstAltitudeDeg, 0, 1.6, "worst altitude difference, handbook option");
});

Deno.test("solarPosition() at apparent solar noon: hour angle 0, sun due south or north, altitude 90° − |φ − δ|", () => {
  // Spherical geometry, closed form: at H = 0, β = 90° − |φ − δ|; azimuth 180° if φ > δ, 0° if φ < δ.
  const probe = solarPosition({
    latitudeDeg: 51.5,
    longitudeDeg: 7.5,
    timeZoneH: 1,
    dayOfYear: 172,
    localStandardTimeH: 12,
  });
  const noonLst = 12 - probe.equationOfTimeMin / 60 - (7.5 - 15) / 15;
  const noon = solarPosition({
    latitudeDeg: 51.5,
    longitudeDeg: 7.5,
    timeZoneH: 1,
    dayOfYear: 172,
    localStandardTimeH: noonLst,
  });
  assertNear(noon.hourAngleDeg, 0, 0.01, "hour angle");
  assertNear(noon.altitudeDeg, 90 - Math.abs(51.5 - noon.declinationDeg), 1e-6, "altitude");
  assertNear(noon.azimuthDeg, 180, 0.05, "azimuth north of the tropic");
  const south = horizontalCoordinates(-33.9, 10, 0);
  assertNear(south.azimuthDeg, 0, 1e-9, "azimuth south of the sun");
  assertNear(south.altitudeDeg, 90 - 43.9, 1e-9, "altitude south of the sun");
});

Deno.test("horizontalCoordinates() puts the morning sun in the east and the afternoon sun in the west", () => {
  // Geometry at the equinox on the equator (δ = 0, φ = 0): H = −90° → sunrise due east (90°), H = +90° → due west.
  const morning = horizontalCoordinates(0, 0, -90);
  const evening = horizontalCoordinates(0, 0, 90);
  assertNear(morning.azimuthDeg, 90, 1e-9, "morning azimuth");
  assertNear(evening.azimuthDeg, 270, 1e-9, "evening azimuth");
  assertNear(morning.altitudeDeg, 0, 1e-9, "morning altitude");
});
