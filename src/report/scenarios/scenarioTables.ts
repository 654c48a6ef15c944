/** The step-by-step tables of a design day (temperatures, heat gains, irradiance) and a weather year's months. */
import type { ScenarioResults, SurfaceResults } from "../../results/types.ts";
import { type DisplayUnits, toDisplay, unitLabel } from "../page/displayUnits.ts";
import { formatFixed } from "../page/format.ts";
import { html, type Trusted } from "../page/html.ts";
import { clockTime, MONTH_NAMES } from "./scenarioData.ts";
import { energyText, heatGainText } from "./scenarioSummary.ts";

/** Up to this many surfaces share one table with the temperatures; more split into temperature and gain tables. */
export const COMBINED_TABLE_MAX_SURFACES = 3;

type Entry = readonly [string, SurfaceResults];

/** The cell formats of one rendering: temperatures to 0.1, irradiance and heat gain whole, in display units. */
interface Cells {
  readonly temperature: (value: number | undefined) => string;
  readonly incident: (value: number | undefined) => string;
  readonly gain: (value: number | undefined) => string;
  /** Unit labels of temperature, heat gain and irradiance. */
  readonly t: string;
  readonly w: string;
  readonly irradiance: string;
}

function cellsFor(d: DisplayUnits): Cells {
  return {
    temperature: (v) => v === undefined ? "—" : formatFixed(toDisplay(d, "temperature", v), 1),
    incident: (v) => v === undefined ? "—" : formatFixed(toDisplay(d, "irradiance", v), 0),
    gain: (v) => v === undefined ? "—" : heatGainText(d, v),
    t: unitLabel(d, "temperature"),
    w: unitLabel(d, "heatGain"),
    irradiance: unitLabel(d, "irradiance"),
  };
}

function timeCell(results: ScenarioResults, k: number): Trusted {
  return html`<td class="num" data-q="time">${clockTime(k * results.timestep_h)}</td>`;
}

function airCells(results: ScenarioResults, k: number, c: Cells): Trusted {
  return html`
    <td class="num" data-q="outdoor">${c.temperature(results.outdoor[k])}</td>
    <td class="num" data-q="indoor">${c.temperature(results.indoor[k])}</td>
  `;
}

function totalCell(results: ScenarioResults, k: number, c: Cells): Trusted {
  return html`<td class="num total-col" data-q="total">${c.gain(results.totalHeatGain[k])}</td>`;
}

function rows(results: ScenarioResults, cells: (k: number) => Trusted): Trusted[] {
  return results.totalHeatGain.map((_, k) => html`<tr>${cells(k)}</tr>`);
}

function combinedTable(id: string, results: ScenarioResults, surfaces: readonly Entry[], c: Cells): Trusted {
  const groupHead = surfaces.map(([sid]) => html`<th colspan="2">${sid}</th>`);
  const subHead = surfaces.map(() =>
    html`
      <th>Sol-air ${c.t}</th>
      <th>Heat gain ${c.w}</th>
    `
  );
  const body = rows(
    results,
    (k) =>
      html`${timeCell(results, k)}${airCells(results, k, c)}${
        surfaces.map(([, s]) =>
          html`
            <td class="num" data-q="solair">${c.temperature(s.solAir[k])}</td>
            <td class="num" data-q="gain">${c.gain(s.heatGain[k])}</td>
          `
        )
      }${totalCell(results, k, c)}`,
  );
  return html`
    <table class="hourly hourly-gains compact">
      <caption>Scenario ${id} at every step: air temperatures, sol-air temperature and heat gain per surface, and the total heat gain (positive into the room).</caption>
      <thead>
        <tr><th rowspan="2">Time</th><th rowspan="2">Outdoor ${c.t}</th><th rowspan="2">Indoor ${c
          .t}</th>${groupHead}<th rowspan="2">Total heat gain ${c.w}</th></tr>
        <tr>${subHead}</tr>
      </thead>
      <tbody>${body}</tbody>
    </table>
  `;
}

