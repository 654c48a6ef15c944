import { packageCss } from "../report/page/css.ts";
import { html, joinHtml, raw, type Trusted } from "../report/page/html.ts";
import {
  changeLabel,
  changeText,
  effectAbsolute,
  effectRelative,
  effectSide,
  effectSubject,
  quantityName,
} from "./display.ts";
import {
  checkFigures,
  checkLabel,
  checkMove,
  verdictFigures,
  verdictLabel,
  verdictMove,
} from "./verdictDisplay.ts";
import { SECTION_TITLES, sideLine } from "./text.ts";
import type { Effect, ProjectDiff, SideSummary } from "./types.ts";

/** The page's Content-Security-Policy: nothing may load or run; only the inline stylesheet applies. */
export const DIFF_CSP = "default-src 'none'; style-src 'unsafe-inline'";

/** How many of the largest effects are highlighted. */
export const HIGHLIGHTED = 3;

const DIFF_CSS = raw(`
.old { color: var(--muted); }
td.at { font-family: ui-monospace, "DejaVu Sans Mono", Consolas, monospace; font-size: 8pt; color: var(--muted); }
tr.largest td { font-weight: bold; background: #fff4d6; }
tr.largest td:first-child { border-left: 3px solid #b5470f; }
.bar { display: inline-block; height: 2.2mm; background: #1f5fa8; vertical-align: middle; margin-left: 1mm; }
.bar.rise { background: #b5470f; }
${Array.from({ length: 10 }, (_, i) => `.bar.w${i + 1} { width: ${(i + 1) * 2}mm; }`).join("\n")}
.no-differences { border: 2px solid var(--pass); color: var(--pass); padding: 2mm 3mm; font-weight: bold; }
`);

function sideRow(name: string, s: SideSummary): Trusted {
  return html`
    <tr>
      <th>${name}</th>
      <td>${sideLine(s)}</td>
      <td class="hash">${s.inputsSha256}</td>
    </tr>
  `;
}

function filesTable(diff: ProjectDiff): Trusted {
  if (diff.files.length === 0) return html``;
  const rows = diff.files.map((f) =>
    html`
      <tr>
        <td>${f.status}</td>
        <td><code>${f.path}</code></td>
        <td>${f.proseChanged === null ? "—" : f.proseChanged ? "changed" : "unchanged"}</td>
      </tr>
    `
  );
  return html`
    <h2>Files</h2>
    <table>
      <thead>
        <tr>
          <th>status</th>
          <th>file</th>
          <th>prose</th>
        </tr>
      </thead>
      <tbody>${rows}</tbody>
    </table>
  `;
}

function changeTables(diff: ProjectDiff): Trusted {
  const parts = SECTION_TITLES.map(([section, title]) => {
    const list = diff.changes.filter((c) => c.section === section);
    if (list.length === 0) return html``;
    const rows = list.map((c) =>
      html`
        <tr class="${c.change}">
          <td>${changeLabel(c)}</td>
          <td>${changeText(c)}</td>
          <td class="at">${c.oldAt ?? "—"}</td>
          <td class="at">${c.newAt ?? "—"}</td>
        </tr>
      `
    );
    return html`
      <h3>${title}</h3>
      <table>
        <thead>
          <tr>
            <th>input</th>
            <th>old → new</th>
            <th>at (a)</th>
            <th>at (b)</th>
          </tr>
        </thead>
        <tbody>${rows}</tbody>
      </table>
    `;
  });
  return diff.changes.length === 0 ? html`` : html`<h2>Inputs</h2>${parts}`;
}

