/**
 * Boundary conditions for outside surfaces: design-day dry bulb, solar position, angle of incidence, ASHRAE clear-sky
 * irradiance, transposition of weather-file irradiance, sol-air temperature. Pure functions of typed data; every time is
 * local standard time, with solar time obtained by the equation of time plus the longitude correction.
 */
export { dayOfYear, DESIGN_REFERENCE_YEAR, isLeapYear, julianDay } from "./calendar.ts";
export {
  type DailyRangeInput,
  designDayHourlyC,
  designDayStepsC,
  expandHourlyToSteps,
  FRACTION_OF_DAILY_RANGE_AT_HOUR,
  FRACTION_OF_DAILY_RANGE_BY_HANDBOOK_HOUR,
  interpolateHourly,
  stepsPerDay,
} from "./designDayProfile.ts";
export {
  type DeclinationAndTime,
  horizontalCoordinates,
  meeusSunDeclinationAndTime,
  type SolarPosition,
  solarPosition,
  type SolarPositionInput,
  type SolarPositionMethod,
} from "./solarPosition.ts";
export { handbookSunDeclinationAndTime } from "./solarPositionHandbook.ts";
export {
  beamOnSurfaceWPerM2,
  cosIncidence,
  incidenceAngleDeg,
  type SunDirection,
  type SurfaceOrientation,
} from "./incidence.ts";
export {
  airMassExponents,
  type ClearSkyEdition,
  type ClearSkyIrradiance,
  clearSkyIrradiance,
  extraterrestrialNormalWPerM2,
  kastenYoungAirMass,
  type OpticalDepths,
  SOLAR_CONSTANT_W_PER_M2,
} from "./clearSky.ts";
export {
  groundReflectedWPerM2,
  type SkyDiffuseModel,
  skyDiffuseOnSurfaceWPerM2,
  verticalDiffuseRatio,
} from "./skyDiffuse.ts";
export {
  clearSkySurfaceIrradiance,
  type SolarSurface,
  type SurfaceIrradiance,
  surfaceIrradiance,
} from "./clearSkySurface.ts";
export {
  type HorizontalIrradiance,
  intervalMidpointH,
  LOW_SUN_ALTITUDE_DEG,
  type TransposedIrradiance,
  transposeToSurface,
  transposeWeatherStep,
  type TranspositionModel,
  type WeatherStepInput,
} from "./transposition.ts";
export {
  HORIZONTAL_LONGWAVE_CORRECTION_K,
  type LongwaveCorrection,
  longwaveCorrectionK,
  solAirSeries,
  type SolAirSurface,
  solAirTemperatureC,
  type SolAirTerms,
  solAirTerms,
} from "./solAir.ts";
export {
  type BoundarySurface,
  type DesignDayBoundary,
  designDayBoundary,
  type DesignDayInput,
  type DesignSky,
  type OutdoorProfile,
  type SurfaceBoundary,
} from "./designDayBoundary.ts";
