/**
 * The hostile-input corpus: every broken or hostile project ends in exact diagnostics with
 * file:line:col and a hint, exit code 1 from runBuild, nothing written, no stack trace, and no hang.
 *
 * Static cases live in test/fixtures/broken/ and test/fixtures/hostile/ (one folder per case,
 * expected.txt = the exact diagnostics runBuild prints, without the final "build stopped" line).
 * The allowed-key lists in hints grow whenever a feature adds a key, so they are compared as the
 * placeholder `{KEYS}` (hostile/ fixtures write it so; broken/ fixtures are normalised the same way). Cases that need big files, links or
 * folders in odd places are made at test time in a temp folder.
 */
import assert from "node:assert/strict";
import { join } from "node:path";
import { loadProject } from "../../src/commands/loadProject.ts";
import { produceOutputs } from "../../src/commands/produce.ts";
import { MAX_MARKDOWN_BYTES, MAX_WEATHER_BYTES } from "../../src/project/readProject.ts";
import { BoundedBuilds, type BuildReport, copyTree, listing } from "./bounded.ts";
import { weatherScenarioBlock } from "../scenarios/_scenarioBlocks.ts";

const FIXTURES = new URL("../fixtures/", import.meta.url).pathname;
const GOOD = join(FIXTURES, "good/minimal");
const DEMO = new URL("../../projects/demo/", import.meta.url).pathname;

function caseFolders(corpus: string): string[] {
  return [...Deno.readDirSync(join(FIXTURES, corpus))].filter((e) => e.isDirectory).map((e) =>
    join(corpus, e.name)
  ).sort();
}

const STATIC_CASES = [...caseFolders("broken"), ...caseFolders("hostile")];

/**
 * Cases whose diagnostics come from the weather-file reader (src/climate/weatherCsv*.ts), which does
 * not give a hint for a gap, a wrong step or an empty file yet; every other error must have one.
 */
const NO_HINT_YET: ReadonlySet<string> = new Set([
  "hostile/weather-gap",
  "hostile/weather-wrong-step",
  "hostile/weather-empty",
]);

/** `path:line:col: severity: message`, or `path: severity: …` for a file or folder as a whole (line 0). */
const POSITIONED = /^[^\s:][^:]*(?::\d+:\d+)?: (error|warning|note): \S/;
const STOPPED = /^build stopped: [1-9]\d* error\(s\); nothing was written$/;

/** Checks the common contract of a stopped build and returns the diagnostics it printed. */
function assertStopped(report: BuildReport, outParent: string, hintsRequired: boolean): string {
  assert.equal(report.thrown, undefined, `runBuild threw:\n${report.thrown}`);
  assert.equal(report.code, 1);
  assert.deepEqual(report.stdout, []);
  assert.deepEqual(listing(outParent), [], "a stopped build wrote something");
  // A diagnostic with a hint is printed as one string holding two lines.
  const lines = report.stderr.join("\n").split("\n");
  assert.match(lines.at(-1) ?? "", STOPPED);
  const diagnostics = lines.slice(0, -1);
  assert.ok(diagnostics.length > 0, "no diagnostic was printed");
  for (const [i, line] of diagnostics.entries()) {
    assert.doesNotMatch(line, /^\s+at\s|internal error|Error:/, `a stack trace or raw exception: ${line}`);
    if (line.startsWith("  hint: ")) continue;
    assert.match(line, POSITIONED, `not a path:line:col diagnostic: ${line}`);
    if (hintsRequired && / error: /.test(line)) {
      assert.ok(diagnostics[i + 1]?.startsWith("  hint: "), `an error without a hint: ${line}`);
    }
  }
  return diagnostics.join("\n");
}

/** Replaces each "allowed keys: a, b, c" list of a hint by `{KEYS}`. */
function withKeyPlaceholders(text: string): string {
  return text.replace(/([Aa]llowed keys: )[a-z0-9, -]+$/gm, "$1{KEYS}");
}

function expectedOf(folder: string): string {
  return withKeyPlaceholders(Deno.readTextFileSync(join(folder, "expected.txt")).trimEnd());
}

/** The minimal good project's files, as text, to start generated cases from. */
function goodFiles(): Record<string, string> {
  return {
    "project.md": Deno.readTextFileSync(join(GOOD, "project.md")),
    "walls.md": Deno.readTextFileSync(join(GOOD, "walls.md")),
  };
}

function withFiles(projectMd: string, list: string): string {
  return projectMd.replace("units: SI\n", `units: SI\nfiles: ${list}\n`);
}

