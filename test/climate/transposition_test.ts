import assert from "node:assert/strict";
import fc from "fast-check";
import { extraterrestrialNormalWPerM2 } from "../../src/climate/clearSky.ts";
import { solarPosition } from "../../src/climate/solarPosition.ts";
import {
  intervalMidpointH,
  transposeToSurface,
  transposeWeatherStep,
  type TranspositionModel,
} from "../../src/climate/transposition.ts";
import { assertNear } from "./_assert.ts";

const RAD = Math.PI / 180;
const MODELS: readonly TranspositionModel[] = ["isotropic", "hay-davies"];

const irradiance = fc.tuple(
  fc.double({ min: 0, max: 1100, noNaN: true }),
  fc.double({ min: 0, max: 1, noNaN: true }),
)
  .map(([global, diffuseShare]) => ({
    globalHorizontalWPerM2: global,
    diffuseHorizontalWPerM2: global * diffuseShare,
  }));
const sunUp = fc.record({
  altitudeDeg: fc.double({ min: 2, max: 90, noNaN: true }),
  azimuthDeg: fc.double({ min: 0, max: 360, noNaN: true }),
});

Deno.test("transposeToSurface() gives the global horizontal back on a horizontal surface, both models", () => {
  // Closed form: Σ = 0 → beam E_bh, sky diffuse E_dh (Hay–Davies: A_i·R_b + (1 − A_i) with R_b = 1), ground 0.
  fc.assert(fc.property(irradiance, sunUp, (horizontal, sun) => {
    for (const model of MODELS) {
      const t = transposeToSurface(horizontal, sun, 200, {
        azimuthDeg: 0,
        tiltDeg: 0,
        groundReflectance: 0.2,
      }, model);
      assertNear(
        t.totalWPerM2,
        horizontal.globalHorizontalWPerM2,
        1e-9 * (1 + horizontal.globalHorizontalWPerM2),
        model,
      );
    }
  }));
});

Deno.test("transposeToSurface() isotropic: a surface and its opposite share the sky and the ground exactly", () => {
  // Liu & Jordan (1963) view factors: (1 + cos Σ)/2 + (1 + cos(180° − Σ))/2 = 1 for the sky, and likewise 1 for the
  // ground, so sky diffuse adds to E_dh and ground-reflected to ρ_g·E_gh.
  fc.assert(
    fc.property(
      irradiance,
      sunUp,
      fc.double({ min: 0, max: 180, noNaN: true }),
      (horizontal, sun, tiltDeg) => {
        const surface = { azimuthDeg: 120, tiltDeg, groundReflectance: 0.3 };
        const opposite = { azimuthDeg: 300, tiltDeg: 180 - tiltDeg, groundReflectance: 0.3 };
        const a = transposeToSurface(horizontal, sun, 100, surface, "isotropic");
        const b = transposeToSurface(horizontal, sun, 100, opposite, "isotropic");
        assertNear(a.skyDiffuseWPerM2 + b.skyDiffuseWPerM2, a.diffuseHorizontalWPerM2, 1e-9 * 1100, "sky");
        assertNear(
          a.groundReflectedWPerM2 + b.groundReflectedWPerM2,
          0.3 * horizontal.globalHorizontalWPerM2,
          1e-9 * 1100,
          "ground",
        );
      },
    ),
  );
});

