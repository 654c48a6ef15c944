/** The CSV of a heating scenario, `csv/heating-<id>.csv`: one row per surface, SI units. */
import type { HeatingResults } from "./heatingTypes.ts";

const HEADER = [
  "surface",
  "construction",
  "area_m2",
  "U_W_per_m2K",
  "heat_loss_W",
  "R_si_moisture_m2K_per_W",
  "inside_surface_C",
  "f_Rsi",
  "f_Rsi_min",
  "dew_point_C",
  "surface_condensation",
  "mould",
  "U_c_W_per_m2K",
];

/** Path and text of the heating CSV; ids are validated identifiers, so no cell needs quoting. */
export function heatingCsv(id: string, r: HeatingResults): { path: string; text: string } {
  const rows = Object.entries(r.surfaces).map(([sid, s]) =>
    [
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
      s.surfaceCondensation.pass ? "pass" : "fail",
      s.mould.pass ? "pass" : "fail",
      s.correctedU,
    ].join(",")
  );
  const total = ["total", "", "", "", r.totalHeatLoss, "", "", "", "", "", "", "", ""].join(",");
  return { path: `csv/heating-${id}.csv`, text: `${[HEADER.join(","), ...rows, total].join("\n")}\n` };
}
