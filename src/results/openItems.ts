/**
 * The open items of results.json `summary.openItems`: values from memory or not yet confirmed, synthetic data,
 * failed checks, defaults in use (one item per kind of default), unmet limits, the user's open points and the
 * findings the user acknowledged. Each item has a stable id that `acknowledged:` in the front matter can name.
 */
import type { Diagnostic } from "../project/diagnostic.ts";
import type { Assumption, Model } from "../project/model.ts";
import { formatPosition, type Position } from "../project/position.ts";
import type { Acknowledgement } from "../project/signOff.ts";
import { findingsAcknowledgedBy } from "../project/acknowledgedFindings.ts";
import type { LimitResult } from "./limitResults.ts";
import { BLOCKING_KINDS, type OpenItem, type OpenItemKind } from "./summaryTypes.ts";
import { syntheticScenarios } from "./syntheticWeather.ts";
import type { ResultsJson } from "./types.ts";

/** A source text that says its values are recalled, not read, or still to be confirmed. */
export const UNCONFIRMED_SOURCE = /from memory|unconfirmed|not (yet )?confirmed|to be confirmed/i;

type Draft = { readonly id: string; readonly kind: OpenItemKind; readonly text: string; readonly at: string };

/** Collects every open item of a computed project, each marked blocking and acknowledged as it is. */
export function collectOpenItems(
  model: Model,
  results: ResultsJson,
  findings: readonly Diagnostic[],
): OpenItem[] {
  const drafts = [
    ...fromMemoryItems(model, results),
    ...syntheticItems(model, results),
    ...failedCheckItems(model, results),
    ...defaultItems(results.assumptions),
    ...unmetLimitItems(results),
    ...(model.info.openPoints ?? []).map((p, i): Draft => ({
      id: `open-point:${i + 1}`,
      kind: "open-point",
      text: p.text,
      at: p.at,
    })),
    ...acknowledgedFindingItems(model.info.acknowledged ?? [], findings),
  ];
  const acks = model.info.acknowledged ?? [];
  return unique(drafts).map((d) => {
    const ack = acks.find((a) => a.item === d.id || a.item === d.kind);
    return {
      ...d,
      blocking: BLOCKING_KINDS.includes(d.kind),
      acknowledged: ack === undefined ? null : { reason: ack.reason, by: ack.by, at: formatPosition(ack.at) },
    };
  });
}

function unique(drafts: readonly Draft[]): Draft[] {
  const seen = new Set<string>();
  return drafts.filter((d) => !seen.has(d.id) && seen.add(d.id) !== undefined);
}

function fromMemoryItems(model: Model, results: ResultsJson): Draft[] {
  const items: Draft[] = [];
  const add = (id: string, what: string, source: string, at: Position | string) => {
    if (!UNCONFIRMED_SOURCE.test(source)) return;
    items.push({
      id: `from-memory-source:${id}`,
      kind: "from-memory-source",
      text: `${what}: source "${source}" is from memory or not yet confirmed`,
      at: typeof at === "string" ? at : formatPosition(at),
    });
  };
  for (const m of model.materials) {
    add(
      `material:${m.id}`,
      `Material ${m.id} (${m.name})`,
      m.source,
      m.origin === "project" ? m.at : firstUse(model, m.id) ?? m.at,
    );
  }
  for (const c of model.constructions) {
    c.layers.forEach((layer, i) => {
      if (layer.materialId === undefined && layer.bridge === undefined) {
        add(`layer:${c.id}/${i + 1}`, `Layer ${i + 1} of ${c.id} (${layer.name})`, layer.source, layer.at);
      }
      if (layer.bridge !== undefined) {
        for (const part of [layer.bridge.base, layer.bridge.bridge]) {
          if (part.materialId !== undefined) continue;
          add(
            `layer:${c.id}/${i + 1}/${part.name}`,
            `${part.name} in layer ${i + 1} of ${c.id}`,
            part.source,
            layer.bridge.at,
          );
        }
      }
      if (layer.corrections !== undefined) {
        add(
          `corrections:${c.id}/${i + 1}`,
          `Corrections of layer ${i + 1} of ${c.id}`,
          layer.corrections.source,
          layer.corrections.at,
        );
      }
    });
  }
  for (const s of model.scenarios) {
    if (s.kind === "design-day" && s.radiantTimeSeries !== undefined) {
      add(
        `radiant-time-series:${s.id}`,
        `Radiant time series of ${s.id}`,
        s.radiantTimeSeries.source,
        s.radiantTimeSeries.at,
      );
    }
  }
  for (
    const [kind, group] of groupAssumptions(
      // A library material's assumption repeats its source, already listed with the material above.
      results.assumptions.filter((a) => !a.id.startsWith("library:") && UNCONFIRMED_SOURCE.test(a.source)),
    )
  ) {
    const first = group[0]!;
    items.push({
      id: `from-memory-source:${kind}`,
      kind: "from-memory-source",
      text: `${first.text} (applies to ${
        appliesTo(group)
      }): source "${first.source}" is from memory or not yet confirmed`,
      at: first.at,
    });
  }
  return items;
}

