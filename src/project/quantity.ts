import { parseUnitExpression, type UnitTerm } from "./unitExpression.ts";
import { suggestUnit } from "./unitSuggest.ts";

/** The physical kinds of quantity a project can write, each with its SI unit. */
export const QUANTITY_KINDS = {
  length: { si: "m", example: "200 mm", label: "a length" },
  conductivity: { si: "W/(m K)", example: "1.4 W/(m K)", label: "a thermal conductivity" },
  density: { si: "kg/m^3", example: "2300 kg/m^3", label: "a density" },
  specificHeat: { si: "J/(kg K)", example: "880 J/(kg K)", label: "a specific heat capacity" },
  resistance: { si: "m^2 K/W", example: "0.13 m^2 K/W", label: "a thermal resistance" },
  temperature: { si: "degC", example: "24 degC", label: "a temperature" },
  temperatureDifference: { si: "K", example: "11 K", label: "a temperature difference" },
  angle: { si: "deg", example: "90 deg", label: "an angle" },
  time: { si: "s", example: "1 h", label: "a duration" },
  area: { si: "m^2", example: "42 m^2", label: "an area" },
  coefficient: { si: "W/(m^2 K)", example: "17 W/(m^2 K)", label: "a heat transfer coefficient" },
  irradiance: { si: "W/m^2", example: "800 W/m^2", label: "an irradiance" },
} as const;

export type QuantityKind = keyof typeof QUANTITY_KINDS;

/** The unit a quantity is usually written in, when it is not the SI unit (a time zone in h, not s). */
export interface NaturalUnit {
  readonly unit: string;
  readonly example: string;
}

export type QuantityResult =
  | { readonly ok: true; readonly value: number }
  | { readonly ok: false; readonly message: string; readonly hint: string };

