import { type Diagnostic, error, errorCount } from "./diagnostic.ts";
import { readSurfaceCore, readSurfaceList } from "./surfaceList.ts";
import { readTimestep } from "./constructionBlock.ts";
import {
  type Fields,
  quantityOf,
  readChoice,
  readFields,
  readId,
  readNumber,
  readQuantity,
  readText,
  textOf,
} from "./fields.ts";
import { isHeatingBlock, readHeatingScenario } from "./heatingBlock.ts";
import type {
  DesignDaySky,
  HeatingScenario,
  Scenario,
  ScenarioSurface,
  Site,
  TemperatureProfile,
} from "./model.ts";
import type { Position } from "./position.ts";
import { describeCodePoints, type QuantityKind } from "./quantity.ts";
import { readRadiantTimeSeries } from "./radiantTimeSeriesBlock.ts";
import { MAX_LONGWAVE_CORRECTION, withinBound } from "./physicalBounds.ts";
import { readElevation, readTimeZone } from "./siteFields.ts";
import type { YamlValue } from "./yamlTree.ts";

export const SCENARIO_KEYS = [
  "id",
  "kind",
  "timestep",
  "indoor",
  "outdoor",
  "site",
  "date",
  "sky",
  "surfaces",
  "weather",
  "radiant-time-series",
  "period",
  "synthetic",
] as const;
export const SURFACE_KEYS = [
  "id",
  "construction",
  "azimuth",
  "tilt",
  "area",
  "absorptance",
  "emittance",
  "ground-reflectance",
  "outside-coefficient",
  "longwave-correction",
  "radiant-fraction",
  "sol-air",
] as const;
const SITE_KEYS = ["latitude", "longitude", "time-zone", "elevation"] as const;
const SKY_KEYS = ["model", "beam-optical-depth", "diffuse-optical-depth"] as const;
const MONTH_DAY = /^(0[1-9]|1[0-2])-(0[1-9]|[12]\d|3[01])$/;
const DAYS_IN_MONTH = [31, 28, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31];

/** Reads and validates a `scenario` block (a heating block goes to its own reader); constructions checked by id. */
export function readScenarioBlock(
  value: YamlValue,
  constructionIds: readonly string[],
  out: Diagnostic[],
): Scenario | HeatingScenario | undefined {
  if (isHeatingBlock(value)) return readHeatingScenario(value, constructionIds, out);
  const fields = readFields(value, SCENARIO_KEYS, "scenario block", out);
  if (fields === undefined) return undefined;
  const before = errorCount(out);
  const id = readId(fields, "id", out);
  const kind = readChoice(fields, "kind", ["design-day", "weather", "heating"] as const, out);
  if (!fields.entries.has("kind")) {
    out.push(
      error(
        fields.at,
        "missing-key",
        'Missing required key "kind" in the scenario block',
        "add `kind: design-day`, `kind: weather` or `kind: heating`",
      ),
    );
  }
  const timestepS = readTimestep(fields, out);
  const indoor = readTemperatureProfile(fields, "indoor", out);
  const site = readSite(fields, out);
  const surfaces = readSurfaces(fields, constructionIds, out);
  const common = {
    id: id?.id ?? "",
    timestepS: timestepS ?? 3600,
    timestepDefaulted: !fields.entries.has("timestep"),
    indoor: indoor ?? { kind: "constant" as const, valueC: NaN },
    surfaces,
    at: fields.at,
    ...(site === undefined ? {} : { site }),
  };
  if (kind === "design-day") {
    forbid(fields, ["weather", "period", "synthetic"], "a design-day scenario", out);
    const radiantTimeSeries = readRadiantTimeSeries(fields, out);
    const outdoor = readOutdoor(fields, out);
    const date = readMonthDay(fields, out);
    const sky = readSky(fields, out);
    if (sky?.kind === "clear-sky" && site === undefined && !fields.entries.has("site")) {
      out.push(
        error(
          fields.at,
          "missing-key",
          'Missing "site" in the scenario block: the clear-sky model needs the sun position',
          "add e.g. `site: { latitude: 52.4 deg, longitude: -1.9 deg, time-zone: 0 h, elevation: 120 m }`",
        ),
      );
    }
    if (
      errorCount(out) > before || id === undefined || indoor === undefined || outdoor === undefined ||
      date === undefined || sky === undefined
    ) return undefined;
    return {
      ...common,
      kind,
      outdoor,
      month: date.month,
      day: date.day,
      sky,
      ...(radiantTimeSeries === undefined ? {} : { radiantTimeSeries }),
    };
  }
  if (kind === "weather") {
    forbid(fields, ["outdoor", "date", "sky"], "a weather scenario (the weather file gives them)", out);
    forbid(
      fields,
      ["radiant-time-series"],
      "a weather scenario (cooling load is computed for design days)",
      out,
    );
    const weather = readWeatherPath(fields, out);
    const period = readPeriod(fields, out);
    const synthetic = readSynthetic(fields, out);
    if (site === undefined && !fields.entries.has("site")) {
      out.push(
        error(
          fields.at,
          "missing-key",
          'Missing "site" in the weather scenario: the sun position is needed to transpose irradiance',
          "add e.g. `site: { latitude: 52.4 deg, longitude: -1.9 deg, time-zone: 0 h, elevation: 120 m }`",
        ),
      );
    }
    if (errorCount(out) > before || id === undefined || indoor === undefined || weather === undefined) {
      return undefined;
    }
    return {
      ...common,
      kind,
      weatherPath: weather.path,
      weatherAt: weather.at,
      ...(period === undefined ? {} : { period }),
      ...(synthetic === undefined ? {} : { synthetic }),
    };
  }
  return undefined;
}

