/**
 * The computed output after a `room` block: the verdict line, the inputs as computed, the room's own radiant
 * time series, the hourly load by both methods, the design heat loss and ground floors, the checks and the
 * method notes. The hourly values print in Appendix E (roomHourly.ts); the room cautions in the cautions.
 */
import type { Room } from "../../project/roomModel.ts";
import type { CheckResult } from "../../results/types.ts";
import type { RoomResults } from "../../scenarios/room/roomTypes.ts";
import { checksOfSubject } from "../page/checksBySubject.ts";
import type { DisplayUnits } from "../page/displayUnits.ts";
import { formatSig } from "../page/format.ts";
import { html, type Trusted } from "../page/html.ts";
import type { RenderContext } from "../page/packageInput.ts";
import { quotedNumbers } from "../page/quotedText.ts";
import { clockTime } from "../scenarios/scenarioData.ts";
import { roomAnchor, roomHeatLossAnchor, roomHourlyAnchor } from "./roomAnchors.ts";
import { groundTable, heatLossTable } from "./roomHeating.ts";
import { conditionsLine, loadsTables, surfacesTable } from "./roomInputTables.ts";
import { percent, renderRoomLoad } from "./roomLoad.ts";
import { renderRoomSeries } from "./roomSeries.ts";
import { sigU } from "./roomUnits.ts";

/** The checks recorded on one room (subject `room:<id>`). */
export function roomChecks(checks: readonly CheckResult[], id: string): readonly CheckResult[] {
  return checksOfSubject(checks, `room:${id}`);
}

/** The largest latent load and the time of its first step, or undefined when the room has none. */
export function latentPeak(r: RoomResults): { readonly load: number; readonly time_h: number } | undefined {
  const xs = r.coolingLoad.latent;
  const k = xs.reduce((best, v, i) => (v > xs[best]! ? i : best), 0);
  const load = xs[k] ?? 0;
  return load > 0 ? { load, time_h: k * r.timestep_h } : undefined;
}

/** The verdict: both peaks with their difference, the latent peak apart, the design heat loss and H. */
export function roomVerdict(r: RoomResults, d: DisplayUnits): Trusted {
  const cl = r.coolingLoad;
  const w = (v: number) => sigU(d, "heatGain", v);
  const latent = latentPeak(r);
  const heating = r.heating === undefined ? html`No heating scenario named: no design heat loss.` : html`
    Design heat loss <strong data-q="verdict-heat-loss">${w(r.heating.total)}</strong>, H = <span
      data-q="verdict-h">${r.heatLossCoefficient === undefined
        ? "—"
        : sigU(d, "heatLossCoefficient", r.heatLossCoefficient)}</span> (scenario ${r.heating.scenario}).
  `;
  return html`
    <div class="peak-summary room-verdict">
      <p
        class="peak-line">Peak sensible cooling load (heat balance): <strong data-q="verdict-hb">${w(
          cl.heatBalancePeak.load,
        )}</strong> at <span data-q="verdict-hb-time">${clockTime(cl.heatBalancePeak.time_h)}</span>.</p>
      <p>Radiant time series method with this room's series: <span data-q="verdict-rts">${w(
        cl.rtsMethodPeak.load,
      )}</span> at ${clockTime(cl.rtsMethodPeak.time_h)}, <span data-q="verdict-difference">${percent(
        cl.peakDifference,
      )}</span> against the heat balance. ${latent === undefined
        ? "No latent gain."
        : html`Latent load, apart from the sensible: peak <span data-q="verdict-latent">${
          w(latent.load)
        }</span> from ${clockTime(latent.time_h)}.`}</p>
      <p>${heating} <span class="room-caution-pointer">A design load is not a system size: see the <a href="#caution-room">cautions</a>.</span></p>
    </div>
  `;
}

/** The room's checks, one compact row each (the descriptions are in Appendix C). */
function checksPart(checks: readonly CheckResult[], id: string): Trusted {
  const own = roomChecks(checks, id);
  if (own.length === 0) return html`<p>No automated check is recorded for this room.</p>`;
  const failed = own.filter((c) => !c.pass).length;
  const rows = own.map((c) =>
    html`
      <tr class="${c.pass ? "pass" : "fail"}">
        <td class="result">${c.pass ? "PASS" : "FAIL"}</td>
        <td><code>${c.id}</code></td>
        <td class="num">${formatSig(c.value, 3)}</td>
        <td class="num">${formatSig(c.limit, 3)}</td>
      </tr>
    `
  );
  return html`
    <table class="compact subject-checks room-checks">
      <caption>${String(own.length - failed)} of ${String(
        own.length,
      )} checks on ${id} passed; what each checks: <a
        href="#s-c">Appendix C</a>.</caption>
      <thead>
        <tr>
          <th>Result</th>
          <th>Check</th>
          <th>Value</th>
          <th>Limit</th>
        </tr>
      </thead>
      <tbody>${rows}</tbody>
    </table>
  `;
}

function renderComputed(room: Room, r: RoomResults, anchor: string, ctx: RenderContext): Trusted {
  const d = ctx.display;
  return html`
    <div class="room-output" id="${anchor}">
      <h4 class="output-heading">Results of room ${room.id}</h4>
      <p class="muted">${room.name}. Numbers as in results.json <code>rooms</code> entry for ${room
        .id} (Appendix B); times are local standard time on design day ${r
        .designDay}; the values at every step are in <a href="#${roomHourlyAnchor(
          anchor,
        )}">Appendix E</a>.</p>
      ${roomVerdict(r, d)}
      <h5>Inputs as computed</h5>
      ${conditionsLine(room, r, d)}
      ${surfacesTable(room, r, d)}
      ${loadsTables(room, d)}
      <h5>The room's own radiant time series</h5>
      ${renderRoomSeries(r.coolingLoad, anchor)}
      <h5>Sensible cooling load by both methods</h5>
      ${renderRoomLoad(r, anchor, d)}
      <h5 id="${roomHeatLossAnchor(anchor)}">Design heat loss</h5>
      ${heatLossTable(r, d)}
      ${groundTable(r, d)}
      <h5>Checks and method notes</h5>
      ${checksPart(ctx.input.results.checks, room.id)}
      <ul class="scenario-notes room-notes">${r.notes.map((n) => html`<li>${quotedNumbers(n, d)}</li>`)}</ul>
    </div>
  `;
}

/** The output after a room block; a room that did not compute says so. */
export function renderRoomOutput(room: Room, ctx: RenderContext): Trusted {
  const rooms = ctx.input.results.rooms ?? {};
  const r = Object.hasOwn(rooms, room.id) ? rooms[room.id] : undefined;
  const anchor = roomAnchor(ctx.input.model, room.id);
  if (r === undefined) {
    return html`
      <div class="room-output" id="${anchor}">
        <p
          class="fail">Not computed: results.json holds no <code>rooms</code> entry for room ${room
            .id} (see the checks and findings).</p>
      </div>
    `;
  }
  return renderComputed(room, r, anchor, ctx);
}
