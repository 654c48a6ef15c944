import { sha256Hex } from "../archive/hash.ts";
import { type Diagnostic, error } from "./diagnostic.ts";
import type { Position } from "./position.ts";
import { FileReadError, type ProjectFs } from "./projectFs.ts";
import { readProjectFrontMatter } from "./resolveProject.ts";
import { decodeSource, type SourceText } from "./sourceText.ts";

/** A project file as read: exact bytes and their hash. */
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

/** Largest Markdown file accepted, bytes. */
export const MAX_MARKDOWN_BYTES = 1024 * 1024;
/** Largest weather file accepted, bytes. */
export const MAX_WEATHER_BYTES = 64 * 1024 * 1024;
const MAX_FILES = 200;

/** Reads a project: project.md, then the files its front matter lists or the other *.md files in name order. */
export async function readProject(fs: ProjectFs): Promise<ReadResult> {
  const out: Diagnostic[] = [];
  const projectAt: Position = { file: "project.md", line: 1, col: 1 };
  const first = await readOne(fs, "project.md", projectAt, MAX_MARKDOWN_BYTES, out);
  if (first === undefined) return { sources: [], files: [], diagnostics: out };
  const sources: SourceText[] = [first.source];
  const files: InputFile[] = [first.file];
  const frontMatter = readProjectFrontMatter(first.source, []);
  const listed = frontMatter?.files ??
    (await listMarkdown(fs, projectAt, out)).filter((name) => name !== "project.md" && !name.startsWith("."))
      .sort((a, b) => (a < b ? -1 : a > b ? 1 : 0)).map((path) => ({ path, at: projectAt }));
  // Files already read, by located key (the real path on disk), so `./a.md` or a link to a.md is not read twice.
  const seen = new Map<string, string>();
  const projectPlace = await fs.locate("project.md");
  if (projectPlace.ok) seen.set(projectPlace.key, "project.md");
  for (const entry of listed.slice(0, MAX_FILES)) {
    const path = entry.path.replaceAll("\\", "/");
    const place = await fs.locate(path);
    const earlier = place.ok ? seen.get(place.key) : undefined;
    if (earlier !== undefined) {
      out.push(
        error(
          entry.at,
          "file-listed-twice",
          earlier === "project.md"
            ? `Cannot read "${path}" again: it is project.md, which is always read first`
            : `Cannot read "${path}" again: it is the same file as "${earlier}"`,
          "list each file once (a link to a file counts as that file)",
        ),
      );
      continue;
    }
    if (place.ok) seen.set(place.key, path);
    const read = await readOne(fs, path, entry.at, MAX_MARKDOWN_BYTES, out);
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

/** Reads a data file (a weather CSV) of the project with the same containment rules, as exact bytes and text. */
export async function readDataFile(
  fs: ProjectFs,
  path: string,
  at: Position,
  maxBytes: number,
  out: Diagnostic[],
): Promise<{ file: InputFile; text: string } | undefined> {
  const read = await readOne(fs, path, at, maxBytes, out);
  return read === undefined ? undefined : { file: read.file, text: read.source.text };
}

async function readOne(
  fs: ProjectFs,
  path: string,
  at: Position,
  maxBytes: number,
  out: Diagnostic[],
): Promise<{ source: SourceText; file: InputFile } | undefined> {
  const place = await fs.locate(path);
  if (!place.ok) {
    const missingProject = path === "project.md" && place.reason === "it does not exist";
    out.push(
      missingProject
        ? error(
          at,
          "no-project-md",
          `Cannot find project.md in "${fs.label}"`,
          "create project.md with the front matter (title, reference, revision, status, …)",
        )
        : error(
          at,
          "file-not-readable",
          `Cannot read "${path}": ${place.reason}`,
          place.hint ??
            (path.endsWith(".md")
              ? "list only Markdown files inside the project folder"
              : "give the path of a file inside the project folder"),
        ),
    );
    return undefined;
  }
  try {
    return await readLocated(fs, path, place.key, at, maxBytes, out);
  } catch (cause) {
    // The file was there a moment ago (a save in progress, a removal) or cannot be read by this user.
    if (!(cause instanceof FileReadError)) throw cause;
    out.push(
      error(
        at,
        "file-not-readable",
        `Cannot read "${path}": ${cause.reason}`,
        "check the file and run again",
      ),
    );
    return undefined;
  }
}

/** The names of the project's top-level Markdown files; a folder that cannot be listed is reported. */
async function listMarkdown(fs: ProjectFs, at: Position, out: Diagnostic[]): Promise<string[]> {
  try {
    return await fs.listMarkdown();
  } catch (cause) {
    if (!(cause instanceof FileReadError)) throw cause;
    out.push(
      error(
        at,
        "folder-not-readable",
        `Cannot list the files of the project folder "${fs.label}": ${cause.reason}`,
        "list the files in the front matter (files: [...]) or check the folder",
      ),
    );
    return [];
  }
}

async function readLocated(
  fs: ProjectFs,
  path: string,
  key: string,
  at: Position,
  maxBytes: number,
  out: Diagnostic[],
): Promise<{ source: SourceText; file: InputFile } | undefined> {
  const place = { key };
  const size = await fs.regularFileSize(place.key);
  if (size === undefined) {
    out.push(
      error(at, "not-a-file", `Cannot read "${path}": it is not a regular file`, "list only regular files"),
    );
    return undefined;
  }
  if (size > maxBytes) {
    out.push(
      error(
        { file: path, line: 1, col: 1 },
        "file-too-large",
        `Cannot read "${path}": ${size} bytes is more than the limit of ${maxBytes} bytes (${
          maxBytes / 1048576
        } MiB)`,
        path.endsWith(".md")
          ? "split the file into several smaller files"
          : "shorten the file (a year of hourly rows is well under 1 MiB)",
      ),
    );
    return undefined;
  }
  const bytes = await fs.read(place.key);
  const decoded = decodeSource(path, bytes);
  if (!decoded.ok) {
    const hint = path.endsWith(".md")
      ? decoded.hint
      : "save the file as UTF-8 CSV text, e.g. exported as 'CSV UTF-8'";
    out.push(error({ file: path, line: decoded.line, col: 1 }, "not-text", decoded.message, hint));
    return undefined;
  }
  return { source: decoded.source, file: { path, bytes, sha256: sha256Hex(bytes) } };
}
