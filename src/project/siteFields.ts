/**
 * The site fields that need more than a unit check: the time zone is a UTC offset in whole quarter
 * hours, and the elevation lies between the lowest and the highest ground on Earth.
 */

import { type Diagnostic, error } from "./diagnostic.ts";
import { type Fields, readQuantity } from "./fields.ts";

/**
 * UTC offsets in use run from −12 h (Baker Island) to +14 h (Line Islands), all whole multiples of
 * 15 min (+5:45 Nepal, +8:45 Eucla and +12:45 Chatham are the finest), per the IANA time zone
 * database (from memory).
 */
export const TIME_ZONE = { minH: -12, maxH: 14, stepH: 0.25 } as const;

/**
 * Ground elevation: the Dead Sea shore is about −430 m and the summit of Everest 8849 m (from memory);
 * the range is rounded outwards.
 */
export const ELEVATION = { minM: -500, maxM: 9000 } as const;

/** Reads `time-zone` as hours east of UTC; undefined (with an error) when missing or not a real offset. */
export function readTimeZone(site: Fields, out: Diagnostic[]): number | undefined {
  const seconds = readQuantity(site, "time-zone", "time", out, true);
  if (seconds === undefined) return undefined;
  const hours = seconds / 3600;
  const quarters = hours / TIME_ZONE.stepH;
  if (
    hours >= TIME_ZONE.minH && hours <= TIME_ZONE.maxH && Math.abs(quarters - Math.round(quarters)) < 1e-9
  ) {
    return Math.round(quarters) * TIME_ZONE.stepH;
  }
  const written = site.entries.get("time-zone")?.value;
  const text = written?.kind === "scalar" ? written.text.replace(/^(["'])(.*)\1$/, "$2").trim() : "";
  out.push(
    error(
      written?.at ?? site.at,
      "out-of-range",
      `Cannot use the time zone "${text}"${
        /\sh$/.test(text) ? "" : ` (${Number(hours.toPrecision(6))} h)`
      }: a UTC offset is a whole number of quarter hours from ${TIME_ZONE.minH} h to +${TIME_ZONE.maxH} h`,
      "write the standard-time offset in hours, east positive, e.g. `time-zone: 1 h`, `-5 h` or `5.75 h` (5:45)",
    ),
  );
  return undefined;
}

/** Reads the optional `elevation` in metres, within the range of ground elevations on Earth. */
export function readElevation(site: Fields, out: Diagnostic[]): number | undefined {
  const metres = readQuantity(site, "elevation", "length", out);
  if (metres === undefined || (metres >= ELEVATION.minM && metres <= ELEVATION.maxM)) return metres;
  out.push(
    error(
      site.entries.get("elevation")?.value.at ?? site.at,
      "out-of-range",
      `Elevation ${
        Number(metres.toPrecision(6))
      } m is outside ${ELEVATION.minM} to ${ELEVATION.maxM} m, the range of ground on Earth`,
      "give the site's height above sea level in metres, e.g. `elevation: 120 m` (check for a km/m slip)",
    ),
  );
  return undefined;
}
