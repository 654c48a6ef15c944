import type { CheckResult } from "../engine/checkResult.ts";
import type {
  EnergyTotals,
  OutsideFilmResults,
  ScenarioResults,
  SurfaceResults,
  SyntheticWeatherResults,
} from "../scenarios/types.ts";
export type {
  CheckResult,
  EnergyTotals,
  OutsideFilmResults,
  ScenarioResults,
  SurfaceResults,
  SyntheticWeatherResults,
};
import type { SensitivityResults } from "../sensitivity/study.ts";
import type { SummaryJson } from "./summaryTypes.ts";
import type { HeatingResults } from "../scenarios/heatingTypes.ts";
import type { RoomResults } from "../scenarios/room/roomTypes.ts";
export type { RoomResults };
/** The machine-readable results (results.json), contract `fluxnote-results/1` (DESIGN.md §4). */

export interface InputFileRecord {
  readonly path: string;
  readonly sha256: string;
}

/**
 * Extension: a method choice (results.json `methodNotes`), e.g. a polynomial CTF not published because its
 * coefficients are numerically unfit, so the modal form is used. Not a check and never a failure; `figures` are
 * the acceptance figures behind the choice (value against limit).
 */
export interface MethodNoteResult {
  /** Stable id, e.g. `ctf-modal-form`. */
  readonly id: string;
  /** `construction:<id>` */
  readonly subject: string;
  readonly text: string;
  readonly figures: readonly {
    readonly id: string;
    readonly description: string;
    readonly value: number;
    readonly limit: number;
  }[];
}

export interface LayerResult {
  readonly name: string;
  readonly kind: "massive" | "resistive";
  /** m, absent for a resistive layer */
  readonly thickness?: number;
  readonly conductivity?: number;
  readonly density?: number;
  readonly specificHeat?: number;
  /** m^2 K/W */
  readonly R: number;
  /** J/(m^2 K) */
  readonly arealHeatCapacity: number;
}

export interface ConstructionResults {
  /** W/(m^2 K), air to air */
  readonly U: number;
  /** m^2 K/W including surface resistances */
  readonly R: number;
  readonly timestep_h: number;
  /** Extension: steady-state detail. */
  readonly steady: {
    readonly outsideSurfaceResistance: number;
    readonly insideSurfaceResistance: number;
    readonly surfaceToSurfaceU: number;
    readonly arealHeatCapacity: number;
    readonly layers: readonly LayerResult[];
  };
  /** Dynamic parts are added by the engine issue (tau1_h, responseFactors, ctf, ...). */
  readonly [key: string]: unknown;
}

export interface ResultsJson {
  readonly schema: "fluxnote-results/1";
  readonly tool: { readonly name: "fluxnote"; readonly version: string };
  readonly inputs: { readonly files: readonly InputFileRecord[]; readonly sha256: string };
  readonly constructions: Readonly<Record<string, ConstructionResults>>;
  readonly scenarios: Readonly<Record<string, ScenarioResults>>;
  readonly checks: readonly CheckResult[];
  /** Extension: method choices (see `MethodNoteResult`); absent in packages written before it. */
  readonly methodNotes?: readonly MethodNoteResult[];
  readonly assumptions: readonly { id: string; text: string; source: string; at: string }[];
  readonly warnings: readonly { at: string; message: string }[];
  /** Extension: the optional sensitivity study (front matter `sensitivity: { variation }`). */
  readonly sensitivity?: SensitivityResults;
  /** Extension: `kind: heating` scenarios (steady design heat loss, ISO 13788 surface checks), by id. */
  readonly heating?: Readonly<Record<string, HeatingResults>>;
  /** `room` blocks (heat balance cooling load, radiant time series, ground floors, design heat loss), by id. */
  readonly rooms?: Readonly<Record<string, RoomResults>>;
  /** Extension: every verdict on one page and the open items (see `summaryTypes.ts`). */
  readonly summary?: SummaryJson;
}
