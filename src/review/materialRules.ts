/**
 * Material plausibility rules: global hard limits, unit slips, class envelopes, the insulation floor,
 * λ–ρ consistency for mineral materials, and derived-quantity bands for materials without a class.
 */

import type { MassiveMaterialClass } from "../materials/classes.ts";
import { MATERIAL_CLASSES } from "../materials/classes.ts";
import type { Diagnostic } from "../project/diagnostic.ts";
import type { Model } from "../project/model.ts";
import { about, finding, num, range } from "./finding.ts";
import { DERIVED, HARD, INSULATION_FLOOR, MINERAL, SLIP } from "./limits.ts";
import { MINERAL_CLASSES, type PropertySubject, propertySubjects, SUPER_INSULATION } from "./subjects.ts";

const W_MK = "W/(m·K)";
const KG_M3 = "kg/m³";
const J_KGK = "J/(kg·K)";

/** Checks every material and inline layer of the model; at most one finding per property. */
export function reviewMaterials(model: Model): Diagnostic[] {
  const out: Diagnostic[] = [];
  for (const s of propertySubjects(model)) {
    const own = [...classProblems(s), ...conductivity(s), ...density(s), ...specificHeat(s)];
    if (own.length === 0) own.push(...mineralConsistency(s));
    const special = SUPER_INSULATION.test(s.name);
    if (own.length === 0 && s.materialClass === undefined && !special) own.push(...derived(s));
    out.push(...about(s.subject, own));
  }
  return out;
}

function massiveClass(s: PropertySubject): MassiveMaterialClass | undefined {
  return s.materialClass?.kind === "massive" ? s.materialClass : undefined;
}

function classProblems(s: PropertySubject): Diagnostic[] {
  if (s.classId === undefined || s.materialClass !== undefined) return [];
  const known = MATERIAL_CLASSES.map((c) => c.id).join(", ");
  return [finding({
    severity: "warning",
    at: s.at,
    rule: "unknown-material-class",
    message: `The ${s.label} names the class "${s.classId}", which is not a known material class`,
    hint: `use one of: ${known}`,
    value: s.classId,
  })];
}

function conductivity(s: PropertySubject): Diagnostic[] {
  const λ = s.conductivity;
  const value = `λ = ${num(λ)} ${W_MK}`;
  if (!Number.isFinite(λ) || λ <= 0 || λ > HARD.maxConductivity.value) {
    return [finding({
      severity: "error",
      at: s.at,
      rule: "conductivity-hard-limit",
      message: `The ${s.label} has a conductivity no building material has`,
      hint: "check the unit: W/(m·K), not Btu·in/(h·ft²·°F) or mW/(m·K)",
      value,
      expected: `0 < λ ≤ ${num(HARD.maxConductivity.value)} ${W_MK}`,
      source: HARD.maxConductivity.source,
    })];
  }
  const superInsulation = SUPER_INSULATION.test(s.name) || SUPER_INSULATION.test(s.classId ?? "");
  if (λ < INSULATION_FLOOR.value && !superInsulation) {
    return [finding({
      severity: "warning",
      at: s.at,
      rule: "conductivity-below-insulation-limit",
      message: `The ${s.label} is a better insulator than any gas-filled insulation`,
      hint:
        "confirm the declared value (a typo such as 0.0022 for 0.022?); vacuum panels and aerogels must say so in the name",
      value,
      expected: `λ ≥ ${num(INSULATION_FLOOR.value)} ${W_MK}`,
      source: INSULATION_FLOOR.source,
    })];
  }
  const c = massiveClass(s);
  if (c !== undefined && (λ < c.conductivity.min || λ > c.conductivity.max)) {
    return [outsideClass(s, "conductivity-outside-class", "conductivity", value, c, c.conductivity, W_MK)];
  }
  return [];
}

