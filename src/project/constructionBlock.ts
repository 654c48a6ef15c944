import { type Diagnostic, error, errorCount, warning } from "./diagnostic.ts";
import {
  type Fields,
  readChoice,
  readFields,
  readId,
  readList,
  readQuantity,
  readText,
  textOf,
} from "./fields.ts";
import { checkMassiveProperties, positive } from "./materialBlock.ts";
import { describeCodePoints } from "./quantity.ts";
import type { HeatFlowDirection, LimitSpec, MaterialLookup, ResolvedLayer } from "./model.ts";
import { defaultSurfaceResistances } from "../materials/surfaceResistance.ts";
import { attachLayerExtras } from "./bridgeSyntax.ts";
import { applyBridges } from "./bridgedLayers.ts";
import { readLimits } from "./limitsSyntax.ts";
import type { Position } from "./position.ts";
import { didYouMean } from "./suggest.ts";
import type { YamlValue } from "./yamlTree.ts";

export const CONSTRUCTION_KEYS = [
  "id",
  "name",
  "layers",
  "outside-surface-resistance",
  "inside-surface-resistance",
  "heat-flow",
  "timestep",
  "limits",
] as const;

export const LAYER_KEYS = [
  "material",
  "name",
  "thickness",
  "conductivity",
  "density",
  "specific-heat",
  "resistance",
  "source",
  "bridge",
  "corrections",
] as const;

export const HEAT_FLOWS: readonly HeatFlowDirection[] = ["horizontal", "upward", "downward"];

/** A construction block as written, before defaults are filled. */
export interface ConstructionDraft {
  readonly id: string;
  readonly name: string;
  readonly layers: readonly ResolvedLayer[];
  readonly heatFlow?: HeatFlowDirection;
  readonly outsideResistance?: number;
  readonly insideResistance?: number;
  readonly timestepS?: number;
  /** Code limits written on this construction (they override project-wide ones of the same key). */
  readonly limits?: readonly LimitSpec[];
  readonly at: Position;
}

export type { MaterialLookup } from "./model.ts";

const MAX_LAYERS = 40;
const WARN_THICKNESS_M = 1;
const MAX_THICKNESS_M = 3;
/**
 * The thinnest massive layer accepted, m. Membranes and boards are 0.1 mm and more (a polyethylene vapour control
 * layer is 0.15–0.25 mm, from memory); a foil or paint film below it stores and resists next to nothing and is
 * left out (common practice, no source). Thinner cells made the state-space reciprocity fail on roundoff in the
 * scratch sweep (1 µm layers, 2026-12-03).
 */
export const MIN_THICKNESS_M = 1e-4;

/** Reads a `construction` block and resolves its layers against the materials. */
export function readConstructionBlock(
  value: YamlValue,
  materials: MaterialLookup,
  out: Diagnostic[],
): ConstructionDraft | undefined {
  const fields = readFields(value, CONSTRUCTION_KEYS, "construction block", out);
  if (fields === undefined) return undefined;
  const before = errorCount(out);
  const id = readId(fields, "id", out);
  const name = readText(fields, "name", out) ?? id?.id ?? "";
  const heatFlow = readChoice(fields, "heat-flow", HEAT_FLOWS, out);
  const outsideResistance = readQuantity(fields, "outside-surface-resistance", "resistance", out);
  const insideResistance = readQuantity(fields, "inside-surface-resistance", "resistance", out);
  const timestepS = readTimestep(fields, out);
  surfaceResistanceFloor(fields, "outside-surface-resistance", outsideResistance, out);
  surfaceResistanceFloor(fields, "inside-surface-resistance", insideResistance, out);
  const items = readList(fields, "layers", out, true);
  const label = id?.id ?? "construction";
  const layers: ResolvedLayer[] = [];
  if (items !== undefined && items.length === 0) {
    out.push(
      error(
        fields.entries.get("layers")?.value.at ?? fields.at,
        "no-layers",
        `Construction "${label}" has no layers`,
        "list at least one layer, outside to inside, e.g. `- { material: dense-concrete, thickness: 200 mm }`",
      ),
    );
  }
  if (items !== undefined && items.length > MAX_LAYERS) {
    out.push(
      error(
        fields.entries.get("layers")?.value.at ?? fields.at,
        "too-many-layers",
        `Construction "${label}" has ${items.length} layers: at most ${MAX_LAYERS} are accepted`,
        "merge thin similar layers",
      ),
    );
  }
  items?.slice(0, MAX_LAYERS).forEach((item, index) => {
    const what = `layer ${index + 1} of ${label}`;
    const layer = attachLayerExtras(item, readLayer(item, what, materials, out), what, materials, out);
    if (layer !== undefined) layers.push(layer);
  });
  const limitsEntry = fields.entries.get("limits");
  const limits = limitsEntry === undefined
    ? undefined
    : readLimits(limitsEntry.value, label, "construction", out);
  if (errorCount(out) > before || id === undefined) return undefined;
  const surfaces = defaultSurfaceResistances(heatFlow ?? "horizontal");
  const resolvedLayers = applyBridges(
    layers,
    outsideResistance ?? surfaces.outsideM2KPerW,
    insideResistance ?? surfaces.insideM2KPerW,
    label,
    out,
  );
  if (errorCount(out) > before) return undefined;
  return {
    id: id.id,
    name,
    layers: resolvedLayers,
    ...(limits === undefined ? {} : { limits }),
    at: fields.at,
    ...(heatFlow === undefined ? {} : { heatFlow }),
    ...(outsideResistance === undefined ? {} : { outsideResistance }),
    ...(insideResistance === undefined ? {} : { insideResistance }),
    ...(timestepS === undefined ? {} : { timestepS }),
  };
}

