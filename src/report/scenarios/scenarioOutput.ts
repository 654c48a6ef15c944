/**
 * The computed output shown after a scenario block: peak summary, conditions, plots, cooling load peaks, the
 * checks line and the caution; the step tables print in Appendix E (hourlyAppendix.ts).
 */
import type { Assumption, Scenario } from "../../project/model.ts";
import type { CheckResult, ScenarioResults } from "../../results/types.ts";
import { checksTable } from "../constructions/constructionOutput.ts";
import { renderCoolingLoad } from "./coolingLoadOutput.ts";
import { type DisplayUnits, unitLabel } from "../page/displayUnits.ts";
import { scenarioFigurePrefix } from "../page/anchors.ts";
import { html, type Trusted } from "../page/html.ts";
import { renderConditions } from "./scenarioConditions.ts";
import {
  coverageLabel,
  hasStepSeries,
  monthlyTotals,
  objectKey,
  scenarioChecks,
  stringKey,
  surfaceOfSubject,
} from "./scenarioData.ts";
import { insideFluxPlot, monthlyPlot, solAirPlot, stackedGainPlot } from "./scenarioPlots.ts";
import { renderPeakSummary } from "./scenarioSummary.ts";
import { renderMonthlyTable } from "./scenarioTables.ts";
import { stampSyntheticOutput, syntheticBanner } from "./syntheticStamp.ts";

/** What the scenario output reads: the block's scenario, its results entry, the register, checks and anchors. */
export interface ScenarioOutputInput {
  readonly scenario: Scenario;
  readonly results: ScenarioResults | undefined;
  readonly checks: readonly CheckResult[];
  readonly assumptions: readonly Pick<Assumption, "id">[];
  readonly constructionAnchors: ReadonlyMap<string, string>;
  /** Fragment id of the output, also the prefix of the plots' ids. */
  readonly anchor: string;
  /** The units every number is printed in. */
  readonly display: DisplayUnits;
}

function figure(svg: Trusted, title: Trusted, caption: Trusted): Trusted {
  return html`
    <figure
      class="plot-figure">${svg}<figcaption><strong>${title}</strong> ${caption}</figcaption></figure>
  `;
}

