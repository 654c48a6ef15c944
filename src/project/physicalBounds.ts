/**
 * Values no building input can take: the reader refuses them as errors, with the bound and its
 * source. Values that are possible but unusual are left to the review rules (src/review/limits.ts).
 */

import { type Diagnostic, error } from "./diagnostic.ts";
import type { Position } from "./position.ts";

interface Bound {
  readonly value: number;
  readonly unit: string;
  readonly source: string;
}

/** Largest area of one surface, m². */
export const MAX_SURFACE_AREA: Bound = {
  value: 1e6,
  unit: "m^2",
  source:
    "1 km²: above the roof of any single building, the largest of which are a few 100 000 m² (from memory)",
};

/** Largest magnitude of the long-wave correction ε·ΔR/h_o, K. */
export const MAX_LONGWAVE_CORRECTION: Bound = {
  value: 50,
  unit: "K",
  source:
    "the whole long-wave emission of a surface at 40 °C to a sky at 0 K, εσT⁴ = 0.9 × 5.67e-8 × 313⁴ ≈ 490 W/m², over h_o ≥ 10 W/(m² K) stays below 50 K (computed)",
};

/** Largest ISO 6946 Annex F correction ΔU on one layer, W/(m² K). */
export const MAX_U_CORRECTION: Bound = {
  value: 6,
  unit: "W/(m^2 K)",
  source:
    "an element with no layers at all has U = 1/(0.04 + 0.13) = 5.9 W/(m² K) with the ISO 6946:2017 Table 7 horizontal-flow surface resistances (computed); a correction cannot add more",
};

/** Pushes an out-of-range error when |value| exceeds the bound; returns whether the value is within it. */
export function withinBound(
  value: number | undefined,
  bound: Bound,
  key: string,
  at: Position,
  out: Diagnostic[],
): boolean {
  if (value === undefined || Math.abs(value) <= bound.value) return true;
  out.push(
    error(
      at,
      "out-of-range",
      `Cannot use ${key} ${
        Number(value.toPrecision(6))
      } ${bound.unit}: its size is more than ${bound.value} ${bound.unit}`,
      `check the value and its unit; the bound is ${bound.source}`,
    ),
  );
  return false;
}

/** A property range no building material leaves: below `min` or above `max` the reader refuses the value. */
interface PropertyRange {
  readonly min: number;
  readonly max: number;
  readonly unit: string;
  readonly source: string;
  readonly hint: string;
}

/**
 * Conductivity, density and specific heat of a massive layer, material or bridge. Outside these ranges the
 * layer's cells get rates or capacities that no building element has, and the engine's checks (state-space
 * reciprocity and agreement, sum rules) fail on roundoff or the build takes minutes (scratch sweep over the
 * reader's former range, 0.1 kg/m³ and 1 J/(kg K) up, 2026-12-03).
 */
export const MASSIVE_PROPERTY_RANGES: Readonly<
  Record<"conductivity" | "density" | "specific-heat", PropertyRange>
> = {
  conductivity: {
    min: 0.001,
    max: 2500,
    unit: "W/(m K)",
    source:
      "from vacuum insulation panels, the least conductive building product at 0.002–0.004 W/(m K) (from memory), to diamond, the most conductive solid at about 2200 W/(m K) (from memory)",
    hint:
      "check the value and its unit (W/(m K), not mW/(m K)); a still air gap is a massless layer with a `resistance`",
  },
  density: {
    min: 1,
    max: 23000,
    unit: "kg/m^3",
    source:
      "from silica aerogels, the lightest solid insulation, above 1 kg/m³ (from memory), to osmium, the densest element, 22 590 kg/m³ (from memory)",
    hint: "check the value and its unit (kg/m^3); a still air gap is a massless layer with a `resistance`",
  },
  "specific-heat": {
    min: 0.1,
    max: 15000,
    unit: "J/(kg K)",
    source:
      "from lead, 0.13 kJ/(kg K), the lowest of building materials (CIBSE Guide A (2006) Table 3.36, secondary copy), written in J/(kg K) by mistake (the review names that slip), to hydrogen gas, about 14 300 J/(kg K), the highest of any substance (from memory)",
    hint: "check the unit: a value in kJ/(kg K) is written e.g. `0.88 kJ/(kg K)` or `880 J/(kg K)`",
  },
};

/** Pushes an out-of-range error when a massive property lies outside its range; returns whether it is inside. */
export function withinPropertyRange(
  value: number | undefined,
  key: keyof typeof MASSIVE_PROPERTY_RANGES,
  at: Position | undefined,
  out: Diagnostic[],
): boolean {
  const range = MASSIVE_PROPERTY_RANGES[key];
  if (value === undefined || at === undefined || !(value > 0) || (value >= range.min && value <= range.max)) {
    return true;
  }
  out.push(
    error(
      at,
      "out-of-range",
      `Cannot use ${key} ${
        Number(value.toPrecision(6))
      } ${range.unit}: expected ${range.min} to ${range.max} ${range.unit}`,
      `${range.hint}; the range runs ${range.source}`,
    ),
  );
  return false;
}

/**
 * Thermal diffusivity λ/(ρc) of a massive layer, m²/s. Each of λ, ρ and c can lie in its range while their
 * combination belongs to no material (2500 W/(m K) at 2 kg/m³ and 100 J/(kg K) is 12 m²/s); such a layer's
 * cells relax 10^4 times faster than a diamond sheet of its thickness and the state-space reciprocity failed
 * on roundoff in the scratch sweep (2026-12-03), while the same constructions without those layers passed.
 */
export const DIFFUSIVITY_RANGE = {
  min: 1e-8,
  max: 2e-3,
  unit: "m^2/s",
  source:
    "from vacuum insulation panels, about 3e-8 m^2/s (0.004 W/(m K), 190 kg/m³, 800 J/(kg K), from memory), to diamond, about 1.2e-3 m^2/s (2200 W/(m K), 3515 kg/m³, 509 J/(kg K), from memory)",
} as const;

/** Pushes an out-of-range error when λ/(ρc) lies outside `DIFFUSIVITY_RANGE`; returns whether it is inside. */
export function withinDiffusivityRange(
  conductivity: number,
  density: number,
  specificHeat: number,
  at: Position,
  out: Diagnostic[],
): boolean {
  const diffusivity = conductivity / (density * specificHeat);
  if (diffusivity >= DIFFUSIVITY_RANGE.min && diffusivity <= DIFFUSIVITY_RANGE.max) return true;
  const shown = (v: number) => Number(v.toPrecision(6));
  out.push(
    error(
      at,
      "diffusivity-out-of-range",
      `Cannot use conductivity ${shown(conductivity)} W/(m K) with density ${
        shown(density)
      } kg/m^3 and specific-heat ${shown(specificHeat)} J/(kg K): their diffusivity λ/(ρc) is ${
        diffusivity.toPrecision(3)
      } ${DIFFUSIVITY_RANGE.unit}, expected ${DIFFUSIVITY_RANGE.min} to ${DIFFUSIVITY_RANGE.max} ${DIFFUSIVITY_RANGE.unit}`,
      `one of the three values belongs to another material or has a wrong unit; the range runs ${DIFFUSIVITY_RANGE.source}`,
    ),
  );
  return false;
}
