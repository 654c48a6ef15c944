import type { Assumption, Construction, ScenarioSurface } from "../project/model.ts";
import { formatPosition } from "../project/position.ts";

/** Default emittance of an outside surface (DESIGN.md §2; typical of non-metallic building surfaces, common practice, no source). */
export const DEFAULT_EMITTANCE = 0.9;
/** Default ground reflectance (the usual value for ordinary ground, ASHRAE Handbook—Fundamentals Ch. 14, from memory). */
export const DEFAULT_GROUND_REFLECTANCE = 0.2;
/**
 * Long-wave radiation deficit ΔR for a horizontal surface, W/m²: 3.9 K × 17 W/(m²K), so that ε ΔR / h_o reproduces the
 * 3.9 K of ASHRAE Handbook—Fundamentals Ch. 18 (sol-air temperature, from memory) for ε = 1 and h_o = 17 W/(m²K).
 */
export const HORIZONTAL_LONGWAVE_DEFICIT_W_PER_M2 = 3.9 * 17;
/**
 * Summer design outside film h_o for design days, W/(m²K): 17 W/(m²K) (3.0 Btu/(h·ft²·°F)), the coefficient of the
 * sol-air temperature in ASHRAE Handbook—Fundamentals, Ch. 18, sol-air temperature (from memory). ISO 6946's
 * R_se = 0.04 m²K/W (h_o = 25) is a conventional film for U-values, not a summer design condition.
 */
export const SUMMER_DESIGN_OUTSIDE_COEFFICIENT = 17;
/** Where the summer design film comes from, as stated in the package. */
export const SUMMER_DESIGN_FILM_SOURCE =
  "ASHRAE Handbook—Fundamentals, Ch. 18, sol-air temperature (from memory)";
/** Which outside film a scenario uses by default: the construction's R_se (weather years) or the summer design film. */
export type OutsideFilmRule = "construction" | "summer-design";
/** Radiant fractions of conduction heat gain, ASHRAE Handbook—Fundamentals 2009–2021, Ch. 18 Table 14 (from memory). */
export const RADIANT_FRACTION_WALL = 0.46;
export const RADIANT_FRACTION_ROOF = 0.60;
/** Surfaces tilted less than this from the horizontal count as roofs for the radiant fraction (a method choice of this package). */
export const ROOF_TILT_LIMIT_DEG = 45;

/** The values used for one surface, with every default logged. */
export interface SurfaceParameters {
  readonly absorptance: number | null;
  readonly emittance: number;
  readonly groundReflectance: number;
  /** h_o, W/(m² K) */
  readonly outsideCoefficient: number;
  /**
   * R_se of the construction response this surface uses, m²K/W: 1/h_o under the summer design film (sol-air and
   * response factors on one film), else the construction's own R_se.
   */
  readonly responseOutsideResistance: number;
  /** True when the surface gives its own `outside-coefficient`. */
  readonly outsideCoefficientGiven: boolean;
  /** ε ΔR / h_o, K */
  readonly longwaveCorrectionK: number;
  readonly radiantFraction: number;
  readonly tiltDeg: number;
  readonly azimuthDeg: number;
}

/** A warning about a surface, as position and message. */
export interface SurfaceWarning {
  readonly at: string;
  readonly message: string;
}

