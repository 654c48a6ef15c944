/** The CSV of a heating scenario, `csv/heating-<id>.csv`: one row per surface, then the total heat loss. */
import type { HeatingResults } from "./heatingTypes.ts";
import { type CsvTable, csvTable, type CsvValue, verdictCell } from "../tables/csvTable.ts";

const HEADER = [
  "surface",
  "construction",
  "area_m2",
  "U_W_m2K",
  "heat_loss_W",
  "R_si_moisture_m2K_W",
  "inside_surface_degC",
  "f_Rsi_1",
  "f_Rsi_min_1",
  "dew_point_degC",
  "surface_condensation_verdict",
  "mould_verdict",
  "U_c_W_m2K",
];

/** The heating table: per surface its figures and ISO 13788 verdicts, and a last row `total` with the heat loss. */
export function heatingCsv(id: string, r: HeatingResults): CsvTable {
  const rows: CsvValue[][] = Object.entries(r.surfaces).map(([sid, s]) => [
    sid,
    s.construction,
    s.area,
    s.U,
    s.heatLoss,
    s.moistureSurfaceResistance,
    s.insideSurfaceTemperature,
    s.fRsi,
    s.fRsiMin,
    s.dewPoint,
    verdictCell(s.surfaceCondensation.pass),
    verdictCell(s.mould.pass),
    s.correctedU,
  ]);
  const total: CsvValue[] = HEADER.map(() => null);
  total[0] = "total";
  total[4] = r.totalHeatLoss;
  return csvTable(`csv/heating-${id}.csv`, HEADER, [...rows, total]);
}
