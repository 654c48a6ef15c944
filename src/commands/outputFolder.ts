import { join } from "node:path";

/** Name of the marker file a build writes into its output folder, before any other file. */
export const OUTPUT_MARKER = ".fluxnote-output";

/** Schema of the marker file. */
export const OUTPUT_MARKER_SCHEMA = "fluxnote-output/1";

/** Largest marker read back, bytes (a marker lists the files of one set: a few kB, at scale about 100 kB). */
const MAX_MARKER_BYTES = 8 << 20;

/** Files that file browsers put into any folder they show; never the user's work. */
const FOLDER_LITTER = new Set([".DS_Store", "Thumbs.db", "desktop.ini"]);

/** What the marker records: the tool, the SHA-256 of the inputs, and every file of the set. */
export interface OutputMarker {
  readonly schema: typeof OUTPUT_MARKER_SCHEMA;
  readonly tool: string;
  readonly inputs: string;
  readonly files: readonly string[];
}

/** The marker's text (stable for the same set, so two builds of the same inputs are byte-identical). */
export function outputMarkerText(tool: string, inputs: string, files: readonly string[]): string {
  const marker: OutputMarker = { schema: OUTPUT_MARKER_SCHEMA, tool, inputs, files: [...files].sort() };
  return `${JSON.stringify(marker, null, 2)}\n`;
}

/** What stands at a path that a build or a cleanup would replace. */
export type FolderVerdict =
  | { readonly kind: "absent" }
  | { readonly kind: "replaceable"; readonly why: "empty" | "marker" | "earlier-output" }
  | { readonly kind: "refused"; readonly reason: string };

/**
 * Decides whether the folder at `path` may be replaced as a whole: only when it is absent, empty, or holds
 * a valid marker (a regular file) and nothing but the files that marker lists (plus file-browser litter).
 * An output set of a fluxnote from before the marker (package.html, results.json of schema
 * fluxnote-results/1 and csv/*.csv, nothing else) is recognised too. A link, a file or anything else is
 * refused; nothing is changed here.
 */
export async function inspectOutputFolder(path: string): Promise<FolderVerdict> {
  let info: Deno.FileInfo;
  try {
    info = await Deno.lstat(path);
  } catch (cause) {
    // A path under a file is absent too: creating its parent then fails with a one-line environment fault.
    if (cause instanceof Deno.errors.NotFound || cause instanceof Deno.errors.NotADirectory) {
      return { kind: "absent" };
    }
    throw cause;
  }
  if (info.isSymlink) {
    return refused(
      "it is a symbolic link, and fluxnote replaces an output folder as a whole, never through a link",
    );
  }
  if (info.isFile) return refused("it is a file, not a folder");
  if (!info.isDirectory) return refused("it is not a folder");
  try {
    return await inspectFolderContents(path);
  } catch (cause) {
    return refused(`its contents cannot be read (${messageOf(cause)})`);
  }
}

async function inspectFolderContents(path: string): Promise<FolderVerdict> {
  const entries = [];
  for await (const entry of Deno.readDir(path)) entries.push(entry);
  const named = entries.filter((e) => !FOLDER_LITTER.has(e.name));
  if (named.length === 0) return { kind: "replaceable", why: "empty" };
  const markerEntry = named.find((e) => e.name === OUTPUT_MARKER);
  if (markerEntry === undefined) {
    if (await isEarlierOutput(path, named)) return { kind: "replaceable", why: "earlier-output" };
    return refused(`it holds files that fluxnote did not write (no ${OUTPUT_MARKER} marker)`);
  }
  const marker = await readMarker(join(path, OUTPUT_MARKER));
  if (marker === undefined) {
    return refused(`its ${OUTPUT_MARKER} is not a marker that fluxnote writes`);
  }
  const stranger = await firstUnlisted(path, "", new Set(marker.files));
  if (stranger !== undefined) {
    return refused(`it holds "${stranger}", which is not one of the files fluxnote wrote there`);
  }
  return { kind: "replaceable", why: "marker" };
}

/** The marker at `path` if it is a regular file holding a valid marker. */
export async function readMarker(path: string): Promise<OutputMarker | undefined> {
  try {
    const info = await Deno.lstat(path);
    if (!info.isFile || info.size > MAX_MARKER_BYTES) return undefined;
    const value: unknown = JSON.parse(await Deno.readTextFile(path));
    if (typeof value !== "object" || value === null) return undefined;
    const record = value as Record<string, unknown>;
    const files = record.files;
    if (
      record.schema !== OUTPUT_MARKER_SCHEMA || typeof record.tool !== "string" ||
      typeof record.inputs !== "string" || !Array.isArray(files) || !files.every((f) => typeof f === "string")
    ) return undefined;
    return { schema: OUTPUT_MARKER_SCHEMA, tool: record.tool, inputs: record.inputs, files };
  } catch {
    return undefined;
  }
}

/** The first entry under `folder` (path relative to the set) that the marker does not list, if any. */
async function firstUnlisted(
  root: string,
  prefix: string,
  listed: ReadonlySet<string>,
): Promise<string | undefined> {
  for await (const entry of Deno.readDir(join(root, prefix))) {
    const relative = prefix === "" ? entry.name : `${prefix}/${entry.name}`;
    if (relative === OUTPUT_MARKER || FOLDER_LITTER.has(entry.name)) continue;
    if (entry.isDirectory && !entry.isSymlink) {
      if (![...listed].some((f) => f.startsWith(`${relative}/`))) return relative;
      const inner = await firstUnlisted(root, relative, listed);
      if (inner !== undefined) return inner;
    } else if (!listed.has(relative)) {
      return relative;
    }
  }
  return undefined;
}

/** An output set of a fluxnote from before the marker: package.html, results.json, csv/*.csv only. */
async function isEarlierOutput(path: string, entries: readonly Deno.DirEntry[]): Promise<boolean> {
  const kinds = new Map(entries.map((e) => [e.name, e]));
  if (![...kinds.keys()].every((n) => EARLIER_SET.has(n))) return false;
  if (!kinds.get("package.html")?.isFile || !kinds.get("results.json")?.isFile) return false;
  const csv = kinds.get("csv");
  if (csv !== undefined) {
    if (!csv.isDirectory) return false;
    for await (const entry of Deno.readDir(join(path, "csv"))) {
      if (FOLDER_LITTER.has(entry.name)) continue;
      if (!entry.isFile || !entry.name.endsWith(".csv")) return false;
    }
  }
  using file = await Deno.open(join(path, "results.json"), { read: true });
  const head = new Uint8Array(64);
  const count = await file.read(head) ?? 0;
  return new TextDecoder().decode(head.subarray(0, count)).startsWith(EARLIER_RESULTS_HEAD);
}

const EARLIER_SET = new Set(["package.html", "results.json", "csv"]);
const EARLIER_RESULTS_HEAD = '{\n  "schema": "fluxnote-results/1"';

function refused(reason: string): FolderVerdict {
  return { kind: "refused", reason };
}

function messageOf(cause: unknown): string {
  return cause instanceof Error ? cause.message : String(cause);
}
