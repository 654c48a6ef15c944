/** What the benchmarks that run the launcher share: its path, a PATH that makes it take this Deno, a median. */
import { fileURLToPath } from "node:url";

/** bin/fluxnote of this repository. */
export const LAUNCHER = fileURLToPath(new URL("../bin/fluxnote", import.meta.url));

/** PATH with this Deno first, so the launcher takes it as the pinned one. */
export const PATH_WITH_THIS_DENO = [Deno.execPath().replace(/\/[^/]*$/, ""), Deno.env.get("PATH") ?? ""].join(
  ":",
);

/** The median (the mean of the middle two of an even count). */
export function median(values: readonly number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  const mid = Math.floor(sorted.length / 2);
  return sorted.length % 2 === 1 ? sorted[mid]! : (sorted[mid - 1]! + sorted[mid]!) / 2;
}
