/** The list of automated checks for the calculation methods section: what each verifies, with its limit from results.json. */
import type { CheckResult } from "../../results/types.ts";
import { formatSig } from "../page/format.ts";
import { html, type Trusted } from "../page/html.ts";
import { quotedNumbers } from "../page/quotedText.ts";

/** Plain statement of what each known check verifies, in the order the engine runs them. */
const CHECK_MEANING: readonly (readonly [id: string, meaning: string])[] = [
  ["sum-rule-X", "Sum rule of the outside response factors: |Σ X_j − U| / U (3.4)."],
  ["sum-rule-Y", "Sum rule of the cross response factors: |Σ Y_j − U| / U (3.4)."],
  ["sum-rule-Z", "Sum rule of the inside response factors: |Σ Z_j − U| / U (3.4)."],
  [
    "root-count",
    "Poles found minus the exact oscillation count, plus intervals where two poles could not be separated (3.3).",
  ],
  [
    "ctf-identity",
    "Steady-state identity of the root CTF: max |Σ CTF / (1 − Σ Φ) − U| / U over X, Y, Z; limit max(10⁻⁶, its roundoff bound) (3.5).",
  ],
  ["ctf-resynthesis", "Long division of the root CTF against the response factors, max error / U (3.5)."],
  [
    "ctf-coefficient-bound",
    "Largest |coefficient| of the root CTF; larger values mean loss of significance (3.5).",
  ],
  ["transmission-determinant", "det M = 1 of the transmission matrix at sampled s, both conventions (3.2)."],
  [
    "iso13786-harmonic-amplitude",
    "Amplitude of H_1 against Y_12 · sinc²(π/24) with aliases, relative (3.9).",
  ],
  ["iso13786-harmonic-phase", "Phase of H_1 against arg Y_12, in hours (3.9)."],
  [
    "periodic-fold",
    "Closed-form periodic factors against the folded hourly response factors, max / U (3.7).",
  ],
  [
    "state-space-agreement",
    "State-space response factors against those of the root method, max / max(U, largest |RF| of the series) (3.6).",
  ],
  [
    "state-space-reciprocity",
    "Cross responses of the state-space model in the two directions agree, max / U (3.6).",
  ],
  [
    "ctf-state-space-resynthesis",
    "Long division of the state-space CTF against its response factors, max error / U (3.6).",
  ],
  ["ctf-state-space-coefficient-bound", "Largest |coefficient| of the state-space CTF (3.6)."],
  ["ctf-state-space-identity", "Steady-state identity of the state-space CTF (3.6)."],
];

const SURFACE_SUFFIX = "-surface";

function meaningOf(id: string): string | undefined {
  const base = id.endsWith(SURFACE_SUFFIX) ? id.slice(0, -SURFACE_SUFFIX.length) : id;
  const found = CHECK_MEANING.find(([known]) => known === base)?.[1];
  if (found === undefined || base === id) return found;
  return `${found} Surface to surface.`;
}

function limitsOf(checks: readonly CheckResult[], id: string): string {
  const limits: number[] = [];
  for (const c of checks) if (c.id === id && !limits.includes(c.limit)) limits.push(c.limit);
  if (limits.length === 0) return "not run";
  if (limits.length <= 2) return limits.map((l) => formatSig(l, 3)).join(", ");
  // A limit set per series (e.g. a roundoff bound): its range, each value is with its check in C.4.
  const low = Math.min(...limits);
  const high = Math.max(...limits);
  return `${formatSig(low, 3)} to ${formatSig(high, 3)} (${String(limits.length)} values)`;
}

/** One row per check id: what it verifies and its limit as recorded in results.json (|value| ≤ limit passes). */
export function methodChecksTable(checks: readonly CheckResult[]): Trusted {
  const ids: string[] = [];
  for (const [id] of CHECK_MEANING) ids.push(id);
  for (const c of checks) if (!ids.includes(c.id)) ids.push(c.id);
  const rows = ids.map((id) => {
    const meaning = meaningOf(id);
    const own = quotedNumbers(checks.find((c) => c.id === id)?.description ?? "");
    return html`
      <tr>
        <td><code>${id}</code></td>
        <td>${meaning ?? own}</td>
        <td class="num">${limitsOf(checks, id)}</td>
      </tr>
    `;
  });
  return html`
    <p>Every construction is checked as below; a check passes when |value| ≤ limit. The limits are those recorded in results.json for this project; each construction's output states how many passed, failures are shown there beside the number and in the checks and findings, the results per subject and kind are in Appendix C.2, failures in full in C.3, and every single value in C.4. Checks whose id ends in <code>-surface</code> repeat the root-method checks surface to surface.</p>
    <table class="method-checks checks-list">
      <thead>
        <tr>
          <th>Check</th>
          <th>What it verifies</th>
          <th>Limit</th>
        </tr>
      </thead>
      <tbody>${rows}</tbody>
    </table>
  `;
}
