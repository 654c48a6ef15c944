/**
 * The comparison of two revisions of a project, schema `fluxnote-diff/1`.
 *
 * `fluxnote diff --format json` prints a `ProjectDiff` as is:
 *
 * ```
 * { "schema": "fluxnote-diff/1",
 *   "a": { "label", "kind": "folder" | "package", "title", "revision", "date", "inputsSha256" },
 *   "b": { same },
 *   "identical": true when nothing below differs,
 *   "verdicts": [ { "subject": "construction:<id>", "limit": "max-u" | "max-periodic-transmittance" | ...,
 *                   "clause", "unit", "old": "MET" | "NOT MET" | null, "new": same (null: no such limit),
 *                   "oldValue", "newValue", "oldLimit", "newLimit": number | null } ],
 *   "checks": [ { "subject", "id", "description", "old": "pass" | "fail" | null, "new": same,
 *                 "oldValue", "newValue": number | null, "limit" } ],
 *   "files": [ { "path", "status": "added" | "removed" | "changed", "proseChanged": bool | null } ],
 *   "changes": [ { "section": "project" | "material" | "construction" | "scenario" | "room",
 *                  "subject": id ("project.md" for the front matter),
 *                  "part": "layer 2" | "layer 2 → 3" | "surface <id>" | "window <id>" | "gain <name>"
 *                          | "thermal bridge <name>" | "point bridge <name>" | null,
 *                  "key": e.g. "conductivity" | null (null: the whole subject or part was added or removed),
 *                  "change": "added" | "removed" | "changed",
 *                  "old": value | null, "new": value | null,   (SI numbers, text, or lists of numbers)
 *                  "unit": SI unit of the values ("" for pure numbers and text),
 *                  "oldAt": "path:line:col" | null, "newAt": "path:line:col" | null } ],
 *   "effects": [ { "subject": "construction:<id>" | "scenario:<id>" | "scenario:<id>/<surface>"
 *                              | "heating:<id>" | "heating:<id>/<surface>" | "room:<id>" | "room:<id>/<surface>",
 *                  "quantity": one of EffectQuantity, "unit",
 *                  "old": number | null, "new": number | null,
 *                  "absolute": new − old | null, "relative": (new − old) / |old| | null,
 *                  "oldTime", "newTime": "YYYY-MM-DDTHH:MM" (weather-year peaks only) } ],
 *   "unchangedEffects": count of compared result quantities that are equal on both sides }
 * ```
 * `verdicts` and `checks` (extensions, read them first) list the code limits whose verdict moved and the
 * calculation checks that newly fail or no longer fail; newly NOT MET / failing ones come first.
 * Effects list only quantities that differ, largest |relative| first; entries without a relative change
 * (one side missing, old = 0, or a clock time such as the hour of the peak) follow in input order.
 * The hour of a design-day peak is a clock hour: its `absolute` change is the signed shortest way round the
 * clock (23:00 → 00:00 is +1 h). A weather-year peak carries its local time as in the package
 * (`oldTime`/`newTime`; `old`/`new` are hours after the first row) and `absolute` is the hours between the two
 * times. "U with corrections" (`correctedU`) is compared only when a side has a correction.
 * `proseChanged` is null for files that are not Markdown documents of both sides.
 */

/** A value of an input key: an SI number, text, a flag, or a list (hourly profiles). */
export type FieldValue = number | string | boolean | readonly number[] | null;

/** Which kind of input a change belongs to. */
export type ChangeSection = "project" | "material" | "construction" | "scenario" | "room";

/** One changed input key (or one added or removed subject or part) with its place on each side. */
export interface Change {
  readonly section: ChangeSection;
  readonly subject: string;
  readonly part: string | null;
  readonly key: string | null;
  readonly change: "added" | "removed" | "changed";
  readonly old: FieldValue;
  readonly new: FieldValue;
  readonly unit: string;
  readonly oldAt: string | null;
  readonly newAt: string | null;
}

