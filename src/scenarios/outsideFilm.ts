import type { ScenarioSurface } from "../project/model.ts";
import type { OutsideFilmResults } from "./types.ts";
import {
  SUMMER_DESIGN_FILM_SOURCE,
  SUMMER_DESIGN_OUTSIDE_COEFFICIENT,
  type SurfaceParameters,
} from "./surfaceParameters.ts";

/**
 * The outside film a design day uses, as data for the summary and the cautions: the summer design film h_o, its
 * source, and the surfaces that give their own `outside-coefficient`. Undefined when no surface uses the solar model.
 */
export function outsideFilmOf(
  surfaces: readonly ScenarioSurface[],
  parameters: ReadonlyMap<string, SurfaceParameters>,
): OutsideFilmResults | undefined {
  const solar = surfaces.filter((s) => s.solAirC === undefined && parameters.has(s.id));
  if (solar.length === 0) return undefined;
  const overridden = solar.filter((s) => parameters.get(s.id)!.outsideCoefficientGiven).map((s) => ({
    surface: s.id,
    h_o: parameters.get(s.id)!.outsideCoefficient,
  }));
  return {
    h_o: SUMMER_DESIGN_OUTSIDE_COEFFICIENT,
    source: SUMMER_DESIGN_FILM_SOURCE,
    response: "R_se = 1/h_o",
    overridden,
  };
}

/** One sentence for the scenario's notes: the film used and that the response factors use the same film. */
export function outsideFilmNote(film: OutsideFilmResults): string {
  const overrides = film.overridden.length === 0
    ? ""
    : ` Surfaces with their own outside-coefficient: ${
      film.overridden.map((o) => `${o.surface} (h_o = ${Number(o.h_o.toPrecision(4))} W/(m²·K))`).join(", ")
    }.`;
  return `Outside film: summer design film h_o = ${film.h_o} W/(m²·K) (${film.source}) for the sol-air ` +
    `temperature, and each construction's response for this day computed with R_se = 1/h_o = ${
      Number((1 / film.h_o).toPrecision(4))
    } m²·K/W; U-values for the limits keep ISO 6946 R_se.${overrides}`;
}
