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
