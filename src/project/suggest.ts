/** Levenshtein edit distance between two strings. */
export function editDistance(a: string, b: string): number {
  const previous = Array.from({ length: b.length + 1 }, (_, j) => j);
  for (let i = 1; i <= a.length; i++) {
    let diagonal = previous[0] ?? 0;
    previous[0] = i;
    for (let j = 1; j <= b.length; j++) {
      const above = previous[j] ?? 0;
      const cost = a[i - 1] === b[j - 1] ? 0 : 1;
      previous[j] = Math.min(above + 1, (previous[j - 1] ?? 0) + 1, diagonal + cost);
      diagonal = above;
    }
  }
  return previous[b.length] ?? 0;
}

/** The closest candidate to `word`, if one is near enough to be a likely typo. */
export function closest(word: string, candidates: Iterable<string>): string | undefined {
  let best: string | undefined;
  let bestDistance = Infinity;
  const lower = word.toLowerCase();
  const prefixed = [...candidates].filter((c) => lower.length >= 2 && c.toLowerCase().startsWith(lower));
  if (prefixed.length === 1) return prefixed[0];
  for (const candidate of candidates) {
    const d = editDistance(lower, candidate.toLowerCase());
    if (d < bestDistance) {
      best = candidate;
      bestDistance = d;
    }
  }
  const allowed = Math.max(2, Math.floor(word.length / 3));
  return bestDistance <= allowed ? best : undefined;
}

/** Up to `count` candidates whose start is closest to `word` (for ids with suffixes such as `mineral-wool-25`). */
export function nearestByPrefix(word: string, candidates: readonly string[], count: number): string[] {
  const lower = word.toLowerCase();
  const allowed = Math.max(2, Math.floor(word.length / 3));
  return candidates
    .map((c) => ({
      c,
      d: editDistance(lower, c.toLowerCase().slice(0, lower.length)),
      full: editDistance(lower, c.toLowerCase()),
    }))
    .filter((x) => x.d <= allowed)
    .sort((a, b) => a.d - b.d || a.full - b.full || (a.c < b.c ? -1 : 1))
    .slice(0, count)
    .map((x) => x.c);
}

/** A hint text: "did you mean X?" when a close candidate exists, else the list of allowed words. */
export function didYouMean(word: string, candidates: readonly string[], what: string): string {
  const near = closest(word, candidates);
  if (near !== undefined) return `did you mean "${near}"?`;
  const similar = nearestByPrefix(word, candidates, 3);
  if (similar.length > 0) return `did you mean ${similar.map((c) => `"${c}"`).join(" or ")}?`;
  const shown = candidates.slice(0, 12).join(", ");
  return candidates.length === 0
    ? `no ${what} is defined`
    : `${what} allowed here: ${shown}${candidates.length > 12 ? ", …" : ""}`;
}
