/**
 * What a weather scenario covers, stated and checked: a file of exactly one calendar year is a weather year; any
 * other span is an error unless the scenario says `period: <n> days` and the file covers exactly that. The coverage
 * then labels the results (`scenarios.<id>.period`) so nothing calls a 10-day period a year.
 */
import type { WeatherSeries } from "../climate/weatherCsv.ts";
import { describeSpan, formatSpan, type WeatherSpan, weatherSpan } from "../climate/weatherSpan.ts";
import { formatDurationS } from "../climate/weatherTime.ts";
import { type Diagnostic, error } from "../project/diagnostic.ts";
import type { Scenario } from "../project/model.ts";

type WeatherScenario = Extract<Scenario, { kind: "weather" }>;

/** `scenarios.<id>.period` in results.json: a whole year, or the stated period, with the file's first and last rows. */
export interface PeriodJson {
  readonly kind: "year" | "period";
  /** rows × Δ in days (may be fractional for a period given in hours) */
  readonly days: number;
  readonly first: string;
  readonly last: string;
}

/** The checked coverage of a weather scenario. */
export interface WeatherCoverage {
  readonly kind: "year" | "period";
  readonly span: WeatherSpan;
  /** "year", or e.g. "period of 10 days": the words every label uses. */
  readonly label: string;
  readonly json: PeriodJson;
}

/** States what the file covers and checks it against the scenario's `period`, or returns the error. */
export function weatherCoverage(
  scenario: WeatherScenario,
  weather: WeatherSeries,
): { ok: true; coverage: WeatherCoverage } | { ok: false; diagnostic: Diagnostic } {
  const span = weatherSpan(weather.startTime, weather.count, weather.timestepS);
  const covers = `covers ${describeSpan(span.spanS)}, ${span.first} … ${span.last}, ${span.rows} row${
    span.rows === 1 ? "" : "s"
  } at ${formatDurationS(span.timestepS)}`;
  const period = scenario.period;
  if (period === undefined) {
    if (!span.isYear) {
      return {
        ok: false,
        diagnostic: error(
          scenario.weatherAt,
          "weather-not-a-year",
          `Give a whole year of weather or state the period: "${scenario.weatherPath}" ${covers}`,
          `add \`period: ${
            formatSpan(span.spanS)
          }\` to the scenario if this repeating period is meant; a year is 8760 h (8784 h across 29 February) of rows ending one year after the first interval begins`,
        ),
      };
    }
    return { ok: true, coverage: coverageOf("year", span) };
  }
  if (period.seconds !== span.spanS) {
    return {
      ok: false,
      diagnostic: error(
        period.at,
        "weather-period-mismatch",
        `Period ${
          describeSpan(period.seconds)
        } does not match the weather file: "${scenario.weatherPath}" ${covers}`,
        `write \`period: ${formatSpan(span.spanS)}\`, or check that the file holds every row of the period`,
      ),
    };
  }
  return { ok: true, coverage: coverageOf("period", span) };
}

/** The coverage of a series given without one (direct engine use): a year when it is one, else its own period. */
export function impliedCoverage(weather: WeatherSeries): WeatherCoverage {
  const span = weatherSpan(weather.startTime, weather.count, weather.timestepS);
  return coverageOf(span.isYear ? "year" : "period", span);
}

/** Notes for results.json: none for a year; for a period, what it covers and what the monthly totals then mean. */
export function coverageNotes(coverage: WeatherCoverage): string[] {
  const { span } = coverage;
  if (coverage.kind === "year") return [];
  return [
    `Weather period, not a year: the file covers a ${coverage.label}, ${span.first} … ${span.last}, ${span.rows} ` +
    "rows, as the scenario's `period` states; totals, peaks and the warm-up are over this period, repeated.",
    "Monthly totals hold the steps of the period that fall in each calendar month (0 for months it does not " +
    "cover); they are not monthly figures of a year.",
  ];
}

function coverageOf(kind: "year" | "period", span: WeatherSpan): WeatherCoverage {
  const days = span.spanS / 86400;
  return {
    kind,
    span,
    label: kind === "year" ? "year" : `period of ${formatSpan(span.spanS)}`,
    json: { kind, days, first: span.first, last: span.last },
  };
}
