/** The echo of one input block (verbatim, with file:line) followed by its computed output. */
import type { Segment } from "../project/model.ts";
import { formatPosition } from "../project/position.ts";
import { COMPACT_ABOVE_CONSTRUCTIONS } from "./page/compact.ts";
import { renderConstructionOutput } from "./constructions/constructionOutput.ts";
import { html, PRE_LEAD, type Trusted } from "./page/html.ts";
import type { RenderContext } from "./page/packageInput.ts";
import { materialTableHead, materialTableRow } from "./constructions/materialRows.ts";
import { blockTextAnchor } from "./appendices/inputBlocks.ts";
import { renderScenarioOutput } from "./scenarios/scenarioOutput.ts";
import { renderHeatingBlock } from "./scenarios/heatingOutput.ts";
import { renderRoomOutput } from "./rooms/roomOutput.ts";

type BlockSegment = Extract<Segment, { kind: "block" }>;

function unresolved(block: BlockSegment): Trusted {
  return html`
    <p
      class="fail">No computed output: this ${block
        .blockKind} block did not resolve (see the checks and findings).</p>
  `;
}

function materialOutput(block: BlockSegment, ctx: RenderContext): Trusted {
  const material = ctx.input.model.materials.find((m) => m.id === block.id && m.origin === "project");
  if (material === undefined) return unresolved(block);
  const system = ctx.display.system === "SI" ? "SI units" : "IP units; results.json holds SI";
  return html`
    <table
      class="material-table"><caption>Material ${material
        .id} as resolved (${system})</caption>${materialTableHead(ctx.display)}<tbody>${materialTableRow(
          material,
          ctx.display,
        )}</tbody></table>
  `;
}

function scenarioOutput(block: BlockSegment, ctx: RenderContext): Trusted {
  const heating = ctx.input.model.heatingScenarios?.find((s) => s.id === block.id);
  if (heating !== undefined) return renderHeatingBlock(heating, ctx);
  const scenario = ctx.input.model.scenarios.find((s) => s.id === block.id);
  if (scenario === undefined) return unresolved(block);
  const anchor = ctx.scenarioAnchors.get(scenario.id) ?? "sc-scenario";
  if (ctx.placedScenarios.has(scenario.id)) {
    return html`
      <p
        class="fail">No computed output here: scenario id ${scenario
          .id} is used by an earlier block, whose output is <a href="#${anchor}">above</a> (see the checks and findings).</p>
    `;
  }
  ctx.placedScenarios.add(scenario.id);
  const scenarios = ctx.input.results.scenarios;
  return renderScenarioOutput({
    scenario,
    results: Object.hasOwn(scenarios, scenario.id) ? scenarios[scenario.id] : undefined,
    checks: ctx.input.results.checks,
    assumptions: ctx.input.results.assumptions,
    constructionAnchors: ctx.constructionAnchors,
    anchor,
    display: ctx.display,
  });
}

function constructionOutput(block: BlockSegment, ctx: RenderContext): Trusted {
  const construction = ctx.input.model.constructions.find((c) => c.id === block.id);
  if (construction === undefined) return unresolved(block);
  const results = Object.hasOwn(ctx.input.results.constructions, construction.id)
    ? ctx.input.results.constructions[construction.id]
    : undefined;
  const anchor = ctx.constructionAnchors.get(construction.id) ?? "c-construction";
  const compact = ctx.input.model.constructions.length > COMPACT_ABOVE_CONSTRUCTIONS;
  return renderConstructionOutput(
    construction,
    results,
    ctx.input.results.checks,
    anchor,
    ctx.display,
    compact,
    ctx.input.results.methodNotes ?? [],
  );
}

function roomOutput(block: BlockSegment, ctx: RenderContext): Trusted {
  const room = ctx.input.model.rooms?.find((r) => r.id === block.id);
  if (room === undefined) return unresolved(block);
  return renderRoomOutput(room, ctx);
}

function outputFor(block: BlockSegment, ctx: RenderContext): Trusted {
  if (block.id === undefined) return unresolved(block);
  switch (block.blockKind) {
    case "material":
      return materialOutput(block, ctx);
    case "construction":
      return constructionOutput(block, ctx);
    case "scenario":
      return scenarioOutput(block, ctx);
    case "room":
      return roomOutput(block, ctx);
  }
}

/**
 * Renders an input block's position and its text (escaped, folded on screen, not printed: the printed copy is
 * Appendix A's), then its computed output.
 */
export function renderBlock(block: BlockSegment, ctx: RenderContext): Trusted {
  const anchor = block.blockKind === "construction" && block.id !== undefined
    ? ctx.constructionAnchors.get(block.id)
    : undefined;
  const idAttr = anchor === undefined ? html`` : html`
    id="${anchor}"
  `;
  const textAnchor = blockTextAnchor(ctx, block);
  const where = textAnchor === undefined ? html`` : html`
    (as written in <a href="#${textAnchor}">Appendix A</a>)
  `;
  return html`
    <div class="input-block" ${idAttr}>
      <p class="input-label">Input: ${block.blockKind} block${block.id === undefined
        ? ""
        : ` "${block.id}"`}, ${formatPosition(block.at)}${where}</p>
      <details class="input-echo">
        <summary>Block as written</summary>
        <pre>${PRE_LEAD}${block.source}</pre>
      </details>
    </div>
    <div class="block-output"><p class="input-label">Computed output</p>${outputFor(block, ctx)}</div>
  `;
}
