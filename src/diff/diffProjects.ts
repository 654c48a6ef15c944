import type { Model } from "../project/model.ts";
import type { ResultsJson } from "../results/types.ts";
import { compareInputs } from "./compareInputs.ts";
import { compareRooms } from "./compareRooms.ts";
import { compareResults } from "./effects.ts";
import { compareChecks, compareVerdicts } from "./verdicts.ts";
import { compareFiles } from "./files.ts";
import { sourceLines } from "./locate.ts";
import type { ProjectDiff, SideSummary } from "./types.ts";

/** One side of a comparison: the resolved model, its results, and optionally its label and source texts. */
export interface DiffSide {
  readonly model: Model;
  readonly results: ResultsJson;
  /** How the side was named on the command line; defaults to "a" or "b". */
  readonly label?: string;
  readonly kind?: "folder" | "package";
  /** Decoded input texts by project path, used to point each change at the line of its key. */
  readonly sources?: readonly { readonly path: string; readonly text: string }[];
}

function summary(side: DiffSide, fallback: string): SideSummary {
  return {
    label: side.label ?? fallback,
    kind: side.kind ?? "folder",
    title: side.model.info.title,
    revision: side.model.info.revision,
    date: side.model.info.date,
    inputsSha256: side.results.inputs?.sha256 ?? "",
  };
}

/** Compares two revisions of a project: changed inputs with their places, changed files, and the effects on results. */
export function diffProjects(a: DiffSide, b: DiffSide): ProjectDiff {
  const inputsA = { model: a.model, lines: sourceLines(a.sources ?? []) };
  const inputsB = { model: b.model, lines: sourceLines(b.sources ?? []) };
  const changes = [...compareInputs(inputsA, inputsB), ...compareRooms(inputsA, inputsB)];
  const files = compareFiles(
    { model: a.model, records: a.results.inputs?.files ?? [] },
    { model: b.model, records: b.results.inputs?.files ?? [] },
  );
  const { effects, unchanged } = compareResults(a.results, b.results);
  const verdicts = compareVerdicts(a.results, b.results);
  const checks = compareChecks(a.results, b.results);
  return {
    schema: "fluxnote-diff/1",
    a: summary(a, "a"),
    b: summary(b, "b"),
    identical: changes.length === 0 && files.length === 0 && effects.length === 0 &&
      verdicts.length === 0 && checks.length === 0,
    verdicts,
    checks,
    files,
    changes,
    effects,
    unchangedEffects: unchanged,
  };
}
