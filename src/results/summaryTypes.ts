/**
 * results.json top-level `summary` (extension): every verdict of the package in one place — one row per
 * construction, one per scenario, the failed checks and the open items that stand between the package and issue.
 */

/** Kinds of open item; the first three block `status: issued` until acknowledged. */
export type OpenItemKind =
  | "from-memory-source"
  | "synthetic-data"
  | "failed-check"
  | "default-in-use"
  | "unmet-limit"
  | "open-point"
  | "acknowledged-finding";

/** Open-item kinds that block issue unless acknowledged in the front matter. */
export const BLOCKING_KINDS: readonly OpenItemKind[] = [
  "from-memory-source",
  "synthetic-data",
  "failed-check",
];

/** Who accepted an open item for issue, and why (front matter `acknowledged`). */
export interface OpenItemAcknowledgement {
  readonly reason: string;
  readonly by: string;
  /** `file:line:col` of the acknowledgement */
  readonly at: string;
}

/** One open item: `id` is stable and is what `acknowledged: [{ item: <id> }]` names. */
export interface OpenItem {
  readonly id: string;
  readonly kind: OpenItemKind;
  readonly text: string;
  /** `file:line:col` */
  readonly at: string;
  readonly blocking: boolean;
  readonly acknowledged: OpenItemAcknowledgement | null;
}

export interface LimitVerdict {
  readonly id: string;
  readonly limitKey: string;
  readonly value: number | null;
  readonly limit: number;
  readonly unit: string;
  readonly clause: string;
  readonly pass: boolean;
}

/** One construction's verdicts, copied from `constructions.<id>` (SI). */
export interface ConstructionSummary {
  readonly id: string;
  readonly name: string;
  /** W/(m²K) */
  readonly U: number;
  /** W/(m²K), U with the user's corrections (equal to U without them) */
  readonly correctedU: number;
  readonly limits: readonly LimitVerdict[];
  readonly decrementFactor: number | null;
  readonly timeLag_h: number | null;
  /** κ₁, J/(m²K): inside areal heat capacity (ISO 13786) */
  readonly kappa1: number | null;
  readonly fRsi: number | null;
  /** m²K/W, the R_si behind `fRsi` as results.json states it */
  readonly fRsiSurfaceResistance: number | null;
}

export interface PeakSummary {
  /** W */
  readonly value: number;
  /** h after 00:00 (design day) or after the start of the weather file */
  readonly time_h: number;
  /** The weather file's time stamp of the peak, when there is one */
  readonly time: string | null;
}

export interface HeatingSurfaceVerdict {
  readonly surface: string;
  readonly construction: string;
  readonly condensation: { readonly pass: boolean; readonly margin: number };
  readonly mould: { readonly pass: boolean; readonly margin: number };
}

/** One scenario's headline figures (SI). */
export interface ScenarioSummary {
  readonly id: string;
  readonly kind: "design-day" | "weather" | "heating";
  readonly peakGain: PeakSummary | null;
  /** J per day: the design day's totals, or a weather period's totals divided by its days */
  readonly dailyEnergy: { readonly gain_J: number; readonly loss_J: number } | null;
  readonly peakCoolingLoad: PeakSummary | null;
  /** W */
  readonly designHeatLoss: number | null;
  readonly surfaces: readonly HeatingSurfaceVerdict[];
  readonly synthetic: boolean;
}

export interface FailedCheckSummary {
  readonly id: string;
  readonly subject: string;
  readonly description: string;
  readonly value: number;
  readonly limit: number;
}

export interface SummaryJson {
  readonly constructions: readonly ConstructionSummary[];
  readonly scenarios: readonly ScenarioSummary[];
  readonly failedChecks: readonly FailedCheckSummary[];
  readonly openItems: readonly OpenItem[];
}
