/** Assembles the self-contained HTML calculation package from the model, results and inputs. */
import { renderInputsAppendix, renderResultsAppendix } from "./appendices/appendices.ts";
import { renderChecksAppendix, renderFactorsAppendix } from "./appendices/checksAppendices.ts";
import { APPENDIX_CSS } from "./appendices/appendixCss.ts";
import { METHODS_APPENDIX_TITLE } from "./registers/methodSection.ts";
import { documentTitle, renderCalculationSection } from "./calculationSection.ts";
import { contentsOutputs } from "./front/contentsOutputs.ts";
import { documentAnchor, SENSITIVITY_ANCHOR, sensitivityAnchor } from "./page/anchors.ts";
import {
  hasHourlyAppendix,
  HOURLY_APPENDIX,
  hourlyScenarioParts,
  renderHourlyAppendix,
} from "./scenarios/hourlyAppendix.ts";
import { roomHourlyParts } from "./rooms/roomHourly.ts";
import { ROOM_CSS } from "./rooms/roomCss.ts";
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

/**
 * The package's own sections after the project's files, by fragment id and title: unnumbered, so that the numbers
 * in the project's headings are the only section numbers; the appendices are lettered.
 */
const OWN_SECTIONS: readonly (readonly [string, string])[] = [
  ["s-4", "Checks and findings"],
  ["s-5", "Assumptions register"],
  ["s-6", "Materials and their sources"],
  ["s-8", "Cautions"],
  ["s-7", "Sources"],
  ["s-9", "Revision history"],
  ["s-10", "Reproducibility"],
  ["s-a", "Appendix A Embedded inputs"],
  ["s-b", "Appendix B Results (results.json)"],
  ["s-c", "Appendix C Numerical checks"],
  ["s-d", "Appendix D Dynamic factors"],
  HOURLY_APPENDIX,
  SENSITIVITY_APPENDIX,
  ["s-3", METHODS_APPENDIX_TITLE],
];

function entry(anchor: string, title: string, nested: readonly Trusted[] = []): Trusted {
  const list = nested.length === 0 ? html`` : html`<ol class="contents-outputs">${nested}</ol>`;
  return html`<li><a href="#${anchor}">${title}</a>${list}</li>`;
}

function renderContents(ctx: RenderContext, roomParts: number): Trusted {
  const docs = ctx.input.model.documents.map((doc, i) => {
    const title = documentTitle(doc);
    const file = title.fromHeading
      ? html`
        <span class="file-name">${doc.path}</span>
      `
      : html``;
    const outputs = contentsOutputs(doc, ctx).map((o) =>
      entry(o.anchor, o.title, o.nested.map((n) => entry(n.anchor, n.title)))
    );
    const list = outputs.length === 0 ? html`` : html`<ol class="contents-outputs">${outputs}</ol>`;
    return html`<li><a href="#${documentAnchor(i)}">${title.text}</a>${file}${list}</li>`;
  });
  const study = ctx.input.results.sensitivity;
  const sensitivity = study === undefined ? html`` : entry(SENSITIVITY_ANCHOR, "Sensitivity study", [
    ...Object.keys(study.constructions).map((id) =>
      entry(sensitivityAnchor(ctx.constructionAnchors.get(id) ?? id), `Construction ${id}`)
    ),
    ...Object.keys(study.scenarios).map((id) =>
      entry(sensitivityAnchor(ctx.scenarioAnchors.get(id) ?? id), `Design day ${id}`)
    ),
  ]);
  const summary = ctx.input.results.summary === undefined ? html`` : entry("s-summary", "Summary of results");
  const absent = new Set<string>();
  if (!hasHourlyAppendix(ctx, roomParts)) absent.add(HOURLY_APPENDIX[0]);
  if (ctx.input.results.sensitivity === undefined) absent.add(SENSITIVITY_APPENDIX[0]);
  const ownSections = OWN_SECTIONS.filter(([id]) => !absent.has(id));
  return html`
    <nav class="contents" aria-label="Contents">
      <h2>Contents</h2>
      <p
        class="muted">The project's files come first, in build order, each under its own first heading with the file name in small print; the tool's output follows each input block. The package's own sections come after them, unnumbered, so the numbers in the project's headings are the only section numbers.</p>
      <ol>${summary}${docs}${sensitivity}${ownSections.map(([id, title]) => entry(id, title))}</ol>
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
  const rooms = (input.model.rooms ?? []).length > 0;
  const css = html`${
    packageCss({ left: headerLeft, right: status }, watermarkFor(info.status))
  }${APPENDIX_CSS}${rooms ? ROOM_CSS : html``}`;
  const roomParts = roomHourlyParts(ctx, hourlyScenarioParts(ctx) + 1);
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
    ${renderContents(ctx, roomParts.length)}
    <main>
    ${renderCalculationSection(ctx)}
    ${renderChecksSection(ctx)}
    ${renderAssumptionsSection(ctx)}
    ${renderMaterialsSection(ctx)}
    ${renderCautionsSection(
      input,
      outsideFilmCautions(
        input.results.scenarios,
        (w) => filmCoefficientText(ctx.display, w),
      ),
    )}
    ${renderSourcesSection(ctx)}
    ${renderRevisionSection(ctx)}
    ${renderReproducibilitySection(ctx)}
    ${renderInputsAppendix(ctx)}
    ${renderResultsAppendix(ctx)}
    ${renderChecksAppendix(ctx)}
    ${renderFactorsAppendix(ctx)}
    ${renderHourlyAppendix(ctx, roomParts)}
    ${renderSensitivityAppendix(ctx)}
    ${renderMethodSection(ctx, renderScopeSection(ctx.display))}
    </main>
    ${endMarker(input)}
      </body>
    </html>
  `;
  return `<!doctype html>\n${page.markup.trim()}\n`;
}
