/** The room's inputs as computed, compactly: surfaces with their boundary, windows, gains, ventilation, bridges. */
import type { Room, RoomBoundary, RoomGain } from "../../project/roomModel.ts";
import type { RoomResults } from "../../scenarios/room/roomTypes.ts";
import type { DisplayUnits } from "../page/displayUnits.ts";
import { unitHead } from "../page/displayUnits.ts";
import { formatFixed, formatSig, formatTrim } from "../page/format.ts";
import { html, type Trusted } from "../page/html.ts";
import { clockTime } from "../scenarios/scenarioData.ts";
import { sig, sigU, temperature } from "./roomUnits.ts";

function boundaryText(b: RoomBoundary, d: DisplayUnits): string {
  switch (b.kind) {
    case "outdoor":
    case "ground":
    case "same-as-room":
      return b.kind;
    case "adjacent": {
      const t = b.temperature;
      const summer = t.kind === "constant" ? temperature(d, t.valueC) : "hourly θ";
      const winter = b.heatingC === undefined ? "" : `, heating ${temperature(d, b.heatingC)}`;
      return `adjacent ${summer}${winter}`;
    }
  }
}

function orientation(azimuth: number | undefined, tilt: number): string {
  const az = azimuth === undefined ? "—" : `${formatTrim(azimuth, 4)}°`;
  return `${az} / ${formatTrim(tilt, 4)}°`;
}

/** Surfaces: id, construction, boundary, gross and net area, azimuth / tilt, absorptance. */
export function surfacesTable(room: Room, r: RoomResults, d: DisplayUnits): Trusted {
  const rows = room.surfaces.map((s) => {
    const res = Object.hasOwn(r.surfaces, s.id) ? r.surfaces[s.id] : undefined;
    return html`
      <tr>
        <th scope="row">${s.id}</th>
        <td>${s.construction}</td>
        <td>${boundaryText(
          s.boundary,
          d,
        )}</td>
        <td class="num">${sig(d, "area", s.areaM2)}</td>
        <td class="num" data-q="net-area">${res ===
            undefined
          ? "—"
          : sig(d, "area", res.netArea)}</td>
        <td class="num">${orientation(
          s.azimuthDeg,
          s.tiltDeg,
        )}</td>
        <td class="num">${s.absorptance === undefined ? "—" : formatFixed(s.absorptance, 2)}</td>
      </tr>
    `;
  });
  return html`
    <table class="compact room-surfaces">
      <caption>Surfaces: net = gross less the windows in it; azimuth from north, tilt from horizontal (180° = a floor).</caption>
      <thead>
        <tr>
          <th>Surface</th>
          <th>Con&shy;struc&shy;tion</th>
          <th>Boundary (far side)</th>
          <th>Gross ${unitHead(
            d,
            "area",
          )}</th>
          <th>Net ${unitHead(d, "area")}</th>
          <th>Azimuth / tilt</th>
          <th>Solar absorp&shy;tance</th>
        </tr>
      </thead>
      <tbody>${rows}</tbody>
    </table>
  `;
}

/** Windows: id, the surface it sits in, area, U_w, g, frame fraction, angle dependence. */
export function windowsTable(room: Room, d: DisplayUnits): Trusted {
  if (room.windows.length === 0) return html``;
  const rows = room.windows.map((w) =>
    html`
      <tr>
        <th scope="row">${w.id}</th>
        <td>${w.in}</td>
        <td class="num">${sig(d, "area", w.areaM2)}</td>
        <td class="num">${sig(d, "transmittance", w.uValue)}</td>
        <td class="num">${formatFixed(w.solarFactor, 2)}${w.angleDependence === undefined ? "" : " (θ)"}</td>
        <td class="num">${formatFixed(w.frameFraction, 2)}</td>
      </tr>
    `
  );
  return html`
    <table class="compact room-windows">
      <caption>Windows (frame: frame fraction; g constant with the angle unless marked (θ)).</caption>
      <thead>
        <tr>
          <th>Window</th>
          <th>In</th>
          <th>Area ${unitHead(d, "area")}</th>
          <th>U<sub>w</sub> ${unitHead(d, "transmittance")}</th>
          <th>g</th>
          <th>Frame</th>
        </tr>
      </thead>
      <tbody>${rows}</tbody>
    </table>
  `;
}

