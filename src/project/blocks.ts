import { type Diagnostic, error } from "./diagnostic.ts";
import { nearBlockKind } from "./fenceKind.ts";
import { findSecondFrontMatter, splitFrontMatter, splitMarkdown } from "./fences.ts";
import { describeCodePoints } from "./quantity.ts";
import type { SourceText } from "./sourceText.ts";
import { parseYamlAt, type YamlValue } from "./yamlTree.ts";

export type InputBlockKind = "material" | "construction" | "scenario" | "room";
/** The fence info words that open an input block. */
export const INPUT_KINDS: readonly InputBlockKind[] = ["material", "construction", "scenario", "room"];

/** One piece of a file in reading order, with input blocks already parsed to YAML trees. */
export type FilePiece =
  | { readonly kind: "prose"; readonly markdown: string; readonly line: number }
  | { readonly kind: "code"; readonly raw: string; readonly line: number }
  | {
    readonly kind: "input";
    readonly blockKind: InputBlockKind;
    readonly raw: string;
    readonly line: number;
    /** Parsed body, absent when it did not parse (the error is reported). */
    readonly value?: YamlValue;
  };

/** A file split into front matter and pieces. */
export interface SplitFile {
  readonly path: string;
  readonly frontMatter?: YamlValue;
  readonly pieces: readonly FilePiece[];
}

/** Splits a file into front matter and pieces and parses every input block's YAML, collecting errors. */
export function splitFile(source: SourceText, isProjectFile: boolean, out: Diagnostic[]): SplitFile {
  const split = splitFrontMatter(source.text);
  let frontMatter: YamlValue | undefined;
  if (split.unterminated) {
    out.push(
      error(
        { file: source.path, line: 1, col: 1 },
        "front-matter-unterminated",
        "Front matter opened with `---` is never closed",
        "end the front matter with a line `---`",
      ),
    );
  } else if (split.yaml !== undefined) {
    if (!isProjectFile) {
      // An error, not a warning: settings written here would be lost while the build went on.
      out.push(
        error(
          { file: source.path, line: 1, col: 1 },
          "front-matter-ignored",
          `Cannot read front matter in "${source.path}": only project.md has front matter, so these keys would be lost`,
          "move the keys into the front matter of project.md and delete the `---` block here",
        ),
      );
    } else {
      const parsed = parseYamlAt(split.yaml, source.path, split.yamlLine);
      if (parsed.ok) frontMatter = parsed.value;
      else out.push(...parsed.diagnostics);
    }
  }
  const second = findSecondFrontMatter(split.body, split.bodyLine);
  if (second !== undefined) {
    out.push(
      error(
        { file: source.path, line: second, col: 1 },
        "front-matter-second",
        split.yaml === undefined
          ? "Cannot read this `---` block of keys as front matter: front matter starts on the very first line of project.md, so it would be prose"
          : "Cannot read a second front matter block: only the first one is read, so these keys would be prose",
        isProjectFile
          ? "merge the keys into one front matter block at the top of project.md"
          : "move the keys into the front matter of project.md and delete the `---` block here",
      ),
    );
  }
  const pieces: FilePiece[] = [];
  for (const piece of splitMarkdown(split.body, split.bodyLine)) {
    if (piece.kind === "prose") {
      pieces.push(piece);
      continue;
    }
    if (!(INPUT_KINDS as readonly string[]).includes(piece.info)) {
      const near = nearBlockKind(piece.infoString, INPUT_KINDS);
      if (near !== undefined) {
        out.push(
          error(
            { file: source.path, line: piece.line, col: 1 },
            "fence-kind-misspelt",
            `Cannot read the fence \`${
              describeCodePoints(piece.infoString)
            }\` as an input block: ${near.reason}, so the block would be prose`,
            `did you mean \`${near.kind}\`? Write the kind alone after the fence, exactly \`${near.kind}\` (for an example that is not input, use another word, e.g. \`text\`)`,
          ),
        );
      }
      pieces.push({ kind: "code", raw: piece.raw, line: piece.line });
      continue;
    }
    const blockKind = piece.info as InputBlockKind;
    if (piece.body.trim() === "") {
      out.push(
        error(
          { file: source.path, line: piece.line, col: 1 },
          "empty-block",
          `The ${blockKind} block is empty`,
          `write the ${blockKind}'s keys inside the fence, starting with \`id:\``,
        ),
      );
      pieces.push({ kind: "input", blockKind, raw: piece.raw, line: piece.line });
      continue;
    }
    const parsed = parseYamlAt(piece.body, source.path, piece.bodyLine);
    if (!parsed.ok) out.push(...parsed.diagnostics);
    pieces.push(
      parsed.ok
        ? { kind: "input", blockKind, raw: piece.raw, line: piece.line, value: parsed.value }
        : { kind: "input", blockKind, raw: piece.raw, line: piece.line },
    );
  }
  return frontMatter === undefined
    ? { path: source.path, pieces }
    : { path: source.path, frontMatter, pieces };
}
