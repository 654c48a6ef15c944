/** Assembles the self-contained HTML calculation package from the model, results and inputs. */
import { renderInputsAppendix, renderResultsAppendix } from "./appendices/appendices.ts";
import { renderChecksAppendix, renderFactorsAppendix } from "./appendices/checksAppendices.ts";
import { renderCalculationSection } from "./calculationSection.ts";
import { hasHourlyAppendix, HOURLY_APPENDIX, renderHourlyAppendix } from "./scenarios/hourlyAppendix.ts";
import { renderSensitivityAppendix, SENSITIVITY_APPENDIX } from "./scenarios/sensitivityOutput.ts";
import { renderChecksSection } from "./registers/checksSection.ts";
import { renderCover, STATUS_LABEL, watermarkFor } from "./front/cover.ts";
import { packageCss } from "./page/css.ts";
import { renderCautionsSection } from "./registers/cautionsSection.ts";
import { renderScopeSection } from "./front/fixedSections.ts";
import { renderMethodSection } from "./registers/methodSection.ts";
import { outsideFilmCautions } from "../results/outsideFilmCautions.ts";
import { filmCoefficientText } from "./page/displayUnits.ts";
import { renderSummarySection } from "./front/summarySection.ts";
import { html, type Trusted } from "./page/html.ts";
import { makeRenderContext, type PackageInput, type RenderContext } from "./page/packageInput.ts";
import { renderReproducibilitySection, renderRevisionSection } from "./registers/recordSections.ts";
import {
  renderAssumptionsSection,
  renderMaterialsSection,
  renderSourcesSection,
} from "./registers/registerSections.ts";

export type { InputFile, LibraryEntry, PackageInput } from "./page/packageInput.ts";

/** The Content-Security-Policy of the package: nothing may load or run except inline style and data: images. */
export const PACKAGE_CSP = "default-src 'none'; img-src data:; style-src 'unsafe-inline'";

/** Contents entries: fragment id and numbered title, in page order. */
const CONTENTS: readonly (readonly [string, string])[] = [
  ["s-summary", "Summary of results"],
  ["s-1", "1 Scope and exclusions"],
  ["s-2", "2 Calculation"],
  ["s-3", "3 Calculation methods"],
  ["s-4", "4 Checks and findings"],
  ["s-5", "5 Assumptions register"],
  ["s-6", "6 Materials and their sources"],
  ["s-7", "7 Sources"],
  ["s-8", "8 Cautions"],
  ["s-9", "9 Revision history"],
  ["s-10", "10 Reproducibility"],
  ["s-a", "Appendix A Embedded inputs"],
  ["s-b", "Appendix B Results (results.json)"],
  ["s-c", "Appendix C Numerical checks"],
  ["s-d", "Appendix D Dynamic factors"],
  HOURLY_APPENDIX,
  SENSITIVITY_APPENDIX,
];

function renderContents(ctx: RenderContext): Trusted {
  const listed = new Set<string>();
  const docs = ctx.input.model.documents.map((d, i) => {
    const outputs = d.segments.flatMap((segment) => {
      if (segment.kind !== "block" || segment.blockKind !== "scenario" || segment.id === undefined) return [];
      const anchor = ctx.scenarioAnchors.get(segment.id);
      if (anchor === undefined || listed.has(anchor)) return [];
      listed.add(anchor);
      return [html`<li><a href="#${anchor}">Results of scenario ${segment.id}</a></li>`];
    });
    const nested = outputs.length === 0 ? html`` : html`<ol class="contents-outputs">${outputs}</ol>`;
    return html`<li><a href="#s-2-${String(i + 1)}">2.${String(i + 1)} ${d.path}</a>${nested}</li>`;
  });
  const sensitivityNumber = String(ctx.input.model.documents.length + 1);
  const sensitivity = ctx.input.results.sensitivity === undefined
    ? html``
    : html`<li><a href="#s-2-${sensitivityNumber}">2.${sensitivityNumber} Sensitivity study</a></li>`;
  const absent = new Set<string>();
  if (ctx.input.results.summary === undefined) absent.add("s-summary");
  if (!hasHourlyAppendix(ctx)) absent.add(HOURLY_APPENDIX[0]);
  if (ctx.input.results.sensitivity === undefined) absent.add(SENSITIVITY_APPENDIX[0]);
  const shown = CONTENTS.filter(([id]) => !absent.has(id));
  const items = shown.map(([id, title]) =>
    id === "s-2"
      ? html`<li><a href="#${id}">${title}</a><ol>${docs}${sensitivity}</ol></li>`
      : html`<li><a href="#${id}">${title}</a></li>`
  );
  return html`
    <nav class="contents" aria-label="Contents">
      <h2>Contents</h2>
      <ol>${items}</ol>
    </nav>
  `;
}

function endMarker(input: PackageInput): Trusted {
  return html`<p class="end-marker">END OF CALCULATION PACKAGE<br><span class="hash">Input SHA-256 ${input.results.inputs.sha256}</span></p>`;
}

/** Renders the whole package as one HTML document; the same input always gives the same string. */
export function renderPackage(input: PackageInput): string {
  const ctx = makeRenderContext(input);
  const info = input.model.info;
  const status = STATUS_LABEL[info.status];
  const headerLeft = `${info.title} | ${info.reference} rev ${info.revision}`;
  const css = packageCss({ left: headerLeft, right: status }, watermarkFor(info.status));
  const page = html`
    <html lang="en">
      <head>
        <meta charset="utf-8">
        <meta http-equiv="Content-Security-Policy" content="${PACKAGE_CSP}">
        <meta name="viewport" content="width=device-width, initial-scale=1">
        <meta name="generator" content="fluxnote ${input.toolVersion}">
        <title>${info.title} (${info.reference} rev ${info.revision}, ${status})</title>
        <style>${css}</style>
      </head>
      <body class="${info.status === "issued" ? "issued" : "not-issued"}">
    <div class="running-header">${headerLeft} | ${status}</div>
    ${renderCover(input)}
    ${renderSummarySection(ctx)}
    ${renderContents(ctx)}
    <main>
    ${renderScopeSection(ctx.display)}
    ${renderCalculationSection(ctx)}
    ${renderMethodSection(ctx)}
    ${renderChecksSection(ctx)}
    ${renderAssumptionsSection(ctx)}
    ${renderMaterialsSection(ctx)}
    ${renderSourcesSection(ctx)}
    ${renderCautionsSection(
      input,
      outsideFilmCautions(
        input.results.scenarios,
        (w) => filmCoefficientText(ctx.display, w),
      ),
    )}
    ${renderRevisionSection(ctx)}
    ${renderReproducibilitySection(ctx)}
    ${renderInputsAppendix(ctx)}
    ${renderResultsAppendix(ctx)}
    ${renderChecksAppendix(ctx)}
    ${renderFactorsAppendix(ctx)}
    ${renderHourlyAppendix(ctx)}
    ${renderSensitivityAppendix(ctx)}
    </main>
    ${endMarker(input)}
      </body>
    </html>
  `;
  return `<!doctype html>\n${page.markup.trim()}\n`;
}
