/**
 * How far a library source has been checked, read from its text: the library records a value recalled rather
 * than read as "from memory" (also for one property, e.g. "density from memory"), and a value awaiting a check
 * as "unconfirmed", "not (yet) confirmed" or "to be confirmed". Any other source names the document (or a
 * secondary copy of it) the value was read in. The same words make a "from-memory-source" open item in a build
 * (`UNCONFIRMED_SOURCE` in src/results/openItems.ts), so the listing and the package agree.
 */

/** The confirmation state of a source text. */
export type SourceConfirmation = "confirmed" | "from memory" | "unconfirmed";

const FROM_MEMORY = /from memory/i;
const NOT_CONFIRMED = /unconfirmed|not (yet )?confirmed|to be confirmed/i;

/** Reads the confirmation state of a source text; "from memory" wins when a text says both. */
export function sourceConfirmation(source: string): SourceConfirmation {
  if (FROM_MEMORY.test(source)) return "from memory";
  if (NOT_CONFIRMED.test(source)) return "unconfirmed";
  return "confirmed";
}
