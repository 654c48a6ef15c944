import {
  changeLabel,
  changeText,
  effectAbsolute,
  effectRelative,
  effectSide,
  effectSubject,
  quantityName,
} from "./display.ts";
import {
  checkFigures,
  checkLabel,
  checkMove,
  verdictFigures,
  verdictLabel,
  verdictMove,
} from "./verdictDisplay.ts";
import type { Change, ChangeSection, ProjectDiff, SideSummary } from "./types.ts";
import { oneLine, shortened } from "../project/displayText.ts";

/** A value from either side, kept on its own line of the output and shortened when long. */
function inLine(text: string): string {
  return oneLine(shortened(text));
}

/** Section titles of the input changes, in the order they are printed. */
export const SECTION_TITLES: readonly (readonly [ChangeSection, string])[] = [
  ["project", "Front matter (project.md)"],
  ["material", "Materials"],
  ["construction", "Constructions"],
  ["scenario", "Scenarios"],
  ["room", "Rooms"],
];

function width(text: string): number {
  return [...text].length;
}

function pad(text: string, size: number, right = false): string {
  const fill = " ".repeat(Math.max(0, size - width(text)));
  return right ? fill + text : text + fill;
}

/** A side as one line: label, kind, revision and date. */
export function sideLine(s: SideSummary): string {
  const kind = s.kind === "package" ? "package" : "project folder";
  return `${inLine(s.label)} (${kind}, revision ${inLine(s.revision)}, ${inLine(s.date)})`;
}

/** Where a change is on each side, `a file:line:col, b file:line:col`. */
export function placesText(c: Change): string {
  return `a ${c.oldAt ?? "—"}, b ${c.newAt ?? "—"}`;
}

function changeLines(changes: readonly Change[]): string[] {
  const out: string[] = [];
  for (const [section, title] of SECTION_TITLES) {
    const list = changes.filter((c) => c.section === section);
    if (list.length === 0) continue;
    out.push("", `${title}: ${list.length} change(s)`);
    for (const c of list) {
      out.push(`  ${inLine(changeLabel(c))}: ${inLine(changeText(c))}`, `      ${inLine(placesText(c))}`);
    }
  }
  return out;
}

function effectTable(diff: ProjectDiff): string[] {
  const head = ["subject", "quantity", "a", "b", "change", "relative"];
  const rows = diff.effects.map((e) => [
    effectSubject(e),
    quantityName(e.quantity),
    effectSide(e, "old"),
    effectSide(e, "new"),
    effectAbsolute(e),
    effectRelative(e),
  ]);
  const sizes = head.map((h, i) => Math.max(width(h), ...rows.map((r) => width(r[i] ?? ""))));
  const line = (cells: readonly string[]) =>
    `  ${cells.map((c, i) => pad(c, sizes[i] ?? 0, i >= 2)).join("  ")}`.trimEnd();
  return [line(head), line(sizes.map((s) => "-".repeat(s))), ...rows.map(line)];
}

/** The verdicts that moved and the checks that flipped, printed before anything else. */
function verdictLines(diff: ProjectDiff): string[] {
  const out: string[] = [];
  if (diff.verdicts.length > 0) {
    out.push("", `Verdicts changed: ${diff.verdicts.length} limit(s), newly NOT MET first`);
    for (const v of diff.verdicts) {
      out.push(`  ${inLine(verdictLabel(v))}: ${verdictMove(v)}`, `      ${inLine(verdictFigures(v))}`);
    }
  }
  if (diff.checks.length > 0) {
    const failing = diff.checks.filter((c) => c.new === "fail").length;
    out.push(
      "",
      `Calculation checks changed: ${failing} newly failing, ${
        diff.checks.length - failing
      } no longer failing`,
    );
    for (const c of diff.checks) {
      out.push(`  ${inLine(checkLabel(c))}: ${checkMove(c)}`, `      ${inLine(checkFigures(c))}`);
    }
  }
  return out;
}

/**
 * Renders the comparison for the terminal: sides, verdicts and checks that changed, changed files, changed
 * inputs by section, effects table.
 */
export function renderDiffText(diff: ProjectDiff): string {
  const out: string[] = [`a: ${sideLine(diff.a)}`, `b: ${sideLine(diff.b)}`];
  if (diff.identical) {
    out.push("", "no differences: the inputs and the results are the same");
    return out.join("\n");
  }
  out.push(...verdictLines(diff));
  if (diff.files.length > 0) {
    out.push("", `Files: ${diff.files.length} differ`);
    for (const f of diff.files) {
      const prose = f.proseChanged === true
        ? "  (prose changed)"
        : f.proseChanged === false
        ? "  (prose unchanged)"
        : "";
      out.push(`  ${pad(f.status, 8)} ${inLine(f.path)}${prose}`);
    }
  }
  out.push(...changeLines(diff.changes));
  out.push("");
  if (diff.effects.length === 0) {
    out.push(`Effects on results: none (${diff.unchangedEffects} quantities compared, all equal)`);
  } else {
    out.push(
      `Effects on results: ${diff.effects.length} quantities changed, largest relative change first` +
        ` (${diff.unchangedEffects} unchanged)`,
      ...effectTable(diff),
    );
  }
  return out.join("\n");
}
