/**
 * Layer-order rules: a construction described as externally (internally) insulated whose insulation sits
 * inside (outside) its heaviest layer, and a wall whose inside face is bare insulation.
 */

import type { Diagnostic } from "../project/diagnostic.ts";
import type { Construction, Model } from "../project/model.ts";
import { about, finding } from "./finding.ts";
import { INSULATION_MAX_CONDUCTIVITY } from "./limits.ts";
import { isInsulationLayer, layerLabel } from "./subjects.ts";

const EXTERNAL =
  /\bexternal(ly)?[\s-]+insulat|\bETICS\b|\bEWI\b|external thermal insulation|insulated (on the )?outside/i;
const INTERNAL =
  /\binternal(ly)?[\s-]+insulat|\bIWI\b|insulated (on the )?inside|dry[\s-]?lin(ed|ing) with insulat/i;
const ORDER_SOURCE =
  "common practice, no source: layers are listed outside → inside (fluxnote input convention); the described position must match the list";

/** The prose just before a construction's block, in its own file; empty when there is none. */
export function proseBefore(model: Model, construction: Construction): string {
  for (const doc of model.documents) {
    const index = doc.segments.findIndex((s) =>
      s.kind === "block" && s.blockKind === "construction" && s.id === construction.id
    );
    if (index < 0) continue;
    const previous = doc.segments[index - 1];
    return previous?.kind === "prose" ? previous.markdown : "";
  }
  return "";
}

/** Checks the order of insulation and mass in every construction. */
export function reviewOrder(model: Model): Diagnostic[] {
  const out: Diagnostic[] = [];
  for (const c of model.constructions) {
    out.push(...about(c.id, [...describedOrder(model, c), ...bareInsideInsulation(model, c)]));
  }
  return out;
}

function describedOrder(model: Model, c: Construction): Diagnostic[] {
  const text = `${c.name}\n${proseBefore(model, c)}`;
  const external = EXTERNAL.test(text);
  const internal = INTERNAL.test(text);
  if (external === internal) return [];
  const insulation = mainInsulation(model, c);
  const heaviest = heaviestLayer(model, c);
  if (insulation === undefined || heaviest === undefined) return [];
  const reversed = external ? insulation > heaviest : insulation < heaviest;
  if (!reversed) return [];
  const layer = c.layers[insulation];
  if (layer === undefined) return [];
  const described = external ? "externally insulated" : "internally insulated";
  const found = external ? "inside" : "outside";
  return [finding({
    severity: "warning",
    at: layer.at,
    rule: "layer-order-reversed",
    message: `${c.id} is described as ${described}, but its insulation (${
      layerLabel(c, insulation)
    }) is ${found} its heaviest layer (${layerLabel(c, heaviest)})`,
    hint:
      "list the layers from outside to inside; a reversed list gives the same U but a different dynamic response",
    value: `insulation is layer ${insulation + 1}, heaviest layer is ${heaviest + 1} (outside → inside)`,
    expected: external ? "insulation outside the heaviest layer" : "insulation inside the heaviest layer",
    source: ORDER_SOURCE,
  })];
}

function bareInsideInsulation(model: Model, c: Construction): Diagnostic[] {
  if (c.heatFlow !== "horizontal") return [];
  const index = c.layers.length - 1;
  const layer = c.layers[index];
  if (layer === undefined || !isInsulationLayer(model, layer, INSULATION_MAX_CONDUCTIVITY.value)) return [];
  return [finding({
    severity: "note",
    at: layer.at,
    rule: "insulation-exposed-inside",
    message: `The inside layer of wall ${c.id} is insulation with no lining (${layerLabel(c, index)})`,
    hint:
      "add the lining (plasterboard, plaster) if there is one, or confirm that the layers are not reversed",
    value: `λ = ${layer.kind === "massive" ? layer.conductivity : "—"} W/(m·K)`,
    expected: `inside layer with λ ≥ ${INSULATION_MAX_CONDUCTIVITY.value} W/(m·K) (a lining)`,
    source: INSULATION_MAX_CONDUCTIVITY.source,
  })];
}

function mainInsulation(model: Model, c: Construction): number | undefined {
  let best: number | undefined;
  let bestR = 0;
  c.layers.forEach((layer, index) => {
    if (layer.kind !== "massive" || !isInsulationLayer(model, layer, INSULATION_MAX_CONDUCTIVITY.value)) {
      return;
    }
    const r = layer.thicknessM / layer.conductivity;
    if (r > bestR) {
      best = index;
      bestR = r;
    }
  });
  return best;
}

function heaviestLayer(model: Model, c: Construction): number | undefined {
  let best: number | undefined;
  let bestMass = 0;
  c.layers.forEach((layer, index) => {
    if (layer.kind !== "massive" || isInsulationLayer(model, layer, INSULATION_MAX_CONDUCTIVITY.value)) {
      return;
    }
    const mass = layer.density * layer.thicknessM;
    if (mass > bestMass) {
      best = index;
      bestMass = mass;
    }
  });
  return best;
}
