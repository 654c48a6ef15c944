// mathjs's own single-file build (same package and version as the lockfile pins): it loads in about a quarter
// of the time of the module tree behind "mathjs", which `check` and `build` wait for at start-up (README,
// "Start-up"). Only `unit` is used.
import mathjsBundle from "mathjs/lib/browser/math.js";
import type { unit as unitType } from "mathjs";

const unit: typeof unitType = mathjsBundle.unit;

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
