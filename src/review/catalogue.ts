/** The catalogue of review rules: stable id, severity and what each looks for. */

import type { Severity } from "../project/diagnostic.ts";

/** One review rule as listed in the catalogue. */
export interface ReviewRule {
  readonly id: string;
  /** The usual severity; `density-in-lb-per-ft3` is an error with a class and a warning without. */
  readonly severity: Severity;
  readonly description: string;
}

function rule(id: string, severity: Severity, description: string): ReviewRule {
  return { id, severity, description };
}

/** Every rule `reviewProject` can report, in reading order of the checks. */
export const REVIEW_RULES: readonly ReviewRule[] = [
  rule("unknown-material-class", "warning", "a project material names a class the library does not know"),
  rule("conductivity-hard-limit", "error", "λ ≤ 0 or above any building material"),
  rule("density-hard-limit", "error", "ρ ≤ 0 or above lead"),
  rule("specific-heat-in-kj", "error", "c so low that it is a kJ/(kg·K) value written as J/(kg·K)"),
  rule("specific-heat-hard-limit", "error", "c below lead"),
  rule("specific-heat-high", "warning", "c above water"),
  rule("density-in-lb-per-ft3", "error", "ρ about 16 times too low: a lb/ft³ value written as kg/m³"),
  rule("conductivity-below-insulation-limit", "warning", "λ below any gas-filled insulation"),
  rule("conductivity-outside-class", "warning", "λ outside the envelope of the material's class"),
  rule("density-outside-class", "warning", "ρ outside the envelope of the material's class"),
  rule("specific-heat-outside-class", "warning", "c outside the envelope of the material's class"),
  rule("conductivity-density-mismatch", "warning", "λ and ρ of a mineral material do not fit together"),
  rule(
    "diffusivity-implausible",
    "warning",
    "λ/(ρc) outside the band of building materials (no class given)",
  ),
  rule("volumetric-heat-capacity-high", "warning", "ρc above any non-metallic solid (no class given)"),
  rule("effusivity-implausible", "warning", "√(λρc) outside the band of building materials (no class given)"),
  rule("masonry-layer-thin", "warning", "a masonry or concrete layer thinner than 5 mm"),
  rule("layer-resistance-large", "warning", "one layer with R above 10 m²·K/W"),
  rule("surface-resistance-twice", "warning", "a layer named like a surface film while R_si/R_se also apply"),
  rule("resistance-outside-class", "warning", "an air layer's R outside the ISO 6946 air-layer envelope"),
  rule(
    "layer-order-reversed",
    "warning",
    "insulation on the wrong side of the mass for the described system",
  ),
  rule("insulation-exposed-inside", "note", "a wall whose inside layer is insulation with no lining"),
  rule("source-missing", "warning", "a project material or inline layer with no source"),
  rule("source-in-prose-only", "note", "an inline layer whose source is cited only in the prose"),
  rule("default-used", "note", "a value the tool filled in by default"),
  rule(
    "surface-orientation-name",
    "note",
    "a vertical surface named as a roof, or a horizontal one named as a wall",
  ),
  rule("absorptance-extreme", "note", "solar absorptance below 0.2 or above 0.95"),
  rule("sol-air-below-outdoor", "warning", "given sol-air more than 10 K below the coldest outdoor air"),
  rule("sol-air-too-high", "warning", "given sol-air above 90 °C"),
  rule("sol-air-range-large", "warning", "given sol-air swinging more than 60 K in a day"),
  rule("indoor-temperature-unusual", "warning", "an indoor temperature outside 10–32 °C"),
  rule("longwave-correction-unusual", "warning", "a long-wave correction outside 0–10 K"),
  rule("u-value-high", "warning", "U above 6 W/(m²·K) for an opaque element"),
  rule("kappa-high", "warning", "κ1 above 400 kJ/(m²·K)"),
  rule("time-lag-long", "note", "time lag above 24 h"),
  rule("limit-not-met", "warning", "a code limit the user wrote (with its clause) is not met"),
  rule("limit-met", "note", "a code limit the user wrote (with its clause) is met"),
  rule("room-area-below-volume", "warning", "a room's surfaces total less area than a cube of its volume"),
  rule(
    "room-area-above-volume",
    "note",
    "a room's surfaces total more area than any box of its volume 2 m deep",
  ),
  rule("room-height-unusual", "note", "volume over floor area outside 2.2–6 m"),
  rule("room-without-outdoor-surface", "note", "a room with no outdoor or ground surface"),
  rule("window-fills-surface", "note", "windows taking more than 90 % of their surface's gross area"),
  rule("ground-surface-not-floor", "warning", "a ground surface that is not a floor (tilt below 170°)"),
  rule(
    "exposed-perimeter-too-long",
    "warning",
    "a ground floor's exposed perimeter above 6.96·√A (10:1 outline)",
  ),
  rule("outdoor-surface-facing-down", "note", "an outdoor surface tilted beyond 135° (facing the ground)"),
  rule("gain-density-high", "warning", "a room's sensible gains above 100 W/m² of floor"),
  rule("gain-density-low", "note", "one gain below 0.5 W/m² of floor (kW written as W?)"),
  rule("radiant-fraction-unusual", "note", "a gain's radiant fraction outside 0.1–0.8"),
  rule("gain-schedule-all-zero", "warning", "a gain whose 24 schedule fractions are all 0"),
  rule(
    "ventilation-rate-unusual",
    "warning",
    "ventilation outside 0.1–20 air changes per hour (below: a note)",
  ),
  rule("placeholder-text", "warning", "text left from the template of `fluxnote init`"),
];