function density(s: PropertySubject): Diagnostic[] {
  const ρ = s.density;
  const value = `ρ = ${num(ρ)} ${KG_M3}`;
  if (!Number.isFinite(ρ) || ρ <= 0 || ρ > HARD.maxDensity.value) {
    return [finding({
      severity: "error",
      at: s.at,
      rule: "density-hard-limit",
      message: `The ${s.label} has a density no building material has`,
      hint: "check the unit: kg/m³",
      value,
      expected: `0 < ρ ≤ ${num(HARD.maxDensity.value)} ${KG_M3}`,
      source: HARD.maxDensity.source,
    })];
  }
  const c = massiveClass(s);
  const converted = ρ * SLIP.poundPerCubicFoot.value;
  const slip = c !== undefined
    ? ρ < c.density.min && converted >= c.density.min && converted <= c.density.max
    : s.conductivity > MINERAL.denseMinConductivity.value && ρ < DERIVED.lightDensity.value * 2 &&
      converted >= MINERAL.lightDensity.value;
  if (slip) {
    return [finding({
      severity: c === undefined ? "warning" : "error",
      at: s.at,
      rule: "density-in-lb-per-ft3",
      message: `The ${s.label} has a density about 16 times too low${
        c === undefined ? " for its conductivity" : ` for ${c.name}`
      }: it looks like a value in lb/ft³`,
      hint: `${num(ρ)} lb/ft³ is ${num(converted)} kg/m³; write the density in kg/m³`,
      value,
      expected: c === undefined
        ? `ρ ≥ ${num(MINERAL.lightDensity.value)} ${KG_M3} for λ > ${
          num(MINERAL.denseMinConductivity.value)
        } ${W_MK}`
        : range(c.density.min, c.density.max, KG_M3),
      source: c === undefined
        ? `${MINERAL.lightDensity.source}; ${SLIP.poundPerCubicFoot.source}`
        : `${c.source}; ${SLIP.poundPerCubicFoot.source}`,
    })];
  }
  if (c !== undefined && (ρ < c.density.min || ρ > c.density.max)) {
    return [outsideClass(s, "density-outside-class", "density", value, c, c.density, KG_M3)];
  }
  return [];
}

function specificHeat(s: PropertySubject): Diagnostic[] {
  const cp = s.specificHeat;
  const value = `c = ${num(cp)} ${J_KGK}`;
  if (Number.isFinite(cp) && cp > 0 && cp <= SLIP.kilojouleSpecificHeat.value) {
    return [finding({
      severity: "error",
      at: s.at,
      rule: "specific-heat-in-kj",
      message:
        `The ${s.label} has a specific heat about 1000 times too low: it looks like a value in kJ/(kg·K)`,
      hint: `${num(cp)} kJ/(kg·K) is ${num(cp * 1000)} ${J_KGK}; write \`${num(cp * 1000)} J/(kg K)\``,
      value,
      expected: `c ≥ ${num(HARD.minSpecificHeat.value)} ${J_KGK}`,
      source: `${HARD.minSpecificHeat.source}; ${SLIP.kilojouleSpecificHeat.source}`,
    })];
  }
  if (!Number.isFinite(cp) || cp < HARD.minSpecificHeat.value) {
    return [finding({
      severity: "error",
      at: s.at,
      rule: "specific-heat-hard-limit",
      message: `The ${s.label} has a specific heat below that of any building material`,
      hint: "check the unit: J/(kg·K), not kJ/(kg·K) or Btu/(lb·°F)",
      value,
      expected: `c ≥ ${num(HARD.minSpecificHeat.value)} ${J_KGK}`,
      source: HARD.minSpecificHeat.source,
    })];
  }
  if (cp > SLIP.maxSpecificHeat.value) {
    return [finding({
      severity: "warning",
      at: s.at,
      rule: "specific-heat-high",
      message: `The ${s.label} has a specific heat above that of water`,
      hint: cp >= 100_000
        ? `about 1000 times too high: ${num(cp)} J/(kg·K) may be a J value written in kJ/(kg·K)`
        : "check the unit and the source value",
      value,
      expected: `c ≤ ${num(SLIP.maxSpecificHeat.value)} ${J_KGK}`,
      source: SLIP.maxSpecificHeat.source,
    })];
  }
  const c = massiveClass(s);
  if (c !== undefined && (cp < c.specificHeat.min || cp > c.specificHeat.max)) {
    return [outsideClass(s, "specific-heat-outside-class", "specific heat", value, c, c.specificHeat, J_KGK)];
  }
  return [];
}

