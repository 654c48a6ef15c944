/** Sections 4 to 6: the assumptions register, the materials used with their sources, and the sources. */
import type { MaterialDef } from "../project/model.ts";
import { html, type Trusted } from "./html.ts";
import { MATERIAL_TABLE_HEAD, materialTableRow } from "./materialRows.ts";
import type { RenderContext } from "./packageInput.ts";

/** Renders section 4, one row per assumption. */
export function renderAssumptionsSection(ctx: RenderContext): Trusted {
  const list = ctx.input.model.assumptions;
  const body = list.length === 0 ? html`<p>No assumptions were recorded.</p>` : html`
    <table>
      <thead>
        <tr>
          <th>Id</th>
          <th>Statement</th>
          <th>Basis / source</th>
          <th>Applies at</th>
        </tr>
      </thead>
      <tbody>${list.map((a) =>
        html`
          <tr>
            <td><code>${a.id}</code></td>
            <td>${a.text}</td>
            <td>${a.source}</td>
            <td><code>${a.at}</code></td>
          </tr>
        `
      )}</tbody>
    </table>
  `;
  return html`<section id="s-4"><h2>4 Assumptions register</h2>
<p>Every value the tool filled in or chose, with its basis and the input line it applies to.</p>
${body}
</section>`;
}

/** Materials referenced by at least one construction layer, in first-use order. */
export function usedMaterials(ctx: RenderContext): MaterialDef[] {
  const out: MaterialDef[] = [];
  for (const c of ctx.input.model.constructions) {
    for (const layer of c.layers) {
      const m = ctx.input.model.materials.find((x) => x.id === layer.materialId);
      if (m !== undefined && !out.includes(m)) out.push(m);
    }
  }
  return out;
}

/** Renders section 5: each material used, with properties, source and origin. */
export function renderMaterialsSection(ctx: RenderContext): Trusted {
  const used = usedMaterials(ctx);
  const unused = ctx.input.model.materials.filter((m) => m.origin === "project" && !used.includes(m));
  const table = used.length === 0
    ? html`<p>No named material is used by a construction.</p>`
    : html`<table>${MATERIAL_TABLE_HEAD}<tbody>${used.map(materialTableRow)}</tbody></table>`;
  const unusedNote = unused.length === 0
    ? html``
    : html`<p class="muted">Defined in the project but not used by any construction: ${
      unused.map((m) => m.id).join(", ")
    }.</p>`;
  return html`<section id="s-5"><h2>5 Materials and their sources</h2>
<p>Layers given inline (without a material id) show their values in the layer tables of section 2.</p>
${table}
${unusedNote}
</section>`;
}

/** Renders section 6: the standards the tool applied and the distinct material sources. */
export function renderSourcesSection(ctx: RenderContext): Trusted {
  const sources: string[] = [];
  for (const m of usedMaterials(ctx)) {
    if (m.source.trim() !== "" && !sources.includes(m.source)) sources.push(m.source);
  }
  for (const c of ctx.input.model.constructions) {
    for (const l of c.layers) {
      if (l.source.trim() !== "" && !sources.includes(l.source)) sources.push(l.source);
    }
  }
  const list = sources.length === 0
    ? html`<p class="fail">No material source is cited in the inputs.</p>`
    : html`<ol>${sources.map((s) => html`<li>${s}</li>`)}</ol>`;
  return html`<section id="s-6"><h2>6 Sources</h2>
<h3 id="s-6-1">6.1 Standards and methods applied by the tool</h3>
<ul>
<li>ISO 6946:2017, Building components and building elements: Thermal resistance and thermal transmittance: calculation methods. Used for the thermal resistance of homogeneous layers (R = d/λ), the default surface resistances by direction of heat flow, and the total resistance and U-value.</li>
</ul>
<h3 id="s-6-2">6.2 Material data sources cited in the inputs</h3>
${list}
</section>`;
}
