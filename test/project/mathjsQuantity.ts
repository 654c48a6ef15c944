// The parseQuantity that read units with mathjs (src/project/quantity.ts before our own unit reader), kept
// as the reference the new reader is checked against in unitReader_test.ts. mathjs 15.2.0 is the reference
// library; the text checks before the unit are the same code as before.
import { unit } from "mathjs";
import {
  describeCodePoints,
  type NaturalUnit,
  NON_DECIMAL_NUMBER,
  QUANTITY_KINDS,
  type QuantityKind,
  type QuantityResult,
} from "../../src/project/quantity.ts";

const NUMBER = /^[+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?/;
const UNIT_CHARS = /^[A-Za-z0-9^/()*. -]+$/;
const SPOOF_CHARS = /[\u200B-\u200F\u202A-\u202E\u2060-\u2069\uFEFF]/;
const LARGEST_MAGNITUDE = 1e12;

/**
 * Parses a quantity written as `"<number> <unit>"` and converts it to the SI unit of its kind.
 * Numbers use `.` as decimal mark, no thousands separators; the unit is required.
 */
export function mathjsParseQuantity(text: string, kind: QuantityKind, natural?: NaturalUnit): QuantityResult {
  const spec = natural === undefined ? QUANTITY_KINDS[kind] : { ...QUANTITY_KINDS[kind], ...natural };
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
      `write the unit, e.g. "${numberText} ${natural?.unit ?? exampleUnit(kind)}"`,
    );
  }
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
  try {
    const parsed = unit(`${numberText} ${unitText}`);
    const reference = unit(spec.si);
    if (!parsed.equalBase(reference)) {
      return fail(
        `Wrong kind of unit in "${trimmed}": expected ${spec.label} (e.g. "${spec.example}"), found a unit of another dimension`,
        `write ${spec.label} such as "${spec.example}"`,
      );
    }
    const value = parsed.toNumber(spec.si);
    if (!Number.isFinite(value)) {
      return fail(
        `Cannot read ${spec.label} "${trimmed}": the value is not finite`,
        `write e.g. "${spec.example}"`,
      );
    }
    return { ok: true, value };
  } catch (cause) {
    const reason = cause instanceof Error ? cause.message.replace(/\.$/, "") : "not understood";
    return fail(
      `Cannot read the unit "${unitText}" of ${spec.label}: ${reason}`,
      `write e.g. "${spec.example}"`,
    );
  }
}

function exampleUnit(kind: QuantityKind): string {
  return kind === "length" ? "mm" : QUANTITY_KINDS[kind].si;
}

function fail(message: string, hint: string): QuantityResult {
  return { ok: false, message, hint };
}
