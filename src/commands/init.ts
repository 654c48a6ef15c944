import { join } from "node:path";
import type { CommandIo } from "./commandIo.ts";

/**
 * The template folder a new project is copied from. Found from two folders below the repository, where the
 * launcher's compiled copy (in .cache/) is too.
 */
export const TEMPLATE_FOLDER = new URL("../../templates/new-project/", import.meta.url);

/** Creates a new project folder from the template; refuses to touch a folder that already has files. */
export async function runInit(target: string, io: CommandIo): Promise<number> {
  const existing = await Deno.lstat(target).catch((cause) => {
    if (cause instanceof Deno.errors.NotFound) return undefined;
    throw cause;
  });
  if (existing !== undefined && !existing.isDirectory) {
    io.stderr(`fluxnote init: "${target}" already exists and is not a folder; nothing was written`);
    io.stderr("  hint: give a new folder name, e.g. fluxnote init projects/my-building");
    return 2;
  }
  try {
    const entries = [...Deno.readDirSync(target)];
    if (entries.length > 0) {
      io.stderr(`fluxnote init: "${target}" already exists and is not empty; nothing was written`);
      io.stderr("  hint: give a new folder name, e.g. fluxnote init projects/my-building");
      return 2;
    }
  } catch (cause) {
    if (!(cause instanceof Deno.errors.NotFound)) throw cause;
  }
  const names = [...Deno.readDirSync(TEMPLATE_FOLDER)].filter((e) => e.isFile && e.name.endsWith(".md")).map((
    e,
  ) => e.name).sort();
  await Deno.mkdir(target, { recursive: true });
  for (const name of names) {
    const bytes = await Deno.readFile(new URL(name, TEMPLATE_FOLDER));
    await Deno.writeFile(join(target, name), bytes, { createNew: true });
  }
  io.stdout(`created ${target} with ${names.join(", ")}`);
  io.stdout(`next: edit the files, then run: fluxnote check ${target} and fluxnote build ${target}`);
  return 0;
}
