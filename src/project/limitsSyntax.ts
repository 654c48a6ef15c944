/**
 * The `limits:` mapping of a construction block or of the front matter: code limits the user writes with
 * their clause. The tool ships no limit values of its own.
 */
import { type Diagnostic, error, errorCount } from "./diagnostic.ts";
import { describe, quantityOf, readFields, readText } from "./fields.ts";
import type { LimitQuantity, LimitSpec } from "./model.ts";
import type { YamlValue } from "./yamlTree.ts";

/** The limit keys, in the order the package lists them. */
export const LIMIT_KEYS: readonly LimitQuantity[] = [
  "max-u",
  "max-periodic-transmittance",
  "min-time-lag",
  "min-temperature-factor",
];

const EXAMPLES: Readonly<Record<LimitQuantity, string>> = {
  "max-u": '{ value: "0.18 W/(m^2 K)", clause: "Client brief AT-LIB-03, cl. 4.2" }',
  "max-periodic-transmittance": '{ value: "0.10 W/(m^2 K)", clause: "…" }',
  "min-time-lag": '{ value: "8 h", clause: "…" }',
  "min-temperature-factor": '{ value: 0.75, clause: "…" }',
};

/** Reads a `limits:` mapping; every entry is `{ value, clause }` with the value's unit (a pure number for f_Rsi). */
export function readLimits(
  value: YamlValue,
  what: string,
  scope: LimitSpec["scope"],
  out: Diagnostic[],
): readonly LimitSpec[] | undefined {
  const fields = readFields(value, LIMIT_KEYS, `limits of the ${what}`, out);
  if (fields === undefined) return undefined;
  const before = errorCount(out);
  const limits: LimitSpec[] = [];
  for (const quantity of LIMIT_KEYS) {
    const entry = fields.entries.get(quantity);
    if (entry === undefined) continue;
    const label = `limit ${quantity} of the ${what}`;
    const spec = readFields(entry.value, ["value", "clause"], label, out);
    if (spec === undefined) continue;
    const clause = readText(spec, "clause", out, { example: '"Client brief AT-LIB-03, cl. 4.2"' });
    const raw = spec.entries.get("value")?.value;
    if (raw === undefined) {
      out.push(error(
        spec.at,
        "missing-key",
        `Missing required key "value" in the ${label}`,
        `write e.g. \`${quantity}: ${EXAMPLES[quantity]}\``,
      ));
      continue;
    }
    const limit = limitValue(quantity, raw, label, out);
    if (limit !== undefined && clause !== undefined) {
      limits.push({ quantity, limit, clause, scope, at: entry.keyAt });
    }
  }
  return errorCount(out) > before ? undefined : limits;
}

function limitValue(quantity: LimitQuantity, raw: YamlValue, label: string, out: Diagnostic[]) {
  switch (quantity) {
    case "max-u":
    case "max-periodic-transmittance":
      return positiveOrReport(quantityOf(raw, "coefficient", label, out), raw, label, out);
    case "min-time-lag": {
      const seconds = quantityOf(raw, "time", label, out);
      return seconds === undefined ? undefined : positiveOrReport(seconds / 3600, raw, label, out);
    }
    case "min-temperature-factor": {
      if (raw.kind !== "scalar" || typeof raw.value !== "number" || !(raw.value > 0 && raw.value < 1)) {
        out.push(error(
          raw.at,
          "expected-number",
          `Expected a pure number between 0 and 1 for the ${label}, found ${describe(raw)}`,
          "the temperature factor f_Rsi has no unit: write e.g. `value: 0.75`",
        ));
        return undefined;
      }
      return raw.value;
    }
  }
}

function positiveOrReport(v: number | undefined, raw: YamlValue, label: string, out: Diagnostic[]) {
  if (v === undefined) return undefined;
  if (!(v > 0)) {
    out.push(
      error(raw.at, "not-positive", `Expected a positive value for the ${label}`, "a limit is above zero"),
    );
    return undefined;
  }
  return v;
}
