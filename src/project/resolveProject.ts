import { canonicalLibraryEntry, findLibraryMaterial, libraryIds } from "../materials/library.ts";
import { isResistiveLibraryMaterial, type LibraryMaterial } from "../materials/libraryMaterial.ts";
import { defaultSurfaceResistances } from "../materials/surfaceResistance.ts";
import { INPUT_KINDS, type SplitFile, splitFile } from "./blocks.ts";
import { brokenIds } from "./brokenBlocks.ts";
import { type ConstructionDraft, type MaterialLookup, readConstructionBlock } from "./constructionBlock.ts";
import { type Diagnostic, error, errorCount } from "./diagnostic.ts";
import { findFenceProblems, splitFrontMatter } from "./fences.ts";
import { type FrontMatter, readFrontMatter } from "./frontMatter.ts";
import { readMaterialBlock } from "./materialBlock.ts";
import { boundProseNesting } from "./proseNesting.ts";
import type {
  Assumption,
  Construction,
  HeatingScenario,
  MaterialDef,
  Model,
  ProjectDocument,
  Scenario,
  Segment,
} from "./model.ts";
import { formatPosition, type Position } from "./position.ts";
import { readRooms, roomReferences } from "./roomBlock.ts";
import { checkRoomSeriesReferences } from "./radiantTimeSeriesBlock.ts";
import { readScenarioBlock } from "./scenarioBlock.ts";
import type { SourceText } from "./sourceText.ts";
import { parseYamlAt } from "./yamlTree.ts";

/** A built-in library entry a project used, with its canonical text (hashed with the inputs). */
export interface LibraryUse {
  readonly id: string;
  readonly canonical: string;
}

export interface ResolveResult {
  readonly model?: Model;
  readonly libraryUsed: readonly LibraryUse[];
  readonly diagnostics: readonly Diagnostic[];
}

const DEFAULT_TIMESTEP_S = 3600;

/** Where library materials are looked up: the built-in library, or the entries embedded in a package. */
export interface LibrarySource {
  find(id: string): LibraryMaterial | undefined;
  ids(): readonly string[];
}

/** The library shipped with this version. */
export const BUILT_IN_LIBRARY: LibrarySource = { find: findLibraryMaterial, ids: libraryIds };

/** A library made of given entries first (e.g. embedded in a package), then the built-in ones. */
export function libraryWith(entries: readonly LibraryMaterial[]): LibrarySource {
  const byId = new Map(entries.map((e) => [e.id, e]));
  return {
    find: (id) => byId.get(id) ?? findLibraryMaterial(id),
    ids: () => [...new Set([...byId.keys(), ...libraryIds()])],
  };
}

/** Reads the front matter of `project.md` only (to learn the file list before the other files are read). */
export function readProjectFrontMatter(source: SourceText, out: Diagnostic[]): FrontMatter | undefined {
  const split = splitFrontMatter(source.text);
  if (split.unterminated || split.yaml === undefined) return undefined;
  const parsed = parseYamlAt(split.yaml, source.path, split.yamlLine);
  return parsed.ok ? readFrontMatter(parsed.value, out) : undefined;
}