function verdictTables(diff: ProjectDiff): Trusted {
  const verdictRows = diff.verdicts.map((v) =>
    html`
      <tr class="${v.new === "NOT MET" ? "fail" : "pass"}">
        <td>${verdictLabel(v)}</td>
        <td class="result">${verdictMove(v)}</td>
        <td>${verdictFigures(v)}</td>
      </tr>
    `
  );
  const checkRows = diff.checks.map((c) =>
    html`
      <tr class="${c.new === "fail" ? "fail" : "pass"}">
        <td>${checkLabel(c)}</td>
        <td class="result">${checkMove(c)}</td>
        <td>${checkFigures(c)}</td>
      </tr>
    `
  );
  const verdicts = diff.verdicts.length === 0 ? html`` : html`
    <h2>Verdicts changed</h2>
    <p class="muted">Limits whose verdict moved, newly NOT MET first.</p>
    <table class="verdicts">
      <thead>
        <tr>
          <th>limit</th>
          <th>a → b</th>
          <th>figures</th>
        </tr>
      </thead>
      <tbody>${verdictRows}</tbody>
    </table>
  `;
  const checks = diff.checks.length === 0 ? html`` : html`
    <h2>Calculation checks changed</h2>
    <p class="muted">Checks that newly fail first, then those that no longer fail.</p>
    <table class="checks">
      <thead>
        <tr>
          <th>check</th>
          <th>a → b</th>
          <th>figures</th>
        </tr>
      </thead>
      <tbody>${checkRows}</tbody>
    </table>
  `;
  return joinHtml([verdicts, checks]);
}

function barClass(e: Effect, largest: number): string {
  if (e.relative === null || largest === 0) return "";
  const step = Math.max(1, Math.min(10, Math.ceil((Math.abs(e.relative) / largest) * 10)));
  return `bar w${step}${e.relative > 0 ? " rise" : ""}`;
}

function effectsTable(diff: ProjectDiff): Trusted {
  if (diff.effects.length === 0) return html``;
  const largest = Math.max(0, ...diff.effects.map((e) => Math.abs(e.relative ?? 0)));
  const rows = diff.effects.map((e, i) => {
    const bar = barClass(e, largest);
    const highlight = i < HIGHLIGHTED && e.relative !== null && e.relative !== 0 ? "largest" : "";
    return html`
      <tr class="${highlight}">
        <td>${effectSubject(e)}</td>
        <td>${quantityName(e.quantity)}</td>
        <td class="num old">${effectSide(e, "old")}</td>
        <td class="num new">${effectSide(e, "new")}</td>
        <td class="num">${effectAbsolute(e)}</td>
        <td class="num">${effectRelative(e)}${bar === "" ? html`` : html`<span class="${bar}"></span>`}</td>
      </tr>
    `;
  });
  return html`
    <h2>Effects on results</h2>
    <p class="muted">Largest relative change first; the ${String(HIGHLIGHTED)} largest are highlighted.
    ${String(diff.unchangedEffects)} compared quantities are unchanged. Energies in kWh (1 kWh = 3.6 MJ).</p>
    <table>
      <thead>
        <tr>
          <th>subject</th>
          <th>quantity</th>
          <th>a</th>
          <th>b</th>
          <th>change</th>
          <th>relative</th>
        </tr>
      </thead>
      <tbody>${rows}</tbody>
    </table>
  `;
}

/** Renders the comparison as one self-contained HTML page in the package's style, with no script. */
export function renderDiffHtml(diff: ProjectDiff): string {
  const title = diff.b.title;
  const heading = `Revision ${diff.a.revision} → ${diff.b.revision}`;
  const css = joinHtml([packageCss({ left: title, right: heading }, undefined), DIFF_CSS]);
  const body = diff.identical
    ? html`<p class="no-differences">No differences: the inputs and the results are the same.</p>`
    : joinHtml([verdictTables(diff), filesTable(diff), changeTables(diff), effectsTable(diff)]);
  const page = html`
    <!DOCTYPE html>
    <html lang="en">
      <head>
        <meta charset="utf-8">
        <meta http-equiv="Content-Security-Policy" content="${DIFF_CSP}">
        <meta name="viewport" content="width=device-width, initial-scale=1">
        <title>${title} — ${heading}</title>
        <style>${css}</style>
      </head>
      <body>
    <h1>${title}</h1>
    <p><strong>${heading}</strong>: what changed in the inputs and what it did to the results.</p>
    <table><tbody>${sideRow("a", diff.a)}${sideRow("b", diff.b)}</tbody></table>
    ${body}
      </body>
    </html>
  `;
  return `${page.markup.trim()}\n`;
}
