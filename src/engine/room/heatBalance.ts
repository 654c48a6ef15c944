import { type EngineCheck, engineCheck } from "../check.ts";
import { FourierDay } from "./dft.ts";
import { type InsideSurface, insideSurfaces, type RoomFailure } from "./insideSurfaces.ts";
import {
  type BalanceSources,
  evaluateBalance,
  meanRadiantTemperature,
  solveBalance,
} from "./periodicBalance.ts";
import { checkRoomSeries, radiationCoefficient } from "./radiantGains.ts";
import { type LoadSource, splitSources } from "./loadSources.ts";
import type { RoomInput } from "./roomInput.ts";
import { heatBalanceNotes, type RoomNote } from "./roomNotes.ts";

/** One inside face's results per step. */
export interface FaceResult {
  readonly id: string;
  readonly kind: InsideSurface["kind"];
  readonly areaM2: number;
  readonly convectionWPerM2K: number;
  readonly insideSurfaceTemperatureC: readonly number[];
  /** Conduction arriving at the inside surface (into the room positive), W. */
  readonly conductionW: readonly number[];
  /** Convection from the surface into the room air, W. */
  readonly convectionW: readonly number[];
  /** Net long-wave radiation from the surface to the other inside surfaces, W. */
  readonly radiationW: readonly number[];
  /** Radiant gains (solar and internal) absorbed on the surface, W. */
  readonly absorbedW: readonly number[];
}

/** Steady-periodic sensible cooling load by the heat balance method. */
export interface HeatBalanceResult {
  readonly kind: "heat-balance";
  readonly timestepS: number;
  /** Sensible cooling load per step, W (heat to remove from the room air to hold the set point). */
  readonly loadW: readonly number[];
  readonly peak: { readonly loadW: number; readonly timeH: number };
  readonly faces: readonly FaceResult[];
  readonly meanRadiantTemperatureC: readonly number[];
  /** The load of each source run alone; the parts sum to `loadW` (linearity). */
  readonly split: readonly { readonly source: LoadSource; readonly loadW: readonly number[] }[];
  /** max_k |Σ parts − load| / peak |load|. */
  readonly splitResidual: number;
  /** Room energy balance per step, W: Σ conduction + gains + ventilation + bridges − load (radiation nets to 0). */
  readonly balanceResidualW: readonly number[];
  /** max_k of the worst face's or the room's |residual| over the largest heat flow of that day, relative. */
  readonly balanceResidual: number;
  /** max_k |flux through the far face of an adiabatic surface| / peak |load|. */
  readonly adiabaticResidual: number;
  /** Linearised long-wave coefficient h_r, W/(m² K). */
  readonly radiationWPerM2K: number;
  /** Harmonics solved (= steps per day): the periodic state is solved directly, no day is repeated. */
  readonly harmonics: number;
  /** The checks of every build: energy balance, split sum, adiabatic far faces (each against 1e-9). */
  readonly checks: readonly EngineCheck[];
  readonly notes: readonly RoomNote[];
}

/** The room's sensible load of one set of sources: convection from the faces plus the air-side terms, W per step. */
function runLoad(
  faces: readonly InsideSurface[],
  radiation: number,
  sources: BalanceSources,
  airSideW: readonly number[],
  day: FourierDay,
): number[] {
  const solution = solveBalance(faces, radiation, sources, day);
  const air = sources.airC;
  return airSideW.map((extra, k) =>
    faces.reduce(
      (s, f, i) => s + f.areaM2 * f.convection * (solution.surfaceC[i]![k]! - (air === null ? 0 : air[k]!)),
      extra,
    )
  );
}

