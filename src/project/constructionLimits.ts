/**
 * The code limits that apply to each construction: its own `limits:` (read again from the block text kept in
 * the model's documents, because the resolved `Construction` does not carry them) over the project-wide ones.
 */
import type { Diagnostic } from "./diagnostic.ts";
import { splitMarkdown } from "./fences.ts";
import { readLimits } from "./limitsSyntax.ts";
import type { LimitSpec, Model } from "./model.ts";
import { parseYamlAt } from "./yamlTree.ts";

/** Limits written on each construction block, by construction id (already validated when the block was read). */
export function ownLimits(model: Model): ReadonlyMap<string, readonly LimitSpec[]> {
  const byId = new Map<string, readonly LimitSpec[]>();
  for (const document of model.documents) {
    for (const segment of document.segments) {
      if (segment.kind !== "block" || segment.blockKind !== "construction" || segment.id === undefined) {
        continue;
      }
      if (byId.has(segment.id)) continue;
      // No `limits` text (nor an escape that could spell it in a quoted key): nothing to read again.
      if (!segment.source.includes("limits") && !segment.source.includes("\\")) continue;
      const fence = splitMarkdown(segment.source.replace(/^\n+/, ""), segment.at.line)
        .find((p) => p.kind === "fence");
      if (fence?.kind !== "fence") continue;
      const parsed = parseYamlAt(fence.body, document.path, fence.bodyLine);
      if (!parsed.ok || parsed.value.kind !== "map") continue;
      const entry = parsed.value.entries.find((e) => e.key === "limits");
      if (entry === undefined) continue;
      const ignored: Diagnostic[] = [];
      const limits = readLimits(entry.value, segment.id, "construction", ignored);
      if (limits !== undefined) byId.set(segment.id, limits);
    }
  }
  return byId;
}

/** The limits applying to one construction: its own, then each project-wide limit it does not override. */
export function limitsFor(
  own: readonly LimitSpec[] | undefined,
  project: readonly LimitSpec[] | undefined,
): readonly LimitSpec[] {
  const mine = own ?? [];
  const inherited = (project ?? []).filter((p) => !mine.some((m) => m.quantity === p.quantity));
  return [...mine, ...inherited];
}
