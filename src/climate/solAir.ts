import { cosDeg } from "./_angles.ts";

/**
 * Long-wave correction εΔR/h_o for a horizontal surface, K: 3.9 K (7 °F), ASHRAE Handbook—Fundamentals Ch. 18
 * "Nonresidential cooling and heating load calculations", sol-air temperature (2009–2021; common practice, from memory
 * stated there for ε = 1, ΔR ≈ 63 W/m², h_o = 17 W/(m²K)); 0 K for vertical surfaces.
 */
export const HORIZONTAL_LONGWAVE_CORRECTION_K = 3.9;

/** How a surface's long-wave correction εΔR/h_o is chosen. */
export type LongwaveCorrection =
  /** Our stated rule: 3.9 K × cos Σ for Σ < 90°, 0 for Σ ≥ 90° (the handbook gives only horizontal and vertical). */
  | { readonly kind: "by-tilt" }
  /** A value given by the user, K. */
  | { readonly kind: "given"; readonly correctionK: number };

/** Properties of an outside surface that enter the sol-air temperature. */
export interface SolAirSurface {
  /** Solar absorptance α of the outside surface, dimensionless. */
  readonly absorptance: number;
  /** Outside surface coefficient h_o (convection + long-wave), W/(m²K). */
  readonly outsideCoefficientWPerM2K: number;
  /** Tilt from the horizontal, degrees (0 = facing up, 90 = vertical). */
  readonly tiltDeg: number;
  readonly longwave: LongwaveCorrection;
}

/** Sol-air temperature at one time, split into its three terms for the calculation package. */
export interface SolAirTerms {
  /** Outdoor dry bulb T_o, °C. */
  readonly outdoorC: number;
  /** Total irradiance on the surface E_t, W/m². */
  readonly irradianceWPerM2: number;
  /** Solar term α·E_t/h_o, K. */
  readonly solarTermK: number;
  /** Long-wave term εΔR/h_o, K (subtracted). */
  readonly longwaveTermK: number;
  /** Sol-air temperature T_sa = T_o + α·E_t/h_o − εΔR/h_o, °C. */
  readonly solAirC: number;
}

/** Long-wave correction εΔR/h_o in K for a surface, by its `LongwaveCorrection` rule. */
export function longwaveCorrectionK(tiltDeg: number, rule: LongwaveCorrection): number {
  switch (rule.kind) {
    case "by-tilt":
      return tiltDeg < 90 ? HORIZONTAL_LONGWAVE_CORRECTION_K * cosDeg(tiltDeg) : 0;
    case "given":
      return rule.correctionK;
  }
}

/**
 * Sol-air temperature and its terms, T_sa = T_o + α·E_t/h_o − εΔR/h_o (ASHRAE Handbook—Fundamentals Ch. 18, sol-air
 * temperature equation, 2009–2021 editions, from memory).
 */
export function solAirTerms(outdoorC: number, irradianceWPerM2: number, surface: SolAirSurface): SolAirTerms {
  if (!(surface.outsideCoefficientWPerM2K > 0)) {
    throw new RangeError(
      `Cannot compute sol-air temperature: outside coefficient "${surface.outsideCoefficientWPerM2K}" W/(m2 K) is not positive`,
    );
  }
  const solarTermK = (surface.absorptance * irradianceWPerM2) / surface.outsideCoefficientWPerM2K;
  const longwaveTermK = longwaveCorrectionK(surface.tiltDeg, surface.longwave);
  return {
    outdoorC,
    irradianceWPerM2,
    solarTermK,
    longwaveTermK,
    solAirC: outdoorC + solarTermK - longwaveTermK,
  };
}

/** Sol-air temperature T_sa = T_o + α·E_t/h_o − εΔR/h_o, °C. */
export function solAirTemperatureC(
  outdoorC: number,
  irradianceWPerM2: number,
  surface: SolAirSurface,
): number {
  return solAirTerms(outdoorC, irradianceWPerM2, surface).solAirC;
}

/** Sol-air breakdown at every time step from matching outdoor and irradiance series. */
export function solAirSeries(
  outdoorC: readonly number[],
  irradianceWPerM2: readonly number[],
  surface: SolAirSurface,
): SolAirTerms[] {
  if (outdoorC.length !== irradianceWPerM2.length) {
    throw new RangeError(
      `Cannot compute sol-air series: ${outdoorC.length} outdoor values but ${irradianceWPerM2.length} irradiance values`,
    );
  }
  return outdoorC.map((t, k) => solAirTerms(t, irradianceWPerM2[k] ?? Number.NaN, surface));
}
