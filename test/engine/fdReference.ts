/**
 * Fine-grid finite-difference reference for tests and benchmarks only: vertex-centred nodes (a node on every layer
 * face, shared where layers touch without a resistance), backward-Euler steps, and Richardson extrapolation in
 * time (2 q(Δt/2) − q(Δt)) and space ((4 q(h/2) − q(h))/3). Films must be > 0 (the air nodes are the boundaries).
 */
import type { ConstructionInput } from "../../src/engine/layer.ts";

interface Grid {
  capacities: number[];
  /** conductance between node i and i+1 */
  links: number[];
  outside: number;
  inside: number;
}

function grid(c: ConstructionInput, targetDxM: number): Grid {
  const capacities: number[] = [];
  const links: number[] = [];
  let pendingR = c.outsideResistance;
  let outside = 0;
  let lastWasMassive = false;
  for (const layer of c.layers) {
    if (layer.kind === "resistive") {
      pendingR += layer.resistance;
      lastWasMassive = false;
      continue;
    }
    const cells = Math.max(2, Math.ceil(layer.thicknessM / targetDxM));
    const dx = layer.thicknessM / cells;
    const cap = layer.density * layer.specificHeat * dx;
    const g = layer.conductivity / dx;
    // First face node: shared with the previous massive layer when nothing lies between.
    if (lastWasMassive && pendingR === 0) {
      capacities[capacities.length - 1]! += cap / 2;
    } else {
      if (capacities.length === 0) outside = 1 / pendingR;
      else links.push(1 / pendingR);
      capacities.push(cap / 2);
    }
    for (let i = 1; i <= cells; i++) {
      links.push(g);
      capacities.push(i === cells ? cap / 2 : cap);
    }
    pendingR = 0;
    lastWasMassive = true;
  }
  pendingR += c.insideResistance;
  return { capacities, links, outside, inside: 1 / pendingR };
}

/** Backward-Euler run; returns q_o and q_i at every `recordEvery`-th step (t = t0 + k·dt). */
function run(
  g: Grid,
  tOutside: (t: number) => number,
  tInside: (t: number) => number,
  t0: number,
  dt: number,
  steps: number,
  recordEvery: number,
): { qo: number[]; qi: number[] } {
  const n = g.capacities.length;
  const temp = new Float64Array(n);
  const lower = new Float64Array(n), diag = new Float64Array(n), upper = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const left = i === 0 ? g.outside : g.links[i - 1]!;
    const right = i === n - 1 ? g.inside : g.links[i]!;
    diag[i] = g.capacities[i]! / dt + left + right;
    if (i > 0) lower[i] = -left;
    if (i < n - 1) upper[i] = -right;
  }
  // Thomas factorisation once.
  const cPrime = new Float64Array(n), denom = new Float64Array(n);
  denom[0] = diag[0]!;
  cPrime[0] = upper[0]! / denom[0]!;
  for (let i = 1; i < n; i++) {
    denom[i] = diag[i]! - lower[i]! * cPrime[i - 1]!;
    cPrime[i] = upper[i]! / denom[i]!;
  }
  const rhs = new Float64Array(n);
  const qo: number[] = [], qi: number[] = [];
  const record = (t: number) => {
    qo.push(g.outside * (tOutside(t) - temp[0]!));
    qi.push(g.inside * (temp[n - 1]! - tInside(t)));
  };
  record(t0);
  for (let k = 1; k <= steps; k++) {
    const t = t0 + k * dt;
    for (let i = 0; i < n; i++) rhs[i] = (g.capacities[i]! / dt) * temp[i]!;
    rhs[0]! += g.outside * tOutside(t);
    rhs[n - 1]! += g.inside * tInside(t);
    rhs[0] = rhs[0]! / denom[0]!;
    for (let i = 1; i < n; i++) rhs[i] = (rhs[i]! - lower[i]! * rhs[i - 1]!) / denom[i]!;
    temp[n - 1] = rhs[n - 1]!;
    for (let i = n - 2; i >= 0; i--) temp[i] = rhs[i]! - cPrime[i]! * temp[i + 1]!;
    if (k % recordEvery === 0) record(t);
  }
  return { qo, qi };
}

/** Options of the reference: base cell size (m) and base substeps per output interval. */
export interface FdOptions {
  readonly dxM: number;
  readonly substeps: number;
}

/** Extrapolated q_o, q_i at t0 + k·interval for k = 0 … outputs − 1. */
export function fdFluxes(
  c: ConstructionInput,
  tOutside: (t: number) => number,
  tInside: (t: number) => number,
  t0: number,
  intervalS: number,
  outputs: number,
  options: FdOptions,
): { qo: number[]; qi: number[] } {
  const timeExtrapolated = (g: Grid) => {
    const coarse = run(
      g,
      tOutside,
      tInside,
      t0,
      intervalS / options.substeps,
      options.substeps * (outputs - 1),
      options.substeps,
    );
    const fine = run(
      g,
      tOutside,
      tInside,
      t0,
      intervalS / (2 * options.substeps),
      2 * options.substeps * (outputs - 1),
      2 * options.substeps,
    );
    return {
      qo: fine.qo.map((v, k) => 2 * v - coarse.qo[k]!),
      qi: fine.qi.map((v, k) => 2 * v - coarse.qi[k]!),
    };
  };
  const h = timeExtrapolated(grid(c, options.dxM));
  const h2 = timeExtrapolated(grid(c, options.dxM / 2));
  return {
    qo: h2.qo.map((v, k) => (4 * v - h.qo[k]!) / 3),
    qi: h2.qi.map((v, k) => (4 * v - h.qi[k]!) / 3),
  };
}

/** Response factors X, Y, Z by simulating unit triangular pulses (base 2Δ) on the fine grid. */
export function fdResponseFactors(
  c: ConstructionInput,
  timestepS: number,
  terms: number,
  options: FdOptions,
) {
  const pulse = (t: number) => Math.max(0, 1 - Math.abs(t) / timestepS);
  const zero = () => 0;
  const outsidePulse = fdFluxes(c, pulse, zero, -timestepS, timestepS, terms + 1, options);
  const insidePulse = fdFluxes(c, zero, pulse, -timestepS, timestepS, terms + 1, options);
  return {
    X: outsidePulse.qo.slice(1),
    Y: outsidePulse.qi.slice(1),
    Z: insidePulse.qi.slice(1).map((v) => -v),
  };
}

/** Decrement factor and time lag (h) of q_i for a 24 h sinusoidal outside air temperature, after `days` days. */
export function fdDecrementAndLag(c: ConstructionInput, days: number, options: FdOptions, uValue: number) {
  const period = 86400, perDay = 96;
  const out = fdFluxes(
    c,
    (t) => Math.cos((2 * Math.PI * t) / period),
    () => 0,
    0,
    period / perDay,
    days * perDay + 1,
    options,
  );
  const lastDay = out.qi.slice(out.qi.length - 1 - perDay, out.qi.length - 1);
  let re = 0, im = 0;
  lastDay.forEach((v, k) => {
    const phase = (2 * Math.PI * k) / perDay;
    re += (2 / perDay) * v * Math.cos(phase);
    im += (2 / perDay) * v * Math.sin(phase);
  });
  return {
    decrement: Math.hypot(re, im) / uValue,
    lagH: (((Math.atan2(im, re) * 24) / (2 * Math.PI)) % 24 + 24) % 24,
  };
}