/** Reads a timestep that divides one hour, 5 min to 1 h. */
export function readTimestep(fields: Fields, out: Diagnostic[]): number | undefined {
  const seconds = readQuantity(fields, "timestep", "time", out);
  if (seconds === undefined) return undefined;
  const stepsPerHour = 3600 / seconds;
  if (!(seconds >= 300 && seconds <= 3600) || Math.abs(stepsPerHour - Math.round(stepsPerHour)) > 1e-9) {
    out.push(
      error(
        fields.entries.get("timestep")?.value.at ?? fields.at,
        "bad-timestep",
        `Cannot use a timestep of ${seconds} s: it must divide one hour and be between 5 min and 1 h`,
        "write e.g. `timestep: 1 h`, `30 min`, `15 min` or `10 min`",
      ),
    );
    return undefined;
  }
  return seconds;
}

/**
 * The smallest surface resistance accepted, m²·K/W. ISO 6946:2017 Annex C gives R_se ≈ 0.02 at 10 m/s
 * wind (h_c = 4 + 4v, from memory); half of that leaves a margin. Zero would make h = 1/R infinite.
 */
export const MIN_SURFACE_RESISTANCE = 0.01;

function surfaceResistanceFloor(
  fields: Fields,
  key: string,
  value: number | undefined,
  out: Diagnostic[],
): void {
  if (value !== undefined && !(value >= MIN_SURFACE_RESISTANCE)) {
    out.push(
      error(
        fields.entries.get(key)?.value.at ?? fields.at,
        "surface-resistance-too-small",
        `Expected ${key} of at least ${MIN_SURFACE_RESISTANCE} m^2 K/W, found ${value} m^2 K/W`,
        `a surface film in air has R ≥ 0.02 m^2 K/W even at 10 m/s wind (ISO 6946:2017 Annex C, from memory); give the film's resistance here rather than as a layer`,
      ),
    );
  }
}

