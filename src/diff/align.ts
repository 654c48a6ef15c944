/** A pairing of one item of the old list with one of the new list; null where the item has no partner. */
export interface Pair {
  readonly old: number | null;
  readonly new: number | null;
}

function commonSubsequence(a: readonly string[], b: readonly string[]): Array<[number, number]> {
  const rows = a.length + 1;
  const cols = b.length + 1;
  const table = new Array<number>(rows * cols).fill(0);
  const at = (i: number, j: number) => table[i * cols + j] ?? 0;
  for (let i = a.length - 1; i >= 0; i--) {
    for (let j = b.length - 1; j >= 0; j--) {
      table[i * cols + j] = a[i] === b[j] ? at(i + 1, j + 1) + 1 : Math.max(at(i + 1, j), at(i, j + 1));
    }
  }
  const matches: Array<[number, number]> = [];
  let i = 0;
  let j = 0;
  while (i < a.length && j < b.length) {
    if (a[i] === b[j]) {
      matches.push([i, j]);
      i++;
      j++;
    } else if (at(i + 1, j) >= at(i, j + 1)) i++;
    else j++;
  }
  return matches;
}

/**
 * Aligns two lists by their keys (longest common subsequence), so an inserted or removed item leaves
 * the others paired. Between two matched items, unmatched old and new items are paired one to one in
 * order (a replaced item); any left over are removed (old only) or added (new only).
 */
export function alignByKey(a: readonly string[], b: readonly string[]): Pair[] {
  const pairs: Pair[] = [];
  let i = 0;
  let j = 0;
  const flushGap = (iEnd: number, jEnd: number) => {
    while (i < iEnd && j < jEnd) pairs.push({ old: i++, new: j++ });
    while (i < iEnd) pairs.push({ old: i++, new: null });
    while (j < jEnd) pairs.push({ old: null, new: j++ });
  };
  for (const [mi, mj] of commonSubsequence(a, b)) {
    flushGap(mi, mj);
    pairs.push({ old: i++, new: j++ });
  }
  flushGap(a.length, b.length);
  return pairs;
}
