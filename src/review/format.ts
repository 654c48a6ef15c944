/** Terminal text for findings: `path:line:col: severity: message`, a hint line and a value line. */

import { type Diagnostic, formatDiagnostic } from "../project/diagnostic.ts";
import { oneLine, shortenValues } from "../project/displayText.ts";

/** Formats one finding; plausibility findings get `  value: … expected: … (source: …)`. */
export function formatFinding(d: Diagnostic): string {
  const head = formatDiagnostic(d);
  if (d.value === undefined && d.expected === undefined && d.source === undefined) return head;
  const parts: string[] = [];
  if (d.value !== undefined) parts.push(`value: ${d.value}`);
  if (d.expected !== undefined) parts.push(`expected: ${d.expected}`);
  if (d.source !== undefined) parts.push(`(source: ${d.source})`);
  return `${head}\n  ${oneLine(shortenValues(parts.join(" ")))}`;
}

/** Formats a list of findings, one block per finding. */
export function formatFindings(list: readonly Diagnostic[]): string[] {
  return list.map(formatFinding);
}