function readLayer(
  value: YamlValue,
  what: string,
  materials: MaterialLookup,
  out: Diagnostic[],
): ResolvedLayer | undefined {
  const fields = readFields(value, LAYER_KEYS, what, out);
  if (fields === undefined) return undefined;
  const before = errorCount(out);
  const materialEntry = fields.entries.get("material");
  const thickness = readQuantity(fields, "thickness", "length", out);
  const thicknessAt = fields.entries.get("thickness")?.value.at ?? fields.at;
  if (thickness !== undefined) checkThickness(thickness, thicknessAt, what, out);
  const ownSource = readText(fields, "source", out);
  if (materialEntry !== undefined) {
    const inlineKeys = ["conductivity", "density", "specific-heat", "resistance"].filter((k) =>
      fields.entries.has(k)
    );
    if (inlineKeys.length > 0) {
      out.push(
        error(
          fields.entries.get(inlineKeys[0] ?? "")?.keyAt ?? fields.at,
          "layer-overrides-material",
          `The ${what} names a material and also gives ${inlineKeys.join(", ")}`,
          "either refer to a material (material + thickness) or describe the layer inline, not both",
        ),
      );
      return undefined;
    }
    const materialId = textOf(materialEntry.value, `"material" in the ${what}`, out);
    if (materialId === undefined) return undefined;
    const material = materials.find(materialId);
    if (material === undefined && materials.isBroken?.(materialId) === true) return undefined;
    if (material === undefined) {
      out.push(
        error(
          materialEntry.value.at,
          "unknown-material",
          `Unknown material "${describeCodePoints(materialId)}" in the ${what}`,
          `${
            didYouMean(materialId, materials.ids(), "materials")
          } Otherwise define it in a \`material\` block or use a built-in id (\`fluxnote materials\` lists them)`,
        ),
      );
      return undefined;
    }
    const name = readText(fields, "name", out) ?? material.name;
    const common = { name, materialId, source: ownSource ?? material.source, at: fields.at };
    if (material.resistance !== undefined) {
      if (thickness !== undefined) {
        out.push(
          error(
            thicknessAt,
            "thickness-on-resistive",
            `The ${what} uses the massless material "${materialId}" and gives a thickness`,
            "remove `thickness`: a massless material is described by its resistance alone",
          ),
        );
        return undefined;
      }
      return errorCount(out) > before
        ? undefined
        : { kind: "resistive", resistance: material.resistance, ...common };
    }
    if (!fields.entries.has("thickness")) {
      out.push(
        error(
          fields.at,
          "missing-key",
          `Missing required key "thickness" in the ${what}`,
          "add e.g. `thickness: 100 mm`",
        ),
      );
      return undefined;
    }
    if (errorCount(out) > before || thickness === undefined) return undefined;
    return {
      kind: "massive",
      thicknessM: thickness,
      conductivity: material.conductivity ?? NaN,
      density: material.density ?? NaN,
      specificHeat: material.specificHeat ?? NaN,
      ...common,
    };
  }
  const name = readText(fields, "name", out, { example: "lining" });
  const source = ownSource ?? "";
  if (fields.entries.has("resistance")) {
    const resistance = readQuantity(fields, "resistance", "resistance", out);
    positive(fields.entries.get("resistance")?.value.at, "resistance", resistance, out);
    const extra = ["thickness", "conductivity", "density", "specific-heat"].filter((k) =>
      fields.entries.has(k)
    );
    if (extra.length > 0) {
      out.push(
        error(
          fields.entries.get(extra[0] ?? "")?.keyAt ?? fields.at,
          "mixed-layer",
          `The ${what} gives a resistance and also ${extra.join(", ")}`,
          "a massless layer gives only `name` and `resistance`; a massive layer gives thickness, conductivity, density and specific-heat",
        ),
      );
    }
    if (errorCount(out) > before || name === undefined || resistance === undefined) return undefined;
    return { kind: "resistive", resistance, name, source, at: fields.at };
  }
  const conductivity = readQuantity(fields, "conductivity", "conductivity", out, true);
  const density = readQuantity(fields, "density", "density", out, true);
  const specificHeat = readQuantity(fields, "specific-heat", "specificHeat", out, true);
  if (thickness === undefined && !fields.entries.has("thickness")) {
    out.push(
      error(
        fields.at,
        "missing-key",
        `Missing required key "thickness" in the ${what}`,
        "add e.g. `thickness: 13 mm`",
      ),
    );
  }
  checkMassiveProperties(fields, conductivity, density, specificHeat, out);
  if (
    errorCount(out) > before || name === undefined || thickness === undefined || conductivity === undefined ||
    density === undefined || specificHeat === undefined
  ) return undefined;
  return {
    kind: "massive",
    thicknessM: thickness,
    conductivity,
    density,
    specificHeat,
    name,
    source,
    at: fields.at,
  };
}

function checkThickness(thicknessM: number, at: Position, what: string, out: Diagnostic[]): void {
  if (!(thicknessM > 0)) {
    out.push(
      error(
        at,
        "not-positive",
        `Expected a positive thickness for the ${what}, found ${thicknessM} m`,
        "remove the layer or give its real thickness, e.g. `thickness: 10 mm`",
      ),
    );
  } else if (thicknessM < MIN_THICKNESS_M) {
    out.push(
      error(
        at,
        "thickness-too-small",
        `Thickness ${
          Number(thicknessM.toPrecision(6))
        } m of the ${what} is less than ${MIN_THICKNESS_M} m (0.1 mm)`,
        "check the unit (mm, not m); leave out a foil or film thinner than 0.1 mm: it stores and resists next to nothing",
      ),
    );
  } else if (thicknessM > MAX_THICKNESS_M) {
    out.push(
      error(
        at,
        "thickness-too-large",
        `Thickness ${thicknessM} m of the ${what} is more than ${MAX_THICKNESS_M} m`,
        "check the unit: did you mean mm? (write e.g. `200 mm`)",
      ),
    );
  } else if (thicknessM > WARN_THICKNESS_M) {
    out.push(
      warning(
        at,
        "thickness-large",
        `Thickness ${thicknessM} m of the ${what} is more than ${WARN_THICKNESS_M} m`,
        "check the unit: did you mean mm?",
      ),
    );
  }
}