/** Resolves a project's decoded files (project.md first, then in reading order) into a model. */
export function resolveProject(
  sources: readonly SourceText[],
  library: LibrarySource = BUILT_IN_LIBRARY,
): ResolveResult {
  const out: Diagnostic[] = [];
  const bounded = sources.map((s) => boundProseNesting(s, out));
  const fenceOut: Diagnostic[] = [];
  const files = bounded.map((s, i) => {
    const file = splitFile(s, i === 0, out);
    fenceOut.push(...fenceProblems(s)); // right after the split, which lexed the same body
    return file;
  });
  out.push(...fenceOut);
  const projectFile = files[0];
  let frontMatter: FrontMatter | undefined;
  if (projectFile?.frontMatter === undefined && splitFrontMatter(sources[0]?.text ?? "").yaml === undefined) {
    out.push(
      error(
        { file: "project.md", line: 1, col: 1 },
        "front-matter-missing",
        "project.md has no front matter",
        "start project.md with `---`, the keys title, reference, revision, status, prepared-by, checked-by, date, units, then `---`",
      ),
    );
  } else if (projectFile?.frontMatter !== undefined) {
    frontMatter = readFrontMatter(projectFile.frontMatter, out);
  }
  const assumptions: Assumption[] = [];
  const materials = readMaterials(files, out, assumptions, library);
  const libraryUsed = new Map<string, LibraryMaterial>();
  const brokenMaterials = brokenIds(files, "material", new Set(materials.keys()));
  const lookup: MaterialLookup = {
    find(id) {
      if (brokenMaterials.has(id)) return undefined;
      const own = materials.get(id);
      if (own !== undefined) return own;
      const entry = library.find(id);
      if (entry === undefined) return undefined;
      libraryUsed.set(id, entry);
      return fromLibrary(entry);
    },
    ids: () => [...materials.keys(), ...library.ids()],
    isBroken: (id) => brokenMaterials.has(id),
  };
  const constructions = readConstructions(files, lookup, out, assumptions);
  // A scenario naming a construction that has errors (reported at the construction) adds no error of its own.
  const constructionIds = constructions.map((c) => c.id);
  const brokenConstructions = brokenIds(files, "construction", new Set(constructionIds));
  const allConstructionIds = [...constructionIds, ...brokenConstructions];
  const heatingScenarios: HeatingScenario[] = [];
  const scenarios = readScenarios(files, allConstructionIds, out, heatingScenarios);
  const rooms = readRooms(
    files,
    roomReferences(files, allConstructionIds, [...scenarios, ...heatingScenarios]),
    out,
  );
  const roomIds = rooms.map((r) => r.id);
  checkRoomSeriesReferences(scenarios, roomIds, brokenIds(files, "room", new Set(roomIds)), out);
  for (const entry of [...libraryUsed.values()].sort((a, b) => a.id < b.id ? -1 : 1)) {
    assumptions.push({
      id: `library:material:${entry.id}`,
      text: `Material "${entry.id}" (${entry.name}) taken from the built-in library: ${
        describeLibrary(entry)
      }`,
      source: entry.source,
      at: firstUse(constructions, entry.id),
    });
  }
  const libraryList = [...libraryUsed.values()].sort((a, b) => a.id < b.id ? -1 : 1)
    .map((m) => ({ id: m.id, canonical: canonicalLibraryEntry(m) }));
  if (errorCount(out) > 0 || frontMatter === undefined) return { diagnostics: out, libraryUsed: libraryList };
  const usedMaterials: MaterialDef[] = [
    ...materials.values(),
    ...[...libraryUsed.values()].filter((m) => !materials.has(m.id)).map(fromLibrary),
  ];
  const model: Model = {
    info: frontMatter.info,
    documents: files.map(toDocument),
    materials: usedMaterials,
    constructions,
    scenarios,
    assumptions,
    ...(heatingScenarios.length === 0 ? {} : { heatingScenarios }),
    ...(rooms.length === 0 ? {} : { rooms }),
  };
  return { model, diagnostics: out, libraryUsed: libraryList };
}

/** Input fences that would otherwise be misread in silence: never closed, or nested in a list, quote or indented code. */
function fenceProblems(source: SourceText): Diagnostic[] {
  const split = splitFrontMatter(source.text);
  return findFenceProblems(split.body, split.bodyLine, INPUT_KINDS).map((p) =>
    p.kind === "unterminated"
      ? error(
        { file: source.path, line: p.line, col: p.col },
        "fence-unterminated",
        `The ${p.info} block opened here with ${p.fence} is never closed, so it would run to the end of the file`,
        `end the block with a line ${p.fence} right after its last key`,
      )
      : error(
        { file: source.path, line: p.line, col: p.col },
        "fence-nested",
        `The ${p.info} block here is inside a list, a quote or indented text, so it would not be read as input`,
        "start the fence line at the left margin, with a blank line before it (or use another info word if it is only an example)",
      )
  );
}

