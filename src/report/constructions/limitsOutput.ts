/** The "Requirements" table of a construction (code limits with MET / NOT MET) and the cover's count. */
import type { LimitResult } from "../../results/limitResults.ts";
import type { ConstructionResults } from "../../results/types.ts";
import { type DisplayUnits, toDisplay, unitLabel } from "../page/displayUnits.ts";
import { formatSig, formatTrim } from "../page/format.ts";
import { html, type Trusted } from "../page/html.ts";
import type { PackageInput } from "../page/packageInput.ts";

const LABEL: Readonly<Record<LimitResult["limitKey"], string>> = {
  "max-u": "U (incl. ΔU corrections) ≤",
  "max-periodic-transmittance": "Periodic thermal transmittance |Y12| ≤",
  "min-time-lag": "Time lag ≥",
  "min-temperature-factor": "Temperature factor f_Rsi ≥",
};

/** The row label; f_Rsi names the moisture R_si it was computed with (results.json `temperatureFactorRsi`). */
function labelOf(l: LimitResult, results: ConstructionResults | undefined, d: DisplayUnits): string {
  if (l.limitKey !== "min-temperature-factor") return LABEL[l.limitKey];
  const rsi = results?.["temperatureFactorRsi"];
  if (typeof rsi !== "number") return LABEL[l.limitKey];
  return `Temperature factor f_Rsi (R_si = ${formatSig(toDisplay(d, "resistance", rsi), 3)} ${
    unitLabel(d, "resistance")
  }, ISO 13788) ≥`;
}

/** The limits of one construction in results.json (empty when none). */
export function limitsOf(results: ConstructionResults | undefined): readonly LimitResult[] {
  const l = results?.["limits"];
  return Array.isArray(l) ? l as LimitResult[] : [];
}

/** Formats a limit's value in the package's display units (results.json keeps W/(m²K) and h). */
function shown(v: number, unit: string, d: DisplayUnits): string {
  if (unit === "-") return formatSig(v, 3);
  if (unit === "W/(m²K)") {
    return `${formatTrim(toDisplay(d, "transmittance", v), 3)} ${unitLabel(d, "transmittance")}`;
  }
  return `${formatTrim(v, 3)} ${unit}`;
}

/** Renders the Requirements table of a construction in the display units `d`; nothing when it has no limits. */
export function renderLimitsOutput(results: ConstructionResults | undefined, d: DisplayUnits): Trusted {
  const withUnit = (v: number, unit: string) => shown(v, unit, d);
  const limits = limitsOf(results);
  if (limits.length === 0) return html``;
  const rows = limits.map((l) =>
    html`
      <tr class="${l.pass ? "pass" : "fail"}">
        <td>${labelOf(l, results, d)}</td>
        <td class="num">${l.value === null ? "not computed" : withUnit(l.value, l.unit)}</td>
        <td class="num">${withUnit(l.limit, l.unit)}</td>
        <td>${l.clause} <span class="muted">(${l.scope === "project"
          ? "project-wide"
          : "this construction"}, ${l.at})</span></td>
        <td class="result">${l.pass ? "MET" : "NOT MET"}</td>
      </tr>
    `
  );
  return html`
    <table class="requirements">
      <caption>Requirements: limits written in the input with their clause (compliance findings, not calculation checks).</caption>
      <thead>
        <tr>
          <th>Requirement</th>
          <th>Value</th>
          <th>Limit</th>
          <th>Clause</th>
          <th>Result</th>
        </tr>
      </thead>
      <tbody>${rows}</tbody>
    </table>
  `;
}

/** The cover line counting unmet limits; nothing when the project writes no limits. */
export function limitsCoverLine(input: PackageInput): Trusted {
  const all = Object.entries(input.results.constructions).flatMap(([id, r]) =>
    limitsOf(r).map((l) => ({ id, l }))
  );
  if (all.length === 0) return html``;
  const unmet = all.filter((x) => !x.l.pass);
  if (unmet.length === 0) {
    return html`<p class="check-summary limits-summary">Requirements: all ${
      String(all.length)
    } limits MET.</p>`;
  }
  return html`
    <div class="check-summary limits-summary has-failures">
      <p>Requirements: ${String(unmet.length)} of ${String(
        all.length,
      )} limits NOT MET (compliance findings; the calculation checks are separate).</p>
      <ul>${unmet.map((x) => html`<li>${x.l.limitKey} on ${x.id} (${x.l.clause})</li>`)}</ul>
    </div>
  `;
}
