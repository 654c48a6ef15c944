import { analyseConstruction, type DynamicAnalysis } from "../engine/mod.ts";
import type { Construction, Model, ResolvedLayer } from "../project/model.ts";
import { computeDesignDay, type ScenarioContext } from "../scenarios/designDay.ts";
import { type ConditionEffect, conditionEffects, EFFECT_THRESHOLD, isShown } from "./conditions.ts";

export type { ConditionEffect, VariedCondition } from "./conditions.ts";

/** A material property a sensitivity study varies. */
export type VariedProperty = "conductivity" | "density" | "specificHeat" | "resistance";

/** The effect of one property varied down and up by the study's fraction. */
export interface SensitivityEffect {
  readonly material: string;
  readonly property: VariedProperty;
  readonly minus: number;
  readonly plus: number;
}

/**
 * results.json `sensitivity` (extension): per construction U and time lag, per design day the peak heat gain, for
 * the material properties and (`conditions`) the design-day conditions. Effects below `threshold` × |base| are
 * dropped from the lists and counted in `dropped`.
 */
export interface SensitivityResults {
  readonly variation: number;
  /** Fraction of the base value below which an effect is dropped (both its changes smaller). */
  readonly threshold: number;
  readonly constructions: Readonly<
    Record<
      string,
      {
        readonly U: readonly SensitivityEffect[];
        readonly timeLag_h: readonly SensitivityEffect[];
        readonly dropped: { readonly U: number; readonly timeLag_h: number };
      }
    >
  >;
  readonly scenarios: Readonly<
    Record<
      string,
      {
        /** Base peak total heat gain, W. */
        readonly basePeakHeatGain: number;
        readonly peakHeatGain: readonly SensitivityEffect[];
        readonly conditions: readonly ConditionEffect[];
        readonly dropped: { readonly peakHeatGain: number; readonly conditions: number };
      }
    >
  >;
}

/** A layer's material key for the study: the material id, or the inline layer's name. */
function materialKey(layer: ResolvedLayer): string {
  return layer.materialId ?? `inline:${layer.name}`;
}

function varied(layer: ResolvedLayer, key: string, property: VariedProperty, factor: number): ResolvedLayer {
  if (materialKey(layer) !== key) return layer;
  if (layer.kind === "resistive") {
    return property === "resistance" ? { ...layer, resistance: layer.resistance * factor } : layer;
  }
  if (property === "resistance") return layer;
  return { ...layer, [property]: layer[property] * factor };
}

function analyse(construction: Construction): DynamicAnalysis | undefined {
  const result = analyseConstruction(construction, construction.timestepS, { stateSpace: false });
  return result.kind === "analysis" ? result : undefined;
}

/** The properties present in the model for each material key, in a stable order. */
function variedProperties(model: Model): { key: string; property: VariedProperty }[] {
  const found = new Map<string, Set<VariedProperty>>();
  for (const c of model.constructions) {
    for (const layer of c.layers) {
      const set = found.get(materialKey(layer)) ?? new Set<VariedProperty>();
      if (layer.kind === "resistive") set.add("resistance");
      else (["conductivity", "density", "specificHeat"] as const).forEach((p) => set.add(p));
      found.set(materialKey(layer), set);
    }
  }
  return [...found.entries()].sort(([a], [b]) => (a < b ? -1 : 1)).flatMap(([key, props]) =>
    [...props].map((property) => ({ key, property }))
  );
}

/**
 * Varies each material property by ± `variation` in every layer that uses it and reports the change of U and time
 * lag of each affected construction and of the peak total heat gain of each design day (one property at a time).
 */
