import type { Construction, Model, ResolvedLayer, ScenarioSurface } from "../project/model.ts";
import type { Position } from "../project/position.ts";
import { alignByKey } from "./align.ts";
import {
  constructionFields,
  type Field,
  heatingFields,
  infoFields,
  layerFields,
  materialFields,
  scenarioFields,
  surfaceFields,
} from "./fields.ts";
import { locate, type SourceLines, where } from "./locate.ts";
import type { Change, ChangeSection, FieldValue } from "./types.ts";

/** One side's model and source lines, as the comparison needs them. */
export interface InputSide {
  readonly model: Model;
  readonly lines: SourceLines;
}

/** Where an input starts and whether it is a one-line list item. */
interface Anchor {
  readonly at: Position;
  readonly inline: boolean;
}

interface Subject {
  readonly section: ChangeSection;
  readonly subject: string;
  readonly part: string | null;
}

function sameValue(a: FieldValue, b: FieldValue): boolean {
  return Array.isArray(a) || Array.isArray(b) ? JSON.stringify(a) === JSON.stringify(b) : a === b;
}

function compareFields(
  s: Subject,
  a: { side: InputSide; fields: readonly Field[]; anchor: Anchor },
  b: { side: InputSide; fields: readonly Field[]; anchor: Anchor },
): Change[] {
  const oldByKey = new Map(a.fields.map((f) => [f.key, f]));
  const newByKey = new Map(b.fields.map((f) => [f.key, f]));
  const keys = [...b.fields.map((f) => f.key), ...a.fields.map((f) => f.key).filter((k) => !newByKey.has(k))];
  const out: Change[] = [];
  for (const key of keys) {
    const o = oldByKey.get(key);
    const n = newByKey.get(key);
    if (o !== undefined && n !== undefined && sameValue(o.value, n.value)) continue;
    out.push({
      ...s,
      key,
      change: o === undefined ? "added" : n === undefined ? "removed" : "changed",
      old: o?.value ?? null,
      new: n?.value ?? null,
      unit: (n ?? o)?.unit ?? "",
      oldAt: o === undefined ? null : locate(a.side.lines, a.anchor.at, o, a.anchor.inline),
      newAt: n === undefined ? null : locate(b.side.lines, b.anchor.at, n, b.anchor.inline),
    });
  }
  return out;
}

function wholeChange(s: Subject, kind: "added" | "removed", summary: string, at: Position): Change {
  return {
    ...s,
    key: null,
    change: kind,
    old: kind === "removed" ? summary : null,
    new: kind === "added" ? summary : null,
    unit: "",
    oldAt: kind === "removed" ? where(at) : null,
    newAt: kind === "added" ? where(at) : null,
  };
}

/** Compares two lists of items with ids: items on one side only are added or removed, the others key by key. */
export function compareById<T extends { readonly id: string; readonly at: Position }>(
  section: ChangeSection,
  a: { side: InputSide; items: readonly T[] },
  b: { side: InputSide; items: readonly T[] },
  fieldsOf: (item: T, side: InputSide) => Field[],
  summary: (item: T) => string,
  nested: (subject: string, o: T, n: T) => Change[] = () => [],
  part: (id: string) => Pick<Subject, "subject" | "part"> = (id) => ({ subject: id, part: null }),
  inline = false,
): Change[] {
  const oldById = new Map(a.items.map((item) => [item.id, item]));
  const newIds = new Set(b.items.map((item) => item.id));
  const out: Change[] = [];
  for (const n of b.items) {
    const o = oldById.get(n.id);
    const s: Subject = { section, ...part(n.id) };
    if (o === undefined) {
      out.push(wholeChange(s, "added", summary(n), n.at));
      continue;
    }
    out.push(
      ...compareFields(
        s,
        { side: a.side, fields: fieldsOf(o, a.side), anchor: { at: o.at, inline } },
        { side: b.side, fields: fieldsOf(n, b.side), anchor: { at: n.at, inline } },
      ),
      ...nested(n.id, o, n),
    );
  }
  for (const o of a.items) {
    if (!newIds.has(o.id)) out.push(wholeChange({ section, ...part(o.id) }, "removed", summary(o), o.at));
  }
  return out;
}

