/**
 * The project's files, each titled by its own first heading (file name in small print), with each input block
 * followed by its output, then the sensitivity study. The package adds no numbers to the user's headings.
 */
import type { ProjectDocument, Segment } from "../project/model.ts";
import { renderBlock } from "./blockOutput.ts";
import { documentAnchor, SENSITIVITY_ANCHOR } from "./page/anchors.ts";
import { html, type Trusted } from "./page/html.ts";
import { type LeadingHeading, leadingHeading, renderMarkdown } from "./page/markdown.ts";
import { renderSensitivity } from "./scenarios/sensitivityOutput.ts";
import type { RenderContext } from "./page/packageInput.ts";

/** A file's title: its opening heading (as h2) when the file opens with one, else its path. */
export interface DocumentTitle {
  /** Plain text of the title as the reader sees it. */
  readonly text: string;
  /** True when the title is the file's own heading (then the file name is printed beside it). */
  readonly fromHeading: boolean;
}

/** A file's opening heading (if it titles the file) and its segments after the heading. */
interface TitleSplit {
  readonly lead?: LeadingHeading;
  readonly rest: readonly Segment[];
}

/** Each file's split, once per document (the contents and the section both read it). */
const splits = new WeakMap<ProjectDocument, TitleSplit>();

/** The title of a project file and the prose it leaves: see `leadingHeading` for when a heading is taken. */
function splitTitle(doc: ProjectDocument): TitleSplit {
  const known = splits.get(doc);
  if (known !== undefined) return known;
  const first = doc.segments[0];
  const lead = first?.kind === "prose" ? leadingHeading(first.markdown) : undefined;
  const split = lead === undefined || first === undefined
    ? { rest: doc.segments }
    : { lead, rest: [{ ...first, markdown: lead.rest }, ...doc.segments.slice(1)] };
  splits.set(doc, split);
  return split;
}

/** The title the contents and the section heading show for a project file. */
export function documentTitle(doc: ProjectDocument): DocumentTitle {
  const lead = splitTitle(doc).lead;
  return lead === undefined ? { text: doc.path, fromHeading: false } : { text: lead.text, fromHeading: true };
}

function renderDocument(doc: ProjectDocument, index: number, ctx: RenderContext): Trusted {
  const { lead, rest } = splitTitle(doc);
  // The title is an h2; the user's headings keep their order below it (a `#` file title makes `##` an h3).
  const shift = lead === undefined ? 2 : 2 - lead.depth;
  const title = lead === undefined
    ? html`<h2 class="document-title">${doc.path}</h2>`
    : html`${
      renderMarkdown(lead.heading, { usedIds: ctx.proseIds, headingShift: shift })
    }<p class="file-name">${doc.path}</p>`;
  const parts = rest.map((segment) => {
    switch (segment.kind) {
      case "prose":
        return html`<div class="prose">${
          renderMarkdown(segment.markdown, { usedIds: ctx.proseIds, headingShift: shift })
        }</div>`;
      case "block":
        return renderBlock(segment, ctx);
    }
  });
  return html`<section class="document" id="${documentAnchor(index)}">${title}
${parts}
</section>`;
}

/** Renders the project's files in build order, then the sensitivity study. */
export function renderCalculationSection(ctx: RenderContext): Trusted {
  const docs = ctx.input.model.documents.map((doc, i) => renderDocument(doc, i, ctx));
  return html`<div id="s-2" class="project-documents">
${docs}
${renderSensitivity(ctx, SENSITIVITY_ANCHOR)}
</div>`;
}
