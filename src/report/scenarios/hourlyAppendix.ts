/**
 * Appendix E, hourly scenario values: the step tables of each design day (temperatures, irradiance, heat gain)
 * and its hourly cooling load, moved out of the body so that the body keeps the summaries and the plots.
 */
import type { ScenarioResults } from "../../results/types.ts";
import { html, type Trusted } from "../page/html.ts";
import type { RenderContext } from "../page/packageInput.ts";
import { coolingLoadHourlyTable } from "./coolingLoadOutput.ts";
import { hasStepSeries } from "./scenarioData.ts";
import { hourlyAnchor } from "./scenarioOutput.ts";
import { renderStepTables } from "./scenarioTables.ts";
import { stampSyntheticOutput } from "./syntheticStamp.ts";

/** The appendix's fragment id and title, for the contents. */
export const HOURLY_APPENDIX: readonly [id: string, title: string] = [
  "s-e",
  "Appendix E Hourly scenario values",
];

/** The scenarios, in model order, whose results.json entry holds step series. */
function steppedScenarios(ctx: RenderContext): { id: string; results: ScenarioResults }[] {
  const all = ctx.input.results.scenarios;
  return ctx.input.model.scenarios.flatMap((scenario) => {
    const results = Object.hasOwn(all, scenario.id) ? all[scenario.id] : undefined;
    return results !== undefined && hasStepSeries(results) ? [{ id: scenario.id, results }] : [];
  });
}

/** Whether the package has an Appendix E (some scenario has step series, or `more` parts follow them). */
export function hasHourlyAppendix(ctx: RenderContext, more = 0): boolean {
  return steppedScenarios(ctx).length + more > 0;
}

/** How many parts (E.1, E.2, …) the scenarios take, so that parts added after them number on. */
export function hourlyScenarioParts(ctx: RenderContext): number {
  return steppedScenarios(ctx).length;
}

/**
 * Renders Appendix E, or nothing when no scenario has step series in results.json and no part is added; `more`
 * are parts printed after the scenarios' (the rooms', made by the caller so that this folder needs no room code).
 */
export function renderHourlyAppendix(ctx: RenderContext, more: readonly Trusted[] = []): Trusted {
  const d = ctx.display;
  const scenarios = steppedScenarios(ctx);
  if (scenarios.length === 0 && more.length === 0) return html``;
  const parts = scenarios.map(({ id, results }, i) => {
    const anchor = hourlyAnchor(ctx.scenarioAnchors.get(id) ?? "sc-scenario");
    const cooling = results.coolingLoad === undefined
      ? html``
      : coolingLoadHourlyTable(id, results, results.coolingLoad, d);
    const part = html`
      <section class="hourly-values" id="${anchor}">
        <h3>E.${String(i + 1)} Scenario ${id}</h3>
        <p class="muted">Results in section 2; every value below is in results.json (Appendix B) and in <code>csv/scenario-${id}.csv</code>.</p>
        ${renderStepTables(id, results, d)}${cooling}
      </section>
    `;
    return results.synthetic === undefined ? part : stampSyntheticOutput(part);
  });
  return html`
    <section id="${HOURLY_APPENDIX[0]}" class="appendix hourly-appendix">
      <h2>${HOURLY_APPENDIX[1]}</h2>
      <p>The values of each design day at every step, in the display units: outdoor and indoor air, and per surface the sol-air temperature, the incident irradiance, the heat gain and, where a radiant time series is given, the cooling load. A weather year's step series are in its CSV file only (section 2 names it).${more
          .length === 0
        ? ""
        : " Each room follows: its inside surface temperatures, mean radiant temperature and its load by both methods."}</p>
      ${parts}${more}
    </section>
  `;
}
