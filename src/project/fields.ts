import { type Diagnostic, error } from "./diagnostic.ts";
import type { Position } from "./position.ts";
import {
  describeCodePoints,
  type NaturalUnit,
  NON_DECIMAL_NUMBER,
  parseQuantity,
  QUANTITY_KINDS,
  type QuantityKind,
  type QuantityResult,
} from "./quantity.ts";
import { closest } from "./suggest.ts";
import type { YamlEntry, YamlValue } from "./yamlTree.ts";

/** A YAML mapping whose keys have been checked against the allowed set. */
export interface Fields {
  readonly entries: ReadonlyMap<string, YamlEntry>;
  readonly at: Position;
  /** What the mapping is, for messages: `material block`, `layer 2 of EW-1`. */
  readonly what: string;
}

/** Checks that `value` is a mapping with only allowed keys; reports unknown keys with a suggestion. */
export function readFields(
  value: YamlValue,
  allowed: readonly string[],
  what: string,
  out: Diagnostic[],
): Fields | undefined {
  if (value.kind !== "map") {
    out.push(
      error(
        value.at,
        "expected-mapping",
        `Expected a mapping of keys for the ${what}, found ${describe(value)}`,
        `write one \`key: value\` per line; allowed keys: ${allowed.join(", ")}`,
      ),
    );
    return undefined;
  }
  const entries = new Map<string, YamlEntry>();
  for (const entry of value.entries) {
    if (!allowed.includes(entry.key)) {
      out.push(
        error(
          entry.keyAt,
          "unknown-key",
          `Unknown key "${describeCodePoints(entry.key)}" in the ${what}`,
          /^\d/.test(entry.key)
            ? "this looks like the digits after a decimal comma: inside `{ … }` a comma separates entries; use a point as the decimal mark, e.g. `33.5 degC`"
            : withSuggestion(entry.key, allowed, `allowed keys: ${allowed.join(", ")}`),
        ),
      );
      continue;
    }
    entries.set(entry.key, entry);
  }
  return { entries, at: value.at, what };
}

/** Reports a missing required key. */
export function missing(fields: Fields, key: string, example: string, out: Diagnostic[]): undefined {
  out.push(
    error(
      fields.at,
      "missing-key",
      `Missing required key "${key}" in the ${fields.what}`,
      `add e.g. \`${key}: ${example}\``,
    ),
  );
  return undefined;
}

/** Reads a non-empty text value. */
export function readText(
  fields: Fields,
  key: string,
  out: Diagnostic[],
  required?: { example: string },
): string | undefined {
  const entry = fields.entries.get(key);
  if (entry === undefined) {
    return required === undefined ? undefined : missing(fields, key, required.example, out);
  }
  return textOf(entry.value, `"${key}" in the ${fields.what}`, out);
}

/** Reads a scalar as text (numbers become their written form); reports lists, maps and empty values. */
export function textOf(value: YamlValue, what: string, out: Diagnostic[]): string | undefined {
  if (value.kind !== "scalar" || value.value === null || String(value.value).trim() === "") {
    out.push(
      error(
        value.at,
        "expected-text",
        `Expected a text value for ${what}, found ${describe(value)}`,
        "write a value after the colon",
      ),
    );
    return undefined;
  }
  return typeof value.value === "string" ? value.value : value.text;
}

const ID_PATTERN = /^[A-Za-z0-9][A-Za-z0-9._-]{0,63}$/;

/** Reads an identifier: ASCII letters, digits, `.`, `_`, `-`, up to 64 characters. */
export function readId(
  fields: Fields,
  key: string,
  out: Diagnostic[],
  required = true,
): { id: string; at: Position } | undefined {
  const entry = fields.entries.get(key);
  if (entry === undefined) return required ? missing(fields, key, "EW-1", out) : undefined;
  return idOf(entry.value, `"${key}" in the ${fields.what}`, out);
}

/** Checks a scalar is a valid identifier. */
export function idOf(
  value: YamlValue,
  what: string,
  out: Diagnostic[],
): { id: string; at: Position } | undefined {
  const text = textOf(value, what, out);
  if (text === undefined) return undefined;
  if (!ID_PATTERN.test(text)) {
    out.push(
      error(
        value.at,
        "bad-id",
        `Cannot use "${describeCodePoints(text)}" as an id for ${what}`,
        "ids use ASCII letters, digits, '.', '_' and '-' only, start with a letter or digit, at most 64 characters",
      ),
    );
    return undefined;
  }
  return { id: text, at: value.at };
}

/**
 * Keys whose quantity has a natural unit other than the SI unit of its kind (or a clearer example):
 * messages and hints about them use that unit, so `time-zone: 1` is told "1 h", never "1 s".
 */
const NATURAL_UNITS: Readonly<Record<string, NaturalUnit>> = {
  "time-zone": { unit: "h", example: "1 h" },
  "timestep": { unit: "min", example: "15 min" },
  "elevation": { unit: "m", example: "120 m" },
  "latitude": { unit: "deg", example: "52.4 deg" },
  "longitude": { unit: "deg", example: "-1.9 deg" },
  "azimuth": { unit: "deg", example: "180 deg" },
  "tilt": { unit: "deg", example: "90 deg" },
};

