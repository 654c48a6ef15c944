/**
 * Reader for the weather CSV of a `weather` scenario (DESIGN.md §2): a header of column names, then one row per time
 * step with `time` (local standard time), `dry-bulb` (°C at `time`), `global-horizontal` and `diffuse-horizontal`
 * (W/m², mean over the interval ending at `time`) and optional `direct-normal`. Strict: every problem is an error
 * naming its line and column.
 */
import { type Diagnostic, error, warning } from "../project/diagnostic.ts";
import { civilFromDays, type LocalTime, localTimeAt, parseLocalTime, secondsOf } from "./weatherTime.ts";
import {
  advance,
  type Column,
  DRY_BULB_RANGE_C,
  MAX_IRRADIANCE_W_PER_M2,
  NEGATIVE_IRRADIANCE_TOLERANCE_W_PER_M2,
  readComment,
  readHeader,
  readValueCell,
  REQUIRED_WEATHER_COLUMNS,
  splitCells,
  stepProblem,
  WEATHER_COLUMNS,
} from "./weatherCsvSyntax.ts";

export {
  DRY_BULB_RANGE_C,
  MAX_IRRADIANCE_W_PER_M2,
  NEGATIVE_IRRADIANCE_TOLERANCE_W_PER_M2,
  REQUIRED_WEATHER_COLUMNS,
  WEATHER_COLUMNS,
};

/** A series of numbers, one per step. */
export type StepSeries = Float64Array | readonly number[];

/** A validated weather series at a constant step; row k is at `startTime` + k·Δ. */
export interface WeatherSeries {
  /** Time of the first row, local standard time. */
  readonly startTime: LocalTime;
  /** Δ, s */
  readonly timestepS: number;
  readonly count: number;
  /** Dry bulb at each row time, °C. */
  readonly dryBulbC: StepSeries;
  /** Mean over the interval ending at each row time, W/m². */
  readonly globalHorizontalWPerM2: StepSeries;
  readonly diffuseHorizontalWPerM2: StepSeries;
  readonly directNormalWPerM2?: StepSeries;
  /** Month (1…12) of the interval that ends at each row time, i.e. of time − Δ/2. */
  readonly monthOfStep: Uint8Array;
}

/** Result of reading a weather CSV: the series (with any warnings) or the errors. */
export type WeatherParseResult =
  | { ok: true; weather: WeatherSeries; diagnostics: Diagnostic[]; synthetic?: SyntheticMark }
  | { ok: false; diagnostics: Diagnostic[] };

/** A leading comment `# synthetic: <how the data were made>` of the weather file, with its line. */
export interface SyntheticMark {
  readonly note: string;
  readonly line: number;
}

/** Diffuse may exceed global by this much (separately rounded values), W/m² (our stated rule). */
export const DIFFUSE_EXCESS_TOLERANCE_W_PER_M2 = 5;
/** Errors collected before reading stops. */
export const MAX_WEATHER_ERRORS = 20;

type ValueColumn = Exclude<Column, "time">;

