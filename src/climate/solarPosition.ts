import { clampUnit, cosDeg, sinDeg, toDeg, wrap180, wrap360 } from "./_angles.ts";
import { DESIGN_REFERENCE_YEAR, julianDay } from "./calendar.ts";
import { type DeclinationAndTime, handbookSunDeclinationAndTime } from "./solarPositionHandbook.ts";

/** Where and when the sun is wanted: site, day and local standard clock time. */
export interface SolarPositionInput {
  /** Latitude, degrees, north positive. */
  readonly latitudeDeg: number;
  /** Longitude, degrees, east positive. */
  readonly longitudeDeg: number;
  /** Standard-time offset from UTC, hours, east positive (no daylight saving). */
  readonly timeZoneH: number;
  /** Day of year, 1 = 1 January (non-leap design year unless `year` says otherwise). */
  readonly dayOfYear: number;
  /** Local standard clock time, hours since 0:00 of that day; fractional and out-of-day values allowed. */
  readonly localStandardTimeH: number;
  /** Calendar year for the astronomical method; default `DESIGN_REFERENCE_YEAR`. */
  readonly year?: number;
}

/** Which published formulas give declination and equation of time. */
export type SolarPositionMethod =
  /** Meeus (1998) Astronomical Algorithms, 2nd ed., Ch. 25 low-accuracy solar coordinates (~0.01°) and Ch. 28 Eq. 28.1. */
  | "meeus"
  /** ASHRAE Handbook—Fundamentals (2013) Ch. 14: Cooper-type declination and Spencer-type equation of time. */
  | "handbook";

/** Sun position and the intermediate quantities a reviewer needs to trace it. */
export interface SolarPosition {
  readonly method: SolarPositionMethod;
  /** Solar declination, degrees. */
  readonly declinationDeg: number;
  /** Equation of time (apparent minus mean solar time), minutes. */
  readonly equationOfTimeMin: number;
  /** Apparent solar time, hours: LST + EoT/60 + (longitude − 15°·time zone)/15. */
  readonly apparentSolarTimeH: number;
  /** Hour angle, degrees, 15° per hour from solar noon, negative in the morning, in [−180, 180). */
  readonly hourAngleDeg: number;
  /** Geometric solar altitude above the horizon, degrees (no refraction). */
  readonly altitudeDeg: number;
  /** Solar azimuth, degrees clockwise from north, in [0, 360). */
  readonly azimuthDeg: number;
}

export type { DeclinationAndTime } from "./solarPositionHandbook.ts";

/**
 * Sun's apparent declination and the equation of time at a Julian Day, by Meeus (1998) Ch. 25 "low accuracy"
 * (Eqs. 25.2–25.8, apparent longitude and corrected obliquity) and Ch. 28 Eq. 28.1.
 */
