/** The package's one stylesheet: screen and print, running header, and the watermark when not issued. */
import { cssStringLiteral, html, raw, type Trusted } from "./html.ts";

const BASE_CSS = raw(`
:root { --ink: #111; --muted: #555; --rule: #999; --fail: #a40000; --pass: #1d5e20; --paper: #fff; }
html { background: #eee; }
body { font-family: Georgia, "Times New Roman", serif; font-size: 10.5pt; line-height: 1.45; color: var(--ink);
  background: var(--paper); max-width: 180mm; margin: 0 auto; padding: 12mm 15mm; }
h1, h2, h3, h4, h5, h6, th, .running-header, caption, figcaption, .status-banner, .check-summary {
  font-family: system-ui, -apple-system, "Segoe UI", Arial, sans-serif; }
h1 { font-size: 20pt; margin: 0 0 4mm; }
h2 { font-size: 14pt; border-bottom: 1px solid var(--rule); margin-top: 10mm; padding-bottom: 1mm; }
h3 { font-size: 12pt; margin-top: 7mm; }
h4, h5, h6 { font-size: 10.5pt; }
table { border-collapse: collapse; margin: 3mm 0; font-size: 9.5pt; break-inside: avoid; }
th, td { border: 1px solid var(--rule); padding: 1mm 2mm; vertical-align: top; text-align: left; }
th { background: #f0f0f0; font-weight: 600; }
th .unit { display: block; font-weight: normal; }
th.num { text-align: right; }
td.num { text-align: right; font-variant-numeric: tabular-nums; white-space: nowrap; }
tr.total td { font-weight: bold; border-top: 2px solid var(--ink); }
figure { margin: 3mm 0; break-inside: avoid; }
figure svg { max-width: 100%; height: auto; }
figcaption, caption { font-size: 9pt; color: var(--muted); text-align: left; }
pre { font-family: ui-monospace, "DejaVu Sans Mono", Consolas, monospace; font-size: 8.5pt; background: #f7f7f7;
  border: 1px solid #ddd; padding: 2mm; white-space: pre-wrap; overflow-wrap: anywhere; }
code { font-family: ui-monospace, "DejaVu Sans Mono", Consolas, monospace; font-size: 9pt; }
.input-block { break-inside: avoid; }
.input-label, .muted { color: var(--muted); font-size: 9pt; }
.block-output { border-left: 3px solid var(--rule); padding-left: 3mm; margin: 2mm 0 6mm; }
.note { font-style: italic; }
.fail, .finding-error { color: var(--fail); font-weight: bold; }
.pass { color: var(--pass); }
.status-banner { border: 2px solid var(--fail); color: var(--fail); padding: 2mm 3mm; font-weight: bold; margin: 4mm 0; }
.status-banner.issued { border-color: var(--pass); color: var(--pass); }
.check-summary { border: 1px solid var(--rule); padding: 2mm 3mm; margin: 4mm 0; }
.check-summary.has-failures { border: 2px solid var(--fail); color: var(--fail); font-weight: bold; }
.cover { break-after: page; }
.cover table th { width: 40mm; }
.hash { font-family: ui-monospace, "DejaVu Sans Mono", Consolas, monospace; font-size: 8.5pt; overflow-wrap: anywhere; }
.raw-html, .image-omitted, .link-removed { color: var(--muted); }
.link-removed { text-decoration: underline dotted; }
.running-header { position: sticky; top: 0; background: var(--paper); border-bottom: 1px solid var(--rule);
  font-size: 8.5pt; color: var(--muted); padding: 1mm 0; margin-bottom: 4mm; z-index: 2; }
.embedded-file { max-height: 30mm; overflow: auto; font-size: 7pt; }
.end-marker { text-align: center; font-weight: bold; border-top: 2px solid var(--ink); margin-top: 10mm; padding-top: 3mm; }
nav.contents ol { list-style: none; padding-left: 0; }
.dynamic-response { margin-top: 5mm; }
.dynamic-response h4 { font-size: 11pt; margin: 5mm 0 1mm; border-top: 1px solid var(--rule); padding-top: 2mm; }
.dynamic-response h5 { font-size: 10pt; margin: 4mm 0 1mm; }
.dynamic-response table { font-size: 8.5pt; }
.dynamic-summary-pair { display: flex; flex-wrap: wrap; gap: 0 4mm; align-items: flex-start; }
.dynamic-summary-caption { font-family: system-ui, -apple-system, "Segoe UI", Arial, sans-serif; font-size: 9pt;
  color: var(--muted); margin-bottom: 0; }
.dynamic-response th, .dynamic-response td { padding: 0.6mm 1.5mm; }
tr.group-start td { border-top: 2px solid var(--ink); }
.ctf-table tr.group-start td { border-top: 1.5px solid var(--ink); }
.ctf-table tr.second-method td { color: var(--muted); }
table.subject-checks tr.fail td { color: var(--fail); font-weight: bold; }
table.subject-checks td.result { font-weight: bold; }
table.subject-checks tr.pass td { color: var(--ink); }
table.subject-checks tr.pass td.result { color: var(--pass); }
.ctf-method-note { border: 1px solid var(--rule); padding: 1mm 2mm; margin: 3mm 0; }
.equation { font-family: "Cambria Math", "STIX Two Math", Georgia, serif; margin: 1.5mm 0 1.5mm 6mm; }
figure.plot-figure svg { display: block; width: 100%; max-width: 160mm; height: auto; }
figure.plot-figure svg text { white-space: pre; }
.scenario-output { margin-top: 4mm; }
.scenario-output h4 { font-size: 11pt; margin: 4mm 0 1mm; }
.scenario-output h5 { font-size: 10pt; margin: 4mm 0 1mm; border-top: 1px solid var(--rule); padding-top: 2mm; }
.peak-summary { border: 2px solid var(--ink); padding: 2mm 3mm; margin: 2mm 0 4mm; break-inside: avoid; }
.peak-summary p { margin: 1mm 0; }
.peak-line { font-family: system-ui, -apple-system, "Segoe UI", Arial, sans-serif; font-size: 12pt; }
table.compact { font-size: 8pt; }
td.when { white-space: nowrap; }
table.compact th, table.compact td { padding: 0.4mm 1.2mm; }
table.hourly { break-inside: auto; }
table.hourly th .unit { font-weight: normal; }
table.hourly td.total-col { font-weight: bold; }
table.conditions th { width: 32mm; }
table.heating-conditions th { width: auto; white-space: nowrap; }
table.heating-surfaces td:first-child, table.scenario-surfaces td:first-child { white-space: nowrap; }
.default-mark { margin-left: 0.35em; }
table.conditions td, .scenario-notes { font-size: 9pt; }
.scenario-notes { margin: 1mm 0 3mm; padding-left: 5mm; }
.legend { display: inline; }
.legend-entry { white-space: nowrap; margin-right: 3mm; }
figure.plot-figure svg.swatch, svg.swatch { display: inline-block; vertical-align: middle; max-width: none;
  width: 28px; height: 10px; }
figure.plot-figure svg.swatch-fill, svg.swatch-fill { width: 12px; }
.caution-box { border: 1px solid var(--ink); background: #f7f7f7; padding: 2mm 3mm; margin: 4mm 0; break-inside: avoid; }
.caution-box p { margin: 1mm 0; }
nav.contents ol.contents-outputs { padding-left: 6mm; }
.file-name { font-size: 8pt; color: var(--muted); font-weight: normal; }
p.file-name { margin: -1mm 0 3mm; break-after: avoid; page-break-after: avoid; }
table.assumptions, table.checks-list { width: 100%; table-layout: fixed; font-size: 8.5pt; break-inside: auto; }
table.assumptions th, table.assumptions td, table.checks-list th, table.checks-list td { padding: 0.5mm 1.2mm; }
table.assumptions code, table.checks-list code { font-size: 7.5pt; overflow-wrap: anywhere; }
table.assumptions tr, table.checks-list tr { break-inside: avoid; }
table.assumptions th:nth-child(1) { width: 16%; }
table.assumptions th:nth-child(2) { width: 34%; }
table.assumptions th:nth-child(3) { width: 20%; }
table.assumptions td.applies-to { font-size: 7.5pt; }
.print-only { display: none; }
@media print {
  html { background: none; }
  body { max-width: none; margin: 0; padding: 0; font-size: 10pt; line-height: 1.35; }
  p { margin: 1.6mm 0; }
  h2 { margin-top: 7mm; }
  h3 { margin-top: 5mm; margin-bottom: 2mm; }
  h4, h5, h6 { margin-top: 3mm; margin-bottom: 1.5mm; }
  table, figure { margin: 2mm 0; }
  th, td { padding: 0.6mm 1.5mm; }
  ul, ol { margin: 1.6mm 0; }
  .block-output { margin: 1.5mm 0 4mm; }
  .dynamic-response { margin-top: 3mm; }
  .dynamic-response h4 { margin: 3mm 0 1mm; }
  .running-header { display: none; }
  .embedded-file, details.input-echo { display: none; }
  details { display: block; }
  details.screen-only, .screen-only { display: none; }
  .print-only { display: block; }
  table.print-only { display: table; }
  a { color: inherit; text-decoration: none; }
  h1, h2, h3, h4, h5, h6, .input-label, caption { break-after: avoid; page-break-after: avoid; }
  caption { break-inside: avoid; page-break-inside: avoid; }
  tr, figure, .input-block { break-inside: avoid; }
  table, table.hourly { break-inside: auto; }
  thead { display: table-header-group; }
  thead, thead tr { break-inside: avoid; break-after: avoid; page-break-after: avoid; }
  tbody > tr:first-child { break-before: avoid; page-break-before: avoid; }
  tfoot { display: table-footer-group; }
  table.material-table { width: 100%; font-size: 8.5pt; }
  table.material-table th:nth-child(1) { width: 17%; }
  table.material-table th:nth-child(2) { width: 19%; }
  table.material-table th:nth-child(7) { width: 34%; }
  #s-7 li { font-size: 9pt; }
  table.layer-table { width: 100%; font-size: 8.5pt; }
  table.layer-table th, table.layer-table td { padding: 0.5mm 1.2mm; }
  table.layer-table th:nth-child(2) { width: 34%; }
  table.layer-table th:nth-child(8) { width: 17%; }
  table.dynamic-summary th, table.dynamic-summary td { padding: 0.3mm 1.2mm; }
  figure.plot-figure svg { max-width: 110mm; }
  figure.tornado svg { max-width: 135mm; }
  figure svg.section-drawing { max-width: 128mm; }
  figure svg.section-stack { max-width: 112mm; }
  .scenario-notes, table.conditions td { font-size: 8.5pt; }
  table.assumptions { font-size: 8pt; }
  table.scenario-surfaces { font-size: 7.5pt; }
  table.scenario-surfaces th, table.scenario-surfaces td { padding: 0.2mm 0.7mm; }
  .hourly-appendix table.compact { font-size: 7pt; }
  .hourly-appendix table.compact th, .hourly-appendix table.compact td { padding: 0.2mm 0.8mm; }
  nav.contents > ol { column-count: 2; column-gap: 8mm; font-size: 9pt; }
  nav.contents > ol > li { break-inside: avoid; }
  .dynamic-summary-pair { flex-wrap: nowrap; }
  .dynamic-summary-pair table.dynamic-summary { width: auto; flex: 1 1 0; margin-top: 0; }
  tr.screen-only { display: none; }
}
`);

