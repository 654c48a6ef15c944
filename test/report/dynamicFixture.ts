/**
 * Dynamic results for the rendering tests, produced by the real engine (never typed in), and small
 * invented constructions with known closed-form behaviour.
 */
import { SI_DISPLAY } from "../../src/report/page/displayUnits.ts";
import {
  analyseConstruction,
  constructionChecksJson,
  constructionDynamicJson,
  constructionMethodNotesJson,
} from "../../src/engine/mod.ts";
import type { Layer } from "../../src/engine/layer.ts";
import type { Construction } from "../../src/project/model.ts";
import { renderDynamicFactors } from "../../src/report/constructions/dynamicOutput.ts";
import { renderConstructionOutput } from "../../src/report/constructions/constructionOutput.ts";
import type { CheckResult, ConstructionResults, MethodNoteResult } from "../../src/results/types.ts";

const at = (line: number) => ({ file: "walls.md", line, col: 1 });

/** The engine's results.json entry (steady part as the build writes it) and checks for a construction. */
export function engineEntry(
  c: Construction,
): { results: ConstructionResults; checks: CheckResult[]; notes: MethodNoteResult[] } {
  const analysis = analyseConstruction(c, c.timestepS);
  if (analysis.kind !== "analysis") throw new Error(`Cannot analyse ${c.id}: ${analysis.message}`);
  const s = analysis.steady;
  const results: ConstructionResults = {
    U: s.uValue,
    R: s.totalResistance,
    timestep_h: c.timestepS / 3600,
    steady: {
      outsideSurfaceResistance: c.outsideResistance,
      insideSurfaceResistance: c.insideResistance,
      surfaceToSurfaceU: s.surfaceToSurfaceU,
      arealHeatCapacity: s.arealHeatCapacity,
      layers: c.layers.map((l, i) => ({
        name: l.name,
        kind: l.kind,
        R: s.layerResistances[i] ?? NaN,
        arealHeatCapacity: s.layerArealHeatCapacities[i] ?? 0,
      })),
    },
    ...constructionDynamicJson(analysis),
  };
  return {
    results,
    checks: constructionChecksJson(c.id, analysis),
    notes: constructionMethodNotesJson(c.id, analysis),
  };
}

/** An invented construction from engine layers, with made-up names and positions. */
export function construction(
  id: string,
  layers: readonly Layer[],
  films: { readonly outside: number; readonly inside: number } = { outside: 0.04, inside: 0.13 },
  name = `Test construction ${id}`,
): Construction {
  return {
    id,
    name,
    heatFlow: "horizontal",
    outsideResistance: films.outside,
    outsideResistanceDefaulted: false,
    insideResistance: films.inside,
    insideResistanceDefaulted: false,
    timestepS: 3600,
    at: at(1),
    layers: layers.map((l, i) => ({
      ...l,
      name: `layer ${i + 1}`,
      source: "invented test value",
      at: at(i + 2),
    })),
  };
}

/**
 * A single thick, light, very resistive layer (0.3048 m, λ 0.023, ρ 1121, c 1465) whose polynomial CTF fails
 * at 1 h: the kind of layer reported to break CTF generation (invented values of that kind).
 */
export function ctfRejectingWall(): Construction {
  return construction("RJ-1", [{
    kind: "massive",
    thicknessM: 0.3048,
    conductivity: 0.023,
    density: 1121,
    specificHeat: 1465,
  }]);
}

/** Homogeneous slab without surface resistances: d 0.2 m, λ 1 W/(m·K), ρc 2·10⁶ J/(m³·K). */
export function bareSlab(): Construction {
  return construction(
    "SL-1",
    [{ kind: "massive", thicknessM: 0.2, conductivity: 1, density: 2000, specificHeat: 1000 }],
    { outside: 0, inside: 0 },
  );
}

/** Renders one construction's output (steady and dynamic) with the engine's results and checks. */
export function renderWithEngine(
  c: Construction,
): { markup: string; results: ConstructionResults; checks: CheckResult[]; notes: MethodNoteResult[] } {
  const { results, checks, notes } = engineEntry(c);
  const anchor = `c-${c.id.toLowerCase()}`;
  // The body's output followed by the construction's Appendix D part, where the factor tables now print.
  const markup = renderConstructionOutput(c, results, checks, anchor, SI_DISPLAY, false, notes).markup +
    renderDynamicFactors(c, results, notes, anchor, SI_DISPLAY).markup;
  return { markup, results, checks, notes };
}
