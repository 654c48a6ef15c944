/**
 * The units the package displays, chosen once from the project's `units:` (SI or IP). Values arrive in SI as
 * results.json holds them; only the printed number and its label change. Every factor is built from exact
 * definitions, and a temperature difference is never converted as an absolute temperature.
 */
import type { ProjectInfo } from "../../project/model.ts";
import { formatFixed, formatTrim } from "./format.ts";
import { escapeHtml, html, raw, type Trusted } from "./html.ts";

/** The unit system of the display, as written in the front matter. */
export type UnitSystem = ProjectInfo["units"];

/** Metres in one foot, exactly (international yard and pound agreement, 1959). */
export const M_PER_FT = 0.3048;
/** Metres in one inch, exactly (international yard and pound agreement, 1959). */
export const M_PER_IN = 0.0254;
/** Kilograms in one pound, exactly (international yard and pound agreement, 1959). */
export const KG_PER_LB = 0.45359237;
/** Joules in one International Table Btu, exactly (NIST SP 811, Appendix B). */
export const J_PER_BTU = 1055.05585262;
/** Seconds in one hour. */
export const S_PER_H = 3600;
/** Degrees Fahrenheit (difference) in one kelvin (difference), exactly: 1 °F = 5/9 K. */
export const DELTA_F_PER_K = 1.8;
/** Offset of the Fahrenheit scale at 0 °C, exactly. */
export const F_AT_0_C = 32;
/** Joules in one kilowatt-hour, exactly (3600 s × 1000 W). */
const J_PER_KWH = 3.6e6;

const FT2 = M_PER_FT * M_PER_FT;
const FT3 = FT2 * M_PER_FT;
const W_PER_BTU_H = J_PER_BTU / S_PER_H;

/** Kinds of quantity the package prints; each has one display unit per system. */
export type QuantityKind =
  | "thickness"
  | "length"
  | "area"
  | "conductivity"
  | "density"
  | "specificHeat"
  | "resistance"
  | "transmittance"
  | "arealHeatCapacity"
  | "temperature"
  | "temperatureDifference"
  | "heatFlux"
  | "irradiance"
  | "heatGain"
  | "energy"
  | "irradiation"
  | "time"
  | "angle";

/** A display unit: its printed label and the conversion from the SI value of results.json. */
export interface DisplayUnit {
  readonly label: string;
  readonly fromSI: (si: number) => number;
}

/**
 * SI amount (in the results.json unit of the kind) in one IP display unit, built from the exact definitions:
 * results.json holds J/(m²·K) for areal heat capacity, J for energy and J/m² for irradiation.
 */
export const SI_PER_IP_UNIT: Readonly<Record<Exclude<QuantityKind, "temperature">, number>> = {
  thickness: M_PER_IN,
  length: M_PER_FT,
  area: FT2,
  conductivity: (W_PER_BTU_H * M_PER_IN / FT2) * DELTA_F_PER_K,
  density: KG_PER_LB / FT3,
  specificHeat: (J_PER_BTU / KG_PER_LB) * DELTA_F_PER_K,
  resistance: 1 / ((W_PER_BTU_H / FT2) * DELTA_F_PER_K),
  transmittance: (W_PER_BTU_H / FT2) * DELTA_F_PER_K,
  arealHeatCapacity: (J_PER_BTU / FT2) * DELTA_F_PER_K,
  temperatureDifference: 1 / DELTA_F_PER_K,
  heatFlux: W_PER_BTU_H / FT2,
  irradiance: W_PER_BTU_H / FT2,
  heatGain: W_PER_BTU_H,
  energy: 1000 * J_PER_BTU,
  irradiation: (1000 * J_PER_BTU) / FT2,
  time: 1,
  angle: 1,
};

const same = (si: number) => si;

/** The SI display: the units the package has always printed (mm, kJ/(m²·K) and kWh are scaled from SI). */
const SI_UNITS: Readonly<Record<QuantityKind, DisplayUnit>> = {
  thickness: { label: "mm", fromSI: (m) => m * 1000 },
  length: { label: "m", fromSI: same },
  area: { label: "m²", fromSI: same },
  conductivity: { label: "W/(m·K)", fromSI: same },
  density: { label: "kg/m³", fromSI: same },
  specificHeat: { label: "J/(kg·K)", fromSI: same },
  resistance: { label: "m²·K/W", fromSI: same },
  transmittance: { label: "W/(m²·K)", fromSI: same },
  arealHeatCapacity: { label: "kJ/(m²·K)", fromSI: (j) => j / 1000 },
  temperature: { label: "°C", fromSI: same },
  temperatureDifference: { label: "K", fromSI: same },
  heatFlux: { label: "W/m²", fromSI: same },
  irradiance: { label: "W/m²", fromSI: same },
  heatGain: { label: "W", fromSI: same },
  energy: { label: "kWh", fromSI: (j) => j / J_PER_KWH },
  irradiation: { label: "kWh/m²", fromSI: (j) => j / J_PER_KWH },
  time: { label: "h", fromSI: same },
  angle: { label: "°", fromSI: same },
};

