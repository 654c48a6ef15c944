/** The combined-method table of a bridged (framed) layer and the ΔU corrections, shown after the layer table. */
import type { ResolvedLayer } from "../../project/model.ts";
import type { CombinedMethodJson, CorrectionsJson } from "../../results/designResults.ts";
import type { ConstructionResults } from "../../results/types.ts";
import { type DisplayUnits, toDisplay, unitLabel } from "../page/displayUnits.ts";
import { formatSig } from "../page/format.ts";
import { html, type Trusted } from "../page/html.ts";

const pct = (f: number) => `${Math.round(f * 1000) / 10} %`;

/**
 * The layer-table name of a bridged layer: the equivalent of its two materials with their area fractions, e.g.
 * `Equivalent of Glass-wool batt 85 % + Sawn softwood 15 %` (not the name of the insulation alone).
 */
export function bridgedLayerName(layer: ResolvedLayer): string | undefined {
  const b = layer.bridge;
  if (b === undefined) return undefined;
  return `Equivalent of ${b.base.name} ${pct(1 - b.fraction)} + ${b.bridge.name} ${pct(b.fraction)}`;
}

/** The layer-table label of a bridged layer, e.g. `(mineral-wool-25 85 % / timber-softwood-500 15 %)`. */
export function bridgedLayerLabel(layer: ResolvedLayer): Trusted | undefined {
  const b = layer.bridge;
  if (b === undefined) return undefined;
  return html`
    <span
      class="muted">(${b.base.materialId ?? b.base.name} ${pct(1 - b.fraction)} / ${b.bridge.materialId ??
        b.bridge.name} ${pct(
          b.fraction,
        )}; one homogeneous layer with the R of the ISO 6946 combined method and the area-weighted ρ·c, see the combined-method table)</span>
  `;
}

function combinedOf(results: ConstructionResults | undefined): CombinedMethodJson | undefined {
  const c = results?.["combinedMethod"];
  return typeof c === "object" && c !== null ? c as CombinedMethodJson : undefined;
}

function correctionsOf(results: ConstructionResults | undefined): CorrectionsJson | undefined {
  const c = results?.["corrections"];
  return typeof c === "object" && c !== null ? c as CorrectionsJson : undefined;
}

/** Renders the combined-method table (paths, R'_T, R''_T, R_T, e, validity) and the corrections, if any. */
export function renderBridgedOutput(results: ConstructionResults | undefined, d: DisplayUnits): Trusted {
  return html`${combinedTable(combinedOf(results), d)}${
    correctionsTable(results, correctionsOf(results), d)
  }`;
}

