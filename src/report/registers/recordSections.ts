/** Sections 9 and 10: revision history and the reproducibility record. */
import { html, type Trusted } from "../page/html.ts";
import type { RenderContext } from "../page/packageInput.ts";

/** Renders the revision history from the front matter's revision list. */
export function renderRevisionSection(ctx: RenderContext): Trusted {
  const revisions = ctx.input.model.info.revisions;
  const body = revisions.length === 0 ? html`<p>No revisions are listed in the front matter.</p>` : html`
    <table>
      <thead>
        <tr>
          <th>Revision</th>
          <th>Date</th>
          <th>Description</th>
        </tr>
      </thead>
      <tbody>${revisions.map((r) =>
        html`
          <tr>
            <td>${r.revision}</td>
            <td>${r.date}</td>
            <td>${r.description}</td>
          </tr>
        `
      )}</tbody>
    </table>
  `;
  return html`<section id="s-9"><h2>Revision history</h2>
${body}
</section>`;
}

function libraryTable(ctx: RenderContext): Trusted {
  const entries = ctx.input.libraryEntries;
  if (entries.length === 0) return html`<p>No built-in library entries were used.</p>`;
  return html`
    <table>
      <thead>
        <tr>
          <th>Library entry</th>
          <th>SHA-256 of its canonical form</th>
        </tr>
      </thead>
      <tbody>${entries.map((e) =>
        html`
          <tr>
            <td>${e.id}</td>
            <td class="hash">${e.sha256}</td>
          </tr>
        `
      )}</tbody>
    </table>
    <details><summary>Canonical forms of the library entries</summary>${entries.map((e) =>
      html`<pre data-library-entry="${e.id}" data-sha256="${e.sha256}">${e.canonical}</pre>`
    )}</details>
  `;
}

/** Renders the reproducibility record: versions, input hashes, library entries and how to re-run. */
export function renderReproducibilitySection(ctx: RenderContext): Trusted {
  const { results, toolVersion, runtimeVersion } = ctx.input;
  const files = results.inputs.files.map((f) =>
    html`
      <tr>
        <td>${f.path}</td>
        <td class="hash">${f.sha256}</td>
      </tr>
    `
  );
  return html`<section id="s-10"><h2>Reproducibility</h2>
<table>
<tr><th scope="row">Tool</th><td>fluxnote ${toolVersion}</td></tr>
<tr><th scope="row">Runtime</th><td>${runtimeVersion}</td></tr>
<tr><th scope="row">Results schema</th><td>${results.schema}</td></tr>
<tr><th scope="row">SHA-256 of the whole input</th><td class="hash">${results.inputs.sha256}</td></tr>
</table>
<h3 id="s-10-1">Input files</h3>
<table><thead><tr><th>Path</th><th>SHA-256</th></tr></thead><tbody>${files}</tbody></table>
<p class="muted">The whole-input hash is the SHA-256 of the lines <code>&lt;sha256&gt;  &lt;path&gt;</code> (each ending in a line feed) of every input in build order, including the canonical forms of the library entries below.</p>
<h3 id="s-10-2">Built-in library entries used</h3>
${libraryTable(ctx)}
<h3 id="s-10-3">How to re-run</h3>
<ol>
<li>Check the package itself: <code>fluxnote verify package.html</code> re-runs the embedded inputs and compares the results.</li>
<li>Or by hand: save each file of Appendix A (base64, decoded) at its path in an empty folder, confirm each SHA-256 against the table above, and run <code>fluxnote build &lt;folder&gt;</code> with fluxnote ${toolVersion}. The results must equal Appendix B.</li>
</ol>
</section>`;
}
