/**
 * Placeholder text left from the template of `fluxnote init` (templates/new-project/): the role names ("Your
 * Name"), the job number and title, values marked "Placeholder:" and the instructions to the author. Each is a
 * `placeholder-text` warning at its file:line:col, so `check --strict` fails on an untouched template. Pure: it
 * reads the decoded source texts.
 */
import { type Diagnostic, warning } from "../project/diagnostic.ts";
import type { SourceText } from "../project/sourceText.ts";

/** Front-matter values the template writes, by key, with what to write instead. */
const TEMPLATE_VALUES: readonly { key: string; values: readonly string[]; hint: string }[] = [
  {
    key: "title",
    values: ["New project — opaque fabric heat transfer"],
    hint: "give the project's own title",
  },
  { key: "reference", values: ["JOB-0000"], hint: "give the job number" },
  { key: "prepared-by", values: ["Your Name"], hint: "name the person who prepared the calculation" },
  { key: "checked-by", values: ["Checker's Name"], hint: "name the person who checks the calculation" },
  { key: "approved-by", values: ["Approver's Name"], hint: "name the person who approves the calculation" },
];

/** Opening words of the template's instructions to the author (prose the package must not keep). */
export const TEMPLATE_INSTRUCTIONS: readonly string[] = [
  "State what this calculation is for, for whom, and which decisions it supports",
  "List the walls and roofs covered, the design conditions used, and what is excluded",
  "Name the standards, the climate data and the client's requirements",
  "Replace the outdoor conditions, the site and the sky optical depths",
];

/** A value or sentence the author marked as a placeholder: `Placeholder:` (any case). */
const MARKED = /\bplaceholder\s*:/i;

const RULE = "placeholder-text";

/** The placeholder findings of every source file, in file and line order. */
export function placeholderFindings(sources: readonly SourceText[]): Diagnostic[] {
  return sources.flatMap((source) => {
    const lines = source.text.split("\n");
    const frontMatterEnd = source.path === "project.md" && lines[0]?.trimEnd() === "---"
      ? lines.findIndex((l, i) => i > 0 && l.trimEnd() === "---")
      : -1;
    return lines.flatMap((line, index) =>
      lineFindings(source.path, index + 1, line, index > 0 && index < frontMatterEnd)
    );
  });
}

function lineFindings(file: string, line: number, text: string, inFrontMatter: boolean): Diagnostic[] {
  if (inFrontMatter) {
    const value = templateValue(text);
    if (value !== undefined) {
      return [{
        ...warning(
          { file, line, col: value.col },
          RULE,
          `Replace the template's placeholder "${value.text}" in "${value.key}"`,
          value.hint,
        ),
        subject: value.key,
      }];
    }
  }
  const marked = MARKED.exec(text);
  if (marked !== null) {
    const rest = text.slice(marked.index).replace(/["']\s*(#.*)?$/, "").trim();
    return [warning(
      { file, line, col: marked.index + 1 },
      RULE,
      `Replace the placeholder text "${shorten(rest)}"`,
      "write the value and its source for this project, or remove the line",
    )];
  }
  const instruction = TEMPLATE_INSTRUCTIONS.find((i) => text.includes(i));
  if (instruction !== undefined) {
    return [warning(
      { file, line, col: text.indexOf(instruction) + 1 },
      RULE,
      `Replace the template's instruction "${shorten(instruction)}" with the project's own text`,
      "the package prints this prose as it stands; write what the instruction asks for",
    )];
  }
  return [];
}

function templateValue(
  text: string,
): { key: string; text: string; col: number; hint: string } | undefined {
  const match = /^([a-z-]+)\s*:\s*(["']?)(.*?)\2\s*(#.*)?$/.exec(text);
  if (match === null) return undefined;
  const [, key = "", , value = ""] = match;
  const known = TEMPLATE_VALUES.find((t) => t.key === key && t.values.includes(value));
  return known === undefined
    ? undefined
    : { key, text: value, col: text.indexOf(value, key.length) + 1, hint: known.hint };
}

/** Keeps a quoted placeholder readable: at most 60 characters, cut at a space. */
function shorten(text: string): string {
  if (text.length <= 60) return text;
  const cut = text.lastIndexOf(" ", 58);
  return `${text.slice(0, cut > 30 ? cut : 58).replace(/[\s,;:]+$/, "")}…`;
}
