import type {
  Construction,
  HeatingScenario,
  MaterialDef,
  ProjectInfo,
  ResolvedLayer,
  Scenario,
  ScenarioSurface,
  TemperatureProfile,
} from "../project/model.ts";
import type { FieldValue } from "./types.ts";

/** One comparable key of an input, its SI value and unit, and how to find its line in the source. */
export interface Field {
  readonly key: string;
  readonly value: FieldValue;
  readonly unit: string;
  /** Pattern that finds the key in the source text; absent: the key's last dotted segment followed by ":". */
  readonly find?: RegExp;
}

/** SI units as printed, shared by every output. */
export const UNIT = {
  conductivity: "W/(m·K)",
  density: "kg/m³",
  specificHeat: "J/(kg·K)",
  resistance: "m²·K/W",
  length: "m",
  area: "m²",
  angle: "°",
  celsius: "°C",
  kelvin: "K",
  seconds: "s",
  hours: "h",
  coefficient: "W/(m²·K)",
} as const;

/** One field, or none when the value is absent. */
export function field(key: string, value: FieldValue | undefined, unit = "", find?: RegExp): Field[] {
  if (value === undefined) return [];
  return [find === undefined ? { key, value, unit } : { key, value, unit, find }];
}

function escapeRegExp(text: string): string {
  return text.replace(/[.*+?^${}()|[\]\\]/g, "\\$&");
}

const KNOWN_INFO = new Set([
  "title",
  "reference",
  "revision",
  "status",
  "preparedBy",
  "checkedBy",
  "approvedBy",
  "date",
  "units",
  "revisions",
  "sensitivityVariation",
]);

/** Settings that later features add to the front matter, compared as they are (numbers, text, or JSON). */
function otherInfoFields(info: ProjectInfo): Field[] {
  return Object.entries(info).filter(([key]) => !KNOWN_INFO.has(key)).sort(([x], [y]) => x < y ? -1 : 1)
    .flatMap(([key, value]) => {
      const yamlKey = key.replace(/[A-Z]/g, (c) => `-${c.toLowerCase()}`);
      const shown = typeof value === "number" || typeof value === "string" || typeof value === "boolean"
        ? value
        : JSON.stringify(value);
      return field(yamlKey, shown);
    });
}

/** The front matter keys of `project.md`; each revisions entry is a key of its own, `revisions.<revision>`. */
export function infoFields(info: ProjectInfo): Field[] {
  return [
    ...field("title", info.title),
    ...field("reference", info.reference),
    ...field("revision", info.revision, "", /^revision\s*:/),
    ...field("status", info.status),
    ...field("prepared-by", info.preparedBy),
    ...field("checked-by", info.checkedBy),
    ...field("approved-by", info.approvedBy),
    ...field("date", info.date, "", /^date\s*:/),
    ...field("units", info.units),
    ...info.revisions.flatMap((r) =>
      field(
        `revisions.${r.revision}`,
        `${r.date}: ${r.description}`,
        "",
        new RegExp(`revision\\s*:\\s*["']?${escapeRegExp(r.revision)}["']?\\s*[,}]`),
      )
    ),
    ...field("sensitivity.variation", info.sensitivityVariation),
    ...otherInfoFields(info),
  ];
}

/** The keys of a material. */
export function materialFields(m: MaterialDef): Field[] {
  return [
    ...field("name", m.name),
    ...field("origin", m.origin),
    ...field("class", m.materialClass),
    ...field("conductivity", m.conductivity, UNIT.conductivity),
    ...field("density", m.density, UNIT.density),
    ...field("specific-heat", m.specificHeat, UNIT.specificHeat),
    ...field("resistance", m.resistance, UNIT.resistance),
    ...field("source", m.source),
  ];
}

/** The construction's own keys (its layers are compared separately). */
export function constructionFields(c: Construction): Field[] {
  return [
    ...field("name", c.name),
    ...field("heat-flow", c.heatFlow),
    ...field("outside-surface-resistance", c.outsideResistance, UNIT.resistance),
    ...field("inside-surface-resistance", c.insideResistance, UNIT.resistance),
    ...field("timestep", c.timestepS, UNIT.seconds),
  ];
}

/**
 * The keys of a layer. A layer that refers to a material takes its properties from that material,
 * whose changes are listed under materials, so only what the layer itself states is compared here.
 */
