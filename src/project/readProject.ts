import { basename, isAbsolute, join, relative, resolve, sep } from "node:path";
import { sha256Hex } from "../archive/hash.ts";
import { type Diagnostic, error } from "./diagnostic.ts";
import type { Position } from "./position.ts";
import { readProjectFrontMatter } from "./resolveProject.ts";
import { decodeSource, type SourceText } from "./sourceText.ts";

/** A project file as read from disk: exact bytes and their hash. */
export interface InputFile {
  readonly path: string;
  readonly bytes: Uint8Array;
  readonly sha256: string;
}

export interface ReadResult {
  /** Decoded texts, project.md first, then the other files in reading order. */
  readonly sources: readonly SourceText[];
  readonly files: readonly InputFile[];
  readonly diagnostics: readonly Diagnostic[];
}

/** Largest weather file accepted, bytes. */
export const MAX_WEATHER_BYTES = 64 * 1024 * 1024;

/** Reads a data file (a weather CSV) of the project, with the same containment rules, as exact bytes and text. */
export async function readDataFile(
  folder: string,
  path: string,
  at: Position,
  maxBytes: number,
  out: Diagnostic[],
): Promise<{ file: InputFile; text: string } | undefined> {
  let root: string;
  try {
    root = await Deno.realPath(folder);
  } catch {
    return undefined;
  }
  const place = await containedPath(root, path);
  if (!place.ok) {
    out.push(
      error(
        at,
        "file-not-readable",
        `Cannot read "${path}": ${place.reason}`,
        "give the path of a file inside the project folder",
      ),
    );
    return undefined;
  }
  const info = await Deno.stat(place.full);
  if (!info.isFile) {
    out.push(
      error(
        at,
        "not-a-file",
        `Cannot read "${path}": it is not a regular file`,
        "give the path of a regular file",
      ),
    );
    return undefined;
  }
  if (info.size > maxBytes) {
    out.push(
      error(
        at,
        "file-too-large",
        `Cannot read "${path}": ${info.size} bytes is more than the limit of ${maxBytes} bytes (${
          maxBytes / 1048576
        } MiB)`,
        "shorten the file (one year of hourly rows is well under 1 MiB)",
      ),
    );
    return undefined;
  }
  const bytes = await Deno.readFile(place.full);
  const decoded = decodeSource(path, bytes);
  if (!decoded.ok) {
    out.push(error({ file: path, line: decoded.line, col: 1 }, "not-text", decoded.message, decoded.hint));
    return undefined;
  }
  return { file: { path, bytes, sha256: sha256Hex(bytes) }, text: decoded.source.text };
}

/** Largest Markdown file accepted, bytes. */
export const MAX_MARKDOWN_BYTES = 1024 * 1024;
const MAX_FILES = 200;

/** Reads a project folder: project.md, then the files its front matter lists or the other *.md files in name order. */
export async function readProject(folder: string): Promise<ReadResult> {
  const out: Diagnostic[] = [];
  const projectAt: Position = { file: "project.md", line: 1, col: 1 };
  let root: string;
  try {
    root = await Deno.realPath(folder);
    if (!(await Deno.stat(root)).isDirectory) throw new Error("not a folder");
  } catch {
    out.push(
      error(
        projectAt,
        "no-project",
        `Cannot open the project folder "${folder}": it does not exist or is not a folder`,
        "give the path of a folder that holds project.md",
      ),
    );
    return { sources: [], files: [], diagnostics: out };
  }
  const first = await readOne(root, "project.md", projectAt, out);
  if (first === undefined) return { sources: [], files: [], diagnostics: out };
  const sources: SourceText[] = [first.source];
  const files: InputFile[] = [first.file];
  const frontMatter = readProjectFrontMatter(first.source, []);
  const listed = frontMatter?.files ?? (await listMarkdown(root)).map((path) => ({ path, at: projectAt }));
  const seen = new Set(["project.md"]);
  for (const entry of listed.slice(0, MAX_FILES)) {
    const path = entry.path.replaceAll("\\", "/");
    if (seen.has(path)) continue;
    seen.add(path);
    const read = await readOne(root, path, entry.at, out);
    if (read !== undefined) {
      sources.push(read.source);
      files.push(read.file);
    }
  }
  if (listed.length > MAX_FILES) {
    out.push(
      error(
        projectAt,
        "too-many-files",
        `The project lists ${listed.length} files: at most ${MAX_FILES} are read`,
        "merge small files",
      ),
    );
  }
  return { sources, files, diagnostics: out };
}

async function listMarkdown(root: string): Promise<string[]> {
  const names: string[] = [];
  for await (const entry of Deno.readDir(root)) {
    if (entry.name.endsWith(".md") && entry.name !== "project.md" && !entry.name.startsWith(".")) {
      names.push(entry.name);
    }
  }
  return names.sort((a, b) => (a < b ? -1 : a > b ? 1 : 0));
}

/** Resolves `path` inside `root`, or explains why it is not allowed. Compares path components, not string prefixes. */
export async function containedPath(
  root: string,
  path: string,
): Promise<{ ok: true; full: string } | { ok: false; reason: string }> {
  if (path === "" || isAbsolute(path) || /^[A-Za-z]:/.test(path) || path.split("/").includes("..")) {
    return { ok: false, reason: "it is absolute or leaves the project folder" };
  }
  let real: string;
  try {
    real = await Deno.realPath(join(root, path));
  } catch {
    return { ok: false, reason: "it does not exist" };
  }
  const rel = relative(root, real);
  if (rel === "" || rel.split(sep)[0] === ".." || isAbsolute(rel)) {
    return { ok: false, reason: "it resolves (through a link) to a place outside the project folder" };
  }
  return { ok: true, full: real };
}

async function readOne(
  root: string,
  path: string,
  listedAt: Position,
  out: Diagnostic[],
): Promise<{ source: SourceText; file: InputFile } | undefined> {
  const at: Position = path === "project.md" ? listedAt : listedAt;
  const place = await containedPath(root, path);
  if (!place.ok) {
    const missingProject = path === "project.md" && place.reason === "it does not exist";
    out.push(
      error(
        at,
        missingProject ? "no-project-md" : "file-not-readable",
        missingProject
          ? `Cannot find project.md in "${basename(resolve(root))}"`
          : `Cannot read "${path}": ${place.reason}`,
        missingProject
          ? "create project.md with the front matter (title, reference, revision, status, …)"
          : "list only Markdown files inside the project folder",
      ),
    );
    return undefined;
  }
  const info = await Deno.stat(place.full);
  if (!info.isFile) {
    out.push(
      error(
        at,
        "not-a-file",
        `Cannot read "${path}": it is not a regular file`,
        "list only regular Markdown files",
      ),
    );
    return undefined;
  }
  if (info.size > MAX_MARKDOWN_BYTES) {
    out.push(
      error(
        { file: path, line: 1, col: 1 },
        "file-too-large",
        `Cannot read "${path}": ${info.size} bytes is more than the limit of ${MAX_MARKDOWN_BYTES} bytes (1 MiB)`,
        "split the file into several smaller files",
      ),
    );
    return undefined;
  }
  const bytes = await Deno.readFile(place.full);
  const decoded = decodeSource(path, bytes);
  if (!decoded.ok) {
    out.push(error({ file: path, line: decoded.line, col: 1 }, "not-text", decoded.message, decoded.hint));
    return undefined;
  }
  return { source: decoded.source, file: { path, bytes, sha256: sha256Hex(bytes) } };
}
