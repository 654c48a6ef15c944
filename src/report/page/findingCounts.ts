/**
 * The one line that counts the review findings, printed alike on the cover and in section 4: errors, warnings
 * and notes, and how many of the notes are the "Default in use" notes folded into the assumptions register.
 */
import type { Diagnostic } from "../../project/diagnostic.ts";

/** Review notes folded into the assumptions register (one per default assumption). */
export const FOLDED_RULE = "default-used";

const counted = (n: number, noun: string) => `${n} ${noun}${n === 1 ? "" : "s"}`;

/** "0 errors, 1 warning, 64 notes (63 of them "Default in use", folded into the assumptions register)". */
export function findingCountsText(findings: readonly Diagnostic[]): string {
  const of = (severity: string) => findings.filter((f) => f.severity === severity).length;
  const folded = findings.filter((f) => f.rule === FOLDED_RULE).length;
  const foldedText = folded === 0
    ? ""
    : ` (${
      folded === of("note") ? "all" : `${folded} of them`
    } "Default in use", folded into the assumptions register)`;
  return `${counted(of("error"), "error")}, ${counted(of("warning"), "warning")}, ${
    counted(of("note"), "note")
  }${foldedText}`;
}
