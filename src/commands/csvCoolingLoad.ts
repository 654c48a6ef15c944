/** Cooling-load columns appended to the design-day CSV when the scenario has a radiant time series. */
import type { CsvValue } from "../tables/csvTable.ts";
import type { ScenarioResults } from "../results/types.ts";

/** Column names: per surface `<id>:cooling_load_W`, then `total_cooling_load_W`; none without a cooling load. */
export function coolingLoadHeader(s: ScenarioResults): string[] {
  if (s.coolingLoad === undefined) return [];
  return [...Object.keys(s.surfaces).map((sid) => `${sid}:cooling_load_W`), "total_cooling_load_W"];
}

/** Cells of row k: the hourly cooling load at full hours, empty between them (sub-hourly steps). */
export function coolingLoadCells(s: ScenarioResults, k: number): CsvValue[] {
  const total = s.coolingLoad;
  if (total === undefined) return [];
  const hours = k * s.timestep_h;
  const h = Math.round(hours);
  const atHour = Math.abs(hours - h) < 1e-9;
  const cell = (series: readonly number[] | undefined): CsvValue => (atHour ? series?.[h] ?? null : null);
  return [...Object.values(s.surfaces).map((v) => cell(v.coolingLoad)), cell(total.total)];
}
