/** Code limits checked against a construction's results: compliance findings, kept apart from `checks`. */
import type { LimitQuantity, LimitSpec } from "../project/model.ts";
import { formatPosition } from "../project/position.ts";

/** One entry of `constructions.<id>.limits` in results.json. */
export interface LimitResult {
  /** `<limit key>:<construction id>`, e.g. `max-u:EW-1`. */
  readonly id: string;
  /** The limit key as written: `max-u`, `max-periodic-transmittance`, `min-time-lag`, `min-temperature-factor`. */
  readonly limitKey: LimitQuantity;
  /** The results.json key compared, e.g. `correctedU`, `dynamic.timeLag_h`. */
  readonly quantity: string;
  /** The construction's value (null when it was not computed). */
  readonly value: number | null;
  readonly limit: number;
  /** W/(m²K), h, or "-" for a pure number. */
  readonly unit: string;
  readonly clause: string;
  /** Where the limit was written: on the construction or project-wide in the front matter. */
  readonly scope: "project" | "construction";
  readonly at: string;
  readonly pass: boolean;
}

/** The figures a limit can be compared with, as in results.json. */
export interface LimitFigures {
  readonly correctedU: number;
  readonly temperatureFactor: number;
  readonly [key: string]: unknown;
}

const QUANTITY: Readonly<Record<LimitQuantity, { key: string; unit: string }>> = {
  "max-u": { key: "correctedU", unit: "W/(m²K)" },
  "max-periodic-transmittance": { key: "dynamic.periodicTransmittance.amplitude", unit: "W/(m²K)" },
  "min-time-lag": { key: "dynamic.timeLag_h", unit: "h" },
  "min-temperature-factor": { key: "temperatureFactor", unit: "-" },
};

function lookup(figures: LimitFigures, path: string): number | null {
  let node: unknown = figures;
  for (const part of path.split(".")) {
    node = typeof node === "object" && node !== null ? (node as Record<string, unknown>)[part] : undefined;
  }
  return typeof node === "number" && Number.isFinite(node) ? node : null;
}

/** Compares each limit with its figure: `max-` passes when value ≤ limit, `min-` when value ≥ limit. */
export function evaluateLimits(
  constructionId: string,
  limits: readonly LimitSpec[],
  figures: LimitFigures,
): LimitResult[] {
  return limits.map((spec) => {
    const { key, unit } = QUANTITY[spec.quantity];
    const value = lookup(figures, key);
    const pass = value !== null &&
      (spec.quantity.startsWith("max-") ? value <= spec.limit : value >= spec.limit);
    return {
      id: `${spec.quantity}:${constructionId}`,
      limitKey: spec.quantity,
      quantity: key,
      value,
      limit: spec.limit,
      unit,
      clause: spec.clause,
      scope: spec.scope,
      at: formatPosition(spec.at),
      pass,
    };
  });
}
