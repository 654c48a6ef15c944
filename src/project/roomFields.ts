/** Small readers shared by the parts of the `room` block: ranges, signs, lists of items and hourly fractions. */
import { type Diagnostic, error } from "./diagnostic.ts";
import { describe, type Fields, missing, quantityOf, readList } from "./fields.ts";
import type { Position } from "./position.ts";
import type { YamlValue } from "./yamlTree.ts";

/** Shows a number as the user would write it (no float noise). */
export function shown(value: number): string {
  return String(Number(value.toPrecision(6)));
}

/** Where the value of `key` stands, else the mapping itself. */
export function valueAt(fields: Fields, key: string): Position {
  return fields.entries.get(key)?.value.at ?? fields.at;
}

/** Reports a value that is not above zero; true when the value is absent or positive. */
export function requirePositive(
  fields: Fields,
  key: string,
  value: number | undefined,
  unit: string,
  hint: string,
  out: Diagnostic[],
): boolean {
  if (value === undefined || value > 0) return true;
  out.push(
    error(
      valueAt(fields, key),
      "not-positive",
      `Expected a positive "${key}" in the ${fields.what}, found ${shown(value)} ${unit}`.trimEnd(),
      hint,
    ),
  );
  return false;
}

/** Reports a negative value; true when the value is absent, zero or positive. */
export function requireNonNegative(
  fields: Fields,
  key: string,
  value: number | undefined,
  unit: string,
  hint: string,
  out: Diagnostic[],
): boolean {
  if (value === undefined || value >= 0) return true;
  out.push(
    error(
      valueAt(fields, key),
      "negative-value",
      `Expected "${key}" in the ${fields.what} to be zero or more, found ${shown(value)} ${unit}`.trimEnd(),
      hint,
    ),
  );
  return false;
}

/** Reports a value outside [min, max] in the given unit; true when absent or within. */
export function requireWithin(
  fields: Fields,
  key: string,
  value: number | undefined,
  range: { readonly min: number; readonly max: number; readonly unit: string },
  out: Diagnostic[],
): boolean {
  if (value === undefined || (value >= range.min && value <= range.max)) return true;
  out.push(
    error(
      valueAt(fields, key),
      "out-of-range",
      `Value ${shown(value)} ${range.unit} of "${key}" is outside ${range.min} to ${range.max} ${range.unit}`,
      `check "${key}" and its unit`,
    ),
  );
  return false;
}

/** Reports a key given where it does not apply. */
export function notAllowed(
  fields: Fields,
  key: string,
  where: string,
  hint: string,
  out: Diagnostic[],
): void {
  const entry = fields.entries.get(key);
  if (entry === undefined) return;
  out.push(error(entry.keyAt, "key-not-allowed", `Key "${key}" does not apply to ${where}`, hint));
}

/**
 * Reads the list under `key` with `readOne`; when `ids` is given, an item whose id is already in it (from this
 * list or an earlier one of the same room) is a duplicate. `example` is one item, for the hint of an empty list.
 */
export function readItems<T extends { readonly at: Position }>(
  fields: Fields,
  key: string,
  example: string,
  out: Diagnostic[],
  readOne: (item: YamlValue, index: number) => T | undefined,
  ids?: { readonly seen: Map<string, string>; readonly idOf: (item: T) => string; readonly what: string },
  required = false,
): T[] {
  const items = readList(fields, key, out, required) ?? [];
  if (items.length === 0 && fields.entries.has(key) && required) {
    out.push(
      error(
        valueAt(fields, key),
        "empty-list",
        `The ${fields.what} lists no ${key}`,
        `list at least one: \`- ${example}\``,
      ),
    );
  }
  const read: T[] = [];
  items.forEach((item, index) => {
    const one = readOne(item, index);
    if (one === undefined) return;
    if (ids !== undefined) {
      const id = ids.idOf(one);
      const earlier = ids.seen.get(id);
      if (earlier !== undefined) {
        out.push(
          error(
            one.at,
            "duplicate-id",
            `Duplicate id "${id}" in the ${fields.what}: already used by ${earlier}`,
            "give each surface and window of a room its own id",
          ),
        );
        return;
      }
      ids.seen.set(id, `a ${ids.what}`);
    }
    read.push(one);
  });
  return read;
}

/** Reads 24 pure numbers in [0, 1] (an hourly schedule), reporting the count found when it is not 24. */
export function readHourlyFractions(fields: Fields, key: string, out: Diagnostic[]): number[] | undefined {
  const entry = fields.entries.get(key);
  if (entry === undefined) return undefined;
  const what = `"${key}" in the ${fields.what}`;
  if (entry.value.kind !== "list") {
    out.push(
      error(
        entry.value.at,
        "expected-list",
        `Expected a list of 24 hourly fractions for ${what}, found ${describe(entry.value)}`,
        "write `[0, 0, …, 1, 1, …]`, hour 0 (00:00 to 01:00) first, each a fraction of the peak from 0 to 1",
      ),
    );
    return undefined;
  }
  if (entry.value.items.length !== 24) {
    out.push(
      error(
        entry.value.at,
        "series-length",
        `Expected 24 hourly fractions for ${what}, found ${entry.value.items.length}`,
        "give one fraction per hour, hour 0 (00:00 to 01:00) first",
      ),
    );
    return undefined;
  }
  const values: number[] = [];
  for (const [hour, item] of entry.value.items.entries()) {
    if (item.kind !== "scalar" || typeof item.value !== "number" || !Number.isFinite(item.value)) {
      out.push(
        error(
          item.at,
          "expected-number",
          `Expected a plain number from 0 to 1 for hour ${hour} of ${what}, found ${describe(item)}`,
          "write each hour's fraction of the peak as a pure number, e.g. `0.5`",
        ),
      );
      return undefined;
    }
    if (item.value < 0 || item.value > 1) {
      out.push(
        error(
          item.at,
          "out-of-range",
          `Value ${item.text} for hour ${hour} of ${what} is outside 0 to 1`,
          "each hour's value is a fraction of the peak gain, from 0 (off) to 1 (full)",
        ),
      );
      return undefined;
    }
    values.push(item.value);
  }
  return values;
}

/** Reads a length in metres, its messages and hints in metres (a length is otherwise shown in mm). */
export function readMetres(
  fields: Fields,
  key: string,
  example: string,
  out: Diagnostic[],
  required = false,
): number | undefined {
  const entry = fields.entries.get(key);
  if (entry === undefined) return required ? missing(fields, key, example, out) : undefined;
  return quantityOf(entry.value, "length", `"${key}" in the ${fields.what}`, out, { unit: "m", example });
}
