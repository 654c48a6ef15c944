/**
 * "Summary of results", directly after the cover: every verdict of the package on one page — constructions,
 * scenarios, the failed checks and the open items (with the id to acknowledge them by).
 */
import type { OpenItem, OpenItemKind, SummaryJson } from "../../results/summaryTypes.ts";
import { outsideFilmCautions } from "../../results/outsideFilmCautions.ts";
import { filmCoefficientText } from "../page/displayUnits.ts";
import { html, type Trusted } from "../page/html.ts";
import { quotedNumbers } from "../page/quotedText.ts";
import { formatSig } from "../page/format.ts";
import type { DisplayUnits } from "../page/displayUnits.ts";
import type { RenderContext } from "../page/packageInput.ts";
import { constructionsTable, scenariosTable } from "./summaryTables.ts";
import { roomsSummaryTable } from "../rooms/roomSummary.ts";

/** Printed name of each open-item kind. */
export const OPEN_ITEM_LABEL: Readonly<Record<OpenItemKind, string>> = {
  "from-memory-source": "Source from memory or not confirmed",
  "synthetic-data": "Synthetic data",
  "failed-check": "Failed check",
  "default-in-use": "Default in use",
  "unmet-limit": "Limit not met",
  "open-point": "Open point",
  "acknowledged-finding": "Acknowledged finding",
};

function failedChecks(summary: SummaryJson, d: DisplayUnits): Trusted {
  if (summary.failedChecks.length === 0) {
    return html`<p class="check-summary">Failed checks: none.</p>`;
  }
  const items = summary.failedChecks.map((c) =>
    html`<li>${c.id} on ${c.subject}: ${formatSig(c.value, 3)} against ${formatSig(c.limit, 3)} (${
      quotedNumbers(c.description, d)
    })</li>`
  );
  return html`
    <div class="check-summary has-failures">
      <p>Failed checks: ${String(summary.failedChecks.length)} (see the checks and findings).</p>
      <ul>${items}</ul>
    </div>
  `;
}

function itemStatus(item: OpenItem): Trusted {
  if (item.acknowledged !== null) {
    return html`acknowledged by ${item.acknowledged.by}: ${item.acknowledged.reason}`;
  }
  return item.blocking ? html`<span class="fail">blocks issue</span>` : html`open`;
}

function openItems(summary: SummaryJson, d: DisplayUnits): Trusted {
  if (summary.openItems.length === 0) return html`<p>Open items: none.</p>`;
  const rows = summary.openItems.map((item) =>
    html`
      <tr class="${item.blocking && item.acknowledged === null ? "fail" : ""}">
        <td>${OPEN_ITEM_LABEL[item.kind]}</td>
        <td>${quotedNumbers(item.text, d)}<br><span class="muted">at ${item.at}; id <code>${item
          .id}</code></span></td>
        <td>${itemStatus(item)}</td>
      </tr>
    `
  );
  return html`
    ${openItemsByKind(summary)}
    <table class="compact summary-open-items screen-only">
      <caption>Open items: ${String(
        summary.openItems.length,
      )}. Sources from memory, synthetic data and failed checks block issue until each is resolved or acknowledged in project.md (<code>acknowledged: [{ item: &lt;id or kind&gt;, reason, by }]</code>).</caption>
      <thead>
        <tr>
          <th>Kind</th>
          <th>Item</th>
          <th>Status</th>
        </tr>
      </thead>
      <tbody>${rows}</tbody>
    </table>
  `;
}

/** An open item named by its id without the kind, and its file and line: `material:eps-graphite-031 (10-materials.md:33)`. */
function shortItem(item: OpenItem): string {
  const name = item.id.startsWith(`${item.kind}:`) ? item.id.slice(item.kind.length + 1) : item.id;
  const line = item.at.replace(/:\d+$/, "");
  const ack = item.acknowledged === null
    ? ""
    : ` — acknowledged by ${item.acknowledged.by}: ${item.acknowledged.reason}`;
  return `${name} (${line})${ack}`;
}

/**
 * The printed open items: one row per kind and status with every item named by its id and line; each item's full
 * text is in the table on screen, results.json `summary.openItems` and csv/summary.csv.
 */
function openItemsByKind(summary: SummaryJson): Trusted {
  const groups = new Map<string, OpenItem[]>();
  for (const item of summary.openItems) {
    const status = item.acknowledged !== null ? "acknowledged" : item.blocking ? "blocks issue" : "open";
    const key = `${item.kind}\u0000${status}`;
    groups.set(key, [...(groups.get(key) ?? []), item]);
  }
  const rows = [...groups].map(([key, items]) => {
    const [kind, status] = key.split("\u0000") as [OpenItemKind, string];
    return html`
      <tr class="${status === "blocks issue" ? "fail" : ""}">
        <td>${OPEN_ITEM_LABEL[kind]} (${String(items.length)})</td>
        <td>${items.map(shortItem).join("; ")}</td>
        <td>${status}</td>
      </tr>
    `;
  });
  return html`
    <table class="compact summary-open-items-by-kind print-only">
      <caption>Open items: ${String(
        summary.openItems.length,
      )}, by kind. Sources from memory, synthetic data and failed checks block issue until each is resolved or acknowledged in project.md (<code>acknowledged: [{ item: &lt;id or kind&gt;, reason, by }]</code>, the id being the kind and the name below, e.g. <code>${summary
        .openItems[0]?.id ??
        "from-memory-source:material:…"}</code>). Each item's full text: the electronic package, results.json <code>summary.openItems</code> and csv/summary.csv.</caption>
      <thead>
        <tr>
          <th>Kind (count)</th>
          <th>Items (id without the kind, and where)</th>
          <th>Status</th>
        </tr>
      </thead>
      <tbody>${rows}</tbody>
    </table>
  `;
}

/** The outside film the design days use, stated once (the same words as the caution). */
function outsideFilm(ctx: RenderContext): Trusted {
  const [statement] = outsideFilmCautions(
    ctx.input.results.scenarios,
    (w) => filmCoefficientText(ctx.display, w),
  );
  return statement === undefined ? html`` : html`<p class="summary-film">${statement}</p>`;
}

/** Renders the summary section; nothing when results.json has no summary (a package read from before it). */
export function renderSummarySection(ctx: RenderContext): Trusted {
  const summary = ctx.input.results.summary;
  if (summary === undefined) return html``;
  return html`<section class="summary-of-results" id="s-summary" aria-labelledby="s-summary-h">
<h2 id="s-summary-h">Summary of results</h2>
${constructionsTable(summary.constructions, ctx.display)}
${scenariosTable(summary.scenarios, ctx.display)}
${roomsSummaryTable(ctx)}
${outsideFilm(ctx)}
${failedChecks(summary, ctx.display)}
${openItems(summary, ctx.display)}
</section>`;
}
