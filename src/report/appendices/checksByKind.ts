/**
 * Appendix C's printed form of the numerical checks: per subject (a construction or a scenario surface) one
 * row per check kind with how many ran, the worst |value| / limit and the verdict. Every single check stays in
 * the HTML (on screen) and in results.json `checks[]`; failures are always listed in full.
 */
import type { CheckResult } from "../../results/types.ts";
import { formatSig } from "../page/format.ts";
import { html, type Trusted } from "../page/html.ts";

/** The checks of one kind on one subject. */
export interface CheckKindRow {
  readonly subject: string;
  readonly id: string;
  readonly count: number;
  readonly failed: number;
  /** Largest |value| / limit over the kind's checks (≤ 1 passes); NaN when a value is not a number. */
  readonly worstRatio: number;
}

/** |value| / limit; a zero limit gives 0 for a zero value and Infinity otherwise. */
export function checkRatio(check: CheckResult): number {
  const size = Math.abs(check.value);
  if (check.limit === 0) return size === 0 ? 0 : Infinity;
  return size / Math.abs(check.limit);
}

/** Groups checks by subject and kind, both in the order they first appear in results.json. */
export function checkKindRows(checks: readonly CheckResult[]): CheckKindRow[] {
  const rows = new Map<
    string,
    { subject: string; id: string; count: number; failed: number; worst: number }
  >();
  for (const c of checks) {
    const key = `${c.subject}\u0000${c.id}`;
    const row = rows.get(key) ?? { subject: c.subject, id: c.id, count: 0, failed: 0, worst: 0 };
    row.count++;
    if (!c.pass) row.failed++;
    const ratio = checkRatio(c);
    row.worst = Number.isNaN(ratio) || Number.isNaN(row.worst) ? NaN : Math.max(row.worst, ratio);
    rows.set(key, row);
  }
  // Subject → first-appearance rank, looked up once per row (not searched per check: O(checks), not O(checks²)).
  const order = new Map<string, number>();
  for (const c of checks) if (!order.has(c.subject)) order.set(c.subject, order.size);
  return [...rows.values()]
    .sort((a, b) => order.get(a.subject)! - order.get(b.subject)!)
    .map((r) => ({ subject: r.subject, id: r.id, count: r.count, failed: r.failed, worstRatio: r.worst }));
}

function ratioText(ratio: number): string {
  return Number.isFinite(ratio) ? formatSig(ratio, 2) : Number.isNaN(ratio) ? "not a number" : "∞";
}

/** The compact table: one row per subject and check kind, the subject named on its first row. */
export function checksByKindTable(
  checks: readonly CheckResult[],
  subjectLink: (subject: string) => string | undefined,
): Trusted {
  if (checks.length === 0) return html`<p>No automated checks apply yet.</p>`;
  const rows = checkKindRows(checks);
  const body = rows.map((r, i) => {
    const first = i === 0 || rows[i - 1]?.subject !== r.subject;
    const anchor = first ? subjectLink(r.subject) : undefined;
    const subject = !first
      ? html`<td></td>`
      : anchor === undefined
      ? html`<td>${r.subject}</td>`
      : html`<td><a href="#${anchor}">${r.subject}</a></td>`;
    const verdict = r.failed === 0 ? "PASS" : `FAIL (${String(r.failed)} of ${String(r.count)})`;
    return html`<tr class="${first ? "subject-start" : ""}">${subject}<td><code>${r.id}</code></td><td
        class="num">${String(r.count)}</td><td class="num">${ratioText(r.worstRatio)}</td><td class="${
      r.failed ===
          0
        ? "pass"
        : "fail"
    }">${verdict}</td></tr>`;
  });
  return html`
    <table class="checks-by-kind">
      <thead>
        <tr>
          <th>Subject</th>
          <th>Check</th>
          <th>Count</th>
          <th>Worst |value| / limit</th>
          <th>Result</th>
        </tr>
      </thead>
      <tbody>${body}</tbody>
    </table>
  `;
}