function forbid(fields: Fields, keys: readonly string[], what: string, out: Diagnostic[]): void {
  for (const key of keys) {
    const entry = fields.entries.get(key);
    if (entry !== undefined) {
      out.push(
        error(entry.keyAt, "key-not-allowed", `Key "${key}" does not apply to ${what}`, `remove \`${key}\``),
      );
    }
  }
}

function readSeries(
  value: YamlValue,
  kind: QuantityKind,
  what: string,
  out: Diagnostic[],
): number[] | undefined {
  if (value.kind !== "list") {
    out.push(
      error(
        value.at,
        "expected-list",
        `Expected a list of 24 hourly values for ${what}`,
        "write `[16.1 degC, 15.2 degC, …]`, hour 0 first",
      ),
    );
    return undefined;
  }
  if (value.items.length !== 24) {
    out.push(
      error(
        value.at,
        "series-length",
        `Expected 24 hourly values for ${what}, found ${value.items.length}`,
        "give one value per hour, hour 0 (00:00) first; each value with its unit",
      ),
    );
    return undefined;
  }
  const values = value.items.map((item, hour) => quantityOf(item, kind, `hour ${hour} of ${what}`, out));
  return values.every((v) => v !== undefined) ? values as number[] : undefined;
}

/** Reads a required temperature under `key`: one value with its unit, or a list of 24 hourly values (hour 0 first). */
export function readTemperatureProfile(
  fields: Fields,
  key: string,
  out: Diagnostic[],
): TemperatureProfile | undefined {
  const entry = fields.entries.get(key);
  if (entry?.value.kind === "list") {
    const hourlyC = readSeries(entry.value, "temperature", `"${key}"`, out);
    return hourlyC === undefined ? undefined : { kind: "hourly", hourlyC };
  }
  const valueC = readQuantity(fields, key, "temperature", out, true);
  return valueC === undefined ? undefined : { kind: "constant", valueC };
}

type Outdoor = Extract<Scenario, { kind: "design-day" }>["outdoor"];