function combinedTable(c: CombinedMethodJson | undefined, d: DisplayUnits): Trusted {
  if (c === undefined) return html``;
  const r = (v: number) => formatSig(toDisplay(d, "resistance", v), 3);
  const k = (v: number) => formatSig(toDisplay(d, "conductivity", v), 3);
  const rUnit = unitLabel(d, "resistance");
  const paths = c.paths.map((p) =>
    html`
      <tr>
        <td>Path through ${p.material}</td>
        <td class="num">${pct(p.fraction)}</td>
        <td class="num">${k(p.conductivity)}</td>
        <td class="num">${r(p.layerR)}</td>
        <td class="num">${r(p.R)}</td>
      </tr>
    `
  );
  const row = (label: string, value: string, note = "") =>
    html`
      <tr class="total">
        <td>${label}</td>
        <td colspan="3" class="muted">${note}</td>
        <td class="num">${value}</td>
      </tr>
    `;
  return html`
    <table class="combined-method">
      <caption>Combined method (ISO 6946:2017) for layer ${String(c.layer + 1)} (${c.layerName}, ${formatSig(
        toDisplay(d, "thickness", c.thickness),
        3,
      )} ${unitLabel(
        d,
        "thickness",
      )}): upper limit by parallel paths through the whole element, lower limit by layers.</caption>
      <thead>
        <tr>
          <th>Path / quantity</th>
          <th>Area fraction f</th>
          <th>λ ${unitLabel(d, "conductivity")}</th>
          <th>R of the layer ${rUnit}</th>
          <th>R_T air to air ${rUnit}</th>
        </tr>
      </thead>
      <tbody>
        ${paths}
        ${row("Upper limit R'_T", r(c.upperR), "1/R'_T = Σ f_m / R_T,m")}
        ${row(
          "Lower limit R''_T",
          r(c.lowerR),
          `layer λ'' = Σ f λ = ${k(c.lowerConductivity)} ${unitLabel(d, "conductivity")}`,
        )}
        ${row("R_T = (R'_T + R''_T)/2", r(c.R))}
        ${row("Relative maximum error e = (R'_T − R''_T)/(2 R_T)", pct(c.relativeError))}
        <tr class="${c.applicable ? "pass" : "fail"}">
          <td>Applicability R'_T/R''_T ≤ ${String(c.ratioLimit)}</td>
          <td colspan="3" class="muted">${c.source}</td>
          <td class="num result">${formatSig(c.ratio, 3)} ${c.applicable ? "APPLIES" : "DOES NOT APPLY"}</td>
        </tr>
      </tbody>
    </table>
    <p
      class="equivalent-layer">Equivalent homogeneous layer used for U and for the dynamic response: λ_eq = ${k(
        c.equivalentLayer.conductivity,
      )} ${unitLabel(d, "conductivity")} (reproduces R_T), ρ = Σ f ρ = ${formatSig(
        toDisplay(d, "density", c.equivalentLayer.density),
        3,
      )} ${unitLabel(d, "density")}, c = Σ f ρ c / Σ f ρ = ${formatSig(
        toDisplay(d, "specificHeat", c.equivalentLayer.specificHeat),
        3,
      )} ${unitLabel(
        d,
        "specificHeat",
      )}. The dynamic response treats the stud zone as one homogeneous layer; lateral heat flow and 2-D effects are not modelled.</p>
  `;
}

function correctionsTable(
  results: ConstructionResults | undefined,
  c: CorrectionsJson | undefined,
  d: DisplayUnits,
): Trusted {
  if (c === undefined || results === undefined) return html``;
  const u = (v: number) => formatSig(toDisplay(d, "transmittance", v), 3);
  const uUnit = unitLabel(d, "transmittance");
  const rows = c.layers.map((l) =>
    html`
      <tr>
        <td>Layer ${String(l.layer + 1)}</td>
        <td class="num">${l.fasteners === null ? "—" : u(l.fasteners)}</td>
        <td class="num">${l.airGaps === null
          ? "—"
          : `level ${l.airGaps.level}: ΔU'' ${u(l.airGaps.deltaU2)} → ΔU_g ${u(l.airGaps.deltaU)}`}</td>
        <td>${l.source}</td>
      </tr>
    `
  );
  const corrected = typeof results["correctedU"] === "number" ? results["correctedU"] : results.U + c.deltaU;
  return html`
    <table class="corrections">
      <caption>Corrections to U given in the input (ISO 6946:2017 Annex F; ΔU_g = ΔU''·(R_1/R_T)²), ${uUnit}</caption>
      <thead>
        <tr>
          <th>Layer</th>
          <th>Fasteners ΔU_f</th>
          <th>Air gaps</th>
          <th>Source</th>
        </tr>
      </thead>
      <tbody>${rows}</tbody>
    </table>
    <p
      class="corrected-u"><strong>U_c = U + ΔU = ${u(results.U)} + ${u(c.deltaU)} = ${u(
        corrected,
      )} ${uUnit}</strong>. ΔU from the corrections is added to U and does not enter the dynamic response (response factors, CTF, ISO 13786 figures and scenarios use U = ${u(
        results.U,
      )} ${uUnit}).</p>
  `;
}
