import { checkLibraryEntry } from "../archive/embeddedShape.ts";
import { extractPackage } from "../archive/extract.ts";
import type { LibraryMaterial } from "../materials/libraryMaterial.ts";
import { memoryProjectFs } from "../project/projectFs.ts";
import { libraryWith } from "../project/resolveProject.ts";
import { type LoadedProject, loadProject } from "./loadProject.ts";
import { PACKAGE_SIZE_LIMIT, readBoundedFile } from "./readBounded.ts";

/** A project opened from a folder or from the inputs embedded in an issued package. */
export type OpenedProject =
  | {
    readonly ok: true;
    readonly kind: "folder" | "package";
    readonly loaded: LoadedProject;
    readonly label: string;
  }
  | { readonly ok: false; readonly reason: string };

/** Opens `path` as a project folder, or as a package.html whose embedded inputs are re-read in memory. */
export async function openProject(path: string): Promise<OpenedProject> {
  let info: Deno.FileInfo;
  try {
    info = await Deno.stat(path);
  } catch {
    return { ok: false, reason: `"${path}" does not exist` };
  }
  if (info.isDirectory) return { ok: true, kind: "folder", loaded: await loadProject(path), label: path };
  const read = await readBoundedFile(path, PACKAGE_SIZE_LIMIT);
  if (!read.ok) return { ok: false, reason: `"${path}" cannot be read as a package: ${read.reason}` };
  let text: string;
  try {
    text = new TextDecoder("utf-8", { fatal: true }).decode(read.bytes);
  } catch {
    return { ok: false, reason: `"${path}" is neither a project folder nor a UTF-8 package file` };
  }
  const extracted = extractPackage(text);
  if (!extracted.ok) return { ok: false, reason: `"${path}" is not a fluxnote package: ${extracted.reason}` };
  if (extracted.contents.tampered.length > 0) {
    return {
      ok: false,
      reason: `"${path}" was altered: ${extracted.contents.tampered.join(", ")} no longer match their hashes`,
    };
  }
  const library: LibraryMaterial[] = [];
  for (const entry of extracted.contents.library) {
    const checked = checkLibraryEntry(entry.canonical, entry.id);
    if (!checked.ok) {
      return {
        ok: false,
        reason: `"${path}" has a malformed library entry "${entry.id}": ${checked.reason}`,
      };
    }
    library.push(checked.value);
  }
  const loaded = await loadProject(memoryProjectFs(path, extracted.contents.files), libraryWith(library));
  return { ok: true, kind: "package", loaded, label: path };
}
