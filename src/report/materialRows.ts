/** Table rows describing materials: properties in SI, source and origin. */
import type { MaterialDef } from "../project/model.ts";
import { formatTrim } from "./format.ts";
import { html, raw, type Trusted } from "./html.ts";

/** Header row of a material table. */
export const MATERIAL_TABLE_HEAD: Trusted = raw(
  "<thead><tr><th>Id</th><th>Name</th><th>λ W/(m·K)</th><th>ρ kg/m³</th><th>c J/(kg·K)</th><th>R m²·K/W</th><th>Source</th><th>Origin</th></tr></thead>",
);

function cell(value: number | undefined): Trusted {
  return html`<td class="num">${value === undefined ? "—" : formatTrim(value, 4)}</td>`;
}

/** One material as a table row; a missing source is shown as a visible gap. */
export function materialTableRow(material: MaterialDef): Trusted {
  const source = material.source.trim() === ""
    ? html`<span class="fail">no source given</span>`
    : html`${material.source}`;
  return html`<tr><td>${material.id}</td><td>${material.name}</td>${cell(material.conductivity)}${
    cell(material.density)
  }${cell(material.specificHeat)}${
    cell(material.resistance)
  }<td>${source}</td><td>${material.origin}</td></tr>`;
}
