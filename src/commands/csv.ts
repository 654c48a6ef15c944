import type { Model } from "../project/model.ts";
import type { ResultsJson } from "../results/types.ts";

/** Quotes a CSV cell; a cell that a spreadsheet would read as a formula gets a leading apostrophe. */
export function csvCell(value: string | number): string {
  if (typeof value === "number") return String(value);
  const safe = /^[=+\-@\t\r]/.test(value) ? `'${value}` : value;
  return /[",\n\r]/.test(safe) ? `"${safe.replaceAll('"', '""')}"` : safe;
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
