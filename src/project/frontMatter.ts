import { type Diagnostic, error, errorCount } from "./diagnostic.ts";
import { type Fields, readChoice, readFields, readList, readNumber, readText, textOf } from "./fields.ts";
import type { ProjectInfo, ProjectStatus, RevisionEntry } from "./model.ts";
import type { Position } from "./position.ts";
import { describeCodePoints } from "./quantity.ts";
import { readLimits } from "./limitsSyntax.ts";
import { readAcknowledgements, readOpenPoints, requireRoleFor } from "./signOff.ts";
import type { YamlValue } from "./yamlTree.ts";

export const FRONT_MATTER_KEYS = [
  "title",
  "reference",
  "revision",
  "status",
  "prepared-by",
  "checked-by",
  "approved-by",
  "date",
  "units",
  "revisions",
  "files",
  "sensitivity",
  "limits",
  "client",
  "project",
  "checked-date",
  "approved-date",
  "open-points",
  "acknowledged",
  "paper",
] as const;

const STATUSES: readonly ProjectStatus[] = ["draft", "for-review", "issued"];
const ISO_DATE = /^\d{4}-(0[1-9]|1[0-2])-(0[1-9]|[12]\d|3[01])$/;

/** Front matter read from `project.md`: the project info and the optional explicit file list. */
export interface FrontMatter {
  readonly info: ProjectInfo;
  readonly files?: readonly { readonly path: string; readonly at: Position }[];
}

/** Validates the front matter of `project.md`. */
export function readFrontMatter(value: YamlValue, out: Diagnostic[]): FrontMatter | undefined {
  const fields = readFields(value, FRONT_MATTER_KEYS, "front matter of project.md", out);
  if (fields === undefined) return undefined;
  const before = errorCount(out);
  const title = readText(fields, "title", out, { example: "Community library, fabric heat flows" });
  const reference = readText(fields, "reference", out, { example: "J-2031-004" });
  const revision = readText(fields, "revision", out, { example: "A" });
  const status = readChoice(fields, "status", STATUSES, out) ?? requireKey(fields, "status", "draft", out);
  const preparedBy = readText(fields, "prepared-by", out, { example: "A. Engineer" });
  const checkedBy = readText(fields, "checked-by", out, { example: "B. Checker" });
  const approvedBy = readText(fields, "approved-by", out);
  const date = readDate(fields, "date", out, true);
  const units = readChoice(fields, "units", ["SI", "IP"] as const, out) ?? "SI";
  const revisions = readRevisions(fields, out);
  const files = readFileList(fields, out);
  const sensitivityVariation = readSensitivity(fields, out);
  const limitsEntry = fields.entries.get("limits");
  const limits = limitsEntry === undefined
    ? undefined
    : readLimits(limitsEntry.value, "front matter of project.md", "project", out);
  const client = readText(fields, "client", out);
  const project = readText(fields, "project", out);
  const checkedDate = readDate(fields, "checked-date", out, false);
  const approvedDate = readDate(fields, "approved-date", out, false);
  requireRoleFor(fields, "approved-date", "approved-by", out);
  const openPoints = readOpenPoints(fields, out);
  const acknowledged = readAcknowledgements(fields, out);
  const paper = readChoice(fields, "paper", ["A4", "Letter"] as const, out);
  if (
    errorCount(out) > before || title === undefined || reference === undefined || revision === undefined ||
    status === undefined || preparedBy === undefined || checkedBy === undefined || date === undefined
  ) {
    return undefined;
  }
  const info: ProjectInfo = {
    title,
    reference,
    revision,
    status,
    preparedBy,
    checkedBy,
    date,
    units,
    revisions,
    ...(approvedBy === undefined ? {} : { approvedBy }),
    ...(sensitivityVariation === undefined ? {} : { sensitivityVariation }),
    ...(limits === undefined ? {} : { limits }),
    ...(client === undefined ? {} : { client }),
    ...(project === undefined ? {} : { project }),
    ...(checkedDate === undefined ? {} : { checkedDate }),
    ...(approvedDate === undefined ? {} : { approvedDate }),
    ...(openPoints === undefined ? {} : { openPoints }),
    ...(acknowledged === undefined ? {} : { acknowledged }),
    ...(paper === undefined ? {} : { paper }),
  };
  return files === undefined ? { info } : { info, files };
}

