/**
 * The direct steady-periodic solution against the heat balance marched step by step, day after day, from a cold
 * start until the days repeat (the usual way of reaching the periodic state; Pedersen, Fisher & Spitler 1997, from
 * memory): an independent route (time-domain modal recursion, one small solve per step) to the same state.
 */
import assert from "node:assert/strict";
import type { PulseModes } from "../../../src/engine/pulseModes.ts";
import { constructionModes } from "../../../src/engine/room/insideSurfaces.ts";
import { radiationCoefficient } from "../../../src/engine/room/radiantGains.ts";
import { DEFAULT_CONVECTION, roomHeatBalance, type RoomInput } from "../../../src/engine/room/mod.ts";
import { HEAVY, LIGHT, ordinaryRoom } from "./rooms.ts";

/** q_t = RF_0 x_t + RF_1 x_(t−1) + Σ c_n q_n s_n,t, s_n,t = q_n s_n,(t−1) + x_(t−2): the part without x_t, then advance. */
class Recursion {
  #x1 = 0;
  #x2 = 0;
  readonly #s: number[];
  constructor(readonly modes: PulseModes) {
    this.#s = modes.ratios.map(() => 0);
  }
  get rf0(): number {
    return this.modes.rf0;
  }
  rest(): number {
    const m = this.modes;
    return m.ratios.reduce(
      (sum, q, n) => sum + m.coefficients[n]! * q * (q * this.#s[n]! + this.#x2),
      m.rf1 * this.#x1,
    );
  }
  advance(x: number): void {
    this.modes.ratios.forEach((q, n) => (this.#s[n] = q * this.#s[n]! + this.#x2));
    this.#x2 = this.#x1;
    this.#x1 = x;
  }
}

const massless = (k: number): PulseModes => ({ timestepS: 1, rf0: k, rf1: 0, ratios: [], coefficients: [] });

/** Marches the room until the load changes by less than `tolerance` of its peak between days; the last day. */
function marched(room: RoomInput, tolerance: number): { loadW: number[]; days: number; daysTo1e4: number } {
  const n = 86400 / room.timestepS;
  const hr = radiationCoefficient(room);
  const faces = [
    ...room.surfaces.map((s) => {
      const m = constructionModes({ ...s.construction, insideResistance: 0 }, room.timestepS, s.id);
      if (m.kind !== "modes") throw new Error(m.message);
      const far = s.farSide.kind === "temperature" ? s.farSide.temperatureC : null;
      return {
        area: s.areaM2,
        hc: DEFAULT_CONVECTION[s.orientation],
        far,
        y: new Recursion(m.Y), // Y on the far temperature
        z: new Recursion(m.Z), // Z on the inside surface
        x: new Recursion(m.X), // X on the far face (adiabatic)
        yi: new Recursion(m.Y), // Y on the inside surface (adiabatic far-face flux)
      };
    }),
    ...room.windows.map((w) => {
      const k = 1 / (1 / w.uValue - 1 / (DEFAULT_CONVECTION.wall + hr));
      return {
        area: w.areaM2,
        hc: DEFAULT_CONVECTION.wall,
        far: room.outdoorAirC,
        y: new Recursion(massless(k)),
        z: new Recursion(massless(k)),
        x: new Recursion(massless(k)),
        yi: new Recursion(massless(k)),
      };
    }),
  ];
  const totalArea = faces.reduce((s, f) => s + f.area, 0);
  const floorArea = room.surfaces.reduce((s, f) => s + (f.orientation === "floor" ? f.areaM2 : 0), 0);
  let previous: number[] = [];
  let daysTo1e4 = 0;
  for (let day = 1; day <= 2000; day++) {
    const load: number[] = [];
    for (let k = 0; k < n; k++) {
      const ta = room.airTemperatureC[k]!;
      const radiant = room.gains.reduce((s, g) => s + g.radiantFraction * g.sensibleW[k]!, 0);
      const solar = room.windows.reduce((s, w) => s + w.transmittedSolarW[k]!, 0);
      const d: number[] = [];
      const b: number[] = [];
      faces.forEach((f, i) => {
        const onFloor = i < room.surfaces.length && room.surfaces[i]!.orientation === "floor";
        const absorbed = radiant / totalArea + (onFloor ? solar / floorArea : 0);
        if (f.far !== null) {
          d.push(f.z.rf0 + f.hc + hr);
          b.push(f.y.rf0 * f.far[k]! + f.y.rest() - f.z.rest() + absorbed + f.hc * ta);
        } else {
          // q_o = 0 gives θ_o = (Y_0 θ_s + rest_Yi − rest_X) / X_0; put into q_i.
          const [x0, y0] = [f.x.rf0, f.y.rf0];
          d.push(f.z.rf0 - (y0 * y0) / x0 + f.hc + hr);
          b.push((y0 * (f.yi.rest() - f.x.rest())) / x0 + f.y.rest() - f.z.rest() + absorbed + f.hc * ta);
        }
      });
      const weights = faces.map((f) => f.area / totalArea);
      const mrt = weights.reduce((s, w, i) => s + (w * b[i]!) / d[i]!, 0) /
        (1 - hr * weights.reduce((s, w, i) => s + w / d[i]!, 0));
      let convection = 0;
      faces.forEach((f, i) => {
        const t = (b[i]! + hr * mrt) / d[i]!;
        convection += f.area * f.hc * (t - ta);
        if (f.far !== null) f.y.advance(f.far[k]!);
        else {
          const farFace = (f.y.rf0 * t + f.yi.rest() - f.x.rest()) / f.x.rf0;
          f.y.advance(farFace);
          f.x.advance(farFace);
          f.yi.advance(t);
        }
        f.z.advance(t);
      });
      const airSide = room.gains.reduce((s, g) => s + (1 - g.radiantFraction) * g.sensibleW[k]!, 0) +
        (room.ventilationWPerK + room.thermalBridgesWPerK) * (room.outdoorAirC[k]! - ta);
      load.push(convection + airSide);
    }
    if (day > 1) {
      const peak = Math.max(...load.map(Math.abs));
      const change = Math.max(...load.map((v, k) => Math.abs(v - previous[k]!))) / peak;
      if (daysTo1e4 === 0 && change < 1e-4) daysTo1e4 = day;
      if (change < tolerance) return { loadW: load, days: day, daysTo1e4 };
    }
    previous = load;
  }
  throw new Error("the days never settled");
}

for (const [name, set] of [["heavy", HEAVY], ["light", LIGHT]] as const) {
  for (const timestepS of [3600, 600]) {
    Deno.test(`room heat balance solved directly equals the day repeated to convergence (${name}, Δ = ${timestepS} s)`, () => {
      const room = ordinaryRoom(set, { timestepS, steady: false });
      const direct = roomHeatBalance(room);
      if (direct.kind !== "heat-balance") throw new Error(direct.message);
      const run = marched(room, 1e-11);
      const peak = direct.peak.loadW;
      run.loadW.forEach((v, k) =>
        assert.ok(Math.abs(v - direct.loadW[k]!) < 1e-8 * peak, `step ${k}: ${v} vs ${direct.loadW[k]}`)
      );
      console.log(
        `${name} Δ ${timestepS} s: marched from zero, 0.01 % day-to-day change after ${run.daysTo1e4} days, 1e-11 after ${run.days}`,
      );
    });
  }
}