/** Reads a quantity with unit and converts it to SI. */
export function readQuantity(
  fields: Fields,
  key: string,
  kind: QuantityKind,
  out: Diagnostic[],
  required = false,
): number | undefined {
  const entry = fields.entries.get(key);
  const natural = NATURAL_UNITS[key];
  if (entry === undefined) {
    return required ? missing(fields, key, natural?.example ?? QUANTITY_KINDS[kind].example, out) : undefined;
  }
  return quantityOf(entry.value, kind, `"${key}" in the ${fields.what}`, out, natural);
}

/** Converts a scalar quantity to SI, reporting bare numbers, wrong units and bad numbers at the value. */
export function quantityOf(
  value: YamlValue,
  kind: QuantityKind,
  what: string,
  out: Diagnostic[],
  natural?: NaturalUnit,
): number | undefined {
  const spec = natural === undefined ? QUANTITY_KINDS[kind] : { ...QUANTITY_KINDS[kind], ...natural };
  return scalarQuantityOf(value, spec, what, out, (text) => parseQuantity(text, kind, natural));
}

/**
 * A scalar value read by `parse` (its quotes removed), reporting a list, a map or an empty value, and the parser's
 * message, at the value.
 */
export function scalarQuantityOf(
  value: YamlValue,
  spec: { readonly label: string; readonly example: string },
  what: string,
  out: Diagnostic[],
  parse: (text: string) => QuantityResult,
): number | undefined {
  if (value.kind !== "scalar" || value.value === null) {
    out.push(
      error(
        value.at,
        "expected-quantity",
        `Expected ${spec.label} with its unit for ${what}, found ${describe(value)}`,
        `write e.g. "${spec.example}"`,
      ),
    );
    return undefined;
  }
  const result = parse(value.text.replace(/^(["'])(.*)\1$/, "$2"));
  if (!result.ok) {
    out.push(error(value.at, "bad-quantity", `${result.message} (for ${what})`, result.hint));
    return undefined;
  }
  return result.value;
}

/** Reads a pure number (no unit) within [min, max]. */
export function readNumber(
  fields: Fields,
  key: string,
  min: number,
  max: number,
  out: Diagnostic[],
): number | undefined {
  const entry = fields.entries.get(key);
  if (entry === undefined) return undefined;
  const value = entry.value;
  const what = `"${key}" in the ${fields.what}`;
  if (value.kind !== "scalar" || typeof value.value !== "number" || !Number.isFinite(value.value)) {
    out.push(
      error(
        value.at,
        "expected-number",
        `Expected a plain number between ${min} and ${max} for ${what}, found ${describe(value)}`,
        `write e.g. \`${key}: ${(min + max) / 2}\` (a pure number, no unit${
          value.kind === "scalar" && NON_DECIMAL_NUMBER.test(value.text) ? ", in decimal digits" : ""
        })`,
      ),
    );
    return undefined;
  }
  if (value.value < min || value.value > max) {
    out.push(
      error(
        value.at,
        "out-of-range",
        `Value ${value.text} out of range for ${what}: expected ${min} to ${max}`,
        `${key} is a fraction between ${min} and ${max}`,
      ),
    );
    return undefined;
  }
  return value.value;
}

/** Reads one of a fixed set of words. */
export function readChoice<T extends string>(
  fields: Fields,
  key: string,
  choices: readonly T[],
  out: Diagnostic[],
): T | undefined {
  const entry = fields.entries.get(key);
  if (entry === undefined) return undefined;
  const text = textOf(entry.value, `"${key}" in the ${fields.what}`, out);
  if (text === undefined) return undefined;
  if (!(choices as readonly string[]).includes(text)) {
    out.push(
      error(
        entry.value.at,
        "bad-choice",
        `Unknown value "${describeCodePoints(text)}" for "${key}" in the ${fields.what}`,
        withSuggestion(text, choices, `write one of: ${choices.join(", ")}`),
      ),
    );
    return undefined;
  }
  return text as T;
}

/** Reads a list value. */
export function readList(
  fields: Fields,
  key: string,
  out: Diagnostic[],
  required = false,
): readonly YamlValue[] | undefined {
  const entry = fields.entries.get(key);
  if (entry === undefined) return required ? missing(fields, key, "[ … ]", out) : undefined;
  if (entry.value.kind !== "list") {
    out.push(
      error(
        entry.value.at,
        "expected-list",
        `Expected a list for "${key}" in the ${fields.what}, found ${describe(entry.value)}`,
        "write a YAML list: one `- item` per line, or `[a, b, c]`",
      ),
    );
    return undefined;
  }
  return entry.value.items;
}

/** Describes what a YAML value is, for messages. */
export function describe(value: YamlValue): string {
  switch (value.kind) {
    case "map":
      return "a mapping";
    case "list":
      return "a list";
    case "scalar":
      return value.value === null ? "nothing" : `"${describeCodePoints(value.text)}"`;
  }
}

/** Prefixes a hint with "did you mean …?" when a close candidate exists. */
export function withSuggestion(word: string, candidates: readonly string[], rest: string): string {
  const near = closest(word, candidates);
  return near === undefined
    ? rest
    : `did you mean "${near}"? ${rest.charAt(0).toUpperCase()}${rest.slice(1)}`;
}
