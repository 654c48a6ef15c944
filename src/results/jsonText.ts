/**
 * Serialises results as readable JSON: objects and arrays of objects one member per line (2-space indent),
 * arrays of numbers, strings and booleans on one line. Same values as JSON.stringify, far fewer bytes for the
 * long numeric series, and stable for the same input.
 */
export function resultsJsonText(value: unknown, arrayTexts?: ArrayTexts): string {
  return `${write(value, "", arrayTexts)}\n`;
}

/**
 * Texts of one-line arrays by array, shared by the serialisations of one build: results.json and the package's
 * copy hold the same arrays (the copy only cuts the response-factor series), so each is written once. A
 * one-line array's text does not depend on its indentation; results are never changed after they are built.
 */
export type ArrayTexts = WeakMap<readonly unknown[], string>;
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
function write(value: unknown, indent: string, arrayTexts: ArrayTexts | undefined): string {
  if (isPrimitive(value)) return JSON.stringify(value) ?? "null";
  const inner = `${indent}  `;
  if (Array.isArray(value)) {
    if (value.length === 0) return "[]";
    if (value.every(isPrimitive)) {
      const known = arrayTexts?.get(value);
      if (known !== undefined) return known;
      const text = primitiveArray(value);
      arrayTexts?.set(value, text);
      return text;
    }
    return `[\n${value.map((v) => `${inner}${write(v, inner, arrayTexts)}`).join(",\n")}\n${indent}]`;
  }
  const entries = Object.entries(value as Record<string, unknown>).filter(([, v]) => v !== undefined);
  if (entries.length === 0) return "{}";
  return `{\n${
    entries.map(([k, v]) => `${inner}${JSON.stringify(k)}: ${write(v, inner, arrayTexts)}`).join(",\n")
  }\n${indent}}`;
}
