/** The data `renderPackage` turns into the calculation package, and shared rendering context. */
import type { Diagnostic } from "../../project/diagnostic.ts";
import type { Model } from "../../project/model.ts";
import type { ResultsJson } from "../../results/types.ts";
import { type DisplayUnits, displayUnitsFor } from "./displayUnits.ts";
import { sha256Hex, utf8Length } from "../../archive/hash.ts";

/** One input file of the project with its exact bytes and SHA-256 (hex). */
export interface InputFile {
  readonly path: string;
  readonly sha256: string;
  readonly bytes: Uint8Array;
}

/** A built-in library entry the project used: its canonical serialisation and SHA-256 (hex). */
export interface LibraryEntry {
  readonly id: string;
  readonly canonical: string;
  readonly sha256: string;
}

/**
 * Everything the package shows. Steady-state figures are read from `results.constructions`,
 * so the printed numbers are the ones embedded in Appendix B.
 */
export interface PackageInput {
  readonly model: Model;
  readonly results: ResultsJson;
  readonly inputFiles: readonly InputFile[];
  readonly libraryEntries: readonly LibraryEntry[];
  readonly findings: readonly Diagnostic[];
  readonly toolVersion: string;
  /** The runtime with its name, e.g. `Deno 2.9.6` (printed as given). */
  readonly runtimeVersion: string;
  /** The exact text written as results.json. */
  readonly resultsJsonText: string;
  /** The text the package embeds: results.json with long response-factor series cut (`packageResultsCopy`). */
  readonly embeddedResultsText: string;
}

/** Ids and anchors shared by the sections of one rendering. */
export interface RenderContext {
  readonly input: PackageInput;
  /** Display units chosen from the front matter's `units:`; results.json stays SI. */
  readonly display: DisplayUnits;
  /** Ids used by prose headings (`u-` prefix). */
  readonly proseIds: Set<string>;
  /** Fragment id of each construction's output, `c-` prefix. */
  readonly constructionAnchors: ReadonlyMap<string, string>;
  /** Fragment id of each scenario's computed output, `sc-` prefix. */
  readonly scenarioAnchors: ReadonlyMap<string, string>;
  /** Scenario ids whose output is already placed (a repeated block id then points back to it). */
  readonly placedScenarios: Set<string>;
  /** results.json's SHA-256 (hex) and UTF-8 length, taken once per rendering (several sections print them). */
  readonly resultsDigest: { readonly sha256: string; readonly bytes: number };
}

function anchorsFor(ids: readonly string[], prefix: string, fallback: string): Map<string, string> {
  const anchors = new Map<string, string>();
  const used = new Set<string>();
  for (const rawId of ids) {
    const slug = rawId.toLowerCase().replace(/[^a-z0-9]+/g, "-").replace(/^-+|-+$/g, "") || fallback;
    let id = `${prefix}-${slug}`;
    for (let n = 2; used.has(id); n++) id = `${prefix}-${slug}-${n}`;
    used.add(id);
    if (!anchors.has(rawId)) anchors.set(rawId, id);
  }
  return anchors;
}

/** Builds the rendering context: deterministic, collision-free anchors for constructions and scenarios. */
export function makeRenderContext(input: PackageInput): RenderContext {
  return {
    input,
    display: displayUnitsFor(input.model.info.units),
    proseIds: new Set<string>(),
    constructionAnchors: anchorsFor(input.model.constructions.map((c) => c.id), "c", "construction"),
    scenarioAnchors: anchorsFor(input.model.scenarios.map((s) => s.id), "sc", "scenario"),
    placedScenarios: new Set<string>(),
    resultsDigest: { sha256: sha256Hex(input.resultsJsonText), bytes: utf8Length(input.resultsJsonText) },
  };
}

/** True when every computed check passed. */
export function allChecksPass(input: PackageInput): boolean {
  return input.results.checks.every((c) => c.pass);
}
