/** Verdicts that moved between two runs: code limits going MET ↔ NOT MET and calculation checks that flip. */
import type { LimitResult } from "../results/limitResults.ts";
import type { CheckResult, ResultsJson } from "../results/types.ts";
import type { CheckChange, CheckStatus, Verdict, VerdictChange } from "./types.ts";

function limitsOf(c: unknown): readonly LimitResult[] {
  const l = typeof c === "object" && c !== null ? (c as Record<string, unknown>).limits : undefined;
  return Array.isArray(l) ? l as LimitResult[] : [];
}

function limitsByKey(results: ResultsJson): Map<string, { construction: string; limit: LimitResult }> {
  const out = new Map<string, { construction: string; limit: LimitResult }>();
  for (const [id, c] of Object.entries(results.constructions ?? {})) {
    for (const limit of limitsOf(c)) out.set(`${id}\u0000${limit.limitKey}`, { construction: id, limit });
  }
  return out;
}

const verdictOf = (l: LimitResult | undefined): Verdict | null =>
  l === undefined ? null : l.pass ? "MET" : "NOT MET";

/**
 * The code limits whose verdict differs between the sides, per construction and limit kind: MET ↔ NOT MET,
 * or a limit present on one side only. Those now NOT MET come first, then the others, each in input order.
 */
export function compareVerdicts(a: ResultsJson, b: ResultsJson): VerdictChange[] {
  const oldLimits = limitsByKey(a);
  const newLimits = limitsByKey(b);
  const keys = [...newLimits.keys(), ...[...oldLimits.keys()].filter((k) => !newLimits.has(k))];
  const out: VerdictChange[] = [];
  for (const key of keys) {
    const o = oldLimits.get(key);
    const n = newLimits.get(key);
    const either = (n ?? o)!;
    const old = verdictOf(o?.limit);
    const now = verdictOf(n?.limit);
    if (old === now) continue;
    out.push({
      subject: `construction:${either.construction}`,
      limit: either.limit.limitKey,
      clause: either.limit.clause,
      unit: either.limit.unit,
      old,
      new: now,
      oldValue: o?.limit.value ?? null,
      newValue: n?.limit.value ?? null,
      oldLimit: o?.limit.limit ?? null,
      newLimit: n?.limit.limit ?? null,
    });
  }
  return [...out.filter((v) => v.new === "NOT MET"), ...out.filter((v) => v.new !== "NOT MET")];
}

function checksByKey(results: ResultsJson): Map<string, CheckResult> {
  const out = new Map<string, CheckResult>();
  const seen = new Map<string, number>();
  for (const c of results.checks ?? []) {
    const base = `${c.subject}\u0000${c.id}`;
    const n = seen.get(base) ?? 0;
    seen.set(base, n + 1);
    out.set(`${base}\u0000${n}`, c);
  }
  return out;
}

const statusOf = (c: CheckResult | undefined): CheckStatus | null =>
  c === undefined ? null : c.pass ? "pass" : "fail";

/**
 * The calculation checks that newly fail on b (passed or were absent on a) and those that failed on a and
 * no longer fail on b (pass, or are gone). Newly failing first, then the others, each in input order.
 */
export function compareChecks(a: ResultsJson, b: ResultsJson): CheckChange[] {
  const oldChecks = checksByKey(a);
  const newChecks = checksByKey(b);
  const keys = [...newChecks.keys(), ...[...oldChecks.keys()].filter((k) => !newChecks.has(k))];
  const out: CheckChange[] = [];
  for (const key of keys) {
    const o = oldChecks.get(key);
    const n = newChecks.get(key);
    const old = statusOf(o);
    const now = statusOf(n);
    if (old === now || (old !== "fail" && now !== "fail")) continue;
    const either = (n ?? o)!;
    out.push({
      subject: either.subject,
      id: either.id,
      description: either.description,
      old,
      new: now,
      oldValue: o?.value ?? null,
      newValue: n?.value ?? null,
      limit: either.limit,
    });
  }
  return [...out.filter((c) => c.new === "fail"), ...out.filter((c) => c.new !== "fail")];
}
