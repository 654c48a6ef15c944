/** Reads the parts of a `room` block beyond its surfaces: gains, ventilation, thermal bridges and the ground. */
import { type Diagnostic, error, errorCount } from "./diagnostic.ts";
import { type Fields, readFields, readNumber, readQuantity, readText } from "./fields.ts";
import {
  readHourlyFractions,
  readItems,
  readMetres,
  requireNonNegative,
  requirePositive,
  valueAt,
} from "./roomFields.ts";
import type { PointBridge, RoomGain, RoomGround, RoomVentilation, ThermalBridge } from "./roomModel.ts";
import { readRoomQuantity } from "./roomQuantity.ts";
import type { YamlValue } from "./yamlTree.ts";

export const ROOM_GAIN_KEYS = ["name", "sensible", "radiant-fraction", "latent", "schedule"] as const;
export const ROOM_VENTILATION_KEYS = ["outdoor-air", "air-changes"] as const;
export const THERMAL_BRIDGE_KEYS = ["name", "psi", "length", "source"] as const;
/** `point-bridges` is fluxnote's extension. */
export const POINT_BRIDGE_KEYS = ["name", "chi", "count", "source"] as const;
/** `wall-thickness` is fluxnote's extension (ISO 13370's w). */
export const ROOM_GROUND_KEYS = [
  "soil-conductivity",
  "temperature",
  "annual-mean-outdoor",
  "wall-thickness",
] as const;

/** The room's internal gains, in block order. */
export function readGains(fields: Fields, out: Diagnostic[]): RoomGain[] {
  return readItems(
    fields,
    "gains",
    "{ name: occupants, sensible: 3000 W, radiant-fraction: 0.6 }",
    out,
    (item, index) => readGain(item, index, out),
  );
}

function readGain(item: YamlValue, index: number, out: Diagnostic[]): RoomGain | undefined {
  const gain = readFields(item, ROOM_GAIN_KEYS, `gain ${index + 1}`, out);
  if (gain === undefined) return undefined;
  const before = errorCount(out);
  const name = readText(gain, "name", out, { example: "occupants" });
  const sensibleW = readRoomQuantity(gain, "sensible", "power", out, true);
  requireNonNegative(
    gain,
    "sensible",
    sensibleW,
    "W",
    "give the peak sensible gain, e.g. `sensible: 3000 W`",
    out,
  );
  const radiantFraction = readNumber(gain, "radiant-fraction", 0, 1, out);
  if (!gain.entries.has("radiant-fraction")) {
    out.push(
      error(
        gain.at,
        "missing-key",
        `Missing required key "radiant-fraction" in the ${gain.what}`,
        "add the radiant share of the sensible gain, e.g. `radiant-fraction: 0.6` (its source in the prose)",
      ),
    );
  }
  const latentW = readRoomQuantity(gain, "latent", "power", out);
  requireNonNegative(gain, "latent", latentW, "W", "give the peak latent gain, e.g. `latent: 1500 W`", out);
  const schedule = readHourlyFractions(gain, "schedule", out);
  if (
    errorCount(out) > before || name === undefined || sensibleW === undefined || radiantFraction === undefined
  ) return undefined;
  return {
    name,
    sensibleW,
    radiantFraction,
    at: gain.at,
    ...(latentW === undefined ? {} : { latentW }),
    ...(schedule === undefined ? {} : { schedule }),
  };
}

/** `{ outdoor-air: <flow> }` or `{ air-changes: <n> 1/h }`, exactly one of the two. */
export function readVentilation(fields: Fields, out: Diagnostic[]): RoomVentilation | undefined {
  const entry = fields.entries.get("ventilation");
  if (entry === undefined) return undefined;
  const ventilation = readFields(entry.value, ROOM_VENTILATION_KEYS, "ventilation", out);
  if (ventilation === undefined) return undefined;
  const hint =
    "write either `ventilation: { outdoor-air: 400 l/s }` or `ventilation: { air-changes: 0.5 1/h }`";
  const given = ROOM_VENTILATION_KEYS.filter((k) => ventilation.entries.has(k));
  if (given.length !== 1) {
    out.push(
      error(
        ventilation.at,
        given.length === 0 ? "missing-key" : "mixed-ventilation",
        given.length === 0
          ? 'Missing "outdoor-air" or "air-changes" in the ventilation'
          : 'Give either "outdoor-air" or "air-changes" in the ventilation, not both',
        hint,
      ),
    );
    return undefined;
  }
  const at = ventilation.at;
  if (given[0] === "outdoor-air") {
    const flowM3PerS = readRoomQuantity(ventilation, "outdoor-air", "airFlow", out);
    if (!requireNonNegative(ventilation, "outdoor-air", flowM3PerS, "m^3/s", hint, out)) return undefined;
    return flowM3PerS === undefined ? undefined : { kind: "outdoor-air", flowM3PerS, at };
  }
  const perHour = readRoomQuantity(ventilation, "air-changes", "airChangeRate", out);
  if (!requireNonNegative(ventilation, "air-changes", perHour, "1/h", hint, out)) return undefined;
  return perHour === undefined ? undefined : { kind: "air-changes", perHour, at };
}

