import { type Diagnostic, error, errorCount } from "./diagnostic.ts";
import { readTimestep } from "./constructionBlock.ts";
import {
  type Fields,
  quantityOf,
  readChoice,
  readFields,
  readId,
  readList,
  readNumber,
  readQuantity,
  readText,
  textOf,
} from "./fields.ts";
import type { Scenario, ScenarioSurface } from "./model.ts";
import type { QuantityKind } from "./quantity.ts";
import { didYouMean } from "./suggest.ts";
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

/** Reads and validates a `scenario` block; constructions are checked against the known ids. */
export function readScenarioBlock(
  value: YamlValue,
  constructionIds: readonly string[],
  out: Diagnostic[],
): Scenario | undefined {
  const fields = readFields(value, SCENARIO_KEYS, "scenario block", out);
  if (fields === undefined) return undefined;
  const before = errorCount(out);
  const id = readId(fields, "id", out);
  const kind = readChoice(fields, "kind", ["design-day", "weather"] as const, out);
  if (kind === undefined && !fields.entries.has("kind")) {
    out.push(
      error(
        fields.at,
        "missing-key",
        'Missing required key "kind" in the scenario block',
        "add `kind: design-day` or `kind: weather`",
      ),
    );
  }
  const timestepS = readTimestep(fields, out) ?? 3600;
  const body: Record<string, unknown> = {};
  body.indoor = readTemperatureSeries(fields, "indoor", out, true);
  if (kind === "design-day") {
    body.outdoor = readOutdoor(fields, out);
    body.site = readSite(fields, out);
    body.date = readMonthDay(fields, out);
    body.sky = readSky(fields, out);
    forbid(fields, ["weather"], "a design-day scenario", out);
  } else if (kind === "weather") {
    body.weather = readWeatherPath(fields, out);
    body.site = readSite(fields, out);
    forbid(fields, ["outdoor", "date", "sky"], "a weather scenario (the weather file gives them)", out);
  }
  const surfaces = readSurfaces(fields, constructionIds, out);
  if (errorCount(out) > before || id === undefined || kind === undefined) return undefined;
  return { id: id.id, kind, timestepS, at: fields.at, body, surfaces };
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
  if (value.kind !== "list") return undefined;
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

function readTemperatureSeries(fields: Fields, key: string, out: Diagnostic[], required: boolean): unknown {
  const entry = fields.entries.get(key);
  if (entry === undefined) return required ? readQuantity(fields, key, "temperature", out, true) : undefined;
  if (entry.value.kind === "list") return readSeries(entry.value, "temperature", `"${key}"`, out);
  return readQuantity(fields, key, "temperature", out, true);
}

function readOutdoor(fields: Fields, out: Diagnostic[]): unknown {
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
    }
    if (hourly.value.kind !== "list") {
      out.push(
        error(
          hourly.value.at,
          "expected-list",
          "Expected a list of 24 temperatures for `hourly`",
          "write `[16.1 degC, …]`",
        ),
      );
      return undefined;
    }
    return { hourly: readSeries(hourly.value, "temperature", "`hourly` outdoor temperatures", out) };
  }
  const maxDryBulb = readQuantity(outdoor, "max-dry-bulb", "temperature", out, true);
  const dailyRange = readQuantity(outdoor, "daily-range", "temperatureDifference", out, true);
  if (dailyRange !== undefined && (dailyRange < 0 || dailyRange > 30)) {
    out.push(
      error(
        outdoor.entries.get("daily-range")?.value.at ?? outdoor.at,
        "out-of-range",
        `Daily range ${dailyRange} K is outside 0 to 30 K`,
        "check the value against the climate data",
      ),
    );
  }
  return { maxDryBulb, dailyRange };
}

function readSite(fields: Fields, out: Diagnostic[]): unknown {
  const entry = fields.entries.get("site");
  if (entry === undefined) return undefined;
  const site = readFields(entry.value, SITE_KEYS, "site", out);
  if (site === undefined) return undefined;
  const latitude = readQuantity(site, "latitude", "angle", out, true);
  const longitude = readQuantity(site, "longitude", "angle", out, true);
  const timeZoneS = readQuantity(site, "time-zone", "time", out, true);
  const elevation = readQuantity(site, "elevation", "length", out);
  inRange(site, "latitude", latitude, -90, 90, "deg", out);
  inRange(site, "longitude", longitude, -180, 180, "deg", out);
  inRange(site, "time-zone", timeZoneS === undefined ? undefined : timeZoneS / 3600, -12, 14, "h", out);
  return {
    latitude,
    longitude,
    timeZoneH: timeZoneS === undefined ? undefined : timeZoneS / 3600,
    elevation,
  };
}

function readSky(fields: Fields, out: Diagnostic[]): unknown {
  const entry = fields.entries.get("sky");
  if (entry === undefined) return undefined;
  if (entry.value.kind === "scalar" && entry.value.value === "none") return "none";
  const sky = readFields(entry.value, SKY_KEYS, "sky", out);
  if (sky === undefined) return undefined;
  const model = readChoice(sky, "model", ["clear-sky"] as const, out);
  const beam = readNumber(sky, "beam-optical-depth", 0.05, 1.5, out);
  const diffuse = readNumber(sky, "diffuse-optical-depth", 0.5, 4, out);
  return { model, beamOpticalDepth: beam, diffuseOpticalDepth: diffuse };
}

