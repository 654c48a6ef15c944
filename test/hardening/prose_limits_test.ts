/**
 * Prose that marked cannot read in bounded time or stack (lists and quotes nested past 32 levels) is
 * refused by both `check` and `build` with file:line, in time linear in its size; ordinary nesting
 * is not. A task list leaves no form control in the package.
 */
import assert from "node:assert/strict";
import { join } from "node:path";
import { runCheck } from "../../src/commands/check.ts";
import type { Diagnostic } from "../../src/project/diagnostic.ts";
import { boundProseNesting, MAX_PROSE_NESTING } from "../../src/project/proseNesting.ts";
import { BoundedBuilds } from "./bounded.ts";
import { hostileProjectFiles, writeProject } from "./hostileProject.ts";
import { assertInertPage } from "./inertPage.ts";

/** Line of the prose in project.md from `hostileProjectFiles` (front matter, blank, heading, blank). */
const PROSE_LINE = 17;

function nestedList(levels: number): string {
  let text = "";
  for (let i = 0; i < levels; i++) text += `${"  ".repeat(i)}- level ${i + 1}\n`;
  return text;
}

function findings(text: string): Diagnostic[] {
  const out: Diagnostic[] = [];
  boundProseNesting({ path: "notes.md", text }, out);
  return out;
}

Deno.test("boundProseNesting() refuses the line that goes past 32 levels, with its column and depth", () => {
  const out = findings(nestedList(40));
  assert.equal(out.length, 1);
  const [d] = out;
  assert.equal(d?.rule, "prose-nesting-too-deep");
  // Level 33 is on line 33, its marker after 32 × 2 spaces.
  assert.deepEqual(d?.at, { file: "notes.md", line: MAX_PROSE_NESTING + 1, col: 2 * MAX_PROSE_NESTING + 1 });
  assert.match(d?.message ?? "", /^Lists or quotes nest 33 levels deep on this line \(and on the next 7\)/);
  assert.equal(
    findings("> ".repeat(3000) + "deep\n")[0]?.message.startsWith("Lists or quotes nest 3000 levels"),
    true,
  );
});

Deno.test("boundProseNesting() accepts ordinary nesting, thematic breaks and fenced examples", () => {
  const ordered = Array.from({ length: 10 }, (_, i) => `${"   ".repeat(i)}1. item`).join("\n");
  const text = [
    ordered,
    "",
    "> > > > > five quotes",
    "",
    "- - - - - - - - - - - - - - - - - - - - - - - - - - - - - - - - - - - - - - - -",
    "",
    "```text",
    "> ".repeat(40) + "an example, not prose",
    "```",
    "",
    nestedList(MAX_PROSE_NESTING),
    "Back at the margin.",
    "",
    nestedList(MAX_PROSE_NESTING),
  ].join("\n");
  assert.deepEqual(findings(text), []);
});

/**
 * Registers a test that writes the hostile project with `prose` into a temp folder (`folder`, package to `out`)
 * and runs `body` on it with a bounded build worker; the worker and the folder are removed afterwards.
 */
function proseBuildTest(
  name: string,
  prose: string,
  body: (paths: { folder: string; out: string }, builds: BoundedBuilds) => Promise<void>,
): void {
  Deno.test({
    name,
    sanitizeOps: false,
    sanitizeResources: false,
    async fn() {
      const base = await Deno.makeTempDir({ prefix: "fluxnote-prose-" });
      const builds = new BoundedBuilds();
      try {
        const folder = join(base, "p");
        writeProject(folder, hostileProjectFiles({ prose }));
        await body({ folder, out: join(base, "out") }, builds);
      } finally {
        builds.close();
        await Deno.remove(base, { recursive: true });
      }
    },
  });
}

proseBuildTest(
  "runCheck() and runBuild() refuse quotes nested 3,000 deep with file:line instead of overflowing the stack",
  "> ".repeat(3000) + "deep",
  async ({ folder, out }, builds) => {
    const expected = new RegExp(
      `^project\\.md:${PROSE_LINE}:65: error: Lists or quotes nest 3000 levels deep`,
    );
    const stderr: string[] = [];
    const code = await runCheck({ project: folder, format: "text", strict: false }, {
      stdout: () => {},
      stderr: (line) => stderr.push(line),
    });
    assert.equal(code, 1);
    assert.ok(stderr.some((line) => expected.test(line)), stderr.join("\n"));
    const report = await builds.build({ project: folder, out });
    assert.equal(report.thrown, undefined, report.thrown);
    assert.equal(report.code, 1);
    assert.ok(report.stderr.some((line) => expected.test(line)), report.stderr.join("\n"));
  },
);

proseBuildTest(
  "runBuild() refuses a 1,000-level nested list with file:line within 10 s",
  nestedList(1000),
  async ({ folder, out }, builds) => {
    // Before the limit this build took 30 s and 1.2 GB (issue 10, item 12).
    const report = await builds.build({ project: folder, out }, 10_000);
    assert.equal(report.thrown, undefined, report.thrown);
    assert.equal(report.code, 1);
    const line = PROSE_LINE + MAX_PROSE_NESTING;
    assert.ok(
      report.stderr.some((l) =>
        l.startsWith(`project.md:${line}:65: error: Lists or quotes nest 33 levels deep`)
      ),
      report.stderr.join("\n"),
    );
  },
);

proseBuildTest(
  "runBuild() renders a task list with no form control in the package",
  "- [ ] check the U-value\n- [x] read the drawings",
  async ({ folder, out }, builds) => {
    const report = await builds.build({ project: folder, out });
    assert.equal(report.code, 0, report.stderr.join("\n"));
    const page = Deno.readTextFileSync(join(out, "package.html"));
    assertInertPage(page, "task list");
    assert.ok(page.includes("[x]</span> read the drawings"));
  },
);
