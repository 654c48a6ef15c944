/**
 * The checks of one subject, in the order of the list. A package of many constructions asks once per
 * construction; scanning the whole list each time made the body's cost grow with the square of the constructions,
 * so each list is grouped by subject once (the list is the finished results' and is not changed afterwards).
 */
import type { CheckResult } from "../../results/types.ts";

const groupsByList = new WeakMap<readonly CheckResult[], ReadonlyMap<string, readonly CheckResult[]>>();

function groups(checks: readonly CheckResult[]): ReadonlyMap<string, readonly CheckResult[]> {
  const known = groupsByList.get(checks);
  if (known !== undefined) return known;
  const bySubject = new Map<string, CheckResult[]>();
  for (const check of checks) {
    const group = bySubject.get(check.subject);
    if (group === undefined) bySubject.set(check.subject, [check]);
    else group.push(check);
  }
  groupsByList.set(checks, bySubject);
  return bySubject;
}

/** `checks.filter((c) => c.subject === subject)`, from the list's grouping by subject. */
export function checksOfSubject(checks: readonly CheckResult[], subject: string): readonly CheckResult[] {
  return groups(checks).get(subject) ?? [];
}
