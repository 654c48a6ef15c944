/**
 * The CSV files of an output set as tables, and the one writer that turns a table into text.
 *
 * Every CSV a build writes is a `CsvTable`: a header and rows of numbers, text or empty cells. The engine builds
 * tables (the weather-year rows a block at a time); `csvChunks` writes them with one rule for every file:
 *
 * - column names: `[<subject>:]<quantity>_<unit>`, the subject (a surface id) before a colon, the quantity in
 *   snake case, the unit last in ASCII (`CSV_UNITS`); text columns (ids, names, time stamps, verdicts) have no
 *   unit, and a verdict column ends in `_verdict` and holds `pass` or `fail`;
 * - numbers rounded to `CSV_SIGNIFICANT_DIGITS` significant figures, written as plain decimals without trailing
 *   zeros (never an exponent, so every spreadsheet locale reads them); no value → an empty cell;
 * - RFC 4180 quoting (a cell holding the separator, a quote or a line break is quoted, quotes doubled), text a
 *   spreadsheet would run as a formula guarded by an apostrophe, LF line ends;
 * - the locale (`CSV_LOCALES`): separator and decimal mark.
 *
 * CSV is derived output for spreadsheets: the exact numbers are in results.json.
 */

import { significantText } from "./significantText.ts";

/** One cell: a number (rounded on writing), text, or `null` for an empty cell. */
export type CsvValue = number | string | null;

/** One CSV file of the output set, as a table. */
export interface CsvTable {
  /** Path inside the output folder, `csv/<name>.csv`. */
  readonly path: string;
  /** A first comment line `# <comment>` above the column names (the synthetic-weather stamp). */
  readonly comment?: string;
  readonly header: readonly string[];
  /** The rows, produced on demand so that a large table is never held whole. */
  rows(): Iterable<readonly CsvValue[]>;
}

/** Significant figures of every number in a CSV file (results.json keeps the full doubles). */
export const CSV_SIGNIFICANT_DIGITS = 6;

/**
 * The units of column names, ASCII: `_` stands for "per", `2` for "squared". A dimensionless quantity has the
 * unit `1` (SI Brochure, 9th edition, 2019, section 2.3.3: the unit of a quantity of dimension one is the number
 * one).
 */
export const CSV_UNITS = {
  degC: "°C",
  K: "K",
  h: "h",
  m2: "m²",
  W: "W",
  W_m2: "W/m²",
  W_m2K: "W/(m²·K)",
  W_K: "W/K",
  m2K_W: "m²·K/W",
  kJ_m2K: "kJ/(m²·K)",
  kWh: "kWh",
  "1": "1 (dimensionless)",
} as const;

export type CsvUnit = keyof typeof CSV_UNITS;

/** A CSV dialect for spreadsheets set to a locale: field separator and decimal mark. */
export interface CsvLocale {
  readonly separator: "," | ";";
  readonly decimal: "." | ",";
  /** A UTF-8 byte-order mark first, so that a spreadsheet opening the file reads non-ASCII names as UTF-8. */
  readonly byteOrderMark: boolean;
}

/**
 * `build --csv-locale` values: `comma-point` (the default: comma-separated, decimal point, no byte-order mark)
 * and `semicolon-comma` (semicolon-separated, decimal comma, UTF-8 byte-order mark) for spreadsheets set to a
 * locale that writes decimal commas.
 */
export const CSV_LOCALES = {
  "comma-point": { separator: ",", decimal: ".", byteOrderMark: false },
  "semicolon-comma": { separator: ";", decimal: ",", byteOrderMark: true },
} as const satisfies Record<string, CsvLocale>;

export type CsvLocaleName = keyof typeof CSV_LOCALES;

export const DEFAULT_CSV_LOCALE: CsvLocaleName = "comma-point";

/** The `--csv-locale` values, default first. */
export const CSV_LOCALE_NAMES = Object.keys(CSV_LOCALES) as readonly CsvLocaleName[];

