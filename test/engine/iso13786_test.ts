import assert from "node:assert/strict";
import { analyseConstruction, conductionChain, iso13786 } from "../../src/engine/mod.ts";
import type { ConstructionInput } from "../../src/engine/layer.ts";
import { assertClose, HEAVY_WALL, massive, reversed } from "./walls.ts";

type C = [number, number];
const mul = (a: C, b: C): C => [a[0] * b[0] - a[1] * b[1], a[0] * b[1] + a[1] * b[0]];
const div = (a: C, b: C): C => {
  const d = b[0] * b[0] + b[1] * b[1];
  return [(a[0] * b[0] + a[1] * b[1]) / d, (a[1] * b[0] - a[0] * b[1]) / d];
};
const abs = (a: C) => Math.hypot(a[0], a[1]);
const arg = (a: C) => Math.atan2(a[1], a[0]);
type M = [C, C, C, C];
const matMul = (m: M, n: M): M => {
  const add = (a: C, b: C): C => [a[0] + b[0], a[1] + b[1]];
  return [
    add(mul(m[0], n[0]), mul(m[1], n[2])),
    add(mul(m[0], n[1]), mul(m[1], n[3])),
    add(mul(m[2], n[0]), mul(m[3], n[2])),
    add(mul(m[2], n[1]), mul(m[3], n[3])),
  ];
};

/**
 * ISO 13786:2017 §6 (heat transfer matrix of a homogeneous layer) with T = 86 400 s:
 * δ = √(λT/(πρc)), ξ = d/δ, Z11 = Z22 = cosh ξ cos ξ + j sinh ξ sin ξ,
 * Z12 = −(δ/2λ)[sinh ξ cos ξ + cosh ξ sin ξ + j(cosh ξ sin ξ − sinh ξ cos ξ)],
 * Z21 = −(λ/δ)[sinh ξ cos ξ − cosh ξ sin ξ + j(sinh ξ cos ξ + cosh ξ sin ξ)]; surface Z_s = [[1, −R], [0, 1]];
 * component Z = Z_s2 · Z_layer · Z_s1 with side 1 = inside.
 */
function isoSingleLayer(d: number, lambda: number, rhoC: number, rsi: number, rse: number) {
  const t = 86400;
  const dp = Math.sqrt((lambda * t) / (Math.PI * rhoC));
  const x = d / dp;
  const [ch, sh, co, si] = [Math.cosh(x), Math.sinh(x), Math.cos(x), Math.sin(x)];
  const layer: M = [
    [ch * co, sh * si],
    [-(dp / (2 * lambda)) * (sh * co + ch * si), -(dp / (2 * lambda)) * (ch * si - sh * co)],
    [-(lambda / dp) * (sh * co - ch * si), -(lambda / dp) * (sh * co + ch * si)],
    [ch * co, sh * si],
  ];
  const surface = (r: number): M => [[1, 0], [-r, 0], [0, 0], [1, 0]];
  const z = matMul(matMul(surface(rse), layer), surface(rsi));
  const [z11, z12, , z22] = z;
  const minusInv = div([-1, 0], z12);
  const y11 = div([-z11[0], -z11[1]], z12);
  const y22 = div([-z22[0], -z22[1]], z12);
  const f = t / (2 * Math.PI);
  return {
    y12: minusInv,
    y11,
    y22,
    kappa1: f * abs(div([z11[0] - 1, z11[1]], z12)),
    kappa2: f * abs(div([z22[0] - 1, z22[1]], z12)),
  };
}

function isoOf(c: ConstructionInput) {
  const chain = conductionChain(c, "air-to-air");
  if (chain.kind !== "chain") throw new Error(chain.message);
  return iso13786(chain);
}

const shiftH = (a: C) => (arg(a) * 24) / (2 * Math.PI);

Deno.test("iso13786() single layer matches the ISO 13786 closed-form matrix (amplitudes, shifts, κ1, κ2)", () => {
  for (const [d, rsi, rse] of [[0.2, 0.13, 0.04], [0.1, 0.1, 0.04], [0.3, 0.17, 0.04]] as const) {
    const ref = isoSingleLayer(d, 1.65, 2300 * 1000, rsi, rse);
    const iso = isoOf({
      layers: [massive(d, 1.65, 2300, 1000)],
      outsideResistance: rse,
      insideResistance: rsi,
    });
    // ISO 13786:2017 closed form above; relative 1e-10.
    assertClose(iso.periodicTransmittance.amplitude / abs(ref.y12), 1, 1e-10, "|Y12|");
    assertClose(iso.periodicTransmittanceWrappedShift_h, shiftH(ref.y12), 1e-9, "Δt12 (wrapped)");
    assertClose(iso.admittanceInside.amplitude / abs(ref.y11), 1, 1e-10, "|Y11|");
    assertClose(iso.admittanceInside.timeShift_h, shiftH(ref.y11), 1e-9, "Δt11");
    assertClose(iso.admittanceOutside.amplitude / abs(ref.y22), 1, 1e-10, "|Y22|");
    assertClose(iso.admittanceOutside.timeShift_h, shiftH(ref.y22), 1e-9, "Δt22");
    assertClose(iso.arealHeatCapacityInside / ref.kappa1, 1, 1e-10, "κ1");
    assertClose(iso.arealHeatCapacityOutside / ref.kappa2, 1, 1e-10, "κ2");
    assertClose(iso.decrementFactor, abs(ref.y12) * (rsi + rse + d / 1.65), 1e-12, "f = |Y12|/U");
  }
});

