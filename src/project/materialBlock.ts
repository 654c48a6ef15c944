import { type Diagnostic, error, errorCount } from "./diagnostic.ts";
import { type Fields, readFields, readId, readQuantity, readText } from "./fields.ts";
import { withinDiffusivityRange, withinPropertyRange } from "./physicalBounds.ts";
import type { MaterialDef } from "./model.ts";
import type { YamlValue } from "./yamlTree.ts";

export const MATERIAL_KEYS = [
  "id",
  "name",
  "conductivity",
  "density",
  "specific-heat",
  "resistance",
  "source",
  "class",
] as const;

/** Reads a `material` block: either conductivity, density and specific heat, or a resistance. */
export function readMaterialBlock(value: YamlValue, out: Diagnostic[]): MaterialDef | undefined {
  const fields = readFields(value, MATERIAL_KEYS, "material block", out);
  if (fields === undefined) return undefined;
  const before = errorCount(out);
  const id = readId(fields, "id", out);
  const name = readText(fields, "name", out) ?? id?.id ?? "";
  const source = readText(fields, "source", out) ?? "";
  const materialClass = readText(fields, "class", out);
  const resistance = readQuantity(fields, "resistance", "resistance", out);
  const massive = ["conductivity", "density", "specific-heat"] as const;
  const given = massive.filter((key) => fields.entries.has(key));
  if (fields.entries.has("resistance") && given.length > 0) {
    out.push(
      error(
        fields.at,
        "mixed-material",
        `Material "${id?.id ?? "?"}" gives both a resistance and ${given.join(", ")}`,
        "a massless material gives only `resistance`; a massive one gives conductivity, density and specific-heat",
      ),
    );
    return undefined;
  }
  if (!fields.entries.has("resistance")) {
    const conductivity = readQuantity(fields, "conductivity", "conductivity", out, true);
    const density = readQuantity(fields, "density", "density", out, true);
    const specificHeat = readQuantity(fields, "specific-heat", "specificHeat", out, true);
    checkMassiveProperties(fields, conductivity, density, specificHeat, out);
    if (
      errorCount(out) > before || id === undefined || conductivity === undefined || density === undefined ||
      specificHeat === undefined
    ) return undefined;
    return {
      id: id.id,
      name,
      origin: "project",
      conductivity,
      density,
      specificHeat,
      source,
      at: fields.at,
      ...(materialClass === undefined ? {} : { materialClass }),
    };
  }
  positive(fields.entries.get("resistance")?.value.at, "resistance", resistance, out);
  if (errorCount(out) > before || id === undefined || resistance === undefined) return undefined;
  return {
    id: id.id,
    name,
    origin: "project",
    resistance,
    source,
    at: fields.at,
    ...(materialClass === undefined ? {} : { materialClass }),
  };
}

/** Reports a value that must be strictly positive. */
export function positive(
  at: Diagnostic["at"] | undefined,
  key: string,
  value: number | undefined,
  out: Diagnostic[],
): void {
  if (at !== undefined && value !== undefined && !(value > 0)) {
    out.push(
      error(
        at,
        "not-positive",
        `Expected a positive ${key}, found ${value}`,
        `${key} must be greater than zero`,
      ),
    );
  }
}

/** Reports conductivity, density and specific heat that are not positive or outside any building material's range. */
export function checkMassiveProperties(
  fields: Fields,
  conductivity: number | undefined,
  density: number | undefined,
  specificHeat: number | undefined,
  out: Diagnostic[],
): void {
  const values = { conductivity, density, "specific-heat": specificHeat } as const;
  let inRange = true;
  for (const key of ["conductivity", "density", "specific-heat"] as const) {
    const at = fields.entries.get(key)?.value.at;
    positive(at, key, values[key], out);
    inRange = withinPropertyRange(values[key], key, at, out) && values[key] !== undefined &&
      values[key] > 0 &&
      inRange;
  }
  if (inRange && conductivity !== undefined && density !== undefined && specificHeat !== undefined) {
    withinDiffusivityRange(conductivity, density, specificHeat, fields.at, out);
  }
}
