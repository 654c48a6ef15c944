/**
 * A number rounded to p significant figures as the shortest plain decimal (never an exponent), the same text as
 * `Number.prototype.toPrecision(p)` (ECMA-262, §21.1.3.5) written out without its exponent and trailing zeros.
 * A CSV of response factors writes thousands of numbers per construction, so the common case is one exact
 * scaling and one rounding; `toPrecision` itself decides every case the fast route cannot prove (a value within
 * roundoff of a rounding tie, out of the exact-power range, or at a power-of-ten boundary).
 */

/** 10^0 … 10^22, each a double without rounding (parsed from text, which rounds correctly). */
const EXACT_POWERS: readonly number[] = Array.from({ length: 23 }, (_, k) => Number(`1e${k}`));

/** Counts of the route taken, for tests (how often the exact fallback ran). */
export interface SignificantTextCounter {
  fallback: number;
}

/** `toPrecision` text without the zeros it pads a fraction with (and without a bare point). */
export function trimZeros(text: string): string {
  if (!text.includes(".")) return text;
  let end = text.length;
  while (text.charCodeAt(end - 1) === 48) end--;
  if (text.charCodeAt(end - 1) === 46) end--;
  return text.slice(0, end);
}

/** Exponent text `-d.ddddde±n` as a plain decimal: `0.000…ddd` or `ddd000…` (string steps, no pattern). */
function plainDecimal(text: string): string {
  const e = text.indexOf("e");
  const negative = text.charCodeAt(0) === 45;
  const sign = negative ? "-" : "";
  const mantissa = text.slice(negative ? 1 : 0, e);
  const point = mantissa.indexOf(".");
  const digits = point < 0 ? mantissa : mantissa.slice(0, point) + mantissa.slice(point + 1);
  const exponent = Number(text.slice(e + 1));
  return placed(sign, digits, exponent);
}

/** Digits d_0 d_1 … with d_0 in the 10^exponent place, as a plain decimal without trailing fraction zeros. */
function placed(sign: string, digits: string, exponent: number): string {
  if (exponent < 0) return trimZeros(`${sign}0.${"0".repeat(-exponent - 1)}${digits}`);
  const whole = digits.padEnd(exponent + 1, "0");
  // trimZeros drops a bare point, so a whole number gets no fraction.
  return `${sign}${whole.slice(0, exponent + 1)}${trimZeros(`.${whole.slice(exponent + 1)}`)}`;
}

/** Enough zeros for any exponent of a double (|exponent| ≤ 324). */
const ZEROS = "0".repeat(330);

/** The digits of a whole number `n` (leading digit in the 10^exponent place) as a plain decimal, zeros trimmed. */
function placedDigits(sign: string, n: number, exponent: number): string {
  while (n % 10 === 0) n /= 10;
  return placedText(sign, String(n), exponent);
}

/** The text by `toPrecision` itself (every case; the reference of the fast route). */
export function significantTextByToPrecision(value: number, p: number): string {
  const rounded = value.toPrecision(p);
  const text = rounded.includes("e") ? plainDecimal(rounded) : trimZeros(rounded);
  return text === "-0" ? "0" : text;
}

/** Texts of 0 … 999: plain, padded to three digits, and both without trailing zeros (built on first use). */
interface DigitTables {
  readonly plain: readonly string[];
  readonly padded: readonly string[];
  readonly trimmed: readonly string[];
  readonly paddedTrimmed: readonly string[];
}
let tables: DigitTables | undefined;

function digitTables(): DigitTables {
  const plain: string[] = [], padded: string[] = [], trimmed: string[] = [], paddedTrimmed: string[] = [];
  const strip = (text: string) => text.replace(/0+$/, "");
  for (let k = 0; k < 1000; k++) {
    const text = String(k);
    plain.push(text);
    padded.push(text.padStart(3, "0"));
    trimmed.push(strip(text));
    paddedTrimmed.push(strip(text.padStart(3, "0")));
  }
  return { plain, padded, trimmed, paddedTrimmed };
}

/**
 * The digits of a whole number 0 < n < 10⁶ without its trailing zeros, from the tables: the same text as
 * `String(n)` with trailing zeros removed, without a number-to-text conversion.
 */
function significantDigits(n: number, t: DigitTables): string {
  const hi = Math.floor(n / 1000);
  const lo = n - 1000 * hi;
  if (hi === 0) return t.trimmed[lo]!;
  return lo === 0 ? t.trimmed[hi]! : t.plain[hi]! + t.paddedTrimmed[lo]!;
}

/** `digits` (no trailing zeros, leading digit in the 10^exponent place) as a plain decimal. */
function placedText(sign: string, digits: string, exponent: number): string {
  if (exponent < 0) return `${sign}0.${ZEROS.slice(0, -exponent - 1)}${digits}`;
  const integerDigits = exponent + 1;
  if (integerDigits >= digits.length) {
    return `${sign}${digits}${ZEROS.slice(0, integerDigits - digits.length)}`;
  }
  return `${sign}${digits.slice(0, integerDigits)}.${digits.slice(integerDigits)}`;
}

/**
 * `value` (finite) to `p` significant figures (1 ≤ p ≤ 15) as a plain decimal; "-0" is written "0". A whole
 * number of at most p digits (below 10⁶) is its own text. Otherwise the scaled value s = |value|·10^k
 * (k = p − 1 − exponent, 10^|k| exact) carries at most half an ulp of error, s·2^−53; unless its fraction lies
 * within s·1e−15 of one half, rounding it gives the digits `toPrecision` gives.
 */
export function significantText(value: number, p: number, counter?: SignificantTextCounter): string {
  if (value === 0) return "0";
  const size = Math.abs(value);
  if (size < 1e6 && size < EXACT_POWERS[p]! && Number.isInteger(size)) {
    const t = tables ??= digitTables();
    const hi = Math.floor(size / 1000);
    const lo = size - 1000 * hi;
    const digits = hi === 0 ? t.plain[lo]! : t.plain[hi]! + t.padded[lo]!;
    return value < 0 ? `-${digits}` : digits;
  }
  const exponent = Math.floor(Math.log10(size));
  const k = p - 1 - exponent;
  if (k <= 22 && k >= -22) {
    const s = k >= 0 ? size * EXACT_POWERS[k]! : size / EXACT_POWERS[-k]!;
    const whole = Math.floor(s);
    const fraction = s - whole;
    const n = fraction > 0.5 ? whole + 1 : whole;
    if (Math.abs(fraction - 0.5) > s * 1e-15 && n >= EXACT_POWERS[p - 1]! && n < EXACT_POWERS[p]!) {
      const sign = value < 0 ? "-" : "";
      if (n < 1e6) return placedText(sign, significantDigits(n, tables ??= digitTables()), exponent);
      return placedDigits(sign, n, exponent);
    }
  }
  if (counter !== undefined) counter.fallback++;
  return significantTextByToPrecision(value, p);
}