Deno.test("iso13786() thick layer admittance equals the semi-infinite solid e√ω at +3 h; with R_si in series", () => {
  // Carslaw & Jaeger (1959) §2.6 periodic surface temperature of a semi-infinite solid: q = e√(iω) θ,
  // |Y| = e√ω, phase +45° (a lead of T/8 = 3 h). With R_si in series: Y = 1/(R_si + 1/(e√(iω))).
  const e = Math.sqrt(1.65 * 2300 * 1000), omega = (2 * Math.PI) / 86400;
  const thick = isoOf({
    layers: [massive(2.0, 1.65, 2300, 1000)],
    outsideResistance: 0,
    insideResistance: 0,
  });
  assertClose(thick.admittanceInside.amplitude / (e * Math.sqrt(omega)), 1, 1e-9, "|Y11| semi-infinite");
  assertClose(thick.admittanceInside.timeShift_h, 3, 1e-8, "Δt11 semi-infinite");
  const withFilm = isoOf({
    layers: [massive(2.0, 1.65, 2300, 1000)],
    outsideResistance: 0,
    insideResistance: 0.13,
  });
  const ys: C = [e * Math.sqrt(omega / 2), e * Math.sqrt(omega / 2)];
  const y = div([1, 0], [0.13 + div([1, 0], ys)[0], div([1, 0], ys)[1]]);
  assertClose(withFilm.admittanceInside.amplitude / abs(y), 1, 1e-9, "|Y11| with R_si");
  assertClose(withFilm.admittanceInside.timeShift_h, shiftH(y), 1e-8, "Δt11 with R_si");
});

Deno.test("iso13786() time lag is unwrapped: grows continuously past 12 h and matches the ISO phase mod 24 h", () => {
  // ISO 13786 gives arg(Y12) modulo 2π; the physical lag follows the phase continuously as the layer thickens.
  let previous = 0;
  for (let d = 0.05; d <= 0.6001; d += 0.05) {
    const iso = isoOf({
      layers: [massive(d, 1.65, 2300, 1000)],
      outsideResistance: 0.04,
      insideResistance: 0.13,
    });
    const ref = isoSingleLayer(d, 1.65, 2.3e6, 0.13, 0.04);
    assert.ok(iso.timeLag_h > previous, `lag grows with thickness at d = ${d}`);
    const wrapped = ((-shiftH(ref.y12)) % 24 + 24) % 24;
    assertClose(((iso.timeLag_h % 24) + 24) % 24, wrapped, 1e-8, `lag mod 24 at d = ${d}`);
    previous = iso.timeLag_h;
  }
  assert.ok(previous > 12, `0.6 m of concrete lags more than 12 h, found ${previous}`);
  const json = isoOf({
    layers: [massive(0.6, 1.65, 2300, 1000)],
    outsideResistance: 0.04,
    insideResistance: 0.13,
  });
  assertClose(
    json.periodicTransmittance.timeShift_h,
    -json.timeLag_h,
    0,
    "reported shift is the unwrapped lag",
  );
});

Deno.test("iso13786() side labelling: concrete inside gives the larger inside areal heat capacity", () => {
  // Physical expectation (ISO 13786 κ1 is the inside heat capacity): an externally insulated concrete wall stores
  // on the inside; reversing the layers (films stay) swaps this and changes |Y12| (different wall).
  const wall: ConstructionInput = {
    layers: [massive(0.1, 0.035, 25, 1400), massive(0.2, 1.65, 2300, 1000)],
    outsideResistance: 0.04,
    insideResistance: 0.13,
  };
  const a = isoOf(wall), b = isoOf(reversed(wall));
  assert.ok(a.arealHeatCapacityInside > 5 * a.arealHeatCapacityOutside);
  assert.ok(b.arealHeatCapacityOutside > 5 * b.arealHeatCapacityInside);
  assert.ok(Math.abs(a.periodicTransmittance.amplitude / b.periodicTransmittance.amplitude - 1) > 1e-3);
});

Deno.test("iso13786 heat transfer matrix equals [[A, −B], [−C, D]] of the Laplace matrix at s = iω", () => {
  // Identity between ISO 13786 (side 1 = inside) and the transmission-matrix convention (outside → inside).
  const ref = isoSingleLayer(0.2, 1.65, 2.3e6, 0.13, 0.04);
  const z = isoOf({
    layers: [massive(0.2, 1.65, 2300, 1000)],
    outsideResistance: 0.04,
    insideResistance: 0.13,
  })
    .heatTransferMatrix!;
  const y12 = div([-1, 0], [z.z12.re, z.z12.im]);
  assertClose(abs(y12) / abs(ref.y12), 1, 1e-12, "|−1/Z12|");
});

Deno.test("analyseConstruction() first harmonic of hourly periodic Y = Y12 · sinc²(π/24) (heavy wall)", () => {
  // Sampling a triangular-pulse response: H1 = Σ_m sinc²(π(1+24m)/24) Y(iω(1+24m)); for a massive wall the
  // aliased terms are negligible, so |H1| ≈ |Y12| sinc²(π/24) and arg H1 = arg Y12 (ISO 13786 ↔ PRF link).
  const a = analyseConstruction(HEAVY_WALL, 3600, { stateSpace: false });
  if (a.kind !== "analysis") throw new Error(a.message);
  let re = 0, im = 0;
  a.periodic.Y.forEach((v, j) => {
    re += v * Math.cos((2 * Math.PI * j) / 24);
    im -= v * Math.sin((2 * Math.PI * j) / 24);
  });
  const sinc2 = (Math.sin(Math.PI / 24) / (Math.PI / 24)) ** 2;
  assertClose(Math.hypot(re, im) / (a.iso13786.periodicTransmittance.amplitude * sinc2), 1, 1e-4, "|H1|");
  const lagFromH1 = ((-Math.atan2(im, re) * 24) / (2 * Math.PI) + 24) % 24;
  assertClose(lagFromH1, a.iso13786.timeLag_h % 24, 0.01, "lag from H1, h");
});
