/** CTF coefficients of a construction by both methods, or the reason a polynomial form was rejected. */
import type { MethodNoteResult } from "../../results/types.ts";
import type { DynamicView } from "./dynamicData.ts";
import { type DisplayUnits, toDisplay, unitLabel } from "../page/displayUnits.ts";
import { formatSig, formatTrim } from "../page/format.ts";
import { html, joinHtml, raw, type Trusted } from "../page/html.ts";
import { quotedNumbers } from "../page/quotedText.ts";

type CtfJson = NonNullable<DynamicView["ctf"]>;

/** Significant digits of printed CTF coefficients (Φ must be known closely for the recursion). */
export const CTF_DIGITS = 6;

/** Method-note ids (results.json `methodNotes`) that record why a method's polynomial CTF is not published. */
const MODAL_FORM_NOTES = { root: "ctf-modal-form", stateSpace: "ctf-state-space-modal-form" } as const;

type Method = keyof typeof MODAL_FORM_NOTES;

interface MethodCtf {
  readonly label: string;
  readonly ctf: CtfJson;
}

function coefficientRow(
  n: number,
  method: MethodCtf,
  first: boolean,
  methods: number,
  d: DisplayUnits,
): Trusted {
  const { ctf } = method;
  const cell = (v: number | undefined) =>
    html`<td class="num">${v === undefined ? "—" : formatSig(v, CTF_DIGITS)}</td>`;
  const scaled = (v: number | undefined) => v === undefined ? undefined : toDisplay(d, "transmittance", v);
  const index = first ? html`<td class="num" rowspan="${String(methods)}">${String(n)}</td>` : html``;
  return html`<tr class="${first ? "group-start" : "second-method"}">${index}<td>${method.label}</td>${
    cell(scaled(ctf.X[n]))
  }${cell(scaled(ctf.Y[n]))}${cell(scaled(ctf.Z[n]))}${cell(n === 0 ? undefined : ctf.Phi[n - 1])}</tr>`;
}

/** One table with the accepted methods' coefficients on alternate rows, so each n reads side by side. */
function coefficientTable(methods: readonly MethodCtf[], caption: Trusted, d: DisplayUnits): Trusted {
  const rows = Math.max(
    ...methods.map(({ ctf }) => Math.max(ctf.X.length, ctf.Y.length, ctf.Z.length, ctf.Phi.length + 1)),
  );
  const body = Array.from(
    { length: rows },
    (_, n) => methods.map((m, k) => coefficientRow(n, m, k === 0, methods.length, d)),
  ).flat();
  return html`
    <table class="ctf-table">
      <caption>${caption}</caption>
      <thead>
        <tr>
          <th>n</th>
          <th>Method</th>
          <th>X_n</th>
          <th>Y_n</th>
          <th>Z_n</th>
          <th>Φ_n</th>
        </tr>
      </thead>
      <tbody>${body}</tbody>
    </table>
  `;
}

function noteFigures(notes: readonly MethodNoteResult[], subject: string, method: Method): Trusted {
  const note = notes.find((n) => n.subject === subject && n.id === MODAL_FORM_NOTES[method]);
  if (note === undefined) {
    return html`<p class="fail">No method note is recorded for it in results.json.</p>`;
  }
  return html`
    <p>${quotedNumbers(note.text)}.</p>
    <ul class="rejection-figures">${note.figures.map((f) =>
      html`<li>${f.id} (${quotedNumbers(f.description)}): value ${formatSig(f.value, 3)}, limit ${
        formatSig(f.limit, 3)
      }${Math.abs(f.value) <= f.limit ? "" : " (over)"}</li>`
    )}</ul>
  `;
}

function modalFormNote(
  label: string,
  notes: readonly MethodNoteResult[],
  subject: string,
  method: Method,
): Trusted {
  return html`
    <div class="ctf-method-note">
      <p><strong>${label}: method choice, modal form used.</strong> The polynomial CTF of this method is not published (results.json holds <code>null</code> for it); the modal form (one first-order recursion per pole, <code>modal</code> in Appendix B) gives the same response factors and is what every computed flux uses. This is a choice of numerical form, not a failed check.</p>
      ${noteFigures(notes, subject, method)}
    </div>
  `;
}

function rootCaption(ctf: CtfJson): Trusted {
  return html`Roots: method of Stephenson &amp; Mitalas (1971), ${String(ctf.Phi.length)} poles.`;
}

function stateSpaceCaption(ctf: CtfJson & { readonly cellsPerLayer: readonly number[] }): Trusted {
  const cells = ctf.cellsPerLayer.map((n) => String(n)).join(", ");
  return html`State space: finite volumes with exact matrix exponential, ${
    String(ctf.Phi.length)
  } poles; cells per layer, outside to inside: ${cells} (0 = resistive layer).`;
}

/** In IP only, the units of the coefficients (the SI caption has always left them to the conventions). */
function coefficientUnits(d: DisplayUnits): string {
  return d.system === "SI"
    ? ""
    : ` X_n, Y_n and Z_n in ${unitLabel(d, "transmittance")} (converted like U); Φ_n has no unit.`;
}

function coefficients(view: DynamicView, d: DisplayUnits): Trusted {
  const methods: MethodCtf[] = [];
  const captions: Trusted[] = [];
  if (view.ctf !== null) {
    methods.push({ label: "roots", ctf: view.ctf });
    captions.push(rootCaption(view.ctf));
  }
  if (view.ctfStateSpace !== null) {
    methods.push({ label: "state space", ctf: view.ctfStateSpace });
    captions.push(stateSpaceCaption(view.ctfStateSpace));
  }
  if (methods.length === 0) return html``;
  return coefficientTable(
    methods,
    html`CTF coefficients, air to air, Δ = ${formatTrim(view.timestep_h, 4)} h. ${
      joinHtml(captions, raw(" "))
    }${coefficientUnits(d)}`,
    d,
  );
}

/**
 * Both CTF sets side by side (X, Y, Z in the display unit of U, Φ without unit), each replaced by its method note
 * (modal form used, with the acceptance figures) when null.
 */
export function ctfSection(
  view: DynamicView,
  notes: readonly MethodNoteResult[],
  subject: string,
  d: DisplayUnits,
): Trusted {
  const modal = view.ctf === null
    ? html`<p>Modal form: ${
      String(view.modal.ratios.length)
    } modes, q_t = RF₀ x_t + RF₁ x_(t−1) + Σ_n c_n q_n s_(n,t) with s_(n,t) = q_n s_(n,t−1) + x_(t−2); RF₀, RF₁, q_n = e^(−β_nΔ) and c_n are in Appendix B.</p>`
    : html``;
  return html`
    <p>Recurrence for the inside flux: q_i,t = Σ_n Y_n T_o,t−n − Σ_n Z_n T_i,t−n + Σ_(n≥1) Φ_n q_i,t−n (outside flux with X_n and Y_n in the same way). CTF sets are not unique: the two methods give different coefficients for the same response, so compare their response factors (check <code>state-space-agreement</code>), not the coefficients. Coefficients printed to ${String(
      CTF_DIGITS,
    )} significant figures; full precision in Appendix B.</p>
    ${coefficients(view, d)}
    ${view.ctf === null ? modalFormNote("Root method", notes, subject, "root") : html``}
    ${view.ctfStateSpace === null
      ? modalFormNote("State-space method", notes, subject, "stateSpace")
      : html``}
    ${modal}
  `;
}