const WEATHER_SCENARIO = weatherScenarioBlock("weather.csv");

/** A case made at test time: `make` fills the empty project folder; `expected` is the exact diagnostics. */
interface GeneratedCase {
  readonly name: string;
  readonly make: (folder: string) => void;
  readonly expected: string;
}

const GENERATED: readonly GeneratedCase[] = [
  {
    name: "markdown-over-1-MiB",
    make(folder) {
      const files = goodFiles();
      Deno.writeTextFileSync(join(folder, "project.md"), files["project.md"] ?? "");
      Deno.writeTextFileSync(join(folder, "walls.md"), files["walls.md"] ?? "");
      // One byte over the limit, all prose: the size check must come before any parsing.
      Deno.writeTextFileSync(join(folder, "notes.md"), "# Notes\n\n".padEnd(MAX_MARKDOWN_BYTES + 1, "word "));
    },
    expected:
      `notes.md:1:1: error: Cannot read "notes.md": 1048577 bytes is more than the limit of 1048576 bytes (1 MiB)
  hint: split the file into several smaller files`,
  },
  {
    name: "weather-over-64-MiB",
    make(folder) {
      const files = goodFiles();
      Deno.writeTextFileSync(join(folder, "project.md"), files["project.md"] ?? "");
      Deno.writeTextFileSync(join(folder, "walls.md"), (files["walls.md"] ?? "") + "\n" + WEATHER_SCENARIO);
      const path = join(folder, "weather.csv");
      Deno.writeTextFileSync(path, "time,dry-bulb,global-horizontal,diffuse-horizontal\n");
      // A sparse file: the size is what is checked, before a byte is read.
      Deno.truncateSync(path, MAX_WEATHER_BYTES + 1);
    },
    expected:
      `weather.csv:1:1: error: Cannot read "weather.csv": 67108865 bytes is more than the limit of 67108864 bytes (64 MiB)
  hint: shorten the file (a year of hourly rows is well under 1 MiB)`,
  },
  {
    name: "symlink-to-absolute-path",
    make(folder) {
      const files = goodFiles();
      Deno.writeTextFileSync(
        join(folder, "project.md"),
        withFiles(files["project.md"] ?? "", "[walls.md, hosts.md]"),
      );
      Deno.writeTextFileSync(join(folder, "walls.md"), files["walls.md"] ?? "");
      Deno.symlinkSync("/etc/hosts", join(folder, "hosts.md"));
    },
    expected:
      `project.md:10:19: error: Cannot read "hosts.md": it resolves (through a link) to a place outside the project folder
  hint: list only Markdown files inside the project folder`,
  },
  {
    name: "symlinked-folder-to-parent",
    make(folder) {
      const files = goodFiles();
      Deno.writeTextFileSync(
        join(folder, "project.md"),
        withFiles(files["project.md"] ?? "", "[walls.md, up/x.md]"),
      );
      Deno.writeTextFileSync(join(folder, "walls.md"), files["walls.md"] ?? "");
      Deno.writeTextFileSync(join(folder, "../x.md"), "# outside\n");
      Deno.symlinkSync("..", join(folder, "up"));
    },
    expected:
      `project.md:10:19: error: Cannot read "up/x.md": it resolves (through a link) to a place outside the project folder
  hint: list only Markdown files inside the project folder`,
  },
  {
    name: "symlink-to-a-listed-file",
    make(folder) {
      const files = goodFiles();
      Deno.writeTextFileSync(
        join(folder, "project.md"),
        withFiles(files["project.md"] ?? "", "[walls.md, copy.md]"),
      );
      Deno.writeTextFileSync(join(folder, "walls.md"), files["walls.md"] ?? "");
      Deno.symlinkSync("walls.md", join(folder, "copy.md"));
    },
    expected: `project.md:10:19: error: Cannot read "copy.md" again: it is the same file as "walls.md"
  hint: list each file once (a link to a file counts as that file)`,
  },
  {
    name: "symlink-loop",
    make(folder) {
      const files = goodFiles();
      Deno.writeTextFileSync(join(folder, "project.md"), files["project.md"] ?? "");
      Deno.writeTextFileSync(join(folder, "walls.md"), files["walls.md"] ?? "");
      Deno.symlinkSync("b.md", join(folder, "a.md"));
      Deno.symlinkSync("a.md", join(folder, "b.md"));
    },
    expected:
      `project.md:1:1: error: Cannot read "a.md": it is a link that cannot be followed (a loop, or a link to nothing)
  hint: list only Markdown files inside the project folder
project.md:1:1: error: Cannot read "b.md": it is a link that cannot be followed (a loop, or a link to nothing)
  hint: list only Markdown files inside the project folder`,
  },
  {
    name: "folder-named-md",
    make(folder) {
      const files = goodFiles();
      Deno.writeTextFileSync(join(folder, "project.md"), files["project.md"] ?? "");
      Deno.writeTextFileSync(join(folder, "walls.md"), files["walls.md"] ?? "");
      Deno.mkdirSync(join(folder, "notes.md"));
    },
    expected: `project.md:1:1: error: Cannot read "notes.md": it is not a regular file
  hint: list only regular files`,
  },
  {
    name: "project-md-is-a-folder",
    make(folder) {
      Deno.mkdirSync(join(folder, "project.md"));
      Deno.writeTextFileSync(join(folder, "walls.md"), goodFiles()["walls.md"] ?? "");
    },
    expected: `project.md:1:1: error: Cannot read "project.md": it is not a regular file
  hint: list only regular files`,
  },
  {
    name: "weather-through-symlink",
    make(folder) {
      const files = goodFiles();
      Deno.writeTextFileSync(join(folder, "project.md"), files["project.md"] ?? "");
      Deno.writeTextFileSync(join(folder, "walls.md"), (files["walls.md"] ?? "") + "\n" + WEATHER_SCENARIO);
      Deno.symlinkSync("/etc/hosts", join(folder, "weather.csv"));
    },
    expected:
      `walls.md:16:10: error: Cannot read "weather.csv": it resolves (through a link) to a place outside the project folder
  hint: give the path of a file inside the project folder`,
  },
  {
    name: "hard-link-to-a-file-outside",
    make(folder) {
      const files = goodFiles();
      Deno.writeTextFileSync(join(folder, "project.md"), files["project.md"] ?? "");
      Deno.writeTextFileSync(join(folder, "walls.md"), files["walls.md"] ?? "");
      // A file outside the project, linked in under a Markdown name: same inode, no symbolic link to see.
      Deno.writeTextFileSync(join(folder, "../secret.md"), "# outside the project\n");
      Deno.linkSync(join(folder, "../secret.md"), join(folder, "notes.md"));
    },
    expected:
      `project.md:1:1: error: Cannot read "notes.md": it is a hard link (the file has 2 names, and another may be outside the project folder)
  hint: copy the file into the project folder instead of linking it (cp, not ln)`,
  },
  {
    name: "weather-through-hard-link",
    make(folder) {
      const files = goodFiles();
      Deno.writeTextFileSync(join(folder, "project.md"), files["project.md"] ?? "");
      Deno.writeTextFileSync(join(folder, "walls.md"), (files["walls.md"] ?? "") + "\n" + WEATHER_SCENARIO);
      Deno.writeTextFileSync(
        join(folder, "../outside.csv"),
        "time,dry-bulb,global-horizontal,diffuse-horizontal\n",
      );
      Deno.linkSync(join(folder, "../outside.csv"), join(folder, "weather.csv"));
    },
    expected:
      `walls.md:16:10: error: Cannot read "weather.csv": it is a hard link (the file has 2 names, and another may be outside the project folder)
  hint: copy the file into the project folder instead of linking it (cp, not ln)`,
  },
];

