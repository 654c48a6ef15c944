/**
 * Front-matter keys of the issue gate: `client`, `project`, the per-role dates `checked-date` and
 * `approved-date`, the user's own `open-points` and the `acknowledged` open items (each with a reason and a name).
 */
import { type Diagnostic, error } from "./diagnostic.ts";
import { type Fields, readFields, readList, readText, textOf } from "./fields.ts";
import { formatPosition, type Position } from "./position.ts";

/** An open point the user lists in the front matter. */
export interface OpenPoint {
  readonly text: string;
  /** `file:line:col` where the point applies: the user's `at`, else the list entry itself. */
  readonly at: string;
}

/**
 * An open item accepted for issue: `item` is an open-item id (as printed in the summary) or a kind. A reviewed
 * finding is acknowledged as `{ rule, subject }` (or `item: finding:<rule>[:<subject>]`, the same thing): then
 * `finding` holds the rule and the subject (absent: every subject; `*` in it matches any run of characters) and
 * `item` the id of its open item, `finding:<rule>` or `finding:<rule>:<subject>`.
 */
export interface Acknowledgement {
  readonly item: string;
  readonly reason: string;
  readonly by: string;
  readonly at: Position;
  readonly finding?: FindingAcknowledged;
}

/** The review finding(s) an acknowledgement names. */
export interface FindingAcknowledged {
  readonly rule: string;
  readonly subject?: string;
}

const FINDING_ITEM = /^finding:([^:]+)(?::(.+))?$/s;

/** Reads `finding:<rule>[:<subject>]` (the open-item id of an acknowledged finding). */
export function findingOfItem(item: string): FindingAcknowledged | undefined {
  const match = FINDING_ITEM.exec(item);
  if (match === null) return undefined;
  return match[2] === undefined ? { rule: match[1]! } : { rule: match[1]!, subject: match[2] };
}

/** Reads `open-points`: a list of texts or `{ text, at }` mappings. */
export function readOpenPoints(fields: Fields, out: Diagnostic[]): OpenPoint[] | undefined {
  const items = readList(fields, "open-points", out);
  if (items === undefined) return undefined;
  const points: OpenPoint[] = [];
  items.forEach((item, index) => {
    if (item.kind !== "map") {
      const text = textOf(item, `entry ${index + 1} of "open-points"`, out);
      if (text !== undefined) points.push({ text, at: formatPosition(item.at) });
      return;
    }
    const entry = readFields(item, ["text", "at"], `open point ${index + 1}`, out);
    if (entry === undefined) return;
    const text = readText(entry, "text", out, { example: "Confirm the roof build-up with the contractor" });
    const at = readText(entry, "at", out);
    if (text !== undefined) points.push({ text, at: at ?? formatPosition(item.at) });
  });
  return points;
}

/**
 * Reads `acknowledged`: a list of `{ item, reason, by }` (an open item) or `{ rule, subject, reason, by }` (a
 * reviewed finding; `subject` optional), `reason` and `by` always required.
 */
export function readAcknowledgements(fields: Fields, out: Diagnostic[]): Acknowledgement[] | undefined {
  const items = readList(fields, "acknowledged", out);
  if (items === undefined) return undefined;
  const list: Acknowledgement[] = [];
  items.forEach((item, index) => {
    const what = `acknowledged entry ${index + 1}`;
    const entry = readFields(item, ["item", "rule", "subject", "reason", "by"], what, out);
    if (entry === undefined) return;
    const named = acknowledgedTarget(entry, what, out);
    const reason = readText(entry, "reason", out, { example: "illustration only, not used for design" });
    const by = readText(entry, "by", out, { example: "B. Checker" });
    if (named !== undefined && reason !== undefined && by !== undefined) {
      list.push({ ...named, reason, by, at: item.at });
    }
  });
  return list;
}

/** The `item` of an entry, or its `rule` and `subject` turned into the finding's open-item id. */
function acknowledgedTarget(
  entry: Fields,
  what: string,
  out: Diagnostic[],
): { item: string; finding?: FindingAcknowledged } | undefined {
  const hasRule = entry.entries.has("rule");
  if (!hasRule) {
    const subjectEntry = entry.entries.get("subject");
    if (subjectEntry !== undefined && entry.entries.has("item")) {
      out.push(error(
        subjectEntry.keyAt,
        "acknowledged-subject-without-rule",
        `Cannot use "subject" with "item" in the ${what}: a subject belongs to a finding's rule`,
        "write `{ rule: <rule>, subject: <subject>, reason: …, by: … }`, or drop `subject`",
      ));
      return undefined;
    }
    const id = readText(entry, "item", out, { example: "synthetic-data:weather-year" });
    if (id === undefined) return undefined;
    const finding = findingOfItem(id);
    return finding === undefined ? { item: id } : { item: id, finding };
  }
  const itemEntry = entry.entries.get("item");
  if (itemEntry !== undefined) {
    out.push(error(
      itemEntry.keyAt,
      "acknowledged-item-and-rule",
      `Cannot use both "item" and "rule" in the ${what}`,
      "an open item takes `item:`, a reviewed finding `rule:` (with `subject:`); split it into two entries",
    ));
    return undefined;
  }
  const rule = readText(entry, "rule", out, { example: "source-missing" });
  const subject = readText(entry, "subject", out);
  if (rule === undefined) return undefined;
  if (rule.includes(":")) {
    out.push(error(
      entry.entries.get("rule")?.value.at ?? entry.at,
      "acknowledged-bad-rule",
      `Cannot read the rule "${rule}" in the ${what}: a rule name has no colon`,
      "copy the rule name as `check` prints it, e.g. `rule: source-missing`, and the subject into `subject:`",
    ));
    return undefined;
  }
  return subject === undefined
    ? { item: `finding:${rule}`, finding: { rule } }
    : { item: `finding:${rule}:${subject}`, finding: { rule, subject } };
}

/** Reports a role date given without its role name (a date nobody signed). */
export function requireRoleFor(fields: Fields, dateKey: string, roleKey: string, out: Diagnostic[]): void {
  const entry = fields.entries.get(dateKey);
  if (entry === undefined || fields.entries.has(roleKey)) return;
  out.push(
    error(
      entry.keyAt,
      "role-date-without-role",
      `Cannot use "${dateKey}" without "${roleKey}": the date belongs to a named person`,
      `add \`${roleKey}: <name>\` or remove \`${dateKey}\``,
    ),
  );
}
