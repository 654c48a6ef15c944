/** Fragment ids of the rooms' outputs (`rm-` prefix, collision-free like those of constructions and scenarios). */
import type { Model } from "../../project/model.ts";

const cache = new WeakMap<Model, ReadonlyMap<string, string>>();

/** The anchor of each room's output, by room id, in model order. */
export function roomAnchors(model: Model): ReadonlyMap<string, string> {
  const known = cache.get(model);
  if (known !== undefined) return known;
  const anchors = new Map<string, string>();
  const used = new Set<string>();
  for (const room of model.rooms ?? []) {
    const slug = room.id.toLowerCase().replace(/[^a-z0-9]+/g, "-").replace(/^-+|-+$/g, "") || "room";
    let id = `rm-${slug}`;
    for (let n = 2; used.has(id); n++) id = `rm-${slug}-${n}`;
    used.add(id);
    if (!anchors.has(room.id)) anchors.set(room.id, id);
  }
  cache.set(model, anchors);
  return anchors;
}

/** The anchor of one room's output. */
export function roomAnchor(model: Model, id: string): string {
  return roomAnchors(model).get(id) ?? "rm-room";
}

/** The room's heat loss table, nested under the room in the contents. */
export function roomHeatLossAnchor(anchor: string): string {
  return `${anchor}-heat-loss`;
}

/** The room's part of Appendix E. */
export function roomHourlyAnchor(anchor: string): string {
  return `e-${anchor}`;
}
