/**
 * The printed form of the embedded results: the JSON with every long numeric series cut to its first terms,
 * so a printout stays readable; the full series are in csv/ and in the embedded results JSON.
 */

/** Series longer than this are cut on paper. */
export const PRINT_SERIES_MAX = 12;
/** How many leading terms of a cut series are printed. */
export const PRINT_SERIES_LEAD = 6;

function isNumberSeries(value: unknown): value is readonly number[] {
  return Array.isArray(value) && value.length > PRINT_SERIES_MAX && value.every((v) => typeof v === "number");
}

function cut(value: unknown): unknown {
  if (isNumberSeries(value)) {
    return [...value.slice(0, PRINT_SERIES_LEAD), `… ${value.length} values in all`];
  }
  if (Array.isArray(value)) return value.map(cut);
  if (value !== null && typeof value === "object") {
    return Object.fromEntries(Object.entries(value).map(([k, v]) => [k, cut(v)]));
  }
  return value;
}

/** The results JSON text with long numeric series cut to their leading terms; the text as given if not JSON. */
export function printedResultsText(
  resultsJsonText: string,
): { readonly text: string; readonly cutSeries: number } {
  let parsed: unknown;
  try {
    parsed = JSON.parse(resultsJsonText);
  } catch {
    return { text: resultsJsonText, cutSeries: 0 };
  }
  let cutSeries = 0;
  const count = (value: unknown): void => {
    if (isNumberSeries(value)) cutSeries++;
    else if (Array.isArray(value)) value.forEach(count);
    else if (value !== null && typeof value === "object") Object.values(value).forEach(count);
  };
  count(parsed);
  return { text: JSON.stringify(cut(parsed), null, 2), cutSeries };
}
