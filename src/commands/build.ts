import { join } from "node:path";
import { loadProject } from "./loadProject.ts";
import { printDiagnostics, produceOutputs } from "./produce.ts";
import { readSigner, signOutputFiles } from "./signOutputs.ts";
import { writeOutputSet } from "./writeOutput.ts";

/** What a command needs from its surroundings (so tests can run it without a terminal). */
export interface CommandIo {
  stdout(line: string): void;
  stderr(line: string): void;
}

export interface BuildOptions {
  readonly project: string;
  readonly out?: string;
  /** A private key file (PEM, PKCS#8 Ed25519): package.html is signed with it. */
  readonly sign?: string;
  /** Test hook: called after rendering, before the output set is swapped in. */
  readonly beforeSwap?: () => void;
}

/** Builds a project into package.html, results.json and csv/; returns the exit code. */
export async function runBuild(options: BuildOptions, io: CommandIo): Promise<number> {
  const signer = options.sign === undefined ? undefined : await readSigner(options.sign);
  if (signer !== undefined && !signer.ok) {
    io.stderr(`fluxnote build: ${signer.reason}; nothing was written`);
    return 2;
  }
  const loaded = await loadProject(options.project);
  printDiagnostics(loaded.diagnostics, io.stderr);
  // Progress goes to stderr only when a person watches it (a terminal), never into logs or pipes.
  const progress = Deno.stderr.isTerminal() ? (message: string) => io.stderr(`… ${message}`) : undefined;
  const produced = produceOutputs(loaded, progress);
  if (!produced.ok) {
    if (loaded.model !== undefined) printDiagnostics(produced.diagnostics, io.stderr);
    const count = produced.diagnostics.filter((d) => d.severity === "error").length;
    io.stderr(`build stopped: ${count} error(s); nothing was written`);
    return 1;
  }
  const { results } = produced.outputs;
  const files = signer === undefined
    ? produced.outputs.files
    : await signOutputFiles(produced.outputs, signer.key, io);
  for (const w of results.warnings.slice(loaded.diagnostics.filter((d) => d.severity !== "error").length)) {
    io.stderr(`${w.at}: warning: ${w.message}`);
  }
  const outDir = options.out ?? join(options.project, "out");
  await writeOutputSet(outDir, files, options.beforeSwap);
  io.stdout(
    `wrote ${join(outDir, "package.html")}, results.json and csv/ (${
      loaded.model?.constructions.length ?? 0
    } constructions, ${Object.keys(results.scenarios).length} scenarios)`,
  );
  const failed = results.checks.filter((c) => !c.pass);
  if (failed.length > 0) {
    for (const c of failed) {
      io.stderr(`${c.subject}: error: computed check ${c.id} failed: ${c.value} > ${c.limit}`);
    }
    io.stderr(`${failed.length} computed check(s) failed; the package shows them on its cover`);
    return 1;
  }
  return 0;
}
