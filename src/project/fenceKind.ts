/**
 * Fence info strings that are almost a block kind. Only the exact words `material`, `construction`
 * and `scenario` open an input block; a near miss (a typo, capitals, a plural, a language word in
 * front, an invisible character) would otherwise turn the block into prose in silence, and the
 * package would say "0 constructions".
 */

import { editDistance } from "./suggest.ts";

/** Zero-width, direction-control, soft-hyphen and byte-order-mark characters. */
const INVISIBLE = /[\u00AD\u061C\u180E\u200B-\u200F\u202A-\u202E\u2060-\u2064\u2066-\u2069\uFEFF]/g;
/** Words shorter than this are only matched exactly (after case, plural and invisibles). */
const MIN_TYPO_LENGTH = 5;
/** Edit distance accepted as a typo; "construction" → "constuction" is 1, "scenario" → "senario" is 1. */
const MAX_TYPO_DISTANCE = 2;

/** A near miss: the block kind meant and what is wrong with the info string as written. */
export interface NearKind {
  readonly kind: string;
  readonly reason: string;
}

/**
 * The block kind that `info` (the whole info string after the fence characters) almost names, or
 * undefined when it names none: ```` ```ts ````, ```` ```yaml ```` or ```` ```text ```` stay code.
 */
export function nearBlockKind(info: string, kinds: readonly string[]): NearKind | undefined {
  // Only the first two words: a language word may stand before the kind (`yaml construction`); later
  // words are free text such as a title.
  const words = info.trim().split(/\s+/).filter((w) => w !== "").slice(0, 2);
  for (const [index, written] of words.entries()) {
    const near = nearWord(written, kinds);
    if (near === undefined) continue;
    if (index > 0) {
      return { kind: near.kind, reason: `the info string starts with "${words[0]}", not with the kind` };
    }
    return near;
  }
  return undefined;
}

function nearWord(written: string, kinds: readonly string[]): NearKind | undefined {
  const visible = written.replace(INVISIBLE, "");
  const word = visible.replace(/^[{.]+|[}]+$/g, "");
  const lower = word.toLowerCase();
  for (const kind of kinds) {
    if (written === kind) return { kind, reason: "" };
    if (visible !== written && (lower === kind || singular(lower) === kind)) {
      return { kind, reason: `it holds an invisible character (${invisibleCodes(written)})` };
    }
    if (word === kind) return { kind, reason: "only the bare word opens a block" };
    if (lower === kind) return { kind, reason: "block kinds are written in lower case" };
    if (singular(lower) === kind) {
      return {
        kind,
        reason: word === lower ? "block kinds are singular" : "block kinds are lower-case and singular",
      };
    }
  }
  if (lower.length < MIN_TYPO_LENGTH || !/^[a-z-]+$/.test(lower)) return undefined;
  let best: { kind: string; distance: number } | undefined;
  for (const kind of kinds) {
    const distance = Math.min(editDistance(lower, kind), editDistance(singular(lower), kind));
    if (distance <= MAX_TYPO_DISTANCE && (best === undefined || distance < best.distance)) {
      best = { kind, distance };
    }
  }
  return best === undefined ? undefined : { kind: best.kind, reason: "it is not spelled as a block kind" };
}

function singular(word: string): string {
  return word.endsWith("s") ? word.slice(0, -1) : word;
}

function invisibleCodes(text: string): string {
  const codes = [...text].filter((ch) => ch.replace(INVISIBLE, "") === "")
    .map((ch) => `U+${(ch.codePointAt(0) ?? 0).toString(16).toUpperCase().padStart(4, "0")}`);
  return [...new Set(codes)].join(", ");
}