/** Sensible cooling load of a room by the inside-face heat balance, steady-periodic, with its checks and split. */
export function roomHeatBalance(room: RoomInput): HeatBalanceResult | RoomFailure {
  const bad = checkRoomSeries(room);
  if (bad !== null) return bad;
  const n = 86400 / room.timestepS;
  const day = new FourierDay(n);
  const radiation = radiationCoefficient(room);
  const faces = insideSurfaces(room, room.timestepS, radiation, day);
  if (!Array.isArray(faces)) return faces;
  const { parts, total } = splitSources(room, faces, n);
  const solution = solveBalance(faces, radiation, total.sources, day);
  const flows = evaluateBalance(faces, radiation, total.sources, solution);
  const loadW = total.airSideW.map((v, k) => flows.reduce((s, f) => s + f.convectionW[k]!, v));
  const split = parts.map((p) => ({
    source: p.source,
    loadW: runLoad(faces, radiation, p.sources, p.airSideW, day),
  }));
  const peakIndex = loadW.reduce((best, v, k) => (v > loadW[best]! ? k : best), 0);
  const scale = Math.max(...loadW.map(Math.abs), 1e-300);
  let splitResidual = 0;
  for (let k = 0; k < n; k++) {
    splitResidual = Math.max(
      splitResidual,
      Math.abs(split.reduce((s, p) => s + p.loadW[k]!, 0) - loadW[k]!) / scale,
    );
  }
  const balanceResidualW = loadW.map((load, k) =>
    flows.reduce((s, f) => s + f.conductionW[k]! + f.absorbedW[k]! - f.radiationW[k]!, 0) +
    total.airSideW[k]! - load
  );
  let largest = 0;
  for (let k = 0; k < n; k++) {
    for (const f of flows) {
      largest = Math.max(
        largest,
        Math.abs(f.conductionW[k]!),
        Math.abs(f.convectionW[k]!),
        Math.abs(f.radiationW[k]!),
        Math.abs(f.absorbedW[k]!),
      );
    }
    largest = Math.max(largest, Math.abs(total.airSideW[k]!), Math.abs(loadW[k]!));
  }
  const worstFace = Math.max(...flows.flatMap((f) => f.residualW.map(Math.abs)));
  const balanceResidual = Math.max(worstFace, ...balanceResidualW.map(Math.abs)) / Math.max(largest, 1e-300);
  const adiabaticResidual = Math.max(0, ...flows.flatMap((f) => f.farFaceW.map(Math.abs))) / scale;
  return {
    kind: "heat-balance",
    timestepS: room.timestepS,
    loadW,
    peak: { loadW: loadW[peakIndex]!, timeH: (peakIndex * room.timestepS) / 3600 },
    faces: faces.map((f, i) => ({
      id: f.id,
      kind: f.kind,
      areaM2: f.areaM2,
      convectionWPerM2K: f.convection,
      insideSurfaceTemperatureC: solution.surfaceC[i]!,
      conductionW: flows[i]!.conductionW,
      convectionW: flows[i]!.convectionW,
      radiationW: flows[i]!.radiationW,
      absorbedW: flows[i]!.absorbedW,
    })),
    meanRadiantTemperatureC: meanRadiantTemperature(faces, solution.surfaceC),
    split,
    splitResidual,
    balanceResidualW,
    balanceResidual,
    adiabaticResidual,
    radiationWPerM2K: radiation,
    harmonics: n,
    checks: [
      engineCheck(
        "room-energy-balance",
        "Conduction + absorbed radiant − convection − long-wave of every inside face, and the room's sum with gains, " +
          "ventilation and bridges against the load, at every step: worst |residual| / largest flow",
        balanceResidual,
        1e-9,
      ),
      engineCheck(
        "room-load-split",
        "Load of each source run alone, summed, against the load: max |difference| / peak load",
        splitResidual,
        1e-9,
      ),
      engineCheck(
        "room-adiabatic-far-face",
        "Flux through the far face of the same-as-room surfaces: max |flux| / peak load",
        adiabaticResidual,
        1e-9,
      ),
    ],
    notes: heatBalanceNotes(room, radiation),
  };
}
