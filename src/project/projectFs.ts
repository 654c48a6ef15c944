import { isAbsolute, join, relative, sep } from "node:path";

/** Where a project's files come from: a folder on disk, or the inputs embedded in a package. */
export interface ProjectFs {
  /** A name for messages (the folder's base name). */
  readonly label: string;
  /** Checks that `path` (POSIX, relative) stays inside the project and exists; containment by path components. */
  locate(path: string): Promise<{ ok: true; key: string } | { ok: false; reason: string }>;
  /** Size in bytes of a located regular file, or undefined when it is not a regular file. */
  regularFileSize(key: string): Promise<number | undefined>;
  read(key: string): Promise<Uint8Array>;
  /** Names of the `*.md` files at the top of the project, unsorted. */
  listMarkdown(): Promise<string[]>;
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
  } catch {
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
      return { ok: true, key: real };
    },
    async regularFileSize(key) {
      const info = await Deno.stat(key);
      return info.isFile ? info.size : undefined;
    },
    read: (key) => Deno.readFile(key),
    async listMarkdown() {
      const names: string[] = [];
      for await (const entry of Deno.readDir(root)) if (entry.name.endsWith(".md")) names.push(entry.name);
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
