import { type EngineCheck, engineCheck } from "../check.ts";
import { steadyPeriodicFlux } from "../surfaceFlux.ts";
import { circularConvolution, FourierDay } from "./dft.ts";
import type { LoadSource } from "./loadSources.ts";
import { constructionModes, insideSurfaces, type RoomFailure } from "./insideSurfaces.ts";
import { solveBalance } from "./periodicBalance.ts";
import { checkRoomSeries, radiationCoefficient, shareByArea, solarShare, spread } from "./radiantGains.ts";
import { DEFAULT_RADIANT_SPLIT, type RadiantSplit, type RoomInput } from "./roomInput.ts";
import { type RoomNote, rtsNotes } from "./roomNotes.ts";

/** The room's own radiant time series (hour 0 … 23 after a radiant pulse), each summing to 1. */
export interface RadiantTimeSeries {
  readonly kind: "radiant-time-series";
  readonly nonsolar: readonly number[];
  readonly solar: readonly number[];
  /** Σ of the hourly loads of the 1 W pulse before normalising: the share not conducted out of the room. */
  readonly nonsolarRetained: number;
  readonly solarRetained: number;
  /** Both series sum to 1 and are non-negative. */
  readonly checks: readonly EngineCheck[];
}

/**
 * The generation procedure: a periodic unit radiant pulse (1 W at hour 0 of every day; non-solar over all inside
 * surfaces by area, solar onto the floor) through the room's heat balance at hourly steps with every temperature
 * zero; the hourly convective loads divided by their sum.
 */
export function roomRadiantTimeSeries(room: RoomInput): RadiantTimeSeries | RoomFailure {
  const day = new FourierDay(24);
  const radiation = radiationCoefficient(room);
  const faces = insideSurfaces(room, 3600, radiation, day);
  if (!Array.isArray(faces)) return faces;
  const pulse = [1, ...new Array<number>(23).fill(0)];
  const series = (shares: readonly number[]) => {
    const none = faces.map(() => null);
    const t = solveBalance(
      faces,
      radiation,
      { farC: none, airC: null, absorbedW: spread(pulse, shares) },
      day,
    );
    const load = pulse.map((_, k) =>
      faces.reduce((s, f, i) => s + f.areaM2 * f.convection * t.surfaceC[i]![k]!, 0)
    );
    const sum = load.reduce((a, b) => a + b, 0);
    return { fractions: load.map((v) => v / sum), sum };
  };
  const nonsolar = series(shareByArea(faces));
  const solar = series(solarShare(faces));
  return {
    kind: "radiant-time-series",
    nonsolar: nonsolar.fractions,
    solar: solar.fractions,
    nonsolarRetained: nonsolar.sum,
    solarRetained: solar.sum,
    checks: [
      engineCheck(
        "room-rts-sum",
        "|Σ r_j − 1| of the non-solar and solar series, the larger",
        Math.max(Math.abs(sumOf(nonsolar.fractions) - 1), Math.abs(sumOf(solar.fractions) - 1)),
        1e-12,
      ),
      engineCheck(
        "room-rts-non-negative",
        "Most negative r_j of both series (0 if none)",
        Math.max(0, -Math.min(...nonsolar.fractions, ...solar.fractions)),
        1e-12,
      ),
    ],
  };
}

const sumOf = (xs: readonly number[]) => xs.reduce((a, b) => a + b, 0);

/** Hourly sensible cooling load by the radiant time series method with the room's own series. */
export interface RtsMethodResult {
  readonly kind: "rts-method";
  /** Load at hours 0 … 23, W. */
  readonly loadW: readonly number[];
  readonly peak: { readonly loadW: number; readonly timeH: number };
  /** Load of each source (conduction of a surface, windows, solar, a gain, ventilation, bridges); sums to `loadW`. */
  readonly split: readonly { readonly source: LoadSource; readonly loadW: readonly number[] }[];
  readonly radiantSplit: RadiantSplit;
  readonly notes: readonly RoomNote[];
}

/** Hourly samples (whole hours) of a series at the room's step. */
function hourly(series: readonly number[], stride: number): number[] {
  return Array.from({ length: 24 }, (_, h) => series[h * stride]!);
}

/** The radiant part through a series, the convective part at once: (1 − f)·q(h) + Σ_j r_j f·q(h − j). */
function throughSeries(
  gain: readonly number[],
  radiantFraction: number,
  series: readonly number[],
): number[] {
  const delayed = circularConvolution(series, gain.map((v) => v * radiantFraction));
  return gain.map((v, h) => (1 - radiantFraction) * v + delayed[h]!);
}

/** The radiant time series method load of the room, hourly, with the given series (the room's own, normally). */
export function roomRtsMethod(room: RoomInput, series: RadiantTimeSeries): RtsMethodResult | RoomFailure {
  const bad = checkRoomSeries(room);
  if (bad !== null) return bad;
  const split = { ...DEFAULT_RADIANT_SPLIT, ...room.options?.radiantSplit };
  const stride = 3600 / room.timestepS;
  const ta = hourly(room.airTemperatureC, stride);
  const outdoor = hourly(room.outdoorAirC, stride).map((v, h) => v - ta[h]!);
  const parts: { source: LoadSource; loadW: number[] }[] = [];
  for (const s of room.surfaces) {
    if (s.farSide.kind !== "temperature") continue;
    const modes = constructionModes(s.construction, 3600, s.id);
    if (modes.kind === "room-failure") return modes;
    const flux = steadyPeriodicFlux(modes, hourly(s.farSide.temperatureC, stride), ta).insideWPerM2;
    const fraction = s.orientation === "ceiling" ? split.ceiling : split.wallOrFloor;
    parts.push({
      source: { kind: "surface", id: s.id },
      loadW: throughSeries(flux.map((v) => v * s.areaM2), fraction, series.nonsolar),
    });
  }
  if (room.windows.length > 0) {
    const ua = room.windows.reduce((sum, w) => sum + w.uValue * w.areaM2, 0);
    parts.push({
      source: { kind: "windows" },
      loadW: throughSeries(outdoor.map((v) => ua * v), split.window, series.nonsolar),
    });
    const solar = hourly(
      room.windows[0]!.transmittedSolarW.map((_, k) =>
        room.windows.reduce((sum, w) => sum + w.transmittedSolarW[k]!, 0)
      ),
      stride,
    );
    parts.push({ source: { kind: "solar" }, loadW: throughSeries(solar, 1, series.solar) });
  }
  for (const g of room.gains) {
    parts.push({
      source: { kind: "gain", name: g.name },
      loadW: throughSeries(hourly(g.sensibleW, stride), g.radiantFraction, series.nonsolar),
    });
  }
  parts.push({ source: { kind: "ventilation" }, loadW: outdoor.map((v) => room.ventilationWPerK * v) });
  parts.push({
    source: { kind: "thermal-bridges" },
    loadW: outdoor.map((v) => room.thermalBridgesWPerK * v),
  });
  const loadW = ta.map((_, h) => parts.reduce((s, p) => s + p.loadW[h]!, 0));
  const peakHour = loadW.reduce((best, v, h) => (v > loadW[best]! ? h : best), 0);
  return {
    kind: "rts-method",
    loadW,
    peak: { loadW: loadW[peakHour]!, timeH: peakHour },
    split: parts,
    radiantSplit: split,
    notes: rtsNotes(split),
  };
}
