/**
 * `csv/summary.csv`: the package's summary tables (results.json `summary`) as one long table, one row per figure
 * or verdict, so that a spreadsheet filters it by its first column instead of finding blocks of unlike columns.
 *
 * Columns: `table` (`constructions`, `scenarios`, `failed-checks`, `open-items`), `subject` (a construction,
 * scenario or `<scenario>:<surface>`, a check subject or an open item id), `quantity` (the figure, named as in the
 * other CSV files without the unit; a check id; an open item kind), `value` and `limit` in the row's `unit`
 * (ASCII, as in the column names of the other files; empty for text and for checks, which state no unit),
 * `verdict` (`pass` or `fail`; for open items `blocking`, `acknowledged` or `open`), `text` (the limit's
 * clause, the check's description, the item's text, a weather peak's time stamp) and `at` (file:line:col).
 */
import { type CsvTable, csvTable, type CsvValue, verdictCell } from "../tables/csvTable.ts";
import type { LimitResult } from "../results/limitResults.ts";
import type { ConstructionSummary, OpenItem, ScenarioSummary, SummaryJson } from "../results/summaryTypes.ts";
import { SYNTHETIC_STAMP } from "../results/syntheticWeather.ts";
import type { ResultsJson } from "../results/types.ts";

export const SUMMARY_HEADER = [
  "table",
  "subject",
  "quantity",
  "value",
  "unit",
  "limit",
  "verdict",
  "text",
  "at",
];

/** J per kWh (exact: 1 kWh = 3.6 MJ), the package's energy unit. */
const J_PER_KWH = 3_600_000;

interface Row {
  readonly quantity: string;
  readonly value: CsvValue;
  readonly unit: string;
  readonly limit?: number;
  readonly verdict?: string;
  readonly text?: string;
  readonly at?: string;
}

function line(table: string, subject: string, r: Row): CsvValue[] {
  return [
    table,
    subject,
    r.quantity,
    r.value,
    r.unit,
    r.limit ?? null,
    r.verdict ?? null,
    r.text ?? null,
    r.at ?? null,
  ];
}

/** The summary of a build as `csv/summary.csv`; no rows when the results carry no summary. */
export function summaryCsv(results: ResultsJson): CsvTable {
  const summary: SummaryJson | undefined = results.summary;
  const rows: CsvValue[][] = [];
  for (const c of summary?.constructions ?? []) {
    const limits = (results.constructions[c.id]?.["limits"] ?? []) as readonly LimitResult[];
    for (const r of constructionRows(c, limits)) rows.push(line("constructions", c.id, r));
  }
  for (const s of summary?.scenarios ?? []) {
    for (const [subject, r] of scenarioRows(s)) rows.push(line("scenarios", subject, r));
  }
  for (const f of summary?.failedChecks ?? []) {
    rows.push(line("failed-checks", f.subject, {
      quantity: f.id,
      value: f.value,
      unit: "",
      limit: f.limit,
      verdict: "fail",
      text: f.description,
    }));
  }
  for (const item of summary?.openItems ?? []) rows.push(line("open-items", item.id, openItemRow(item)));
  return csvTable("csv/summary.csv", SUMMARY_HEADER, rows);
}

function constructionRows(c: ConstructionSummary, limits: readonly LimitResult[]): Row[] {
  const rows: Row[] = [
    { quantity: "U", value: c.U, unit: "W_m2K" },
    { quantity: "U_c", value: c.correctedU, unit: "W_m2K" },
    { quantity: "decrement_factor", value: c.decrementFactor, unit: "1" },
    { quantity: "time_lag", value: c.timeLag_h, unit: "h" },
    {
      quantity: "inside_areal_heat_capacity",
      value: c.kappa1 === null ? null : c.kappa1 / 1000,
      unit: "kJ_m2K",
    },
    { quantity: "f_Rsi", value: c.fRsi, unit: "1" },
    { quantity: "f_Rsi_R_si", value: c.fRsiSurfaceResistance, unit: "m2K_W" },
  ];
  for (const l of c.limits) {
    const full = limits.find((x) => x.id === l.id);
    rows.push({
      quantity: `limit_${l.limitKey.replaceAll("-", "_")}`,
      value: l.value,
      unit: LIMIT_UNITS[l.limitKey] ?? "",
      limit: l.limit,
      verdict: verdictCell(l.pass),
      text: l.clause,
      ...(full === undefined ? {} : { at: full.at }),
    });
  }
  return rows;
}

const LIMIT_UNITS: Readonly<Record<string, string>> = {
  "max-u": "W_m2K",
  "max-periodic-transmittance": "W_m2K",
  "min-time-lag": "h",
  "min-temperature-factor": "1",
};

function scenarioRows(s: ScenarioSummary): [string, Row][] {
  const stamp = s.synthetic ? { text: SYNTHETIC_STAMP } : {};
  const rows: [string, Row][] = [];
  const add = (r: Row, subject = s.id) => rows.push([subject, r]);
  if (s.peakGain !== null) {
    add({ quantity: "peak_heat_gain", value: s.peakGain.value, unit: "W", ...stamp });
    add({
      quantity: "peak_heat_gain_time",
      value: s.peakGain.time_h,
      unit: "h",
      ...(s.peakGain.time === null ? stamp : { text: s.peakGain.time }),
    });
  }
  if (s.dailyEnergy !== null) {
    add({
      quantity: "daily_heat_gain_energy",
      value: s.dailyEnergy.gain_J / J_PER_KWH,
      unit: "kWh",
      ...stamp,
    });
    add({
      quantity: "daily_heat_loss_energy",
      value: s.dailyEnergy.loss_J / J_PER_KWH,
      unit: "kWh",
      ...stamp,
    });
  }
  if (s.peakCoolingLoad !== null) {
    add({ quantity: "peak_cooling_load", value: s.peakCoolingLoad.value, unit: "W" });
    add({ quantity: "peak_cooling_load_time", value: s.peakCoolingLoad.time_h, unit: "h" });
  }
  if (s.designHeatLoss !== null) add({ quantity: "design_heat_loss", value: s.designHeatLoss, unit: "W" });
  for (const v of s.surfaces) {
    const subject = `${s.id}:${v.surface}`;
    add({
      quantity: "surface_condensation_margin",
      value: v.condensation.margin,
      unit: "K",
      verdict: verdictCell(v.condensation.pass),
      text: `construction ${v.construction}`,
    }, subject);
    add({
      quantity: "mould_f_Rsi_margin",
      value: v.mould.margin,
      unit: "1",
      verdict: verdictCell(v.mould.pass),
      text: `construction ${v.construction}`,
    }, subject);
  }
  return rows;
}

function openItemRow(item: OpenItem): Row {
  const ack = item.acknowledged;
  return {
    quantity: item.kind,
    value: null,
    unit: "",
    verdict: ack !== null ? "acknowledged" : item.blocking ? "blocking" : "open",
    text: ack === null ? item.text : `${item.text} (acknowledged by ${ack.by} at ${ack.at}: ${ack.reason})`,
    at: item.at,
  };
}