export function layerFields(
  layer: ResolvedLayer,
  materialName: string | undefined,
  materialSource?: string,
): Field[] {
  const own = layer.materialId === undefined;
  const massive = layer.kind === "massive";
  return [
    ...field("material", layer.materialId),
    ...field("name", own || layer.name !== materialName ? layer.name : undefined),
    ...field("thickness", massive ? layer.thicknessM : undefined, UNIT.length),
    ...field("conductivity", own && massive ? layer.conductivity : undefined, UNIT.conductivity),
    ...field("density", own && massive ? layer.density : undefined, UNIT.density),
    ...field("specific-heat", own && massive ? layer.specificHeat : undefined, UNIT.specificHeat),
    ...field("resistance", own && !massive ? layer.resistance : undefined, UNIT.resistance),
    ...field("source", own || layer.source !== materialSource ? layer.source : undefined),
  ];
}

/** A temperature input: one value, or 24 hourly values under `<key>.hourly`. */
export function profileFields(key: string, p: TemperatureProfile): Field[] {
  return p.kind === "constant"
    ? field(key, p.valueC, UNIT.celsius)
    : field(`${key}.hourly`, p.hourlyC, UNIT.celsius, new RegExp(`(^|[\\s{,])${key}\\s*:`));
}

/** The scenario's own keys (its surfaces are compared separately). */
export function scenarioFields(s: Scenario): Field[] {
  const common = [
    ...field("kind", s.kind),
    ...field("timestep", s.timestepS, UNIT.seconds),
    ...profileFields("indoor", s.indoor),
    ...field("site.latitude", s.site?.latitudeDeg, UNIT.angle),
    ...field("site.longitude", s.site?.longitudeDeg, UNIT.angle),
    ...field("site.time-zone", s.site?.timeZoneH, UNIT.hours),
    ...field("site.elevation", s.site?.elevationM, UNIT.length),
  ];
  if (s.kind === "weather") return [...common, ...field("weather", s.weatherPath)];
  const outdoor = s.outdoor.kind === "daily-range"
    ? [
      ...field("outdoor.max-dry-bulb", s.outdoor.maxDryBulbC, UNIT.celsius),
      ...field("outdoor.daily-range", s.outdoor.dailyRangeK, UNIT.kelvin),
    ]
    : field("outdoor.hourly", s.outdoor.hourlyC, UNIT.celsius, /(^|[\s{,])outdoor\s*:/);
  const sky = s.sky.kind === "clear-sky"
    ? [
      ...field("sky.model", "clear-sky"),
      ...field("sky.beam-optical-depth", s.sky.beamOpticalDepth),
      ...field("sky.diffuse-optical-depth", s.sky.diffuseOpticalDepth),
    ]
    : field("sky.model", "none");
  const date = `${String(s.month).padStart(2, "0")}-${String(s.day).padStart(2, "0")}`;
  return [...common, ...outdoor, ...field("date", date, "", /^\s*date\s*:/), ...sky];
}

/** The keys of a heating design condition (its surfaces are compared separately). */
export function heatingFields(h: HeatingScenario): Field[] {
  return [
    ...field("kind", h.kind),
    ...field("indoor", h.indoorC, UNIT.celsius),
    ...field("outdoor.design-temperature", h.outdoorC, UNIT.celsius),
    ...field("indoor-humidity", h.indoorRelativeHumidity),
    ...field("moisture-surface-resistance", h.moistureSurfaceResistance, UNIT.resistance),
  ];
}

/** The keys of one exposed surface of a scenario. */
export function surfaceFields(s: ScenarioSurface): Field[] {
  return [
    ...field("construction", s.construction),
    ...field("area", s.areaM2, UNIT.area),
    ...field("azimuth", s.azimuthDeg, UNIT.angle),
    ...field("tilt", s.tiltDeg, UNIT.angle),
    ...field("absorptance", s.absorptance),
    ...field("emittance", s.emittance),
    ...field("ground-reflectance", s.groundReflectance),
    ...field("outside-coefficient", s.outsideCoefficient, UNIT.coefficient),
    ...field("longwave-correction", s.longwaveCorrectionK, UNIT.kelvin),
    ...field("radiant-fraction", s.radiantFraction),
    ...field("sol-air", s.solAirC, UNIT.celsius),
  ];
}
