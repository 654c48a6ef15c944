/**
 * Above this many constructions the package prints each construction's dynamic summary and its failed checks
 * only; the full series, CTF tables and plots are in results.json and csv/ (keeps large packages openable).
 */
export const COMPACT_ABOVE_CONSTRUCTIONS = 40;
