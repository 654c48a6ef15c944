/**
 * The reader's two libraries, the YAML parser and marked's Markdown lexer, loaded when the reader needs them.
 * Every reader loads both at start (src/project/yamlTree.ts, src/project/fences.ts) unless
 * `deferReaderLibraries` was called first, as `fluxnote check` does: most projects are plain YAML and plain
 * Markdown that src/project/yamlSubset.ts and src/project/plainMarkdown.ts read alone, and loading the
 * libraries is the largest part of check's start-up. A deferred reader that meets a text only a library can
 * read throws `ReaderLibraryNeeded`; src/commands/check.ts then loads both and checks again.
 */
import type * as Yaml from "yaml";
import type * as Marked from "marked";

export type YamlLibrary = typeof Yaml;
export type MarkdownLibrary = typeof Marked;

let yaml: YamlLibrary | undefined;
let markdown: MarkdownLibrary | undefined;
let deferred = false;

/** Thrown by a deferred reader for a text only a library reads (load them, then read again). */
export class ReaderLibraryNeeded extends Error {
  constructor(which: string) {
    super(`the ${which} library is needed for this text and was not loaded`);
    this.name = "ReaderLibraryNeeded";
  }
}

/** Readers loaded after this call load no library until `loadReaderLibraries` is called. */
export function deferReaderLibraries(): void {
  deferred = true;
}

export function readerLibrariesDeferred(): boolean {
  return deferred;
}

/** Loads both libraries (once). */
export async function loadReaderLibraries(): Promise<void> {
  [yaml, markdown] = await Promise.all([yaml ?? import("yaml"), markdown ?? import("marked")]);
}

/** The YAML library if loaded, else throws `ReaderLibraryNeeded`. */
export function yamlLibrary(): YamlLibrary {
  if (yaml === undefined) throw new ReaderLibraryNeeded("YAML");
  return yaml;
}

/** marked if loaded, else throws `ReaderLibraryNeeded`. */
export function markdownLibrary(): MarkdownLibrary {
  if (markdown === undefined) throw new ReaderLibraryNeeded("Markdown");
  return markdown;
}
