import type { Model } from "../project/model.ts";
import type { InputFileRecord } from "../results/types.ts";
import type { FileChange } from "./types.ts";

function proseOf(model: Model, path: string): string | undefined {
  const doc = model.documents.find((d) => d.path === path);
  if (doc === undefined) return undefined;
  return doc.segments.flatMap((s) =>
    s.kind === "prose" && s.markdown.trim() !== "" ? [s.markdown.trim()] : []
  )
    .join("\n\n");
}

/**
 * Lists the input files (Markdown, data files, built-in library entries) that were added, removed or
 * whose bytes changed, by comparing their SHA-256; for a changed document, says whether its prose changed.
 */
export function compareFiles(
  a: { readonly model: Model; readonly records: readonly InputFileRecord[] },
  b: { readonly model: Model; readonly records: readonly InputFileRecord[] },
): FileChange[] {
  const oldHash = new Map(a.records.map((r) => [r.path, r.sha256]));
  const newPaths = new Set(b.records.map((r) => r.path));
  const out: FileChange[] = [];
  for (const r of b.records) {
    const before = oldHash.get(r.path);
    if (before === r.sha256) continue;
    if (before === undefined) {
      out.push({ path: r.path, status: "added", proseChanged: null });
      continue;
    }
    const oldProse = proseOf(a.model, r.path);
    const newProse = proseOf(b.model, r.path);
    const proseChanged = oldProse === undefined || newProse === undefined ? null : oldProse !== newProse;
    out.push({ path: r.path, status: "changed", proseChanged });
  }
  for (const r of a.records) {
    if (!newPaths.has(r.path)) out.push({ path: r.path, status: "removed", proseChanged: null });
  }
  return out;
}
