import { oneLine, shortenValues } from "./displayText.ts";
import { formatPosition, type Position } from "./position.ts";

export type Severity = "error" | "warning" | "note";

/** One finding about the input: what is wrong, where, and how to fix it. */
export interface Diagnostic {
  readonly severity: Severity;
  readonly at: Position;
  /** Stable rule name, e.g. `unit-missing`, `unknown-material`. */
  readonly rule: string;
  readonly message: string;
  readonly hint?: string;
  /** For plausibility findings: the value found, with its unit. */
  readonly value?: string;
  /** For plausibility findings: the expected range or rule, with its unit. */
  readonly expected?: string;
  /** For plausibility findings: where the expected range comes from. */
  readonly source?: string;
  /**
   * What the finding is about, as `check` groups it and `acknowledged: [{ rule, subject }]` names it: a material
   * id, a construction id, `<construction> layer <n>`, `<scenario>/<surface>`, a front-matter key. Absent: the
   * finding's `file:line` stands for it.
   */
  readonly subject?: string;
}

/** Creates an error diagnostic; quoted values longer than 200 characters are shortened. */
export function error(at: Position, rule: string, message: string, hint?: string): Diagnostic {
  return hint === undefined
    ? { severity: "error", at, rule, message: shortenValues(message) }
    : { severity: "error", at, rule, message: shortenValues(message), hint: shortenValues(hint) };
}

/** Creates a warning diagnostic; quoted values longer than 200 characters are shortened. */
export function warning(at: Position, rule: string, message: string, hint?: string): Diagnostic {
  return hint === undefined
    ? { severity: "warning", at, rule, message: shortenValues(message) }
    : { severity: "warning", at, rule, message: shortenValues(message), hint: shortenValues(hint) };
}

/** Orders diagnostics by file, line, column, then message, so output is stable. */
export function sortDiagnostics(list: readonly Diagnostic[]): Diagnostic[] {
  return [...list].sort((a, b) =>
    a.at.file < b.at.file ? -1 : a.at.file > b.at.file ? 1 : a.at.line - b.at.line || a.at.col - b.at.col ||
      (a.message < b.message ? -1 : a.message > b.message ? 1 : 0)
  );
}

/**
 * Formats a diagnostic as `path:line:col: severity: message` plus an indented hint line. Each line is
 * kept one line (a newline or control character in a value is shown escaped) and long values are shortened.
 */
export function formatDiagnostic(d: Diagnostic): string {
  const head = oneLine(`${formatPosition(d.at)}: ${d.severity}: ${shortenValues(d.message)}`);
  return d.hint === undefined ? head : `${head}\n  hint: ${oneLine(shortenValues(d.hint))}`;
}

/** True when the list holds at least one error. */
export function hasErrors(list: readonly Diagnostic[]): boolean {
  return list.some((d) => d.severity === "error");
}

/** Number of errors in the list (warnings and notes do not count). */
export function errorCount(list: readonly Diagnostic[]): number {
  let n = 0;
  for (const d of list) if (d.severity === "error") n++;
  return n;
}
