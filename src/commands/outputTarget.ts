import { sep } from "node:path";
import { inspectOutputFolder } from "./outputFolder.ts";

/** Why `build` will not write to an output folder, with what the user can do instead. */
export interface TargetRefusal {
  readonly reason: string;
  readonly hint: string;
}

/** Hint for a folder fluxnote did not write (also when that is found only just before the swap). */
export const NOT_OURS_HINT = "give --out a new or empty folder, or the output folder of an earlier build; " +
  "fluxnote never deletes what it did not write, so move or remove it yourself if it is no longer needed";

const HOLDS_PROJECT_HINT =
  "give --out a folder that does not hold the project, or leave --out off to write " +
  "to <project>/out";

/**
 * Checks, before anything is computed, that `out` may receive the output set of `project`: never the
 * project folder or a folder that holds it (compared as real paths, so `..` and links cannot hide it), and
 * otherwise only an absent or empty folder or one that fluxnote wrote. Reads only; changes nothing.
 */
export async function refuseBuildTarget(project: string, out: string): Promise<TargetRefusal | undefined> {
  const realOut = await realPathOrUndefined(out);
  const realProject = await realPathOrUndefined(project);
  if (realOut !== undefined && realProject !== undefined) {
    if (realOut === realProject) {
      return { reason: "it is the project folder itself", hint: HOLDS_PROJECT_HINT };
    }
    if (realProject.startsWith(realOut.endsWith(sep) ? realOut : `${realOut}${sep}`)) {
      return { reason: `it holds the project folder "${project}"`, hint: HOLDS_PROJECT_HINT };
    }
  }
  const verdict = await inspectOutputFolder(out);
  if (verdict.kind !== "refused") return undefined;
  return { reason: verdict.reason, hint: NOT_OURS_HINT };
}

async function realPathOrUndefined(path: string): Promise<string | undefined> {
  try {
    return await Deno.realPath(path);
  } catch {
    return undefined;
  }
}
