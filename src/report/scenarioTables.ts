/** The step-by-step tables of a design day (temperatures, heat gains, irradiance) and a weather year's months. */
import type { ScenarioResults, SurfaceResults } from "../results/types.ts";
import { formatFixed } from "./format.ts";
import { html, type Trusted } from "./html.ts";
import { clockTime, MONTH_NAMES } from "./scenarioData.ts";
import { kwh, watts } from "./scenarioSummary.ts";

/** Up to this many surfaces share one table with the temperatures; more split into temperature and gain tables. */
export const COMBINED_TABLE_MAX_SURFACES = 3;

type Entry = readonly [string, SurfaceResults];

const temperature = (value: number | undefined) => value === undefined ? "—" : formatFixed(value, 1);
const incident = (value: number | undefined) => value === undefined ? "—" : formatFixed(value, 0);
const gain = (value: number | undefined) => value === undefined ? "—" : watts(value);

function timeCell(results: ScenarioResults, k: number): Trusted {
  return html`<td class="num" data-q="time">${clockTime(k * results.timestep_h)}</td>`;
}

function airCells(results: ScenarioResults, k: number): Trusted {
  return html`
    <td class="num" data-q="outdoor">${temperature(results.outdoor[k])}</td>
    <td class="num" data-q="indoor">${temperature(results.indoor[k])}</td>
  `;
}

function totalCell(results: ScenarioResults, k: number): Trusted {
  return html`<td class="num total-col" data-q="total">${gain(results.totalHeatGain[k])}</td>`;
}

function rows(results: ScenarioResults, cells: (k: number) => Trusted): Trusted[] {
  return results.totalHeatGain.map((_, k) => html`<tr>${cells(k)}</tr>`);
}

function combinedTable(id: string, results: ScenarioResults, surfaces: readonly Entry[]): Trusted {
  const groupHead = surfaces.map(([sid]) => html`<th colspan="2">${sid}</th>`);
  const subHead = surfaces.map(() =>
    html`
      <th>Sol-air °C</th>
      <th>Heat gain W</th>
    `
  );
  const body = rows(
    results,
    (k) =>
      html`${timeCell(results, k)}${airCells(results, k)}${
        surfaces.map(([, s]) =>
          html`
            <td class="num" data-q="solair">${temperature(s.solAir[k])}</td>
            <td class="num" data-q="gain">${gain(s.heatGain[k])}</td>
          `
        )
      }${totalCell(results, k)}`,
  );
  return html`
    <table class="hourly hourly-gains compact">
      <caption>Scenario ${id} at every step: air temperatures, sol-air temperature and heat gain per surface, and the total heat gain (positive into the room).</caption>
      <thead>
        <tr><th rowspan="2">Time</th><th rowspan="2">Outdoor °C</th><th rowspan="2">Indoor °C</th>${groupHead}<th rowspan="2">Total heat gain W</th></tr>
        <tr>${subHead}</tr>
      </thead>
      <tbody>${body}</tbody>
    </table>
  `;
}

function splitTables(id: string, results: ScenarioResults, surfaces: readonly Entry[]): Trusted {
  const tempHead = surfaces.map(([sid]) => html`<th>${sid}<br><span class="unit">sol-air °C</span></th>`);
  const gainHead = surfaces.map(([sid]) => html`<th>${sid}<br><span class="unit">heat gain W</span></th>`);
  const tempBody = rows(
    results,
    (k) =>
      html`${timeCell(results, k)}${airCells(results, k)}${
        surfaces.map(([, s]) => html`<td class="num" data-q="solair">${temperature(s.solAir[k])}</td>`)
      }`,
  );
  const gainBody = rows(
    results,
    (k) =>
      html`${timeCell(results, k)}${
        surfaces.map(([, s]) => html`<td class="num" data-q="gain">${gain(s.heatGain[k])}</td>`)
      }${totalCell(results, k)}`,
  );
  return html`
    <table class="hourly hourly-temperatures compact">
      <caption>Scenario ${id} at every step: outdoor and indoor air and the sol-air temperature of each surface, °C.</caption>
      <thead>
        <tr><th>Time</th><th>Outdoor °C</th><th>Indoor °C</th>${tempHead}</tr>
      </thead>
      <tbody>${tempBody}</tbody>
    </table>
    <table class="hourly hourly-gains compact">
      <caption>Scenario ${id} at every step: heat gain of each surface and the total, W (positive into the room).</caption>
      <thead>
        <tr><th>Time</th>${gainHead}<th>Total heat gain W</th></tr>
      </thead>
      <tbody>${gainBody}</tbody>
    </table>
  `;
}

function irradianceTable(id: string, results: ScenarioResults, surfaces: readonly Entry[]): Trusted {
  if (surfaces.every(([, s]) => s.incident.length === 0)) {
    return html`<p class="muted">No irradiance table: every surface of ${id} has given sol-air temperatures.</p>`;
  }
  const head = surfaces.map(([sid]) => html`<th>${sid}</th>`);
  const body = rows(
    results,
    (k) =>
      html`${timeCell(results, k)}${
        surfaces.map(([, s]) => html`<td class="num" data-q="incident">${incident(s.incident[k])}</td>`)
      }`,
  );
  return html`
    <table class="hourly hourly-irradiance compact">
      <caption>Scenario ${id}: total solar irradiance incident on each surface (beam, sky diffuse and ground-reflected), W/m²; "—" where the surface was given sol-air temperatures.</caption>
      <thead>
        <tr><th>Time</th>${head}</tr>
      </thead>
      <tbody>${body}</tbody>
    </table>
  `;
}

/** Renders the design-day tables: one combined table for few surfaces, else temperatures and gains apart; then irradiance. */
export function renderStepTables(id: string, results: ScenarioResults): Trusted {
  const surfaces = Object.entries(results.surfaces);
  const main = surfaces.length <= COMBINED_TABLE_MAX_SURFACES
    ? combinedTable(id, results, surfaces)
    : splitTables(id, results, surfaces);
  return html`${main}${irradianceTable(id, results, surfaces)}`;
}

/** Renders the monthly gain and loss of all surfaces together, kWh, with the totals of results.json below. */
export function renderMonthlyTable(
  id: string,
  months: readonly { gain_J: number; loss_J: number }[],
  totals: { gain_J: number; loss_J: number },
): Trusted {
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
      <caption>Scenario ${id}: monthly heat gain and heat loss through all surfaces, kWh.</caption>
      <thead>
        <tr>
          <th>Month</th>
          <th>Heat gain kWh</th>
          <th>Heat loss kWh</th>
          <th>Net (gain − loss) kWh</th>
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
