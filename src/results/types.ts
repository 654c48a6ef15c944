/** The machine-readable results (results.json), contract `fluxnote-results/1` (DESIGN.md §4). */

export interface InputFileRecord {
  readonly path: string;
  readonly sha256: string;
}

export interface CheckResult {
  /** Stable id, e.g. `sum-rule-Y`. */
  readonly id: string;
  /** `construction:<id>` or `scenario:<id>/<surface>` */
  readonly subject: string;
  readonly description: string;
  readonly value: number;
  readonly limit: number;
  readonly pass: boolean;
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
  readonly scenarios: Readonly<Record<string, unknown>>;
  readonly checks: readonly CheckResult[];
  readonly assumptions: readonly { id: string; text: string; source: string; at: string }[];
  readonly warnings: readonly { at: string; message: string }[];
}
