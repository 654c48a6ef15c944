/** The room output's styles, added to the package's stylesheet only when the project has a room. */
import { raw, type Trusted } from "../page/html.ts";

export const ROOM_CSS: Trusted = raw(`
.room-output { margin-top: 4mm; }
.room-output h4 { font-size: 11pt; margin: 4mm 0 1mm; }
.room-output h5 { font-size: 10pt; margin: 4mm 0 1mm; border-top: 1px solid var(--rule); padding-top: 2mm; }
.room-pair { display: flex; flex-wrap: wrap; gap: 0 4mm; align-items: flex-start; }
.room-pair > table { margin-top: 1mm; }
.room-series > figure { flex: 1 1 60mm; min-width: 60mm; margin-top: 1mm; }
.room-load > figure { flex: 1 1 100mm; min-width: 90mm; }
table.room-heat-loss th[scope="rowgroup"] { font-weight: 600; }
table.room-rts td.j { color: var(--muted); }
table.room-rts td, table.room-rts th { padding: 0 1.2mm; }
tr.subtotal td { font-style: italic; }
tr.total-row th, tr.total-row td { font-weight: bold; border-top: 2px solid var(--ink); }
td.room-quantities { font-size: 7.5pt; }
table.room-checks code { font-size: 7.5pt; }
.room-notes { font-size: 8pt; }
.room-conditions { font-size: 9pt; }
@media print {
  .room-output h5 { margin-top: 2.5mm; }
  .room-series > figure svg, .room-load > figure svg { max-width: none; }
  .room-notes { font-size: 7.5pt; }
  .room-notes li { margin: 0; }
  table.room-hourly { font-size: 7pt; }
}
`);