Deno.test("transposeToSurface() south wall, isotropic and Hay–Davies, worked by hand", () => {
  // Hand derivation, sun β = 30°, φ = 180°, wall ψ = 180°, Σ = 90°: cos θ = cos 30° = 0.8660254; E_gh = 600, E_dh = 200
  // → E_bh = 400, E_bn = 400/sin 30° = 800, beam on wall = 800 × 0.8660254 = 692.820; ground 600 × 0.2/2 = 60.
  const horizontal = { globalHorizontalWPerM2: 600, diffuseHorizontalWPerM2: 200 };
  const sun = { altitudeDeg: 30, azimuthDeg: 180 };
  const wall = { azimuthDeg: 180, tiltDeg: 90, groundReflectance: 0.2 };
  const iso = transposeToSurface(horizontal, sun, 172, wall, "isotropic");
  assertNear(iso.beamNormalWPerM2, 800, 1e-9, "E_bn");
  assertNear(iso.beamWPerM2, 692.8203, 1e-4, "beam");
  assertNear(iso.skyDiffuseWPerM2, 100, 1e-9, "sky, isotropic: 200/2");
  assertNear(iso.groundReflectedWPerM2, 60, 1e-9, "ground");
  // Hay & Davies (1980), from memory: A_i = E_bn/E_0, E_0(n = 172) from the handbook formula; R_b = cos θ/sin β =
  // 1.7320508; sky = E_dh[A_i R_b + (1 − A_i)/2].
  const e0 = extraterrestrialNormalWPerM2(172);
  const ai = 800 / e0;
  const hd = transposeToSurface(horizontal, sun, 172, wall, "hay-davies");
  assertNear(hd.skyDiffuseWPerM2, 200 * (ai * 1.7320508 + (1 - ai) / 2), 1e-5, "sky, Hay–Davies");
  // With no beam (overcast) A_i = 0 and Hay–Davies reduces to isotropic (property of the model's definition).
  const overcast = { globalHorizontalWPerM2: 150, diffuseHorizontalWPerM2: 150 };
  assertNear(
    transposeToSurface(overcast, sun, 172, wall, "hay-davies").skyDiffuseWPerM2,
    transposeToSurface(overcast, sun, 172, wall, "isotropic").skyDiffuseWPerM2,
    1e-12,
    "overcast",
  );
});

Deno.test("transposeToSurface() low-sun guard puts the beam into the diffuse below 2°", () => {
  // Our stated rule: β < 2° → E_bh = 0, E_dh = E_gh; at β = 1.5° the wall then sees E_gh/2 + ground E_gh·ρ_g/2.
  const t = transposeToSurface(
    { globalHorizontalWPerM2: 40, diffuseHorizontalWPerM2: 25 },
    { altitudeDeg: 1.5, azimuthDeg: 90 },
    80,
    { azimuthDeg: 90, tiltDeg: 90, groundReflectance: 0.2 },
    "hay-davies",
  );
  assert.equal(t.lowSunGuard, true);
  assert.equal(t.beamWPerM2, 0);
  assertNear(t.diffuseHorizontalWPerM2, 40, 0, "diffuse used");
  assertNear(t.totalWPerM2, 20 + 4, 1e-12, "total on the wall");
});

Deno.test("transposeWeatherStep() uses the sun at the interval midpoint", () => {
  // DESIGN.md §2 convention: irradiance is the mean over the interval ending at `time`; row 13:00, Δ = 1 h → 12:30.
  assertNear(intervalMidpointH(13, 3600), 12.5, 0, "midpoint, 1 h");
  assertNear(intervalMidpointH(13, 900), 13 - 0.125, 0, "midpoint, 15 min");
  const site = { latitudeDeg: 38.7, longitudeDeg: -9.1, timeZoneH: 0 };
  const step = transposeWeatherStep(
    {
      site,
      dayOfYear: 202,
      endTimeH: 13,
      timestepS: 3600,
      horizontal: { globalHorizontalWPerM2: 800, diffuseHorizontalWPerM2: 120 },
    },
    { azimuthDeg: 180, tiltDeg: 90, groundReflectance: 0.2 },
    "isotropic",
  );
  const expected = solarPosition({ ...site, dayOfYear: 202, localStandardTimeH: 12.5 });
  assertNear(step.sun.altitudeDeg, expected.altitudeDeg, 0, "altitude");
  assertNear(
    step.irradiance.beamNormalWPerM2,
    680 / Math.sin(expected.altitudeDeg * RAD),
    1e-9,
    "E_bn from midpoint sun",
  );
});