/**
 * A number rounded to `CSV_SIGNIFICANT_DIGITS` significant figures, as the shortest plain decimal text (never an
 * exponent, never "-0"); "" when not finite.
 */
export function csvNumber(value: number, decimal: "." | "," = "."): string {
  if (!Number.isFinite(value)) return "";
  const text = significantText(value, CSV_SIGNIFICANT_DIGITS);
  return decimal === "." ? text : text.replace(".", decimal);
}

/** Characters that start a formula in a spreadsheet, ASCII and full width (U+FF1D ＝, U+FF0B ＋, U+FF0D －, U+FF20 ＠). */
const FORMULA_START = "=+\\-@\uFF1D\uFF0B\uFF0D\uFF20";
/** A formula start at the beginning of the cell, after any spaces (`\s` includes NBSP and the Unicode spaces). */
const LEADING_FORMULA = new RegExp(`^[\\s]*[${FORMULA_START}]|^[\\t\\r]`);
/**
 * A formula start after a separator a spreadsheet may split on (`;`, tab, CR, LF) and any spaces: opened
 * with `;` or tab as the separator, `x;=1+1` is two cells, the second a formula.
 */
const SPLIT_FORMULA = new RegExp(`([;\\t\\r\\n][\\s]*)(?=[${FORMULA_START}])`, "g");

/**
 * One written cell. Numbers are rounded (`csvNumber`). A text cell that a spreadsheet would read as a formula —
 * at its start, or after a `;`, tab or line break it may split on — gets an apostrophe before each such part
 * (OWASP "CSV Injection" guidance); a cell holding `,`, `;`, a quote, a tab or a line break is quoted
 * (RFC 4180, section 2, rules 6 and 7; both separators, so either dialect reads it as one cell).
 */
export function csvCell(value: CsvValue, locale: CsvLocale = CSV_LOCALES[DEFAULT_CSV_LOCALE]): string {
  if (value === null) return "";
  if (typeof value === "number") return csvNumber(value, locale.decimal);
  const split = value.replace(SPLIT_FORMULA, "$1'");
  const safe = LEADING_FORMULA.test(split) || split !== value ? `'${split}` : split;
  return /[",;\t\n\r]/.test(safe) ? `"${safe.replaceAll('"', '""')}"` : safe;
}

/** Rows per written piece of a table. */
const ROWS_PER_CHUNK = 96;

/** The text of a table in pieces of `ROWS_PER_CHUNK` rows, so that a large table never sits in memory whole. */
export function* csvChunks(table: CsvTable, locale: CsvLocale): Generator<string> {
  const line = (cells: readonly CsvValue[]) => {
    // A loop, not map/join: a weather year at scale writes some 10⁸ cells.
    let text = "";
    for (let i = 0; i < cells.length; i++) {
      const cell = cells[i]!;
      if (i > 0) text += locale.separator;
      text += typeof cell === "number" ? csvNumber(cell, locale.decimal) : csvCell(cell, locale);
    }
    return text;
  };
  const comment = table.comment === undefined ? "" : `# ${table.comment.replace(/[\r\n]+/g, " ")}\n`;
  yield `${locale.byteOrderMark ? "\uFEFF" : ""}${comment}${line(table.header)}\n`;
  const block: string[] = [];
  for (const row of table.rows()) {
    block.push(`${line(row)}\n`);
    if (block.length === ROWS_PER_CHUNK) {
      yield block.join("");
      block.length = 0;
    }
  }
  if (block.length > 0) yield block.join("");
}

/** The whole text of a table (small tables and tests). */
export function csvText(table: CsvTable, locale: CsvLocale = CSV_LOCALES[DEFAULT_CSV_LOCALE]): string {
  return [...csvChunks(table, locale)].join("");
}

/** A table of rows already in memory. */
export function csvTable(
  path: string,
  header: readonly string[],
  rows: readonly (readonly CsvValue[])[],
): CsvTable {
  return { path, header, rows: () => rows };
}

/** `pass` or `fail`, the words of every verdict column. */
export function verdictCell(pass: boolean): "pass" | "fail" {
  return pass ? "pass" : "fail";
}