function readMaterials(
  files: readonly SplitFile[],
  out: Diagnostic[],
  assumptions: Assumption[],
  library: LibrarySource,
): Map<string, MaterialDef> {
  const materials = new Map<string, MaterialDef>();
  for (const piece of inputs(files, "material")) {
    const material = readMaterialBlock(piece.value, out);
    if (material === undefined) continue;
    const earlier = materials.get(material.id);
    if (earlier !== undefined) {
      out.push(duplicate("material", material.id, material.at, earlier.at));
      continue;
    }
    const libraryEntry = library.find(material.id);
    if (libraryEntry !== undefined) {
      assumptions.push({
        id: `override:library-material:${material.id}`,
        text:
          `The project's material "${material.id}" replaces the built-in library entry of the same id (${libraryEntry.name})`,
        source: material.source === "" ? "project block (no source given)" : material.source,
        at: formatPosition(material.at),
      });
    }
    materials.set(material.id, material);
  }
  return materials;
}

function readConstructions(
  files: readonly SplitFile[],
  lookup: MaterialLookup,
  out: Diagnostic[],
  assumptions: Assumption[],
): Construction[] {
  const constructions: Construction[] = [];
  for (const piece of inputs(files, "construction")) {
    let usesBroken = false;
    const tracking: MaterialLookup = {
      ...lookup,
      isBroken(id) {
        const broken = lookup.isBroken?.(id) === true;
        if (broken) usesBroken = true;
        return broken;
      },
    };
    const draft = readConstructionBlock(piece.value, tracking, out);
    // A layer that names a broken material is left out silently; the construction is then broken too.
    if (draft === undefined || usesBroken) continue;
    const earlier = constructions.find((c) => c.id === draft.id);
    if (earlier !== undefined) {
      out.push(duplicate("construction", draft.id, draft.at, earlier.at));
      continue;
    }
    constructions.push(withDefaults(draft, assumptions));
  }
  return constructions;
}

function withDefaults(draft: ConstructionDraft, assumptions: Assumption[]): Construction {
  const at = formatPosition(draft.at);
  const heatFlow = draft.heatFlow ?? "horizontal";
  if (draft.heatFlow === undefined) {
    assumptions.push({
      id: `default:heat-flow:${draft.id}`,
      text:
        `Heat-flow direction of ${draft.id} not given: horizontal assumed (a wall); set \`heat-flow\` for roofs and floors`,
      source: "fluxnote default",
      at,
    });
  }
  const defaults = defaultSurfaceResistances(heatFlow);
  if (draft.insideResistance === undefined) {
    assumptions.push({
      id: `default:inside-surface-resistance:${draft.id}`,
      text:
        `Inside surface resistance of ${draft.id}: R_si = ${defaults.insideM2KPerW} m²·K/W for ${heatFlow} heat flow`,
      source: defaults.source,
      at,
    });
  }
  if (draft.outsideResistance === undefined) {
    assumptions.push({
      id: `default:outside-surface-resistance:${draft.id}`,
      text: `Outside surface resistance of ${draft.id}: R_se = ${defaults.outsideM2KPerW} m²·K/W`,
      source: defaults.source,
      at,
    });
  }
  if (draft.timestepS === undefined) {
    assumptions.push({
      id: `default:timestep:${draft.id}`,
      text: `Time step of ${draft.id} not given: 1 h used for its dynamic response`,
      source: "fluxnote default",
      at,
    });
  }
  return {
    id: draft.id,
    name: draft.name,
    layers: draft.layers,
    heatFlow,
    outsideResistance: draft.outsideResistance ?? defaults.outsideM2KPerW,
    outsideResistanceDefaulted: draft.outsideResistance === undefined,
    insideResistance: draft.insideResistance ?? defaults.insideM2KPerW,
    insideResistanceDefaulted: draft.insideResistance === undefined,
    timestepS: draft.timestepS ?? DEFAULT_TIMESTEP_S,
    at: draft.at,
  };
}

