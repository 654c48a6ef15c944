import { cosDeg, sinDeg } from "./_angles.ts";

/** Declination and equation of time from one of the published methods. */
export interface DeclinationAndTime {
  readonly declinationDeg: number;
  readonly equationOfTimeMin: number;
}

/**
 * Declination and equation of time by the simple day-of-year formulas of ASHRAE Handbook—Fundamentals (2013, SI)
 * Ch. 14 (from memory: Eqs. 5 and 6): ET = 2.2918[0.0075 + 0.1868 cos Γ − 3.2077 sin Γ − 1.4615 cos 2Γ − 4.089 sin 2Γ]
 * min with Γ = 360°(n − 1)/365, and δ = 23.45° sin[360°(n + 284)/365]; a day-of-year approximation, worse than Meeus.
 */
export function handbookSunDeclinationAndTime(dayOfYear: number): DeclinationAndTime {
  const gammaDeg = (360 * (dayOfYear - 1)) / 365;
  const equationOfTimeMin = 2.2918 *
    (0.0075 + 0.1868 * cosDeg(gammaDeg) - 3.2077 * sinDeg(gammaDeg) - 1.4615 * cosDeg(2 * gammaDeg) -
      4.089 * sinDeg(2 * gammaDeg));
  const declinationDeg = 23.45 * sinDeg((360 * (dayOfYear + 284)) / 365);
  return { declinationDeg, equationOfTimeMin };
}
