import { join } from "node:path";
import { loadProject } from "./loadProject.ts";
import { printDiagnostics, produceOutputs } from "./produce.ts";
import { NOT_OURS_HINT, refuseBuildTarget } from "./outputTarget.ts";
import { readSigner, signOutputFiles } from "./signOutputs.ts";
import { OutputRefused, writeOutputSet } from "./writeOutput.ts";
import { TOOL_VERSION } from "../version.ts";
import { type PaperSize, renderPdf } from "./pdf.ts";
import type { OutputFile } from "./writeOutput.ts";
import type { CsvLocaleName } from "../tables/csvTable.ts";

export type { CommandIo } from "./commandIo.ts";
import type { CommandIo } from "./commandIo.ts";
import { writeStyled } from "./terminalIo.ts";
import { buildStatusLines } from "./buildStatus.ts";

export interface BuildOptions {
  readonly project: string;
  readonly out?: string;
  /** A private key file (PEM, PKCS#8 Ed25519): package.html is signed with it. */
  readonly sign?: string;
  /** Also print package.pdf through the local Chromium (this path, or Debian's when absent). */
  readonly pdf?: boolean;
  readonly chromiumPath?: string;
  /** The CSV dialect (`build --csv-locale`); comma-separated with a decimal point when absent. */
  readonly csvLocale?: CsvLocaleName;
  /** Print errors only: no progress, warnings, "wrote" line or status block. */
  readonly quiet?: boolean;
  /** Test hook: called after rendering, before the output set is swapped in. */
  readonly beforeSwap?: () => void | Promise<void>;
  /** Test hook: called when the old output set has been moved aside, before the new one is put in place. */
  readonly afterRetire?: () => void | Promise<void>;
}

/** Builds a project into package.html, results.json and csv/; returns the exit code. */
export async function runBuild(options: BuildOptions, io: CommandIo): Promise<number> {
  const outDir = options.out ?? join(options.project, "out");
  const refusal = await refuseBuildTarget(options.project, outDir);
  if (refusal !== undefined) {
    io.stderr(`fluxnote build: refusing to write to "${outDir}": ${refusal.reason}; nothing was written`);
    io.stderr(`  hint: ${refusal.hint}`);
    return 1;
  }
  const signer = options.sign === undefined ? undefined : await readSigner(options.sign);
  if (signer !== undefined && !signer.ok) {
    io.stderr(`fluxnote build: ${signer.reason}; nothing was written`);
    return 2;
  }
  const quiet = options.quiet === true;
  const loaded = await loadProject(options.project);
  printDiagnostics(
    quiet ? loaded.diagnostics.filter((d) => d.severity === "error") : loaded.diagnostics,
    io.stderr,
  );
  // Progress goes to stderr only when a person watches it (a terminal), never into logs or pipes.
  const progress = Deno.stderr.isTerminal() && !quiet
    ? (message: string) => io.stderr(`… ${message}`)
    : undefined;
  const produced = produceOutputs(loaded, progress, options.csvLocale);
  if (!produced.ok) {
    if (loaded.model !== undefined) {
      printDiagnostics(
        quiet ? produced.diagnostics.filter((d) => d.severity === "error") : produced.diagnostics,
        io.stderr,
      );
    }
    const count = produced.diagnostics.filter((d) => d.severity === "error").length;
    io.stderr(`build stopped: ${count} error(s); nothing was written`);
    return 1;
  }
  const { results } = produced.outputs;
  const signed = signer === undefined
    ? produced.outputs.files
    : await signOutputFiles(produced.outputs, signer.key, io);
  const files = options.pdf === true
    ? await withPdf(signed, loaded.model?.info.paper ?? "A4", options.chromiumPath)
    : signed;
  if (typeof files === "string") {
    io.stderr(`fluxnote build: ${files}; nothing was written`);
    return 1;
  }
  const computedWarnings = results.warnings.slice(
    loaded.diagnostics.filter((d) => d.severity !== "error").length,
  );
  if (!quiet) { for (const w of computedWarnings) io.stderr(`${w.at}: warning: ${w.message}`); }
  try {
    await writeOutputSet(outDir, files, { tool: `fluxnote ${TOOL_VERSION}`, inputs: results.inputs.sha256 }, {
      ...(options.beforeSwap === undefined ? {} : { beforeSwap: options.beforeSwap }),
      ...(options.afterRetire === undefined ? {} : { afterRetire: options.afterRetire }),
    });
  } catch (cause) {
    if (!(cause instanceof OutputRefused)) throw cause;
    io.stderr(`fluxnote build: ${cause.message}; nothing was written`);
    io.stderr(`  hint: ${NOT_OURS_HINT}`);
    return 1;
  }
  const failed = results.checks.filter((c) => !c.pass);
  if (!quiet) {
    io.stdout(
      `wrote ${join(outDir, "package.html")}${
        options.pdf === true ? ", package.pdf" : ""
      }, results.json and csv/ (${loaded.model?.constructions.length ?? 0} constructions, ${
        Object.keys(results.scenarios).length + Object.keys(results.heating ?? {}).length
      } scenarios${roomCount(results.rooms)})`,
    );
    const output = join(outDir, "package.html");
    const status = { results, findings: produced.outputs.findings, computedWarnings, output };
    for (const line of buildStatusLines(status)) writeStyled(io, line);
  }
  if (failed.length > 0) {
    for (const c of failed) {
      io.stderr(`${c.subject}: error: computed check ${c.id} failed: ${c.value} > ${c.limit}`);
    }
    io.stderr(`${failed.length} computed check(s) failed; the package shows them on its cover`);
    return 1;
  }
  return 0;
}

/** The output set with package.pdf printed from its package.html, or why it cannot be printed. */
async function withPdf(
  files: readonly OutputFile[],
  paper: PaperSize,
  chromiumPath: string | undefined,
): Promise<readonly OutputFile[] | string> {
  const page = files.find((f) => f.path === "package.html");
  if (page === undefined || !("text" in page)) return "package.html was not produced, so no package.pdf";
  const pdf = await renderPdf(page.text, paper, chromiumPath);
  return pdf.ok ? [...files, { path: "package.pdf", bytes: pdf.bytes }] : pdf.reason;
}

/** ", 1 room" / ", 2 rooms" after the scenario count, nothing without rooms. */
function roomCount(rooms: Readonly<Record<string, unknown>> | undefined): string {
  const n = Object.keys(rooms ?? {}).length;
  return n === 0 ? "" : `, ${n} room${n === 1 ? "" : "s"}`;
}
