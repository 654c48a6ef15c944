import type { InsideSurface } from "./insideSurfaces.ts";
import type { BalanceSources } from "./periodicBalance.ts";
import { shareByArea, solarShare, spread, sumSeries } from "./radiantGains.ts";
import type { RoomInput, RoomSurfaceInput } from "./roomInput.ts";

/** What one part of the split load comes from (each run alone through the same balance). */
export type LoadSource =
  /** The far-side temperature of an opaque surface, taken relative to the room air set point. */
  | { readonly kind: "surface"; readonly id: string }
  /** Window conduction: the outdoor air relative to the set point, through all windows. */
  | { readonly kind: "windows" }
  /** Transmitted solar of all windows. */
  | { readonly kind: "solar" }
  | { readonly kind: "gain"; readonly name: string }
  | { readonly kind: "ventilation" }
  | { readonly kind: "thermal-bridges" }
  /** The set point itself (every temperature equal to it): zero for a constant set point. */
  | { readonly kind: "set-point" };

/** The far-side temperature series of a surface, or null for a same-as-room surface. */
function farTemperature(s: RoomSurfaceInput): readonly number[] | null {
  return s.farSide.kind === "temperature" ? s.farSide.temperatureC : null;
}

/** One run of the balance for the split: its source, inputs and instantaneous air-side load. */
export interface SplitPart {
  readonly source: LoadSource;
  readonly sources: BalanceSources;
  readonly airSideW: readonly number[];
}

/** Sources of every split part, each with its air-side (instantaneous) load, plus the full set. */
export function splitSources(
  room: RoomInput,
  faces: readonly InsideSurface[],
  n: number,
): { parts: SplitPart[]; total: { sources: BalanceSources; airSideW: readonly number[] } } {
  const ta = room.airTemperatureC;
  const opaque = room.surfaces.length;
  const none = faces.map(() => null);
  const outdoorRelative = room.outdoorAirC.map((v, k) => v - ta[k]!);
  const zeros = new Array<number>(n).fill(0);
  const nonsolarShare = shareByArea(faces);
  const solar = sumSeries(n, room.windows.map((w) => w.transmittedSolarW));
  const solarAbsorbed = spread(solar, solarShare(faces));
  const parts: SplitPart[] = [];
  room.surfaces.forEach((s, i) => {
    const t = farTemperature(s);
    if (t === null) return;
    const farC = faces.map((_, j) => (j === i ? t.map((v, k) => v - ta[k]!) : null));
    parts.push({
      source: { kind: "surface", id: s.id },
      sources: { farC, airC: null, absorbedW: none },
      airSideW: zeros,
    });
  });
  if (room.windows.length > 0) {
    const farC = faces.map((_, j) => (j >= opaque ? outdoorRelative : null));
    parts.push({
      source: { kind: "windows" },
      sources: { farC, airC: null, absorbedW: none },
      airSideW: zeros,
    });
    parts.push({
      source: { kind: "solar" },
      sources: { farC: none, airC: null, absorbedW: solarAbsorbed },
      airSideW: zeros,
    });
  }
  for (const g of room.gains) {
    const radiant = g.sensibleW.map((v) => v * g.radiantFraction);
    parts.push({
      source: { kind: "gain", name: g.name },
      sources: { farC: none, airC: null, absorbedW: spread(radiant, nonsolarShare) },
      airSideW: g.sensibleW.map((v, k) => v - radiant[k]!),
    });
  }
  const air = (h: number) => outdoorRelative.map((v) => h * v);
  parts.push({
    source: { kind: "ventilation" },
    sources: { farC: none, airC: null, absorbedW: none },
    airSideW: air(room.ventilationWPerK),
  });
  parts.push({
    source: { kind: "thermal-bridges" },
    sources: { farC: none, airC: null, absorbedW: none },
    airSideW: air(room.thermalBridgesWPerK),
  });
  const setPointFar = faces.map((f) => (f.kind === "adiabatic" ? null : ta));
  parts.push({
    source: { kind: "set-point" },
    sources: { farC: setPointFar, airC: ta, absorbedW: none },
    airSideW: zeros,
  });
  const nonsolarRadiant = sumSeries(n, room.gains.map((g) => g.sensibleW.map((v) => v * g.radiantFraction)));
  const absorbedW = nonsolarShare.map((share, i) =>
    nonsolarRadiant.map((v, k) => v * share + (solarAbsorbed[i]?.[k] ?? 0))
  );
  const farC = faces.map((f, i) =>
    f.kind === "window" ? room.outdoorAirC : f.kind === "adiabatic" ? null : farTemperature(room.surfaces[i]!)
  );
  const convectiveGains = sumSeries(
    n,
    room.gains.map((g) => g.sensibleW.map((v) => v * (1 - g.radiantFraction))),
  );
  const airSideW = convectiveGains.map((v, k) =>
    v + (room.ventilationWPerK + room.thermalBridgesWPerK) * outdoorRelative[k]!
  );
  return { parts, total: { sources: { farC, airC: ta, absorbedW }, airSideW } };
}
