import type { ProjectDiff } from "./types.ts";

/** Serialises the comparison as the `fluxnote-diff/1` JSON document (shape documented in types.ts). */
export function renderDiffJson(diff: ProjectDiff): string {
  return `${JSON.stringify(diff, null, 2)}\n`;
}
