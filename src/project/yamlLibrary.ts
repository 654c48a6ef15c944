/**
 * The YAML library, loaded when the reader needs it. Every reader loads it at start (src/project/yamlTree.ts)
 * unless `deferYamlLibrary` was called first, as `fluxnote check` does: most projects are plain YAML that
 * src/project/yamlSubset.ts reads alone, and the library's CommonJS build is the largest part of check's
 * start-up. A deferred reader that meets a block only the library can read throws `YamlLibraryNeeded`;
 * src/commands/loadProject.ts then loads the library and reads the project again.
 */
import type * as Yaml from "yaml";

export type YamlLibrary = typeof Yaml;

let library: YamlLibrary | undefined;
let deferred = false;

/** Thrown by a deferred reader for a block only the library can read (load it, then read again). */
export class YamlLibraryNeeded extends Error {
  constructor() {
    super("the YAML library is needed for this block and was not loaded");
    this.name = "YamlLibraryNeeded";
  }
}

/** Readers loaded after this call do not load the library until `loadYamlLibrary` is called. */
export function deferYamlLibrary(): void {
  deferred = true;
}

export function yamlLibraryDeferred(): boolean {
  return deferred;
}

/** Loads the library (once). */
export async function loadYamlLibrary(): Promise<YamlLibrary> {
  library ??= await import("yaml");
  return library;
}

/** The library if loaded, else throws `YamlLibraryNeeded`. */
export function yamlLibrary(): YamlLibrary {
  if (library === undefined) throw new YamlLibraryNeeded();
  return library;
}
