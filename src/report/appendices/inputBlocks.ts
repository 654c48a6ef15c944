/** The input blocks as written, printed once in Appendix A; the body names each block and links here. */
import type { Segment } from "../../project/model.ts";
import { formatPosition } from "../../project/position.ts";
import { html, PRE_LEAD, type Trusted } from "../page/html.ts";
import type { RenderContext } from "../page/packageInput.ts";

type BlockSegment = Extract<Segment, { kind: "block" }>;

/** Every block of the project in document order. */
function allBlocks(ctx: RenderContext): BlockSegment[] {
  return ctx.input.model.documents.flatMap((d) =>
    d.segments.filter((s): s is BlockSegment => s.kind === "block")
  );
}

/** The fragment id of a block's text in Appendix A ("a-block-3"), or undefined for a block not in the model. */
export function blockTextAnchor(ctx: RenderContext, block: BlockSegment): string | undefined {
  const index = allBlocks(ctx).indexOf(block);
  return index < 0 ? undefined : `a-block-${String(index + 1)}`;
}

/** Renders Appendix A's list of input blocks as written, each with its position and id. */
export function renderBlocksAsWritten(ctx: RenderContext): Trusted {
  const blocks = allBlocks(ctx);
  if (blocks.length === 0) return html``;
  return html`
    <h3 id="s-a-blocks">Input blocks as written</h3>
    <p class="muted">Each block exactly as in its file; the body shows the table computed from it.</p>
    <p
      class="print-only">Printed within their files above, at the position the body names (file:line); on screen each block is also listed here on its own.</p>
    ${blocks.map((b, i) =>
      html`
        <div class="block-as-written" id="a-block-${String(i + 1)}">
          <p class="input-label">${b.blockKind} block${b.id === undefined
            ? ""
            : ` "${b.id}"`}, ${formatPosition(b.at)}</p>
          <pre>${PRE_LEAD}${b.source}</pre>
        </div>
      `
    )}
  `;
}
