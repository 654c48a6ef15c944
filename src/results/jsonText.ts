/**
 * Serialises results as readable JSON: objects and arrays of objects one member per line (2-space indent),
 * arrays of numbers, strings and booleans on one line. Same values as JSON.stringify, far fewer bytes for the
 * long numeric series, and stable for the same input.
 */
export function resultsJsonText(value: unknown): string {
  return `${write(value, "")}\n`;
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
function write(value: unknown, indent: string): string {
  if (isPrimitive(value)) return JSON.stringify(value) ?? "null";
  const inner = `${indent}  `;
  if (Array.isArray(value)) {
    if (value.length === 0) return "[]";
    if (value.every(isPrimitive)) return primitiveArray(value);
    return `[\n${value.map((v) => `${inner}${write(v, inner)}`).join(",\n")}\n${indent}]`;
  }
  const entries = Object.entries(value as Record<string, unknown>).filter(([, v]) => v !== undefined);
  if (entries.length === 0) return "{}";
  return `{\n${
    entries.map(([k, v]) => `${inner}${JSON.stringify(k)}: ${write(v, inner)}`).join(",\n")
  }\n${indent}}`;
}
