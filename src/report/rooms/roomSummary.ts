/** The rooms' line in the "Summary of results": peak sensible loads by both methods, latent, heat loss and H. */
import type { DisplayUnits } from "../page/displayUnits.ts";
import { html, type Trusted } from "../page/html.ts";
import type { RenderContext } from "../page/packageInput.ts";
import { clockTime } from "../scenarios/scenarioData.ts";
import { roomAnchor } from "./roomAnchors.ts";
import { computedRooms } from "./roomHourly.ts";
import { percent } from "./roomLoad.ts";
import { latentPeak, roomChecks } from "./roomOutput.ts";
import { sigU } from "./roomUnits.ts";
import type { RoomResults } from "../../scenarios/room/roomTypes.ts";

function row(id: string, r: RoomResults, anchor: string, ctx: RenderContext): Trusted {
  const d: DisplayUnits = ctx.display;
  const cl = r.coolingLoad;
  const latent = latentPeak(r);
  const checks = roomChecks(ctx.input.results.checks, id);
  const failed = checks.filter((c) => !c.pass).length;
  return html`
    <tr>
      <td><a href="#${anchor}">${id}</a><br><span class="muted">${r.name}</span></td>
      <td class="num" data-q="summary-hb">${sigU(
        d,
        "heatGain",
        cl.heatBalancePeak.load,
      )} <span class="muted">at ${clockTime(cl.heatBalancePeak.time_h)}</span></td>
      <td class="num" data-q="summary-rts">${sigU(
        d,
        "heatGain",
        cl.rtsMethodPeak.load,
      )} <span class="muted">(${percent(cl.peakDifference)})</span></td>
      <td class="num">${latent === undefined ? "—" : sigU(d, "heatGain", latent.load)}</td>
      <td class="num" data-q="summary-heat-loss">${r.heating === undefined
        ? "—"
        : sigU(d, "heatGain", r.heating.total)}${r.heatLossCoefficient === undefined
        ? ""
        : html`<br><span class="muted">H ${
          sigU(d, "heatLossCoefficient", r.heatLossCoefficient)
        }</span>`}</td>
      <td class="${failed === 0 ? "pass" : "fail"}">${failed === 0 ? "all pass" : `${failed} failed`}</td>
    </tr>
  `;
}

/** One row per computed room, or nothing when the project has none. */
export function roomsSummaryTable(ctx: RenderContext): Trusted {
  const rooms = computedRooms(ctx);
  if (rooms.length === 0) return html``;
  return html`
    <table class="compact summary-rooms">
      <caption>Rooms: peak sensible cooling load by the heat balance and by the radiant time series method (difference), latent peak, design heat loss with H, the room's checks.</caption>
      <thead>
        <tr>
          <th>Room</th>
          <th>Peak sensible, heat balance</th>
          <th>RTS method</th>
          <th>Latent peak</th>
          <th>Design heat loss</th>
          <th>Checks</th>
        </tr>
      </thead>
      <tbody>${rooms.map(({ id, results }) => row(id, results, roomAnchor(ctx.input.model, id), ctx))}</tbody>
    </table>
  `;
}
