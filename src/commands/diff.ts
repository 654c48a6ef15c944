import { basename, dirname } from "node:path";
import { diffProjects, type DiffSide } from "../diff/diffProjects.ts";
import { renderDiffJson } from "../diff/json.ts";
import { renderDiffHtml } from "../diff/page.ts";
import { renderDiffText } from "../diff/text.ts";
import { type Diagnostic, formatDiagnostic } from "../project/diagnostic.ts";
import { decodeSource } from "../project/sourceText.ts";
import { computeProject } from "../results/buildResults.ts";
import type { CommandIo } from "./build.ts";
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

/** Writes `text` to `path` through a temporary file in the same folder and a rename, so readers never see part of it. */
async function writeAtomically(path: string, text: string): Promise<void> {
  const folder = dirname(path);
  const temp = await Deno.makeTempFile({ dir: folder, prefix: `.${basename(path)}.tmp-` });
  try {
    await Deno.writeTextFile(temp, text);
    await Deno.chmod(temp, 0o644).catch(() => {});
    await Deno.rename(temp, path);
  } catch (cause) {
    await Deno.remove(temp).catch(() => {});
    throw cause;
  }
}

/** Compares two revisions (folders or package.html files); 0 whether or not they differ, 1 input errors, 2 not a package. */
export async function runDiff(options: DiffOptions, io: CommandIo): Promise<number> {
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
    await writeAtomically(options.out, text);
  } catch (cause) {
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
