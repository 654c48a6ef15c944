/**
 * Text the results hold as sentences (notes, check descriptions, assumptions, open items) reaches the page in
 * the package's one number format: a machine-written number with more than three significant figures or in
 * exponent notation (`0.20889695019725435`, `3.73e-5`) is printed to three significant figures with `× 10ⁿ`,
 * and in an IP package a number followed by an SI unit is converted to the display unit. Coefficients of a
 * formula written in the text (`610.5·exp(17.269θ/(237.3+θ))`) are kept as written: they are not results, and
 * a sentence stating a formula keeps its SI units (the formula's θ is in °C).
 */
import {
  DELTA_F_PER_K,
  type DisplayUnits,
  type QuantityKind,
  SI_DISPLAY,
  toDisplay,
  unitLabel,
} from "./displayUnits.ts";
import { formatSig, MINUS } from "./format.ts";

/** Significant figures of a number printed from text (the package's rule, ISSUE 11 item 9). */
const DIGITS = 3;

/** SI unit labels as the results write them, longest first, with the quantity each measures. */
const SI_TEXT_UNITS: readonly (readonly [string, QuantityKind | "heatLossCoefficient" | "pressure"])[] = [
  ["W/(m²·K)", "transmittance"],
  ["W/(m²K)", "transmittance"],
  ["W/(m² K)", "transmittance"],
  ["m²·K/W", "resistance"],
  ["m² K/W", "resistance"],
  ["W/(m·K)", "conductivity"],
  ["W/(m K)", "conductivity"],
  ["kJ/(m²·K)", "arealHeatCapacity"],
  ["J/(kg·K)", "specificHeat"],
  ["kg/m³", "density"],
  ["kWh/m²", "irradiation"],
  ["kWh", "energy"],
  ["W/m²", "heatFlux"],
  ["W/K", "heatLossCoefficient"],
  ["°C", "temperature"],
  ["Pa", "pressure"],
  ["mm", "thickness"],
  ["W", "heatGain"],
  ["K", "temperatureDifference"],
];

/** A number as the results write it: optional minus, digits, decimals, exponent. */
const NUMBER = /(?<![\w.\u2212-])([\u2212-]?)(\d+(?:\.\d+)?)(e[-+]?\d+)?(?![\w.]*\d)/g;

function significantDigits(digits: string): number {
  return digits.replace(".", "").replace(/^0+/, "").length;
}

/** Whether the number at `start..end` is a coefficient of a formula: `610.5·exp`, `17.269θ`, `(237.3+θ)`. */
function inFormula(text: string, start: number, end: number): boolean {
  const after = text.slice(end, end + 2);
  if (/^[·θ(]/.test(after) || /^[A-Za-zα-ω]/.test(after)) return true;
  return text[start - 1] === "(" && /^[+]/.test(after);
}

function unitAt(
  text: string,
  end: number,
): { readonly label: string; readonly kind: string; readonly to: number } | undefined {
  const space = /^[ \u2009\u00a0]?/.exec(text.slice(end))?.[0] ?? "";
  const rest = text.slice(end + space.length);
  for (const [label, kind] of SI_TEXT_UNITS) {
    if (!rest.startsWith(label)) continue;
    const next = rest[label.length] ?? "";
    if (/[\w²³/·(]/.test(next)) continue;
    return { label, kind, to: end + space.length + label.length };
  }
  return undefined;
}

/** SI amount of results.json per unit as the text writes it, where the two differ (mm, kJ, kWh). */
const TEXT_UNIT_IN_SI: Partial<Record<QuantityKind, number>> = {
  thickness: 1e-3,
  arealHeatCapacity: 1e3,
  energy: 3.6e6,
  irradiation: 3.6e6,
};

/** Inches of mercury (conventional) in pascals: 1 inHg = 3386.389 Pa (NIST SP 811, Appendix B). */
export const PA_PER_IN_HG = 3386.389;

/** The display value and label of an SI value of `kind`, as IP shows it. */
function converted(display: DisplayUnits, kind: string, si: number, label: string): [number, string] {
  if (display.system === "SI") return [si, label];
  if (kind === "pressure") return [si / PA_PER_IN_HG, "in. Hg"];
  if (kind === "heatLossCoefficient") {
    return [toDisplay(display, "heatGain", si) / DELTA_F_PER_K, "Btu/(h·°F)"];
  }
  const q = kind as QuantityKind;
  return [toDisplay(display, q, si * (TEXT_UNIT_IN_SI[q] ?? 1)), unitLabel(display, q)];
}

/**
 * `text` with every machine-written number in the package's format (three significant figures, `× 10ⁿ`)
 * and, in IP, every number with an SI unit converted to the display unit. Integers of three figures or fewer,
 * and numbers of three significant figures or fewer, are kept as written in SI.
 */
export function quotedNumbers(text: string, display: DisplayUnits = SI_DISPLAY): string {
  const matches = [...text.matchAll(NUMBER)];
  // A sentence that states a formula states it in SI: its bounds and units stay with it.
  const convert = display.system === "IP" &&
    !matches.some((m) => inFormula(text, m.index, m.index + m[0].length));
  let out = "";
  let last = 0;
  for (const m of matches) {
    const start = m.index;
    const end = start + m[0].length;
    if (start < last || inFormula(text, start, end)) continue;
    const [, sign = "", digits = "", exponent = ""] = m;
    const value = Number(`${sign === "" ? "" : "-"}${digits}${exponent}`);
    const unit = unitAt(text, end);
    if (unit !== undefined && convert) {
      const [shown, label] = converted(display, unit.kind, value, unit.label);
      out += text.slice(last, start) + `${formatSig(shown, DIGITS)} ${label}`;
      last = unit.to;
      continue;
    }
    const long = exponent !== "" || (digits.includes(".") && significantDigits(digits) > DIGITS);
    if (!long) continue;
    out += text.slice(last, start) + formatSig(value, DIGITS);
    last = end;
  }
  return (out + text.slice(last)).replaceAll(`${MINUS}${MINUS}`, MINUS);
}