/** Where a library material is first used: the layer (or bridged layer) that names it. */
function firstUse(model: Model, materialId: string): Position | undefined {
  for (const c of model.constructions) {
    for (const layer of c.layers) {
      if (layer.materialId === materialId) return layer.at;
      const b = layer.bridge;
      if (b !== undefined && (b.base.materialId === materialId || b.bridge.materialId === materialId)) {
        return b.at;
      }
    }
  }
  return undefined;
}

function syntheticItems(model: Model, results: ResultsJson): Draft[] {
  const marks = syntheticScenarios(model, results);
  return model.scenarios.flatMap((s): Draft[] => {
    const mark = marks.get(s.id);
    return s.kind === "weather" && mark !== undefined
      ? [{
        id: `synthetic-data:${s.id}`,
        kind: "synthetic-data",
        text: `Weather of scenario ${s.id} (${s.weatherPath}) is synthetic${
          mark.from === "file" ? " (marked in the file's first comment)" : ""
        }${
          mark.note === "" ? "" : `: ${mark.note}`
        }; replace it with climate data before relying on the results`,
        at: formatPosition(s.weatherAt),
      }]
      : [];
  });
}

function failedCheckItems(model: Model, results: ResultsJson): Draft[] {
  return results.checks.filter((c) => !c.pass).map((c) => ({
    id: `failed-check:${c.id}:${c.subject}`,
    kind: "failed-check",
    text: `Computed check ${c.id} failed on ${c.subject}: ${c.value} > ${c.limit} (${c.description})`,
    at: subjectPosition(model, c.subject),
  }));
}

/** The block a check subject (`construction:<id>`, `scenario:<id>/<surface>`) points to. */
function subjectPosition(model: Model, subject: string): string {
  const [type, rest = ""] = subject.split(":", 2) as [string, string?];
  const [id, surface] = rest.split("/", 2);
  if (type === "construction") {
    const c = model.constructions.find((c) => c.id === id);
    if (c !== undefined) return formatPosition(c.at);
  }
  const s = model.scenarios.find((s) => s.id === id);
  if (s !== undefined) return formatPosition(s.surfaces.find((x) => x.id === surface)?.at ?? s.at);
  return "project.md:1:1";
}

/** Assumptions grouped by the kind of default: `default:<kind>:<subject>` → `default:<kind>`. */
function groupAssumptions(list: readonly Assumption[]): Map<string, Assumption[]> {
  const groups = new Map<string, Assumption[]>();
  for (const a of list) {
    const parts = a.id.split(":");
    const key = parts[0] === "default" && parts.length > 2 ? `default:${parts[1]}` : `assumption:${a.id}`;
    groups.set(key, [...(groups.get(key) ?? []), a]);
  }
  return groups;
}

function appliesTo(group: readonly Assumption[]): string {
  const subjects = group.map((a) => a.id.split(":").slice(2).join(":") || a.at);
  return [...new Set(subjects)].join(", ");
}

function defaultItems(assumptions: readonly Assumption[]): Draft[] {
  const defaults = assumptions.filter((a) => a.id.startsWith("default:"));
  return [...groupAssumptions(defaults)].map(([key, group]) => ({
    id: `default-in-use:${key.replace(/^default:/, "")}`,
    kind: "default-in-use",
    text: `Default ${key.replace(/^default:/, "").replaceAll("-", " ")} in use (applies to ${
      appliesTo(group)
    }); e.g. ${group[0]!.text}`,
    at: group[0]!.at,
  }));
}

function unmetLimitItems(results: ResultsJson): Draft[] {
  return Object.values(results.constructions).flatMap((c) =>
    ((c["limits"] ?? []) as readonly LimitResult[]).filter((l) => !l.pass).map((l): Draft => ({
      id: `unmet-limit:${l.id}`,
      kind: "unmet-limit",
      text: `Limit ${l.limitKey} not met by ${l.id.split(":").slice(1).join(":")}: ${
        l.value === null ? "not computed" : `${Number(l.value.toPrecision(3))} ${l.unit}`
      } against ${l.limit} ${l.unit} (${l.clause})`,
      at: l.at,
    }))
  );
}

/**
 * `acknowledged: [{ rule, subject }]` (or `item: finding:<rule>[:<subject>]`) records the review findings it names
 * as seen and accepted: one open item per acknowledgement that matches a warning or a note.
 */
function acknowledgedFindingItems(
  acks: readonly Acknowledgement[],
  findings: readonly Diagnostic[],
): Draft[] {
  return acks.flatMap((a): Draft[] => {
    const hits = findingsAcknowledgedBy(a, findings);
    if (a.finding === undefined || hits.length === 0) return [];
    const { rule, subject } = a.finding;
    return [{
      id: a.item,
      kind: "acknowledged-finding",
      text: subject === undefined
        ? `Finding ${rule} (${hits.length}×), e.g. ${hits[0]!.message}`
        : `Finding ${rule} for ${subject}${hits.length > 1 ? ` (${hits.length}×), e.g.` : ":"} ${
          hits[0]!.message
        }`,
      at: formatPosition(hits[0]!.at),
    }];
  });
}