/** Reads a weather CSV whose header is at `firstLine` of `path`, for a scenario with time step `timestepS`. */
export function parseWeatherCsv(
  text: string,
  path: string,
  firstLine: number,
  timestepS: number,
): WeatherParseResult {
  const errors: Diagnostic[] = [];
  const warnings: Diagnostic[] = [];
  const at = (line: number, col: number) => ({ file: path, line, col });
  const full = () => errors.length >= MAX_WEATHER_ERRORS;
  const fail = (): WeatherParseResult => ({ ok: false, diagnostics: errors });
  const body = text.startsWith("\uFEFF") ? text.slice(1) : text;
  // Lines are visited in place (no array of every line) and values go straight into typed arrays sized by the line
  // count, so a 64 MiB file costs a few bytes per value, not a string and a boxed number per cell.
  const lines = lineCursor(body);
  let lineNo = firstLine - 1;
  let headerLine: string | undefined;
  let synthetic: SyntheticMark | undefined;
  while (headerLine === undefined) {
    const line = lines.next();
    if (line === undefined) break;
    lineNo++;
    if (line.trimStart().startsWith("#")) {
      const comment = readComment(line, lineNo, at, errors);
      if (comment !== undefined) synthetic ??= comment;
    } else if (line.trim() !== "") headerLine = line;
  }
  if (errors.length > 0) return fail();
  if (headerLine === undefined) {
    errors.push(
      error(
        at(firstLine, 1),
        "weather-empty",
        `The weather file is empty: expected a header line such as ${REQUIRED_WEATHER_COLUMNS.join(",")}`,
      ),
    );
    return fail();
  }
  const header = readHeader(headerLine, lineNo, at, errors);
  if (!(timestepS > 0 && timestepS % 60 === 0)) {
    errors.push(error(
      at(lineNo, 1),
      "weather-timestep",
      `The scenario time step ${timestepS} s is not a whole number of minutes, but weather times are HH:MM`,
    ));
  }
  if (header === undefined || errors.length > 0) return fail();
  const capacity = lines.remaining();
  const columns = header.names.map((name) => (name === "time" ? undefined : new Float64Array(capacity)));
  const timeColumn = header.names.indexOf("time");
  const diffuseColumn = header.names.indexOf("diffuse-horizontal");
  const globalColumn = header.names.indexOf("global-horizontal");
  const times = new Float64Array(capacity);
  const monthOfStep = new Uint8Array(capacity);
  const row = new Float64Array(header.names.length);
  let rows = 0;
  let count = 0;
  let negatives = 0;
  let firstNegative = "";
  let previous: number | undefined;
  for (let line = lines.next(); line !== undefined && !full(); line = lines.next()) {
    lineNo++;
    if (line.trim() === "") continue;
    const cells = splitCells(line);
    const timeCell = cells[timeColumn];
    const parsedTime = timeCell === undefined ? undefined : parseLocalTime(timeCell.text);
    if (cells.length !== header.names.length) {
      const more = cells.length > header.names.length;
      errors.push(error(
        at(lineNo, 1),
        "weather-row-length",
        `Expected ${header.names.length} values (${header.names.join(", ")}), found ${cells.length}`,
        more
          ? "a decimal comma (21,5) or a thousands separator (1,020) splits a number in two: write 21.5 or 1020"
          : "every row needs a value in every column",
      ));
      previous = parsedTime?.ok === true ? secondsOf(parsedTime.time) : advance(previous, timestepS);
      continue;
    }
    if (parsedTime === undefined || !parsedTime.ok) {
      errors.push(error(
        at(lineNo, timeCell?.col ?? 1),
        "weather-time",
        `Cannot read time "${timeCell?.text ?? ""}": ${
          parsedTime?.ok === false ? parsedTime.reason : "missing"
        }`,
        "write local standard time as YYYY-MM-DDTHH:MM, e.g. 2031-07-21T14:00",
      ));
      previous = advance(previous, timestepS);
    } else {
      const seconds = secondsOf(parsedTime.time);
      const problem = previous === undefined ? undefined : stepProblem(previous, seconds, timestepS);
      if (problem !== undefined) {
        errors.push(error(at(lineNo, timeCell!.col), "weather-step", problem));
      }
      previous = seconds;
      if (count < capacity) {
        times[count] = seconds;
        monthOfStep[count] = civilFromDays(Math.floor((seconds - timestepS / 2) / 86400)).month;
      }
      count++;
    }
    row.fill(NaN);
    for (const [c, name] of header.names.entries()) {
      if (name === "time" || full()) continue;
      const cell = cells[c]!;
      const read = readValueCell(name, cell.text, at(lineNo, cell.col), errors);
      if (read === undefined) continue;
      if (read.clipped && negatives++ === 0) firstNegative = `line ${lineNo}, ${name} ${cell.text}`;
      row[c] = read.value;
    }
    const global = row[globalColumn]!;
    const diffuse = row[diffuseColumn]!;
    if (diffuse > global + DIFFUSE_EXCESS_TOLERANCE_W_PER_M2) {
      errors.push(error(
        at(lineNo, cells[diffuseColumn]!.col),
        "weather-range",
        `diffuse-horizontal ${diffuse} W/m² exceeds global-horizontal ${global} W/m² by more than ${DIFFUSE_EXCESS_TOLERANCE_W_PER_M2} W/m²`,
        "diffuse is part of global: check that the two columns are not swapped",
      ));
    }
    if (rows < capacity) {
      for (const [c, column] of columns.entries()) if (column !== undefined) column[rows] = row[c]!;
    }
    rows++;
  }
  if (full()) {
    const last = errors[errors.length - 1]!.at.line;
    errors.push({
      severity: "note",
      at: at(last, 1),
      rule: "weather-too-many-errors",
      message: `Stopped reading the weather file after ${MAX_WEATHER_ERRORS} errors`,
    });
  }
  if (errors.length === 0 && count === 0) {
    errors.push(error(at(firstLine, 1), "weather-empty", "The weather file has a header but no data rows"));
  }
  if (errors.length > 0) return fail();
  if (negatives > 0) {
    warnings.push(warning(
      at(firstLine, 1),
      "weather-negative-irradiance",
      `${negatives} small negative irradiance value${
        negatives === 1 ? "" : "s"
      } (down to −${NEGATIVE_IRRADIANCE_TOLERANCE_W_PER_M2} W/m²) set to 0; the first at ${firstNegative}`,
    ));
  }
  const exact = <T extends Float64Array | Uint8Array>(array: T): T =>
    (array.length === count ? array : array.slice(0, count)) as T;
  const series = (name: ValueColumn) => {
    const column = columns[header.names.indexOf(name)];
    return column === undefined ? new Float64Array(0) : exact(column);
  };
  const weather: WeatherSeries = {
    startTime: localTimeAt(times[0]!),
    timestepS,
    count,
    dryBulbC: series("dry-bulb"),
    globalHorizontalWPerM2: series("global-horizontal"),
    diffuseHorizontalWPerM2: series("diffuse-horizontal"),
    ...(header.names.includes("direct-normal") ? { directNormalWPerM2: series("direct-normal") } : {}),
    monthOfStep: exact(monthOfStep),
  };
  return { ok: true, weather, diagnostics: warnings, ...(synthetic === undefined ? {} : { synthetic }) };
}

/** Visits the lines of a text one at a time (LF or CRLF ends), and counts the lines not yet visited. */
function lineCursor(text: string): { next(): string | undefined; remaining(): number } {
  let position = 0;
  return {
    next() {
      if (position > text.length) return undefined;
      let end = text.indexOf("\n", position);
      if (end < 0) end = text.length;
      const line = text.slice(position, end > position && text[end - 1] === "\r" ? end - 1 : end);
      position = end + 1;
      return line;
    },
    remaining() {
      if (position > text.length) return 0;
      let lines = 1;
      for (let i = text.indexOf("\n", position); i >= 0; i = text.indexOf("\n", i + 1)) lines++;
      return lines;
    },
  };
}
