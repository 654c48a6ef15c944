/**
 * The CSV tables built from results.json (constructions, response factors, design days) and the output files of
 * every CSV table of a build in the chosen locale. The naming, rounding and quoting rules are in
 * `src/results/csvTable.ts`.
 */
import type { Model } from "../project/model.ts";
import {
  csvChunks,
  type CsvLocale,
  type CsvTable,
  csvTable,
  csvText,
  type CsvValue,
  verdictCell,
} from "../tables/csvTable.ts";
import type { LimitResult } from "../results/limitResults.ts";
import type { LimitQuantity } from "../project/model.ts";
import type { ResultsJson } from "../results/types.ts";
import { coolingLoadCells, coolingLoadHeader } from "./csvCoolingLoad.ts";
import type { OutputFile } from "./writeOutput.ts";

export { csvCell } from "../tables/csvTable.ts";

/** Tables with fewer rows are written as one text, larger ones in pieces. */
const WHOLE_TEXT_ROWS = 10_000;

/** The output files of CSV tables in a locale; a table made row by row (a weather year) is written in pieces. */
export function csvOutputFiles(tables: readonly CsvTable[], locale: CsvLocale): OutputFile[] {
  return tables.map((table) => {
    const rows = table.rows();
    return Array.isArray(rows) && rows.length <= WHOLE_TEXT_ROWS
      ? { path: table.path, text: csvText(table, locale) }
      : { path: table.path, chunks: () => csvChunks(table, locale) };
  });
}

/** Limit columns of constructions.csv: the limit key, the unit of its value, and the figure it is compared with. */
const LIMIT_COLUMNS: readonly { readonly key: LimitQuantity; readonly unit: string }[] = [
  { key: "max-u", unit: "W_m2K" },
  { key: "max-periodic-transmittance", unit: "W_m2K" },
  { key: "min-time-lag", unit: "h" },
  { key: "min-temperature-factor", unit: "1" },
];

const CONSTRUCTION_HEADER = [
  "id",
  "name",
  "U_W_m2K",
  "R_m2K_W",
  "areal_heat_capacity_kJ_m2K",
  "timestep_h",
  "U_c_W_m2K",
  "decrement_factor_1",
  "time_lag_h",
  "periodic_transmittance_W_m2K",
  "inside_areal_heat_capacity_kJ_m2K",
  "f_Rsi_1",
  "f_Rsi_R_si_m2K_W",
  ...LIMIT_COLUMNS.flatMap(({ key, unit }) => {
    const name = `limit_${key.replaceAll("-", "_")}`;
    return [`${name}_${unit}`, `${name}_verdict`];
  }),
];

/** A number at a path of a results.json object, or null. */
export function numberAt(value: unknown, ...path: string[]): number | null {
  let at: unknown = value;
  for (const key of path) {
    if (typeof at !== "object" || at === null) return null;
    at = (at as Record<string, unknown>)[key];
  }
  return typeof at === "number" ? at : null;
}

const kilo = (j: number | null) => (j === null ? null : j / 1000);

/**
 * One row per construction: U, R, areal heat capacity (kJ/(m²K), as in the package), time step, U with
 * corrections (U_c), the ISO 13786 figures, f_Rsi with the R_si behind it, and per limit kind its value and verdict
 * (empty when the construction has no such limit).
 */
export function constructionsCsv(model: Model, results: ResultsJson): CsvTable {
  const rows = model.constructions.map((c): CsvValue[] => {
    const r = results.constructions[c.id];
    if (r === undefined) return [c.id, c.name, ...CONSTRUCTION_HEADER.slice(2).map(() => null)];
    const limits = (r["limits"] ?? []) as readonly LimitResult[];
    return [
      c.id,
      c.name,
      r.U,
      r.R,
      r.steady.arealHeatCapacity / 1000,
      r.timestep_h,
      numberAt(r, "correctedU") ?? r.U,
      numberAt(r, "dynamic", "decrementFactor"),
      numberAt(r, "dynamic", "timeLag_h"),
      numberAt(r, "dynamic", "periodicTransmittance", "amplitude"),
      kilo(numberAt(r, "dynamic", "arealHeatCapacityInside")),
      numberAt(r, "temperatureFactor"),
      numberAt(r, "temperatureFactorRsi") ?? r.steady.insideSurfaceResistance,
      ...LIMIT_COLUMNS.flatMap(({ key }): CsvValue[] => {
        const limit = limits.find((l) => l.limitKey === key);
        return limit === undefined ? [null, null] : [limit.limit, verdictCell(limit.pass)];
      }),
    ];
  });
  return csvTable("csv/constructions.csv", CONSTRUCTION_HEADER, rows);
}

const FACTOR_HEADER = ["j", "time_h", "X_W_m2K", "Y_W_m2K", "Z_W_m2K"];

/** Response factors of one construction, one row per term: j, time (h), X, Y, Z (W/(m²K)), air to air. */
export function factorsCsv(id: string, results: ResultsJson): CsvTable {
  const path = `csv/factors-${id}.csv`;
  const c = results.constructions[id] as {
    responseFactors?: { X: number[]; Y: number[]; Z: number[] };
    timestep_h: number;
  } | undefined;
  const rf = c?.responseFactors;
  if (rf === undefined || c === undefined) return csvTable(path, FACTOR_HEADER, []);
  return csvTable(
    path,
    FACTOR_HEADER,
    rf.X.map((x, j) => [j, j * c.timestep_h, x, rf.Y[j] ?? null, rf.Z[j] ?? null]),
  );
}

/**
 * Design-day series of one scenario, one row per step: `time_h`, `outdoor_degC`, `indoor_degC`, per surface
 * `<id>:incident_W_m2`, `<id>:sol_air_degC`, `<id>:inside_flux_W_m2`, `<id>:heat_gain_W` (the columns of the
 * weather-year file), `total_heat_gain_W`, then the cooling load columns when there is a radiant time series.
 */
export function designDayCsv(id: string, results: ResultsJson): CsvTable {
  const path = `csv/scenario-${id}.csv`;
  const s = results.scenarios[id];
  if (s === undefined) return csvTable(path, [], []);
  const surfaces = Object.entries(s.surfaces);
  const header = [
    "time_h",
    "outdoor_degC",
    "indoor_degC",
    ...surfaces.flatMap(([sid]) =>
      ["incident_W_m2", "sol_air_degC", "inside_flux_W_m2", "heat_gain_W"].map((c) => `${sid}:${c}`)
    ),
    "total_heat_gain_W",
    ...coolingLoadHeader(s),
  ];
  const rows = s.outdoor.map((outdoor, k): CsvValue[] => [
    k * s.timestep_h,
    outdoor,
    s.indoor[k] ?? null,
    ...surfaces.flatMap((
      [, v],
    ) => [v.incident[k] ?? null, v.solAir[k] ?? null, v.insideFlux[k] ?? null, v.heatGain[k] ?? null]),
    s.totalHeatGain[k] ?? null,
    ...coolingLoadCells(s, k),
  ]);
  return csvTable(path, header, rows);
}