/** The result quantities compared between the two sides. */
export type EffectQuantity =
  | "U"
  | "decrementFactor"
  | "timeLag_h"
  | "peakHeatGain"
  | "peakTime_h"
  | "dailyGain_J"
  | "dailyLoss_J"
  | "annualGain_J"
  | "annualLoss_J"
  | "correctedU"
  | "temperatureFactor"
  | "limitsNotMet"
  | "peakCoolingLoad"
  | "peakCoolingLoadTime_h"
  | "designHeatLoss"
  | "insideSurfaceTemperature"
  | "mouldMargin"
  | "heatBalancePeak"
  | "heatBalancePeakTime_h"
  | "rtsMethodPeak"
  | "rtsMethodPeakTime_h"
  | "heatLossCoefficient"
  | "peakInsideSurfaceTemperature";

/** How one result quantity moved between the two sides. */
export interface Effect {
  readonly subject: string;
  readonly quantity: EffectQuantity;
  readonly unit: string;
  readonly old: number | null;
  readonly new: number | null;
  readonly absolute: number | null;
  readonly relative: number | null;
  /** Weather-year peaks: the local time of the peak as the package prints it, `YYYY-MM-DDTHH:MM`. */
  readonly oldTime?: string | null;
  readonly newTime?: string | null;
}

/** The verdict on a code limit, as the package prints it. */
export type Verdict = "MET" | "NOT MET";

/** A code limit of a construction whose verdict differs between the sides (null: no such limit there). */
export interface VerdictChange {
  readonly subject: string;
  readonly limit: string;
  readonly clause: string;
  readonly unit: string;
  readonly old: Verdict | null;
  readonly new: Verdict | null;
  readonly oldValue: number | null;
  readonly newValue: number | null;
  readonly oldLimit: number | null;
  readonly newLimit: number | null;
}

/** The outcome of a calculation check. */
export type CheckStatus = "pass" | "fail";

/** A calculation check that newly fails on b, or failed on a and no longer does (null: absent on that side). */
export interface CheckChange {
  readonly subject: string;
  readonly id: string;
  readonly description: string;
  readonly old: CheckStatus | null;
  readonly new: CheckStatus | null;
  readonly oldValue: number | null;
  readonly newValue: number | null;
  readonly limit: number;
}

/** An input file present on only one side or with different bytes. */
export interface FileChange {
  readonly path: string;
  readonly status: "added" | "removed" | "changed";
  readonly proseChanged: boolean | null;
}

/** What identifies one side of the comparison. */
export interface SideSummary {
  readonly label: string;
  readonly kind: "folder" | "package";
  readonly title: string;
  readonly revision: string;
  readonly date: string;
  readonly inputsSha256: string;
}

/** The whole comparison, serialised as is by `--format json`. */
export interface ProjectDiff {
  readonly schema: "fluxnote-diff/1";
  readonly a: SideSummary;
  readonly b: SideSummary;
  readonly identical: boolean;
  /** Extension: limits whose verdict moved, newly NOT MET first. */
  readonly verdicts: readonly VerdictChange[];
  /** Extension: calculation checks that newly fail or no longer fail, newly failing first. */
  readonly checks: readonly CheckChange[];
  readonly files: readonly FileChange[];
  readonly changes: readonly Change[];
  readonly effects: readonly Effect[];
  readonly unchangedEffects: number;
}

/** One compared quantity of a construction, scenario, heating scenario or room (effects.ts compares them). */
export interface ComparedQuantity {
  readonly subject: string;
  readonly quantity: EffectQuantity;
  readonly unit: string;
  readonly value: number | null;
  /** False for a clock time, whose relative change means nothing. */
  readonly ratio: boolean;
  /** A clock hour of a design day: its change is taken the shortest way round the clock. */
  readonly clock?: boolean;
  /** A weather-year peak: its local time `YYYY-MM-DDTHH:MM` as results.json and the package give it. */
  readonly time?: string | null;
}