/** The hours a schedule is on: runs of full hours as `09:00–19:00`, or the full-load hours of a graded one. */
export function scheduleText(schedule: readonly number[] | undefined): string {
  if (schedule === undefined || schedule.every((f) => f === 1)) return "always";
  if (schedule.some((f) => f !== 0 && f !== 1)) {
    return `graded, ${formatTrim(schedule.reduce((a, f) => a + f, 0), 3)} full-load h`;
  }
  const runs: string[] = [];
  for (let h = 0; h < 24; h++) {
    if (schedule[h] !== 1 || (h > 0 && schedule[h - 1] === 1)) continue;
    let end = h;
    while (end < 24 && schedule[end] === 1) end++;
    runs.push(`${clockTime(h)}–${clockTime(end === 24 ? 24 : end).replace(/^00:00$/, "24:00")}`);
  }
  return runs.length === 0 ? "never" : runs.join(", ");
}

function gainRow(g: RoomGain, d: DisplayUnits): Trusted {
  return html`
    <tr>
      <th scope="row">${g.name}</th>
      <td class="num">${sig(d, "heatGain", g.sensibleW)}</td>
      <td class="num">${g.latentW === undefined ? "—" : sig(d, "heatGain", g.latentW)}</td>
      <td class="num">${formatFixed(g.radiantFraction, 2)}</td>
      <td>${scheduleText(g.schedule)}</td>
    </tr>
  `;
}

/** Windows and gains side by side, then the thermal bridges (nothing for an empty list). */
export function loadsTables(room: Room, d: DisplayUnits): Trusted {
  const gains = room.gains.length === 0 ? html`` : html`
    <table class="compact room-gains">
      <caption>Internal gains at their peak.</caption>
      <thead>
        <tr>
          <th>Gain</th>
          <th>Sensible ${unitHead(d, "heatGain")}</th>
          <th>Latent ${unitHead(d, "heatGain")}</th>
          <th>Radiant</th>
          <th>On</th>
        </tr>
      </thead>
      <tbody>${room.gains.map((g) => gainRow(g, d))}</tbody>
    </table>
  `;
  const linear = room.thermalBridges.map((b) =>
    html`
      <tr>
        <th scope="row">${b.name}</th>
        <td>ψ = ${sigU(d, "linearTransmittance", b.psi)}</td>
        <td>L = ${sigU(d, "length", b.lengthM)}</td>
        <td>${b.source ?? "—"}</td>
      </tr>
    `
  );
  const point = room.pointBridges.map((b) =>
    html`
      <tr>
        <th scope="row">${b.name}</th>
        <td>χ = ${sigU(d, "heatLossCoefficient", b.chi)}</td>
        <td>n = ${String(b.count)}</td>
        <td>${b.source ?? "—"}</td>
      </tr>
    `
  );
  const bridges = linear.length + point.length === 0 ? html`` : html`
    <table class="compact room-bridges">
      <caption>Thermal bridges (all on the outdoor envelope).</caption>
      <thead>
        <tr>
          <th>Bridge</th>
          <th>ψ or χ</th>
          <th>L or count</th>
          <th>Source</th>
        </tr>
      </thead>
      <tbody>${linear}${point}</tbody>
    </table>
  `;
  return html`<div class="room-pair">${windowsTable(room, d)}${gains}</div>${bridges}`;
}

/** One line: set point, volume, ventilation, design day and heating scenario. */
export function conditionsLine(room: Room, r: RoomResults, d: DisplayUnits): Trusted {
  const set = room.airTemperature;
  const air = set.kind === "constant"
    ? temperature(d, set.valueC)
    : `hourly, mean ${
      temperature(d, r.airTemperature.reduce((a, t) => a + t, 0) / Math.max(1, r.airTemperature.length))
    }`;
  const v = room.ventilation;
  const vent = v === undefined
    ? "none"
    : v.kind === "outdoor-air"
    ? `outdoor air ${sigU(d, "airFlow", v.flowM3PerS)}`
    : `${formatSig(v.perHour, 3)} air changes per hour`;
  return html`
    <p
      class="room-conditions">Set point ${air}; volume ${sigU(
        d,
        "volume",
        room.volumeM3,
      )}; ventilation ${vent}; design day ${room
        .designDay} (step ${formatTrim(r.timestep_h * 60, 3)} min)${room.heating === undefined
        ? ""
        : `; heating ${room.heating}`}.</p>
  `;
}