/** Linear thermal bridges: ψ (may be negative, e.g. at corners measured on external dimensions) over a length. */
export function readThermalBridges(fields: Fields, out: Diagnostic[]): ThermalBridge[] {
  return readItems(
    fields,
    "thermal-bridges",
    '{ name: "wall-roof junction", psi: 0.06 W/(m K), length: 30 m, source: "…" }',
    out,
    (item, index) => {
      const bridge = readFields(item, THERMAL_BRIDGE_KEYS, `thermal bridge ${index + 1}`, out);
      if (bridge === undefined) return undefined;
      const before = errorCount(out);
      const name = readText(bridge, "name", out, { example: "wall-roof junction" });
      const psi = readRoomQuantity(bridge, "psi", "linearTransmittance", out, true);
      const lengthM = readMetres(bridge, "length", "30 m", out, true);
      requirePositive(bridge, "length", lengthM, "m", "give the junction's length, e.g. `length: 30 m`", out);
      const source = readText(bridge, "source", out);
      if (errorCount(out) > before || name === undefined || psi === undefined || lengthM === undefined) {
        return undefined;
      }
      return { name, psi, lengthM, at: bridge.at, ...(source === undefined ? {} : { source }) };
    },
  );
}

/** Point thermal bridges: χ, W/K, each counted `count` times (default 1). */
export function readPointBridges(fields: Fields, out: Diagnostic[]): PointBridge[] {
  return readItems(
    fields,
    "point-bridges",
    '{ name: "balcony bracket", chi: 0.1 W/K, count: 12, source: "…" }',
    out,
    (item, index) => {
      const bridge = readFields(item, POINT_BRIDGE_KEYS, `point bridge ${index + 1}`, out);
      if (bridge === undefined) return undefined;
      const before = errorCount(out);
      const name = readText(bridge, "name", out, { example: "balcony bracket" });
      const chi = readRoomQuantity(bridge, "chi", "pointTransmittance", out, true);
      const count = readCount(bridge, out);
      const source = readText(bridge, "source", out);
      if (errorCount(out) > before || name === undefined || chi === undefined || count === undefined) {
        return undefined;
      }
      return { name, chi, count, at: bridge.at, ...(source === undefined ? {} : { source }) };
    },
  );
}

function readCount(bridge: Fields, out: Diagnostic[]): number | undefined {
  const entry = bridge.entries.get("count");
  if (entry === undefined) return 1;
  const value = entry.value;
  if (
    value.kind === "scalar" && typeof value.value === "number" && Number.isInteger(value.value) &&
    value.value >= 1
  ) {
    return value.value;
  }
  out.push(
    error(
      valueAt(bridge, "count"),
      "expected-count",
      `Expected a whole number of 1 or more for "count" in the ${bridge.what}, found ${
        value.kind === "scalar" ? `"${value.text}"` : `a ${value.kind === "map" ? "mapping" : "list"}`
      }`,
      "write how many such points the room has, e.g. `count: 12` (a pure number)",
    ),
  );
  return undefined;
}

/** Ground parameters for ISO 13370; every key optional (the defaults are filled and logged when computing). */
export function readGround(fields: Fields, out: Diagnostic[]): RoomGround | undefined {
  const entry = fields.entries.get("ground");
  if (entry === undefined) return undefined;
  const ground = readFields(entry.value, ROOM_GROUND_KEYS, "ground", out);
  if (ground === undefined) return undefined;
  const before = errorCount(out);
  const soilConductivity = readQuantity(ground, "soil-conductivity", "conductivity", out);
  requirePositive(
    ground,
    "soil-conductivity",
    soilConductivity,
    "W/(m K)",
    "give λ_g of the soil, e.g. `soil-conductivity: 2.0 W/(m K)` (ISO 13370 Table 7)",
    out,
  );
  const temperatureC = readQuantity(ground, "temperature", "temperature", out);
  const annualMeanOutdoorC = readQuantity(ground, "annual-mean-outdoor", "temperature", out);
  const wallThicknessM = readMetres(ground, "wall-thickness", "0.4 m", out);
  requireNonNegative(
    ground,
    "wall-thickness",
    wallThicknessM,
    "m",
    "give the wall's full thickness at ground level",
    out,
  );
  if (errorCount(out) > before) return undefined;
  const present = Object.fromEntries(
    Object.entries({ soilConductivity, temperatureC, annualMeanOutdoorC, wallThicknessM }).filter(([, v]) =>
      v !== undefined
    ),
  );
  return { ...present, at: ground.at };
}