function readMonthDay(fields: Fields, out: Diagnostic[]): string | undefined {
  const text = readText(fields, "date", out, { example: "07-21" });
  if (text !== undefined && !MONTH_DAY.test(text)) {
    out.push(
      error(
        fields.entries.get("date")?.value.at ?? fields.at,
        "bad-date",
        `Cannot read the design date "${text}"`,
        "write month and day as MM-DD, e.g. `date: 07-21` (quote it if your editor changes it)",
      ),
    );
  }
  return text;
}

function readWeatherPath(fields: Fields, out: Diagnostic[]): string | undefined {
  const path = readText(fields, "weather", out, { example: "weather/site-2031.csv" });
  if (
    path !== undefined &&
    (path.startsWith("/") || path.split(/[\\/]/).includes("..") || /^[A-Za-z]:/.test(path))
  ) {
    out.push(
      error(
        fields.entries.get("weather")?.value.at ?? fields.at,
        "path-outside",
        `Cannot use the weather file "${path}": it points outside the project folder`,
        "copy the file into the project folder and give its path relative to it",
      ),
    );
  }
  return path;
}

function readSurfaces(
  fields: Fields,
  constructionIds: readonly string[],
  out: Diagnostic[],
): ScenarioSurface[] {
  const items = readList(fields, "surfaces", out, true) ?? [];
  const surfaces: ScenarioSurface[] = [];
  const seen = new Set<string>();
  items.forEach((item, index) => {
    const surface = readFields(item, SURFACE_KEYS, `surface ${index + 1}`, out);
    if (surface === undefined) return;
    const before = errorCount(out);
    const id = readId(surface, "id", out);
    if (id !== undefined && seen.has(id.id)) {
      out.push(
        error(
          id.at,
          "duplicate-id",
          `Duplicate surface id "${id.id}" in the scenario`,
          "give each surface its own id",
        ),
      );
    }
    if (id !== undefined) seen.add(id.id);
    const construction = readText(surface, "construction", out, { example: "EW-1" });
    if (construction !== undefined && !constructionIds.includes(construction)) {
      out.push(
        error(
          surface.entries.get("construction")?.value.at ?? surface.at,
          "unknown-construction",
          `Unknown construction "${construction}" in surface ${id?.id ?? index + 1}`,
          didYouMean(construction, constructionIds, "constructions"),
        ),
      );
    }
    const areaM2 = readQuantity(surface, "area", "area", out, true);
    if (areaM2 !== undefined && !(areaM2 > 0)) {
      out.push(
        error(
          surface.entries.get("area")?.value.at ?? surface.at,
          "not-positive",
          `Expected a positive area, found ${areaM2} m^2`,
          "give the net area of the surface",
        ),
      );
    }
    const solAir = surface.entries.get("sol-air");
    if (solAir !== undefined) {
      if (solAir.value.kind !== "list") {
        out.push(
          error(
            solAir.value.at,
            "expected-list",
            "Expected a list of 24 sol-air temperatures",
            "write `[30 degC, …]`",
          ),
        );
      } else readSeries(solAir.value, "temperature", `"sol-air" of surface ${id?.id ?? index + 1}`, out);
    }
    const azimuthDeg = readQuantity(surface, "azimuth", "angle", out, false);
    const tiltDeg = readQuantity(surface, "tilt", "angle", out, solAir === undefined);
    inRange(surface, "azimuth", azimuthDeg, 0, 360, "deg", out);
    inRange(surface, "tilt", tiltDeg, 0, 180, "deg", out);
    if (
      solAir === undefined && tiltDeg !== undefined && tiltDeg > 0 && tiltDeg < 180 &&
      azimuthDeg === undefined
    ) {
      out.push(
        error(
          surface.at,
          "missing-key",
          `Missing "azimuth" for the tilted surface ${id?.id ?? index + 1}`,
          "add e.g. `azimuth: 180 deg` (clockwise from north)",
        ),
      );
    }
    const absorptance = readNumber(surface, "absorptance", 0, 1, out);
    const emittance = readNumber(surface, "emittance", 0, 1, out);
    readNumber(surface, "ground-reflectance", 0, 1, out);
    readNumber(surface, "radiant-fraction", 0, 1, out);
    readQuantity(surface, "outside-coefficient", "coefficient", out);
    readQuantity(surface, "longwave-correction", "temperatureDifference", out);
    if (errorCount(out) > before || id === undefined || construction === undefined || areaM2 === undefined) {
      return;
    }
    surfaces.push({
      id: id.id,
      construction,
      areaM2,
      at: surface.at,
      ...(azimuthDeg === undefined ? {} : { azimuthDeg }),
      ...(tiltDeg === undefined ? {} : { tiltDeg }),
      ...(absorptance === undefined ? {} : { absorptance }),
      ...(emittance === undefined ? {} : { emittance }),
    });
  });
  return surfaces;
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
        `Value ${value} ${unitName} of "${key}" is outside ${min} to ${max} ${unitName}`,
        `check "${key}" (${textOfKey(fields, key)})`,
      ),
    );
  }
}

function textOfKey(fields: Fields, key: string): string {
  const v = fields.entries.get(key)?.value;
  return v === undefined ? "" : textOf(v, key, []) ?? "";
}
