import type { Model } from "../project/model.ts";
import type { ResultsJson } from "../results/types.ts";
import { coolingLoadCells, coolingLoadHeader } from "./csvCoolingLoad.ts";

/** Characters that start a formula in a spreadsheet, ASCII and full width (U+FF1D ＝, U+FF0B ＋, U+FF0D －, U+FF20 ＠). */
const FORMULA_START = "=+\\-@\uFF1D\uFF0B\uFF0D\uFF20";
/** A formula start at the beginning of the cell, after any spaces (`\s` includes NBSP and the Unicode spaces). */
const LEADING_FORMULA = new RegExp(`^[\\s]*[${FORMULA_START}]|^[\\t\\r]`);
/**
 * A formula start after a separator a spreadsheet may split on (`;`, tab, CR, LF) and any spaces: opened
 * with `;` or tab as the separator, `x;=1+1` is two cells, the second a formula.
 */
const SPLIT_FORMULA = new RegExp(`([;\\t\\r\\n][\\s]*)(?=[${FORMULA_START}])`, "g");

/**
 * Quotes a CSV cell. Numbers are written as numbers. A text cell that a spreadsheet would read as a
 * formula — at its start, or after a `;`, tab or line break it may split on — gets an apostrophe before
 * each such part (OWASP "CSV Injection" guidance).
 */
export function csvCell(value: string | number): string {
  if (typeof value === "number") return String(value);
  const split = value.replace(SPLIT_FORMULA, "$1'");
  const safe = LEADING_FORMULA.test(split) || split !== value ? `'${split}` : split;
  return /[",;\t\n\r]/.test(safe) ? `"${safe.replaceAll('"', '""')}"` : safe;
}

/** One row per construction: steady-state figures in SI units. */
export function constructionsCsv(model: Model, results: ResultsJson): string {
  const header = "id,name,U_W_per_m2K,R_m2K_per_W,areal_heat_capacity_J_per_m2K,timestep_h";
  const rows = model.constructions.map((c) => {
    const r = results.constructions[c.id];
    return [c.id, c.name, r?.U ?? NaN, r?.R ?? NaN, r?.steady.arealHeatCapacity ?? NaN, r?.timestep_h ?? NaN]
      .map(csvCell).join(",");
  });
  return `${[header, ...rows].join("\n")}\n`;
}

/** Response factors of one construction, one row per term: j, time (h), X, Y, Z (W/(m²K)), air to air. */
export function factorsCsv(id: string, results: ResultsJson): string {
  const c = results.constructions[id] as {
    responseFactors?: { X: number[]; Y: number[]; Z: number[] };
    timestep_h: number;
  } | undefined;
  const rf = c?.responseFactors;
  if (rf === undefined || c === undefined) return "j,time_h,X_W_per_m2K,Y_W_per_m2K,Z_W_per_m2K\n";
  const rows = rf.X.map((x, j) =>
    [j, j * c.timestep_h, x, rf.Y[j] ?? 0, rf.Z[j] ?? 0].map(csvCell).join(",")
  );
  return `${["j,time_h,X_W_per_m2K,Y_W_per_m2K,Z_W_per_m2K", ...rows].join("\n")}\n`;
}

/** Design-day series of one scenario, one row per step, SI units; per surface sol-air, inside flux and heat gain. */
export function designDayCsv(id: string, results: ResultsJson): string {
  const s = results.scenarios[id];
  if (s === undefined) return "";
  const surfaces = Object.entries(s.surfaces);
  const header = [
    "time_h",
    "outdoor_C",
    "indoor_C",
    ...surfaces.flatMap(([sid]) => [`${sid}_sol_air_C`, `${sid}_inside_flux_W_per_m2`, `${sid}_heat_gain_W`]),
    "total_heat_gain_W",
    ...coolingLoadHeader(s),
  ].map(csvCell).join(",");
  const rows = s.outdoor.map((outdoor, k) =>
    [
      k * s.timestep_h,
      outdoor,
      s.indoor[k] ?? NaN,
      ...surfaces.flatMap(([, v]) => [v.solAir[k] ?? NaN, v.insideFlux[k] ?? NaN, v.heatGain[k] ?? NaN]),
      s.totalHeatGain[k] ?? NaN,
    ].map(csvCell).concat(coolingLoadCells(s, k)).join(",")
  );
  return `${[header, ...rows].join("\n")}\n`;
}