Deno.test("the bad-input corpus holds at least 60 broken or hostile projects", () => {
  const total = STATIC_CASES.length + GENERATED.length;
  assert.ok(total >= 60, `${total} cases`);
  for (const name of STATIC_CASES) {
    const folder = join(FIXTURES, name);
    const expected = Deno.readTextFileSync(join(folder, "expected.txt"));
    assert.ok(expected.trim() !== "", `${name}/expected.txt is empty`);
  }
});

Deno.test({
  name: "runBuild() stops every broken or hostile project with its exact diagnostics, in time",
  sanitizeOps: false,
  sanitizeResources: false,
  async fn(t) {
    const builds = new BoundedBuilds();
    try {
      for (const name of STATIC_CASES) {
        await t.step({
          name,
          sanitizeOps: false,
          sanitizeResources: false,
          async fn() {
            const folder = join(FIXTURES, name);
            const outParent = await Deno.makeTempDir({ prefix: "fluxnote-hostile-" });
            try {
              const report = await builds.build({ project: folder, out: join(outParent, "out") });
              const printed = assertStopped(report, outParent, !NO_HINT_YET.has(name));
              assert.equal(withKeyPlaceholders(printed), expectedOf(folder));
            } finally {
              await Deno.remove(outParent, { recursive: true });
            }
          },
        });
      }
      for (const c of GENERATED) {
        await t.step({
          name: `generated/${c.name}`,
          sanitizeOps: false,
          sanitizeResources: false,
          async fn() {
            const base = await Deno.makeTempDir({ prefix: "fluxnote-hostile-" });
            try {
              const folder = join(base, "project");
              const outParent = join(base, "out-parent");
              Deno.mkdirSync(folder);
              Deno.mkdirSync(outParent);
              c.make(folder);
              const report = await builds.build({ project: folder, out: join(outParent, "out") });
              assert.equal(assertStopped(report, outParent, true), c.expected);
            } finally {
              await Deno.remove(base, { recursive: true });
            }
          },
        });
      }
    } finally {
      builds.close();
    }
  },
});

