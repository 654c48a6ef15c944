/**
 * Reviewed findings accepted in project.md: `acknowledged: [{ rule, subject, reason, by }]` (or the older
 * `item: finding:<rule>`). An acknowledged warning or note stays listed, marked with its reason and name, but no
 * longer counts for `check --strict`. Errors cannot be acknowledged: they stop the build.
 */
import type { Diagnostic } from "./diagnostic.ts";
import type { Acknowledgement } from "./signOff.ts";

/** Rules whose findings cannot be acknowledged (acknowledging a stale acknowledgement would hide it). */
const NOT_ACKNOWLEDGEABLE: ReadonlySet<string> = new Set(["acknowledged-nothing"]);

/** What a finding is about: its `subject`, else its `file:line`. */
export function findingSubject(d: Diagnostic): string {
  return d.subject ?? `${d.at.file}:${d.at.line}`;
}

/** True when a subject pattern (absent: every subject; `*` matches any run of characters) names the subject. */
export function subjectMatches(pattern: string | undefined, subject: string): boolean {
  if (pattern === undefined || pattern === subject) return true;
  if (!pattern.includes("*")) return false;
  const parts = pattern.split("*").map((p) => p.replace(/[.*+?^${}()|[\]\\]/g, "\\$&"));
  return new RegExp(`^${parts.join(".*")}$`, "s").test(subject);
}

/** True when the finding can be acknowledged at all (a warning or a note of an acknowledgeable rule). */
export function acknowledgeable(d: Diagnostic): boolean {
  return d.severity !== "error" && !NOT_ACKNOWLEDGEABLE.has(d.rule);
}

/** The first acknowledgement that names this finding, if any. */
export function acknowledgementFor(
  d: Diagnostic,
  acks: readonly Acknowledgement[],
): Acknowledgement | undefined {
  if (!acknowledgeable(d)) return undefined;
  const subject = findingSubject(d);
  return acks.find((a) =>
    a.finding !== undefined && a.finding.rule === d.rule && subjectMatches(a.finding.subject, subject)
  );
}

/** The findings one acknowledgement names (only warnings and notes). */
export function findingsAcknowledgedBy(
  ack: Acknowledgement,
  findings: readonly Diagnostic[],
): Diagnostic[] {
  const named = ack.finding;
  if (named === undefined) return [];
  return findings.filter((d) =>
    acknowledgeable(d) && d.rule === named.rule && subjectMatches(named.subject, findingSubject(d))
  );
}

/** Why a finding acknowledgement matches nothing, for the stale-acknowledgement warning. */
export function staleFindingMessage(ack: Acknowledgement, findings: readonly Diagnostic[]): string {
  const named = ack.finding;
  if (named === undefined) return `Acknowledged item "${ack.item}" matches no open item`;
  const what = named.subject === undefined
    ? `Acknowledged finding "${named.rule}"`
    : `Acknowledged finding "${named.rule}" for "${named.subject}"`;
  const errors = findings.some((d) =>
    d.severity === "error" && d.rule === named.rule && subjectMatches(named.subject, findingSubject(d))
  );
  return errors ? `${what} names only errors, which cannot be acknowledged` : `${what} matches no finding`;
}
