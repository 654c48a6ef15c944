/**
 * The `bridge:` and `corrections:` keys of a construction layer: a framed layer (insulation between studs)
 * and the user's ISO 6946 Annex F corrections. Reading only; the combined method is in `bridgedLayers.ts`.
 */
import { type Diagnostic, error, errorCount, warning } from "./diagnostic.ts";
import { describe, quantityOf, readFields, readQuantity, readText, textOf } from "./fields.ts";
import { checkMassiveProperties } from "./materialBlock.ts";
import type { BridgeComponent, LayerCorrections, MaterialLookup, ResolvedLayer } from "./model.ts";
import type { Position } from "./position.ts";
import { describeCodePoints } from "./quantity.ts";
import { didYouMean } from "./suggest.ts";
import type { YamlValue } from "./yamlTree.ts";
import { MAX_U_CORRECTION, withinBound } from "./physicalBounds.ts";

/** Keys of a layer's `bridge:` mapping. */
export const BRIDGE_KEYS = [
  "material",
  "name",
  "conductivity",
  "density",
  "specific-heat",
  "source",
  "fraction",
];

/** Keys of a layer's `corrections:` mapping. */
export const CORRECTION_KEYS = ["fasteners", "air-gaps", "source"];

/** A fraction above this is accepted but warned about: the "bridge" is then most of the layer. */
const WARN_FRACTION = 0.5;

/** The bridging material of a layer and its area fraction, as read. */
export interface BridgeDraft {
  readonly bridge: BridgeComponent;
  readonly fraction: number;
  readonly at: Position;
}

/** Reads a layer's `bridge:` mapping (a material id or inline properties, plus `fraction`). */
export function readBridge(
  value: YamlValue,
  what: string,
  materials: MaterialLookup,
  out: Diagnostic[],
): BridgeDraft | undefined {
  const label = `bridge of the ${what}`;
  const fields = readFields(value, BRIDGE_KEYS, label, out);
  if (fields === undefined) return undefined;
  const before = errorCount(out);
  const fraction = readFraction(fields.entries.get("fraction")?.value, fields.at, label, out);
  const ownSource = readText(fields, "source", out);
  const materialEntry = fields.entries.get("material");
  let bridge: BridgeComponent | undefined;
  if (materialEntry !== undefined) {
    const inline = ["conductivity", "density", "specific-heat"].filter((k) => fields.entries.has(k));
    if (inline.length > 0) {
      out.push(error(
        fields.entries.get(inline[0] ?? "")?.keyAt ?? fields.at,
        "layer-overrides-material",
        `The ${label} names a material and also gives ${inline.join(", ")}`,
        "either refer to a material or give name, conductivity, density and specific-heat inline, not both",
      ));
      return undefined;
    }
    const id = textOf(materialEntry.value, `"material" in the ${label}`, out);
    if (id === undefined) return undefined;
    const material = materials.find(id);
    if (material === undefined && materials.isBroken?.(id) === true) return undefined;
    if (material === undefined) {
      out.push(error(
        materialEntry.value.at,
        "unknown-material",
        `Unknown material "${describeCodePoints(id)}" in the ${label}`,
        `${didYouMean(id, materials.ids(), "materials")} Otherwise define it in a \`material\` block`,
      ));
      return undefined;
    }
    if (
      material.conductivity === undefined || material.density === undefined ||
      material.specificHeat === undefined
    ) {
      out.push(error(
        materialEntry.value.at,
        "bridge-massless",
        `The ${label} uses the massless material "${id}": a bridge must be a solid material with λ, ρ and c`,
        "use a massive material (timber, steel, concrete) for studs or joists",
      ));
      return undefined;
    }
    bridge = {
      name: readText(fields, "name", out) ?? material.name,
      materialId: id,
      conductivity: material.conductivity,
      density: material.density,
      specificHeat: material.specificHeat,
      source: ownSource ?? material.source,
    };
  } else {
    const name = readText(fields, "name", out, { example: "timber studs" });
    const conductivity = readQuantity(fields, "conductivity", "conductivity", out, true);
    const density = readQuantity(fields, "density", "density", out, true);
    const specificHeat = readQuantity(fields, "specific-heat", "specificHeat", out, true);
    checkMassiveProperties(fields, conductivity, density, specificHeat, out);
    if (
      name !== undefined && conductivity !== undefined && density !== undefined && specificHeat !== undefined
    ) {
      bridge = { name, conductivity, density, specificHeat, source: ownSource ?? "" };
    }
  }
  if (errorCount(out) > before || bridge === undefined || fraction === undefined) return undefined;
  return { bridge, fraction, at: fields.at };
}

