/**
 * Conventional surface resistances for plane surfaces, ISO 6946:2017 Table 7 (Table 1 in the 2007
 * edition, from memory): R_si 0.10 / 0.13 / 0.17 m^2 K/W for heat flow upward / horizontal / downward,
 * R_se 0.04 m^2 K/W in all directions. "Horizontal" covers heat flow within ±30° of the horizontal plane.
 */

/** Direction of heat flow through a construction; the same values as `HeatFlowDirection` in the model. */
export type SurfaceHeatFlow = "horizontal" | "upward" | "downward";

/** The default inside and outside surface resistances of a construction, with their source. */
export interface SurfaceResistances {
  /** R_si, m^2 K/W */
  readonly insideM2KPerW: number;
  /** R_se, m^2 K/W */
  readonly outsideM2KPerW: number;
  readonly source: string;
}

const OUTSIDE_M2K_PER_W = 0.04;

const SOURCE_BY_DIRECTION: Readonly<Record<SurfaceHeatFlow, string>> = {
  upward: 'ISO 6946:2017, Table 7, column "upwards" (Table 1 in ISO 6946:2007, from memory)',
  horizontal: 'ISO 6946:2017, Table 7, column "horizontal" (Table 1 in ISO 6946:2007, from memory)',
  downward: 'ISO 6946:2017, Table 7, column "downwards" (Table 1 in ISO 6946:2007, from memory)',
};

/** Returns the ISO 6946 conventional surface resistances for a heat-flow direction. */
export function defaultSurfaceResistances(heatFlow: SurfaceHeatFlow): SurfaceResistances {
  const source = SOURCE_BY_DIRECTION[heatFlow];
  switch (heatFlow) {
    case "upward":
      return { insideM2KPerW: 0.1, outsideM2KPerW: OUTSIDE_M2K_PER_W, source };
    case "horizontal":
      return { insideM2KPerW: 0.13, outsideM2KPerW: OUTSIDE_M2K_PER_W, source };
    case "downward":
      return { insideM2KPerW: 0.17, outsideM2KPerW: OUTSIDE_M2K_PER_W, source };
  }
}