function readOutdoor(fields: Fields, out: Diagnostic[]): Outdoor | undefined {
  const entry = fields.entries.get("outdoor");
  if (entry === undefined) {
    out.push(
      error(
        fields.at,
        "missing-key",
        'Missing required key "outdoor" in the scenario block',
        "add e.g. `outdoor: { max-dry-bulb: 33 degC, daily-range: 11 K }`",
      ),
    );
    return undefined;
  }
  const outdoor = readFields(
    entry.value,
    ["max-dry-bulb", "daily-range", "hourly"],
    "outdoor conditions",
    out,
  );
  if (outdoor === undefined) return undefined;
  const hourly = outdoor.entries.get("hourly");
  if (hourly !== undefined) {
    if (outdoor.entries.has("max-dry-bulb") || outdoor.entries.has("daily-range")) {
      out.push(
        error(
          hourly.keyAt,
          "mixed-outdoor",
          "Give either `hourly` or `max-dry-bulb` with `daily-range`, not both",
          "remove one of the two descriptions",
        ),
      );
      return undefined;
    }
    const hourlyC = readSeries(hourly.value, "temperature", "`hourly` outdoor temperatures", out);
    return hourlyC === undefined ? undefined : { kind: "hourly", hourlyC };
  }
  const maxDryBulbC = readQuantity(outdoor, "max-dry-bulb", "temperature", out, true);
  const dailyRangeK = readQuantity(outdoor, "daily-range", "temperatureDifference", out, true);
  if (maxDryBulbC !== undefined && (maxDryBulbC < -60 || maxDryBulbC > 60)) {
    out.push(
      error(
        outdoor.entries.get("max-dry-bulb")?.value.at ?? outdoor.at,
        "out-of-range",
        `Maximum dry bulb ${maxDryBulbC} °C is outside −60 to 60 °C`,
        "check the value and its unit against the climate data",
      ),
    );
    return undefined;
  }
  if (dailyRangeK !== undefined && (dailyRangeK < 0 || dailyRangeK > 30)) {
    out.push(
      error(
        outdoor.entries.get("daily-range")?.value.at ?? outdoor.at,
        "out-of-range",
        `Daily range ${dailyRangeK} K is outside 0 to 30 K`,
        "check the value against the climate data",
      ),
    );
    return undefined;
  }
  return maxDryBulbC === undefined || dailyRangeK === undefined
    ? undefined
    : { kind: "daily-range", maxDryBulbC, dailyRangeK };
}

function readSite(fields: Fields, out: Diagnostic[]): Site | undefined {
  const entry = fields.entries.get("site");
  if (entry === undefined) return undefined;
  const site = readFields(entry.value, SITE_KEYS, "site", out);
  if (site === undefined) return undefined;
  const before = errorCount(out);
  const latitudeDeg = readQuantity(site, "latitude", "angle", out, true);
  const longitudeDeg = readQuantity(site, "longitude", "angle", out, true);
  const timeZoneH = readTimeZone(site, out);
  const elevationM = readElevation(site, out);
  inRange(site, "latitude", latitudeDeg, -90, 90, "deg", out);
  inRange(site, "longitude", longitudeDeg, -180, 180, "deg", out);
  if (
    errorCount(out) > before || latitudeDeg === undefined || longitudeDeg === undefined ||
    timeZoneH === undefined
  ) return undefined;
  return {
    latitudeDeg,
    longitudeDeg,
    timeZoneH,
    ...(elevationM === undefined ? {} : { elevationM }),
  };
}

function readSky(fields: Fields, out: Diagnostic[]): DesignDaySky | undefined {
  const entry = fields.entries.get("sky");
  if (entry === undefined) {
    out.push(
      error(
        fields.at,
        "missing-key",
        'Missing required key "sky" in the design-day scenario',
        "add `sky: { model: clear-sky, beam-optical-depth: 0.45, diffuse-optical-depth: 2.0 }` (depths from the climate data) or `sky: none`",
      ),
    );
    return undefined;
  }
  if (entry.value.kind === "scalar" && entry.value.value === "none") return { kind: "none" };
  const sky = readFields(entry.value, SKY_KEYS, "sky", out);
  if (sky === undefined) return undefined;
  const before = errorCount(out);
  readChoice(sky, "model", ["clear-sky"] as const, out);
  const beamOpticalDepth = readNumber(sky, "beam-optical-depth", 0.05, 1.5, out);
  const diffuseOpticalDepth = readNumber(sky, "diffuse-optical-depth", 0.5, 4, out);
  if (beamOpticalDepth === undefined && !sky.entries.has("beam-optical-depth")) {
    out.push(
      error(
        sky.at,
        "missing-key",
        'Missing "beam-optical-depth" in the sky',
        "add the site's τb from the climate data, e.g. `beam-optical-depth: 0.45`",
      ),
    );
  }
  if (diffuseOpticalDepth === undefined && !sky.entries.has("diffuse-optical-depth")) {
    out.push(
      error(
        sky.at,
        "missing-key",
        'Missing "diffuse-optical-depth" in the sky',
        "add the site's τd from the climate data, e.g. `diffuse-optical-depth: 2.0`",
      ),
    );
  }
  if (errorCount(out) > before || beamOpticalDepth === undefined || diffuseOpticalDepth === undefined) {
    return undefined;
  }
  return { kind: "clear-sky", beamOpticalDepth, diffuseOpticalDepth };
}

