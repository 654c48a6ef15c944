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
  | { ok: true; weather: WeatherSeries; diagnostics: Diagnostic[] }
  | { ok: false; diagnostics: Diagnostic[] };

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
  const lines = (text.startsWith("\uFEFF") ? text.slice(1) : text).split(/\r?\n/);
  let index = lines.findIndex((l) => l.trim() !== "");
  if (index < 0) {
    errors.push(
      error(
        at(firstLine, 1),
        "weather-empty",
        `The weather file is empty: expected a header line such as ${REQUIRED_WEATHER_COLUMNS.join(",")}`,
      ),
    );
    return fail();
  }
  const header = readHeader(lines[index]!, firstLine + index, at, errors);
  if (!(timestepS > 0 && timestepS % 60 === 0)) {
    errors.push(error(
      at(firstLine + index, 1),
      "weather-timestep",
      `The scenario time step ${timestepS} s is not a whole number of minutes, but weather times are HH:MM`,
    ));
  }
  if (header === undefined || errors.length > 0) return fail();
  const values = new Map<ValueColumn, number[]>();
  for (const name of header.names) if (name !== "time") values.set(name, []);
  const times: number[] = [];
  let negatives = 0;
  let firstNegative = "";
  let previous: number | undefined;
  for (index++; index < lines.length && !full(); index++) {
    const line = lines[index]!;
    if (line.trim() === "") continue;
    const lineNo = firstLine + index;
    const cells = splitCells(line);
    const timeCell = cells[header.names.indexOf("time")];
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
      times.push(seconds);
    }
    const row = new Map<ValueColumn, number>();
    for (const [c, name] of header.names.entries()) {
      if (name === "time" || full()) continue;
      const cell = cells[c]!;
      const read = readValueCell(name, cell.text, at(lineNo, cell.col), errors);
      if (read === undefined) continue;
      if (read.clipped && negatives++ === 0) firstNegative = `line ${lineNo}, ${name} ${cell.text}`;
      row.set(name, read.value);
    }
    const global = row.get("global-horizontal");
    const diffuse = row.get("diffuse-horizontal");
    if (
      global !== undefined && diffuse !== undefined && diffuse > global + DIFFUSE_EXCESS_TOLERANCE_W_PER_M2
    ) {
      errors.push(error(
        at(lineNo, cells[header.names.indexOf("diffuse-horizontal")]!.col),
        "weather-range",
        `diffuse-horizontal ${diffuse} W/m² exceeds global-horizontal ${global} W/m² by more than ${DIFFUSE_EXCESS_TOLERANCE_W_PER_M2} W/m²`,
        "diffuse is part of global: check that the two columns are not swapped",
      ));
    }
    for (const [name, list] of values) list.push(row.get(name) ?? NaN);
  }
  if (full()) {
    const lineNo = errors[errors.length - 1]!.at.line;
    errors.push({
      severity: "note",
      at: at(lineNo, 1),
      rule: "weather-too-many-errors",
      message: `Stopped reading the weather file after ${MAX_WEATHER_ERRORS} errors`,
    });
  }
  if (errors.length === 0 && times.length === 0) {
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
  const series = (name: ValueColumn) => Float64Array.from(values.get(name) ?? []);
  const weather: WeatherSeries = {
    startTime: localTimeAt(times[0]!),
    timestepS,
    count: times.length,
    dryBulbC: series("dry-bulb"),
    globalHorizontalWPerM2: series("global-horizontal"),
    diffuseHorizontalWPerM2: series("diffuse-horizontal"),
    ...(values.has("direct-normal") ? { directNormalWPerM2: series("direct-normal") } : {}),
    monthOfStep: Uint8Array.from(times, (s) => civilFromDays(Math.floor((s - timestepS / 2) / 86400)).month),
  };
  return { ok: true, weather, diagnostics: warnings };
}
