import assert from "node:assert/strict";
import {
  airMassExponents,
  clearSkyIrradiance,
  extraterrestrialNormalWPerM2,
  kastenYoungAirMass,
} from "../../src/climate/clearSky.ts";
import { clearSkySurfaceIrradiance } from "../../src/climate/clearSkySurface.ts";
import { skyDiffuseOnSurfaceWPerM2, verticalDiffuseRatio } from "../../src/climate/skyDiffuse.ts";
import { assertNear } from "./_assert.ts";

// Test inputs (not a station's values): τ_b = 0.45, τ_d = 2.0, 21 July (n = 202), β = 60°.
const DEPTHS = { beamOpticalDepth: 0.45, diffuseOpticalDepth: 2.0 };

Deno.test("extraterrestrialNormalWPerM2() follows E0 = 1367[1 + 0.033 cos(360°(n − 3)/365)]", () => {
  // Published equation (ASHRAE Fundamentals 2013 Ch. 14, from memory Eq. 4) evaluated by hand:
  // n = 3 → 1367 × 1.033 = 1412.111; n = 185 (cos(180°·364/365) = −0.999963) → 1321.891; n = 202 → 1323.696.
  assertNear(extraterrestrialNormalWPerM2(3), 1412.111, 1e-3, "n = 3");
  assertNear(extraterrestrialNormalWPerM2(185), 1321.891, 1e-3, "n = 185");
  assertNear(extraterrestrialNormalWPerM2(202), 1323.696, 1e-3, "n = 202");
});

Deno.test("kastenYoungAirMass() reproduces Kasten & Young (1989)", () => {
  // Formula by hand, β = 90°: 1/(1 + 0.50572 × 96.07995^−1.6364) = 0.999712.
  assertNear(kastenYoungAirMass(90), 0.999712, 1e-6, "zenith");
  // Formula by hand, β = 60°: 1/(0.8660254 + 0.50572 × 66.07995^−1.6364) = 1.153992.
  assertNear(kastenYoungAirMass(60), 1.153992, 1e-6, "β = 60°");
  // Kasten & Young (1989) table, horizon value 38.0868 (from memory); the paper's formula gives 37.92 there.
  assertNear(kastenYoungAirMass(0.000001), 38.0868, 0.4, "horizon");
  assert.ok(Number.isNaN(kastenYoungAirMass(-1)), "below the horizon");
});

Deno.test("airMassExponents() 2013 and 2009 fits, worked by hand", () => {
  // 2013 (Fundamentals Ch. 14, from memory Eqs. 17–18): ab = 1.454 − 0.406·0.45 − 0.268·2 + 0.021·0.9 = 0.754200;
  // ad = 0.507 + 0.205·0.45 − 0.080·2 − 0.190·0.9 = 0.268250.
  const e2013 = airMassExponents(DEPTHS, "2013");
  assertNear(e2013.beamExponent, 0.7542, 1e-12, "ab 2013");
  assertNear(e2013.diffuseExponent, 0.26825, 1e-12, "ad 2013");
  // 2009 (Fundamentals 2009 Ch. 14, from memory): ab = 1.219 − 0.043·0.45 − 0.151·2 − 0.204·0.9 = 0.714050;
  // ad = 0.202 + 0.852·0.45 − 0.007·2 − 0.357·0.9 = 0.250100.
  const e2009 = airMassExponents(DEPTHS, "2009");
  assertNear(e2009.beamExponent, 0.71405, 1e-12, "ab 2009");
  assertNear(e2009.diffuseExponent, 0.2501, 1e-12, "ad 2009");
});

Deno.test("clearSkyIrradiance() beam and diffuse, worked by hand from the 2013 equations", () => {
  // E_b = 1323.6965 exp(−0.45 × 1.153992^0.7542) = 801.793 W/m²; E_d = 1323.6965 exp(−2.0 × 1.153992^0.26825)
  // = 165.645 W/m² (Fundamentals 2013 Ch. 14 Eqs. 15–16, from memory; evaluated by hand in double precision).
  const sky = clearSkyIrradiance(60, 202, DEPTHS, "2013");
  assertNear(sky.beamNormalWPerM2, 801.793, 1e-3, "E_b");
  assertNear(sky.diffuseHorizontalWPerM2, 165.645, 1e-3, "E_d");
  // Same with the 2009 exponents: E_b = 804.102, E_d = 166.541 W/m².
  const sky2009 = clearSkyIrradiance(60, 202, DEPTHS, "2009");
  assertNear(sky2009.beamNormalWPerM2, 804.102, 1e-3, "E_b 2009");
  assertNear(sky2009.diffuseHorizontalWPerM2, 166.541, 1e-3, "E_d 2009");
  const night = clearSkyIrradiance(-5, 202, DEPTHS);
  assert.equal(night.beamNormalWPerM2, 0);
  assert.equal(night.diffuseHorizontalWPerM2, 0);
});

