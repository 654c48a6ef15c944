/**
 * The CSV files of a room: `csv/room-<id>.csv` (a row per step of the design day), `csv/room-<id>-series.csv`
 * (the generated radiant time series) and, with a heating scenario, `csv/room-<id>-heat-loss.csv` (the table's
 * lines and a last `total` row).
 */
import { type CsvTable, csvTable, type CsvValue } from "../../tables/csvTable.ts";
import type { RoomResults } from "./roomTypes.ts";

/** A `bySource` key as a CSV subject: `surface:roof` → `surface-roof`. */
const subject = (label: string) => label.replaceAll(":", "-");

/** The hourly table of a room: temperatures, both loads, their difference, latent gain and the split by source. */
function roomSteps(id: string, room: RoomResults): CsvTable {
  const surfaces = Object.entries(room.surfaces);
  const sources = Object.entries(room.coolingLoad.bySource);
  const header = [
    "time_h",
    "air_degC",
    "outdoor_degC",
    "mean_radiant_degC",
    "heat_balance_load_W",
    "rts_method_load_W",
    "rts_minus_heat_balance_W",
    "latent_W",
    ...surfaces.map(([sid]) => `${sid}:inside_surface_degC`),
    ...sources.map(([label]) => `${subject(label)}:load_W`),
  ];
  const stepsPerHour = Math.round(1 / room.timestep_h);
  const cl = room.coolingLoad;
  const rows: CsvValue[][] = cl.heatBalance.map((load, k) => {
    const hour = k % stepsPerHour === 0 ? k / stepsPerHour : undefined;
    return [
      k * room.timestep_h,
      room.airTemperature[k]!,
      room.outdoor[k]!,
      room.meanRadiantTemperature[k]!,
      load,
      hour === undefined ? null : cl.rtsMethod[hour]!,
      hour === undefined ? null : cl.difference[hour]!,
      cl.latent[k]!,
      ...surfaces.map(([, s]) => s.insideSurfaceTemperature[k]!),
      ...sources.map(([, part]) => part[k]!),
    ];
  });
  return csvTable(`csv/room-${id}.csv`, header, rows);
}

/** The room's own radiant time series, a row per hour. */
function roomSeries(id: string, room: RoomResults): CsvTable {
  const series = room.coolingLoad.radiantTimeSeries;
  return csvTable(
    `csv/room-${id}-series.csv`,
    ["hour_h", "nonsolar_1", "solar_1"],
    series.nonsolar.map((r, h) => [h, r, series.solar[h]!]),
  );
}

/** The heat loss lines and their total. */
function roomHeatLoss(id: string, room: RoomResults): CsvTable | undefined {
  const heating = room.heating;
  if (heating === undefined) return undefined;
  const header = ["group", "item", "formula", "H_W_K", "delta_T_K", "heat_loss_W"];
  const rows: CsvValue[][] = heating.lines.map((l) => [l.group, l.id, l.formula, l.H, l.deltaT, l.phi]);
  rows.push([
    "total",
    null,
    null,
    room.heatLossCoefficient ?? null,
    heating.indoor - heating.outdoor,
    heating.total,
  ]);
  return csvTable(`csv/room-${id}-heat-loss.csv`, header, rows);
}

/** Every CSV table of the project's rooms, in room order. */
export function roomCsvTables(rooms: Readonly<Record<string, RoomResults>> | undefined): CsvTable[] {
  return Object.entries(rooms ?? {}).flatMap(([id, room]) => {
    const loss = roomHeatLoss(id, room);
    return [roomSteps(id, room), roomSeries(id, room), ...(loss === undefined ? [] : [loss])];
  });
}
