// What to suggest for a unit name that is not known: the known spelling of another case ("Btu" → "BTU"), two
// units run together ("kgK" → "kg K"), or the nearest name by edit distance when it is close.
import { findUnit } from "./unitExpression.ts";
import { prefixesOf, UNITS } from "./unitTable.ts";
import { editDistance } from "./suggest.ts";

const COMMON_SYMBOL_PREFIXES = ["k", "M", "G", "m", "c", "d", "u"];
const COMMON_NAME_PREFIXES = ["kilo", "mega", "milli", "centi"];

/** Unit names and their commonly prefixed forms (mm, kW, kWh, millimeter, ...), built on the first miss. */
let candidates: readonly (readonly [string, string])[] | undefined;

/** Each known name with its lower-case form. */
function knownNames(): readonly (readonly [string, string])[] {
  if (candidates !== undefined) return candidates;
  const names = new Set<string>();
  for (const entry of UNITS) {
    if (entry.dimension.some(Number.isNaN)) continue; // electric and other units: never the likely intent
    names.add(entry.name);
    const prefixes = prefixesOf(entry);
    for (const p of [...COMMON_SYMBOL_PREFIXES, ...COMMON_NAME_PREFIXES]) {
      if (prefixes.has(p)) names.add(p + entry.name);
    }
  }
  candidates = [...names].map((n) => [n, n.toLowerCase()] as const);
  return candidates;
}

const remembered = new Map<string, string | undefined>();

/** A known way to write `name`, if one is near: `"BTU"`, `"kg K"`, `"millimeter"`; else undefined. */
export function suggestUnit(name: string): string | undefined {
  if (remembered.has(name)) return remembered.get(name);
  const near = nearest(name);
  if (remembered.size < 256) remembered.set(name, near);
  return near;
}

function nearest(name: string): string | undefined {
  const lower = name.toLowerCase();
  const names = knownNames();
  const sameLetters = name.length >= 3 ? names.find(([, l]) => l === lower) : undefined; // not "mn" → "MN"
  if (sameLetters !== undefined) return sameLetters[0];
  for (let i = 1; i < name.length; i++) {
    const head = name.slice(0, i);
    const tail = name.slice(i);
    if (/^[A-Za-z]/.test(tail) && findUnit(head) !== undefined && findUnit(tail) !== undefined) {
      return `${head} ${tail}`;
    }
  }
  if (name.length <= 3) return undefined; // a short name is near too many units to guess
  const allowed = name.length <= 7 ? 2 : 3;
  let best: string | undefined;
  let bestDistance = allowed + 1;
  for (const [candidate, candidateLower] of names) {
    if (Math.abs(candidate.length - name.length) > allowed) continue;
    const d = editDistance(lower, candidateLower);
    if (d < bestDistance) {
      best = candidate;
      bestDistance = d;
    }
  }
  return best;
}
