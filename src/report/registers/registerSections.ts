/** Sections 5 to 7: the assumptions register, the materials used with their sources, and the sources. */
import type { MaterialDef } from "../../project/model.ts";
import { type AssumptionGroup, groupAssumptions } from "./assumptionGroups.ts";
import { html, type Trusted } from "../page/html.ts";
import { FOLDED_RULE } from "../page/findingCounts.ts";
import { quotedNumbers } from "../page/quotedText.ts";
import { materialTableHead, materialTableRow } from "../constructions/materialRows.ts";
import type { RenderContext } from "../page/packageInput.ts";

function appliesTo(group: AssumptionGroup): Trusted {
  if (group.members.length === 1) {
    return html`<td class="applies-to"><code>${group.members[0]!.at}</code></td>`;
  }
  const items = group.members.map((m, i) =>
    html`${i === 0 ? "" : "; "}<code>${m.id.slice(group.kind.length + 1)}</code> at <code>${m.at}</code>`
  );
  return html`<td class="applies-to">${String(group.members.length)}: ${items}</td>`;
}

/**
 * Renders section 5: one row per kind of assumption and statement, with the subjects and input lines it
 * applies to; the review's "Default in use" notes are folded into it.
 */
export function renderAssumptionsSection(ctx: RenderContext): Trusted {
  const list = ctx.input.results.assumptions;
  const groups = groupAssumptions(list, ctx.input.model.constructions.map((c) => c.id));
  const body = list.length === 0 ? html`<p>No assumptions were recorded.</p>` : html`
    <table class="assumptions">
      <thead>
        <tr>
          <th>Kind</th>
          <th>Statement</th>
          <th>Basis / source</th>
          <th>Applies to</th>
        </tr>
      </thead>
      <tbody>${groups.map((g) =>
        html`
          <tr>
            <td><code>${g.members.length === 1 ? g.members[0]!.id : g.kind}</code></td>
            <td>${quotedNumbers(g.text, ctx.display)}</td>
            <td>${g.source}</td>
            ${appliesTo(g)}
          </tr>
        `
      )}</tbody>
    </table>
  `;
  const siNote = ctx.display.system === "SI" ? html`` : html`
    <p
      class="muted">The statements are quoted from results.json with their values in IP units; a formula keeps its SI form.</p>
  `;
  const defaults = ctx.input.findings.filter((f) => f.rule === FOLDED_RULE).length;
  const folded = defaults === 0 ? html`` : html`
    <p
      class="muted">The review's ${String(
        defaults,
      )} notes "Default in use" are folded into this register: state the value in the input if a default does not fit an element.</p>
  `;
  return html`<section id="s-5"><h2>5 Assumptions register</h2>
<p>Every value the tool filled in or chose, with its basis and the input lines it applies to; a default used by many subjects is one row (${
    String(list.length)
  } assumptions in ${String(groups.length)} rows; each id in results.json <code>assumptions</code>).</p>
${siNote}${folded}${body}
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

/** Renders section 6: each material used, with properties, source and origin. */
export function renderMaterialsSection(ctx: RenderContext): Trusted {
  const used = usedMaterials(ctx);
  const unused = ctx.input.model.materials.filter((m) => m.origin === "project" && !used.includes(m));
  const table = used.length === 0
    ? html`<p>No named material is used by a construction.</p>`
    : html`<table>${materialTableHead(ctx.display)}<tbody>${
      used.map((m) => materialTableRow(m, ctx.display))
    }</tbody></table>`;
  const unusedNote = unused.length === 0
    ? html``
    : html`<p class="muted">Defined in the project but not used by any construction: ${
      unused.map((m) => m.id).join(", ")
    }.</p>`;
  return html`<section id="s-6"><h2>6 Materials and their sources</h2>
<p>Layers given inline (without a material id) show their values in the layer tables of section 2.</p>
${table}
${unusedNote}
</section>`;
}

/** Renders section 7: the standards the tool applied and the distinct material sources. */
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
  return html`<section id="s-7"><h2>7 Sources</h2>
<h3 id="s-7-1">7.1 Standards and methods applied by the tool</h3>
<ul>
<li>ISO 6946:2017, Building components and building elements: Thermal resistance and thermal transmittance: calculation methods. Used for the thermal resistance of homogeneous layers (R = d/λ), the default surface resistances by direction of heat flow, and the total resistance and U-value.</li>
<li>ISO 13786:2017, Thermal performance of building components: Dynamic thermal characteristics: Calculation methods. Used for the heat transfer matrix at 24 h and the periodic thermal transmittance, decrement factor, time shifts, admittances and areal heat capacities (3.8).</li>
<li>Pipes, L.A. (1957). Matrix analysis of heat transfer problems. Journal of the Franklin Institute 263. Transmission matrices of layers (3.2).</li>
<li>Stephenson, D.G., Mitalas, G.P. (1967). Cooling load calculations by thermal response factor method. ASHRAE Transactions 73(1). Response factors (3.4).</li>
<li>Kusuda, T. (1969). Thermal response factors for multi-layer structures of various heat conduction systems. ASHRAE Transactions 75(1). Response factors of multilayer constructions (3.4).</li>
<li>Stephenson, D.G., Mitalas, G.P. (1971). Calculation of heat conduction transfer functions for multi-layer slabs. ASHRAE Transactions 77(2). Poles, residues and CTF by the z-transform (3.3 to 3.5).</li>
<li>Hittle, D.C. (1981). Calculating building heating and cooling loads using the frequency response of multilayered slabs. US Army CERL Technical Manuscript E-169. Poles, residues and response factors (3.3, 3.4).</li>
<li>Seem, J.E. (1987). Modeling of heat transfer in buildings. PhD thesis, University of Wisconsin–Madison. State-space CTF (3.6).</li>
<li>Ouyang, K., Haghighat, F. (1991). A procedure for calculating thermal response factors of multi-layer walls: state space method. Building and Environment 26. State-space response factors (3.6).</li>
<li>Spitler, J.D., Fisher, D.E., Pedersen, C.O. (1997). The radiant time series cooling load calculation procedure. ASHRAE Transactions 103(2). Conduction time series (3.7).</li>
<li>Spitler, J.D., Fisher, D.E. (1999). Development of periodic response factors for use with the radiant time series method. ASHRAE Transactions 105(2). Periodic response factors (3.7).</li>
<li>ASHRAE Handbook—Fundamentals, chapter on nonresidential cooling and heating load calculations. Periodic response factors and conduction time series (3.7).</li>
</ul>
<h3 id="s-7-2">7.2 Material data sources cited in the inputs</h3>
${list}
</section>`;
}
