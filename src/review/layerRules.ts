/**
 * Layer rules: thin masonry leaves, single layers with a huge resistance, surface resistances entered twice,
 * and massless layers outside the air-layer envelope.
 */

import { findMaterialClass } from "../materials/classes.ts";
import { defaultSurfaceResistances } from "../materials/surfaceResistance.ts";
import type { Diagnostic } from "../project/diagnostic.ts";
import type { Construction, Model, ResolvedLayer } from "../project/model.ts";
import { about, finding, num, range } from "./finding.ts";
import { AIR_LAYER_NAME, SLIP } from "./limits.ts";
import { layerClassId, layerLabel, layerSubject, MASONRY_CLASSES } from "./subjects.ts";

/** Names that say a layer is a surface resistance (a membrane named "film" alone does not count). */
export const SURFACE_FILM_NAME =
  /surface|\br[_ ]?s[ie]\b|\b(inside|outside|internal|external|interior|exterior|air)[\s-]+films?\b/i;
const MASONRY_NAME = /concrete|brick|block|masonry|stone/i;
const M2K_W = "m²·K/W";

/** Checks the layers of every construction. */
export function reviewLayers(model: Model): Diagnostic[] {
  const out: Diagnostic[] = [];
  for (const c of model.constructions) {
    c.layers.forEach((layer, index) => {
      out.push(...about(layerSubject(c, index), [
        ...thinMasonry(model, c, layer, index),
        ...largeResistance(c, layer, index),
        ...surfaceFilm(c, layer, index),
        ...airLayer(model, c, layer, index),
      ]));
    });
  }
  return out;
}

function thinMasonry(model: Model, c: Construction, layer: ResolvedLayer, index: number): Diagnostic[] {
  if (layer.kind !== "massive") return [];
  const classId = layerClassId(model, layer);
  const known = classId === undefined ? undefined : findMaterialClass(classId);
  const masonry = known === undefined ? MASONRY_NAME.test(layer.name) : MASONRY_CLASSES.has(known.id);
  if (!masonry || layer.thicknessM >= SLIP.minMasonryThickness.value) return [];
  return [finding({
    severity: "warning",
    at: layer.at,
    rule: "masonry-layer-thin",
    message: `The masonry or concrete ${layerLabel(c, index)} is thinner than any real leaf`,
    hint: "check the unit: was a thickness in m or cm written with `mm`?",
    value: `d = ${num(layer.thicknessM * 1000)} mm`,
    expected: `d ≥ ${num(SLIP.minMasonryThickness.value * 1000)} mm`,
    source: SLIP.minMasonryThickness.source,
  })];
}

function largeResistance(c: Construction, layer: ResolvedLayer, index: number): Diagnostic[] {
  const r = layer.kind === "massive" ? layer.thicknessM / layer.conductivity : layer.resistance;
  if (!(r > SLIP.maxLayerResistance.value)) return [];
  return [finding({
    severity: "warning",
    at: layer.at,
    rule: "layer-resistance-large",
    message: `The ${layerLabel(c, index)} alone has a thermal resistance above ${
      num(SLIP.maxLayerResistance.value)
    } ${M2K_W}`,
    hint:
      "an IP R-value (h·ft²·°F/Btu) entered as m²·K/W? R-19 IP is 3.35 m²·K/W; or a thickness in the wrong unit",
    value: `R = ${num(r)} ${M2K_W}`,
    expected: `R ≤ ${num(SLIP.maxLayerResistance.value)} ${M2K_W}`,
    source: SLIP.maxLayerResistance.source,
  })];
}

function surfaceFilm(c: Construction, layer: ResolvedLayer, index: number): Diagnostic[] {
  if (layer.kind !== "resistive" || !SURFACE_FILM_NAME.test(layer.name)) return [];
  const outermost = index === 0;
  const innermost = index === c.layers.length - 1;
  const side = outermost ? "outside" : innermost ? "inside" : "inside and outside";
  const tool = outermost ? c.outsideResistance : innermost ? c.insideResistance : Math.max(
    c.outsideResistance,
    c.insideResistance,
  );
  if (!(tool > 0)) return [];
  const conventional = defaultSurfaceResistances(c.heatFlow);
  const values = [conventional.outsideM2KPerW, 0.1, 0.13, 0.17];
  const equal = values.some((v) => Math.abs(v - layer.resistance) < 1e-9);
  return [finding({
    severity: "warning",
    at: layer.at,
    rule: "surface-resistance-twice",
    message: `The ${layerLabel(c, index)} looks like a surface resistance${
      equal ? " and has a conventional surface-resistance value" : ""
    }, but ${c.id} also applies its ${side} surface resistance (${num(tool)} ${M2K_W})`,
    hint: `remove this layer; if its value is the film you mean, give it as \`${
      outermost ? "outside" : "inside"
    }-surface-resistance\` on ${c.id} instead`,
    value: `R = ${num(layer.resistance)} ${M2K_W}`,
    expected: "surface resistances counted once: only in the construction's surface-resistance keys",
    source: conventional.source,
  })];
}

function airLayer(model: Model, c: Construction, layer: ResolvedLayer, index: number): Diagnostic[] {
  if (layer.kind !== "resistive") return [];
  const classId = layerClassId(model, layer) ??
    (layer.materialId === undefined && AIR_LAYER_NAME.test(layer.name) && !SURFACE_FILM_NAME.test(layer.name)
      ? "air-layer"
      : undefined);
  const cls = classId === undefined ? undefined : findMaterialClass(classId);
  if (cls === undefined || cls.kind !== "resistive") return [];
  const r = cls.resistance;
  if (layer.resistance >= r.min && layer.resistance <= r.max) return [];
  return [finding({
    severity: "warning",
    at: layer.at,
    rule: "resistance-outside-class",
    message: `The air layer ${layerLabel(c, index)} has a resistance outside the envelope of ${cls.name}`,
    hint: "a reflective (low-emissivity) cavity needs its own ISO 6946 calculation; say so in `source`",
    value: `R = ${num(layer.resistance)} ${M2K_W}`,
    expected: range(r.min, r.max, M2K_W),
    source: cls.source,
  })];
}
