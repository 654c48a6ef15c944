/**
 * Provenance rules: project materials and inline layers without a `source`, and one note per default the
 * tool filled in (assumption ids starting `default:`).
 */

import type { Diagnostic } from "../project/diagnostic.ts";
import type { Model } from "../project/model.ts";
import type { ResultsJson } from "../results/types.ts";
import { finding } from "./finding.ts";
import { parsePosition } from "../project/position.ts";
import { proseBefore } from "./orderRules.ts";
import { layerLabel, layerSubject } from "./subjects.ts";

const PROVENANCE_SOURCE =
  "common practice, no source: a reviewable calculation names the reference of every input value";

/** Words that make a sentence a citation: a standard, a handbook, a table, a survey or a product document. */
const CITATION =
  /\b(ISO|EN|BS|DIN|ASTM|CIBSE|ASHRAE|table|survey|report|datasheet|data sheet|declaration)\b/i;

/** Checks that every project value names its source, and lists the defaults used. */
export function reviewProvenance(model: Model, results?: ResultsJson): Diagnostic[] {
  const out: Diagnostic[] = [];
  for (const m of model.materials) {
    if (m.origin !== "project" || m.source.trim() !== "") continue;
    out.push(finding({
      severity: "warning",
      at: m.at,
      subject: m.id,
      rule: "source-missing",
      message: `Material "${m.id}" gives no source for its values`,
      hint:
        "add `source:` naming the document, edition and table, or the product declaration; mark values from memory as such",
      value: "source: (none)",
      expected: 'a document, edition and table, a product declaration, or "from memory"',
      source: PROVENANCE_SOURCE,
    }));
  }
  for (const c of model.constructions) {
    const prose = proseBefore(model, c);
    c.layers.forEach((layer, index) => {
      if (layer.materialId !== undefined || layer.source.trim() !== "") return;
      const cited = prose.split(/(?<=[.;])\s+/).some((sentence) =>
        sentence.toLowerCase().includes(layer.name.toLowerCase()) && CITATION.test(sentence)
      );
      out.push(finding({
        severity: cited ? "note" : "warning",
        at: layer.at,
        subject: layerSubject(c, index),
        rule: cited ? "source-in-prose-only" : "source-missing",
        message: cited
          ? `The inline ${layerLabel(c, index)} cites its source only in the prose above the block`
          : `The inline ${layerLabel(c, index)} gives no source for its values`,
        hint: "add `source:` to the layer so the package's sources table lists it",
        value: "source: (none)",
        expected: 'a document, edition and table, a product declaration, or "from memory"',
        source: PROVENANCE_SOURCE,
      }));
    });
  }
  const seen = new Set<string>();
  for (const a of results?.assumptions ?? model.assumptions) {
    if (!a.id.startsWith("default:") || seen.has(a.id)) continue;
    seen.add(a.id);
    out.push(finding({
      severity: "note",
      at: parsePosition(a.at),
      rule: "default-used",
      subject: a.id.slice("default:".length),
      message: `Default in use: ${a.text}`,
      hint: "state the value in the input if the default does not fit this element",
      value: a.id,
      source: a.source,
    }));
  }
  return out;
}
