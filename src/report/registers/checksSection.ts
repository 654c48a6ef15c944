/** Section 4: the automated checks with value, limit and result, then the review findings. */
import { formatPosition } from "../../project/position.ts";
import { sortDiagnostics } from "../../project/diagnostic.ts";
import { formatSig } from "../page/format.ts";
import { html, type Trusted } from "../page/html.ts";
import { findingCountsText, FOLDED_RULE } from "../page/findingCounts.ts";
import { quotedNumbers } from "../page/quotedText.ts";
import type { RenderContext } from "../page/packageInput.ts";
import type { CheckResult } from "../../results/types.ts";
import { acknowledgementFor } from "../../project/acknowledgedFindings.ts";

/** The fragment id of a check's subject (its construction or scenario output), if it is in the package. */
export function subjectAnchor(subject: string, ctx: RenderContext): string | undefined {
  if (subject.startsWith("construction:")) {
    return ctx.constructionAnchors.get(subject.slice("construction:".length));
  }
  if (!subject.startsWith("scenario:")) return undefined;
  const rest = subject.slice("scenario:".length);
  const scenario = ctx.input.model.scenarios.find((s) => rest === s.id || rest.startsWith(`${s.id}/`));
  return scenario === undefined ? undefined : ctx.scenarioAnchors.get(scenario.id);
}

function subjectCell(subject: string, ctx: RenderContext): Trusted {
  const anchor = subjectAnchor(subject, ctx);
  return anchor === undefined
    ? html`<td>${subject}</td>`
    : html`<td><a href="#${anchor}">${subject}</a></td>`;
}

/** Tables every numerical check (Appendix C), or says none applies. */
export function allChecksTable(ctx: RenderContext): Trusted {
  return checksTable(ctx, ctx.input.results.checks);
}

/** Tables the given checks in full: id, subject, description, value, limit and result. */
export function checksTable(ctx: RenderContext, checks: readonly CheckResult[]): Trusted {
  if (checks.length === 0) return html`<p>No automated checks apply yet.</p>`;
  const rows = checks.map((c) =>
    html`<tr><td>${c.id}</td>${subjectCell(c.subject, ctx)}<td>${
      quotedNumbers(c.description, ctx.display)
    }</td><td class="num">${formatSig(c.value, 3)}</td><td class="num">${
      formatSig(c.limit, 3)
    }</td><td class="${c.pass ? "pass" : "fail"}">${c.pass ? "PASS" : "FAIL"}</td></tr>`
  );
  return html`
    <table class="checks-list">
      <thead>
        <tr>
          <th>Check</th>
          <th>Subject</th>
          <th>Description</th>
          <th>Value</th>
          <th>Limit</th>
          <th>Result</th>
        </tr>
      </thead>
      <tbody>${rows}</tbody>
    </table>
    <p class="muted">A check passes when |value| ≤ limit.</p>
  `;
}

function checksSummary(ctx: RenderContext): Trusted {
  const checks = ctx.input.results.checks;
  if (checks.length === 0) return html`<p>No automated checks apply yet.</p>`;
  const failed = checks.filter((c) => !c.pass);
  const line = html`
    <p
      class="${failed.length === 0 ? "pass" : ""}">${String(checks.length - failed.length)} of ${String(
        checks.length,
      )} numerical checks passed; every check with its value and limit is in <a href="#s-c">Appendix C</a>.</p>
  `;
  return failed.length === 0 ? line : html`${line}<p>The failed checks:</p>${checksTable(ctx, failed)}`;
}

function methodNotesTable(ctx: RenderContext): Trusted {
  const notes = ctx.input.results.methodNotes ?? [];
  if (notes.length === 0) return html``;
  const rows = notes.map((n) =>
    html`<tr><td>${n.id}</td>${subjectCell(n.subject, ctx)}<td>${
      quotedNumbers(n.text, ctx.display)
    }</td><td class="note">NOTE</td></tr>`
  );
  return html`
    <p>Method notes: choices of numerical form, not checks. A polynomial CTF that is not published is replaced by the modal form, which every computed flux uses; its acceptance figures are in results.json <code>methodNotes</code> and, for the air-to-air CTFs, with the construction.</p>
    <table class="method-notes">
      <thead>
        <tr>
          <th>Note</th>
          <th>Subject</th>
          <th>Choice and reason</th>
          <th>Result</th>
        </tr>
      </thead>
      <tbody>${rows}</tbody>
    </table>
  `;
}

function findingsTable(ctx: RenderContext): Trusted {
  const all = sortDiagnostics(ctx.input.findings);
  const findings = all.filter((f) => f.rule !== FOLDED_RULE);
  const foldedCount = all.length - findings.length;
  const counts = html`<p class="finding-counts">Review findings: ${findingCountsText(all)}.</p>`;
  const folded = foldedCount === 0 ? counts : html`
    ${counts}
        <p
      class="muted">The "Default in use" notes (rule <code>${FOLDED_RULE}</code>) are rows of the <a href="#s-5">assumptions register</a>, one row per default with the lines it applies to.</p>
  `;
  if (findings.length === 0) {
    return html`${folded}${foldedCount === 0 ? html`<p>No findings were raised on the inputs.</p>` : html``}`;
  }
  const acks = ctx.input.model.info.acknowledged ?? [];
  const rows = findings.map((f) => {
    const ack = acknowledgementFor(f, acks);
    return html`
      <tr>
        <td class="${f.severity === "error" ? "finding-error" : ""}">${f.severity}</td>
        <td><code>${formatPosition(f.at)}</code></td>
        <td>${f.rule}</td>
        <td>${f.message}${ack === undefined
          ? html``
          : html`<br><span class="muted">acknowledged by ${ack.by}: ${ack.reason}</span>`}</td>
        <td>${f.hint ?? ""}</td>
      </tr>
    `;
  });
  return html`
    <table class="checks-list">
      <thead>
        <tr>
          <th>Severity</th>
          <th>At</th>
          <th>Rule</th>
          <th>Message</th>
          <th>Hint</th>
        </tr>
      </thead>
      <tbody>${rows}</tbody>
    </table>
    ${folded}
  `;
}

/** Renders the checks and findings. */
export function renderChecksSection(ctx: RenderContext): Trusted {
  return html`<section id="s-4"><h2>Checks and findings</h2>
<h3 id="s-4-1">Automated checks</h3>
${checksSummary(ctx)}
${methodNotesTable(ctx)}
<h3 id="s-4-2">Review findings on the inputs</h3>
${findingsTable(ctx)}
</section>`;
}