/** Resolves a surface's optional keys to the values used, logging each default as an assumption. */
export function surfaceParameters(
  scenarioId: string,
  surface: ScenarioSurface,
  construction: Construction,
  assumptions: Assumption[],
  warnings: SurfaceWarning[],
  filmRule: OutsideFilmRule = "construction",
): SurfaceParameters {
  const at = formatPosition(surface.at);
  const tag = `${scenarioId}/${surface.id}`;
  const tiltDeg = surface.tiltDeg ?? 90;
  const emittance = surface.emittance ?? DEFAULT_EMITTANCE;
  if (surface.emittance === undefined && surface.solAirC === undefined) {
    assumptions.push({
      id: `default:emittance:${tag}`,
      text: `Long-wave emittance of ${surface.id}: ε = ${DEFAULT_EMITTANCE}`,
      source: "fluxnote default for non-metallic surfaces (common practice, no source)",
      at,
    });
  }
  const groundReflectance = surface.groundReflectance ?? DEFAULT_GROUND_REFLECTANCE;
  if (surface.groundReflectance === undefined && surface.solAirC === undefined) {
    assumptions.push({
      id: `default:ground-reflectance:${tag}`,
      text: `Ground reflectance seen by ${surface.id}: ρg = ${DEFAULT_GROUND_REFLECTANCE}`,
      source: "ASHRAE Handbook—Fundamentals, climatic design chapter, typical ground (from memory)",
      at,
    });
  }
  const film = filmRule === "summer-design" && surface.solAirC === undefined
    ? summerDesignFilm(surface, construction, tag, at, assumptions)
    : constructionFilm(surface, construction, tag, at, assumptions, warnings);
  const outsideCoefficient = film.outsideCoefficient;
  let longwaveCorrectionK = surface.longwaveCorrectionK ?? 0;
  if (surface.longwaveCorrectionK === undefined && surface.solAirC === undefined) {
    const skyView = tiltDeg < 90 ? Math.cos((tiltDeg * Math.PI) / 180) : 0;
    longwaveCorrectionK = Number.isFinite(outsideCoefficient)
      ? (emittance * HORIZONTAL_LONGWAVE_DEFICIT_W_PER_M2 * skyView) / outsideCoefficient
      : 0;
    assumptions.push({
      id: `default:longwave-correction:${tag}`,
      text: `Long-wave correction of ${surface.id}: ε ΔR cos Σ / h_o = ${
        round(longwaveCorrectionK)
      } K with ΔR = ${
        round(HORIZONTAL_LONGWAVE_DEFICIT_W_PER_M2)
      } W/m² for a horizontal surface, cos Σ for tilts below 90°, 0 for vertical and downward-facing surfaces (the cos Σ scaling of tilted surfaces is a method choice of this package)`,
      source:
        "ASHRAE Handbook—Fundamentals Ch. 18, sol-air temperature: 3.9 K horizontal, 0 vertical (from memory; common practice)",
      at,
    });
  }
  const isRoof = tiltDeg < ROOF_TILT_LIMIT_DEG;
  const radiantFraction = surface.radiantFraction ?? (isRoof ? RADIANT_FRACTION_ROOF : RADIANT_FRACTION_WALL);
  const untilted = surface.tiltDeg === undefined;
  if (surface.radiantFraction === undefined && untilted && surface.solAirC !== undefined) {
    warnings.push({ at, message: untiltedSolAirWarning(surface.id, radiantFraction) });
  }
  if (surface.radiantFraction === undefined) {
    assumptions.push({
      id: `default:radiant-fraction:${tag}`,
      text: `Radiant part of the conduction heat gain of ${surface.id}: ${radiantFraction} (${
        isRoof ? "roof" : "wall"
      }; ${
        untilted ? "no tilt given, taken as a wall" : `tilt below ${ROOF_TILT_LIMIT_DEG}° counts as a roof`
      })`,
      source:
        "ASHRAE Handbook—Fundamentals 2009–2021, Ch. 18 Table 14, recommended radiative/convective split (from memory)",
      at,
    });
  }
  return {
    absorptance: surface.absorptance ?? null,
    emittance,
    groundReflectance,
    outsideCoefficient,
    responseOutsideResistance: film.responseOutsideResistance,
    outsideCoefficientGiven: surface.outsideCoefficient !== undefined,
    longwaveCorrectionK,
    radiantFraction,
    tiltDeg,
    azimuthDeg: surface.azimuthDeg ?? 180,
  };
}

interface OutsideFilm {
  readonly outsideCoefficient: number;
  readonly responseOutsideResistance: number;
}

