import { sha256Hex } from "../archive/hash.ts";
import { type Diagnostic, error, hasErrors, sortDiagnostics } from "../project/diagnostic.ts";
import { diskProjectFs, type ProjectFs } from "../project/projectFs.ts";
import type { Model } from "../project/model.ts";
import { type InputFile, MAX_WEATHER_BYTES, readDataFile, readProject } from "../project/readProject.ts";
import {
  BUILT_IN_LIBRARY,
  type LibrarySource,
  type LibraryUse,
  resolveProject,
} from "../project/resolveProject.ts";
import type { InputFileRecord } from "../results/types.ts";
import { placeholderFindings } from "../review/placeholderRules.ts";

/** A project read and resolved, ready to compute, or the diagnostics that stopped it. */
export interface LoadedProject {
  readonly model?: Model;
  readonly files: readonly InputFile[];
  readonly library: readonly (LibraryUse & { readonly sha256: string })[];
  /** Input records in build order: the files, then the library entries used. */
  readonly inputRecords: readonly InputFileRecord[];
  readonly diagnostics: readonly Diagnostic[];
  /** Texts of the data files the scenarios name (weather CSVs), by project path, LF line ends. */
  readonly dataTexts: ReadonlyMap<string, string>;
}

/** Reads and resolves a project folder; every diagnostic of both stages is collected and sorted. */
export async function loadProject(
  folder: string | ProjectFs,
  librarySource: LibrarySource = BUILT_IN_LIBRARY,
): Promise<LoadedProject> {
  const fs = typeof folder === "string" ? await diskProjectFs(folder) : folder;
  if (fs === undefined) {
    // The folder itself is the place (line 0: no line of any file), not a project.md that is not there.
    const at = { file: String(folder), line: 0, col: 0 };
    const problem = error(
      at,
      "no-project",
      "Cannot open the project folder: it does not exist or is not a folder; expected a folder holding project.md",
      `check the path (a relative path starts in the folder fluxnote runs in), or start a project there with: fluxnote init ${
        String(folder)
      }`,
    );
    return {
      files: [],
      library: [],
      inputRecords: [],
      diagnostics: [problem],
      dataTexts: new Map(),
    };
  }
  const read = await readProject(fs);
  if (hasErrors(read.diagnostics) || read.sources.length === 0) {
    return {
      files: read.files,
      library: [],
      inputRecords: [],
      diagnostics: sortDiagnostics(read.diagnostics),
      dataTexts: new Map(),
    };
  }
  const resolved = resolveProject(read.sources, librarySource);
  const dataProblems: Diagnostic[] = [];
  const dataFiles: InputFile[] = [];
  const dataTexts = new Map<string, string>();
  for (const scenario of resolved.model?.scenarios ?? []) {
    if (scenario.kind !== "weather" || dataTexts.has(scenario.weatherPath)) continue;
    const data = await readDataFile(
      fs,
      scenario.weatherPath,
      scenario.weatherAt,
      MAX_WEATHER_BYTES,
      dataProblems,
    );
    if (data === undefined) continue;
    dataFiles.push(data.file);
    dataTexts.set(scenario.weatherPath, data.text);
  }
  const diagnostics = sortDiagnostics([
    ...read.diagnostics,
    ...resolved.diagnostics,
    ...dataProblems,
    ...placeholderFindings(read.sources),
  ]);
  const library = resolved.libraryUsed.map((entry) => ({ ...entry, sha256: sha256Hex(entry.canonical) }));
  const inputRecords: InputFileRecord[] = [
    ...[...read.files, ...dataFiles].map((f) => ({ path: f.path, sha256: f.sha256 })),
    ...library.map((entry) => ({ path: `builtin-library/${entry.id}`, sha256: entry.sha256 })),
  ];
  const base = { files: [...read.files, ...dataFiles], library, inputRecords, diagnostics, dataTexts };
  return resolved.model === undefined || hasErrors(diagnostics) ? base : { ...base, model: resolved.model };
}
