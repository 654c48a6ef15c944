/** Table rows describing materials: properties in the display units, source and origin. */
import type { MaterialDef } from "../../project/model.ts";
import { type DisplayUnits, type QuantityKind, toDisplay, unitHead } from "../page/displayUnits.ts";
import { formatTrim } from "../page/format.ts";
import { html, type Trusted } from "../page/html.ts";

/** Header row of a material table, with the display units of λ, ρ, c and R. */
export function materialTableHead(d: DisplayUnits): Trusted {
  const heads = [
    html`Id`,
    html`Name`,
    html`λ ${unitHead(d, "conductivity")}`,
    html`ρ ${unitHead(d, "density")}`,
    html`c ${unitHead(d, "specificHeat")}`,
    html`R ${unitHead(d, "resistance")}`,
    html`Source`,
    html`Origin`,
  ];
  return html`
    <thead>
      <tr>${heads.map((h) => html`<th>${h}</th>`)}</tr>
    </thead>
  `;
}

function cell(value: number | undefined, kind: QuantityKind, d: DisplayUnits): Trusted {
  return html`<td class="num">${value === undefined ? "—" : formatTrim(toDisplay(d, kind, value), 3)}</td>`;
}

/** One material as a table row in the display units; a missing source is shown as a visible gap. */
export function materialTableRow(material: MaterialDef, d: DisplayUnits): Trusted {
  const source = material.source.trim() === ""
    ? html`<span class="fail">no source given</span>`
    : html`${material.source}`;
  return html`<tr><td>${material.id}</td><td>${material.name}</td>${
    cell(material.conductivity, "conductivity", d)
  }${cell(material.density, "density", d)}${cell(material.specificHeat, "specificHeat", d)}${
    cell(material.resistance, "resistance", d)
  }<td>${source}</td><td>${material.origin}</td></tr>`;
}
