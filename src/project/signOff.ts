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

/** An open item accepted for issue: `item` is an open-item id (as printed in the summary) or a kind. */
export interface Acknowledgement {
  readonly item: string;
  readonly reason: string;
  readonly by: string;
  readonly at: Position;
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

/** Reads `acknowledged`: a list of `{ item, reason, by }`, every key required. */
export function readAcknowledgements(fields: Fields, out: Diagnostic[]): Acknowledgement[] | undefined {
  const items = readList(fields, "acknowledged", out);
  if (items === undefined) return undefined;
  const list: Acknowledgement[] = [];
  items.forEach((item, index) => {
    const entry = readFields(item, ["item", "reason", "by"], `acknowledged entry ${index + 1}`, out);
    if (entry === undefined) return;
    const id = readText(entry, "item", out, { example: "synthetic-data:weather-year" });
    const reason = readText(entry, "reason", out, { example: "illustration only, not used for design" });
    const by = readText(entry, "by", out, { example: "B. Checker" });
    if (id !== undefined && reason !== undefined && by !== undefined) {
      list.push({ item: id, reason, by, at: item.at });
    }
  });
  return list;
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
