/**
 * Serialises results as readable JSON: objects and arrays of objects one member per line (2-space indent),
 * arrays of numbers, strings and booleans on one line. Same values as JSON.stringify, far fewer bytes for the
 * long numeric series, and stable for the same input.
 */
export function resultsJsonText(value: unknown, shared?: SharedTexts): string {
  return `${write(value, "", shared === undefined ? undefined : { texts: shared, depth: 0 })}\n`;
}

/**
 * The texts of the objects and arrays near the top of a value already written, by object, for writing a second
 * value that holds many of the same objects (the package's copy of results.json keeps every member but the long
 * response-factor series). An object's text depends only on its members and its indent, so an object written
 * before at the same indent is its earlier text; the results are not changed between the two writings.
 */
export type SharedTexts = Map<object, { readonly indent: string; readonly text: string }>;

/**
 * Objects and arrays of objects up to this depth are remembered: the top-level members (checks, assumptions,
 * summary) and their entries. Deeper ones cost more to remember than the copy saves (measured with
 * bench/marginal_build.ts); one-line arrays are never remembered (the long series are cut in the copy).
 */
const SHARED_DEPTH = 2;

interface Sharing {
  readonly texts: SharedTexts;
  readonly depth: number;
}

function isPrimitive(value: unknown): boolean {
  return value === null || typeof value !== "object";
}
/**
 * A one-line array of primitives, `[a, b, c]`. An array of numbers only is written by one native
 * JSON.stringify (number texts hold no comma, so spacing its commas gives the same text as item by item).
 */
function primitiveArray(value: readonly unknown[]): string {
  let numbers = true;
  for (let i = 0; i < value.length; i++) {
    if (typeof value[i] !== "number") {
      numbers = false;
      break;
    }
  }
  if (numbers) return JSON.stringify(value).replaceAll(",", ", ");
  return `[${value.map((v) => JSON.stringify(v) ?? "null").join(", ")}]`;
}
function write(value: unknown, indent: string, sharing?: Sharing): string {
  if (isPrimitive(value)) return JSON.stringify(value) ?? "null";
  if (
    sharing === undefined || sharing.depth > SHARED_DEPTH ||
    (Array.isArray(value) && value.every(isPrimitive))
  ) {
    return writeContainer(value as object, indent);
  }
  const known = sharing.texts.get(value as object);
  if (known !== undefined && known.indent === indent) return known.text;
  const text = writeContainer(value as object, indent, { texts: sharing.texts, depth: sharing.depth + 1 });
  sharing.texts.set(value as object, { indent, text });
  return text;
}

function writeContainer(value: object, indent: string, sharing?: Sharing): string {
  const inner = `${indent}  `;
  if (Array.isArray(value)) {
    if (value.length === 0) return "[]";
    if (value.every(isPrimitive)) return primitiveArray(value);
    return `[\n${value.map((v) => `${inner}${write(v, inner, sharing)}`).join(",\n")}\n${indent}]`;
  }
  const entries = Object.entries(value as Record<string, unknown>).filter(([, v]) => v !== undefined);
  if (entries.length === 0) return "{}";
  return `{\n${
    entries.map(([k, v]) => `${inner}${JSON.stringify(k)}: ${write(v, inner, sharing)}`).join(",\n")
  }\n${indent}}`;
}
