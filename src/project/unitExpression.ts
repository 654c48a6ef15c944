// Reads a unit expression as users write it: `W/(m K)`, `m^2 K/W`, `kg/m^3`, `BTU/(h ft degF)`, `J/kg/K`,
// `W/(m.K)`. Units multiply when written side by side (a space), with `*` or with `.`; `/` divides by the next
// unit or bracket only (`W/m K` is W·K/m); `^` raises the unit before it to a decimal power (`^2`, `^-1`).
// These are mathjs's rules (its Unit.parse), plus `.` between two units, so every text mathjs accepted reads
// the same.
import { type Dimension, prefixesOf, type UnitEntry, UNITS } from "./unitTable.ts";

/** One unit of an expression with its prefix factor and power (m^-2 in W/m^2 has power -2). */
export interface UnitTerm {
  readonly entry: UnitEntry;
  readonly prefixFactor: number;
  readonly power: number;
}

export type UnitExpression =
  | { readonly ok: true; readonly terms: readonly UnitTerm[]; readonly dimension: Dimension }
  | { readonly ok: false; readonly reason: string; readonly unknown?: string };

const EXACT = new Map<string, UnitEntry>();
for (const entry of UNITS) if (!EXACT.has(entry.name)) EXACT.set(entry.name, entry);

type Found = { readonly entry: UnitEntry; readonly prefixFactor: number } | undefined;
const FOUND = new Map<string, Found>();

/** The unit a name stands for: the name itself, else the first unit it ends with after a prefix it takes. */
export function findUnit(name: string): Found {
  if (FOUND.has(name)) return FOUND.get(name);
  const found = lookUp(name);
  if (FOUND.size < 1000) FOUND.set(name, found);
  return found;
}

function lookUp(name: string): Found {
  const exact = EXACT.get(name);
  if (exact !== undefined) return { entry: exact, prefixFactor: 1 };
  for (const entry of UNITS) {
    if (name.length > entry.name.length && name.endsWith(entry.name)) {
      const prefixFactor = prefixesOf(entry).get(name.slice(0, name.length - entry.name.length));
      if (prefixFactor !== undefined) return { entry, prefixFactor };
    }
  }
  return undefined;
}

const isDigit = (c: string): boolean => c >= "0" && c <= "9";
const isAlpha = (c: string): boolean => (c >= "a" && c <= "z") || (c >= "A" && c <= "Z");

/** Reads a unit expression (the text after the number). */
export function parseUnitExpression(text: string): UnitExpression {
  let index = 0;
  const at = (): string => text.charAt(index);
  const skipSpaces = (): void => {
    while (at() === " " || at() === "\t") index++;
  };
  /** A decimal number (a power), as mathjs reads one: sign, digits, one point, an exponent if digits follow. */
  const readNumber = (): number | undefined => {
    const start = index;
    if (at() === "+" || at() === "-") index++;
    if (!isDigit(at()) && at() !== ".") return void (index = start);
    if (at() === ".") {
      index++;
      if (!isDigit(at())) return void (index = start);
    } else {
      while (isDigit(at())) index++;
      if (at() === ".") index++;
    }
    while (isDigit(at())) index++;
    if (at() === "e" || at() === "E") {
      const mark = index;
      index++;
      if (at() === "+" || at() === "-") index++;
      if (isDigit(at())) { while (isDigit(at())) index++; }
      else index = mark;
    }
    return Number(text.slice(start, index));
  };
  const fail = (reason: string, unknown?: string): UnitExpression =>
    unknown === undefined ? { ok: false, reason } : { ok: false, reason, unknown };

  const terms: UnitTerm[] = [];
  const dimension = [0, 0, 0, 0, 0];
  const groups: number[] = []; // the sign each open bracket was entered with
  let groupSign = 1;
  let sign = 1;
  let expectingUnit = false;
  skipSpaces();
  if (at() === "*" || at() === "/") {
    sign = at() === "/" ? -1 : 1;
    expectingUnit = true;
    index++;
  }
  while (true) {
    skipSpaces();
    while (at() === "(") {
      groups.push(sign);
      groupSign *= sign;
      sign = 1;
      index++;
      skipSpaces();
    }
    if (index >= text.length) break;
    const start = index;
    while (isDigit(at()) || isAlpha(at())) index++;
    const name = text.slice(start, index);
    if (name === "" || !isAlpha(name.charAt(0))) {
      const found = name === "" ? text.charAt(start) : name;
      if (found === "^" && text.charAt(start - 1) === ")") {
        return fail('a power applies to one unit, not to a bracket (write "m^2 K^2", not "(m K)^2")');
      }
      if (found === ".") return fail(`unexpected "." in "${text}": a "." joins two units, as in "m.K"`);
      return fail(`unexpected "${found}" in "${text}"`);
    }
    const found = findUnit(name);
    if (found === undefined) return fail(`"${name}" is not a known unit`, name);
    let power = sign * groupSign;
    skipSpaces();
    if (at() === "^") {
      index++;
      skipSpaces();
      const exponent = readNumber();
      if (exponent === undefined) return fail(`"^" must be followed by a number (e.g. "m^2", "h^-1")`);
      power *= exponent;
    }
    terms.push({ entry: found.entry, prefixFactor: found.prefixFactor, power });
    for (let i = 0; i < 5; i++) dimension[i]! += found.entry.dimension[i]! * power;
    const beforeSpaces = index;
    skipSpaces();
    while (at() === ")") {
      const entered = groups.pop();
      if (entered === undefined) return fail(`a ")" without its "(" in "${text}"`);
      groupSign /= entered;
      index++;
      skipSpaces();
    }
    expectingUnit = false;
    sign = 1;
    if (
      at() === "*" || at() === "/" ||
      (at() === "." && index === beforeSpaces && isAlpha(text.charAt(index + 1)))
    ) {
      sign = at() === "/" ? -1 : 1;
      expectingUnit = true;
      index++;
    }
  }
  if (expectingUnit) return fail(`"${text}" ends with an operator: a unit must follow it`);
  if (groups.length > 0) return fail(`a "(" is not closed in "${text}"`);
  return { ok: true, terms, dimension: dimension as unknown as Dimension };
}
