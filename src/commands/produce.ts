import { type Diagnostic, formatDiagnostic, sortDiagnostics } from "../project/diagnostic.ts";
import { reviewProject } from "../review/mod.ts";
import { formatPosition } from "../project/position.ts";
import { renderPackage } from "../report/package.ts";
import { computeProject } from "../results/buildResults.ts";
import { resultsJsonText } from "../results/jsonText.ts";
import { packageResultsCopy } from "../results/packageCopy.ts";
import { issueGate } from "../results/issueGate.ts";
import { buildSummary } from "../results/summary.ts";
import type { ResultsJson } from "../results/types.ts";
import { TOOL_VERSION } from "../version.ts";
import { constructionsCsv, csvOutputFiles, designDayCsv, factorsCsv } from "./csv.ts";
import { summaryCsv } from "./summaryCsv.ts";
import { CSV_LOCALES, type CsvLocaleName, DEFAULT_CSV_LOCALE } from "../tables/csvTable.ts";
import type { LoadedProject } from "./loadProject.ts";
import type { OutputFile } from "./writeOutput.ts";

/** Everything a build produces, in memory. */
export interface ProducedOutputs {
  readonly results: ResultsJson;
  readonly resultsJsonText: string;
  /** The copy package.html embeds (long response-factor series cut to their leading terms). */
  readonly embeddedResultsText: string;
  readonly page: string;
  /** The reader's and the review's findings, sorted (what the package lists). */
  readonly findings: readonly Diagnostic[];
  /** package.html, results.json and the CSV files, ready to write. */
  readonly files: readonly OutputFile[];
}

export type ProduceOutcome =
  | { readonly ok: true; readonly outputs: ProducedOutputs }
  | { readonly ok: false; readonly diagnostics: readonly Diagnostic[] };

/** The runtime named in the package (reproducibility section). */
export function runtimeVersion(): string {
  return `Deno ${Deno.version.deno}`;
}

/** The phases of a build, in order, as `produceOutputs` reports their ends (for the build-cost benchmark). */
export type ProducePhase = "compute" | "review" | "results-json" | "package-copy" | "render" | "csv";

/**
 * Computes and renders a loaded project; pure apart from reading the runtime version. The CSV files are written
 * in `csvLocale` (comma-separated with a decimal point unless told otherwise). `phaseDone` is told when each phase
 * ends (bench/marginal_build.ts times them).
 */
export function produceOutputs(
  loaded: LoadedProject,
  progress?: (message: string) => void,
  csvLocale: CsvLocaleName = DEFAULT_CSV_LOCALE,
  phaseDone: (phase: ProducePhase) => void = () => {},
): ProduceOutcome {
  if (loaded.model === undefined) return { ok: false, diagnostics: loaded.diagnostics };
  const outcome = computeProject(loaded.model, loaded.inputRecords, loaded.dataTexts, progress);
  phaseDone("compute");
  if (!outcome.ok) return { ok: false, diagnostics: outcome.diagnostics };
  const computed = outcome.computed;
  const computedResults: ResultsJson = {
    ...computed.results,
    warnings: [
      ...loaded.diagnostics.filter((d) => d.severity !== "error").map((d) => ({
        at: formatPosition(d.at),
        message: d.message,
      })),
      ...computed.results.warnings,
    ],
  };
  const findings = sortDiagnostics([...loaded.diagnostics, ...reviewProject(loaded.model, computedResults)]);
  const summary = buildSummary(loaded.model, computedResults, findings);
  const gate = issueGate(loaded.model, summary, findings);
  if (gate.some((d) => d.severity === "error")) return { ok: false, diagnostics: sortDiagnostics(gate) };
  const results: ResultsJson = {
    ...computedResults,
    warnings: [
      ...computedResults.warnings,
      ...gate.map((d) => ({ at: formatPosition(d.at), message: d.message })),
    ],
    summary,
  };
  phaseDone("review");
  progress?.("rendering the package");
  const resultsText = resultsJsonText(results);
  phaseDone("results-json");
  const embeddedResultsText = resultsJsonText(packageResultsCopy(results));
  phaseDone("package-copy");
  const page = renderPackage({
    model: loaded.model,
    results,
    inputFiles: loaded.files,
    libraryEntries: loaded.library,
    findings,
    toolVersion: TOOL_VERSION,
    runtimeVersion: runtimeVersion(),
    resultsJsonText: resultsText,
    embeddedResultsText,
  });
  phaseDone("render");
  const files: OutputFile[] = [
    { path: "package.html", text: page },
    { path: "results.json", text: resultsText },
    ...csvOutputFiles([
      constructionsCsv(loaded.model, results),
      summaryCsv(results),
      ...loaded.model.constructions.map((c) => factorsCsv(c.id, results)),
      ...loaded.model.scenarios.filter((s) => s.kind === "design-day").map((s) =>
        designDayCsv(s.id, results)
      ),
      ...computed.csvFiles,
    ], CSV_LOCALES[csvLocale]),
  ];
  phaseDone("csv");
  return {
    ok: true,
    outputs: { results, resultsJsonText: resultsText, embeddedResultsText, page, findings, files },
  };
}

/** Prints diagnostics, one per line, as the CLI contract says. */
export function printDiagnostics(list: readonly Diagnostic[], stderr: (line: string) => void): void {
  for (const d of list) stderr(formatDiagnostic(d));
}
