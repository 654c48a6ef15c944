/**
 * The built-in materials library: common construction materials with SI values and a named source for
 * each entry. A project's `material` block with the same id overrides an entry.
 */
import { AIR_LAYER_MATERIALS } from "./libraryAirLayers.ts";
import { FINISH_MATERIALS } from "./libraryFinishes.ts";
import { INSULATION_MATERIALS } from "./libraryInsulation.ts";
import { MASONRY_MATERIALS } from "./libraryMasonry.ts";
import type { LibraryMaterial } from "./libraryMaterial.ts";
import { METAL_AND_SHEET_MATERIALS } from "./libraryMetalsAndSheets.ts";
import { TIMBER_MATERIALS } from "./libraryTimber.ts";

export type { LibraryMassiveMaterial, LibraryMaterial, LibraryResistiveMaterial } from "./libraryMaterial.ts";
export { isResistiveLibraryMaterial } from "./libraryMaterial.ts";

/** Every built-in library entry, grouped by class family in a fixed order. */
export const LIBRARY_MATERIALS: readonly LibraryMaterial[] = [
  ...MASONRY_MATERIALS,
  ...FINISH_MATERIALS,
  ...TIMBER_MATERIALS,
  ...INSULATION_MATERIALS,
  ...METAL_AND_SHEET_MATERIALS,
  ...AIR_LAYER_MATERIALS,
];

const BY_ID: ReadonlyMap<string, LibraryMaterial> = new Map(LIBRARY_MATERIALS.map((m) => [m.id, m]));

/** Returns the library entry with this id, or undefined when the library has none. */
export function findLibraryMaterial(id: string): LibraryMaterial | undefined {
  return BY_ID.get(id);
}

/** Returns the ids of all library entries, in library order. */
export function libraryIds(): string[] {
  return LIBRARY_MATERIALS.map((m) => m.id);
}

/**
 * Serialises a library entry canonically for hashing: JSON with keys sorted by code unit, no whitespace,
 * numbers in their shortest round-trip form (ECMAScript Number-to-String).
 */
export function canonicalLibraryEntry(m: LibraryMaterial): string {
  return canonicalJson(m, m.id);
}

function canonicalJson(value: unknown, entryId: string): string {
  if (typeof value === "number") {
    if (!Number.isFinite(value)) {
      throw new RangeError(`Cannot serialise library entry "${entryId}": non-finite number ${value}`);
    }
    return String(value);
  }
  if (typeof value === "string" || typeof value === "boolean") return JSON.stringify(value);
  if (Array.isArray(value)) return `[${value.map((v) => canonicalJson(v, entryId)).join(",")}]`;
  if (typeof value === "object" && value !== null) {
    const record = value as Record<string, unknown>;
    const keys = Object.keys(record).filter((k) => record[k] !== undefined).sort();
    const members = keys.map((k) => `${JSON.stringify(k)}:${canonicalJson(record[k], entryId)}`);
    return `{${members.join(",")}}`;
  }
  throw new TypeError(`Cannot serialise library entry "${entryId}": unsupported value type ${typeof value}`);
}
