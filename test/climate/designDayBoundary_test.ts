import assert from "node:assert/strict";
import * as SunCalc from "suncalc";
import { DESIGN_REFERENCE_YEAR, designDayBoundary, type DesignDayInput } from "../../src/climate/mod.ts";
import { angleDiffDeg, assertNear } from "./_assert.ts";

// Scenario of DESIGN.md §2's example block: Lisbon-like site, 21 July, 33 °C max, 11 K range, τ_b 0.45, τ_d 2.0.
function scenario(timestepS: number): DesignDayInput {
  return {
    site: { latitudeDeg: 38.7, longitudeDeg: -9.1, timeZoneH: 0 },
    month: 7,
    day: 21,
    timestepS,
    outdoor: { kind: "daily-range", maxDryBulbC: 33, dailyRangeK: 11 },
    sky: {
      kind: "clear-sky",
      beamOpticalDepth: 0.45,
      diffuseOpticalDepth: 2.0,
      edition: "2013",
      skyDiffuseModel: "handbook",
    },
    surfaces: [
      {
        kind: "solar",
        id: "roof",
        azimuthDeg: 0,
        tiltDeg: 0,
        absorptance: 0.052 * 17,
        outsideCoefficientWPerM2K: 17,
        groundReflectance: 0.2,
        longwave: { kind: "by-tilt" },
      },
      {
        kind: "solar",
        id: "wall-south",
        azimuthDeg: 180,
        tiltDeg: 90,
        absorptance: 0.026 * 17,
        outsideCoefficientWPerM2K: 17,
        groundReflectance: 0.2,
        longwave: { kind: "by-tilt" },
      },
      { kind: "given-sol-air", id: "wall-test", hourlyC: Array.from({ length: 24 }, (_, k) => 20 + k) },
    ],
    solarPositionMethod: "meeus",
  };
}

Deno.test("designDayBoundary() steps are k·Δ local standard time with the handbook dry-bulb profile", () => {
  const b = designDayBoundary(scenario(900));
  assert.equal(b.timeBase, "local standard time");
  assert.equal(b.dayOfYear, 202);
  assert.equal(b.timesH.length, 96);
  assertNear(b.timesH[61]!, 15.25, 0, "step 61");
  // Fundamentals Ch. 14 fraction of daily range: 15:00 → f = 0 → 33 °C; 05:00 → f = 1 → 22 °C.
  assertNear(b.outdoorC[60]!, 33, 1e-12, "15:00");
  assertNear(b.outdoorC[20]!, 22, 1e-12, "05:00");
  const given = b.surfaces[2];
  assert.ok(given?.kind === "given-sol-air");
  // Straight line between hours: 10:30 → 30.5 °C.
  assertNear(given.solAirC[42]!, 30.5, 1e-12, "given sol-air at 10:30");
});

Deno.test("designDayBoundary() roof at night sits 3.9 K below the air; sol-air terms add up", () => {
  // Fundamentals Ch. 18 (common practice): εΔR/h_o = 3.9 K for a horizontal surface, and E_t = 0 at night.
  const b = designDayBoundary(scenario(3600));
  const roof = b.surfaces[0];
  assert.ok(roof?.kind === "solar");
  assertNear(roof.solAirC[2]!, b.outdoorC[2]! - 3.9, 1e-12, "02:00");
  for (let k = 0; k < 24; k++) {
    const t = roof.terms[k]!;
    assertNear(t.solAirC, t.outdoorC + t.solarTermK - t.longwaveTermK, 1e-12, `terms at ${k}:00`);
    assertNear(t.solarTermK, 0.052 * roof.irradiance[k]!.totalWPerM2, 1e-9, `α/h_o = 0.052 at ${k}:00`);
  }
  const wall = b.surfaces[1];
  assert.ok(wall?.kind === "solar");
  assertNear(wall.solAirC[2]!, b.outdoorC[2]!, 1e-12, "vertical wall at night: no long-wave correction");
});

Deno.test("designDayBoundary() sun positions agree with suncalc at every step", () => {
  // npm suncalc 2.0.2 as reference (apparent altitude in degrees, azimuth clockwise from north): its refraction
  // (Meeus Eq. 16.4) is added to our geometric altitude; bound 0.1° as required for the solar position.
  const b = designDayBoundary(scenario(1800));
  b.timesH.forEach((tH, k) => {
    const date = new Date(Date.UTC(DESIGN_REFERENCE_YEAR, 0, 202) + tH * 3_600_000);
    const ref = SunCalc.getPosition(date, 38.7, -9.1);
    const ours = b.sunPosition[k]!;
    const h = Math.max(ours.altitudeDeg, 0) * Math.PI / 180;
    const refractionDeg = 0.0002967 / Math.tan(h + 0.00312536 / (h + 0.08901179)) * 180 / Math.PI;
    assertNear(ours.altitudeDeg + refractionDeg, ref.altitude, 0.1, `altitude at ${tH} h`);
    // Azimuth compared as the great-circle shift Δazimuth·cos(altitude), as in solarPosition_test.ts.
    const shiftDeg = angleDiffDeg(ours.azimuthDeg, ref.azimuth) * Math.cos((ref.altitude * Math.PI) / 180);
    assertNear(shiftDeg, 0, 0.1, `azimuth at ${tH} h`);
  });
});

Deno.test("designDayBoundary() roof irradiance peaks at suncalc's solar noon", () => {
  // suncalc 2.0.2 getTimes().solarNoon for the site and date (independent of our equation of time). Clear-sky
  // horizontal irradiance rises with altitude, so its peak is at the step nearest solar noon (Δ = 5 min; allowance
  // half a step plus 1.5 min).
  const b = designDayBoundary(scenario(300));
  const roof = b.surfaces[0];
  assert.ok(roof?.kind === "solar");
  const totals = roof.irradiance.map((e) => e.totalWPerM2);
  const peakH = b.timesH[totals.indexOf(Math.max(...totals))]!;
  const noon = SunCalc.getTimes(new Date(Date.UTC(DESIGN_REFERENCE_YEAR, 0, 202, 12)), 38.7, -9.1).solarNoon;
  const noonH = noon.getUTCHours() + noon.getUTCMinutes() / 60 + noon.getUTCSeconds() / 3600;
  assertNear(peakH, noonH, 5 / 60 / 2 + 1.5 / 60, "time of peak");
  // South wall: morning sun is behind it until the sun passes azimuth 90° (due east); at 06:00 the sun is north of east.
  const wall = b.surfaces[1];
  assert.ok(wall?.kind === "solar");
  const six = b.timesH.indexOf(6);
  assert.ok(b.sunPosition[six]!.azimuthDeg < 90, "sun north of east at 06:00 in July at 38.7° N");
  assertNear(wall.irradiance[six]!.beamWPerM2, 0, 0, "no beam on the south wall at 06:00");
});

Deno.test("designDayBoundary() hourly and 15-min runs agree at whole hours", () => {
  const hourly = designDayBoundary(scenario(3600));
  const quarter = designDayBoundary(scenario(900));
  for (let k = 0; k < 24; k++) {
    for (let s = 0; s < 2; s++) {
      const a = hourly.surfaces[s], c = quarter.surfaces[s];
      assert.ok(a?.kind === "solar" && c?.kind === "solar");
      assertNear(a.solAirC[k]!, c.solAirC[4 * k]!, 1e-12, `surface ${s} at ${k}:00`);
    }
  }
});
