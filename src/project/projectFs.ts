import { isAbsolute, join, relative, sep } from "node:path";

/** Where a project's files come from: a folder on disk, or the inputs embedded in a package. */
export interface ProjectFs {
  /** A name for messages (the folder's base name). */
  readonly label: string;
  /**
   * Checks that `path` (POSIX, relative) stays inside the project and exists; containment by path
   * components. A failure may carry its own hint.
   */
  locate(path: string): Promise<{ ok: true; key: string } | { ok: false; reason: string; hint?: string }>;
  /** Size in bytes of a located regular file, or undefined when it is not a regular file. */
  regularFileSize(key: string): Promise<number | undefined>;
  /** The file's bytes; a file that cannot be read (gone, no permission) throws `FileReadError`. */
  read(key: string): Promise<Uint8Array>;
  /** Names of the `*.md` files at the top of the project, unsorted. */
  listMarkdown(): Promise<string[]>;
}

/** A located file that could not be read after all (removed meanwhile, no permission, an I/O error). */
export class FileReadError extends Error {
  constructor(readonly reason: string) {
    super(reason);
    this.name = "FileReadError";
  }
}

/** Why reading failed, in the words of a diagnostic (`Cannot read "x": <reason>`). */
function readFailure(cause: unknown): FileReadError {
  if (cause instanceof Deno.errors.NotFound) return new FileReadError("it was removed while being read");
  if (cause instanceof Deno.errors.PermissionDenied) {
    return new FileReadError("permission denied (the file is not readable by this user)");
  }
  if (cause instanceof Deno.errors.NotCapable) return new FileReadError("this run is not allowed to read it");
  if (cause instanceof Deno.errors.IsADirectory) return new FileReadError("it is not a regular file");
  const message = cause instanceof Error ? cause.message : String(cause);
  return new FileReadError(`it cannot be read (${message.replace(/\s*\(os error \d+\).*$/s, "")})`);
}

/** Rejects absolute paths, drive letters and `..` components before any lookup. */
export function lexicallyInside(path: string): boolean {
  return path !== "" && !isAbsolute(path) && !/^[A-Za-z]:/.test(path) && !path.startsWith("\\") &&
    !path.split(/[\\/]/).includes("..");
}

/** A project folder on disk; symbolic links are resolved before the containment test. */
export async function diskProjectFs(folder: string): Promise<ProjectFs | undefined> {
  let root: string;
  try {
    root = await Deno.realPath(folder);
    if (!(await Deno.stat(root)).isDirectory) return undefined;
  } catch (cause) {
    // A run without read permission is told so (one line from the CLI), not that the folder is missing.
    if (cause instanceof Deno.errors.NotCapable) throw cause;
    return undefined;
  }
  return {
    label: root.split(sep).pop() ?? folder,
    async locate(path) {
      if (!lexicallyInside(path)) return { ok: false, reason: "it is absolute or leaves the project folder" };
      let real: string;
      try {
        real = await Deno.realPath(join(root, path));
      } catch {
        // The name may exist as a link whose target is missing or loops back: say so, not "does not exist".
        const isLink = await Deno.lstat(join(root, path)).then((i) => i.isSymlink, () => false);
        return {
          ok: false,
          reason: isLink
            ? "it is a link that cannot be followed (a loop, or a link to nothing)"
            : "it does not exist",
        };
      }
      const rel = relative(root, real);
      if (rel === "" || rel.split(sep)[0] === ".." || isAbsolute(rel)) {
        return { ok: false, reason: "it resolves (through a link) to a place outside the project folder" };
      }
      // A hard link is the same file under a second name, which may be outside the project: no path
      // test can tell, so a regular file with more than one link is refused.
      const links = await Deno.lstat(real).then((i) => (i.isFile ? i.nlink ?? 1 : 1), () => 1);
      if (links > 1) {
        return {
          ok: false,
          reason:
            `it is a hard link (the file has ${links} names, and another may be outside the project folder)`,
          hint: "copy the file into the project folder instead of linking it (cp, not ln)",
        };
      }
      return { ok: true, key: real };
    },
    async regularFileSize(key) {
      try {
        const info = await Deno.stat(key);
        return info.isFile ? info.size : undefined;
      } catch (cause) {
        throw readFailure(cause);
      }
    },
    read: (key) =>
      Deno.readFile(key).catch((cause) => {
        throw readFailure(cause);
      }),
    async listMarkdown() {
      const names: string[] = [];
      try {
        for await (const entry of Deno.readDir(root)) if (entry.name.endsWith(".md")) names.push(entry.name);
      } catch (cause) {
        throw readFailure(cause);
      }
      return names;
    },
  };
}

/** A project held in memory (e.g. the inputs embedded in a package), keyed by POSIX path. */
export function memoryProjectFs(label: string, files: ReadonlyMap<string, Uint8Array>): ProjectFs {
  return {
    label,
    locate(path) {
      if (!lexicallyInside(path)) {
        return Promise.resolve({ ok: false, reason: "it is absolute or leaves the project folder" });
      }
      const key = path.replaceAll("\\", "/").replace(/^\.\//, "");
      return Promise.resolve(files.has(key) ? { ok: true, key } : { ok: false, reason: "it does not exist" });
    },
    regularFileSize: (key) => Promise.resolve(files.get(key)?.length),
    read: (key) => Promise.resolve(files.get(key) ?? new Uint8Array()),
    listMarkdown: () =>
      Promise.resolve([...files.keys()].filter((p) => !p.includes("/") && p.endsWith(".md"))),
  };
}
