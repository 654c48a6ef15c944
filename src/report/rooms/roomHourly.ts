/** A room's part of Appendix E: at the full hours, inside surface temperatures, θ_mrt, both loads, the difference. */
import type { RoomResults } from "../../scenarios/room/roomTypes.ts";
import type { DisplayUnits } from "../page/displayUnits.ts";
import { unitHead } from "../page/displayUnits.ts";
import { html, type Trusted } from "../page/html.ts";
import type { RenderContext } from "../page/packageInput.ts";
import { clockTime } from "../scenarios/scenarioData.ts";
import { roomAnchor, roomHourlyAnchor } from "./roomAnchors.ts";
import { heatBalanceAtHour } from "./roomLoad.ts";
import { temperatureFigure, whole } from "./roomUnits.ts";

const HOURS = Array.from({ length: 24 }, (_, h) => h);

/** The rooms of the model with results, in model order. */
export function computedRooms(ctx: RenderContext): { id: string; results: RoomResults }[] {
  const all = ctx.input.results.rooms ?? {};
  return (ctx.input.model.rooms ?? []).flatMap((room) =>
    Object.hasOwn(all, room.id) ? [{ id: room.id, results: all[room.id]! }] : []
  );
}

function hourlyTable(id: string, r: RoomResults, d: DisplayUnits): Trusted {
  const surfaces = Object.entries(r.surfaces);
  const at = (xs: readonly number[], h: number) => xs[Math.round(h / r.timestep_h)] ?? NaN;
  const body = HOURS.map((h) =>
    html`<tr><td class="num">${clockTime(h)}</td>${
      surfaces.map(([, s]) =>
        html`<td class="num">${temperatureFigure(d, at(s.insideSurfaceTemperature, h))}</td>`
      )
    }<td class="num">${
      temperatureFigure(d, at(r.meanRadiantTemperature, h))
    }</td><td class="num total-col" data-q="hb">${
      whole(d, heatBalanceAtHour(r, h))
    }</td><td class="num total-col" data-q="rts">${
      whole(d, r.coolingLoad.rtsMethod[h] ?? NaN)
    }</td><td class="num" data-q="difference">${whole(d, r.coolingLoad.difference[h] ?? NaN)}</td></tr>`
  );
  return html`
    <table class="hourly room-hourly compact">
      <caption>Room ${id} at the full hours: inside surface temperatures θ<sub>si</sub> and mean radiant temperature θ<sub>mrt</sub> (${unitHead(
        d,
        "temperature",
      )}), sensible load by the heat balance (HB) and the radiant time series method (RTS), difference RTS − HB.</caption>
      <thead>
        <tr>
          <th rowspan="2">Time</th>
          <th colspan="${String(surfaces.length)}">θ<sub>si</sub> ${unitHead(d, "temperature")}</th>
          <th rowspan="2">θ<sub>mrt</sub> ${unitHead(d, "temperature")}</th>
          <th colspan="3">Load ${unitHead(d, "heatGain")}</th>
        </tr>
        <tr>${surfaces.map(([sid]) => html`<th>${sid}</th>`)}<th>HB</th><th>RTS</th><th>RTS − HB</th></tr>
      </thead>
      <tbody>${body}</tbody>
    </table>
  `;
}

/** The rooms' parts of Appendix E, numbered on from `first` (E.first, E.first+1, …). */
export function roomHourlyParts(ctx: RenderContext, first: number): Trusted[] {
  return computedRooms(ctx).map(({ id, results }, i) =>
    html`
      <section class="hourly-values" id="${roomHourlyAnchor(roomAnchor(ctx.input.model, id))}">
        <h3>E.${String(first + i)} Room ${id}</h3>
        <p class="muted">Results after the room block; every value below is in results.json (Appendix B), the heat balance at every step of ${results
          .designDay}.</p>
        ${hourlyTable(id, results, ctx.display)}
      </section>
    `
  );
}
