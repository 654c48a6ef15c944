/**
 * The body's one table of the sensitivity study: the largest effects across all constructions (U and time lag)
 * and design days (peak heat gain, by material property and by design condition), ranked by their size
 * relative to the base value. The full tables per construction and design day are in Appendix F.
 */
import type { ConditionEffect, SensitivityEffect, SensitivityResults } from "../../sensitivity/study.ts";
import { readDynamic } from "../constructions/dynamicData.ts";
import { type DisplayUnits, type QuantityKind, toDisplay, unitLabel } from "../page/displayUnits.ts";
import { formatSig, formatTrim } from "../page/format.ts";
import { html, type Trusted } from "../page/html.ts";
import type { RenderContext } from "../page/packageInput.ts";

/** Rows the body's ranked table shows; the rest are in Appendix F. */
export const RANKED_SHOWN = 10;

/** Names of the material properties varied. */
export const PROPERTY_NAMES: Readonly<Record<SensitivityEffect["property"], string>> = {
  conductivity: "conductivity λ",
  density: "density ρ",
  specificHeat: "specific heat c",
  resistance: "thermal resistance R",
};

/** Names of the design-day conditions varied. */
export const CONDITION_NAMES: Readonly<Record<ConditionEffect["condition"], string>> = {
  absorptance: "solar absorptance α of every sunlit surface",
  outsideCoefficient: "outside film h_o of every sunlit surface (and its R_se = 1/h_o)",
  maxDryBulb: "design maximum dry bulb (the whole outdoor profile shifted)",
  dailyRange: "daily range of the outdoor dry bulb",
  indoor: "indoor temperature",
};

/** A material key as printed: the material id, or the inline layer's name. */
export function materialLabel(key: string): string {
  return key.startsWith("inline:") ? `${key.slice(7)} (inline layer)` : key;
}

/** A change in the display unit of `kind`, signed ("+0.0275"); times in hours. */
export function signed(value: number, display: DisplayUnits, kind: QuantityKind): string {
  const shown = kind === "time" ? value : toDisplay(display, kind, value) - toDisplay(display, kind, 0);
  const text = formatSig(shown, 3);
  return shown > 0 ? `+${text}` : text;
}

/** One effect on one result, with its size relative to the result's base value. */
interface RankedEffect {
  readonly result: string;
  readonly input: string;
  readonly step: string;
  readonly minus: number;
  readonly plus: number;
  readonly kind: QuantityKind;
  /** max(|minus|, |plus|) / |base|. */
  readonly relative: number;
}

function relativeOf(e: { minus: number; plus: number }, base: number | undefined): number {
  const size = Math.max(Math.abs(e.minus), Math.abs(e.plus));
  return base === undefined || !Number.isFinite(base) || base === 0 ? NaN : size / Math.abs(base);
}

/** One material property's effect on `result`, as a row of the ranked table. */
function materialEffect(
  e: SensitivityEffect,
  result: string,
  kind: QuantityKind,
  step: string,
  base: number | undefined,
): RankedEffect {
  return {
    result,
    input: `${materialLabel(e.material)}: ${PROPERTY_NAMES[e.property]}`,
    step,
    minus: e.minus,
    plus: e.plus,
    kind,
    relative: relativeOf(e, base),
  };
}

/** Every effect the study kept (all above its threshold), largest relative change first. */
export function rankedEffects(ctx: RenderContext, study: SensitivityResults): RankedEffect[] {
  const percent = `±${formatTrim(study.variation * 100, 3)} %`;
  const all: RankedEffect[] = [];
  for (const [id, c] of Object.entries(study.constructions)) {
    const own = Object.hasOwn(ctx.input.results.constructions, id)
      ? ctx.input.results.constructions[id]
      : undefined;
    const lag = readDynamic(own)?.dynamic.timeLag_h;
    all.push(...c.U.map((e) => materialEffect(e, `U of ${id}`, "transmittance", percent, own?.U)));
    all.push(...c.timeLag_h.map((e) => materialEffect(e, `time lag of ${id}`, "time", percent, lag)));
  }
  for (const [id, s] of Object.entries(study.scenarios)) {
    const result = `peak heat gain of ${id}`;
    all.push(
      ...s.peakHeatGain.map((e) => materialEffect(e, result, "heatGain", percent, s.basePeakHeatGain)),
    );
    s.conditions.forEach((e) =>
      all.push({
        result,
        input: CONDITION_NAMES[e.condition],
        step: e.step,
        minus: e.minus,
        plus: e.plus,
        kind: "heatGain",
        relative: relativeOf(e, s.basePeakHeatGain),
      })
    );
  }
  const size = (e: RankedEffect) => Number.isNaN(e.relative) ? -1 : e.relative;
  return all.sort((a, b) => size(b) - size(a));
}

function unitOf(kind: QuantityKind, d: DisplayUnits): string {
  return kind === "time" ? "h" : unitLabel(d, kind);
}

/** Renders the ranked table of the largest effects, with the count left to Appendix F and the threshold. */
export function renderRankedEffects(ctx: RenderContext, study: SensitivityResults): Trusted {
  const d = ctx.display;
  const ranked = rankedEffects(ctx, study);
  const threshold = formatTrim(study.threshold * 100, 3);
  if (ranked.length === 0) {
    return html`<p class="muted">No effect reaches the threshold of ${threshold} % of its base value.</p>`;
  }
  const shown = ranked.slice(0, RANKED_SHOWN);
  const rows = shown.map((e, i) =>
    html`
      <tr>
        <td class="num">${String(i + 1)}</td>
        <td>${e.result}</td>
        <td>${e.input}</td>
        <td class="num">${e.step}</td>
        <td class="num" data-q="minus">${signed(e.minus, d, e.kind)} ${unitOf(e.kind, d)}</td>
        <td class="num" data-q="plus">${signed(e.plus, d, e.kind)} ${unitOf(e.kind, d)}</td>
        <td class="num" data-q="relative">${Number.isNaN(e.relative)
          ? "—"
          : formatSig(e.relative * 100, 2)}</td>
      </tr>
    `
  );
  const rest = ranked.length - shown.length;
  return html`
    <table class="sensitivity-ranked compact">
      <caption>The largest effects across all constructions and design days, ranked by the larger of the two changes as a share of the base value; every effect kept is at least ${threshold} % of its base value (smaller ones are left out and counted in Appendix F).</caption>
      <thead>
        <tr>
          <th>Rank</th>
          <th>Result</th>
          <th>Input varied</th>
          <th>Step</th>
          <th>Change at − step</th>
          <th>Change at + step</th>
          <th>Largest change, % of base</th>
        </tr>
      </thead>
      <tbody>${rows}</tbody>
    </table>
    <p class="muted">${rest > 0
      ? `${
        String(rest)
      } smaller effects above the threshold, and every table per construction and design day: `
      : "Every table per construction and design day: "}<a href="#s-f">Appendix F</a>.</p>
  `;
}