function readScenarios(
  files: readonly SplitFile[],
  constructionIds: readonly string[],
  out: Diagnostic[],
  heating: HeatingScenario[] = [],
): Scenario[] {
  const scenarios: Scenario[] = [];
  for (const piece of inputs(files, "scenario")) {
    const scenario = readScenarioBlock(piece.value, constructionIds, out);
    if (scenario === undefined) continue;
    const earlier = [...scenarios, ...heating].find((s) => s.id === scenario.id);
    if (earlier !== undefined) out.push(duplicate("scenario", scenario.id, scenario.at, earlier.at));
    else if (scenario.kind === "heating") heating.push(scenario);
    else scenarios.push(scenario);
  }
  return scenarios;
}

function* inputs(files: readonly SplitFile[], kind: "material" | "construction" | "scenario") {
  for (const file of files) {
    for (const piece of file.pieces) {
      if (piece.kind === "input" && piece.blockKind === kind && piece.value !== undefined) {
        yield { ...piece, value: piece.value };
      }
    }
  }
}

function duplicate(kind: string, id: string, at: Position, earlier: Position): Diagnostic {
  return error(
    at,
    "duplicate-id",
    `Duplicate ${kind} id "${id}": already defined at ${formatPosition(earlier)}`,
    `rename one of the two ${kind}s or delete the copy`,
  );
}

function fromLibrary(entry: LibraryMaterial): MaterialDef {
  const at = { file: "(built-in library)", line: 1, col: 1 };
  const common = {
    id: entry.id,
    name: entry.name,
    origin: "library" as const,
    source: entry.source,
    materialClass: entry.materialClass,
    at,
  };
  return isResistiveLibraryMaterial(entry) ? { ...common, resistance: entry.resistance } : {
    ...common,
    conductivity: entry.conductivity,
    density: entry.density,
    specificHeat: entry.specificHeat,
  };
}

function describeLibrary(entry: LibraryMaterial): string {
  return isResistiveLibraryMaterial(entry)
    ? `R = ${entry.resistance} m²·K/W`
    : `λ = ${entry.conductivity} W/(m·K), ρ = ${entry.density} kg/m³, c = ${entry.specificHeat} J/(kg·K)`;
}

function firstUse(constructions: readonly Construction[], materialId: string): string {
  for (const c of constructions) {
    const layer = c.layers.find((l) => l.materialId === materialId);
    if (layer !== undefined) return formatPosition(layer.at);
  }
  return "(built-in library)";
}

function toDocument(file: SplitFile): ProjectDocument {
  const segments: Segment[] = [];
  for (const piece of file.pieces) {
    const at = { file: file.path, line: piece.line, col: 1 };
    switch (piece.kind) {
      case "prose":
        segments.push({ kind: "prose", markdown: piece.markdown, at });
        break;
      case "code":
        segments.push({ kind: "prose", markdown: piece.raw, at });
        break;
      case "input": {
        const id = idOf(piece.value);
        segments.push(
          id === undefined
            ? { kind: "block", blockKind: piece.blockKind, source: piece.raw, at }
            : { kind: "block", blockKind: piece.blockKind, id, source: piece.raw, at },
        );
        break;
      }
    }
  }
  return { path: file.path, segments };
}

function idOf(value: SplitFile["frontMatter"]): string | undefined {
  if (value?.kind !== "map") return undefined;
  const entry = value.entries.find((e) => e.key === "id");
  return entry?.value.kind === "scalar" && typeof entry.value.value === "string"
    ? entry.value.value
    : undefined;
}
