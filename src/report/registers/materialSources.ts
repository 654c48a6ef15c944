/**
 * Section 6, materials and their sources, reduced to what the rest of the package does not already say: each
 * material used, where its values are stated (a project material's table in section 2, a library material's
 * values here), the number of its source in the list of section 7.2 and whether that source is confirmed.
 */
import type { MaterialDef, ResolvedLayer } from "../../project/model.ts";
import { formatPosition } from "../../project/position.ts";
import { UNCONFIRMED_SOURCE } from "../../results/openItems.ts";
import { type DisplayUnits, type QuantityKind, toDisplay, unitLabel } from "../page/displayUnits.ts";
import { formatTrim } from "../page/format.ts";
import { html, type Trusted } from "../page/html.ts";
import type { RenderContext } from "../page/packageInput.ts";

/** The material ids a layer uses: its own, and those of a framed layer's two parts. */
function layerMaterialIds(layer: ResolvedLayer): string[] {
  const ids = [layer.materialId, layer.bridge?.base.materialId, layer.bridge?.bridge.materialId];
  return ids.filter((id): id is string => id !== undefined);
}

/** Materials referenced by at least one construction layer (framed layers' parts included), in first-use order. */
export function usedMaterials(ctx: RenderContext): MaterialDef[] {
  const out: MaterialDef[] = [];
  for (const c of ctx.input.model.constructions) {
    for (const layer of c.layers) {
      for (const id of layerMaterialIds(layer)) {
        const m = ctx.input.model.materials.find((x) => x.id === id);
        if (m !== undefined && !out.includes(m)) out.push(m);
      }
    }
  }
  return out;
}

/** The distinct sources cited by the materials used and by inline layers, numbered in this order in 7.2. */
export function citedSources(ctx: RenderContext): string[] {
  const sources: string[] = [];
  for (const m of usedMaterials(ctx)) {
    if (m.source.trim() !== "" && !sources.includes(m.source)) sources.push(m.source);
  }
  for (const c of ctx.input.model.constructions) {
    for (const l of c.layers) {
      if (l.source.trim() !== "" && !sources.includes(l.source)) sources.push(l.source);
    }
  }
  return sources;
}

/** The reference "[n]" to a source of the 7.2 list, or undefined when the text is not in it. */
export function sourceReference(sources: readonly string[], source: string): string | undefined {
  const i = sources.indexOf(source);
  return i < 0 ? undefined : `[${String(i + 1)}]`;
}

function cell(value: number | undefined, kind: QuantityKind, d: DisplayUnits): Trusted {
  return html`<td class="num">${value === undefined ? "—" : formatTrim(toDisplay(d, kind, value), 3)}</td>`;
}

function usedIn(ctx: RenderContext, id: string): string {
  return ctx.input.model.constructions
    .filter((c) => c.layers.some((l) => layerMaterialIds(l).includes(id)))
    .map((c) => c.id)
    .join(", ");
}

/** Whether a material block of this id is in the project's documents (its table is then in section 2). */
function hasBlock(ctx: RenderContext, id: string): boolean {
  return ctx.input.model.documents.some((d) =>
    d.segments.some((s) => s.kind === "block" && s.blockKind === "material" && s.id === id)
  );
}

function row(ctx: RenderContext, m: MaterialDef, sources: readonly string[]): Trusted {
  const d = ctx.display;
  const values = m.origin === "project" && hasBlock(ctx, m.id)
    ? html`<td colspan="4" class="muted">table with its input (${formatPosition(m.at)})</td>`
    : html`${cell(m.conductivity, "conductivity", d)}${cell(m.density, "density", d)}${
      cell(m.specificHeat, "specificHeat", d)
    }${cell(m.resistance, "resistance", d)}`;
  const ref = m.source.trim() === "" ? undefined : sourceReference(sources, m.source);
  const source = m.source.trim() === ""
    ? html`<span class="fail">no source given</span>`
    : ref === undefined
    ? html`${m.source}`
    : html`<a href="#s-7-2">${ref}</a>`;
  const state = m.source.trim() === ""
    ? html`<span class="fail">none</span>`
    : UNCONFIRMED_SOURCE.test(m.source)
    ? html`<span class="unconfirmed">from memory or not confirmed</span>`
    : html`as cited`;
  return html`<tr><td>${m.id}</td><td>${m.origin}</td>${values}<td>${source}</td><td>${state}</td><td>${
    usedIn(ctx, m.id)
  }</td></tr>`;
}

/** Renders section 6: one line per material used (see the module comment). */
export function renderMaterialsSection(ctx: RenderContext): Trusted {
  const d = ctx.display;
  const used = usedMaterials(ctx);
  const sources = citedSources(ctx);
  const unused = ctx.input.model.materials.filter((m) => m.origin === "project" && !used.includes(m));
  const table = used.length === 0 ? html`<p>No named material is used by a construction.</p>` : html`
    <table class="material-sources compact">
      <thead>
        <tr>
          <th>Material</th>
          <th>Origin</th>
          <th>λ ${unitLabel(d, "conductivity")}</th>
          <th>ρ ${unitLabel(d, "density")}</th>
          <th>c ${unitLabel(d, "specificHeat")}</th>
          <th>R ${unitLabel(d, "resistance")}</th>
          <th>Source (no.)</th>
          <th>Source state</th>
          <th>Used in</th>
        </tr>
      </thead>
      <tbody>${used.map((m) => row(ctx, m, sources))}</tbody>
    </table>
  `;
  const unusedNote = unused.length === 0
    ? html``
    : html`<p class="muted">Defined in the project but not used by any construction: ${
      unused.map((m) => m.id).join(", ")
    }.</p>`;
  return html`<section id="s-6"><h2>Materials and their sources</h2>
<p>Each material used once: a project material's values are its table with its input (its block as written in Appendix A), a library material's values are given here; the source is the numbered entry of the material data sources (Sources). Layers given inline (without a material id) show their values in the layer tables of their constructions.</p>
${table}
${unusedNote}
</section>`;
}
