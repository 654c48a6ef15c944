import { LIBRARY_MATERIALS } from "../materials/library.ts";
import { listingJsonRow, listLibraryMaterials } from "../materials/libraryListing.ts";
import { listingTextLines } from "../materials/listingText.ts";
import type { CommandIo } from "./commandIo.ts";

export interface MaterialsOptions {
  /** Only entries of this material class (an id of src/materials/classes.ts). */
  readonly materialClass?: string;
  /** Only entries whose id or name holds this text, case-insensitive. */
  readonly search?: string;
  readonly format: "text" | "json";
}

/**
 * Lists the built-in materials library. Exit codes: 0 listed; 1 nothing matched (an explaining line on stderr;
 * `[]` on stdout for JSON); 2 an unknown class (with the list of classes).
 */
export function runMaterials(options: MaterialsOptions, io: CommandIo): Promise<number> {
  const query = {
    ...(options.materialClass === undefined ? {} : { materialClass: options.materialClass }),
    ...(options.search === undefined ? {} : { search: options.search }),
  };
  const listing = listLibraryMaterials(query);
  if (!listing.ok) {
    io.stderr(
      `fluxnote materials: unknown class "${listing.unknownClass}"; use one of: ${
        listing.classes.join(", ")
      }`,
    );
    return Promise.resolve(2);
  }
  if (options.format === "json") io.stdout(JSON.stringify(listing.rows.map(listingJsonRow), null, 2));
  if (listing.rows.length === 0) {
    const what = [
      options.materialClass === undefined ? "" : `of class "${options.materialClass}"`,
      options.search === undefined ? "" : `with "${options.search}" in its id or name`,
    ].filter((s) => s !== "").join(" and ");
    io.stderr(`fluxnote materials: no built-in material ${what}`);
    return Promise.resolve(1);
  }
  if (options.format === "text") {
    const width = Deno.stdout.isTerminal() ? Deno.consoleSize().columns : undefined;
    for (const line of listingTextLines(listing.rows, LIBRARY_MATERIALS.length, width)) io.stdout(line);
  }
  return Promise.resolve(0);
}