function layerKey(layer: ResolvedLayer): string {
  return layer.materialId === undefined ? `inline:${layer.name}` : `material:${layer.materialId}`;
}

function layerSummary(layer: ResolvedLayer): string {
  const what = layer.materialId ?? layer.name;
  return layer.kind === "massive"
    ? `${what}, ${Number((layer.thicknessM * 1000).toPrecision(12))} mm`
    : `${what}, R = ${layer.resistance} m²·K/W`;
}

function fieldsOfLayer(layer: ResolvedLayer, side: InputSide): Field[] {
  const material = side.model.materials.find((m) => m.id === layer.materialId);
  return layerFields(layer, material?.name, material?.source);
}

/** Compares the layers of a construction, aligned on their materials so an inserted layer shifts no others. */
function compareLayers(a: InputSide, b: InputSide, id: string, o: Construction, n: Construction): Change[] {
  const out: Change[] = [];
  for (const pair of alignByKey(o.layers.map(layerKey), n.layers.map(layerKey))) {
    const ol = pair.old === null ? undefined : o.layers[pair.old];
    const nl = pair.new === null ? undefined : n.layers[pair.new];
    const label = pair.old === null || pair.new === null || pair.old === pair.new
      ? `layer ${(pair.new ?? pair.old ?? 0) + 1}`
      : `layer ${pair.old + 1} → ${pair.new + 1}`;
    const s: Subject = { section: "construction", subject: id, part: label };
    if (ol === undefined && nl !== undefined) out.push(wholeChange(s, "added", layerSummary(nl), nl.at));
    else if (nl === undefined && ol !== undefined) {
      out.push(wholeChange(s, "removed", layerSummary(ol), ol.at));
    } else if (ol !== undefined && nl !== undefined) {
      out.push(
        ...compareFields(
          s,
          { side: a, fields: fieldsOfLayer(ol, a), anchor: { at: ol.at, inline: true } },
          { side: b, fields: fieldsOfLayer(nl, b), anchor: { at: nl.at, inline: true } },
        ),
      );
    }
  }
  return out;
}

function frontMatterAnchor(): Anchor {
  return { at: { file: "project.md", line: 2, col: 1 }, inline: false };
}

/** Lists every changed input key of the two models: front matter, materials, constructions, scenarios. */
export function compareInputs(a: InputSide, b: InputSide): Change[] {
  const project = compareFields(
    { section: "project", subject: "project.md", part: null },
    { side: a, fields: infoFields(a.model.info), anchor: frontMatterAnchor() },
    { side: b, fields: infoFields(b.model.info), anchor: frontMatterAnchor() },
  );
  const materials = compareById(
    "material",
    { side: a, items: a.model.materials },
    { side: b, items: b.model.materials },
    (m) => materialFields(m),
    (m) => m.name,
  );
  const constructions = compareById(
    "construction",
    { side: a, items: a.model.constructions },
    { side: b, items: b.model.constructions },
    (c) => constructionFields(c),
    (c) => c.name,
    (id, o, n) => compareLayers(a, b, id, o, n),
  );
  const compareSurfaces = (
    id: string,
    before: readonly ScenarioSurface[],
    after: readonly ScenarioSurface[],
  ) =>
    compareById(
      "scenario",
      { side: a, items: before },
      { side: b, items: after },
      (surface) => surfaceFields(surface),
      (surface) => `surface on ${surface.construction}, ${surface.areaM2} m²`,
      () => [],
      (surfaceId) => ({ subject: id, part: `surface ${surfaceId}` }),
      true,
    );
  const scenarios = compareById(
    "scenario",
    { side: a, items: a.model.scenarios },
    { side: b, items: b.model.scenarios },
    (s) => scenarioFields(s),
    (s) => `${s.kind} scenario`,
    (id, o, n) => compareSurfaces(id, o.surfaces, n.surfaces),
  );
  const heating = compareById(
    "scenario",
    { side: a, items: a.model.heatingScenarios ?? [] },
    { side: b, items: b.model.heatingScenarios ?? [] },
    (h) => heatingFields(h),
    () => "heating scenario",
    (id, o, n) => compareSurfaces(id, o.surfaces, n.surfaces),
  );
  return [...project, ...materials, ...constructions, ...scenarios, ...heating];
}
