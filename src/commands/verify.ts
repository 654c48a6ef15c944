import { compareJson } from "../archive/compareJson.ts";
import { packageResultsCopy } from "../results/packageCopy.ts";
import { checkEmbeddedResults, checkLibraryEntry } from "../archive/embeddedShape.ts";
import { extractPackage } from "../archive/extract.ts";
import { inputsHash } from "../archive/hash.ts";
import { findSignature } from "../archive/signature.ts";
import type { LibraryMaterial } from "../materials/libraryMaterial.ts";
import { oneLine, shortenValues } from "../project/displayText.ts";
import { memoryProjectFs } from "../project/projectFs.ts";
import { libraryWith } from "../project/resolveProject.ts";
import { TOOL_VERSION } from "../version.ts";
import type { CommandIo } from "./commandIo.ts";
import { loadProject } from "./loadProject.ts";
import { printDiagnostics, produceOutputs } from "./produce.ts";
import { PACKAGE_SIZE_LIMIT, readBoundedFile } from "./readBounded.ts";
import { readPublicKey } from "./signingKeys.ts";
import { type ExpectedKey, signatureProblems } from "./verifySignature.ts";

/** Relative tolerance for numbers when the package was made by another version. */
export const CROSS_VERSION_TOLERANCE = 1e-9;
const MAX_LISTED = 20;

export interface VerifyOptions {
  /** A public key file (PEM, SPKI): the package must carry a valid signature by that key. */
  readonly key?: string;
  /** Largest package read, in bytes (tests lower it). */
  readonly sizeLimit?: number;
}

/** Re-runs the inputs embedded in a package and compares; 0 reproduced, 1 not reproduced, 2 not a package. */
export async function runVerify(
  packagePath: string,
  io: CommandIo,
  options: VerifyOptions = {},
): Promise<number> {
  const refuse = (reason: string) => {
    io.stderr(`fluxnote verify: "${packagePath}" ${reason}`);
    return 2;
  };
  let expected: ExpectedKey | undefined;
  if (options.key !== undefined) {
    const key = await readPublicKey(options.key);
    if (!key.ok) {
      io.stderr(`fluxnote verify: ${key.reason}`);
      return 2;
    }
    expected = { path: options.key, ...key.key };
  }
  const read = await readBoundedFile(packagePath, options.sizeLimit ?? PACKAGE_SIZE_LIMIT);
  if (!read.ok) return refuse(`cannot be read: ${read.reason}`);
  let pageText: string;
  try {
    pageText = new TextDecoder("utf-8", { fatal: true }).decode(read.bytes);
  } catch {
    return refuse("is not a fluxnote package: it is not UTF-8 text");
  }
  const found = findSignature(pageText);
  if (found.kind === "malformed") return refuse(`is not a fluxnote package as written: ${found.reason}`);
  const unsignedPage = found.kind === "signed" ? found.unsignedPage : pageText;
  const extracted = extractPackage(unsignedPage);
  if (!extracted.ok) return refuse(`is not a fluxnote package: ${extracted.reason}`);
  const contents = extracted.contents;
  const head = checkEmbeddedResults(contents.resultsJsonText);
  if (!head.ok) return refuse(`has malformed embedded results: ${head.reason}`);
  const library: LibraryMaterial[] = [];
  for (const entry of contents.library) {
    const checked = checkLibraryEntry(entry.canonical, entry.id);
    if (!checked.ok) return refuse(`has a malformed embedded library entry "${entry.id}": ${checked.reason}`);
    library.push(checked.value);
  }
  const embedded = head.value;
  // The version comes from the embedded results; the generator mark must agree with it.
  const version = embedded.tool.version;
  const problems: string[] = contents.tampered.map((item) =>
    `embedded ${item}: its bytes do not match the SHA-256 written beside it`
  );
  if (contents.generatorVersion !== version) {
    problems.push(
      `the generator mark says "fluxnote ${contents.generatorVersion}" but the embedded results were made by ` +
        `fluxnote ${version}: the page was edited`,
    );
  }
  problems.push(...await signatureProblems(found, expected, io));
  const records = embedded.inputs.files;
  if (inputsHash(records) !== embedded.inputs.sha256) {
    problems.push("the whole-input SHA-256 does not match the list of input hashes");
  }
  const loaded = await loadProject(memoryProjectFs("embedded inputs", contents.files), libraryWith(library));
  const produced = produceOutputs(loaded);
  if (!produced.ok) {
    printDiagnostics(produced.diagnostics, io.stderr);
    io.stderr("fluxnote verify: the embedded inputs no longer build with this version");
    return 1;
  }
  const rerun = produced.outputs;
  const sameVersion = version === TOOL_VERSION;
  io.stdout(`package made by fluxnote ${version} (embedded results); re-run with fluxnote ${TOOL_VERSION}`);
  io.stdout(`inputs: ${records.length} records, SHA-256 ${embedded.inputs.sha256}`);
  if (rerun.results.inputs.sha256 !== embedded.inputs.sha256) {
    problems.push(
      `the embedded inputs hash to ${rerun.results.inputs.sha256}, not to the ${embedded.inputs.sha256} recorded`,
    );
  }
  if (sameVersion) {
    if (rerun.embeddedResultsText !== contents.resultsJsonText) {
      problems.push(
        `results differ: ${firstDifference(contents.resultsJsonText, rerun.embeddedResultsText)}`,
      );
    }
    if (rerun.page !== unsignedPage) {
      problems.push(
        `the package text differs from a fresh rendering: ${firstDifference(unsignedPage, rerun.page)}`,
      );
    }
  } else {
    const differences = crossVersionDifferences(head.parsed, rerun.results, version);
    if (differences.length === 0) {
      io.stdout(`results: every number agrees within ${CROSS_VERSION_TOLERANCE} relative with the re-run`);
    }
    problems.push(...differences);
    // An older or newer layout cannot be re-rendered here, so the visible numbers and verdicts stay unproven.
    problems.push(
      `page text not verifiable with this version: the page was laid out by fluxnote ${version}; its visible ` +
        `numbers and verdicts can only be proven by verify of fluxnote ${version}`,
    );
  }
  if (problems.length > 0) {
    for (const p of problems) io.stderr(`${packagePath}: error: ${oneLine(shortenValues(p))}`);
    io.stderr(`NOT REPRODUCED: ${problems.length} problem(s)`);
    return 1;
  }
  io.stdout("REPRODUCED: results and package are byte-identical to a fresh build of the embedded inputs");
  return 0;
}

/** Differences between embedded and re-run results beyond the cross-version tolerance, listed. */
function crossVersionDifferences(embedded: unknown, rerun: unknown, version: string): string[] {
  // Both sides in the package's form, whichever form the older package embedded: the cut tails are exact
  // expansions of the modal form, which is compared itself.
  const differences = compareJson(
    packageResultsCopy(stripVersion(embedded)),
    packageResultsCopy(stripVersion(rerun)),
    CROSS_VERSION_TOLERANCE,
  );
  const lines = differences.slice(0, MAX_LISTED).map((d) =>
    `${d.pointer}: ${JSON.stringify(d.before)} (fluxnote ${version}) → ${
      JSON.stringify(d.after)
    } (fluxnote ${TOOL_VERSION})`
  );
  if (differences.length > MAX_LISTED) {
    lines.push(`… and ${differences.length - MAX_LISTED} more differences`);
  }
  return lines;
}

function stripVersion(results: unknown): unknown {
  return { ...(results as Record<string, unknown>), tool: "(version not compared)" };
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
