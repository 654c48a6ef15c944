/**
 * Moisture relations for the ISO 13788:2012 surface checks: saturation vapour pressure (Magnus-type formula over
 * water and over ice), its inverse (dew point), and the temperature factor criteria. Pure functions, SI units.
 */

/** Saturation vapour pressure at 0 °C in the formula, Pa (ISO 13788:2012, saturation-pressure annex; from memory). */
export const P_SAT_0C_PA = 610.5;
/** Magnus coefficients over water (θ ≥ 0 °C): 17.269 and 237.3 °C (ISO 13788:2012, saturation-pressure annex; from memory). */
export const WATER_A = 17.269;
/** See `WATER_A`. */
export const WATER_B_C = 237.3;
/** Magnus coefficients over ice (θ < 0 °C): 21.875 and 265.5 °C (ISO 13788:2012, saturation-pressure annex; from memory). */
export const ICE_A = 21.875;
/** See `ICE_A`. */
export const ICE_B_C = 265.5;
/** Surface relative humidity that ISO 13788:2012 (clause 5, mould growth criterion, from memory) must not exceed. */
export const MOULD_SURFACE_RELATIVE_HUMIDITY = 0.8;
/**
 * Inside surface resistance for the surface-temperature checks of opaque elements, m²K/W: ISO 13788:2012, clause 4
 * boundary conditions (from memory, clause number not confirmed); it stands for corners and furniture.
 */
export const ISO13788_INSIDE_SURFACE_RESISTANCE = 0.25;

/** Where the formulas of this module come from, as printed in the package and the assumptions register. */
export const ISO13788_FORMULA_SOURCE =
  "ISO 13788:2012, saturation-pressure annex (from memory; annex letter not confirmed): p_sat = 610.5·exp(17.269θ/(237.3+θ)) for θ ≥ 0 °C, 610.5·exp(21.875θ/(265.5+θ)) for θ < 0 °C — coefficients from memory, not checked against the printed standard";

/** Saturation vapour pressure, Pa, at temperature θ in °C (over water from 0 °C up, over ice below). */
export function saturationVapourPressure(thetaC: number): number {
  return thetaC >= 0
    ? P_SAT_0C_PA * Math.exp((WATER_A * thetaC) / (WATER_B_C + thetaC))
    : P_SAT_0C_PA * Math.exp((ICE_A * thetaC) / (ICE_B_C + thetaC));
}

/** The temperature, °C, at which the saturation vapour pressure equals `pressurePa` (the exact inverse). */
export function saturationTemperature(pressurePa: number): number {
  if (!(pressurePa > 0)) return -Infinity;
  const x = Math.log(pressurePa / P_SAT_0C_PA);
  return x >= 0 ? (WATER_B_C * x) / (WATER_A - x) : (ICE_B_C * x) / (ICE_A - x);
}

/** Indoor vapour pressure, Pa, from air temperature (°C) and relative humidity (fraction). */
export function vapourPressure(thetaC: number, relativeHumidity: number): number {
  return relativeHumidity * saturationVapourPressure(thetaC);
}

/** Dew point, °C, of air at θ (°C) and relative humidity φ (fraction). */
export function dewPoint(thetaC: number, relativeHumidity: number): number {
  return saturationTemperature(vapourPressure(thetaC, relativeHumidity));
}

/** Temperature factor f_Rsi = (θ_si − θ_e)/(θ_i − θ_e). */
export function temperatureFactor(surfaceC: number, indoorC: number, outdoorC: number): number {
  return (surfaceC - outdoorC) / (indoorC - outdoorC);
}

/** The mould criterion at one condition: lowest acceptable surface temperature and temperature factor. */
export interface MouldCriterion {
  /** p_sat(θ_si,min) = p_i / 0.8, Pa */
  readonly minimumSaturationPressure: number;
  /** θ_si,min, °C */
  readonly minimumSurfaceTemperature: number;
  /** f_Rsi,min = (θ_si,min − θ_e)/(θ_i − θ_e) */
  readonly minimumTemperatureFactor: number;
}

/** θ_si,min and f_Rsi,min so that the surface relative humidity stays at or below `limit` (default 0.8). */
export function mouldCriterion(
  indoorC: number,
  outdoorC: number,
  relativeHumidity: number,
  limit = MOULD_SURFACE_RELATIVE_HUMIDITY,
): MouldCriterion {
  const minimumSaturationPressure = vapourPressure(indoorC, relativeHumidity) / limit;
  const minimumSurfaceTemperature = saturationTemperature(minimumSaturationPressure);
  return {
    minimumSaturationPressure,
    minimumSurfaceTemperature,
    minimumTemperatureFactor: temperatureFactor(minimumSurfaceTemperature, indoorC, outdoorC),
  };
}
