/** Section 2, the notebook: each document's prose in order, each input block followed by its output. */
import type { ProjectDocument } from "../project/model.ts";
import { renderBlock } from "./blockOutput.ts";
import { html, type Trusted } from "./page/html.ts";
import { renderMarkdown } from "./page/markdown.ts";
import { renderSensitivity } from "./scenarios/sensitivityOutput.ts";
import type { RenderContext } from "./page/packageInput.ts";

function renderDocument(doc: ProjectDocument, index: number, ctx: RenderContext): Trusted {
  const parts = doc.segments.map((segment) => {
    switch (segment.kind) {
      case "prose":
        return html`<div class="prose">${renderMarkdown(segment.markdown, { usedIds: ctx.proseIds })}</div>`;
      case "block":
        return renderBlock(segment, ctx);
    }
  });
  return html`<section class="document"><h3 id="s-2-${String(index + 1)}">2.${
    String(index + 1)
  } ${doc.path}</h3>
${parts}
</section>`;
}

/** Renders section 2 with one subsection per project document, in build order. */
export function renderCalculationSection(ctx: RenderContext): Trusted {
  const docs = ctx.input.model.documents.map((doc, i) => renderDocument(doc, i, ctx));
  return html`<section id="s-2"><h2>2 Calculation</h2>
<p>The project's own text follows, file by file. After each input block the tool's computed output is shown, so that every figure sits beside the input it comes from. Headings inside the project text are the consultant's.</p>
${docs}
${renderSensitivity(ctx, `s-2-${String(docs.length + 1)}`, `2.${String(docs.length + 1)}`)}
</section>`;
}
