import type { LoadSource } from "../../engine/room/mod.ts";

/** The key of a load source in results.json `coolingLoad.bySource` (stable, readable). */
export function sourceLabel(source: LoadSource): string {
  switch (source.kind) {
    case "surface":
      return `surface:${source.id}`;
    case "gain":
      return `gain:${source.name}`;
    default:
      return source.kind;
  }
}
