/** The SI packages of the golden files and the same packages with the front matter's `units: IP`. */
import type { PackageInput } from "../../src/report/package.ts";
import { fixture } from "./fixture.ts";
import { designDay, designDayPackage, surface, weatherYearPackage } from "./scenarioFixture.ts";

/** The SI fixtures of the golden files: the plain package, a two-surface design day and a weather year. */
export function siPackages(): Readonly<Record<string, PackageInput>> {
  return {
    "si-fixture": fixture(),
    "si-design-day": designDayPackage(designDay([
      surface({ id: "wall-south", construction: "EW-9", areaM2: 42, azimuthDeg: 180, tiltDeg: 90 }),
      surface({ id: "roof", construction: "RF-9", areaM2: 120, tiltDeg: 0 }),
    ])).input,
    "si-weather-year": weatherYearPackage(
      [surface({ id: "wall-north", construction: "EW-9", areaM2: 30, azimuthDeg: 0, tiltDeg: 90 })],
      5,
      20,
    ).input,
  };
}

/** The same model and results with `units: IP` in the front matter. */
export function asIp(input: PackageInput): PackageInput {
  return { ...input, model: { ...input.model, info: { ...input.model.info, units: "IP" } } };
}
