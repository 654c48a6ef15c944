/** The sensitivity study in the package: which material property moves U, time lag and the peak heat gain most. */
import * as Plot from "@observablehq/plot";
import type { ConditionEffect, SensitivityEffect, SensitivityResults } from "../../sensitivity/study.ts";
import {
  CONDITION_NAMES,
  materialLabel,
  PROPERTY_NAMES,
  renderRankedEffects,
  signed,
} from "./sensitivityRanking.ts";
import { type DisplayUnits, type QuantityKind, toDisplay, unitLabel } from "../page/displayUnits.ts";
import { formatTrim } from "../page/format.ts";
import { html, type Trusted } from "../page/html.ts";
import { sensitivityAnchor } from "../page/anchors.ts";
import { quotedNumbers } from "../page/quotedText.ts";
import type { RenderContext } from "../page/packageInput.ts";
import { namePlaceholder, renderPlotSvg } from "../page/plotSvg.ts";

/** Bars in a tornado chart; the tables of Appendix F list every effect kept. */
const SHOWN = 10;

/** The sentence on the effects left out: how many and the threshold. */
function droppedText(count: number, study: SensitivityResults, what: string): string {
  const threshold = formatTrim(study.threshold * 100, 3);
  return count === 0
    ? `No ${what} is below the threshold of ${threshold} % of the base value.`
    : `${count} ${what}${
      count === 1 ? " is" : "s are"
    } left out: both changes below ${threshold} % of the base value.`;
}

function conditionTable(
  id: string,
  effects: readonly ConditionEffect[],
  dropped: number,
  study: SensitivityResults,
  display: DisplayUnits,
): Trusted {
  const unit = unitLabel(display, "heatGain");
  const rows = effects.map((e) =>
    html`
      <tr>
        <td>${CONDITION_NAMES[e.condition]}</td>
        <td>${quotedNumbers(e.step, display)}</td>
        <td class="num">${signed(e.minus, display, "heatGain")}</td>
        <td class="num">${signed(e.plus, display, "heatGain")}</td>
      </tr>
    `
  );
  return html`
    <table>
      <caption>Effect of the design-day conditions on the peak total heat gain of ${id}, largest first (changes in ${unit})</caption>
      <thead>
        <tr>
          <th>Condition varied</th>
          <th>Step</th>
          <th>Change at − step</th>
          <th>Change at + step</th>
        </tr>
      </thead>
      <tbody>${rows}</tbody>
    </table>
    <p class="muted">${droppedText(dropped, study, "condition effect")}</p>
  `;
}

/** Shortens a bar label to fit the left margin of the chart. */
function clipName(text: string): string {
  return text.length <= 44 ? text : `${text.slice(0, 43)}\u2026`;
}

