/** CTF coefficients of a construction by both methods, or the reason a polynomial form was rejected. */
import type { CheckResult } from "../results/types.ts";
import type { DynamicView } from "./dynamicData.ts";
import { formatSig } from "./format.ts";
import { html, type Trusted } from "./html.ts";

type CtfJson = NonNullable<DynamicView["ctf"]>;

/** Significant digits of printed CTF coefficients (Φ must be known closely for the recursion). */
export const CTF_DIGITS = 6;

/** Check ids that decide whether the root-method or the state-space CTF is accepted. */
const ACCEPTANCE_CHECKS = {
  root: ["ctf-resynthesis", "ctf-coefficient-bound", "ctf-identity"],
  stateSpace: [
    "ctf-state-space-resynthesis",
    "ctf-state-space-coefficient-bound",
    "ctf-state-space-identity",
  ],
} as const;

type Method = keyof typeof ACCEPTANCE_CHECKS;

function coefficientTable(ctf: CtfJson, caption: Trusted): Trusted {
  const rows = Math.max(ctf.X.length, ctf.Y.length, ctf.Z.length, ctf.Phi.length + 1);
  const cell = (v: number | undefined) =>
    html`<td class="num">${v === undefined ? "—" : formatSig(v, CTF_DIGITS)}</td>`;
  const body = Array.from(
    { length: rows },
    (_, n) =>
      html`<tr><td class="num">${String(n)}</td>${cell(ctf.X[n])}${cell(ctf.Y[n])}${cell(ctf.Z[n])}${
        cell(n === 0 ? undefined : ctf.Phi[n - 1])
      }</tr>`,
  );
  return html`
    <table class="ctf-table">
      <caption>${caption}</caption>
      <thead>
        <tr>
          <th>n</th>
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

function failedChecks(checks: readonly CheckResult[], subject: string, method: Method): Trusted {
  const ids: readonly string[] = ACCEPTANCE_CHECKS[method];
  const failed = checks.filter((c) => c.subject === subject && ids.includes(c.id) && !c.pass);
  if (failed.length === 0) {
    return html`<p class="fail">No failed acceptance check is recorded for it in results.json.</p>`;
  }
  return html`<ul class="rejection-checks">${
    failed.map((c) =>
      html`<li class="fail">FAIL: ${c.id} (${c.description}): value ${formatSig(c.value, 3)}, limit ${
        formatSig(c.limit, 3)
      }</li>`
    )
  }</ul>`;
}

function rejection(label: string, checks: readonly CheckResult[], subject: string, method: Method): Trusted {
  return html`
    <div class="ctf-rejected">
      <p><strong>${label}: polynomial CTF rejected.</strong> Its coefficients failed the acceptance checks below, so results.json holds <code>null</code> for it and the modal form (one first-order recursion per pole, <code>modal</code> in Appendix B) is to be used instead.</p>
      ${failedChecks(checks, subject, method)}
    </div>
  `;
}

function rootPart(view: DynamicView, checks: readonly CheckResult[], subject: string): Trusted {
  if (view.ctf === null) return rejection("Root method", checks, subject, "root");
  return coefficientTable(
    view.ctf,
    html`Root method (Stephenson &amp; Mitalas): ${String(view.ctf.Phi.length)} poles, air to air, Δ = ${
      formatSig(view.timestep_h, 3)
    } h.`,
  );
}

function stateSpacePart(view: DynamicView, checks: readonly CheckResult[], subject: string): Trusted {
  const ss = view.ctfStateSpace;
  if (ss === null) return rejection("State-space method", checks, subject, "stateSpace");
  const cells = ss.cellsPerLayer.map((n) => String(n)).join(", ");
  return coefficientTable(
    ss,
    html`State-space method (finite volumes, exact matrix exponential): ${
      String(ss.Phi.length)
    } poles; cells per layer, outside to inside: ${cells} (0 = resistive layer).`,
  );
}

/** Both CTF sets side by side, each replaced by its rejection note and failed checks when null. */
export function ctfSection(view: DynamicView, checks: readonly CheckResult[], subject: string): Trusted {
  const modal = view.ctf === null
    ? html`<p>Modal form: ${
      String(view.modal.ratios.length)
    } modes, q_t = RF₀ x_t + RF₁ x_(t−1) + Σ_n c_n q_n s_(n,t) with s_(n,t) = q_n s_(n,t−1) + x_(t−2); RF₀, RF₁, q_n = e^(−β_nΔ) and c_n are in Appendix B.</p>`
    : html``;
  return html`
    <p>Recurrence for the inside flux: q_i,t = Σ_n Y_n T_o,t−n − Σ_n Z_n T_i,t−n + Σ_(n≥1) Φ_n q_i,t−n (outside flux with X_n and Y_n in the same way). CTF sets are not unique: the two methods give different coefficients for the same response, so compare their response factors (check <code>state-space-agreement</code>), not the coefficients. Coefficients printed to ${String(
      CTF_DIGITS,
    )} significant figures; full precision in Appendix B.</p>
    <div class="side-by-side">${rootPart(view, checks, subject)}${stateSpacePart(view, checks, subject)}</div>
    ${modal}
  `;
}
