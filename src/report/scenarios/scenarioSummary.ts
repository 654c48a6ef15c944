/** The peak summary at the top of a scenario's output: total peak, its time, energy totals, per-surface peaks. */
import type { ScenarioResults } from "../../results/types.ts";
import { type DisplayUnits, siEquivalent, toDisplay, unitLabel } from "../page/displayUnits.ts";
import { formatFixed, formatSig } from "../page/format.ts";
import { html, type Trusted } from "../page/html.ts";
import { clockTime, objectKey, stringKey, type TimedValue, timedValue, weatherTime } from "./scenarioData.ts";

const LST = "local standard time";

/** A heat gain in W printed as the summary and the tables print it: whole W (or whole Btu/h in IP). */
export function heatGainText(d: DisplayUnits, watts: number): string {
  return formatFixed(toDisplay(d, "heatGain", watts), 0);
}

/** Energy in J printed to three significant figures in the display unit (kWh, or kBtu in IP). */
export function energyText(d: DisplayUnits, joules: number): string {
  return formatSig(toDisplay(d, "energy", joules), 3);
}

const wholeWatts = (w: number) => formatFixed(w, 0);

function peakTimeText(results: ScenarioResults, owner: unknown, timeH: number, zone = ` ${LST}`): string {
  const given = stringKey(owner, "peakTime");
  if (given !== undefined) return `${weatherTime(given)}${zone}`;
  if (results.kind === "design-day") return `${clockTime(timeH)}${zone}`;
  return `${formatSig(timeH, 6)} h after the first row`;
}

function lossText(loss: TimedValue | undefined, d: DisplayUnits): Trusted {
  return loss === undefined
    ? html`
      <td class="num">—</td>
      <td>—</td>
    `
    : html`
      <td class="num">${heatGainText(d, loss.heatGain)}</td>
      <td class="when">${weatherTime(loss.time)}</td>
    `;
}

function surfaceRows(results: ScenarioResults, weather: boolean, d: DisplayUnits): Trusted[] {
  return Object.entries(results.surfaces).map(([id, s]) => {
    const totals = objectKey(s, "totals");
    const gain = typeof totals?.gain_J === "number" ? energyText(d, totals.gain_J) : "—";
    const loss = typeof totals?.loss_J === "number" ? energyText(d, totals.loss_J) : "—";
    const extra = weather
      ? html`${
        lossText(timedValue((s as unknown as Record<string, unknown>).peakLoss), d)
      }<td class="num">${gain}</td><td class="num">${loss}</td>`
      : html``;
    return html`<tr><td>${id}</td><td class="num">${heatGainText(d, s.peak.heatGain)}</td><td class="when">${
      peakTimeText(results, s, s.peak.time_h, "")
    }</td>${extra}</tr>`;
  });
}

/**
 * Renders the prominent peak box and the per-surface peak table of one scenario in the display units; with a
 * cooling load the per-surface peaks are the cooling-load peak table's (gain and load side by side), so the box
 * points there instead of printing them twice.
 */
export function renderPeakSummary(id: string, results: ScenarioResults, d: DisplayUnits): Trusted {
  const gainUnit = unitLabel(d, "heatGain");
  const energyUnit = unitLabel(d, "energy");
  const weather = results.kind === "weather";
  const period = weather ? "Totals over the weather file" : "Daily totals";
  const loss = timedValue((results as unknown as Record<string, unknown>).peakLoss);
  const lossLine = loss === undefined
    ? html``
    : html`<p>Lowest total heat gain (largest loss when negative): <strong>${
      heatGainText(d, loss.heatGain)
    } ${gainUnit}</strong>${siEquivalent(d, "heatGain", loss.heatGain, wholeWatts)} at ${
      weatherTime(loss.time)
    } ${LST}.</p>`;
  const head = weather
    ? html`
      <th>Peak heat gain ${gainUnit}</th>
      <th>At (local standard time)</th>
      <th>Lowest heat gain ${gainUnit}</th>
      <th>At</th>
      <th>Gain ${energyUnit}</th>
      <th>Loss ${energyUnit}</th>
    `
    : html`
      <th>Peak heat gain ${gainUnit}</th>
      <th>At (local standard time)</th>
    `;
  return html`
    <div class="peak-summary">
      <p class="peak-line">Peak total heat gain of ${id}: <strong class="peak-value">${heatGainText(
        d,
        results.peak.heatGain,
      )} ${gainUnit}</strong>${siEquivalent(
        d,
        "heatGain",
        results.peak.heatGain,
        wholeWatts,
      )} at <strong class="peak-time">${peakTimeText(
        results,
        results,
        results.peak.time_h,
      )}</strong></p>
      ${lossLine}
      <p>${period} through all surfaces: heat gain <strong>${energyText(
        d,
        results.totals.gain_J,
      )} ${energyUnit}</strong>, heat loss <strong>${energyText(
        d,
        results.totals.loss_J,
      )} ${energyUnit}</strong> (gain counts steps with a positive total, loss those with a negative total).</p>
      ${results.coolingLoad === undefined
        ? html`
          <table class="surface-peaks compact">
            <thead>
              <tr><th>Surface</th>${head}</tr>
            </thead>
            <tbody>${surfaceRows(results, weather, d)}</tbody>
          </table>
        `
        : html`
          <p
            class="muted">Peak heat gain and peak cooling load of each surface: the table under "Cooling load" below.</p>
        `}
    </div>
  `;
}
