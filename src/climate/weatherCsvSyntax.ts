/** Lexical pieces of the weather CSV reader: columns, header, cells and the step rule. */
import { type Diagnostic, error } from "../project/diagnostic.ts";
import { formatDurationS, formatLocalTime, localTimeAt } from "./weatherTime.ts";

/** Column names of the weather CSV, required first. */
export const WEATHER_COLUMNS = [
  "time",
  "dry-bulb",
  "global-horizontal",
  "diffuse-horizontal",
  "direct-normal",
] as const;
/** Columns every weather CSV must have. */
export const REQUIRED_WEATHER_COLUMNS = WEATHER_COLUMNS.slice(0, 4);

/** A weather CSV column name. */
export type Column = (typeof WEATHER_COLUMNS)[number];

const LIST = WEATHER_COLUMNS.join(", ");

/** Splits a line at commas into trimmed cells with their 1-based columns. */
export function splitCells(line: string): { text: string; col: number }[] {
  const cells: { text: string; col: number }[] = [];
  let start = 0;
  for (const raw of line.split(",")) {
    const lead = raw.length - raw.trimStart().length;
    cells.push({ text: raw.trim(), col: start + lead + 1 });
    start += raw.length + 1;
  }
  return cells;
}

/** Reads the header line into column names, or reports unknown, duplicate and missing columns. */
export function readHeader(
  line: string,
  lineNo: number,
  at: (line: number, col: number) => Diagnostic["at"],
  errors: Diagnostic[],
): { names: Column[] } | undefined {
  const cells = splitCells(line);
  if (cells.length === 1 && /[;\t]/.test(line)) {
    errors.push(error(
      at(lineNo, 1),
      "weather-header",
      `The header "${line.trim()}" has one column: columns are separated by commas`,
      `write the header as ${WEATHER_COLUMNS.slice(0, 4).join(",")}`,
    ));
    return undefined;
  }
  const names: Column[] = [];
  for (const cell of cells) {
    const known = (WEATHER_COLUMNS as readonly string[]).includes(cell.text);
    if (!known) {
      errors.push(error(
        at(lineNo, cell.col),
        "weather-unknown-column",
        `Unknown column "${cell.text}" in the weather file; allowed columns: ${LIST}`,
      ));
    } else if (names.includes(cell.text as Column)) {
      errors.push(
        error(at(lineNo, cell.col), "weather-duplicate-column", `Column "${cell.text}" appears twice`),
      );
    } else names.push(cell.text as Column);
  }
  for (const required of REQUIRED_WEATHER_COLUMNS) {
    if (!names.includes(required)) {
      errors.push(error(
        at(lineNo, 1),
        "weather-missing-column",
        `Missing column "${required}" in the weather file header`,
        `the header needs ${REQUIRED_WEATHER_COLUMNS.join(", ")} (direct-normal is optional), in any order`,
      ));
    }
  }
  return { names };
}

/** The time the next row should have, so that one bad row does not make the next look like a gap. */
export function advance(previousS: number | undefined, timestepS: number): number | undefined {
  return previousS === undefined ? undefined : previousS + timestepS;
}

/** Describes a row time that does not follow the previous one by exactly one step, or undefined when it does. */
export function stepProblem(previousS: number, seconds: number, timestepS: number): string | undefined {
  const expectedS = previousS + timestepS;
  if (seconds === expectedS) return undefined;
  const t = formatLocalTime(localTimeAt(seconds));
  const expected = `expected ${formatLocalTime(localTimeAt(expectedS))}`;
  const step = formatDurationS(timestepS);
  if (seconds === previousS) return `Time ${t} repeats the previous row; ${expected} (step ${step})`;
  if (seconds < previousS) {
    return `Time ${t} goes back from the previous row ${
      formatLocalTime(localTimeAt(previousS))
    }; ${expected} (step ${step})`;
  }
  const missing = (seconds - previousS) / timestepS - 1;
  if (Number.isInteger(missing)) {
    return `Time ${t} leaves a gap of ${missing} row${missing === 1 ? "" : "s"}; ${expected} (step ${step})`;
  }
  return `Time ${t} is ${
    formatDurationS(seconds - previousS)
  } after the previous row; ${expected} (the scenario's time step is ${step})`;
}