export function sensitivityStudy(
  model: Model,
  variation: number,
  base: ReadonlyMap<string, DynamicAnalysis>,
): SensitivityResults {
  const constructions: Record<string, { U: SensitivityEffect[]; timeLag_h: SensitivityEffect[] }> = {};
  const scenarios: Record<string, { peakHeatGain: SensitivityEffect[] }> = {};
  const designDays = model.scenarios.filter((s) => s.kind === "design-day");
  const cache: AnalysisCache = new WeakMap();
  const baseConstructions = byId(model.constructions);
  const basePeaks = new Map(
    designDays.map((s) => [s.id, peakOf(s, baseConstructions, (id) => base.get(id), cache)]),
  );
  for (const { key, property } of variedProperties(model)) {
    const variants = [1 - variation, 1 + variation].map((factor) => {
      const changed = new Map<string, Construction>();
      for (const c of model.constructions) {
        if (!c.layers.some((l) => materialKey(l) === key)) continue;
        changed.set(c.id, { ...c, layers: c.layers.map((l) => varied(l, key, property, factor)) });
      }
      const analyses = new Map<string, DynamicAnalysis>();
      for (const [id, c] of changed) {
        const a = analyse(c);
        if (a !== undefined) analyses.set(id, a);
      }
      return { changed, analyses };
    });
    const [down, up] = variants as [typeof variants[0], typeof variants[0]];
    for (const id of down.changed.keys()) {
      const b = base.get(id);
      const d = down.analyses.get(id);
      const u = up.analyses.get(id);
      if (b === undefined || d === undefined || u === undefined) continue;
      const entry = constructions[id] ?? { U: [], timeLag_h: [] };
      entry.U.push({
        material: key,
        property,
        minus: d.steady.uValue - b.steady.uValue,
        plus: u.steady.uValue - b.steady.uValue,
      });
      entry.timeLag_h.push({
        material: key,
        property,
        minus: d.iso13786.timeLag_h - b.iso13786.timeLag_h,
        plus: u.iso13786.timeLag_h - b.iso13786.timeLag_h,
      });
      constructions[id] = entry;
    }
    for (const scenario of designDays) {
      if (!scenario.surfaces.some((s) => down.changed.has(s.construction))) continue;
      const basePeak = basePeaks.get(scenario.id) ?? NaN;
      const look = (v: typeof down) => (id: string) => v.analyses.get(id) ?? base.get(id);
      const entry = scenarios[scenario.id] ?? { peakHeatGain: [] };
      entry.peakHeatGain.push({
        material: key,
        property,
        minus: peakOf(scenario, byId(model.constructions, down.changed), look(down), cache) - basePeak,
        plus: peakOf(scenario, byId(model.constructions, up.changed), look(up), cache) - basePeak,
      });
      scenarios[scenario.id] = entry;
    }
  }
  const byEffect = (a: { minus: number; plus: number }, b: { minus: number; plus: number }) =>
    Math.max(Math.abs(b.minus), Math.abs(b.plus)) - Math.max(Math.abs(a.minus), Math.abs(a.plus));
  const kept = <T extends { minus: number; plus: number }>(effects: readonly T[], baseValue: number) => {
    const shown = effects.filter((e) => isShown(e, baseValue)).sort(byEffect);
    return { shown, dropped: effects.length - shown.length };
  };
  // In block order (the model's), not the order the varied materials first reached each construction.
  const studied = model.constructions.flatMap((c) =>
    Object.hasOwn(constructions, c.id) ? [[c.id, constructions[c.id]!] as const] : []
  );
  const constructionResults: SensitivityResults["constructions"] = Object.fromEntries(
    [...new Map(studied)].map(([id, entry]) => {
      const b = base.get(id)!;
      const u = kept(entry.U, b.steady.uValue);
      const lag = kept(entry.timeLag_h, b.iso13786.timeLag_h);
      return [id, { U: u.shown, timeLag_h: lag.shown, dropped: { U: u.dropped, timeLag_h: lag.dropped } }];
    }),
  );
  const scenarioResults: SensitivityResults["scenarios"] = Object.fromEntries(
    designDays.map((scenario) => {
      const basePeak = basePeaks.get(scenario.id) ?? NaN;
      const materials = kept(scenarios[scenario.id]?.peakHeatGain ?? [], basePeak);
      const conditions = kept(
        conditionEffects(
          scenario,
          variation,
          basePeak,
          (variant) => peakOf(variant, baseConstructions, (id) => base.get(id), cache),
        ),
        basePeak,
      );
      return [scenario.id, {
        basePeakHeatGain: basePeak,
        peakHeatGain: materials.shown,
        conditions: conditions.shown,
        dropped: { peakHeatGain: materials.dropped, conditions: conditions.dropped },
      }];
    }),
  );
  return {
    variation,
    threshold: EFFECT_THRESHOLD,
    constructions: constructionResults,
    scenarios: scenarioResults,
  };
}

/** Analyses of the design days' films, per construction object, by "timestep|R_se". */
type AnalysisCache = WeakMap<Construction, Map<string, DynamicAnalysis>>;

function peakOf(
  scenario: Extract<Model["scenarios"][number], { kind: "design-day" }>,
  constructions: ReadonlyMap<string, Construction>,
  lookup: (id: string) => DynamicAnalysis | undefined,
  cache: AnalysisCache,
): number {
  const context: ScenarioContext = {
    constructions,
    analysisAt(id, timestepS, outsideResistance) {
      const a = lookup(id);
      const c = constructions.get(id)!;
      const film = outsideResistance ?? c.outsideResistance;
      if (a !== undefined && a.timestepS === timestepS && film === c.outsideResistance) return a;
      const byKey = cache.get(c) ?? new Map<string, DynamicAnalysis>();
      cache.set(c, byKey);
      const key = `${timestepS}|${film}`;
      const cached = byKey.get(key);
      if (cached !== undefined) return cached;
      const fresh = analyseConstruction({ ...c, outsideResistance: film }, timestepS, {
        stateSpace: false,
        ...(a === undefined ? {} : { sameLayers: { input: c, analysis: a } }),
      });
      if (fresh.kind !== "analysis") throw new Error(fresh.message);
      byKey.set(key, fresh);
      return fresh;
    },
  };
  return computeDesignDay(scenario, context).results.peak.heatGain;
}

function byId(
  constructions: readonly Construction[],
  changed?: ReadonlyMap<string, Construction>,
): Map<string, Construction> {
  return new Map(constructions.map((c) => [c.id, changed?.get(c.id) ?? c]));
}
