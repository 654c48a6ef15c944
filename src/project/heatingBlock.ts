/** Reads a `scenario` block of `kind: heating`: steady winter design conditions and the surfaces to assess. */
import { readSurfaceCore, readSurfaceList } from "./surfaceList.ts";
import { type Diagnostic, error, errorCount } from "./diagnostic.ts";
import { type Fields, readFields, readId, readNumber, readQuantity } from "./fields.ts";
import type { HeatingScenario, ScenarioSurface } from "./model.ts";
import type { YamlValue } from "./yamlTree.ts";

/** Allowed keys of a heating scenario block. */
export const HEATING_SCENARIO_KEYS = [
  "id",
  "kind",
  "indoor",
  "indoor-humidity",
  "outdoor",
  "moisture-surface-resistance",
  "surfaces",
] as const;
/** Allowed keys of a surface of a heating scenario (orientation is optional and only shown). */
export const HEATING_SURFACE_KEYS = ["id", "construction", "area", "azimuth", "tilt"] as const;

/** True when a scenario block's YAML says `kind: heating` (read before the keys are checked). */
export function isHeatingBlock(value: YamlValue): boolean {
  return value.kind === "map" &&
    value.entries.some((e) => e.key === "kind" && e.value.kind === "scalar" && e.value.value === "heating");
}

/** Reads and validates a heating scenario; surface constructions are checked against the known ids. */
export function readHeatingScenario(
  value: YamlValue,
  constructionIds: readonly string[],
  out: Diagnostic[],
): HeatingScenario | undefined {
  const fields = readFields(value, HEATING_SCENARIO_KEYS, "heating scenario", out);
  if (fields === undefined) return undefined;
  const before = errorCount(out);
  const id = readId(fields, "id", out);
  const indoorC = readQuantity(fields, "indoor", "temperature", out, true);
  const outdoorC = readOutdoorDesign(fields, out);
  const humidity = readHumidity(fields, out);
  const resistance = readQuantity(fields, "moisture-surface-resistance", "resistance", out);
  if (resistance !== undefined && !(resistance > 0)) {
    out.push(
      error(
        fields.entries.get("moisture-surface-resistance")?.value.at ?? fields.at,
        "not-positive",
        "Expected a positive moisture-surface-resistance",
        "write e.g. `moisture-surface-resistance: 0.25 m^2 K/W`",
      ),
    );
  }
  if (indoorC !== undefined && outdoorC !== undefined && !(indoorC > outdoorC)) {
    out.push(
      error(
        fields.entries.get("indoor")?.value.at ?? fields.at,
        "no-heating-demand",
        `Indoor ${indoorC} °C is not above the outdoor design temperature ${outdoorC} °C`,
        "a heating design condition needs θi > θe; check both values",
      ),
    );
  }
  const surfaces = readHeatingSurfaces(fields, constructionIds, out);
  if (
    errorCount(out) > before || id === undefined || indoorC === undefined || outdoorC === undefined ||
    humidity === undefined
  ) return undefined;
  return {
    kind: "heating",
    id: id.id,
    indoorC,
    outdoorC,
    indoorRelativeHumidity: humidity,
    ...(resistance === undefined ? {} : { moistureSurfaceResistance: resistance }),
    surfaces,
    at: fields.at,
  };
}

function readOutdoorDesign(fields: Fields, out: Diagnostic[]): number | undefined {
  const entry = fields.entries.get("outdoor");
  if (entry === undefined) {
    out.push(
      error(
        fields.at,
        "missing-key",
        'Missing required key "outdoor" in the heating scenario',
        "add e.g. `outdoor: { design-temperature: -4 degC }`",
      ),
    );
    return undefined;
  }
  const outdoor = readFields(entry.value, ["design-temperature"], "outdoor conditions", out);
  if (outdoor === undefined) return undefined;
  if (!outdoor.entries.has("design-temperature")) {
    out.push(
      error(
        outdoor.at,
        "missing-key",
        'Missing required key "design-temperature" in the outdoor conditions of the heating scenario',
        "add the outdoor design temperature, e.g. `outdoor: { design-temperature: -4 degC }`",
      ),
    );
    return undefined;
  }
  const valueC = readQuantity(outdoor, "design-temperature", "temperature", out);
  if (valueC !== undefined && (valueC < -60 || valueC > 30)) {
    out.push(
      error(
        outdoor.entries.get("design-temperature")?.value.at ?? outdoor.at,
        "out-of-range",
        `Outdoor design temperature ${valueC} °C is outside −60 to 30 °C`,
        "check the value and its unit against the climate data",
      ),
    );
    return undefined;
  }
  return valueC;
}

function readHumidity(fields: Fields, out: Diagnostic[]): number | undefined {
  if (!fields.entries.has("indoor-humidity")) {
    out.push(
      error(
        fields.at,
        "missing-key",
        'Missing required key "indoor-humidity" in the heating scenario',
        "add the indoor relative humidity as a fraction, e.g. `indoor-humidity: 0.5` for 50 %",
      ),
    );
    return undefined;
  }
  const value = readNumber(fields, "indoor-humidity", 0, 1, out);
  if (value !== undefined && !(value > 0)) {
    out.push(
      error(
        fields.entries.get("indoor-humidity")?.value.at ?? fields.at,
        "not-positive",
        "Expected an indoor relative humidity above 0",
        "write the relative humidity as a fraction, e.g. `indoor-humidity: 0.5` for 50 %",
      ),
    );
    return undefined;
  }
  return value;
}

function readHeatingSurfaces(
  fields: Fields,
  constructionIds: readonly string[],
  out: Diagnostic[],
): ScenarioSurface[] {
  return readSurfaceList(
    fields,
    "{ id: wall-south, construction: EW-1, area: 42 m^2 }",
    out,
    (item, index) => readHeatingSurface(item, index, constructionIds, out),
  );
}

function readHeatingSurface(
  item: YamlValue,
  index: number,
  constructionIds: readonly string[],
  out: Diagnostic[],
): ScenarioSurface | undefined {
  const surface = readFields(item, HEATING_SURFACE_KEYS, `surface ${index + 1}`, out);
  if (surface === undefined) return undefined;
  const before = errorCount(out);
  const { id, construction, areaM2 } = readSurfaceCore(surface, index, constructionIds, out);
  const azimuthDeg = readQuantity(surface, "azimuth", "angle", out);
  const tiltDeg = readQuantity(surface, "tilt", "angle", out);
  if (errorCount(out) > before || id === undefined || construction === undefined || areaM2 === undefined) {
    return undefined;
  }
  return {
    id,
    construction,
    areaM2,
    at: surface.at,
    ...(azimuthDeg === undefined ? {} : { azimuthDeg }),
    ...(tiltDeg === undefined ? {} : { tiltDeg }),
  };
}
