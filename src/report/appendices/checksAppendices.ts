/** Appendix C (every numerical check with value, limit and result) and Appendix D (each construction's factors). */
import { renderDynamicFactors } from "../constructions/dynamicOutput.ts";
import { html, type Trusted } from "../page/html.ts";
import type { RenderContext } from "../page/packageInput.ts";
import { allChecksTable } from "../registers/checksSection.ts";
import { methodChecksTable } from "../registers/methodChecks.ts";

/** Renders Appendix C: the full list of numerical checks, PASS rows included. */
export function renderChecksAppendix(ctx: RenderContext): Trusted {
  return html`
    <section id="s-c">
      <h2>Appendix C Numerical checks</h2>
      <h3 id="s-c-1">C.1 Checks and their limits</h3>
      ${methodChecksTable(ctx.input.results.checks)}
      <h3 id="s-c-2">C.2 Every check with its value</h3>
      <p>Every automated check with its value, limit and result, as in results.json <code>checks</code>. Failures are also shown in the body beside the number they concern and in the checks and findings.</p>
      ${allChecksTable(ctx)}
    </section>
  `;
}

/** Renders Appendix D: per construction, response factors, both CTFs, periodic factors and plots. */
export function renderFactorsAppendix(ctx: RenderContext): Trusted {
  const parts = ctx.input.model.constructions.map((construction, i) => {
    const results = Object.hasOwn(ctx.input.results.constructions, construction.id)
      ? ctx.input.results.constructions[construction.id]
      : undefined;
    const anchor = ctx.constructionAnchors.get(construction.id) ?? "c-construction";
    return html`
      <h3 id="d-${anchor}">D.${String(i + 1)} Dynamic factors of ${construction.id}: ${construction.name}</h3>
      <p
        class="muted">Results with <a href="#${anchor}">the construction</a>; long series printed as their leading terms, every term in results.json (Appendix B) and csv/factors-${construction
          .id}.csv.</p>
      ${renderDynamicFactors(construction, results, ctx.input.results.methodNotes ?? [], anchor, ctx.display)}
    `;
  });
  return html`
    <section id="s-d">
      <h2>Appendix D Dynamic factors</h2>
      ${parts.length === 0 ? html`<p>No construction in this project.</p>` : parts}
    </section>
  `;
}
