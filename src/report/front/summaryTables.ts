/** The tables of the "Summary of results": constructions and scenarios, in the package's display units. */
import type { ConstructionSummary, PeakSummary, ScenarioSummary } from "../../results/summaryTypes.ts";
import { type DisplayUnits, type QuantityKind, toDisplay, unitLabel } from "../page/displayUnits.ts";
import { formatFixed, formatSig, withUnit } from "../page/format.ts";
import { html, type Trusted } from "../page/html.ts";

function quantity(d: DisplayUnits, kind: QuantityKind, si: number | null, digits = 3): string {
  return si === null ? "—" : withUnit(formatSig(toDisplay(d, kind, si), digits), unitLabel(d, kind));
}

/** `hh:mm` of a time in hours after midnight (wrapped into the day). */
export function clockTime(hours: number): string {
  const minutes = Math.round((((hours % 24) + 24) % 24) * 60) % 1440;
  return `${String(Math.floor(minutes / 60)).padStart(2, "0")}:${String(minutes % 60).padStart(2, "0")}`;
}

function peak(d: DisplayUnits, p: PeakSummary | null): Trusted {
  if (p === null) return html`—`;
  return html`${quantity(d, "heatGain", p.value, 3)} <span class="muted">at ${
    p.time ?? clockTime(p.time_h)
  }</span>`;
}

function limitCell(c: ConstructionSummary, d: DisplayUnits): Trusted {
  if (c.limits.length === 0) return html`<span class="muted">none written</span>`;
  return html`${
    c.limits.map((l) =>
      html`<span class="${l.pass ? "pass" : "fail"}">${l.limitKey} ${
        l.unit === "W/(m²K)"
          ? quantity(d, "transmittance", l.limit, 3)
          : withUnit(formatSig(l.limit, 3), l.unit)
      }: ${l.pass ? "MET" : "NOT MET"}</span><br>`
    )
  }`;
}

/** One row per construction: U, U with corrections, limit verdicts, f, time lag, κ₁, f_Rsi with its R_si. */
export function constructionsTable(rows: readonly ConstructionSummary[], d: DisplayUnits): Trusted {
  if (rows.length === 0) return html`<p class="muted">No constructions.</p>`;
  const body = rows.map((c) =>
    html`
      <tr>
        <td>${c.id}<br><span class="muted">${c.name}</span></td>
        <td class="num">${quantity(d, "transmittance", c.U, 3)}</td>
        <td class="num">${quantity(d, "transmittance", c.correctedU, 3)}</td>
        <td>${limitCell(c, d)}</td>
        <td class="num">${c.decrementFactor === null ? "—" : formatFixed(c.decrementFactor, 3)}</td>
        <td class="num">${c.timeLag_h === null ? "—" : withUnit(formatFixed(c.timeLag_h, 1), "h")}</td>
        <td class="num">${quantity(d, "arealHeatCapacity", c.kappa1, 3)}</td>
        <td class="num">${c.fRsi === null ? "—" : formatFixed(c.fRsi, 3)}${c.fRsiSurfaceResistance === null
          ? ""
          : html`<br><span class="muted">R_si ${
            quantity(d, "resistance", c.fRsiSurfaceResistance, 2)
          }</span>`}</td>
      </tr>
    `
  );
  return html`
    <table class="compact summary-constructions">
      <caption>Constructions: values from each construction's output and results.json.</caption>
      <thead>
        <tr>
          <th>Construction</th>
          <th>U</th>
          <th>U with corrections</th>
          <th>Limits</th>
          <th>Decrement factor f</th>
          <th>Time lag</th>
          <th>κ₁</th>
          <th>f_Rsi</th>
        </tr>
      </thead>
      <tbody>${body}</tbody>
    </table>
  `;
}

function surfaceVerdicts(s: ScenarioSummary): Trusted {
  if (s.surfaces.length === 0) return html`—`;
  return html`${
    s.surfaces.map((v) =>
      html`
        ${v.surface} (${v.construction}): condensation <span class="${v.condensation.pass
          ? "pass"
          : "fail"}">${v.condensation.pass ? "OK" : "RISK"}</span>, mould <span
          class="${v.mould.pass ? "pass" : "fail"}">${v.mould.pass ? "OK" : "RISK"}</span><br>
      `
    )
  }`;
}

function energy(d: DisplayUnits, s: ScenarioSummary): Trusted {
  if (s.dailyEnergy === null) return html`—`;
  return html`gain ${quantity(d, "energy", s.dailyEnergy.gain_J, 3)}<br>loss ${
    quantity(d, "energy", s.dailyEnergy.loss_J, 3)
  }${s.kind === "weather" ? html`<br><span class="muted">mean per day</span>` : html``}`;
}

/** One row per scenario: peak gain and time, daily energy, peak cooling load, design heat loss, surface verdicts. */
export function scenariosTable(rows: readonly ScenarioSummary[], d: DisplayUnits): Trusted {
  if (rows.length === 0) return html`<p class="muted">No scenarios.</p>`;
  const body = rows.map((s) =>
    html`
      <tr>
        <td>${s.id}<br><span class="muted">${s.kind}</span>${s.synthetic
          ? html`<br><span class="fail synthetic-mark">[SYNTHETIC DATA]</span>`
          : html``}</td>
        <td class="num">${peak(d, s.peakGain)}</td>
        <td class="num">${energy(d, s)}</td>
        <td class="num">${peak(d, s.peakCoolingLoad)}</td>
        <td class="num">${quantity(d, "heatGain", s.designHeatLoss, 3)}</td>
        <td>${surfaceVerdicts(s)}</td>
      </tr>
    `
  );
  return html`
    <table class="compact summary-scenarios">
      <caption>Scenarios: peak conduction heat gain, daily energy, cooling load, design heat loss, ISO 13788 verdicts.</caption>
      <thead>
        <tr>
          <th>Scenario</th>
          <th>Peak gain</th>
          <th>Daily energy</th>
          <th>Peak cooling load</th>
          <th>Design heat loss</th>
          <th>Condensation and mould</th>
        </tr>
      </thead>
      <tbody>${body}</tbody>
    </table>
  `;
}
