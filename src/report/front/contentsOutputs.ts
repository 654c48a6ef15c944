/** The output blocks of one project file that the contents lists under the file's title, in input order. */
import type { ProjectDocument } from "../../project/model.ts";
import { coolingLoadAnchor, heatingAnchor, scenarioFigurePrefix } from "../page/anchors.ts";
import type { RenderContext } from "../page/packageInput.ts";
import { roomAnchor, roomHeatLossAnchor } from "../rooms/roomAnchors.ts";

/** One contents entry: the fragment it links to, its title and the entries nested under it. */
export interface ContentsOutput {
  readonly anchor: string;
  readonly title: string;
  readonly nested: readonly ContentsOutput[];
}

/**
 * Each construction's, scenario's, heating scenario's and room's output in `doc`, in block order, with a design
 * day's cooling load and a room's design heat loss nested under it. A block whose output is not placed (unresolved, or an id already used) has no entry.
 */
export function contentsOutputs(doc: ProjectDocument, ctx: RenderContext): ContentsOutput[] {
  const model = ctx.input.model;
  const out: ContentsOutput[] = [];
  const listed = new Set<string>();
  const add = (anchor: string, title: string, nested: ContentsOutput[] = []): void => {
    if (listed.has(anchor)) return;
    listed.add(anchor);
    out.push({ anchor, title, nested });
  };
  for (const segment of doc.segments) {
    if (segment.kind !== "block" || segment.id === undefined) continue;
    const id = segment.id;
    if (segment.blockKind === "construction") {
      const anchor = ctx.constructionAnchors.get(id);
      if (anchor !== undefined) add(anchor, `Results of construction ${id}`);
    } else if (segment.blockKind === "scenario") {
      if (model.heatingScenarios?.some((s) => s.id === id) === true) {
        add(heatingAnchor(id), `Results of heating scenario ${id}`);
        continue;
      }
      const anchor = ctx.scenarioAnchors.get(id);
      if (anchor === undefined) continue;
      const results = Object.hasOwn(ctx.input.results.scenarios, id)
        ? ctx.input.results.scenarios[id]
        : undefined;
      const coolingLoad = results?.coolingLoad === undefined ? [] : [{
        anchor: coolingLoadAnchor(scenarioFigurePrefix(anchor)),
        title: `Cooling load of ${id}`,
        nested: [],
      }];
      add(anchor, `Results of scenario ${id}`, coolingLoad);
    } else if (segment.blockKind === "room") {
      const results = ctx.input.results.rooms ?? {};
      if (model.rooms?.some((r) => r.id === id) !== true || !Object.hasOwn(results, id)) continue;
      const anchor = roomAnchor(model, id);
      const heatLoss = results[id]!.heating === undefined
        ? []
        : [{ anchor: roomHeatLossAnchor(anchor), title: `Design heat loss of ${id}`, nested: [] }];
      add(anchor, `Results of room ${id}`, heatLoss);
    }
  }
  return out;
}
