/**
 * Above this many constructions the package prints each construction's dynamic summary and its failed checks
 * only: Appendix C gives the checks by subject and kind and the failures, without the list of every check, and
 * Appendix D no factor tables or plots; they are in the embedded results (Appendix B), results.json and csv/.
 * This keeps large packages openable and about 50 KB per heavy wall (bench/marginal_build.ts).
 */
export const COMPACT_ABOVE_CONSTRUCTIONS = 40;

/** True when a project of `constructionCount` constructions gets the compact package. */
export function isCompactPackage(constructionCount: number): boolean {
  return constructionCount > COMPACT_ABOVE_CONSTRUCTIONS;
}
