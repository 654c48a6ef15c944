/**
 * Synthetic weather: a weather scenario is synthetic when its `synthetic` key says so or when its weather file's
 * leading comment `# synthetic: <note>` does. The flag travels in results.json `scenarios.<id>.synthetic`; the open
 * items, the summary, the cautions and the stamps of the scenario's tables and plots all read it from here.
 */
import type { Model } from "../project/model.ts";
import type { CsvTable } from "../tables/csvTable.ts";
import type { ResultsJson, SyntheticWeatherResults } from "./types.ts";

/** The scenario's `synthetic` key wins over the file's `# synthetic:` comment; either marks the results. */
export function syntheticMark(
  key: { readonly note: string } | undefined,
  comment: { readonly note: string } | undefined,
): SyntheticWeatherResults | undefined {
  if (key !== undefined) return { note: key.note, from: "scenario" };
  if (comment !== undefined) return { note: comment.note, from: "file" };
  return undefined;
}

/**
 * Every synthetic weather scenario by id, in model order: marked in the results, or by the scenario key when the
 * scenario has no results (its weather file could not be read).
 */
export function syntheticScenarios(
  model: Model,
  results: ResultsJson,
): Map<string, SyntheticWeatherResults> {
  const marks = new Map<string, SyntheticWeatherResults>();
  for (const s of model.scenarios) {
    if (s.kind !== "weather") continue;
    const mark = results.scenarios[s.id]?.synthetic ?? syntheticMark(s.synthetic, undefined);
    if (mark !== undefined) marks.set(s.id, mark);
  }
  return marks;
}

/** The words of every stamp on output derived from synthetic weather. */
export const SYNTHETIC_STAMP = "SYNTHETIC WEATHER — illustration only";

/**
 * Stamps a CSV derived from synthetic weather with a first comment line `# SYNTHETIC WEATHER — …` (the weather
 * file's own comment syntax); a spreadsheet shows it as one first row above the column names.
 */
export function stampSyntheticCsv(table: CsvTable, mark: SyntheticWeatherResults): CsvTable {
  const comment = `${SYNTHETIC_STAMP}: synthetic ${
    mark.from === "file" ? "per the weather file" : "per the scenario"
  }${mark.note === "" ? "" : `, ${mark.note.replace(/[\r\n]+/g, " ")}`}`;
  return { ...table, comment };
}
