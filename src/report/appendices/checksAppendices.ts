/** Appendix C (the numerical checks by subject and kind, failures in full, every check on screen) and Appendix D (each construction's factors). */
import { renderDynamicFactors } from "../constructions/dynamicOutput.ts";
import { COMPACT_ABOVE_CONSTRUCTIONS, isCompactPackage } from "../page/compact.ts";
import { LEADING_TERMS } from "../../results/packageCopy.ts";
import { readDynamic } from "../constructions/dynamicData.ts";
import { renderFactorSeries } from "./factorSeries.ts";
import { html, type Trusted } from "../page/html.ts";
import type { RenderContext } from "../page/packageInput.ts";
import { allChecksTable, checksTable, subjectAnchor } from "../registers/checksSection.ts";
import { checksByKindTable } from "./checksByKind.ts";
import { methodChecksTable } from "../registers/methodChecks.ts";

function failedChecks(ctx: RenderContext): Trusted {
  const failed = ctx.input.results.checks.filter((c) => !c.pass);
  return failed.length === 0
    ? html`<p>No check failed.</p>`
    : html`<p class="fail">${String(failed.length)} checks failed; each in full:</p>${
      checksTable(ctx, failed)
    }`;
}

/** Every check with its value: expandable on screen; on paper a pointer to results.json and its hash. */
function everyCheck(ctx: RenderContext): Trusted {
  const checks = ctx.input.results.checks;
  if (checks.length === 0) return html`<p>No automated checks apply yet.</p>`;
  if (isCompactPackage(ctx.input.model.constructions.length)) {
    return html`
      <p
        class="every-check-pointer">A large project (more than ${String(
          COMPACT_ABOVE_CONSTRUCTIONS,
        )} constructions): the ${String(
          checks.length,
        )} checks one by one, with description, value and limit, are in the embedded results (Appendix B) and results.json <code>checks[]</code>, SHA-256 <span
            class="hash">${ctx.resultsDigest.sha256}</span>.</p>
    `;
  }
  return html`
    <details class="screen-only every-check">
      <summary>Every check (${String(checks.length)}) with its description, value, limit and result</summary>
      ${allChecksTable(ctx)}
    </details>
    <p
      class="print-only every-check-pointer">Not printed: the ${String(
        checks.length,
      )} checks one by one, with description, value and limit, are in the electronic package (this appendix) and in results.json <code>checks[]</code>, SHA-256 <span
        class="hash">${ctx.resultsDigest.sha256}</span> (Appendix B).</p>
  `;
}

/** Renders Appendix C: the checks and their limits, a row per subject and check kind, failures in full. */
export function renderChecksAppendix(ctx: RenderContext): Trusted {
  const checks = ctx.input.results.checks;
  const subjects = new Set(checks.map((c) => c.subject)).size;
  const failed = checks.filter((c) => !c.pass).length;
  return html`
    <section id="s-c">
      <h2>Appendix C Numerical checks</h2>
      <p>${String(checks.length)} automated checks on ${String(subjects)} subjects: ${String(
        checks.length - failed,
      )} passed, ${String(failed)} failed. A check passes when |value| ≤ limit.</p>
      <h3 id="s-c-1">C.1 Checks and their limits</h3>
      ${methodChecksTable(checks)}
      <h3 id="s-c-2">C.2 Checks by subject and kind</h3>
      <p>One row per subject and check kind: how many checks of the kind ran, the largest |value| / limit among them (1 is the limit) and the result. Failures are also shown in the body beside the number they concern and in the checks and findings.</p>
      ${checksByKindTable(checks, (subject) => subjectAnchor(subject, ctx))}
      <h3 id="s-c-3">C.3 Failed checks</h3>
      ${failedChecks(ctx)}
      <h3 id="s-c-4">C.4 Every check with its value</h3>
      ${everyCheck(ctx)}
    </section>
  `;
}

/** Renders Appendix D: per construction, response factors, both CTFs, periodic factors and plots. */
export function renderFactorsAppendix(ctx: RenderContext): Trusted {
  const resultsSha256 = ctx.resultsDigest.sha256;
  if (isCompactPackage(ctx.input.model.constructions.length)) {
    return html`
      <section id="s-d">
        <h2>Appendix D Dynamic factors</h2>
        <p>A large project (more than ${String(
          COMPACT_ABOVE_CONSTRUCTIONS,
        )} constructions): each construction's dynamic summary is printed with it; its response factors, CTF coefficients and periodic factors are in the embedded results (Appendix B: long series as their first ${String(
          LEADING_TERMS,
        )} terms and the modal form the rest expand from), in results.json, SHA-256 <span
          class="hash">${resultsSha256}</span>, and in csv/factors-&lt;id&gt;.csv.</p>
      </section>
    `;
  }
  const parts = ctx.input.model.constructions.map((construction, i) => {
    const results = Object.hasOwn(ctx.input.results.constructions, construction.id)
      ? ctx.input.results.constructions[construction.id]
      : undefined;
    const anchor = ctx.constructionAnchors.get(construction.id) ?? "c-construction";
    const view = readDynamic(results);
    return html`
      <h3 id="d-${anchor}">D.${String(i + 1)} Dynamic factors of ${construction.id}: ${construction.name}</h3>
      <p
        class="muted">Results with <a href="#${anchor}">the construction</a>; long series printed as their leading terms, every term in results.json (Appendix B) and csv/factors-${construction
          .id}.csv.</p>
      ${renderDynamicFactors(construction, results, ctx.input.results.methodNotes ?? [], anchor, ctx.display)}
      ${view === undefined ? html`` : renderFactorSeries(construction.id, view, resultsSha256)}
    `;
  });
  return html`
    <section id="s-d">
      <h2>Appendix D Dynamic factors</h2>
      ${parts.length === 0 ? html`<p>No construction in this project.</p>` : parts}
    </section>
  `;
}