export function meeusSunDeclinationAndTime(julianDayUt: number): DeclinationAndTime {
  // Universal Time stands in for Dynamical Time; ΔT ≈ 70 s moves the sun by < 0.001°.
  const t = (julianDayUt - 2451545.0) / 36525;
  const meanLongitudeDeg = wrap360(280.46646 + 36000.76983 * t + 0.0003032 * t * t); // Eq. 25.2
  const meanAnomalyDeg = wrap360(357.52911 + 35999.05029 * t - 0.0001537 * t * t); // Eq. 25.3
  const centreDeg = (1.914602 - 0.004817 * t - 0.000014 * t * t) * sinDeg(meanAnomalyDeg) +
    (0.019993 - 0.000101 * t) * sinDeg(2 * meanAnomalyDeg) + 0.000289 * sinDeg(3 * meanAnomalyDeg);
  const trueLongitudeDeg = meanLongitudeDeg + centreDeg;
  const omegaDeg = 125.04 - 1934.136 * t;
  const apparentLongitudeDeg = trueLongitudeDeg - 0.00569 - 0.00478 * sinDeg(omegaDeg);
  // Eq. 22.2 (mean obliquity, arcseconds) plus the Ch. 25 correction for the apparent position.
  const meanObliquityDeg = 23 + 26 / 60 + (21.448 - 46.815 * t - 0.00059 * t * t + 0.001813 * t ** 3) / 3600;
  const obliquityDeg = meanObliquityDeg + 0.00256 * cosDeg(omegaDeg);
  const declinationDeg = toDeg(Math.asin(clampUnit(sinDeg(obliquityDeg) * sinDeg(apparentLongitudeDeg))));
  const rightAscensionDeg = toDeg(Math.atan2(
    cosDeg(obliquityDeg) * sinDeg(apparentLongitudeDeg),
    cosDeg(apparentLongitudeDeg),
  )); // Eq. 25.6
  // Eq. 28.1: E = L0 − 0.0057183° − α + Δψ cos ε, with the nutation in longitude Δψ ≈ −0.00478° sin Ω (its
  // leading term, Ch. 22); degrees of hour angle → minutes of time at 4 min per degree.
  const nutationInLongitudeDeg = -0.00478 * sinDeg(omegaDeg);
  const eotDeg = wrap180(
    meanLongitudeDeg - 0.0057183 - rightAscensionDeg + nutationInLongitudeDeg * cosDeg(obliquityDeg),
  );
  return { declinationDeg, equationOfTimeMin: eotDeg * 4 };
}

/**
 * Altitude and azimuth (clockwise from north) from latitude, declination and hour angle, by the spherical
 * astronomy relations (e.g. Meeus 1998, Eqs. 13.5–13.6).
 */
export function horizontalCoordinates(
  latitudeDeg: number,
  declinationDeg: number,
  hourAngleDeg: number,
): { readonly altitudeDeg: number; readonly azimuthDeg: number } {
  const sinAltitude = sinDeg(latitudeDeg) * sinDeg(declinationDeg) +
    cosDeg(latitudeDeg) * cosDeg(declinationDeg) * cosDeg(hourAngleDeg);
  const altitudeDeg = toDeg(Math.asin(clampUnit(sinAltitude)));
  // Meeus Eq. 13.5 gives the azimuth from south, positive toward west; +180° turns it to north-clockwise.
  const fromSouthDeg = toDeg(Math.atan2(
    sinDeg(hourAngleDeg) * cosDeg(declinationDeg),
    cosDeg(hourAngleDeg) * cosDeg(declinationDeg) * sinDeg(latitudeDeg) -
      sinDeg(declinationDeg) * cosDeg(latitudeDeg),
  ));
  return { altitudeDeg, azimuthDeg: wrap360(fromSouthDeg + 180) };
}

/**
 * Solar position at a local standard clock time: declination and equation of time by the chosen method, apparent
 * solar time by the equation of time plus the longitude correction, then altitude and azimuth.
 */
export function solarPosition(
  input: SolarPositionInput,
  method: SolarPositionMethod = "meeus",
): SolarPosition {
  const universalTimeH = input.localStandardTimeH - input.timeZoneH;
  let sun: DeclinationAndTime;
  switch (method) {
    case "meeus":
      sun = meeusSunDeclinationAndTime(
        julianDay(input.year ?? DESIGN_REFERENCE_YEAR, input.dayOfYear, universalTimeH),
      );
      break;
    case "handbook":
      sun = handbookSunDeclinationAndTime(input.dayOfYear);
      break;
  }
  const standardMeridianDeg = 15 * input.timeZoneH;
  const apparentSolarTimeH = input.localStandardTimeH + sun.equationOfTimeMin / 60 +
    (input.longitudeDeg - standardMeridianDeg) / 15;
  const hourAngleDeg = wrap180(15 * (apparentSolarTimeH - 12));
  const { altitudeDeg, azimuthDeg } = horizontalCoordinates(
    input.latitudeDeg,
    sun.declinationDeg,
    hourAngleDeg,
  );
  return { method, ...sun, apparentSolarTimeH, hourAngleDeg, altitudeDeg, azimuthDeg };
}
