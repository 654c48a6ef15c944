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
const NUMBER = /^[+-]?(\d+(\.\d*)?|\.\d+)([eE][+-]?\d+)?$/;
const NUMBER_HINT =
  "write a plain number with a '.' decimal point, e.g. 21.5 (no unit, no thousands separator)";

/** Plausible dry bulb, °C: just beyond the recorded extremes −89.2 °C (Vostok, 1983) and 56.7 °C (Death Valley, 1913) (from memory). */
export const DRY_BULB_RANGE_C = { min: -90, max: 60 } as const;
/** Largest irradiance accepted, W/m² (our stated limit: the top-of-atmosphere normal value is 1367 × (1 ± 0.033)). */
export const MAX_IRRADIANCE_W_PER_M2 = 1400;
/** Negative irradiance down to this magnitude is instrument night offset, set to 0 with a warning, W/m² (common practice, no source). */
export const NEGATIVE_IRRADIANCE_TOLERANCE_W_PER_M2 = 10;

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

/**
 * Reads a comment line (`#` first) before the header. `# synthetic: <how the data were made>` marks the file as
 * invented data (`# synthetic: true` marks it without a note; `# synthetic: false` does not mark it); any other
 * comment is free text. A comment that starts with the word synthetic but lacks the colon is an error, so a marker
 * meant to warn the reader is never silently dropped.
 */
export function readComment(
  line: string,
  lineNo: number,
  at: (line: number, col: number) => Diagnostic["at"],
  errors: Diagnostic[],
): { note: string; line: number } | undefined {
  const text = line.trim().slice(1).trim();
  const marker = /^synthetic\b/i.exec(text);
  if (marker === null) return undefined;
  const rest = text.slice(marker[0].length).trimStart();
  if (marker[0] !== "synthetic" || !rest.startsWith(":")) {
    errors.push(error(
      at(lineNo, line.indexOf("#") + 1),
      "weather-synthetic-comment",
      `Cannot read the comment "${line.trim()}" as a synthetic-data marker`,
      "write the first line as # synthetic: <how the data were made>, lower case with a colon",
    ));
    return undefined;
  }
  const note = rest.slice(1).trim();
  if (note === "false") return undefined;
  return { note: note === "true" ? "" : note, line: lineNo };
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

/**
 * Reads one value cell as a strict number ('.' decimal, optional exponent) and checks its plausible range; returns
 * undefined after reporting an error, and `clipped` when a small negative irradiance was set to 0.
 */
export function readValueCell(
  name: Exclude<Column, "time">,
  text: string,
  place: Diagnostic["at"],
  errors: Diagnostic[],
): { value: number; clipped: boolean } | undefined {
  if (text === "") {
    errors.push(error(place, "weather-number", `Missing value in column ${name}`, NUMBER_HINT));
    return undefined;
  }
  if (!NUMBER.test(text)) {
    errors.push(
      error(place, "weather-number", `Cannot read "${text}" in column ${name} as a number`, NUMBER_HINT),
    );
    return undefined;
  }
  const value = Number(text);
  let problem: string | undefined;
  let hint: string | undefined;
  if (name === "dry-bulb") {
    if (value < DRY_BULB_RANGE_C.min || value > DRY_BULB_RANGE_C.max) {
      problem =
        `dry-bulb ${text} °C is outside the plausible range ${DRY_BULB_RANGE_C.min}…${DRY_BULB_RANGE_C.max} °C`;
      hint = "the column is °C (not °F or K)";
    }
  } else if (value > MAX_IRRADIANCE_W_PER_M2) {
    problem = `${name} ${text} W/m² is above the plausible limit of ${MAX_IRRADIANCE_W_PER_M2} W/m²`;
    hint = "irradiance is in W/m², the mean over the step (not Wh/m² or kJ/m² totals)";
  } else if (value < -NEGATIVE_IRRADIANCE_TOLERANCE_W_PER_M2) {
    problem = `${name} ${text} W/m² is negative`;
  } else if (value < 0) {
    return { value: 0, clipped: true };
  }
  if (problem !== undefined) {
    errors.push(error(place, "weather-range", problem, hint));
    return undefined;
  }
  return { value, clipped: false };
}
