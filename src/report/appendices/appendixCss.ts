/**
 * The appendices' own rules: the checks by subject and kind (Appendix C), and their compact print — the input
 * files in small monospace in two columns (Appendix A), the factor tables and plots of Appendix D set tight, three plots a row, and Appendix F's tables two a row.
 */
import { raw, type Trusted } from "../page/html.ts";

export const APPENDIX_CSS: Trusted = raw(`
table.method-checks td.num { white-space: normal; }
table.checks-by-kind { width: 100%; font-size: 8.5pt; break-inside: auto; }
table.checks-by-kind th, table.checks-by-kind td { padding: 0.3mm 1.2mm; }
table.checks-by-kind tr { break-inside: avoid; }
table.checks-by-kind tr.subject-start td { border-top: 1.5px solid var(--ink); }
table.checks-by-kind code { font-size: 7.5pt; }
@media print {
  #s-a h3 { font-size: 10pt; margin: 2.5mm 0 0; }
  #s-a h3 + p.muted { margin: 0 0 0.5mm; font-size: 7.5pt; }
  #s-a .printed-input > p.muted { display: none; }
  #s-a pre.printed-file, #s-a pre.embedded-library {
    font-size: 6.4pt; line-height: 1.15; padding: 0.8mm 1.2mm; margin: 0 0 1mm;
    white-space: pre-wrap; overflow-wrap: anywhere; break-inside: auto; }
  #s-a pre.printed-file, #s-a .library-entries {
    column-count: 2; column-gap: 4mm; column-rule: 0.5pt solid #bbb; }
  #s-a .library-entries pre.embedded-library { break-inside: avoid; }
  #s-a .block-as-written { display: none; }
  #s-c table.method-checks { font-size: 7.5pt; }
  #s-c table.method-checks th, #s-c table.method-checks td { padding: 0.2mm 1.2mm; line-height: 1.2; }
  #s-c table.method-checks th:nth-child(1) { width: 30%; }
  #s-c table.method-checks th:nth-child(3) { width: 16%; }
  #s-c table.checks-by-kind { font-size: 7.5pt; }
  #s-c table.checks-by-kind th, #s-c table.checks-by-kind td { padding: 0 1.2mm; line-height: 1.15; }
  #s-c table code { font-size: 7pt; }
  #s-d h3 { margin-top: 4mm; font-size: 11pt; }
  #s-d h4 { font-size: 9.5pt; margin: 1.5mm 0 0.5mm; clear: both; }
  #s-d table.rf-table { float: left; margin-right: 3mm; }
  #s-d table { font-size: 7.5pt; margin: 0.5mm 0; }
  #s-d th, #s-d td { padding: 0 1.5mm; line-height: 1.2; }
  #s-d caption, #s-d figcaption, #s-d p.muted, #s-d p.factor-pointer, #s-d .ctf-method-note {
    font-size: 7pt; line-height: 1.25; }
  #s-d p { margin: 0.5mm 0; font-size: 8pt; line-height: 1.3; }
  #s-f h3 { font-size: 10.5pt; margin: 3mm 0 1mm; break-after: avoid; }
  #s-f .table-pair { display: grid; grid-template-columns: minmax(0, 1fr) minmax(0, 1fr); column-gap: 4mm;
    align-items: start; }
  #s-f .table-pair > div { min-width: 0; }
  #s-f table { font-size: 7.5pt; width: 100%; margin: 0 0 0.5mm; }
  #s-f caption { font-size: 7.5pt; }
  #s-f th, #s-f td { padding: 0.2mm 1mm; line-height: 1.2; overflow-wrap: break-word; }
  #s-f p.muted { font-size: 7pt; line-height: 1.25; margin: 0 0 1mm; }
  #s-a .hash, #s-c .hash, #s-d .hash { font-size: 7pt; }
  #s-d figure.plot-figure { float: left; width: 49%; margin: 0.5mm 0.5% 0.5mm 0; break-inside: avoid; }
  #s-d figure.plot-figure figcaption { font-size: 6.5pt; line-height: 1.2; }
  #s-d figure.plot-figure + p.factor-pointer { clear: both; margin: 0.5mm 0 1mm; }
  #s-d h3 { clear: both; }
}
`);