function readFraction(value: YamlValue | undefined, at: Position, label: string, out: Diagnostic[]) {
  if (value === undefined) {
    out.push(error(
      at,
      "missing-key",
      `Missing required key "fraction" in the ${label}`,
      "add the area fraction of the bridging material, e.g. `fraction: 0.15` for studs over 15 % of the area",
    ));
    return undefined;
  }
  if (value.kind !== "scalar" || typeof value.value !== "number" || !Number.isFinite(value.value)) {
    out.push(error(
      value.at,
      "expected-number",
      `Expected a plain number between 0 and 1 for "fraction" in the ${label}, found ${describe(value)}`,
      "write the area fraction as a pure number, e.g. `fraction: 0.15` (not 15 %)",
    ));
    return undefined;
  }
  const f = value.value;
  if (!(f > 0 && f < 1)) {
    out.push(error(
      value.at,
      "bad-fraction",
      `The bridge fraction ${value.text} in the ${label} must lie strictly between 0 and 1`,
      f >= 1 && f < 100
        ? "write a fraction, not a percentage: 15 % is `fraction: 0.15`"
        : "0 means no bridge (remove `bridge:`); 1 means the whole layer is the bridging material",
    ));
    return undefined;
  }
  if (f > WARN_FRACTION) {
    out.push(warning(
      value.at,
      "bridge-fraction-large",
      `The bridge covers ${Math.round(f * 1000) / 10} % of the ${
        layerOf(label)
      }: more than the material it bridges`,
      "check that `material` is the infill and `bridge` the framing, not the other way round",
    ));
  }
  return f;
}

function layerOf(label: string): string {
  return label.replace(/^bridge of the /, "");
}

