import { isValidTimestep } from "../analyse.ts";
import { conductionChain } from "../elements.ts";
import type { ConstructionInput } from "../layer.ts";
import { periodicFromModes } from "../periodic.ts";
import { estimatedPoles, MAX_POLES } from "../poleBudget.ts";
import { type PulseModes, pulseModes } from "../pulseModes.ts";
import { polesAndRamp } from "../rootAnalysis.ts";
import { FourierDay, type Spectrum } from "./dft.ts";
import { DEFAULT_CONVECTION, type RoomInput, type SurfaceOrientation } from "./roomInput.ts";

/** Why a room cannot be computed, with a message a user can act on. */
export interface RoomFailure {
  readonly kind: "room-failure";
  /** The surface or window concerned, when there is one. */
  readonly id?: string;
  readonly message: string;
}

export function roomFailure(message: string, id?: string): RoomFailure {
  return id === undefined ? { kind: "room-failure", message } : { kind: "room-failure", id, message };
}

/**
 * One inside face of the room at one time step: the conduction from its far side (film included) to its inside
 * surface (no inside film) as 24-hour periodic response factors and their spectra. Windows are massless (one term).
 */
export interface InsideSurface {
  readonly id: string;
  readonly kind: "conducting" | "adiabatic" | "window";
  readonly orientation: SurfaceOrientation;
  readonly areaM2: number;
  /** Inside convection coefficient h_c, W/(m² K). */
  readonly convection: number;
  /** Periodic response factors over one day, W/(m² K): q_inside = P_Y ⊛ T_far − P_Z ⊛ T_surface. */
  readonly pX: readonly number[];
  readonly pY: readonly number[];
  readonly pZ: readonly number[];
  readonly X: Spectrum;
  readonly Y: Spectrum;
  readonly Z: Spectrum;
}

/** The modal form of X, Y, Z of a construction (air to air: both given surface resistances included). */
export interface ConstructionModes {
  readonly kind: "modes";
  readonly X: PulseModes;
  readonly Y: PulseModes;
  readonly Z: PulseModes;
  /** W/(m² K) */
  readonly uValue: number;
}

/** The modal form of X, Y, Z of a construction's chain with the given surface resistances. */
export function constructionModes(
  construction: ConstructionInput,
  timestepS: number,
  id: string,
): ConstructionModes | RoomFailure {
  if (!isValidTimestep(timestepS)) {
    return roomFailure(
      `Cannot compute the room at time step ${timestepS} s: expected whole seconds dividing 3600 s`,
    );
  }
  const chain = conductionChain(construction, "air-to-air");
  if (chain.kind === "unresolvable") return roomFailure(chain.message, id);
  const poles = estimatedPoles(construction, timestepS);
  if (poles.count > MAX_POLES) {
    return roomFailure(`Cannot analyse surface "${id}": about ${poles.count} poles would be needed`, id);
  }
  const { ramp } = polesAndRamp(chain, timestepS);
  return {
    kind: "modes",
    X: pulseModes(ramp, "X", timestepS),
    Y: pulseModes(ramp, "Y", timestepS),
    Z: pulseModes(ramp, "Z", timestepS),
    uValue: ramp.uValue,
  };
}

/**
 * The inside faces of a room at `timestepS` (opaque surfaces first in input order, then windows). A window's
 * conductance from the outdoor air to its inside surface is 1 / (1/U_w − 1/(h_c + h_r)).
 */
export function insideSurfaces(
  room: RoomInput,
  timestepS: number,
  radiation: number,
  day: FourierDay,
): InsideSurface[] | RoomFailure {
  const n = day.n;
  const out: InsideSurface[] = [];
  for (const s of room.surfaces) {
    if (!(s.areaM2 > 0)) {
      return roomFailure(`Give surface "${s.id}" a positive area, found ${s.areaM2} m²`, s.id);
    }
    const convection = s.convectionWPerM2K ?? DEFAULT_CONVECTION[s.orientation];
    if (!(convection > 0)) {
      return roomFailure(`Give surface "${s.id}" a positive h_c, found ${convection}`, s.id);
    }
    const modes = constructionModes({ ...s.construction, insideResistance: 0 }, timestepS, s.id);
    if (modes.kind === "room-failure") return modes;
    const pX = periodicFromModes(modes.X, n);
    const pY = periodicFromModes(modes.Y, n);
    const pZ = periodicFromModes(modes.Z, n);
    out.push({
      id: s.id,
      kind: s.farSide.kind === "same-as-room" ? "adiabatic" : "conducting",
      orientation: s.orientation,
      areaM2: s.areaM2,
      convection,
      pX,
      pY,
      pZ,
      X: day.forward(pX),
      Y: day.forward(pY),
      Z: day.forward(pZ),
    });
  }
  for (const w of room.windows) {
    if (!(w.areaM2 > 0)) {
      return roomFailure(`Give window "${w.id}" a positive area, found ${w.areaM2} m²`, w.id);
    }
    const orientation = w.orientation ?? "wall";
    const convection = DEFAULT_CONVECTION[orientation];
    const insideFilm = 1 / (convection + radiation);
    if (!(w.uValue > 0) || 1 / w.uValue <= insideFilm) {
      return roomFailure(
        `Give window "${w.id}" a U-value between 0 and ${
          (1 / insideFilm).toFixed(2)
        } W/(m² K) (1/R_si), found ${w.uValue}`,
        w.id,
      );
    }
    const conductance = 1 / (1 / w.uValue - insideFilm);
    const p = new Array<number>(n).fill(0);
    p[0] = conductance;
    const spectrum = day.forward(p);
    out.push({
      id: w.id,
      kind: "window",
      orientation,
      areaM2: w.areaM2,
      convection,
      pX: p,
      pY: p,
      pZ: p,
      X: spectrum,
      Y: spectrum,
      Z: spectrum,
    });
  }
  return out;
}
