import { basename, dirname } from "node:path";
import { diffProjects, type DiffSide } from "../diff/diffProjects.ts";
import { renderDiffJson } from "../diff/json.ts";
import { renderDiffHtml } from "../diff/page.ts";
import { renderDiffText } from "../diff/text.ts";
import { type Diagnostic, formatDiagnostic } from "../project/diagnostic.ts";
import { decodeSource } from "../project/sourceText.ts";
import { computeProject } from "../results/buildResults.ts";
import type { CommandIo } from "./commandIo.ts";
import { openProject } from "./openProject.ts";

/** The output formats of `fluxnote diff`. */
export type DiffFormat = "text" | "json" | "html";

/** Arguments of `fluxnote diff`. */
export interface DiffOptions {
  readonly a: string;
  readonly b: string;
  readonly format: DiffFormat;
  readonly out?: string;
}

type SideOutcome =
  | { readonly ok: true; readonly side: DiffSide }
  | { readonly ok: false; readonly code: 1 | 2 };

async function openSide(name: "a" | "b", path: string, io: CommandIo): Promise<SideOutcome> {
  const opened = await openProject(path);
  if (!opened.ok) {
    io.stderr(`fluxnote diff: ${name}: ${opened.reason}`);
    return { ok: false, code: 2 };
  }
  const loaded = opened.loaded;
  const report = (list: readonly Diagnostic[]) => {
    const errors = list.filter((d) => d.severity === "error");
    io.stderr(`fluxnote diff: ${name} (${path}) has ${errors.length} input error(s):`);
    for (const d of errors) io.stderr(`${name}: ${formatDiagnostic(d)}`);
  };
  if (loaded.model === undefined) {
    report(loaded.diagnostics);
    return { ok: false, code: 1 };
  }
  const computed = computeProject(loaded.model, loaded.inputRecords, loaded.dataTexts);
  if (!computed.ok) {
    report(computed.diagnostics);
    return { ok: false, code: 1 };
  }
  const sources = loaded.files.flatMap((f) => {
    const decoded = decodeSource(f.path, f.bytes);
    return decoded.ok ? [decoded.source] : [];
  });
  return {
    ok: true,
    side: {
      model: loaded.model,
      results: computed.computed.results,
      label: path,
      kind: opened.kind,
      sources,
    },
  };
}

/**
 * Why `diff --out` will not write to `path`: anything but an absent path or a regular file is refused (a
 * rename would replace a link or fail on a folder), and so is a revision being compared.
 */
async function refuseDiffTarget(path: string, revisions: readonly string[]): Promise<string | undefined> {
  let info: Deno.FileInfo;
  try {
    info = await Deno.lstat(path);
  } catch (cause) {
    if (cause instanceof Deno.errors.NotFound) return undefined;
    return `it cannot be examined (${cause instanceof Error ? cause.message : String(cause)})`;
  }
  if (info.isSymlink) return "it is a symbolic link; fluxnote replaces the file, never a link or its target";
  if (info.isDirectory) return "it is a folder, not a file";
  if (!info.isFile) return "it is not a regular file";
  const real = await Deno.realPath(path);
  for (const revision of revisions) {
    if (real === await Deno.realPath(revision).catch(() => undefined)) {
      return `it is revision "${revision}", which is being compared`;
    }
  }
  return undefined;
}

/** Writes `text` to `path` through a temporary file in the same folder and a rename, so readers never see part of it. */
async function writeAtomically(path: string, text: string, revisions: readonly string[]): Promise<void> {
  const folder = dirname(path);
  const temp = await Deno.makeTempFile({ dir: folder, prefix: `.${basename(path)}.tmp-` });
  try {
    await Deno.writeTextFile(temp, text);
    await Deno.chmod(temp, 0o644).catch(() => {});
    const refusal = await refuseDiffTarget(path, revisions);
    if (refusal !== undefined) throw new DiffOutRefused(refusal);
    await Deno.rename(temp, path);
  } catch (cause) {
    await Deno.remove(temp).catch(() => {});
    throw cause;
  }
}

class DiffOutRefused extends Error {}

/**
 * Compares two revisions (folders or package.html files); 0 whether or not they differ, 1 input errors or an
 * --out it will not replace, 2 not a package.
 */
export async function runDiff(options: DiffOptions, io: CommandIo): Promise<number> {
  const revisions = [options.a, options.b];
  const refused = (reason: string) => {
    io.stderr(`fluxnote diff: refusing to write to "${options.out}": ${reason}; nothing was written`);
    io.stderr("  hint: give --out a new file name or an existing regular file to replace");
    return 1;
  };
  if (options.out !== undefined) {
    const refusal = await refuseDiffTarget(options.out, revisions);
    if (refusal !== undefined) return refused(refusal);
  }
  const a = await openSide("a", options.a, io);
  const b = await openSide("b", options.b, io);
  if (!a.ok || !b.ok) return Math.max(a.ok ? 0 : a.code, b.ok ? 0 : b.code);
  const diff = diffProjects(a.side, b.side);
  const text = options.format === "json"
    ? renderDiffJson(diff)
    : options.format === "html"
    ? renderDiffHtml(diff)
    : `${renderDiffText(diff)}\n`;
  if (options.out === undefined) {
    io.stdout(text.replace(/\n$/, ""));
    return 0;
  }
  try {
    await writeAtomically(options.out, text, revisions);
  } catch (cause) {
    if (cause instanceof DiffOutRefused) return refused(cause.message);
    io.stderr(
      `fluxnote diff: cannot write "${options.out}": ${
        cause instanceof Error ? cause.message : String(cause)
      }`,
    );
    return 2;
  }
  io.stdout(
    `wrote ${options.out} (${diff.identical ? "no differences" : `${diff.changes.length} input change(s)`})`,
  );
  return 0;
}
