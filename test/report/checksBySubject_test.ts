import assert from "node:assert/strict";
import { checksOfSubject } from "../../src/report/page/checksBySubject.ts";
import type { CheckResult } from "../../src/results/types.ts";

function check(id: string, subject: string, pass = true): CheckResult {
  return { id, subject, description: `${id} of ${subject}`, value: 0, limit: 1, pass };
}

Deno.test("checksOfSubject() gives each subject's checks as filtering the list would, in the list's order", () => {
  // Reference: Array.prototype.filter on the subject (what the body's check lines did per construction).
  const subjects = ["construction:W1", "construction:W2", "scenario:D", "construction:W1/extra", "room:R"];
  let s = 3;
  const rand = () => ((s = (1664525 * s + 1013904223) >>> 0) / 2 ** 32);
  const checks = Array.from(
    { length: 400 },
    (_, i) => check(`c${i}`, subjects[Math.floor(rand() * subjects.length)]!, rand() > 0.1),
  );
  for (const subject of [...subjects, "construction:none"]) {
    assert.deepStrictEqual(checksOfSubject(checks, subject), checks.filter((c) => c.subject === subject));
  }
  // Another list is grouped on its own, not from the first list's grouping.
  const other = [check("x", "construction:W1"), check("y", "construction:W3")];
  assert.deepStrictEqual(checksOfSubject(other, "construction:W1"), [other[0]]);
  assert.deepStrictEqual(checksOfSubject(other, "construction:W3"), [other[1]]);
});