Deno.test({
  name: "runBuild() names the project folder when it does not exist, without a project.md:1:1 position",
  sanitizeOps: false,
  sanitizeResources: false,
  async fn() {
    const builds = new BoundedBuilds();
    const base = await Deno.makeTempDir({ prefix: "fluxnote-hostile-" });
    try {
      const missing = join(base, "no-such-project");
      const report = await builds.build({ project: missing, out: join(base, "out") });
      assert.equal(
        assertStopped(report, base, true),
        `${missing}: error: Cannot open the project folder: it does not exist or is not a folder; expected a ` +
          "folder holding project.md\n  hint: check the path (a relative path starts in the folder fluxnote " +
          `runs in), or start a project there with: fluxnote init ${missing}`,
      );
    } finally {
      builds.close();
      await Deno.remove(base, { recursive: true });
    }
  },
});

// --- BOM and CRLF variants give the same results as their LF twins -------------------------------

type Variant = "bom" | "crlf" | "bom+crlf";

/** Rewrites every .md and .csv file of a copied project with a BOM and/or CRLF line ends. */
function rewriteText(folder: string, variant: Variant): number {
  let changed = 0;
  for (const entry of Deno.readDirSync(folder)) {
    const path = join(folder, entry.name);
    if (entry.isDirectory) {
      changed += rewriteText(path, variant);
      continue;
    }
    if (!/\.(md|csv)$/.test(entry.name)) continue;
    let text = Deno.readTextFileSync(path);
    assert.ok(!text.includes("\r") && !text.startsWith("\uFEFF"), `${path} is not an LF file`);
    if (variant !== "bom") text = text.replaceAll("\n", "\r\n");
    if (variant !== "crlf") text = "\uFEFF" + text;
    Deno.writeTextFileSync(path, text);
    changed++;
  }
  return changed;
}

async function resultsOf(
  folder: string,
): Promise<{ constructions: string; scenarios: string; sha256: string }> {
  const loaded = await loadProject(folder);
  assert.deepEqual(loaded.diagnostics.filter((d) => d.severity === "error"), []);
  const produced = produceOutputs(loaded);
  assert.ok(produced.ok, "the project did not build");
  const r = produced.outputs.results;
  return {
    constructions: JSON.stringify(r.constructions),
    scenarios: JSON.stringify(r.scenarios),
    sha256: r.inputs.sha256,
  };
}

for (const [label, source] of [["test/fixtures/good/minimal", GOOD], ["projects/demo", DEMO]] as const) {
  Deno.test(`BOM and CRLF variants of ${label} give the same constructions and scenarios as LF`, async () => {
    const base = await Deno.makeTempDir({ prefix: "fluxnote-line-ends-" });
    try {
      const skipOut = (path: string) => !/\/out$/.test(path);
      const lf = join(base, "lf");
      copyTree(source, lf, skipOut);
      const reference = await resultsOf(lf);
      assert.ok(reference.constructions.length > 2, "no constructions to compare");
      for (const variant of ["bom", "crlf", "bom+crlf"] as const) {
        const folder = join(base, variant);
        copyTree(source, folder, skipOut);
        assert.ok(rewriteText(folder, variant) >= 2);
        const got = await resultsOf(folder);
        // The inputs hash covers the exact bytes, so it must differ: the variant really is different.
        assert.notEqual(got.sha256, reference.sha256, `${variant}: the inputs hash did not change`);
        assert.equal(got.constructions, reference.constructions, `${variant}: constructions differ`);
        assert.equal(got.scenarios, reference.scenarios, `${variant}: scenarios differ`);
      }
    } finally {
      await Deno.remove(base, { recursive: true });
    }
  });
}
