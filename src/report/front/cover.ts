/** The cover: identity, status, sign-off, input hash, tool version and the summary of checks. */
import type { ProjectStatus } from "../../project/model.ts";
import { html, type Trusted } from "../page/html.ts";
import { findingCountsText } from "../page/findingCounts.ts";
import { quotedNumbers } from "../page/quotedText.ts";
import { displayUnitsFor } from "../page/displayUnits.ts";
import type { PackageInput } from "../page/packageInput.ts";
import { limitsCoverLine } from "../constructions/limitsOutput.ts";

/** Printed status word of each project status. */
export const STATUS_LABEL: Readonly<Record<ProjectStatus, string>> = {
  "draft": "DRAFT",
  "for-review": "DRAFT FOR REVIEW",
  "issued": "ISSUED",
};

/** The watermark text for a status; undefined once the package is issued. */
export function watermarkFor(status: ProjectStatus): string | undefined {
  return status === "issued" ? undefined : "DRAFT";
}

function statusBanner(status: ProjectStatus): Trusted {
  switch (status) {
    case "draft":
      return html`
        <p
          class="status-banner">DRAFT: work in progress, not checked and not issued. Do not rely on these results.</p>
      `;
    case "for-review":
      return html`
        <p
          class="status-banner">DRAFT FOR REVIEW: submitted for checking, not issued. Do not rely on these results until issued.</p>
      `;
    case "issued":
      return html`<p class="status-banner issued">Issued at the revision and date shown.</p>`;
  }
}

/** One line stating whether all automated checks passed; failures are named. */
export function checkSummary(input: PackageInput): Trusted {
  const checks = input.results.checks;
  const failed = checks.filter((c) => !c.pass);
  if (checks.length === 0) {
    return html`<p class="check-summary">Automated checks: none apply yet (see the checks and findings).</p>`;
  }
  const notes = input.results.methodNotes?.length ?? 0;
  const noteLine = notes === 0 ? "" : ` Method notes: ${notes} (a numerical form chosen, not a failure).`;
  if (failed.length === 0) {
    const all = String(checks.length);
    return html`<p class="check-summary">Automated checks: all ${all} passed (see checks and findings).${noteLine}</p>`;
  }
  const names = failed.map((c) => html`<li>${c.id} on ${c.subject}</li>`);
  return html`
    <div class="check-summary has-failures">
      <p>Automated checks: ${String(failed.length)} of ${String(
        checks.length,
      )} FAILED (see the checks and findings).${noteLine}</p>
      <ul>${names}</ul>
    </div>
  `;
}

function findingSummary(input: PackageInput): Trusted {
  return html`<p class="check-summary">Review findings: ${
    findingCountsText(input.findings)
  }; see the checks and findings.</p>`;
}

/**
 * A sign-off row. Checking and approval are "pending" until the package is issued (the name shows who is to
 * sign); once issued, each role carries its own date (the package date when the role gives none).
 */
function signOffRow(
  role: string,
  name: string | undefined,
  signed: { date: string } | "pending" | "undated",
): Trusted {
  const who = name === undefined || name === "" ? "(not given)" : name;
  const when = signed === "undated" ? html`` : signed === "pending"
    ? html`
      <span class="role-pending">— pending</span>
    `
    : html`
      <span class="role-date">— ${signed.date}</span>
    `;
  return html`
    <tr>
      <th scope="row">${role}</th>
      <td>${who}${name === undefined || name === "" ? html`` : when}</td>
    </tr>
  `;
}

function optionalRow(label: string, value: string | undefined): Trusted {
  return value === undefined ? html`` : html`
    <tr>
      <th scope="row">${label}</th>
      <td>${value}</td>
    </tr>
  `;
}

/** The open items accepted for issue, each with its reason and name; nothing when none are. */
function acknowledgedItems(input: PackageInput): Trusted {
  const acknowledged = (input.results.summary?.openItems ?? []).filter((i) => i.acknowledged !== null);
  if (acknowledged.length === 0) return html``;
  const items = acknowledged.map((i) =>
    html`<li><code>${i.id}</code>: ${
      quotedNumbers(i.text, displayUnitsFor(input.model.info.units))
    } — acknowledged by ${i.acknowledged?.by ?? ""}: ${i.acknowledged?.reason ?? ""}</li>`
  );
  return html`
    <div class="check-summary acknowledged-items">
      <p>Open items acknowledged for issue: ${String(acknowledged.length)} (see the summary of results).</p>
      <ul>${items}</ul>
    </div>
  `;
}

/** Renders the cover page. */
export function renderCover(input: PackageInput): Trusted {
  const info = input.model.info;
  const issued = info.status === "issued";
  const independence = info.preparedBy !== "" && info.preparedBy === info.checkedBy
    ? html`<p class="fail">The checker is the same person as the preparer: the check is not independent.</p>`
    : html``;
  return html`<section class="cover" aria-label="Cover">
<p class="muted">Calculation package</p>
<h1>${info.title}</h1>
${statusBanner(info.status)}
<table>
${optionalRow("Client", info.client)}
${optionalRow("Project", info.project)}
<tr><th scope="row">Reference</th><td>${info.reference}</td></tr>
<tr><th scope="row">Revision</th><td>${info.revision}</td></tr>
<tr><th scope="row">Status</th><td>${STATUS_LABEL[info.status]}</td></tr>
<tr><th scope="row">Date</th><td>${info.date}</td></tr>
${signOffRow("Prepared by", info.preparedBy, "undated")}
${signOffRow("Checked by", info.checkedBy, issued ? { date: info.checkedDate ?? info.date } : "pending")}
${signOffRow("Approved by", info.approvedBy, issued ? { date: info.approvedDate ?? info.date } : "pending")}
<tr><th scope="row">Input SHA-256</th><td class="hash">${input.results.inputs.sha256}</td></tr>
<tr><th scope="row">Tool</th><td>fluxnote ${input.toolVersion}</td></tr>
</table>
${independence}
${checkSummary(input)}${limitsCoverLine(input)}
${findingSummary(input)}
${acknowledgedItems(input)}
</section>`;
}