const IP_LABELS: Readonly<Record<Exclude<QuantityKind, "temperature">, string>> = {
  thickness: "in",
  length: "ft",
  area: "ft²",
  conductivity: "Btu·in/(h·ft²·°F)",
  density: "lb/ft³",
  specificHeat: "Btu/(lb·°F)",
  resistance: "h·ft²·°F/Btu",
  transmittance: "Btu/(h·ft²·°F)",
  arealHeatCapacity: "Btu/(ft²·°F)",
  temperatureDifference: "Δ°F",
  heatFlux: "Btu/(h·ft²)",
  irradiance: "Btu/(h·ft²)",
  heatGain: "Btu/h",
  energy: "kBtu",
  irradiation: "kBtu/ft²",
  time: "h",
  angle: "°",
};

function ipUnits(): Record<QuantityKind, DisplayUnit> {
  const out = {
    temperature: { label: "°F", fromSI: (c: number) => c * DELTA_F_PER_K + F_AT_0_C },
  } as Record<QuantityKind, DisplayUnit>;
  for (const [kind, label] of Object.entries(IP_LABELS) as [Exclude<QuantityKind, "temperature">, string][]) {
    const factor = SI_PER_IP_UNIT[kind];
    out[kind] = { label, fromSI: factor === 1 ? same : (si: number) => si / factor };
  }
  return out;
}

/** The display units of one rendering: the system and, per quantity kind, a label and a conversion. */
export interface DisplayUnits {
  readonly system: UnitSystem;
  readonly units: Readonly<Record<QuantityKind, DisplayUnit>>;
}

/** The SI display, which prints exactly what the package printed before display units existed. */
export const SI_DISPLAY: DisplayUnits = { system: "SI", units: SI_UNITS };
/** The inch-pound display (International Table Btu, °F). */
export const IP_DISPLAY: DisplayUnits = { system: "IP", units: ipUnits() };

/** The display units for the project's `units:` value. */
export function displayUnitsFor(system: UnitSystem): DisplayUnits {
  return system === "IP" ? IP_DISPLAY : SI_DISPLAY;
}

/** The printed label of a quantity kind's display unit, e.g. `W/(m²·K)` or `Btu/(h·ft²·°F)`. */
export function unitLabel(display: DisplayUnits, kind: QuantityKind): string {
  return display.units[kind].label;
}

/** Converts an SI value (as results.json holds it) to the display unit of its kind. */
export function toDisplay(display: DisplayUnits, kind: QuantityKind, si: number): number {
  return display.units[kind].fromSI(si);
}

/**
 * The SI value in parentheses after a converted key result (` (0.170 W/(m²·K))`), marked with the class
 * `si-equivalent`, on a line of its own when `ownLine` (narrow table cells); nothing when the display is SI.
 */
export function siEquivalent(
  display: DisplayUnits,
  kind: QuantityKind,
  si: number,
  format: (value: number) => string,
  ownLine = false,
): Trusted {
  if (display.system === "SI") return html``;
  const text = `(${format(SI_DISPLAY.units[kind].fromSI(si))} ${SI_DISPLAY.units[kind].label})`;
  return ownLine
    ? html`<br><span class="si-equivalent muted">${text}</span>`
    : html`<span class="si-equivalent muted"> ${text}</span>`;
}

/** A surface coefficient h (W/(m²·K) in SI) in the display units, three significant figures, with its unit. */
export function filmCoefficientText(display: DisplayUnits, wPerM2K: number): string {
  return `${formatTrim(toDisplay(display, "transmittance", wPerM2K), 3)} ${
    unitLabel(display, "transmittance")
  }`;
}

/**
 * A layer thickness (metres in SI) as the package prints it: in SI millimetres to 0.1 mm, as layers are
 * specified (a 102.5 mm brick leaf, a 12.5 mm board); in IP inches to three significant figures (7.09 in).
 */
export function formatThickness(display: DisplayUnits, metres: number): string {
  return thicknessFigure(display, toDisplay(display, "thickness", metres));
}

/** A thickness already in the display unit (mm or in), printed as {@link formatThickness} prints it. */
export function thicknessFigure(display: DisplayUnits, shown: number): string {
  if (display.system === "IP") return formatTrim(shown, 3);
  return formatFixed(shown, 1).replace(/\.0$/, "");
}

/**
 * The unit of a table column under its symbol: `<span class="unit">` on a line of its own, with a break
 * opportunity after each "/" so that a long IP unit (Btu·in/(h·ft²·°F)) wraps inside a narrow column.
 */
export function unitHead(display: DisplayUnits, kind: QuantityKind): Trusted {
  return html`<span class="unit">${unitBreakable(display, kind)}</span>`;
}

/** A unit label with a break opportunity after each "/" (`Btu/<wbr>(h·ft²·°F)`), for narrow table heads. */
export function unitBreakable(display: DisplayUnits, kind: QuantityKind): Trusted {
  return raw(escapeHtml(unitLabel(display, kind)).replaceAll("/", "/<wbr>"));
}