function splitTables(id: string, results: ScenarioResults, surfaces: readonly Entry[], c: Cells): Trusted {
  const tempHead = surfaces.map(([sid]) => html`<th>${sid}<br><span class="unit">sol-air ${c.t}</span></th>`);
  const gainHead = surfaces.map(([sid]) =>
    html`<th>${sid}<br><span class="unit">heat gain ${c.w}</span></th>`
  );
  const tempBody = rows(
    results,
    (k) =>
      html`${timeCell(results, k)}${airCells(results, k, c)}${
        surfaces.map(([, s]) => html`<td class="num" data-q="solair">${c.temperature(s.solAir[k])}</td>`)
      }`,
  );
  const gainBody = rows(
    results,
    (k) =>
      html`${timeCell(results, k)}${
        surfaces.map(([, s]) => html`<td class="num" data-q="gain">${c.gain(s.heatGain[k])}</td>`)
      }${totalCell(results, k, c)}`,
  );
  return html`
    <table class="hourly hourly-temperatures compact">
      <caption>Scenario ${id} at every step: outdoor and indoor air and the sol-air temperature of each surface, ${c
        .t}.</caption>
      <thead>
        <tr><th>Time</th><th>Outdoor ${c.t}</th><th>Indoor ${c.t}</th>${tempHead}</tr>
      </thead>
      <tbody>${tempBody}</tbody>
    </table>
    <table class="hourly hourly-gains compact">
      <caption>Scenario ${id} at every step: heat gain of each surface and the total, ${c
        .w} (positive into the room).</caption>
      <thead>
        <tr><th>Time</th>${gainHead}<th>Total heat gain ${c.w}</th></tr>
      </thead>
      <tbody>${gainBody}</tbody>
    </table>
  `;
}

function irradianceTable(
  id: string,
  results: ScenarioResults,
  surfaces: readonly Entry[],
  c: Cells,
): Trusted {
  if (surfaces.every(([, s]) => s.incident.length === 0)) {
    return html`<p class="muted">No irradiance table: every surface of ${id} has given sol-air temperatures.</p>`;
  }
  const head = surfaces.map(([sid]) => html`<th>${sid}</th>`);
  const body = rows(
    results,
    (k) =>
      html`${timeCell(results, k)}${
        surfaces.map(([, s]) => html`<td class="num" data-q="incident">${c.incident(s.incident[k])}</td>`)
      }`,
  );
  return html`
    <table class="hourly hourly-irradiance compact">
      <caption>Scenario ${id}: total solar irradiance incident on each surface (beam, sky diffuse and ground-reflected), ${c
        .irradiance}; "—" where the surface was given sol-air temperatures.</caption>
      <thead>
        <tr><th>Time</th>${head}</tr>
      </thead>
      <tbody>${body}</tbody>
    </table>
  `;
}

/**
 * Renders the design-day tables in the display units: one combined table for few surfaces, else temperatures
 * and gains apart; then irradiance.
 */
export function renderStepTables(id: string, results: ScenarioResults, d: DisplayUnits): Trusted {
  const surfaces = Object.entries(results.surfaces);
  const c = cellsFor(d);
  const main = surfaces.length <= COMBINED_TABLE_MAX_SURFACES
    ? combinedTable(id, results, surfaces, c)
    : splitTables(id, results, surfaces, c);
  return html`${main}${irradianceTable(id, results, surfaces, c)}`;
}

/** Renders the monthly gain and loss of all surfaces together (kWh or kBtu), with the totals of results.json below. */
export function renderMonthlyTable(
  id: string,
  months: readonly { gain_J: number; loss_J: number }[],
  totals: { gain_J: number; loss_J: number },
  d: DisplayUnits,
): Trusted {
  const kwh = (joules: number) => energyText(d, joules);
  const unit = unitLabel(d, "energy");
  const body = months.map((m, i) =>
    html`
      <tr>
        <td>${MONTH_NAMES[i] ?? String(i + 1)}</td>
        <td class="num" data-q="gain">${kwh(m.gain_J)}</td>
        <td class="num" data-q="loss">${kwh(m.loss_J)}</td>
        <td class="num">${kwh(m.gain_J - m.loss_J)}</td>
      </tr>
    `
  );
  return html`
    <table class="monthly compact">
      <caption>Scenario ${id}: monthly heat gain and heat loss through all surfaces, ${unit}.</caption>
      <thead>
        <tr>
          <th>Month</th>
          <th>Heat gain ${unit}</th>
          <th>Heat loss ${unit}</th>
          <th>Net (gain − loss) ${unit}</th>
        </tr>
      </thead>
      <tbody>${body}<tr class="total"><td>Year</td><td class="num">${kwh(
        totals.gain_J,
      )}</td><td class="num">${kwh(totals.loss_J)}</td><td class="num">${kwh(
        totals.gain_J - totals.loss_J,
      )}</td></tr></tbody>
    </table>
  `;
}
