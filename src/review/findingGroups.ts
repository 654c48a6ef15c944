/**
 * Findings grouped by rule for `check`: one group per severity, rule and acknowledgement, with the count, one
 * message, the subjects it applies to and the first position. Pure; `formatGroups` gives the aligned text.
 */
import type { Diagnostic, Severity } from "../project/diagnostic.ts";
import { oneLine, shortenValues } from "../project/displayText.ts";
import { formatPosition } from "../project/position.ts";
import type { Acknowledgement } from "../project/signOff.ts";
import { acknowledgementFor, findingSubject } from "../project/acknowledgedFindings.ts";
import { REVIEW_RULES } from "./catalogue.ts";

/** One finding with the acknowledgement that accepts it, if any. */
export interface MarkedFinding {
  readonly finding: Diagnostic;
  readonly subject: string;
  readonly acknowledged?: Acknowledgement;
}

/** The findings of one rule at one severity, all acknowledged by the same entry or all not acknowledged. */
export interface FindingGroup {
  readonly severity: Severity;
  readonly rule: string;
  readonly count: number;
  /** The finding's message when there is one (or all say the same), else the rule's description. */
  readonly message: string;
  /** The hint, when every finding of the group gives the same one. */
  readonly hint?: string;
  /** The value line of a single plausibility finding. */
  readonly value?: string;
  /** Distinct subjects in order of position. */
  readonly subjects: readonly string[];
  /** `file:line:col` of the first finding. */
  readonly at: string;
  readonly acknowledged?: Acknowledgement;
  readonly findings: readonly MarkedFinding[];
}

const SEVERITY_ORDER: readonly Severity[] = ["error", "warning", "note"];

/** True when a finding of severity `s` is shown under the filter `min` ("and above"). */
export function atLeast(s: Severity, min: Severity): boolean {
  return SEVERITY_ORDER.indexOf(s) <= SEVERITY_ORDER.indexOf(min);
}

/** Marks each finding with its subject and the acknowledgement that accepts it. */
export function markFindings(
  findings: readonly Diagnostic[],
  acks: readonly Acknowledgement[],
): MarkedFinding[] {
  return findings.map((finding) => {
    const acknowledged = acknowledgementFor(finding, acks);
    const subject = findingSubject(finding);
    return acknowledged === undefined ? { finding, subject } : { finding, subject, acknowledged };
  });
}

/** Groups marked findings (sorted by position) by severity, rule and acknowledgement. */
export function groupFindings(marked: readonly MarkedFinding[]): FindingGroup[] {
  const buckets = new Map<string, MarkedFinding[]>();
  for (const m of marked) {
    const ack = m.acknowledged === undefined ? "" : `${formatPosition(m.acknowledged.at)}`;
    const key = `${m.finding.severity}\u0000${m.finding.rule}\u0000${ack}`;
    buckets.set(key, [...(buckets.get(key) ?? []), m]);
  }
  const groups = [...buckets.values()].map(toGroup);
  return groups.sort((a, b) =>
    SEVERITY_ORDER.indexOf(a.severity) - SEVERITY_ORDER.indexOf(b.severity) ||
    Number(a.acknowledged !== undefined) - Number(b.acknowledged !== undefined) ||
    (a.rule < b.rule ? -1 : a.rule > b.rule ? 1 : 0)
  );
}

function toGroup(list: readonly MarkedFinding[]): FindingGroup {
  const first = list[0]!;
  const d = first.finding;
  const messages = new Set(list.map((m) => m.finding.message));
  const hints = new Set(list.map((m) => m.finding.hint));
  const description = REVIEW_RULES.find((r) => r.id === d.rule)?.description;
  const message = messages.size === 1
    ? d.message
    : description === undefined
    ? `${d.message} (and ${list.length - 1} more like it)`
    : description;
  const value = list.length === 1 ? valueLine(d) : undefined;
  return {
    severity: d.severity,
    rule: d.rule,
    count: list.length,
    message,
    ...(hints.size === 1 && d.hint !== undefined ? { hint: d.hint } : {}),
    ...(value === undefined ? {} : { value }),
    subjects: [...new Set(list.map((m) => m.subject))],
    at: formatPosition(d.at),
    ...(first.acknowledged === undefined ? {} : { acknowledged: first.acknowledged }),
    findings: list,
  };
}

function valueLine(d: Diagnostic): string | undefined {
  if (d.value === undefined && d.expected === undefined && d.source === undefined) return undefined;
  const expected = d.expected === undefined ? "" : `; expected ${d.expected}`;
  const source = d.source === undefined ? "" : ` (source: ${d.source})`;
  return `${d.value ?? ""}${expected}${source}`.replace(/^; /, "").trim();
}

/** Subjects shown in "applies to" before the rest is counted. */
export const SHOWN_SUBJECTS = 6;

/** "a, b, c, … and 57 more": the first few subjects and how many are left out. */
export function appliesTo(subjects: readonly string[]): string {
  if (subjects.length <= SHOWN_SUBJECTS) return subjects.join(", ");
  const shown = subjects.slice(0, SHOWN_SUBJECTS - 1);
  return `${shown.join(", ")}, … and ${subjects.length - shown.length} more`;
}

/**
 * Aligned terminal text: per group a head line `severity  rule  count  message`, then indented labelled lines
 * (applies to, at or first at, hint, value, acknowledged by). Each line is kept on one line and long values are
 * shortened.
 */
export function formatGroups(groups: readonly FindingGroup[]): string[] {
  if (groups.length === 0) return [];
  const ruleWidth = Math.max(...groups.map((g) => g.rule.length));
  const countWidth = Math.max(...groups.map((g) => String(g.count).length));
  const indent = " ".repeat(9);
  const lines: string[] = [];
  for (const g of groups) {
    const head = `${g.severity.padEnd(8)} ${g.rule.padEnd(ruleWidth)}  ${
      String(g.count).padStart(countWidth)
    }  ${g.acknowledged === undefined ? "" : "[acknowledged] "}${g.message}`;
    lines.push(clean(head));
    const detail = (label: string, text: string) => lines.push(clean(`${indent}${label.padEnd(13)}${text}`));
    detail("applies to", appliesTo(g.subjects));
    detail(g.count === 1 ? "at" : "first at", g.at);
    if (g.acknowledged !== undefined) {
      detail(
        "acknowledged",
        `by ${g.acknowledged.by}: ${g.acknowledged.reason} (${formatPosition(g.acknowledged.at)})`,
      );
    }
    if (g.hint !== undefined && g.acknowledged === undefined) detail("hint", g.hint);
    if (g.value !== undefined) detail("value", g.value);
  }
  return lines;
}

function clean(line: string): string {
  return oneLine(shortenValues(line));
}
