/** Reads the optional `radiant-time-series` key of a design-day scenario: 24 fractions and their source. */
import { type Diagnostic, error, errorCount } from "./diagnostic.ts";
import { describe, type Fields, readFields, readText, withSuggestion } from "./fields.ts";
import type { RadiantTimeSeries, Scenario } from "./model.ts";

/** Allowed keys of the `radiant-time-series` mapping. */
export const RADIANT_TIME_SERIES_KEYS = ["values", "source", "room"] as const;
/** Number of hourly terms r_0 … r_23 of a radiant time series. */
export const RADIANT_TIME_SERIES_LENGTH = 24;
/** How far Σ r_j may be from 1 (printed tables are rounded). */
export const RADIANT_TIME_SERIES_SUM_TOLERANCE = 1e-3;

/** Reads `radiant-time-series: { values: [24 numbers], source: "…" }`; absent key gives undefined. */
export function readRadiantTimeSeries(fields: Fields, out: Diagnostic[]): RadiantTimeSeries | undefined {
  const entry = fields.entries.get("radiant-time-series");
  if (entry === undefined) return undefined;
  const rts = readFields(entry.value, RADIANT_TIME_SERIES_KEYS, "radiant time series", out);
  if (rts === undefined) return undefined;
  const before = errorCount(out);
  if (rts.entries.has("room")) return readRoomSeries(rts, entry.value.at, out);
  const values = readValues(rts, out);
  const source = readText(rts, "source", out);
  if (source === undefined && !rts.entries.has("source")) {
    out.push(
      error(
        rts.at,
        "missing-key",
        'Missing required key "source" in the radiant time series',
        'say where the 24 values come from: publication, edition, table and row, or "project assumption" and who set it',
      ),
    );
  }
  if (errorCount(out) > before || values === undefined || source === undefined) return undefined;
  return { values, source, at: entry.value.at };
}

/** The source a series generated for a room is given in the package. */
export function roomSeriesSource(roomId: string): string {
  return `the non-solar radiant time series this package generates for room "${roomId}" from its own constructions (heat balance, unit radiant pulse)`;
}

/** `radiant-time-series: { room: <id> }`: the room's own series, alone (no values, no source). */
function readRoomSeries(
  rts: Fields,
  at: RadiantTimeSeries["at"],
  out: Diagnostic[],
): RadiantTimeSeries | undefined {
  const before = errorCount(out);
  for (const key of ["values", "source"]) {
    const other = rts.entries.get(key);
    if (other === undefined) continue;
    out.push(
      error(
        other.keyAt,
        "rts-room-and-values",
        `Cannot give "${key}" with "room" in the radiant time series: the room's own series is used`,
        `remove "${key}", or remove "room" to give the 24 values and their source yourself`,
      ),
    );
  }
  const room = readText(rts, "room", out);
  if (errorCount(out) > before || room === undefined) return undefined;
  return { values: [], source: roomSeriesSource(room), room, at };
}

function readValues(rts: Fields, out: Diagnostic[]): number[] | undefined {
  const entry = rts.entries.get("values");
  if (entry === undefined) {
    out.push(
      error(
        rts.at,
        "missing-key",
        'Missing required key "values" in the radiant time series',
        "add `values: [r0, r1, …, r23]`, 24 fractions that sum to 1, r0 for the hour of the gain",
      ),
    );
    return undefined;
  }
  const list = entry.value;
  if (list.kind !== "list") {
    out.push(
      error(
        list.at,
        "expected-list",
        `Expected a list of 24 numbers for "values" in the radiant time series, found ${describe(list)}`,
        "write `[0.47, 0.19, …]`, r0 (the hour of the gain) first",
      ),
    );
    return undefined;
  }
  if (list.items.length !== RADIANT_TIME_SERIES_LENGTH) {
    out.push(
      error(
        list.at,
        "rts-length",
        `Expected 24 values in the radiant time series, found ${list.items.length}`,
        "give r0 … r23: one fraction per hour, r0 for the hour of the gain",
      ),
    );
    return undefined;
  }
  const values: number[] = [];
  for (const [j, item] of list.items.entries()) {
    if (item.kind !== "scalar" || typeof item.value !== "number" || !Number.isFinite(item.value)) {
      out.push(
        error(
          item.at,
          "expected-number",
          `Expected a plain number for r${j} of the radiant time series, found ${describe(item)}`,
          "write fractions without a unit, e.g. 0.47 (not 47 %)",
        ),
      );
      return undefined;
    }
    if (item.value < 0) {
      out.push(
        error(
          item.at,
          "rts-negative",
          `Value r${j} = ${item.text} of the radiant time series is negative`,
          "every term of a radiant time series is a fraction from 0 to 1",
        ),
      );
      return undefined;
    }
    values.push(item.value);
  }
  const sum = values.reduce((a, b) => a + b, 0);
  if (Math.abs(sum - 1) > RADIANT_TIME_SERIES_SUM_TOLERANCE) {
    out.push(
      error(
        list.at,
        "rts-sum",
        `The radiant time series sums to ${
          Number(sum.toPrecision(6))
        }, not 1 (tolerance ${RADIANT_TIME_SERIES_SUM_TOLERANCE})`,
        Math.abs(sum - 100) <= 100 * RADIANT_TIME_SERIES_SUM_TOLERANCE
          ? "the values look like percent: divide each by 100"
          : "check the values against their source; the 24 fractions must sum to 1",
      ),
    );
    return undefined;
  }
  return values;
}

/** A design day's `radiant-time-series: { room }` must name a room of the project (a broken room adds no error). */
export function checkRoomSeriesReferences(
  scenarios: readonly Scenario[],
  roomIds: readonly string[],
  brokenRoomIds: ReadonlySet<string>,
  out: Diagnostic[],
): void {
  for (const scenario of scenarios) {
    const series = scenario.kind === "design-day" ? scenario.radiantTimeSeries : undefined;
    const room = series?.room;
    if (series === undefined || room === undefined || roomIds.includes(room) || brokenRoomIds.has(room)) {
      continue;
    }
    out.push(
      error(
        series.at,
        "unknown-room",
        `Unknown room "${room}" for the radiant time series of scenario "${scenario.id}"`,
        withSuggestion(room, roomIds, `rooms defined: ${roomIds.join(", ") || "none (add a room block)"}`),
      ),
    );
  }
}
