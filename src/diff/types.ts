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
 *   "files": [ { "path", "status": "added" | "removed" | "changed", "proseChanged": bool | null } ],
 *   "changes": [ { "section": "project" | "material" | "construction" | "scenario",
 *                  "subject": id ("project.md" for the front matter),
 *                  "part": "layer 2" | "layer 2 → 3" | "surface <id>" | null,
 *                  "key": e.g. "conductivity" | null (null: the whole subject or part was added or removed),
 *                  "change": "added" | "removed" | "changed",
 *                  "old": value | null, "new": value | null,   (SI numbers, text, or lists of numbers)
 *                  "unit": SI unit of the values ("" for pure numbers and text),
 *                  "oldAt": "path:line:col" | null, "newAt": "path:line:col" | null } ],
 *   "effects": [ { "subject": "construction:<id>" | "scenario:<id>" | "scenario:<id>/<surface>",
 *                  "quantity": one of EffectQuantity, "unit",
 *                  "old": number | null, "new": number | null,
 *                  "absolute": new − old | null, "relative": (new − old) / |old| | null } ],
 *   "unchangedEffects": count of compared result quantities that are equal on both sides }
 * ```
 * Effects list only quantities that differ, largest |relative| first; entries without a relative change
 * (one side missing, old = 0, or a clock time such as the hour of the peak) follow in input order.
 * `proseChanged` is null for files that are not Markdown documents of both sides.
 */

/** A value of an input key: an SI number, text, a flag, or a list (hourly profiles). */
export type FieldValue = number | string | boolean | readonly number[] | null;

/** Which kind of input a change belongs to. */
export type ChangeSection = "project" | "material" | "construction" | "scenario";

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
  | "mouldMargin";

/** How one result quantity moved between the two sides. */
export interface Effect {
  readonly subject: string;
  readonly quantity: EffectQuantity;
  readonly unit: string;
  readonly old: number | null;
  readonly new: number | null;
  readonly absolute: number | null;
  readonly relative: number | null;
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
  readonly files: readonly FileChange[];
  readonly changes: readonly Change[];
  readonly effects: readonly Effect[];
  readonly unchangedEffects: number;
}