/** Reads a layer's `corrections:` mapping: `fasteners` ΔU_f, `air-gaps: { level, delta-u }`, `source`. */
export function readCorrections(
  value: YamlValue,
  what: string,
  out: Diagnostic[],
): LayerCorrections | undefined {
  const label = `corrections of the ${what}`;
  const fields = readFields(value, CORRECTION_KEYS, label, out);
  if (fields === undefined) return undefined;
  const before = errorCount(out);
  const fastenersDeltaU = readQuantity(fields, "fasteners", "coefficient", out);
  const fastenersAt = fields.entries.get("fasteners")?.value.at ?? fields.at;
  withinBound(fastenersDeltaU, MAX_U_CORRECTION, "a fasteners ΔU_f of", fastenersAt, out);
  if (fastenersDeltaU !== undefined && !(fastenersDeltaU >= 0)) {
    out.push(error(
      fields.entries.get("fasteners")?.value.at ?? fields.at,
      "negative",
      `Expected a non-negative ΔU_f for "fasteners" in the ${label}`,
      'write the correction as computed by ISO 6946 Annex F, e.g. `fasteners: "0.02 W/(m^2 K)"`',
    ));
  }
  const gapsEntry = fields.entries.get("air-gaps");
  let airGaps: LayerCorrections["airGaps"];
  if (gapsEntry !== undefined) {
    const gaps = readFields(gapsEntry.value, ["level", "delta-u"], `air-gaps in the ${label}`, out);
    const levelValue = gaps?.entries.get("level")?.value;
    const level = levelValue?.kind === "scalar" ? levelValue.value : undefined;
    const deltaEntry = gaps?.entries.get("delta-u")?.value;
    const deltaU2 = deltaEntry === undefined
      ? undefined
      : quantityOf(deltaEntry, "coefficient", "delta-u", out);
    if (deltaEntry !== undefined) {
      withinBound(deltaU2, MAX_U_CORRECTION, "an air-gaps ΔU'' of", deltaEntry.at, out);
    }
    if (gaps !== undefined && (level !== 0 && level !== 1 && level !== 2)) {
      out.push(error(
        levelValue?.at ?? gaps.at,
        "bad-choice",
        `Expected "level" 0, 1 or 2 in air-gaps of the ${label}`,
        "write e.g. `air-gaps: { level: 1, delta-u: \"0.01 W/(m^2 K)\" }` with ΔU'' from the standard's table",
      ));
    } else if (gaps !== undefined && deltaEntry === undefined) {
      out.push(error(
        gaps.at,
        "missing-key",
        `Missing "delta-u" (ΔU'' of the level) in air-gaps of the ${label}`,
        "the tool ships no correction values: give ΔU'' for the level with its source",
      ));
    } else if (deltaU2 !== undefined && (level === 0 || level === 1 || level === 2)) {
      airGaps = { level, deltaU2 };
    }
  }
  const source = readText(fields, "source", out, { example: '"ISO 6946:2017, Annex F, Table F.1"' });
  if (fastenersDeltaU === undefined && gapsEntry === undefined && errorCount(out) === before) {
    out.push(error(
      fields.at,
      "empty-corrections",
      `The ${label} gives neither "fasteners" nor "air-gaps"`,
      "remove `corrections:` or give at least one correction",
    ));
  }
  if (errorCount(out) > before || source === undefined) return undefined;
  return {
    ...(fastenersDeltaU === undefined ? {} : { fastenersDeltaU }),
    ...(airGaps === undefined ? {} : { airGaps }),
    source,
    at: fields.at,
  };
}

/** Reads the `bridge:` and `corrections:` keys of a layer item and attaches them to the layer read from it. */
export function attachLayerExtras(
  item: YamlValue,
  layer: ResolvedLayer | undefined,
  what: string,
  materials: MaterialLookup,
  out: Diagnostic[],
): ResolvedLayer | undefined {
  if (item.kind !== "map") return layer;
  const bridgeEntry = item.entries.find((e) => e.key === "bridge");
  const correctionsEntry = item.entries.find((e) => e.key === "corrections");
  const before = errorCount(out);
  const bridge = bridgeEntry === undefined ? undefined : readBridge(bridgeEntry.value, what, materials, out);
  const corrections = correctionsEntry === undefined
    ? undefined
    : readCorrections(correctionsEntry.value, what, out);
  for (const entry of [bridgeEntry, correctionsEntry]) {
    if (entry !== undefined && layer?.kind === "resistive") {
      out.push(error(
        entry.keyAt,
        entry.key === "bridge" ? "bridge-on-massless" : "corrections-on-massless",
        `The ${what} is a massless layer and cannot take \`${entry.key}\``,
        entry.key === "bridge"
          ? "a bridged layer is a solid infill (e.g. insulation) with a thickness, crossed by studs or joists"
          : "put the corrections on the insulation layer they belong to",
      ));
    }
  }
  if (layer === undefined || layer.kind !== "massive" || errorCount(out) > before) {
    return errorCount(out) > before ? undefined : layer;
  }
  const base: BridgeComponent = {
    name: layer.name,
    ...(layer.materialId === undefined ? {} : { materialId: layer.materialId }),
    conductivity: layer.conductivity,
    density: layer.density,
    specificHeat: layer.specificHeat,
    source: layer.source,
  };
  return {
    ...layer,
    ...(bridge === undefined ? {} : { bridge: { base, ...bridge } }),
    ...(corrections === undefined ? {} : { corrections }),
  };
}
