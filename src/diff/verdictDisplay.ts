/** How verdict and check changes read for people, shared by the text and HTML renderings of a diff. */
import { formatSig } from "../report/page/format.ts";
import type { CheckChange, CheckStatus, Verdict, VerdictChange } from "./types.ts";

function subjectText(subject: string): string {
  const [kind = "", rest = ""] = subject.split(/:(.*)/s);
  return kind === "construction"
    ? `construction ${rest}`
    : `${kind} ${rest.replace("/", " / surface ")}`.trim();
}

function number(value: number | null, unit = ""): string {
  if (value === null) return "—";
  const shown = formatSig(value, 4);
  return unit === "" || unit === "-" ? shown : `${shown} ${unit}`;
}

function either(value: Verdict | CheckStatus | null): string {
  return value ?? "(none)";
}

/** What a verdict is about: `construction EW-1 · max-u (Clause 4.2)`. */
export function verdictLabel(v: VerdictChange): string {
  return `${subjectText(v.subject)} · ${v.limit} (${v.clause})`;
}

/** The move of a verdict: `NOT MET → MET`. */
export function verdictMove(v: VerdictChange): string {
  return `${either(v.old)} → ${either(v.new)}`;
}

/** The figures behind a verdict on each side: `value 0.3102 → 0.2701 W/(m²K), limit 0.28 → 0.28`. */
export function verdictFigures(v: VerdictChange): string {
  return `value ${number(v.oldValue)} → ${number(v.newValue, v.unit)}, limit ${number(v.oldLimit)} → ${
    number(v.newLimit, v.unit)
  }`;
}

/** What a check change is about: `construction EW-1 · sum-rule-Y`. */
export function checkLabel(c: CheckChange): string {
  return `${subjectText(c.subject)} · ${c.id}`;
}

/** The move of a check: `pass → fail`, `(none) → fail`. */
export function checkMove(c: CheckChange): string {
  return `${either(c.old)} → ${either(c.new)}`;
}

/** The figures behind a check on each side: `value 1e-9 → 0.02, limit 0.001`. */
export function checkFigures(c: CheckChange): string {
  return `value ${number(c.oldValue)} → ${number(c.newValue)}, limit ${number(c.limit)}`;
}