function effectTable(
  caption: string,
  allEffects: readonly SensitivityEffect[],
  dropped: number,
  study: SensitivityResults,
  display: DisplayUnits,
  kind: QuantityKind,
): Trusted {
  const percent = formatTrim(study.variation * 100, 3);
  const unit = kind === "time" ? "h" : unitLabel(display, kind);
  const effects = allEffects.filter((e) => Math.max(Math.abs(e.minus), Math.abs(e.plus)) > 1e-12);
  const droppedNote = droppedText(dropped, study, "material property effect");
  if (effects.length === 0) {
    return html`<p class="muted">${caption}: no material property changes it by the threshold. ${droppedNote}</p>`;
  }
  const rows = effects.map((e, i) =>
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
  return html`
    <table>
      <caption>${caption} (changes in ${unit})</caption>
      <thead>
        <tr>
          <th>Rank</th>
          <th>Material</th>
          <th>Property varied</th>
          <th>Change at −${percent} %</th>
          <th>Change at +${percent} %</th>
        </tr>
      </thead>
      <tbody>${rows}</tbody>
    </table>
    <p class="muted">${droppedNote}</p>
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
  const names = shown.map((e) => clipName(`${materialLabel(e.material)}: ${PROPERTY_NAMES[e.property]}`));
  return renderPlotSvg(
    {
      height: 60 + 21 * shown.length,
      marginLeft: 262,
      marginBottom: 40,
      x: {
        label: `Change of peak heat gain (${unitLabel(display, "heatGain")})`,
        labelAnchor: "center",
        labelArrow: "none",
        grid: true,
      },
      y: {
        label: null,
        domain: shown.map((_, i) => i + 1),
        tickFormat: (rank: number) => namePlaceholder(rank - 1),
        tickSize: 0,
      },
      // Dark for lowered, light for raised: the two sides differ in greyscale too.
      color: { domain: ["minus", "plus"], range: ["#2c4f73", "#d8a3a3"] },
      marks: [
        Plot.barX(data, { x: "value", y: "rank", fill: "side", stroke: "#111", strokeWidth: 0.5 }),
        Plot.ruleX([0]),
      ],
    },
    `sens-${id}`,
    "Sensitivity of the peak heat gain",
    names,
  );
}

/** The design days' tornado charts: change of the peak heat gain by material property. */
function tornadoFigures(study: SensitivityResults, display: DisplayUnits): Trusted[] {
  const percent = formatTrim(study.variation * 100, 3);
  return Object.entries(study.scenarios).flatMap(([id, s]) =>
    s.peakHeatGain.length === 0 ? [] : [
      html`
        <figure
          class="tornado">${tornado(
            id,
            s.peakHeatGain,
            display,
          )}<figcaption>Change of the peak total heat gain of design day ${id} when one property of one material is lowered (blue) or raised (red) by ${percent} %, largest effects first; each bar is labelled by material and property (table in Appendix F).</figcaption></figure>
      `,
    ]
  );
}

/**
 * Renders the body's sensitivity study: the method, one ranked table of the largest effects across
 * constructions and design days, and the design days' tornado charts; the tables per construction and design
 * day are Appendix F's (`renderSensitivityAppendix`).
 */
export function renderSensitivity(ctx: RenderContext, sectionId: string): Trusted {
  const study = ctx.input.results.sensitivity;
  if (study === undefined) return html``;
  const percent = formatTrim(study.variation * 100, 3);
  return html`<section class="document sensitivity" id="${sectionId}"><h2>Sensitivity study</h2>
<p>Each material property was lowered and raised by ${percent} % in every layer that uses the material, one property at a time, with all else held; the affected constructions were recomputed (root method) and so was each design day. Each design day's conditions were varied the same way, one at a time, by the steps stated in the table (absorptance ±0.1, h_o ±${percent} %, design maximum dry bulb and daily range ±2 K, indoor temperature ±1 K: our stated steps, common practice, no source). Effects whose changes are both below ${
    formatTrim(study.threshold * 100, 3)
  } % of the base value are left out and counted. The study shows which inputs the results depend on most, so that their sources can be checked first; it is not a statement of uncertainty.</p>
${renderRankedEffects(ctx, study)}
${tornadoFigures(study, ctx.display)}
</section>`;
}

/** Appendix F's fragment id and title, for the contents. */
export const SENSITIVITY_APPENDIX: readonly [id: string, title: string] = [
  "s-f",
  "Appendix F Sensitivity tables",
];

/** Renders Appendix F: per design day and per construction the ranked tables of the study; nothing without one. */
export function renderSensitivityAppendix(ctx: RenderContext): Trusted {
  const study = ctx.input.results.sensitivity;
  if (study === undefined) return html``;
  const display = ctx.display;
  const scenarios = Object.entries(study.scenarios).map(([id, s]) =>
    html`
      <h3 id="${sensitivityAnchor(
        ctx.scenarioAnchors.get(id) ?? id,
      )}">Design day ${id}: peak total heat gain</h3>
      <div class="table-pair">
        <div>${effectTable(
          `Effect on the peak total heat gain of ${id}`,
          s.peakHeatGain,
          s.dropped.peakHeatGain,
          study,
          display,
          "heatGain",
        )}</div>
        <div>${conditionTable(id, s.conditions, s.dropped.conditions, study, display)}</div>
      </div>
    `
  );
  const order = ctx.input.model.constructions.map((c) => c.id);
  const rank = (id: string) => order.includes(id) ? order.indexOf(id) : order.length;
  const byInput = Object.entries(study.constructions).sort(([a], [b]) => rank(a) - rank(b));
  const constructions = byInput.map(([id, c]) =>
    html`
      <h3 id="${sensitivityAnchor(ctx.constructionAnchors.get(id) ?? id)}">Construction ${id}</h3>
      <div class="table-pair">
        <div>${effectTable(
          `Effect on the U-value of ${id}`,
          c.U,
          c.dropped.U,
          study,
          display,
          "transmittance",
        )}</div>
        <div>${effectTable(
          `Effect on the time lag of ${id}`,
          c.timeLag_h,
          c.dropped.timeLag_h,
          study,
          display,
          "time",
        )}</div>
      </div>
    `
  );
  return html`<section id="${SENSITIVITY_APPENDIX[0]}" class="appendix sensitivity-appendix"><h2>${
    SENSITIVITY_APPENDIX[1]
  }</h2>
<p>The sensitivity study in full: for each construction and each design day the effects kept, largest first, and the count of those left out below the threshold; method and steps with the study in the body.</p>
${constructions}
${scenarios}
</section>`;
}
