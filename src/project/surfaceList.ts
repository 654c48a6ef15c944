import { type Diagnostic, error } from "./diagnostic.ts";
import { MAX_SURFACE_AREA, withinBound } from "./physicalBounds.ts";
import { type Fields, readId, readList, readQuantity, readText, withSuggestion } from "./fields.ts";
import type { Position } from "./position.ts";
import { describeCodePoints } from "./quantity.ts";
import type { YamlValue } from "./yamlTree.ts";

/** Reads a scenario's `surfaces` list with `readOne`, reporting an empty list and duplicate surface ids. */
export function readSurfaceList<T extends { readonly id: string; readonly at: Position }>(
  fields: Fields,
  example: string,
  out: Diagnostic[],
  readOne: (item: YamlValue, index: number) => T | undefined,
): T[] {
  const items = readList(fields, "surfaces", out, true) ?? [];
  if (items.length === 0 && fields.entries.has("surfaces")) {
    out.push(
      error(
        fields.entries.get("surfaces")?.value.at ?? fields.at,
        "no-surfaces",
        "The scenario has no surfaces",
        `list at least one surface: \`- ${example}\``,
      ),
    );
  }
  const surfaces: T[] = [];
  items.forEach((item, index) => {
    const surface = readOne(item, index);
    if (surface === undefined) return;
    if (surfaces.some((s) => s.id === surface.id)) {
      out.push(
        error(
          surface.at,
          "duplicate-id",
          `Duplicate surface id "${surface.id}" in the scenario`,
          "give each surface its own id",
        ),
      );
      return;
    }
    surfaces.push(surface);
  });
  return surfaces;
}

/** The keys every surface has: its id (and a label for messages), a known construction and a positive area. */
export function readSurfaceCore(
  surface: Fields,
  index: number,
  constructionIds: readonly string[],
  out: Diagnostic[],
): { id: string | undefined; label: string; construction: string | undefined; areaM2: number | undefined } {
  const id = readId(surface, "id", out)?.id;
  const label = id ?? String(index + 1);
  const construction = readKnownConstruction(surface, label, constructionIds, out);
  const areaM2 = readQuantity(surface, "area", "area", out, true);
  const areaAt = surface.entries.get("area")?.value.at ?? surface.at;
  withinBound(areaM2, MAX_SURFACE_AREA, "an area of", areaAt, out);
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
  return { id, label, construction, areaM2 };
}

/** A surface's `construction`: one of the project's, else reported (with the nearest id) and undefined. */
export function readKnownConstruction(
  surface: Fields,
  label: string,
  constructionIds: readonly string[],
  out: Diagnostic[],
): string | undefined {
  const construction = readText(surface, "construction", out, { example: "EW-1" });
  if (construction === undefined || constructionIds.includes(construction)) return construction;
  out.push(
    error(
      surface.entries.get("construction")?.value.at ?? surface.at,
      "unknown-construction",
      `Unknown construction "${describeCodePoints(construction)}" in surface ${label}`,
      withSuggestion(
        construction,
        constructionIds,
        `constructions defined: ${constructionIds.join(", ") || "none"}`,
      ),
    ),
  );
  return undefined;
}
