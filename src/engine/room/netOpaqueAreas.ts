/** Takes the windows' areas out of the surfaces they sit in (gross → net opaque area). Pure numbers, m². */

export interface GrossSurfaceArea {
  readonly id: string;
  /** Gross area, windows included, m² */
  readonly grossAreaM2: number;
}

export interface WindowInSurface {
  readonly id: string;
  /** Id of the surface the window sits in. */
  readonly hostId: string;
  /** Whole window area (frame included), m² */
  readonly areaM2: number;
}

export interface NetOpaqueArea {
  readonly id: string;
  readonly grossAreaM2: number;
  /** Sum of the windows' areas in this surface, m² */
  readonly windowAreaM2: number;
  /** grossAreaM2 − windowAreaM2, m² (never below 0) */
  readonly netAreaM2: number;
}

export interface NetOpaqueAreas {
  readonly kind: "net-areas";
  /** One entry per surface, in the order given. */
  readonly areas: readonly NetOpaqueArea[];
}

export type NetAreaRejectReason = "unknown-host" | "windows-exceed-host" | "invalid-area";

export interface NetAreaRejected {
  readonly kind: "rejected";
  readonly reason: NetAreaRejectReason;
  /** The window (unknown host, invalid area) or the host surface (windows exceed it) concerned. */
  readonly subject: string;
  readonly message: string;
}

/**
 * Relative slack when comparing the windows' sum with the host's area, so that areas given to a few decimals
 * (0.1 + 0.2 against 0.3) are not refused for a rounding difference; within it the net area is 0.
 */
const AREA_SLACK = 1e-9;

/**
 * Net opaque area of each surface: its gross area less the windows sitting in it. Rejects (never throws) a window
 * naming no known surface, a window with a negative or non-finite area, and windows that together exceed their
 * host's area.
 */
export function netOpaqueAreas(
  surfaces: readonly GrossSurfaceArea[],
  windows: readonly WindowInSurface[],
): NetOpaqueAreas | NetAreaRejected {
  const windowSum = new Map<string, number>(surfaces.map((s) => [s.id, 0]));
  for (const w of windows) {
    if (!Number.isFinite(w.areaM2) || w.areaM2 < 0) {
      return {
        kind: "rejected",
        reason: "invalid-area",
        subject: w.id,
        message: `Give window "${w.id}" an area of 0 m² or more (got ${w.areaM2})`,
      };
    }
    const sum = windowSum.get(w.hostId);
    if (sum === undefined) {
      return {
        kind: "rejected",
        reason: "unknown-host",
        subject: w.id,
        message:
          `Name a surface of the room for window "${w.id}" (it sits in "${w.hostId}", which is not one)`,
      };
    }
    windowSum.set(w.hostId, sum + w.areaM2);
  }
  const areas: NetOpaqueArea[] = [];
  for (const s of surfaces) {
    const windowAreaM2 = windowSum.get(s.id) ?? 0;
    if (windowAreaM2 > s.grossAreaM2 * (1 + AREA_SLACK)) {
      return {
        kind: "rejected",
        reason: "windows-exceed-host",
        subject: s.id,
        message:
          `Make the windows in "${s.id}" smaller than the surface: they add up to ${windowAreaM2} m² ` +
          `and the surface is ${s.grossAreaM2} m²`,
      };
    }
    areas.push({
      id: s.id,
      grossAreaM2: s.grossAreaM2,
      windowAreaM2,
      netAreaM2: Math.max(0, s.grossAreaM2 - windowAreaM2),
    });
  }
  return { kind: "net-areas", areas };
}
