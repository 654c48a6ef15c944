import type { OutsideFilmResults } from "./types.ts";

/**
 * The caution line on the outside film, h_o shown by `coefficient` (the package's display units),, once for all design days of a package (empty when there are none): the
 * design-day results depend on it and a different film changes them.
 */
export function outsideFilmCautions(
  scenarios: Readonly<Record<string, { readonly outsideFilm?: OutsideFilmResults }>>,
  coefficient: (wPerM2K: number) => string = (w) => `${Number(w.toPrecision(3))} W/(m²·K)`,
): string[] {
  const films = Object.entries(scenarios).filter(([, s]) => s.outsideFilm !== undefined);
  if (films.length === 0) return [];
  const first = films[0]![1].outsideFilm!;
  const overridden = films.flatMap(([id, s]) => s.outsideFilm!.overridden.map((o) => `${id}/${o.surface}`));
  return [
    `Design days use the summer design outside film h_o = ${
      coefficient(first.h_o)
    } (${first.source}), for the ` +
    `sol-air temperature and for the construction response of that day (R_se = 1/h_o), not ISO 6946's ` +
    `conventional film (h_o = 1/R_se = ${
      coefficient(25)
    }), which stays in the U-values for limits. A stiffer film (higher h_o) gives ` +
    `lower sol-air temperatures and lower gains; the sensitivity study, when requested, shows by how much.${
      overridden.length === 0 ? "" : ` Own outside-coefficient given for: ${overridden.join(", ")}.`
    }`,
  ];
}
