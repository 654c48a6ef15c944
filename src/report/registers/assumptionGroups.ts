/**
 * Groups the assumptions register: one row per default kind and statement, with an "applies to" list, so a
 * default used by many surfaces is stated once. Every assumption id and position stays in the list.
 */

/** One assumption as recorded in results.json. */
export interface AssumptionRecord {
  readonly id: string;
  readonly text: string;
  readonly source: string;
  readonly at: string;
}

/** One register row: the kind, one statement, its source and every subject it applies to. */
export interface AssumptionGroup {
  readonly kind: string;
  /** The statement; for more than one subject, with the subject (and its construction) written generally. */
  readonly text: string;
  readonly source: string;
  readonly members: readonly AssumptionRecord[];
}

/** The kind of an assumption: its id without the final subject ("default:timestep:EW-1" → "default:timestep"). */
export function assumptionKind(id: string): string {
  const cut = id.lastIndexOf(":");
  return cut <= 0 ? id : id.slice(0, cut);
}

/** The subject named at the end of an id: the surface of "scenario/surface", else the last segment. */
export function assumptionSubject(id: string): string {
  const last = id.slice(id.lastIndexOf(":") + 1);
  return last.slice(last.lastIndexOf("/") + 1);
}

function escapeRegExp(s: string): string {
  return s.replace(/[.*+?^${}()|[\]\\]/g, "\\$&");
}

/** Replaces whole-word occurrences of `word` in `text` by `by`. */
function replaceWord(text: string, word: string, by: string): string {
  // A word that is not even a substring cannot occur as a whole word: no pattern to build for it (a statement is
  // compared with every construction id, so this keeps the grouping from compiling n² patterns).
  if (word === "" || !text.includes(word)) return text;
  return text.replace(new RegExp(`(?<![\\w-])${escapeRegExp(word)}(?![\\w-])`, "g"), by);
}

/** The statement with its own subject and the construction ids written generally, for comparing. */
function generalText(a: AssumptionRecord, constructionIds: readonly string[]): string {
  let text = replaceWord(a.text, assumptionSubject(a.id), "each listed subject");
  for (const id of constructionIds) text = replaceWord(text, id, "its construction");
  return text;
}

/**
 * Groups `list` by kind, general statement and source, in first-appearance order; `constructionIds` are the
 * construction ids a surface's statement may name (written generally when grouped).
 */
export function groupAssumptions(
  list: readonly AssumptionRecord[],
  constructionIds: readonly string[],
): AssumptionGroup[] {
  const groups = new Map<
    string,
    { kind: string; text: string; source: string; members: AssumptionRecord[] }
  >();
  for (const a of list) {
    const kind = assumptionKind(a.id);
    const text = generalText(a, constructionIds);
    const key = JSON.stringify([kind, text, a.source]);
    const group = groups.get(key);
    if (group === undefined) groups.set(key, { kind, text, source: a.source, members: [a] });
    else group.members.push(a);
  }
  return [...groups.values()].map((g) => g.members.length === 1 ? { ...g, text: g.members[0]!.text } : g);
}
