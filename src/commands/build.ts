import { join } from "node:path";
import { formatDiagnostic } from "../project/diagnostic.ts";
import { formatPosition } from "../project/position.ts";
import { renderPackage } from "../report/package.ts";
import { computeProject } from "../results/buildResults.ts";
import type { ResultsJson } from "../results/types.ts";
import { constructionsCsv } from "./csv.ts";
import { loadProject } from "./loadProject.ts";
import { type OutputFile, writeOutputSet } from "./writeOutput.ts";
import { TOOL_VERSION } from "../version.ts";

/** What the build command needs from its surroundings (so tests can run it without a terminal). */
export interface CommandIo {
  stdout(line: string): void;
  stderr(line: string): void;
}

export interface BuildOptions {
  readonly project: string;
  readonly out?: string;
  /** Test hook: called after rendering, before the output set is swapped in. */
  readonly beforeSwap?: () => void;
}

/** Builds a project into package.html, results.json and csv/; returns the exit code. */
export async function runBuild(options: BuildOptions, io: CommandIo): Promise<number> {
  const loaded = await loadProject(options.project);
  for (const d of loaded.diagnostics) io.stderr(formatDiagnostic(d));
  if (loaded.model === undefined) {
    io.stderr(
      `build stopped: ${
        loaded.diagnostics.filter((d) => d.severity === "error").length
      } error(s); nothing was written`,
    );
    return 1;
  }
  const outcome = computeProject(loaded.model, loaded.inputRecords);
  if (!outcome.ok) {
    for (const d of outcome.diagnostics) io.stderr(formatDiagnostic(d));
    io.stderr(
      `build stopped: ${outcome.diagnostics.length} construction(s) cannot be computed; nothing was written`,
    );
    return 1;
  }
  const computed = outcome.computed;
  const results: ResultsJson = {
    ...computed.results,
    warnings: loaded.diagnostics.filter((d) => d.severity !== "error").map((d) => ({
      at: formatPosition(d.at),
      message: d.message,
    })),
  };
  for (const w of computed.results.warnings) io.stderr(`${w.at}: warning: ${w.message}`);
  const resultsJsonText = `${JSON.stringify(results, null, 2)}\n`;
  const page = renderPackage({
    model: loaded.model,
    results,
    inputFiles: loaded.files,
    libraryEntries: loaded.library,
    findings: loaded.diagnostics,
    toolVersion: TOOL_VERSION,
    runtimeVersion: `Deno ${Deno.version.deno}`,
    resultsJsonText,
  });
  const encoder = new TextEncoder();
  const files: OutputFile[] = [
    { path: "package.html", bytes: encoder.encode(page) },
    { path: "results.json", bytes: encoder.encode(resultsJsonText) },
    { path: "csv/constructions.csv", bytes: encoder.encode(constructionsCsv(loaded.model, results)) },
  ];
  const outDir = options.out ?? join(options.project, "out");
  await writeOutputSet(outDir, files, options.beforeSwap);
  const failed = results.checks.filter((c) => !c.pass);
  io.stdout(
    `wrote ${
      join(outDir, "package.html")
    }, results.json and csv/ (${loaded.model.constructions.length} constructions)`,
  );
  if (failed.length > 0) {
    io.stderr(`${failed.length} computed check(s) failed; see the package cover`);
    return 1;
  }
  return 0;
}
