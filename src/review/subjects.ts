/**
 * What the material rules look at: one "subject" per project material, per library material used and per
 * inline layer, each with its properties, its class (when known) and the position to report.
 */

import { findMaterialClass, type MaterialClass } from "../materials/classes.ts";
import type { Construction, MaterialDef, Model, ResolvedLayer } from "../project/model.ts";
import type { Position } from "../project/position.ts";

/** Classes of porous mineral materials, for the λ–ρ consistency rule. */
export const MINERAL_CLASSES: ReadonlySet<string> = new Set([
  "dense-concrete",
  "lightweight-concrete",
  "aerated-concrete",
  "clay-masonry",
  "concrete-block",
  "natural-stone",
  "gypsum-board",
  "gypsum-plaster",
  "lime-plaster",
  "cement-mortar",
  "ceramic-tile",
  "earth",
  "soil",
]);

/** Classes of load-bearing masonry and concrete, for the thin-leaf rule. */
export const MASONRY_CLASSES: ReadonlySet<string> = new Set([
  "dense-concrete",
  "lightweight-concrete",
  "aerated-concrete",
  "clay-masonry",
  "concrete-block",
  "natural-stone",
  "earth",
]);

/** Classes of insulation materials. */
export const INSULATION_CLASSES: ReadonlySet<string> = new Set([
  "mineral-wool",
  "polystyrene",
  "polyurethane-phenolic",
  "cellular-glass",
]);

/** Names of the few insulation types that legitimately go below the gas-filled floor. */
export const SUPER_INSULATION = /vacuum|aerogel|\bVIP\b/i;

/** A set of massive properties to check, with the place to report. */
export interface PropertySubject {
  /** How the message names it, e.g. `material "eps-100"` or `layer 2 of EW-1`. */
  readonly label: string;
  /** What a finding names (`Diagnostic.subject`): the material id, or `<construction>/layer-<n>`. */
  readonly subject: string;
  readonly name: string;
  /** The class id as given (it may be unknown). */
  readonly classId?: string;
  readonly materialClass?: MaterialClass;
  readonly conductivity: number;
  readonly density: number;
  readonly specificHeat: number;
  readonly at: Position;
}

/** The position of the first layer that uses a material, or the material's own block. */
export function firstUse(model: Model, material: MaterialDef): Position {
  if (material.origin === "project") return material.at;
  for (const c of model.constructions) {
    const layer = c.layers.find((l) => l.materialId === material.id);
    if (layer !== undefined) return layer.at;
  }
  return material.at;
}

/** The material a layer refers to, if any. */
export function layerMaterial(model: Model, layer: ResolvedLayer): MaterialDef | undefined {
  return layer.materialId === undefined ? undefined : model.materials.find((m) => m.id === layer.materialId);
}

/** The class id of the material a layer refers to, if it has one. */
export function layerClassId(model: Model, layer: ResolvedLayer): string | undefined {
  return layerMaterial(model, layer)?.materialClass;
}

/** A human label for a layer: `layer 2 ("name") of EW-1`. */
export function layerLabel(construction: Construction, index: number): string {
  const layer = construction.layers[index];
  return `layer ${index + 1}${layer === undefined ? "" : ` ("${layer.name}")`} of ${construction.id}`;
}

/** The subject of a layer's findings: `EW-1/layer-2`. */
export function layerSubject(construction: Construction, index: number): string {
  return `${construction.id}/layer-${index + 1}`;
}

/** Every massive material and inline massive layer of the model, as property subjects. */
export function propertySubjects(model: Model): PropertySubject[] {
  const subjects: PropertySubject[] = [];
  for (const m of model.materials) {
    if (m.conductivity === undefined || m.density === undefined || m.specificHeat === undefined) continue;
    subjects.push(withClass({
      label: `${m.origin === "library" ? "library material" : "material"} "${m.id}"`,
      subject: m.id,
      name: m.name,
      conductivity: m.conductivity,
      density: m.density,
      specificHeat: m.specificHeat,
      at: firstUse(model, m),
    }, m.materialClass));
  }
  for (const c of model.constructions) {
    c.layers.forEach((layer, index) => {
      if (layer.kind !== "massive" || layer.materialId !== undefined) return;
      subjects.push({
        label: `inline ${layerLabel(c, index)}`,
        subject: layerSubject(c, index),
        name: layer.name,
        conductivity: layer.conductivity,
        density: layer.density,
        specificHeat: layer.specificHeat,
        at: layer.at,
      });
    });
  }
  return subjects;
}

function withClass(base: PropertySubject, classId: string | undefined): PropertySubject {
  if (classId === undefined) return base;
  const materialClass = findMaterialClass(classId);
  return materialClass === undefined ? { ...base, classId } : { ...base, classId, materialClass };
}

/** Tells whether a layer is insulation: an insulation class, or λ below the insulation threshold. */
export function isInsulationLayer(model: Model, layer: ResolvedLayer, maxConductivity: number): boolean {
  if (layer.kind !== "massive") return false;
  const classId = layerClassId(model, layer);
  return (classId !== undefined && INSULATION_CLASSES.has(classId)) || layer.conductivity < maxConductivity;
}