/**
 * Design days: h_o is the summer design film (or the surface's `outside-coefficient`), and the construction response
 * of this surface is computed with R_se = 1/h_o, so sol-air and response factors use one film; U for limits keeps the
 * construction's ISO 6946 R_se.
 */
function summerDesignFilm(
  surface: ScenarioSurface,
  construction: Construction,
  tag: string,
  at: string,
  assumptions: Assumption[],
): OutsideFilm {
  const given = surface.outsideCoefficient;
  const outsideCoefficient = given ?? SUMMER_DESIGN_OUTSIDE_COEFFICIENT;
  const response = `the response of ${construction.id} for this design day uses R_se = 1/h_o = ${
    round(1 / outsideCoefficient)
  } m²·K/W (its U-value for limits keeps R_se = ${construction.outsideResistance} m²·K/W)`;
  assumptions.push(
    given === undefined
      ? {
        id: `default:outside-coefficient:${tag}`,
        text:
          `Outside coefficient of ${surface.id}: summer design film h_o = ${outsideCoefficient} W/(m²·K); ${response}`,
        source: SUMMER_DESIGN_FILM_SOURCE,
        at,
      }
      : {
        id: `override:outside-coefficient:${tag}`,
        text: `Surface ${surface.id} sets h_o = ${
          round(outsideCoefficient)
        } W/(m²·K) instead of the summer design film ${SUMMER_DESIGN_OUTSIDE_COEFFICIENT} W/(m²·K); ${response}`,
        source: "project input",
        at,
      },
  );
  return { outsideCoefficient, responseOutsideResistance: 1 / outsideCoefficient };
}

/** Weather years and given sol-air lists: h_o = 1/R_se of the construction unless the surface overrides it. */
function constructionFilm(
  surface: ScenarioSurface,
  construction: Construction,
  tag: string,
  at: string,
  assumptions: Assumption[],
  warnings: SurfaceWarning[],
): OutsideFilm {
  const responseOutsideResistance = construction.outsideResistance;
  const filmCoefficient = construction.outsideResistance > 0 ? 1 / construction.outsideResistance : Infinity;
  if (surface.outsideCoefficient !== undefined) {
    const outsideCoefficient = surface.outsideCoefficient;
    if (Math.abs(outsideCoefficient - filmCoefficient) > 1e-9 * outsideCoefficient) {
      const message =
        `Surface ${surface.id} sets h_o = ${
          round(outsideCoefficient)
        } W/(m²·K) for its sol-air temperature, ` +
        `but the response factors of ${construction.id} use R_se = ${construction.outsideResistance} m²·K/W (1/R_se = ${
          round(filmCoefficient)
        })`;
      warnings.push({ at, message });
      assumptions.push({
        id: `override:outside-coefficient:${tag}`,
        text: message,
        source: "project input",
        at,
      });
    }
    return { outsideCoefficient, responseOutsideResistance };
  }
  if (surface.solAirC === undefined) {
    assumptions.push({
      id: `default:outside-coefficient:${tag}`,
      text: `Outside coefficient of ${surface.id}: h_o = 1/R_se of ${construction.id} = ${
        round(filmCoefficient)
      } W/(m²·K), the same film as in the response factors`,
      source:
        "Method choice of this package: the sol-air temperature and the conduction use the same outside film",
      at,
    });
  }
  return { outsideCoefficient: filmCoefficient, responseOutsideResistance };
}

/**
 * The warning for a surface given only a `sol-air` list: nothing tells a wall from a roof, so the wall's radiant
 * fraction is used; the message says which value and how to state the surface's kind.
 */
export function untiltedSolAirWarning(id: string, radiantFraction: number): string {
  return `Give "tilt" or "radiant-fraction" for surface ${id}: it has only a sol-air list and no tilt, so nothing ` +
    `tells a wall from a roof and its radiant fraction is taken as ${radiantFraction}, a wall's (a roof's is ` +
    `${RADIANT_FRACTION_ROOF}); add e.g. \`tilt: 0 deg\` for a roof`;
}

function round(value: number): number {
  return Number(value.toPrecision(4));
}
