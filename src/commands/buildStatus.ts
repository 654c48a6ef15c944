/**
 * The block `build` prints after writing: failed checks, unmet limits, open items and warnings (counts,
 * the first few named) and the output path, one aligned line each, so the state of the package is read
 * in the terminal without opening it.
 */
import type { Diagnostic } from "../project/diagnostic.ts";
import { formatPosition } from "../project/position.ts";
import type { ResultsJson } from "../results/types.ts";
import type { StyledPart, Tone } from "./terminalIo.ts";

/** How many entries a line names before "and N more". */
const NAMED = 3;
/** Longest name kept whole, characters (a warning's message can be long). */
const NAME_WIDTH = 60;

export interface BuildStatusInput {
  readonly results: ResultsJson;
  /** Reader and review findings of the build (every severity). */
  readonly findings: readonly Diagnostic[];
  /** Warnings the computation added (`results.warnings` beyond the reader's), `{ at, message }`. */
  readonly computedWarnings: readonly { readonly at: string; readonly message: string }[];
  /** The path of package.html as written. */
  readonly output: string;
}

interface Row {
  readonly label: string;
  readonly count: number | undefined;
  readonly detail: string;
  readonly tone: Tone;
}

function shorten(text: string): string {
  return text.length <= NAME_WIDTH ? text : `${text.slice(0, NAME_WIDTH - 1)}…`;
}

/** "a; b; c and 4 more" */
function named(names: readonly string[]): string {
  const shown = names.slice(0, NAMED).map(shorten).join("; ");
  return names.length > NAMED ? `${shown} and ${names.length - NAMED} more` : shown;
}

/** A number with 3 significant digits, without trailing zeros (0.2089 → "0.209", 0.18 → "0.18"). */
function figure(value: number): string {
  return String(Number(value.toPrecision(3)));
}

function rows(input: BuildStatusInput): Row[] {
  const { results } = input;
  const failed = results.checks.filter((c) => !c.pass).map((c) => `${c.subject} ${c.id}`);
  const unmet = (results.summary?.constructions ?? []).flatMap((c) =>
    c.limits.filter((l) => !l.pass).map((l) =>
      `${c.id} ${l.limitKey}: ${l.value === null ? "no value" : figure(l.value)}, limit ${
        figure(l.limit)
      } ${l.unit}`
    )
  );
  const open = results.summary?.openItems ?? [];
  const byKind = new Map<string, number>();
  for (const item of open) byKind.set(item.kind, (byKind.get(item.kind) ?? 0) + 1);
  const kinds = [...byKind].sort((a, b) => b[1] - a[1] || (a[0] < b[0] ? -1 : 1)).map(([k, n]) =>
    `${n} ${k}`
  );
  const blocking = open.filter((item) => item.blocking && item.acknowledged === null).length;
  const warnings = [
    // An unmet limit is also a review warning; it has its own line above.
    ...input.findings.filter((d) => d.severity === "warning" && d.rule !== "limit-not-met").map((d) =>
      `${formatPosition(d.at)} ${d.message}`
    ),
    ...input.computedWarnings.map((w) => `${w.at} ${w.message}`),
  ];
  return [
    {
      label: "failed checks",
      count: failed.length,
      detail: named(failed),
      tone: failed.length > 0 ? "bad" : "good",
    },
    {
      label: "unmet limits",
      count: unmet.length,
      detail: named(unmet),
      tone: unmet.length > 0 ? "warn" : "good",
    },
    {
      label: "open items",
      count: open.length,
      detail: open.length === 0
        ? ""
        : `${kinds.join(", ")}; ${blocking} ${blocking === 1 ? "stops" : "stop"} status: issued`,
      tone: blocking > 0 ? "warn" : "good",
    },
    {
      label: "warnings",
      count: warnings.length,
      detail: named(warnings),
      tone: warnings.length > 0 ? "warn" : "good",
    },
    { label: "output", count: undefined, detail: input.output, tone: "plain" },
  ];
}

/** The status block, one line of parts per row: label, count (right-aligned), then the names. */
export function buildStatusLines(input: BuildStatusInput): StyledPart[][] {
  const all = rows(input);
  const labelWidth = Math.max(...all.map((r) => r.label.length));
  const countWidth = Math.max(...all.map((r) => (r.count === undefined ? 0 : String(r.count).length)));
  return all.map((r) => {
    const label = `  ${r.label.padEnd(labelWidth)}  `;
    if (r.count === undefined) return [{ text: `${label}${r.detail}` }];
    const parts: StyledPart[] = [{ text: label }, {
      text: String(r.count).padStart(countWidth),
      tone: r.tone,
    }];
    if (r.detail !== "") parts.push({ text: `  ${r.detail}` });
    return parts;
  });
}