function readMonthDay(fields: Fields, out: Diagnostic[]): { month: number; day: number } | undefined {
  const text = readText(fields, "date", out, { example: "07-21" });
  if (text === undefined) return undefined;
  const at = fields.entries.get("date")?.value.at ?? fields.at;
  const match = MONTH_DAY.exec(text);
  const month = Number(match?.[1]);
  const day = Number(match?.[2]);
  if (match === null || day > (DAYS_IN_MONTH[month - 1] ?? 0)) {
    out.push(
      error(
        at,
        "bad-date",
        `Cannot read the design date "${describeCodePoints(text)}"`,
        "write month and day as MM-DD, e.g. `date: 07-21` (29 February is not a design day)",
      ),
    );
    return undefined;
  }
  return { month, day };
}

function readWeatherPath(fields: Fields, out: Diagnostic[]): { path: string; at: Position } | undefined {
  const path = readText(fields, "weather", out, { example: "weather/site-2031.csv" });
  if (path === undefined) return undefined;
  const at = fields.entries.get("weather")?.value.at ?? fields.at;
  if (path.startsWith("/") || path.split(/[\\/]/).includes("..") || /^[A-Za-z]:/.test(path)) {
    out.push(
      error(
        at,
        "path-outside",
        `Cannot use the weather file "${describeCodePoints(path)}": it points outside the project folder`,
        "copy the file into the project folder and give its path relative to it",
      ),
    );
    return undefined;
  }
  if (!path.endsWith(".csv")) {
    out.push(
      error(
        at,
        "weather-not-csv",
        `Cannot use the weather file "${describeCodePoints(path)}": expected a .csv file`,
        "give the path of the CSV file",
      ),
    );
    return undefined;
  }
  return { path: path.replaceAll("\\", "/"), at };
}

/** `period: 10 days`: the span a shorter (or longer) than one-year weather file covers, repeated for the warm-up. */
/** `synthetic: true` or a note on how the data were made flags invented weather; `false` is the same as absent. */
function readSynthetic(fields: Fields, out: Diagnostic[]): { note: string; at: Position } | undefined {
  const entry = fields.entries.get("synthetic");
  if (entry === undefined) return undefined;
  const text = textOf(entry.value, `"synthetic" in the ${fields.what}`, out);
  if (text === undefined || text === "false") return undefined;
  return { note: text === "true" ? "" : text, at: entry.keyAt };
}

function readPeriod(fields: Fields, out: Diagnostic[]): { seconds: number; at: Position } | undefined {
  const seconds = readQuantity(fields, "period", "time", out);
  if (seconds === undefined) return undefined;
  const at = fields.entries.get("period")?.value.at ?? fields.at;
  if (!(seconds > 0)) {
    out.push(
      error(
        at,
        "not-positive",
        `Expected a positive period, found ${seconds} s`,
        "write the span the weather file covers, e.g. `period: 10 days`",
      ),
    );
    return undefined;
  }
  return { seconds, at };
}

function readSurfaces(
  fields: Fields,
  constructionIds: readonly string[],
  out: Diagnostic[],
): ScenarioSurface[] {
  return readSurfaceList(
    fields,
    "{ id: wall-south, construction: EW-1, azimuth: 180 deg, tilt: 90 deg, area: 42 m^2, absorptance: 0.6 }",
    out,
    (item, index) => readSurface(item, index, constructionIds, out),
  );
}

