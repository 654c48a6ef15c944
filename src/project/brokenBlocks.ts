/**
 * Ids of input blocks that have errors of their own. A block that fails is reported once, at its
 * own error; what refers to it by id (a construction naming a broken material, a scenario naming a
 * broken construction) must not add "Unknown …" errors, still less a "did you mean" that points at
 * another entry with other properties.
 */

import type { InputBlockKind, SplitFile } from "./blocks.ts";

const ID = /^[A-Za-z0-9][A-Za-z0-9._-]{0,63}$/;
/** An `id:` line at the left margin of a block body, for blocks whose YAML did not parse. */
const RAW_ID_LINE = /^id:[ \t]*(["']?)([A-Za-z0-9][A-Za-z0-9._-]{0,63})\1[ \t]*(?:#.*)?$/m;

/** Every readable id of the blocks of `kind`, whether or not the block itself has errors. */
export function writtenIds(files: readonly SplitFile[], kind: InputBlockKind): Set<string> {
  const ids = new Set<string>();
  for (const file of files) {
    for (const piece of file.pieces) {
      if (piece.kind !== "input" || piece.blockKind !== kind) continue;
      const id = piece.value === undefined ? rawId(piece.raw) : parsedId(piece.value);
      if (id !== undefined) ids.add(id);
    }
  }
  return ids;
}

/** The ids written in blocks of `kind` that were not read successfully. */
export function brokenIds(
  files: readonly SplitFile[],
  kind: InputBlockKind,
  read: ReadonlySet<string>,
): Set<string> {
  const broken = new Set<string>();
  for (const id of writtenIds(files, kind)) if (!read.has(id)) broken.add(id);
  return broken;
}

type Parsed = NonNullable<Extract<SplitFile["pieces"][number], { kind: "input" }>["value"]>;

function parsedId(value: Parsed): string | undefined {
  if (value.kind !== "map") return undefined;
  const entry = value.entries.find((e) => e.key === "id");
  if (entry?.value.kind !== "scalar") return undefined;
  const text = typeof entry.value.value === "string" ? entry.value.value : entry.value.text;
  return ID.test(text) ? text : undefined;
}

function rawId(raw: string): string | undefined {
  // The fence lines themselves never match: they start with ``` or ~~~.
  return RAW_ID_LINE.exec(raw)?.[2];
}
