/**
 * The room's quantities in the package's display units: the kinds of `displayUnits.ts` (temperatures, loads,
 * areas, U) plus the few only a room prints (volume, air flow, H, ψ, χ, ρc), built from the same exact
 * definitions so that an IP package converts every printed number.
 */
import {
  DELTA_F_PER_K,
  type DisplayUnits,
  J_PER_BTU,
  M_PER_FT,
  type QuantityKind,
  S_PER_H,
  toDisplay,
  unitLabel,
} from "../page/displayUnits.ts";
import { formatFixed, formatSig, THIN_SPACE, withUnit } from "../page/format.ts";
import { escapeHtml, html, raw, type Trusted } from "../page/html.ts";

const FT3 = M_PER_FT * M_PER_FT * M_PER_FT;
const W_PER_BTU_H = J_PER_BTU / S_PER_H;

/** Quantities printed only by the room output. */
export type RoomQuantityKind =
  | "volume"
  | "airFlow"
  | "heatLossCoefficient"
  | "linearTransmittance"
  | "volumetricHeatCapacity";

interface RoomUnit {
  readonly si: string;
  /** SI display value per results.json SI value. */
  readonly siScale: number;
  readonly ip: string;
  /** results.json SI amount in one IP unit. */
  readonly siPerIp: number;
}

const ROOM_UNITS: Readonly<Record<RoomQuantityKind, RoomUnit>> = {
  volume: { si: "m³", siScale: 1, ip: "ft³", siPerIp: FT3 },
  // results.json holds m³/s; SI prints l/s, IP ft³/min (cfm).
  airFlow: { si: "l/s", siScale: 1000, ip: "cfm", siPerIp: FT3 / 60 },
  heatLossCoefficient: { si: "W/K", siScale: 1, ip: "Btu/(h·°F)", siPerIp: W_PER_BTU_H * DELTA_F_PER_K },
  linearTransmittance: {
    si: "W/(m·K)",
    siScale: 1,
    ip: "Btu/(h·ft·°F)",
    siPerIp: (W_PER_BTU_H / M_PER_FT) * DELTA_F_PER_K,
  },
  volumetricHeatCapacity: {
    si: "J/(m³·K)",
    siScale: 1,
    ip: "Btu/(ft³·°F)",
    siPerIp: (J_PER_BTU / FT3) * DELTA_F_PER_K,
  },
};

/** Any quantity the room prints: a package-wide kind or a room-only one. */
export type AnyKind = QuantityKind | RoomQuantityKind;

function isRoomKind(kind: AnyKind): kind is RoomQuantityKind {
  return Object.hasOwn(ROOM_UNITS, kind);
}

/** The display value of an SI value of `kind`. */
export function shown(d: DisplayUnits, kind: AnyKind, si: number): number {
  if (!isRoomKind(kind)) return toDisplay(d, kind, si);
  const u = ROOM_UNITS[kind];
  return d.system === "SI" ? si * u.siScale : si / u.siPerIp;
}

/** The display unit label of `kind`. */
export function label(d: DisplayUnits, kind: AnyKind): string {
  if (!isRoomKind(kind)) return unitLabel(d, kind);
  return d.system === "SI" ? ROOM_UNITS[kind].si : ROOM_UNITS[kind].ip;
}

/** Three significant figures in the display unit, without the unit. */
export function sig(d: DisplayUnits, kind: AnyKind, si: number, digits = 3): string {
  return formatSig(shown(d, kind, si), digits);
}

/** Three significant figures in the display unit, with the unit. */
export function sigU(d: DisplayUnits, kind: AnyKind, si: number, digits = 3): string {
  return withUnit(sig(d, kind, si, digits), label(d, kind));
}

/** A heat flow rate in whole display units (W or Btu/h), as a table a reviewer adds by hand prints it. */
export function whole(d: DisplayUnits, si: number): string {
  return formatFixed(shown(d, "heatGain", si), 0);
}

/** A temperature to 0.1 in the display unit, with its unit. */
export function temperature(d: DisplayUnits, c: number): string {
  return withUnit(formatFixed(shown(d, "temperature", c), 1), label(d, "temperature"));
}

/** A temperature to 0.1 in the display unit, without its unit. */
export function temperatureFigure(d: DisplayUnits, c: number): string {
  return formatFixed(shown(d, "temperature", c), 1);
}

/** The display kind of a unit as results.json writes it in a heat loss line's quantities; undefined = no unit. */
export function kindOfUnit(unit: string): AnyKind | undefined {
  switch (unit.replaceAll(" ", "·").replaceAll(THIN_SPACE, "·")) {
    case "W/(m²·K)":
      return "transmittance";
    case "m²":
      return "area";
    case "m":
      return "length";
    case "W/(m·K)":
      return "linearTransmittance";
    case "W/K":
      return "heatLossCoefficient";
    case "J/(m³·K)":
      return "volumetricHeatCapacity";
    case "m³/s":
      return "airFlow";
    case "m³":
      return "volume";
    default:
      return undefined;
  }
}

/** The unit of a table column under its symbol, breakable after each "/" (as `unitHead` of displayUnits.ts). */
export function unitHeadOf(d: DisplayUnits, kind: AnyKind): Trusted {
  return html`<span class="unit">${raw(escapeHtml(label(d, kind)).replaceAll("/", "/<wbr>"))}</span>`;
}
