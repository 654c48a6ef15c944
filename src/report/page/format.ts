/** Locale-independent number formatting for the package: fixed significant digits, "−" minus sign. */

/** U+2212 MINUS SIGN, used instead of the hyphen in printed numbers. */
export const MINUS = "\u2212";
/** U+2009 THIN SPACE, between a number and its unit. */
export const THIN_SPACE = "\u2009";

const SUPERSCRIPT: Readonly<Record<string, string>> = {
  "0": "⁰",
  "1": "¹",
  "2": "²",
  "3": "³",
  "4": "⁴",
  "5": "⁵",
  "6": "⁶",
  "7": "⁷",
  "8": "⁸",
  "9": "⁹",
  "-": "⁻",
};

function nonFinite(value: number): string | undefined {
  if (Number.isNaN(value)) return "NaN";
  if (value === Infinity) return "∞";
  if (value === -Infinity) return `${MINUS}∞`;
  return undefined;
}

function signed(text: string, negative: boolean): string {
  return negative ? MINUS + text : text;
}

/** Decimal exponent of a finite non-zero number, robust to floating-point error in log10. */
function decimalExponent(abs: number): number {
  let e = Math.floor(Math.log10(abs));
  if (10 ** e > abs) e -= 1;
  if (10 ** (e + 1) <= abs) e += 1;
  return e;
}

function scientific(abs: number, digits: number): string {
  const [mantissa = "", exponent = "0"] = abs.toExponential(digits - 1).split("e");
  const power = String(Number(exponent)).split("").map((c) => SUPERSCRIPT[c] ?? c).join("");
  return `${mantissa}${THIN_SPACE}×${THIN_SPACE}10${power}`;
}

/**
 * Formats a number to `digits` significant digits, keeping trailing zeros (`0.30` for 0.3 at 2);
 * magnitudes below 1e-4 or from 1e9 up use `×10ⁿ` notation.
 */
export function formatSig(value: number, digits = 3): string {
  const special = nonFinite(value);
  if (special !== undefined) return special;
  if (!Number.isInteger(digits) || digits < 1 || digits > 15) {
    throw new RangeError(`Cannot format with ${digits} significant digits: expected 1 to 15`);
  }
  if (value === 0) return digits > 1 ? `0.${"0".repeat(digits - 1)}` : "0";
  const negative = value < 0;
  const rounded = Number(Math.abs(value).toPrecision(digits));
  if (rounded < 1e-4 || rounded >= 1e9) return signed(scientific(rounded, digits), negative);
  const decimals = Math.max(0, digits - 1 - decimalExponent(rounded));
  return signed(rounded.toFixed(decimals), negative);
}

/** Formats a number to at most `maxDigits` significant digits without trailing zeros (`10` not `10.0`). */
export function formatTrim(value: number, maxDigits = 4): string {
  const text = formatSig(value, maxDigits);
  if (text.includes("×") || !text.includes(".")) return text === `${MINUS}0` ? "0" : text;
  const trimmed = text.replace(/0+$/, "").replace(/\.$/, "");
  return trimmed === `${MINUS}0` ? "0" : trimmed;
}

/** Formats a number with a fixed count of decimals (`formatFixed(0.125, 2)` → `0.13` by toFixed). */
export function formatFixed(value: number, decimals: number): string {
  const special = nonFinite(value);
  if (special !== undefined) return special;
  const text = Math.abs(value).toFixed(decimals);
  const isZero = Number(text) === 0;
  return signed(text, value < 0 && !isZero);
}

/** Joins a formatted number and its unit with a thin space: `0.30 W/(m²·K)`. */
export function withUnit(formatted: string, unit: string): string {
  return unit === "" ? formatted : `${formatted}${THIN_SPACE}${unit}`;
}