function readSurface(
  item: YamlValue,
  index: number,
  constructionIds: readonly string[],
  out: Diagnostic[],
): ScenarioSurface | undefined {
  const surface = readFields(item, SURFACE_KEYS, `surface ${index + 1}`, out);
  if (surface === undefined) return undefined;
  const before = errorCount(out);
  const { id, label, construction, areaM2 } = readSurfaceCore(surface, index, constructionIds, out);
  const solAirEntry = surface.entries.get("sol-air");
  const solAirC = solAirEntry === undefined
    ? undefined
    : readSeries(solAirEntry.value, "temperature", `"sol-air" of surface ${label}`, out);
  const azimuthDeg = readQuantity(surface, "azimuth", "angle", out);
  const tiltDeg = readQuantity(surface, "tilt", "angle", out, solAirEntry === undefined);
  inRange(surface, "azimuth", azimuthDeg, 0, 360, "deg", out);
  inRange(surface, "tilt", tiltDeg, 0, 180, "deg", out);
  if (
    solAirEntry === undefined && tiltDeg !== undefined && tiltDeg > 0 && tiltDeg < 180 &&
    !surface.entries.has("azimuth")
  ) {
    out.push(
      error(
        surface.at,
        "missing-key",
        `Missing "azimuth" for the tilted surface ${label}`,
        "add e.g. `azimuth: 180 deg` (clockwise from north)",
      ),
    );
  }
  const absorptance = readNumber(surface, "absorptance", 0, 1, out);
  if (solAirEntry === undefined && !surface.entries.has("absorptance")) {
    out.push(
      error(
        surface.at,
        "missing-key",
        `Missing "absorptance" for surface ${label}: the solar gain depends on it`,
        "add the outside finish's solar absorptance, e.g. `absorptance: 0.6` (or give `sol-air` values directly)",
      ),
    );
  }
  const optional = {
    emittance: readNumber(surface, "emittance", 0, 1, out),
    groundReflectance: readNumber(surface, "ground-reflectance", 0, 1, out),
    radiantFraction: readNumber(surface, "radiant-fraction", 0, 1, out),
    outsideCoefficient: readQuantity(surface, "outside-coefficient", "coefficient", out),
    longwaveCorrectionK: readQuantity(surface, "longwave-correction", "temperatureDifference", out),
  };
  const longwaveAt = surface.entries.get("longwave-correction")?.value.at ?? surface.at;
  withinBound(
    optional.longwaveCorrectionK,
    MAX_LONGWAVE_CORRECTION,
    "a longwave-correction of",
    longwaveAt,
    out,
  );
  if (optional.outsideCoefficient !== undefined && !(optional.outsideCoefficient > 0)) {
    out.push(
      error(
        surface.entries.get("outside-coefficient")?.value.at ?? surface.at,
        "not-positive",
        "Expected a positive outside coefficient",
        "write e.g. `outside-coefficient: 25 W/(m^2 K)`",
      ),
    );
  }
  if (errorCount(out) > before || id === undefined || construction === undefined || areaM2 === undefined) {
    return undefined;
  }
  const present = Object.fromEntries(
    Object.entries({ ...optional, azimuthDeg, tiltDeg, absorptance, solAirC }).filter(([, v]) =>
      v !== undefined
    ),
  );
  return { id, construction, areaM2, at: surface.at, ...present };
}

function inRange(
  fields: Fields,
  key: string,
  value: number | undefined,
  min: number,
  max: number,
  unitName: string,
  out: Diagnostic[],
): void {
  if (value !== undefined && (value < min || value > max)) {
    out.push(
      error(
        fields.entries.get(key)?.value.at ?? fields.at,
        "out-of-range",
        `Value ${
          Number(value.toPrecision(6))
        } ${unitName} of "${key}" is outside ${min} to ${max} ${unitName}`,
        `check "${key}" and its unit`,
      ),
    );
  }
}