const NUMBER = /^[+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?/;
const UNIT_CHARS = /^[A-Za-z0-9^/()*. -]+$/;
const SPOOF_CHARS = /[\u200B-\u200F\u202A-\u202E\u2060-\u2069\uFEFF]/;
const LARGEST_MAGNITUDE = 1e12;
/** A number written with a 0x, 0o or 0b prefix (YAML core schema integers, never meant here). */
export const NON_DECIMAL_NUMBER = /^[-+]?0[xXoObB][0-9A-Fa-f.]/;

/** Shows invisible or non-ASCII code points so a user can see what was really written. */
export function describeCodePoints(text: string): string {
  return [...text].map((ch) => {
    const cp = ch.codePointAt(0) ?? 0;
    return cp < 0x20 || cp > 0x7e ? `U+${cp.toString(16).toUpperCase().padStart(4, "0")}` : ch;
  }).join("");
}

/**
 * Parses a quantity written as `"<number> <unit>"` and converts it to the SI unit of its kind.
 * Numbers use `.` as decimal mark, no thousands separators; the unit is required.
 */
export function parseQuantity(text: string, kind: QuantityKind, natural?: NaturalUnit): QuantityResult {
  const spec = natural === undefined ? QUANTITY_KINDS[kind] : { ...QUANTITY_KINDS[kind], ...natural };
  const split = splitQuantity(text, spec, natural?.unit ?? exampleUnit(kind));
  if (!split.ok) return split;
  const { trimmed, numberText, number, unitText } = split;
  if (!UNIT_CHARS.test(unitText)) {
    return fail(
      `Cannot read the unit "${
        describeCodePoints(unitText)
      }" of ${spec.label}: only plain ASCII unit names are accepted`,
      `write e.g. "${spec.example}" (degC for °C, m^2 for m²)`,
    );
  }
  if (kind === "temperatureDifference" && /deg[CF]/.test(unitText)) {
    return fail(
      `Cannot read ${spec.label} "${trimmed}": degC and degF are temperatures, not differences`,
      `write the difference in kelvin, e.g. "${numberText} K" (or degR for a Fahrenheit difference)`,
    );
  }
  const parsed = parseUnitExpression(unitText);
  if (!parsed.ok) {
    const near = parsed.unknown === undefined ? undefined : suggestUnit(parsed.unknown);
    return fail(
      `Cannot read the unit "${unitText}" of ${spec.label}: ${parsed.reason}`,
      near === undefined
        ? `write e.g. "${spec.example}"`
        : `did you mean "${near}"${
          near.includes(" ") ? " (a space between two units)" : ""
        }? write e.g. "${spec.example}"`,
    );
  }
  const target = targetOf(kind);
  if (!sameDimension(parsed.dimension, target.dimension)) {
    return fail(
      `Wrong kind of unit in "${trimmed}": expected ${spec.label} (e.g. "${spec.example}"), found a unit of another dimension`,
      `write ${spec.label} such as "${spec.example}"`,
    );
  }
  const single = isSingle(parsed.terms) ? parsed.terms[0] : undefined;
  if (kind === "temperatureDifference" && single?.entry.offset !== undefined) {
    return fail(
      `Cannot read ${spec.label} "${trimmed}": ${single.entry.name} is a temperature, not a difference`,
      `write the difference in kelvin, e.g. "${numberText} K" (or degR for a Fahrenheit difference)`,
    );
  }
  if (kind === "temperature" && single === undefined) {
    return fail(
      `Cannot read ${spec.label} "${trimmed}": a temperature is written with one unit, not a compound unit`,
      `write e.g. "${spec.example}" (degC, degF or K)`,
    );
  }
  const value = toTarget(number, parsed.terms, target.terms);
  if (!Number.isFinite(value)) {
    return fail(
      `Cannot read ${spec.label} "${trimmed}": the value is not finite`,
      `write e.g. "${spec.example}"`,
    );
  }
  return { ok: true, value };
}

type Parsed = Extract<ReturnType<typeof parseUnitExpression>, { ok: true }>;
const TARGETS = new Map<QuantityKind, Parsed>();

/** The kind's SI unit, read once. */
function targetOf(kind: QuantityKind): Parsed {
  let target = TARGETS.get(kind);
  if (target === undefined) {
    const parsed = parseUnitExpression(QUANTITY_KINDS[kind].si);
    if (!parsed.ok) throw new Error(`the SI unit of ${kind} does not read: ${parsed.reason}`);
    target = parsed;
    TARGETS.set(kind, target);
  }
  return target;
}

function sameDimension(a: readonly number[], b: readonly number[]): boolean {
  return a.every((x, i) => Math.abs(x - (b[i] ?? 0)) <= 1e-12);
}

/** One unit to the first power (a temperature scale's zero applies only then). */
function isSingle(terms: readonly UnitTerm[]): terms is readonly [UnitTerm] {
  return terms.length === 1 && Math.abs(terms[0]!.power - 1) <= 1e-15;
}

/**
 * Converts `number` written in `from` to the unit `to`, with mathjs's operations in mathjs's order (so the
 * result is the same to the last bit): to SI term by term, shift between temperature scales, from SI term by
 * term.
 */
function toTarget(number: number, from: readonly UnitTerm[], to: readonly UnitTerm[]): number {
  let value = number;
  for (const t of from) value = value * Math.pow(t.entry.factor * t.prefixFactor, t.power);
  if (isSingle(from) && isSingle(to)) {
    const [a, b] = from[0].entry.offset ?? [0, 1];
    const [c, d] = to[0].entry.offset ?? [0, 1];
    if (a / b !== c / d) value = value + (a * d - c * b) / (b * d);
  }
  for (const t of to) value = value / Math.pow(t.entry.factor * t.prefixFactor, t.power);
  return value;
}

/** A quantity's text split into its number and its unit text, or why it cannot be. */
export type QuantitySplit =
  | {
    readonly ok: true;
    readonly trimmed: string;
    readonly numberText: string;
    readonly number: number;
    readonly unitText: string;
  }
  | { readonly ok: false; readonly message: string; readonly hint: string };

/**
 * The number rules every quantity shares: no invisible characters, decimal digits only, a point as the decimal
 * mark, no thousands separators, a magnitude up to 1e12, and a unit after it (`unitHint` names one in the hint).
 */
export function splitQuantity(
  text: string,
  spec: { readonly label: string; readonly example: string },
  unitHint: string,
): QuantitySplit {
  const trimmed = text.trim();
  if (SPOOF_CHARS.test(trimmed)) {
    return fail(
      `Cannot read ${spec.label} "${
        describeCodePoints(trimmed)
      }": it contains invisible or direction-control characters`,
      `retype the value as plain text, e.g. "${spec.example}"`,
    );
  }
  if (NON_DECIMAL_NUMBER.test(trimmed)) {
    return fail(
      `Cannot read ${spec.label} "${trimmed}": only decimal numbers are accepted, not hexadecimal, octal or binary`,
      `write the number in decimal digits, e.g. "${spec.example}"`,
    );
  }
  const numberMatch = NUMBER.exec(trimmed);
  if (numberMatch === null) {
    return fail(
      `Cannot read ${spec.label} "${describeCodePoints(trimmed)}": it does not start with a number`,
      `write e.g. "${spec.example}"`,
    );
  }
  const numberText = numberMatch[0];
  const rest = trimmed.slice(numberText.length);
  if (/^,\d/.test(rest)) {
    return fail(
      `Cannot read ${spec.label} "${trimmed}": a comma is not accepted in numbers`,
      `use a point as the decimal mark and no thousands separators, e.g. "${spec.example}"`,
    );
  }
  const number = Number(numberText);
  if (!Number.isFinite(number) || Math.abs(number) > LARGEST_MAGNITUDE) {
    return fail(
      `Cannot read ${spec.label} "${trimmed}": the number is out of range`,
      `write e.g. "${spec.example}"`,
    );
  }
  const unitText = rest.trim();
  if (unitText === "") {
    return fail(
      `Missing unit in ${spec.label} "${trimmed}": a bare number is ambiguous`,
      `write the unit, e.g. "${numberText} ${unitHint}"`,
    );
  }
  // A digit group after the number ("1 000 J/(kg K)") is a thousands separator; "1/h" is a unit.
  if (/^\d+(?:\s|$)/.test(unitText)) {
    return fail(
      `Cannot read ${spec.label} "${trimmed}": a space is not accepted in numbers`,
      `write the digits together, without thousands separators, e.g. "${spec.example}"`,
    );
  }
  return { ok: true, trimmed, numberText, number, unitText };
}

function exampleUnit(kind: QuantityKind): string {
  return kind === "length" ? "mm" : QUANTITY_KINDS[kind].si;
}

function fail(
  message: string,
  hint: string,
): { readonly ok: false; readonly message: string; readonly hint: string } {
  return { ok: false, message, hint };
}
