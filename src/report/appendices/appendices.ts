/** Appendix A (every input file's exact bytes, base64) and Appendix B (the results JSON). */
import { encodeBase64 } from "../../archive/base64.ts";
import { LEADING_TERMS } from "../../results/packageCopy.ts";
import { renderBlocksAsWritten } from "./inputBlocks.ts";
import { html, PRE_LEAD, type Trusted } from "../page/html.ts";
import type { InputFile, RenderContext } from "../page/packageInput.ts";

/** Decodes bytes as UTF-8 text, or undefined when they are not valid UTF-8. */
function asText(bytes: Uint8Array): string | undefined {
  try {
    return new TextDecoder("utf-8", { fatal: true }).decode(bytes);
  } catch {
    return undefined;
  }
}

/** Readable views are given for files up to this size; larger data files are only embedded. */
const READABLE_VIEW_MAX_BYTES = 128 * 1024;

function embeddedFile(file: InputFile, index: number): Trusted {
  const text = file.bytes.length <= READABLE_VIEW_MAX_BYTES ? asText(file.bytes) : undefined;
  const readable = text === undefined
    ? html`<p class="muted">${
      file.bytes.length > READABLE_VIEW_MAX_BYTES
        ? "A large data file: only the base64 form is given (the CSV files in the output hold the same data)."
        : "Not valid UTF-8 text: only the base64 form is given."
    }</p>`
    : html`
      <details class="screen-only">
        <summary>Readable view of ${file.path}</summary>
        <pre class="readable-file">${PRE_LEAD}${text}</pre>
      </details>
      <div class="print-only printed-input">
        <p class="muted">${file.path} in full:</p>
        <pre class="printed-file">${PRE_LEAD}${text}</pre>
      </div>
    `;
  return html`
    <h3 id="s-a-${String(index + 1)}">A.${String(index + 1)} ${file.path}</h3>
    <p class="muted">${String(file.bytes.length)} bytes, SHA-256 <span class="hash">${file.sha256}</span></p>
    <pre class="embedded-file" data-path="${file.path}" data-sha256="${file.sha256}"
      data-encoding="base64">${encodeBase64(file.bytes)}</pre>
    ${readable}
  `;
}

/** Renders Appendix A: each input file's bytes as base64 in an inert element, plus a readable view. */
export function renderInputsAppendix(ctx: RenderContext): Trusted {
  return html`<section id="s-a"><h2>Appendix A Embedded inputs</h2>
<p>Each input file's exact bytes, base64-encoded (RFC 4648), so the package alone can regenerate its results. The base64 blocks are hidden when printed; the printout gives each text file in full.</p>
${ctx.input.inputFiles.map(embeddedFile)}
${renderBlocksAsWritten(ctx)}
${
    ctx.input.libraryEntries.length === 0 ? "" : html`<h3 id="s-a-lib">Built-in library entries used</h3>
<p>The canonical text of each library entry the project used; these are hashed with the inputs.</p>
<div class="library-entries">${
      ctx.input.libraryEntries.map((entry) =>
        html`<pre class="embedded-library" data-id="${entry.id}" data-sha256="${entry.sha256}">${entry.canonical}</pre>`
      )
    }</div>`
  }
</section>`;
}

function siNote(ctx: RenderContext): Trusted {
  return ctx.display.system === "SI"
    ? html``
    : html`<p class="muted">In SI units, whatever the display units of the package.</p>`;
}

/**
 * The print-only view of Appendix B: the results named by their hash and where every value is. The JSON itself
 * is not printed: the body and Appendices C and D print its numbers (long series by their leading terms).
 */
function printedResults(ctx: RenderContext): Trusted {
  return html`
    <div class="print-only printed-results">
      <p>The results embedded in this package: results.json, schema ${ctx.input.results.schema}, ${String(
        ctx.resultsDigest.bytes,
      )} bytes, SHA-256 <span class="hash">${ctx.resultsDigest.sha256}</span>. Every value is in the
      electronic package and in results.json and the CSV files in csv/ beside it; the printout gives the numbers in
      the body and in Appendices C and D, long series by their leading terms.</p>
    </div>
  `;
}

/** Renders Appendix B: the results JSON as escaped text (always SI). */
export function renderResultsAppendix(ctx: RenderContext): Trusted {
  return html`
    <section id="s-b">
      <h2>Appendix B Results (results.json)</h2>${siNote(ctx)}
      <details class="screen-only">
        <summary>Machine-readable results, schema ${ctx.input.results.schema}</summary>
        <p>As results.json, except that each response-factor series of a construction is written to its first
        ${String(
          LEADING_TERMS,
        )} terms; the rest are its modal form (<code>modal</code>) expanded, and results.json
        beside the package holds every term.</p>
        <pre data-embedded="results-json">${PRE_LEAD}${ctx.input.embeddedResultsText}</pre>
      </details>
      ${printedResults(ctx)}
    </section>
  `;
}