function requireKey(fields: Fields, key: string, example: string, out: Diagnostic[]): undefined {
  if (!fields.entries.has(key)) {
    out.push(
      error(
        fields.at,
        "missing-key",
        `Missing required key "${key}" in the ${fields.what}`,
        `add e.g. \`${key}: ${example}\``,
      ),
    );
  }
  return undefined;
}

function readDate(fields: Fields, key: string, out: Diagnostic[], required: boolean): string | undefined {
  const text = readText(fields, key, out, required ? { example: "2031-05-14" } : undefined);
  if (text === undefined) return undefined;
  const at = fields.entries.get(key)?.value.at ?? fields.at;
  if (!ISO_DATE.test(text)) {
    out.push(
      error(
        at,
        "bad-date",
        `Cannot read the date "${describeCodePoints(text)}": expected an ISO date YYYY-MM-DD`,
        "write e.g. `date: 2031-05-14`",
      ),
    );
    return undefined;
  }
  const [year, month, day] = text.split("-").map(Number) as [number, number, number];
  const last = daysInMonth(year, month);
  if (day > last) {
    out.push(
      error(
        at,
        "bad-date",
        `Cannot use the date "${text}": month ${month} of ${year} has ${last} days`,
        `check the day; the last day of that month is ${text.slice(0, 8)}${last}`,
      ),
    );
    return undefined;
  }
  return text;
}

/** Days in a month of the Gregorian calendar (ISO 8601): February has 29 in leap years. */
export function daysInMonth(year: number, month: number): number {
  if (month === 2) return (year % 4 === 0 && year % 100 !== 0) || year % 400 === 0 ? 29 : 28;
  return [4, 6, 9, 11].includes(month) ? 30 : 31;
}

function readRevisions(fields: Fields, out: Diagnostic[]): RevisionEntry[] {
  const items = readList(fields, "revisions", out) ?? [];
  const revisions: RevisionEntry[] = [];
  items.forEach((item, index) => {
    const entry = readFields(item, ["revision", "date", "description"], `revision entry ${index + 1}`, out);
    if (entry === undefined) return;
    const revision = readText(entry, "revision", out, { example: "A" });
    const date = readDate(entry, "date", out, true);
    const description = readText(entry, "description", out, { example: "First issue for comment" });
    if (revision !== undefined && date !== undefined && description !== undefined) {
      revisions.push({ revision, date, description });
    }
  });
  return revisions;
}

function readFileList(fields: Fields, out: Diagnostic[]): { path: string; at: Position }[] | undefined {
  const items = readList(fields, "files", out);
  if (items === undefined) return undefined;
  const files: { path: string; at: Position }[] = [];
  for (const item of items) {
    const path = textOf(item, 'an entry of "files"', out);
    if (path !== undefined) files.push({ path, at: item.at });
  }
  return files;
}

function readSensitivity(fields: Fields, out: Diagnostic[]): number | undefined {
  const entry = fields.entries.get("sensitivity");
  if (entry === undefined) return undefined;
  const study = readFields(entry.value, ["variation"], "sensitivity setting", out);
  if (study === undefined) return undefined;
  const variation = readNumber(study, "variation", 0.01, 0.9, out);
  if (variation === undefined && !study.entries.has("variation")) {
    out.push(
      error(
        study.at,
        "missing-key",
        'Missing "variation" in the sensitivity setting',
        "write e.g. `sensitivity: { variation: 0.2 }` for ±20 %",
      ),
    );
  }
  return variation;
}
