/**
 * The steady limit of a room, computed in every build: every temperature held at its daily mean, no sun, gains at
 * their daily mean. The heat balance load must then be constant and equal the heat its inside faces conduct plus the
 * gains, ventilation and bridges; a hand sum Σ U·A·ΔT + … (air-to-air U, no inside long-wave exchange) must come
 * close, the difference being the heat the inside long-wave exchange moves between surfaces.
 */
import { roomHeatBalance, type RoomInput } from "../../engine/room/mod.ts";
import type { CheckResult } from "../../engine/checkResult.ts";
import { steadyState } from "../../engine/steady.ts";
import { meanOf } from "../seriesStats.ts";

const constant = (xs: readonly number[]) => xs.map(() => meanOf(xs));

/** The room with every input replaced by its steady limit. */
function steadyLimitInput(room: RoomInput): RoomInput {
  return {
    ...room,
    airTemperatureC: constant(room.airTemperatureC),
    outdoorAirC: constant(room.outdoorAirC),
    surfaces: room.surfaces.map((s) =>
      s.farSide.kind === "temperature"
        ? { ...s, farSide: { kind: "temperature", temperatureC: constant(s.farSide.temperatureC) } }
        : s
    ),
    windows: room.windows.map((w) => ({ ...w, transmittedSolarW: w.transmittedSolarW.map(() => 0) })),
    gains: room.gains.map((g) => ({ ...g, sensibleW: constant(g.sensibleW) })),
  };
}

/** The hand sum of a room in its steady limit (`steadyLimitInput`) and the sum of its terms' magnitudes, W. */
function steadyHandSum(steady: RoomInput): { readonly total: number; readonly magnitude: number } {
  const air = steady.airTemperatureC[0]!;
  const outdoor = steady.outdoorAirC[0]!;
  const terms = [
    ...steady.surfaces.map((s) =>
      s.farSide.kind === "temperature"
        ? steadyState(s.construction).uValue * s.areaM2 * (s.farSide.temperatureC[0]! - air)
        : 0
    ),
    ...steady.windows.map((w) => w.uValue * w.areaM2 * (outdoor - air)),
    (steady.ventilationWPerK + steady.thermalBridgesWPerK) * (outdoor - air),
    ...steady.gains.map((g) => g.sensibleW[0]!),
  ];
  return { total: terms.reduce((a, b) => a + b, 0), magnitude: terms.reduce((a, b) => a + Math.abs(b), 0) };
}

/** Conductance from a face's far side to its inside surface, W/(m²K) (0 for a same-as-room face). */
function farConductance(room: RoomInput, id: string, kind: string, h: number): number {
  if (kind === "adiabatic") return 0;
  const window = room.windows.find((w) => w.id === id);
  if (window !== undefined) return 1 / (1 / window.uValue - 1 / h);
  const s = room.surfaces.find((x) => x.id === id)!;
  return 1 / (s.construction.outsideResistance + steadyState(s.construction).layersResistance);
}

/** The steady-limit checks of a room (subject `room:<id>`) and the statement of its hand sum. */
export function steadyLimitChecks(
  room: RoomInput,
  subject: string,
): { readonly checks: CheckResult[]; readonly statement?: string } {
  const steady = steadyLimitInput(room);
  const result = roomHeatBalance(steady);
  if (result.kind !== "heat-balance") return { checks: [] };
  const load = result.loadW;
  const scale = Math.max(...load.map(Math.abs), 1e-300);
  const spreadW = Math.max(...load) - Math.min(...load);
  const air = steady.airTemperatureC[0]!;
  const outdoor = steady.outdoorAirC[0]!;
  const conducted = result.faces.reduce((s, f) => s + f.conductionW[0]!, 0);
  const gains = steady.gains.reduce((s, g) => s + g.sensibleW[0]!, 0);
  const airSide = (steady.ventilationWPerK + steady.thermalBridgesWPerK) * (outdoor - air);
  const identity = Math.abs(conducted + gains + airSide - load[0]!) / scale;
  // Closed form of the steady room (series resistances, one node per inside face): a face with conductance K to
  // its far side θ_f and film h = h_c + h_r to θ_env = (h_c θ_i + h_r θ_mrt)/h, absorbing a W/m², conducts
  // q = U (θ_f − θ_env) − a U/h with U = 1/(1/K + 1/h); summed with gains, ventilation and bridges.
  const hr = result.radiationWPerM2K;
  const mrt = result.meanRadiantTemperatureC[0]!;
  const totalArea = result.faces.reduce((s, f) => s + f.areaM2, 0);
  const absorbed = steady.gains.reduce((s, g) => s + g.sensibleW[0]! * g.radiantFraction, 0) / totalArea;
  let closedForm = gains + airSide;
  let longWave = 0;
  let radiantOut = 0;
  for (const f of result.faces) {
    const h = f.convectionWPerM2K + hr;
    const k = farConductance(steady, f.id, f.kind, h);
    if (k === 0) continue;
    const u = 1 / (1 / k + 1 / h);
    const surface = steady.surfaces.find((s) => s.id === f.id);
    const far = surface === undefined
      ? outdoor
      : surface.farSide.kind === "temperature"
      ? surface.farSide.temperatureC[0]!
      : air;
    longWave += (mrt - air) * f.areaM2 * u * (hr / h);
    radiantOut += f.areaM2 * absorbed * (u / h);
    closedForm += f.areaM2 * u * (far - air);
  }
  closedForm -= longWave + radiantOut;
  const hand = steadyHandSum(steady);
  const check = (id: string, description: string, value: number, limit: number): CheckResult => ({
    id,
    subject,
    description,
    value,
    limit,
    pass: Math.abs(value) <= limit,
  });
  const pct = (v: number) => `${((100 * v) / Math.max(hand.magnitude, 1e-300)).toFixed(1)} % of Σ |terms|`;
  return {
    checks: [
      check(
        "room-steady-constant",
        "Steady limit (daily means, no sun): (max − min) of the heat balance load over the day / its magnitude",
        spreadW / scale,
        1e-9,
      ),
      check(
        "room-steady-identity",
        "Steady limit: load against the inside faces' conduction at their computed temperatures + gains + " +
          "ventilation + bridges, |difference| / load",
        identity,
        1e-9,
      ),
      check(
        "room-steady-closed-form",
        "Steady limit: load against the closed form Σ A·U·(θ_f − θ_i) − (θ_mrt − θ_i)·Σ A·U·h_r/h − Σ A·a·U/h + " +
          "gains + ventilation + bridges (U face to far side with the film h = h_c + h_r), |difference| / load",
        Math.abs(closedForm - load[0]!) / scale,
        1e-9,
      ),
    ],
    statement: `Steady limit (daily means, no sun, gains at their daily mean): heat balance ${
      load[0]!.toFixed(0)
    } W against the hand sum Σ U·A·ΔT + U_w·A_w·ΔT + (ρc·V̇ + Σψ·L)·ΔT + gains = ${hand.total.toFixed(0)} W (${
      pct(load[0]! - hand.total)
    }). The hand sum takes every face to exchange with the air and every gain to reach it; the inside long-wave exchange moves ${
      longWave.toFixed(0)
    } W (${pct(-longWave)}) and ${radiantOut.toFixed(0)} W of radiant gains are conducted out (${
      pct(-radiantOut)
    }); the rest is the difference between the ISO 6946 inside films and h_c + h_r.`,
  };
}
