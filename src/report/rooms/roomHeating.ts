/**
 * The room's design heat loss as a table a reviewer can add by hand (every line, group subtotals, the total and
 * H), and the ISO 13370 ground floor: B′, d_t, the branch, U and every input with its default flag.
 */
import type { GroundFloorResults, HeatLossLineResults, RoomResults } from "../../scenarios/room/roomTypes.ts";
import type { DisplayUnits } from "../page/displayUnits.ts";
import { unitHead } from "../page/displayUnits.ts";
import { formatSig } from "../page/format.ts";
import { html, type Trusted } from "../page/html.ts";
import { kindOfUnit, label, sig, sigU, temperature, unitHeadOf, whole } from "./roomUnits.ts";

const GROUP_NAME: Readonly<Record<HeatLossLineResults["group"], string>> = {
  transmission: "Transmission",
  windows: "Windows",
  ground: "Ground",
  thermalBridges: "Thermal bridges",
  ventilation: "Ventilation",
};

function quantityText(q: HeatLossLineResults["quantities"][number], d: DisplayUnits): string {
  const kind = kindOfUnit(q.unit);
  if (kind !== undefined) return `${q.symbol} = ${sigU(d, kind, q.value)}`;
  const unit = q.unit === "—" || q.unit === "" ? "" : ` ${q.unit}`;
  return `${q.symbol} = ${formatSig(q.value, 3)}${unit}`;
}

function lineRow(l: HeatLossLineResults, d: DisplayUnits, group: Trusted): Trusted {
  return html`
    <tr>${group}<td>${l.id}</td><td>${l.formula}</td><td class="room-quantities">${l.quantities.map((q) =>
      quantityText(q, d)
    ).join(", ")}</td><td class="num">${sig(d, "heatLossCoefficient", l.H)}</td><td class="num">${sig(
      d,
      "temperatureDifference",
      l.deltaT,
    )}</td><td class="num" data-q="phi">${whole(d, l.phi)}</td></tr>
  `;
}

/** The heat loss lines grouped in table order, each group closed by its subtotal, then the total and H. */
export function heatLossTable(r: RoomResults, d: DisplayUnits): Trusted {
  const h = r.heating;
  if (h === undefined) return html`<p class="muted">No heating scenario named: no design heat loss.</p>`;
  const groups = [...new Set(h.lines.map((l) => l.group))];
  const body = groups.map((g) => {
    const lines = h.lines.filter((l) => l.group === g);
    const subtotal = lines.reduce((a, l) => a + l.phi, 0);
    const name = html`<th scope="rowgroup" rowspan="${String(lines.length + 1)}">${GROUP_NAME[g]}</th>`;
    return html`
      ${lines.map((l, i) => lineRow(l, d, i === 0 ? name : html``))}
      <tr class="subtotal">
        <td colspan="5">subtotal</td>
        <td class="num" data-q="subtotal">${whole(d, subtotal)}</td>
      </tr>
    `;
  });
  const deltaT = h.indoor - h.outdoor;
  return html`
    <table class="compact room-heat-loss">
      <caption>Design heat loss, scenario ${h.scenario}: θ<sub>int</sub> = ${temperature(
        d,
        h.indoor,
      )}, θ<sub>e</sub> = ${temperature(
        d,
        h.outdoor,
      )}. Φ = H·ΔT per line (ground: ΔT to the annual mean outdoor temperature; adjacent space: b in H); Φ rounded to 1 ${label(
        d,
        "heatGain",
      )}.</caption>
      <thead>
        <tr>
          <th>Group</th>
          <th>Line</th>
          <th>Formula</th>
          <th>Quantities</th>
          <th>H ${unitHeadOf(d, "heatLossCoefficient")}</th>
          <th>ΔT ${unitHead(d, "temperatureDifference")}</th>
          <th>Φ ${unitHead(d, "heatGain")}</th>
        </tr>
      </thead>
      <tbody>${body}
        <tr class="total-row"><th colspan="6" scope="row">Total design heat loss Φ<sub>total</sub></th><td class="num" data-q="heat-loss-total">${whole(
          d,
          h.total,
        )}</td></tr>
        <tr><td colspan="7">H = Φ<sub>total</sub> / (θ<sub>int</sub> − θ<sub>e</sub>) = ${whole(
          d,
          h.total,
        )} ${label(d, "heatGain")} / ${sigU(
          d,
          "temperatureDifference",
          deltaT,
        )} = <strong data-q="heat-loss-coefficient">${r.heatLossCoefficient === undefined
          ? "—"
          : sigU(d, "heatLossCoefficient", r.heatLossCoefficient)}</strong></td></tr>
      </tbody>
    </table>
  `;
}

/** ISO 13370 inputs: symbol and display kind per results.json key. */
const GROUND_INPUTS: Readonly<Record<string, readonly [string, Parameters<typeof sigU>[1]]>> = {
  areaM2: ["A", "area"],
  exposedPerimeterM: ["P", "length"],
  floorResistanceM2KPerW: ["R_f", "resistance"],
  soilConductivityWPerMK: ["λ_g", "conductivity"],
  wallThicknessM: ["w", "length"],
  insideResistanceM2KPerW: ["R_si", "resistance"],
  outsideResistanceM2KPerW: ["R_se", "resistance"],
};

function groundInputs(g: GroundFloorResults, d: DisplayUnits): Trusted {
  const entries = Object.entries(g.inputs);
  return html`${
    entries.map(([key, input], i) => {
      const [symbol, kind] = GROUND_INPUTS[key] ?? [key, undefined];
      const value = kind === undefined ? formatSig(input.value, 3) : sigU(d, kind, input.value);
      const mark = input.defaulted
        ? html`<span class="default-mark" title="${input.source}">(default)</span>`
        : html``;
      const sep = i === entries.length - 1 ? "" : "; ";
      return html`<span class="room-ground-input">${symbol} = ${value}${mark}</span>${sep}`;
    })
  }`;
}

/** One row per ground floor: inputs, B′, d_t, branch, U. */
export function groundTable(r: RoomResults, d: DisplayUnits): Trusted {
  const floors = Object.entries(r.ground);
  if (floors.length === 0) return html``;
  const rows = floors.map(([id, g]) =>
    html`
      <tr>
        <th scope="row">${id}</th>
        <td class="room-quantities">${groundInputs(g, d)}</td>
        <td class="num">${sig(d, "length", g.characteristicDimension)}</td>
        <td class="num">${sig(d, "length", g.equivalentThickness)}</td>
        <td>${g.branch === "thin" ? "d_t < B′" : "d_t ≥ B′"}</td>
        <td class="num" data-q="ground-u">${sig(d, "transmittance", g.U)}</td>
        <td class="num">${temperature(d, g.designDayGroundTemperature)}</td>
      </tr>
    `
  );
  return html`
    <table class="compact room-ground">
      <caption>Ground floors by ISO 13370 (slab on ground): B′ = A / (0.5 P), d_t = w + λ_g (R_si + R_f + R_se); d_t < B′: U = 2λ_g/(πB′ + d_t)·ln(πB′/d_t + 1), else U = λ_g/(0.457 B′ + d_t). Defaults are in the assumptions register.</caption>
      <thead>
        <tr>
          <th>Floor</th>
          <th>Inputs</th>
          <th>B′ ${unitHead(d, "length")}</th>
          <th>d_t ${unitHead(d, "length")}</th>
          <th>Branch</th>
          <th>U ${unitHead(d, "transmittance")}</th>
          <th>Ground on the design day</th>
        </tr>
      </thead>
      <tbody>${rows}</tbody>
    </table>
  `;
}