Deno.test("verticalDiffuseRatio() Y values of the handbook polynomial", () => {
  // Y = 0.55 + 0.437 cos θ + 0.313 cos² θ (Fundamentals 2013 Ch. 14, from memory): cos θ = 1 → 1.300;
  // 0 → 0.55; 0.25 → 0.6788125; −1 → 0.45 (floor; polynomial gives 0.426).
  assertNear(verticalDiffuseRatio(1), 1.3, 1e-12, "Y(1)");
  assertNear(verticalDiffuseRatio(0), 0.55, 1e-12, "Y(0)");
  assertNear(verticalDiffuseRatio(0.25), 0.6788125, 1e-12, "Y(0.25)");
  assertNear(verticalDiffuseRatio(-1), 0.45, 1e-12, "Y(−1)");
});

Deno.test("skyDiffuseOnSurfaceWPerM2() handbook rule and isotropic model: horizontal, vertical, tilted, facing down", () => {
  // Handbook rule by hand: Σ = 0 → E_d; Σ = 90° → E_d·Y; Σ = 120°, cos θ = 0 → E_d × 0.55 × sin 120° = 0.476314 E_d.
  assertNear(skyDiffuseOnSurfaceWPerM2(100, 0.3, 0, "handbook"), 100, 1e-9, "horizontal");
  assertNear(skyDiffuseOnSurfaceWPerM2(100, 0.25, 90, "handbook"), 67.88125, 1e-9, "vertical");
  assertNear(skyDiffuseOnSurfaceWPerM2(100, 0, 120, "handbook"), 47.6314, 1e-4, "Σ = 120°");
  // Isotropic (Liu & Jordan 1963): E_d(1 + cos Σ)/2 → 50 % on a wall, 25 % at Σ = 120°.
  assertNear(skyDiffuseOnSurfaceWPerM2(100, 0.25, 90, "isotropic"), 50, 1e-9, "vertical, isotropic");
  assertNear(skyDiffuseOnSurfaceWPerM2(100, 0.25, 120, "isotropic"), 25, 1e-9, "Σ = 120°, isotropic");
});

Deno.test("clearSkySurfaceIrradiance() south wall and 30° roof, worked by hand", () => {
  const sun = { altitudeDeg: 60, azimuthDeg: 240 };
  const sky = clearSkyIrradiance(60, 202, DEPTHS, "2013");
  // South wall: cos θ = cos 60° cos 60° = 0.25; beam 801.7933 × 0.25 = 200.448; Y = 0.6788125, diffuse
  // 165.6450 × Y = 112.442; ground (801.7933 sin 60° + 165.6450) × 0.2 × (1 − 0)/2 = 86.002 W/m².
  const wall = clearSkySurfaceIrradiance(sun, sky, { azimuthDeg: 180, tiltDeg: 90, groundReflectance: 0.2 });
  assertNear(wall.beamWPerM2, 200.448, 1e-3, "wall beam");
  assertNear(wall.skyDiffuseWPerM2, 112.442, 1e-3, "wall diffuse");
  assertNear(wall.groundReflectedWPerM2, 86.002, 1e-3, "wall ground");
  assertNear(wall.totalWPerM2, 200.448 + 112.442 + 86.002, 3e-3, "wall total");
  // 30° south roof: cos θ = 0.25 × 0.5 + sin 60° cos 30° = 0.875; Y = 1.172015625; diffuse
  // 165.6450 × (Y sin 30° + cos 30°) = 240.522; ground × (1 − cos 30°)/2 = 11.522 W/m².
  const roof = clearSkySurfaceIrradiance(sun, sky, { azimuthDeg: 180, tiltDeg: 30, groundReflectance: 0.2 });
  assertNear(roof.cosIncidence, 0.875, 1e-12, "roof cos θ");
  assertNear(roof.skyDiffuseWPerM2, 240.522, 1e-3, "roof diffuse");
  assertNear(roof.groundReflectedWPerM2, 11.522, 1e-3, "roof ground");
  const night = clearSkySurfaceIrradiance({ altitudeDeg: -3, azimuthDeg: 300 }, sky, {
    azimuthDeg: 0,
    tiltDeg: 0,
    groundReflectance: 0.2,
  });
  assert.equal(night.totalWPerM2, 0);
});