/** Text of the running header: title, reference, revision and status. */
export interface RunningHeader {
  readonly left: string;
  readonly right: string;
}

/**
 * Builds the stylesheet. Page size is left to the printer so the same file prints on A4 and Letter;
 * the margins fit both. `watermark` is the diagonal text on every page, absent when issued.
 */
export function packageCss(header: RunningHeader, watermark: string | undefined): Trusted {
  const pageRules = html`
    @page { margin: 20mm 18mm 20mm 18mm;
      @top-left { content: ${cssStringLiteral(header.left)}; font: 8pt system-ui, sans-serif; color: #555; }
      @top-right { content: ${cssStringLiteral(header.right)}; font: 8pt system-ui, sans-serif; color: #555; }
      @bottom-right { content: "Page " counter(page) " of " counter(pages); font: 8pt system-ui, sans-serif; }
    }
    @page :first { @top-left { content: none; } @top-right { content: none; } }
  `;
  const watermarkRule = watermark === undefined ? html`` : html`
    body::before { content: ${cssStringLiteral(watermark)}; position: fixed; top: 42%; left: 0; right: 0;
      text-align: center; font: bold 110pt system-ui, sans-serif; color: rgba(170, 0, 0, 0.10);
      transform: rotate(-35deg); pointer-events: none; z-index: 10; letter-spacing: 8pt; }
  `;
  return html`${BASE_CSS}${pageRules}${watermarkRule}`;
}