function outsideClass(
  s: PropertySubject,
  rule: string,
  what: string,
  value: string,
  c: MassiveMaterialClass,
  r: { readonly min: number; readonly max: number },
  unit: string,
): Diagnostic {
  return finding({
    severity: "warning",
    at: s.at,
    rule,
    message: `The ${s.label} has a ${what} outside the envelope of its class (${c.name})`,
    hint: "confirm the value against its source, or give the class that fits the material",
    value,
    expected: range(r.min, r.max, unit),
    source: c.source,
  });
}

function mineralConsistency(s: PropertySubject): Diagnostic[] {
  const mineral = s.classId === undefined
    ? s.conductivity < DERIVED.metalConductivity.value
    : MINERAL_CLASSES.has(
      s.classId,
    );
  if (!mineral) return [];
  const λ = s.conductivity;
  const ρ = s.density;
  const light = ρ < MINERAL.lightDensity.value && λ > MINERAL.lightMaxConductivity.value;
  const dense = ρ > MINERAL.denseDensity.value && λ < MINERAL.denseMinConductivity.value;
  if (!light && !dense) return [];
  return [finding({
    severity: "warning",
    at: s.at,
    rule: "conductivity-density-mismatch",
    message: light
      ? `The ${s.label} is light but conducts like dense concrete`
      : `The ${s.label} is dense but conducts like a lightweight material`,
    hint: "one of λ and ρ is probably from another product or in another unit (IP conductivity?)",
    value: `λ = ${num(λ)} ${W_MK}, ρ = ${num(ρ)} ${KG_M3}`,
    expected: light
      ? `λ ≤ ${num(MINERAL.lightMaxConductivity.value)} ${W_MK} when ρ < ${
        num(MINERAL.lightDensity.value)
      } ${KG_M3}`
      : `λ ≥ ${num(MINERAL.denseMinConductivity.value)} ${W_MK} when ρ > ${
        num(MINERAL.denseDensity.value)
      } ${KG_M3}`,
    source: MINERAL.lightDensity.source,
  })];
}

function derived(s: PropertySubject): Diagnostic[] {
  const { conductivity: λ, density: ρ, specificHeat: cp } = s;
  if (λ >= DERIVED.metalConductivity.value) return [];
  const a = λ / (ρ * cp);
  const maxA = ρ < DERIVED.lightDensity.value ? DERIVED.maxDiffusivityLight : DERIVED.maxDiffusivity;
  if (a < DERIVED.minDiffusivity.value || a > maxA.value) {
    return [derivedFinding(s, "diffusivity-implausible", "thermal diffusivity λ/(ρc)", `a = ${num(a)} m²/s`, {
      expected: range(DERIVED.minDiffusivity.value, maxA.value, "m²/s"),
      source: a > maxA.value ? maxA.source : DERIVED.minDiffusivity.source,
    })];
  }
  const ρc = ρ * cp;
  if (ρc > DERIVED.maxVolumetricHeatCapacity.value) {
    return [
      derivedFinding(
        s,
        "volumetric-heat-capacity-high",
        "volumetric heat capacity ρc",
        `ρc = ${num(ρc)} J/(m³·K)`,
        {
          expected: `ρc ≤ ${num(DERIVED.maxVolumetricHeatCapacity.value)} J/(m³·K)`,
          source: DERIVED.maxVolumetricHeatCapacity.source,
        },
      ),
    ];
  }
  const b = Math.sqrt(λ * ρ * cp);
  if (b < DERIVED.minEffusivity.value || b > DERIVED.maxEffusivity.value) {
    return [
      derivedFinding(s, "effusivity-implausible", "thermal effusivity √(λρc)", `b = ${num(b)} W·s^½/(m²·K)`, {
        expected: range(DERIVED.minEffusivity.value, DERIVED.maxEffusivity.value, "W·s^½/(m²·K)"),
        source: b < DERIVED.minEffusivity.value ? DERIVED.minEffusivity.source : DERIVED.maxEffusivity.source,
      }),
    ];
  }
  return [];
}

function derivedFinding(
  s: PropertySubject,
  rule: string,
  what: string,
  value: string,
  band: { readonly expected: string; readonly source: string },
): Diagnostic {
  return finding({
    severity: "warning",
    at: s.at,
    rule,
    message: `The ${s.label} has an implausible ${what} (λ, ρ and c do not fit together)`,
    hint:
      "check each of λ, ρ and c and their units; giving `class:` lets the review compare each with its class",
    value,
    expected: band.expected,
    source: band.source,
  });
}
