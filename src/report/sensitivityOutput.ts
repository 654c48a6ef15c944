/** The sensitivity study in the package: which material property moves U, time lag and the peak heat gain most. */
import * as Plot from "@observablehq/plot";
import type { SensitivityEffect, SensitivityResults } from "../sensitivity/study.ts";
import { type DisplayUnits, type QuantityKind, toDisplay, unitLabel } from "./displayUnits.ts";
import { formatSig, formatTrim } from "./format.ts";
import { html, type Trusted } from "./html.ts";
import type { RenderContext } from "./packageInput.ts";
import { renderPlotSvg } from "./plotSvg.ts";

const PROPERTY_NAMES: Readonly<Record<SensitivityEffect["property"], string>> = {
  conductivity: "conductivity λ",
  density: "density ρ",
  specificHeat: "specific heat c",
  resistance: "thermal resistance R",
};
const SHOWN = 10;

function materialLabel(key: string): string {
  return key.startsWith("inline:") ? `${key.slice(7)} (inline layer)` : key;
}

function signed(value: number, display: DisplayUnits, kind: QuantityKind): string {
  const shown = kind === "time" ? value : toDisplay(display, kind, value) - toDisplay(display, kind, 0);
  const text = formatSig(shown, 3);
  return shown > 0 ? `+${text}` : text;
}

function effectTable(
  caption: string,
  allEffects: readonly SensitivityEffect[],
  study: SensitivityResults,
  display: DisplayUnits,
  kind: QuantityKind,
): Trusted {
  const percent = formatTrim(study.variation * 100, 3);
  const unit = kind === "time" ? "h" : unitLabel(display, kind);
  const effects = allEffects.filter((e) => Math.max(Math.abs(e.minus), Math.abs(e.plus)) > 1e-12);
  if (effects.length === 0) return html`<p class="muted">${caption}: no material property changes it.</p>`;
  const rows = effects.slice(0, SHOWN).map((e, i) =>
    html`
      <tr>
        <td class="num">${String(i + 1)}</td>
        <td>${materialLabel(e.material)}</td>
        <td>${PROPERTY_NAMES[e.property]}</td>
        <td class="num">${signed(e.minus, display, kind)}</td>
        <td class="num">${signed(e.plus, display, kind)}</td>
      </tr>
    `
  );
  const more = effects.length > SHOWN
    ? html`
      <p
        class="muted">${String(
          effects.length - SHOWN,
        )} smaller effects are in Appendix B (results.json, key sensitivity); properties with no effect are not listed.</p>
    `
    : html``;
  return html`
    <table>
      <caption>${caption}</caption>
      <thead>
        <tr>
          <th>Rank</th>
          <th>Material</th>
          <th>Property varied</th>
          <th>Change at −${percent} % (${unit})</th>
          <th>Change at +${percent} % (${unit})</th>
        </tr>
      </thead>
      <tbody>${rows}</tbody>
    </table>${more}
  `;
}

function tornado(id: string, effects: readonly SensitivityEffect[], display: DisplayUnits): Trusted {
  const shown = effects.slice(0, SHOWN);
  const data = shown.flatMap((e, i) => [
    {
      rank: i + 1,
      side: "minus",
      value: toDisplay(display, "heatGain", e.minus) - toDisplay(display, "heatGain", 0),
    },
    {
      rank: i + 1,
      side: "plus",
      value: toDisplay(display, "heatGain", e.plus) - toDisplay(display, "heatGain", 0),
    },
  ]);
  return renderPlotSvg(
    {
      height: 60 + 26 * shown.length,
      marginLeft: 60,
      x: { label: `Change of peak heat gain (${unitLabel(display, "heatGain")})`, grid: true },
      y: { label: "Rank", domain: shown.map((_, i) => i + 1) },
      color: { domain: ["minus", "plus"], range: ["#4477aa", "#cc6677"] },
      marks: [Plot.barX(data, { x: "value", y: "rank", fill: "side" }), Plot.ruleX([0])],
    },
    `sens-${id}`,
    "Sensitivity of the peak heat gain",
  );
}

/** Renders the sensitivity study: per design day a ranked table and bar chart of the peak gain, per construction U and lag. */
export function renderSensitivity(ctx: RenderContext, sectionId: string, number: string): Trusted {
  const study = ctx.input.results.sensitivity;
  if (study === undefined) return html``;
  const display = ctx.display;
  const percent = formatTrim(study.variation * 100, 3);
  const scenarios = Object.entries(study.scenarios).map(([id, s]) =>
    html`<h4>Design day ${id}: peak total heat gain</h4>
<figure>${
      tornado(id, s.peakHeatGain, display)
    }<figcaption>Change of the peak total heat gain of ${id} when one property of one material is lowered (blue) or raised (red) by ${percent} %, largest effects first; ranks as in the table below.</figcaption></figure>
${effectTable(`Effect on the peak total heat gain of ${id}`, s.peakHeatGain, study, display, "heatGain")}`
  );
  const constructions = Object.entries(study.constructions).map(([id, c]) =>
    html`<h4>Construction ${id}</h4>
${effectTable(`Effect on the U-value of ${id}`, c.U, study, display, "transmittance")}
${effectTable(`Effect on the time lag of ${id}`, c.timeLag_h, study, display, "time")}`
  );
  return html`<section class="document"><h3 id="${sectionId}">${number} Sensitivity study</h3>
<p>Each material property was lowered and raised by ${percent} % in every layer that uses the material, one property at a time, with all else held; the affected constructions were recomputed (root method) and so was each design day. The study shows which inputs the results depend on most, so that their sources can be checked first; it is not a statement of uncertainty.</p>
${scenarios}
${constructions}
</section>`;
}
