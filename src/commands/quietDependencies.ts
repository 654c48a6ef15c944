import process from "node:process";

/**
 * The YAML parser prints its tokens with console.log when `LOG_TOKENS` is set (and its stream with
 * `LOG_STREAM`), which corrupts `check --format json` on stdout, and reading those variables needs an
 * environment permission. Dependencies see an empty environment instead; no other dependency reads it,
 * and fluxnote itself reads none.
 */
export function hideEnvironmentFromDependencies(): void {
  (process as { env: unknown }).env = {};
}