function designDayPlots(id: string, results: ScenarioResults, prefix: string, d: DisplayUnits): Trusted {
  return html`
    ${figure(
      solAirPlot(results, prefix, d),
      html`Outdoor air and sol-air temperatures, scenario ${id}.`,
      html`Each line is named at its right end (surface sol-air temperatures by surface id). The 24:00 point repeats 00:00 (the day repeats).`,
    )}
    ${figure(
      insideFluxPlot(results, prefix, d),
      html`Inside heat flux by surface, scenario ${id}.`,
      html`Each line is named at its right end by surface id; ${
        unitLabel(d, "heatFlux")
      } of surface, positive into the room.`,
    )}
    ${figure(
      stackedGainPlot(results, prefix, d),
      html`Heat gain stacked by surface, scenario ${id}.`,
      html`Each surface's bar is named at its right end by surface id, the total (line with dots) likewise. Bars stack from zero in input order; gains above zero, losses below.`,
    )}
  `;
}

function designDayBody(
  id: string,
  results: ScenarioResults,
  prefix: string,
  d: DisplayUnits,
  anchor: string,
): Trusted {
  return html`
    <p
      class="muted hourly-pointer">The values at every step (air and sol-air temperatures, irradiance, heat gain${results
          .coolingLoad === undefined
        ? ""
        : " and cooling load"} of each surface) are in <a href="#${hourlyAnchor(
          anchor,
        )}">Appendix E</a> and in <code>csv/scenario-${id}.csv</code>.</p>
    <h5>Plots</h5>
    ${designDayPlots(id, results, prefix, d)}
  `;
}

/** The fragment id of a scenario's part of Appendix E, from the id of its output. */
export function hourlyAnchor(anchor: string): string {
  return `e-${anchor}`;
}

/**
 * The body's line on a scenario's numerical checks: failures tabled beside their values, then
 * "N numerical checks passed (Appendix C)".
 */
function scenarioChecksLine(checks: readonly CheckResult[], id: string): Trusted {
  const own = scenarioChecks(checks, id);
  if (own.length === 0) return html`<p>No automated check is recorded for this scenario.</p>`;
  const failed = own.filter((c) => !c.pass);
  const passed = own.length - failed.length;
  const line = failed.length === 0
    ? html`<p class="pass checks-line">${
      String(passed)
    } numerical checks passed (<a href="#s-c">Appendix C</a>).</p>`
    : html`<p class="checks-line">${String(passed)} of ${String(own.length)} numerical checks passed (<a
        href="#s-c">Appendix C</a>); the ${String(failed.length)} failed above.</p>`;
  return html`${
    failed.length === 0 ? html`` : checksTable(failed, (c) => surfaceOfSubject(c.subject, id), "Surface")
  }${line}`;
}

function summaryBody(id: string, results: ScenarioResults, prefix: string, d: DisplayUnits): Trusted {
  const months = monthlyTotals(results.totals);
  const csv = stringKey(results, "csv");
  const csvLine = csv === undefined
    ? html`<p class="muted">The step series of ${id} are not in results.json; only the summaries are shown.</p>`
    : html`
      <p
        class="muted">The step series of ${id} are in <code>${csv}</code> beside the package, not in results.json; the summaries below are.</p>
    `;
  const daily = objectKey(results, "daily");
  const dailyLine = daily === undefined ? html`` : html`
    <p
      class="muted">Daily largest, smallest and mean heat gain per surface are in results.json (Appendix B), key <code>daily</code>.</p>
  `;
  const coverage = coverageLabel(results);
  const monthly = coverage.kind === "period"
    ? html`
      <p
        class="muted">No monthly totals or monthly plot: the weather file of ${id} covers a ${coverage
          .label}, not a year. The totals over the period are in the summary above; results.json <code>period</code> gives its first and last rows.</p>
    `
    : months === undefined
    ? html`<p class="muted">No monthly totals in results.json for ${id}.</p>`
    : html`
      <h5>Monthly totals</h5>
      ${renderMonthlyTable(id, months, results.totals, d)}
      ${figure(
        monthlyPlot(months, prefix, d),
        html`Monthly heat gain and heat loss, scenario ${id}.`,
        html`Heat gain above zero, heat loss below (lighter), each named at its largest month. All surfaces together, ${
          unitLabel(d, "energy")
        } per month.`,
      )}
    `;
  return html`${csvLine}${monthly}${dailyLine}`;
}

function caution(results: ScenarioResults): Trusted {
  const coverage = coverageLabel(results);
  const basis = results.kind === "design-day"
    ? "these figures assume a steady-periodic day (the same day repeated, continuous operation at the stated indoor temperature)"
    : `these figures assume the stated indoor temperature at every step (continuous operation) and a ${coverage.label} that repeats for the warm-up`;
  return html`
    <div class="caution-box" role="note">
      <p><strong>Heat gain is not cooling load:</strong> the radiant part reaches the room air later, after the room's surfaces absorb and release it, so the load on the plant peaks later and lower than the heat gain shown; ${basis}. Set-back, intermittent plant, glazing, ventilation and internal gains are outside these figures.</p>
    </div>
  `;
}

/** Renders a scenario's computed output from its results.json entry; missing results give a plain failure note. */
export function renderScenarioOutput(input: ScenarioOutputInput): Trusted {
  const { scenario, results, anchor } = input;
  const id = scenario.id;
  if (results === undefined) {
    return html`
      <div class="scenario-output" id="${anchor}">
        <p
          class="fail">Not computed: results.json holds no entry for scenario ${id} (see the warnings and the checks and findings).</p>
      </div>
    `;
  }
  const prefix = scenarioFigurePrefix(anchor);
  const d = input.display;
  const body = hasStepSeries(results)
    ? designDayBody(id, results, prefix, d, anchor)
    : summaryBody(id, results, prefix, d);
  const output = html`
    <div class="scenario-output" id="${anchor}">
      <h4 class="output-heading">Results of scenario ${id}</h4>${results.synthetic === undefined
        ? html``
        : syntheticBanner(id, results.synthetic)}
      <p class="muted">Numbers as in results.json <code>scenarios</code> entry for ${id} (Appendix B); times are local standard time.</p>
      ${renderPeakSummary(id, results, d)}
      <h5>Conditions</h5>
      ${renderConditions({ ...input, results })}
      ${body}
      ${renderCoolingLoad(id, results, prefix, d)}
      <h5>Checks on ${id}</h5>
      ${scenarioChecksLine(input.checks, id)}
      ${caution(results)}
    </div>
  `;
  return results.synthetic === undefined ? output : stampSyntheticOutput(output);
}
