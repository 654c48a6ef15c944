/** Helpers shared by the review rules: building findings and formatting numbers without locale. */

import type { Diagnostic, Severity } from "../project/diagnostic.ts";
import type { Position } from "../project/position.ts";

/** What a rule states about one offending value. */
export interface FindingSpec {
  readonly severity: Severity;
  readonly at: Position;
  readonly rule: string;
  readonly message: string;
  readonly hint?: string;
  readonly value?: string;
  readonly expected?: string;
  readonly source?: string;
  /** What the finding is about (see `Diagnostic.subject`). */
  readonly subject?: string;
}

/** Builds a diagnostic from a finding spec, leaving absent fields out (exact optional properties). */
export function finding(spec: FindingSpec): Diagnostic {
  const out: { -readonly [K in keyof Diagnostic]: Diagnostic[K] } = {
    severity: spec.severity,
    at: spec.at,
    rule: spec.rule,
    message: spec.message,
  };
  if (spec.hint !== undefined) out.hint = spec.hint;
  if (spec.value !== undefined) out.value = spec.value;
  if (spec.expected !== undefined) out.expected = spec.expected;
  if (spec.source !== undefined) out.source = spec.source;
  if (spec.subject !== undefined) out.subject = spec.subject;
  return out;
}

/** Names what each finding of the list is about (see `Diagnostic.subject`). */
export function about(subject: string, list: readonly Diagnostic[]): Diagnostic[] {
  return list.map((d) => ({ ...d, subject }));
}

/** Formats a number with four significant digits, plain for 0.001–999 999 and exponential otherwise. */
export function num(x: number): string {
  if (!Number.isFinite(x)) return String(x);
  if (x === 0) return "0";
  const abs = Math.abs(x);
  if (abs >= 1e-3 && abs < 1e6) return String(Number(x.toPrecision(4)));
  const [mantissa = "", exponent = ""] = x.toExponential(2).split("e");
  return `${String(Number(mantissa))}e${exponent}`;
}

/** Formats a closed range `min–max unit`. */
export function range(min: number, max: number, unit: string): string {
  return `${num(min)}–${num(max)} ${unit}`;
}
