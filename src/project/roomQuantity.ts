/**
 * Quantities of the `room` block that the shared unit table (quantity.ts) has no kind for: heat flow rates, volumes,
 * air flow rates, air change rates and the linear and point thermal transmittances of thermal bridges. Each kind
 * lists the units it accepts with their exact factor to SI, so no unit library is needed; the number is read by
 * the same rules as every other quantity (decimal point, no thousands separators, a unit required).
 */
import type { Diagnostic } from "./diagnostic.ts";
import { type Fields, missing, scalarQuantityOf } from "./fields.ts";
import { describeCodePoints, splitQuantity } from "./quantity.ts";
import type { YamlValue } from "./yamlTree.ts";

/** The international foot, m (exact). */
const FOOT = 0.3048;
/** The international table British thermal unit per hour, W (1 Btu_IT = 1055.05585262 J, exact). */
const BTU_PER_HOUR = 1055.05585262 / 3600;
/** One degree Fahrenheit as a temperature difference, K (exact). */
const DEG_F = 5 / 9;

interface RoomKindSpec {
  readonly label: string;
  readonly example: string;
  /** Accepted unit spellings (spaces around `/`, `(`, `)` and `*` ignored) and their factor to the stored unit. */
  readonly units: Readonly<Record<string, number>>;
  /** The unit the value is stored in. */
  readonly stored: string;
}

/** The room's own quantity kinds; each value is stored in the unit `stored` names (SI, or 1/h for air changes). */
export const ROOM_QUANTITY_KINDS = {
  power: {
    label: "a heat flow rate",
    example: "3000 W",
    stored: "W",
    units: { "W": 1, "kW": 1000, "BTU/h": BTU_PER_HOUR },
  },
  volume: {
    label: "a volume",
    example: "420 m^3",
    stored: "m^3",
    units: { "m^3": 1, "L": 1e-3, "l": 1e-3, "ft^3": FOOT ** 3 },
  },
  airFlow: {
    label: "an air flow rate",
    example: "400 l/s",
    stored: "m^3/s",
    units: {
      "l/s": 1e-3,
      "L/s": 1e-3,
      "m^3/s": 1,
      "m^3/h": 1 / 3600,
      "ft^3/min": FOOT ** 3 / 60,
      "cfm": FOOT ** 3 / 60,
    },
  },
  airChangeRate: {
    label: "an air change rate",
    example: "0.5 1/h",
    stored: "1/h",
    units: { "1/h": 1, "h^-1": 1, "ach": 1 },
  },
  linearTransmittance: {
    label: "a linear thermal transmittance",
    example: "0.06 W/(m K)",
    stored: "W/(m K)",
    units: { "W/(m K)": 1, "W/(m*K)": 1, "BTU/(h ft degF)": BTU_PER_HOUR / (FOOT * DEG_F) },
  },
  pointTransmittance: {
    label: "a point thermal transmittance",
    example: "0.01 W/K",
    stored: "W/K",
    units: { "W/K": 1, "BTU/(h degF)": BTU_PER_HOUR / DEG_F },
  },
} as const satisfies Record<string, RoomKindSpec>;

export type RoomQuantityKind = keyof typeof ROOM_QUANTITY_KINDS;

export type RoomQuantityResult =
  | { readonly ok: true; readonly value: number }
  | { readonly ok: false; readonly message: string; readonly hint: string };

/** A unit spelling without the spaces that do not change it: `W/(m K)` and `W / (m K)` read alike. */
function unitKey(unit: string): string {
  return unit.trim().replace(/\s+/g, " ").replace(/ ?([/()*]) ?/g, "$1");
}

/** Parses `"<number> <unit>"` of a room quantity kind into its stored unit. */
export function parseRoomQuantity(text: string, kind: RoomQuantityKind): RoomQuantityResult {
  const spec: RoomKindSpec = ROOM_QUANTITY_KINDS[kind];
  const fail = (message: string, hint: string): RoomQuantityResult => ({ ok: false, message, hint });
  const accepted = Object.keys(spec.units);
  const split = splitQuantity(text, spec, accepted[0]!);
  if (!split.ok) return split;
  const { number, unitText } = split;
  const factor = Object.entries(spec.units).find(([unit]) => unitKey(unit) === unitKey(unitText))?.[1];
  if (factor === undefined) {
    return fail(
      `Cannot read the unit "${describeCodePoints(unitText)}" of ${spec.label}`,
      `write one of the units ${accepted.join(", ")}, e.g. "${spec.example}"`,
    );
  }
  return { ok: true, value: number * factor };
}

/** Converts a scalar room quantity, reporting lists, maps, bare numbers and unknown units at the value. */
export function roomQuantityOf(
  value: YamlValue,
  kind: RoomQuantityKind,
  what: string,
  out: Diagnostic[],
): number | undefined {
  return scalarQuantityOf(
    value,
    ROOM_QUANTITY_KINDS[kind],
    what,
    out,
    (text) => parseRoomQuantity(text, kind),
  );
}

/** Reads a room quantity under `key` (reporting it missing when required). */
export function readRoomQuantity(
  fields: Fields,
  key: string,
  kind: RoomQuantityKind,
  out: Diagnostic[],
  required = false,
): number | undefined {
  const entry = fields.entries.get(key);
  if (entry === undefined) {
    return required ? missing(fields, key, ROOM_QUANTITY_KINDS[kind].example, out) : undefined;
  }
  return roomQuantityOf(entry.value, kind, `"${key}" in the ${fields.what}`, out);
}
