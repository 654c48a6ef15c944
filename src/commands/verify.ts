import { compareJson } from "../archive/compareJson.ts";
import { extractPackage } from "../archive/extract.ts";
import { inputsHash } from "../archive/hash.ts";
import type { LibraryMaterial } from "../materials/libraryMaterial.ts";
import { oneLine, shortenValues } from "../project/displayText.ts";
import { memoryProjectFs } from "../project/projectFs.ts";
import { libraryWith } from "../project/resolveProject.ts";
import type { ResultsJson } from "../results/types.ts";
import { TOOL_VERSION } from "../version.ts";
import type { CommandIo } from "./build.ts";
import { loadProject } from "./loadProject.ts";
import { printDiagnostics, produceOutputs } from "./produce.ts";

/** Relative tolerance for numbers when the package was made by another version. */
export const CROSS_VERSION_TOLERANCE = 1e-9;
const MAX_LISTED = 20;

/** Re-runs the inputs embedded in a package and compares; 0 reproduces, 1 does not, 2 not a package. */
export async function runVerify(packagePath: string, io: CommandIo): Promise<number> {
  let pageText: string;
  try {
    pageText = new TextDecoder("utf-8", { fatal: true }).decode(await Deno.readFile(packagePath));
  } catch (cause) {
    io.stderr(
      `fluxnote verify: cannot read "${packagePath}": ${
        cause instanceof Error ? cause.message : String(cause)
      }`,
    );
    return 2;
  }
  const extracted = extractPackage(pageText);
  if (!extracted.ok) {
    io.stderr(`fluxnote verify: "${packagePath}" is not a fluxnote package: ${extracted.reason}`);
    return 2;
  }
  const contents = extracted.contents;
  const problems: string[] = contents.tampered.map((item) =>
    `embedded ${item}: its bytes do not match the SHA-256 written beside it`
  );
  let embedded: ResultsJson;
  try {
    embedded = JSON.parse(contents.resultsJsonText) as ResultsJson;
  } catch {
    io.stderr(
      `fluxnote verify: the embedded results of "${packagePath}" are not valid JSON: the package was edited`,
    );
    return 1;
  }
  const records = embedded.inputs?.files ?? [];
  if (inputsHash(records) !== embedded.inputs?.sha256) {
    problems.push("the whole-input SHA-256 does not match the list of input hashes");
  }
  const library: LibraryMaterial[] = contents.library.map((entry) =>
    JSON.parse(entry.canonical) as LibraryMaterial
  );
  const loaded = await loadProject(memoryProjectFs("embedded inputs", contents.files), libraryWith(library));
  const produced = produceOutputs(loaded);
  if (!produced.ok) {
    printDiagnostics(produced.diagnostics, io.stderr);
    io.stderr("fluxnote verify: the embedded inputs no longer build with this version");
    return 1;
  }
  const rerun = produced.outputs;
  const sameVersion = contents.toolVersion === TOOL_VERSION;
  io.stdout(`package made by fluxnote ${contents.toolVersion}; re-run with fluxnote ${TOOL_VERSION}`);
  io.stdout(`inputs: ${records.length} records, SHA-256 ${embedded.inputs.sha256}`);
  if (rerun.results.inputs.sha256 !== embedded.inputs.sha256) {
    problems.push(
      `the embedded inputs hash to ${rerun.results.inputs.sha256}, not to the ${embedded.inputs.sha256} recorded`,
    );
  }
  if (sameVersion) {
    if (rerun.resultsJsonText !== contents.resultsJsonText) {
      problems.push(`results differ: ${firstDifference(contents.resultsJsonText, rerun.resultsJsonText)}`);
    }
    if (rerun.page !== pageText) {
      problems.push(
        `the package text differs from a fresh rendering: ${firstDifference(pageText, rerun.page)}`,
      );
    }
  } else {
    const differences = compareJson(
      stripVersion(embedded),
      stripVersion(rerun.results),
      CROSS_VERSION_TOLERANCE,
    );
    for (const d of differences.slice(0, MAX_LISTED)) {
      problems.push(
        `${d.pointer}: ${JSON.stringify(d.before)} (fluxnote ${contents.toolVersion}) → ${
          JSON.stringify(d.after)
        } (fluxnote ${TOOL_VERSION})`,
      );
    }
    if (differences.length > MAX_LISTED) {
      problems.push(`… and ${differences.length - MAX_LISTED} more differences`);
    }
  }
  if (problems.length > 0) {
    for (const p of problems) io.stderr(`${packagePath}: error: ${oneLine(shortenValues(p))}`);
    io.stderr(`NOT REPRODUCED: ${problems.length} problem(s)`);
    return 1;
  }
  io.stdout(
    sameVersion
      ? "REPRODUCED: results and package are byte-identical to a fresh build of the embedded inputs"
      : `REPRODUCED: every number agrees within ${CROSS_VERSION_TOLERANCE} relative`,
  );
  return 0;
}

function stripVersion(results: ResultsJson): unknown {
  return { ...results, tool: { name: results.tool?.name } };
}

/** Describes where two texts first differ: line number and both lines, shortened. */
export function firstDifference(before: string, after: string): string {
  const a = before.split("\n");
  const b = after.split("\n");
  for (let i = 0; i < Math.max(a.length, b.length); i++) {
    if (a[i] !== b[i]) {
      const cut = (s: string | undefined) =>
        s === undefined ? "(no line)" : JSON.stringify(s.length > 120 ? `${s.slice(0, 117)}…` : s);
      return `line ${i + 1}: package has ${cut(a[i])}, fresh build has ${cut(b[i])}`;
    }
  }
  return "the texts differ in length";
}
