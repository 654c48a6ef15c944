/** The peak summary at the top of a scenario's output: total peak, its time, energy totals, per-surface peaks. */
import type { ScenarioResults } from "../results/types.ts";
import { formatFixed, formatSig } from "./format.ts";
import { html, type Trusted } from "./html.ts";
import {
  clockTime,
  J_PER_KWH,
  objectKey,
  stringKey,
  type TimedValue,
  timedValue,
  weatherTime,
} from "./scenarioData.ts";

const LST = "local standard time";

/** Watts as printed in the summary and the tables: whole watts. */
export function watts(value: number): string {
  return formatFixed(value, 0);
}

/** Energy in J printed as kWh with two decimals. */
export function kwh(joules: number): string {
  return formatFixed(joules / J_PER_KWH, 2);
}

function peakTimeText(results: ScenarioResults, owner: unknown, timeH: number, zone = ` ${LST}`): string {
  const given = stringKey(owner, "peakTime");
  if (given !== undefined) return `${weatherTime(given)}${zone}`;
  if (results.kind === "design-day") return `${clockTime(timeH)}${zone}`;
  return `${formatSig(timeH, 6)} h after the first row`;
}

function lossText(loss: TimedValue | undefined): Trusted {
  return loss === undefined
    ? html`
      <td class="num">—</td>
      <td>—</td>
    `
    : html`
      <td class="num">${watts(loss.heatGain)}</td>
      <td class="when">${weatherTime(loss.time)}</td>
    `;
}

function surfaceRows(results: ScenarioResults, weather: boolean): Trusted[] {
  return Object.entries(results.surfaces).map(([id, s]) => {
    const totals = objectKey(s, "totals");
    const gain = typeof totals?.gain_J === "number" ? kwh(totals.gain_J) : "—";
    const loss = typeof totals?.loss_J === "number" ? kwh(totals.loss_J) : "—";
    const extra = weather
      ? html`${
        lossText(timedValue((s as unknown as Record<string, unknown>).peakLoss))
      }<td class="num">${gain}</td><td class="num">${loss}</td>`
      : html``;
    return html`<tr><td>${id}</td><td class="num">${watts(s.peak.heatGain)}</td><td class="when">${
      peakTimeText(results, s, s.peak.time_h, "")
    }</td>${extra}</tr>`;
  });
}

/** Renders the prominent peak box and the per-surface peak table of one scenario. */
export function renderPeakSummary(id: string, results: ScenarioResults): Trusted {
  const weather = results.kind === "weather";
  const period = weather ? "Totals over the weather file" : "Daily totals";
  const loss = timedValue((results as unknown as Record<string, unknown>).peakLoss);
  const lossLine = loss === undefined
    ? html``
    : html`<p>Lowest total heat gain (largest loss when negative): <strong>${
      watts(loss.heatGain)
    } W</strong> at ${weatherTime(loss.time)} ${LST}.</p>`;
  const head = weather
    ? html`
      <th>Peak heat gain W</th>
      <th>At (local standard time)</th>
      <th>Lowest heat gain W</th>
      <th>At</th>
      <th>Gain kWh</th>
      <th>Loss kWh</th>
    `
    : html`
      <th>Peak heat gain W</th>
      <th>At (local standard time)</th>
    `;
  return html`
    <div class="peak-summary">
      <p class="peak-line">Peak total heat gain of ${id}: <strong class="peak-value">${watts(
        results.peak.heatGain,
      )} W</strong> at <strong class="peak-time">${peakTimeText(
        results,
        results,
        results.peak.time_h,
      )}</strong></p>
      ${lossLine}
      <p>${period} through all surfaces: heat gain <strong>${kwh(
        results.totals.gain_J,
      )} kWh</strong>, heat loss <strong>${kwh(
        results.totals.loss_J,
      )} kWh</strong> (gain counts steps with a positive total, loss those with a negative total).</p>
      <table class="surface-peaks compact">
        <thead><tr><th>Surface</th>${head}</tr></thead>
        <tbody>${surfaceRows(results, weather)}</tbody>
      </table>
    </div>
  `;
}
