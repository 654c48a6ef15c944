import fc from "fast-check";
import { beamOnSurfaceWPerM2, cosIncidence, incidenceAngleDeg } from "../../src/climate/incidence.ts";
import { assertNear } from "./_assert.ts";

const RAD = Math.PI / 180;

Deno.test("cosIncidence() is 1 when the sun lies along the surface normal", () => {
  // Geometry: a surface tilted Σ faces the sky point at altitude 90° − Σ in its own azimuth.
  fc.assert(fc.property(
    fc.double({ min: 0, max: 90, noNaN: true }),
    fc.double({ min: 0, max: 360, noNaN: true, maxExcluded: true }),
    (tiltDeg, azimuthDeg) => {
      const cos = cosIncidence({ altitudeDeg: 90 - tiltDeg, azimuthDeg }, { azimuthDeg, tiltDeg });
      assertNear(cos, 1, 1e-12, "cos θ");
    },
  ));
});

Deno.test("cosIncidence() on a horizontal surface equals sin(altitude)", () => {
  // Geometry: Σ = 0 → cos θ = sin β whatever the azimuths.
  fc.assert(fc.property(
    fc.double({ min: -90, max: 90, noNaN: true }),
    fc.double({ min: 0, max: 360, noNaN: true }),
    fc.double({ min: 0, max: 360, noNaN: true }),
    (altitudeDeg, sunAzimuthDeg, surfaceAzimuthDeg) => {
      const cos = cosIncidence({ altitudeDeg, azimuthDeg: sunAzimuthDeg }, {
        azimuthDeg: surfaceAzimuthDeg,
        tiltDeg: 0,
      });
      assertNear(cos, Math.sin(altitudeDeg * RAD), 1e-12, "cos θ");
    },
  ));
});

Deno.test("cosIncidence() is ≤ 0 with the sun behind a wall, and the beam on it is then 0", () => {
  // Geometry: sun in the north half-sky (azimuth 270°…90° via north) behind a south-facing vertical wall.
  fc.assert(fc.property(
    fc.double({ min: 0, max: 90, noNaN: true }),
    fc.double({ min: -90, max: 90, noNaN: true }),
    (altitudeDeg, offsetFromNorthDeg) => {
      const sun = { altitudeDeg, azimuthDeg: (offsetFromNorthDeg + 360) % 360 };
      const cos = cosIncidence(sun, { azimuthDeg: 180, tiltDeg: 90 });
      assertNear(Math.min(cos, 0), cos, 1e-12, "cos θ ≤ 0");
      assertNear(beamOnSurfaceWPerM2(850, cos), 0, 1e-9, "beam on surface");
    },
  ));
});

Deno.test("cosIncidence() hand-worked cases: vertical wall and 45° roof", () => {
  // Hand derivation: vertical south wall (ψ = 180°, Σ = 90°), sun at β = 30°, φ = 240°:
  // cos θ = cos 30° cos 60° = 0.8660254 × 0.5 = 0.4330127.
  assertNear(
    cosIncidence({ altitudeDeg: 30, azimuthDeg: 240 }, { azimuthDeg: 180, tiltDeg: 90 }),
    0.4330127,
    1e-7,
    "wall",
  );
  // Hand derivation: 45° roof facing east (ψ = 90°), sun at β = 60°, φ = 90°: θ = 90° − 60° − 45° → |−15°|,
  // cos θ = cos 60° cos 0° sin 45° + sin 60° cos 45° = cos 15° = 0.9659258.
  assertNear(
    cosIncidence({ altitudeDeg: 60, azimuthDeg: 90 }, { azimuthDeg: 90, tiltDeg: 45 }),
    0.9659258,
    1e-7,
    "roof",
  );
  assertNear(
    incidenceAngleDeg({ altitudeDeg: 60, azimuthDeg: 90 }, { azimuthDeg: 90, tiltDeg: 45 }),
    15,
    1e-9,
    "θ",
  );
  // Facing down (Σ = 180°): cos θ = −sin β, the sun never reaches it.
  assertNear(
    cosIncidence({ altitudeDeg: 40, azimuthDeg: 10 }, { azimuthDeg: 0, tiltDeg: 180 }),
    -Math.sin(40 * RAD),
    1e-12,
    "soffit",
  );
});

Deno.test("beamOnSurfaceWPerM2() scales the beam normal irradiance by cos θ", () => {
  // Definition: E = E_b cos θ for cos θ > 0; 800 × 0.5 = 400 W/m².
  assertNear(beamOnSurfaceWPerM2(800, 0.5), 400, 1e-12, "beam on surface");
});
