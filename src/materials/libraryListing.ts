/**
 * The rows of `fluxnote materials`: built-in library entries filtered by class and by a search text, each with
 * its SI values and the confirmation state of its source. Pure: the command does the printing.
 */
import { MATERIAL_CLASSES } from "./classes.ts";
import { isResistiveLibraryMaterial, LIBRARY_MATERIALS, type LibraryMaterial } from "./library.ts";
import { type SourceConfirmation, sourceConfirmation } from "./sourceConfirmation.ts";

/** One listed library entry, SI values; a massive entry has λ, ρ, c and a massless one R. */
export type MaterialListingRow =
  & {
    readonly id: string;
    readonly name: string;
    readonly materialClass: string;
    readonly source: string;
    readonly confirmation: SourceConfirmation;
  }
  & (
    | {
      readonly kind: "massive";
      /** W/(m K) */
      readonly conductivity: number;
      /** kg/m^3 */
      readonly density: number;
      /** J/(kg K) */
      readonly specificHeat: number;
    }
    | {
      readonly kind: "resistive";
      /** m^2 K/W */
      readonly resistance: number;
    }
  );

/** What to list: entries of one class and/or entries whose id or name holds a text (case-insensitive). */
export interface MaterialListingQuery {
  readonly materialClass?: string;
  readonly search?: string;
}

/** The listing, or the refusal of a class the library does not know (with the classes it knows). */
export type MaterialListing =
  | { readonly ok: true; readonly rows: readonly MaterialListingRow[] }
  | { readonly ok: false; readonly unknownClass: string; readonly classes: readonly string[] };

/** The ids of the library's material classes, in the library's order. */
export function materialClassIds(): string[] {
  return MATERIAL_CLASSES.map((c) => c.id);
}

/** Lists the library entries that match the query, in library order. */
export function listLibraryMaterials(
  query: MaterialListingQuery,
  library: readonly LibraryMaterial[] = LIBRARY_MATERIALS,
): MaterialListing {
  const classes = materialClassIds();
  const wanted = query.materialClass;
  if (wanted !== undefined && !classes.includes(wanted)) {
    return { ok: false, unknownClass: wanted, classes };
  }
  const text = query.search?.trim().toLowerCase() ?? "";
  const rows = library
    .filter((m) => wanted === undefined || m.materialClass === wanted)
    .filter((m) => text === "" || m.id.toLowerCase().includes(text) || m.name.toLowerCase().includes(text))
    .map(listingRow);
  return { ok: true, rows };
}

function listingRow(m: LibraryMaterial): MaterialListingRow {
  const common = {
    id: m.id,
    name: m.name,
    materialClass: m.materialClass,
    source: m.source,
    confirmation: sourceConfirmation(m.source),
  };
  return isResistiveLibraryMaterial(m) ? { ...common, kind: "resistive", resistance: m.resistance } : {
    ...common,
    kind: "massive",
    conductivity: m.conductivity,
    density: m.density,
    specificHeat: m.specificHeat,
  };
}

/** One row as `--format json` writes it: every key in every object, SI units named in the keys, null where n/a. */
export function listingJsonRow(row: MaterialListingRow): Record<string, string | number | null> {
  const massive = row.kind === "massive" ? row : undefined;
  return {
    id: row.id,
    name: row.name,
    class: row.materialClass,
    kind: row.kind,
    conductivity_W_per_mK: massive?.conductivity ?? null,
    density_kg_per_m3: massive?.density ?? null,
    specificHeat_J_per_kgK: massive?.specificHeat ?? null,
    resistance_m2K_per_W: row.kind === "resistive" ? row.resistance : null,
    source: row.source,
    sourceConfirmation: row.confirmation,
  };
}
