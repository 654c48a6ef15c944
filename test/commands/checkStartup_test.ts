/**
 * `fluxnote check` starts fast (README, "Start-up"): its modules do not include the package renderer, the
 * plotting and DOM libraries, the YAML parser or the Markdown lexer; plain YAML and Markdown are read without
 * them (loaded only for a text that needs them, with the same findings), and the work only the package shows
 * (the sensitivity study, the CSV tables) is not done.
 */
import assert from "node:assert/strict";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { loadProject } from "../../src/commands/loadProject.ts";
import { computeProject } from "../../src/results/buildResults.ts";

const REPO = fileURLToPath(new URL("../../", import.meta.url));

/** Runs this test's Deno through `sh` (the test task may start sh and mkfifo only). */
async function deno(args: readonly string[]): Promise<{ code: number; out: string; err: string }> {
  const result = await new Deno.Command("sh", {
    args: ["-c", 'exec "$0" "$@"', Deno.execPath(), ...args],
    cwd: REPO,
    env: { NO_COLOR: "1" },
    stdout: "piped",
    stderr: "piped",
  }).output();
  const decode = (b: Uint8Array) => new TextDecoder().decode(b);
  return { code: result.code, out: decode(result.stdout), err: decode(result.stderr) };
}

interface GraphModule {
  readonly specifier: string;
  readonly dependencies?: readonly {
    readonly code?: { readonly specifier: string };
    readonly isDynamic?: boolean;
  }[];
}

/** The modules a root loads before it runs: the graph of `deno info` along static (not `import()`) code edges. */
function staticModules(
  graph: { roots: string[]; modules: GraphModule[]; redirects: Record<string, string> },
) {
  const byName = new Map(graph.modules.map((m) => [m.specifier, m]));
  const seen = new Set<string>();
  const stack = [...graph.roots];
  while (stack.length > 0) {
    const name = stack.pop()!;
    const specifier = graph.redirects[name] ?? name;
    if (seen.has(specifier)) continue;
    seen.add(specifier);
    for (const d of byName.get(specifier)?.dependencies ?? []) {
      if (d.code !== undefined && d.isDynamic !== true) stack.push(d.code.specifier);
    }
  }
  return [...seen];
}

Deno.test("the static module graph of check holds no YAML, Markdown, plotting, DOM or package-rendering module", async () => {
  const info = await deno(["info", "--json", "--config", "deno.json", "src/commands/check.ts"]);
  assert.equal(info.code, 0, info.err);
  const specifiers = staticModules(JSON.parse(info.out));
  assert.ok(specifiers.some((s) => s.endsWith("/src/project/readProject.ts")), "the graph was read");
  for (
    const heavy of [
      "npm:/marked@",
      "npm:/yaml@",
      "npm:/linkedom@",
      "npm:/@observablehq/plot@",
      "npm:/mathjs@",
      "/src/report/",
    ]
  ) {
    assert.deepEqual(specifiers.filter((s) => s.includes(heavy)), [], heavy);
  }
});

/** Runs `check` of a project in a fresh process (test/commands/_checkLoads.ts): exit code, rules, libraries loaded. */
function checkLoads(project: string): Promise<{ code: number; out: string; err: string }> {
  return deno([
    "run",
    "--quiet",
    "--config",
    "deno.json",
    "--allow-read",
    "test/commands/_checkLoads.ts",
    project,
  ]);
}

Deno.test("check of the template reads its YAML and Markdown without loading their libraries", async () => {
  const run = await checkLoads("templates/new-project");
  assert.equal(run.code, 0, run.err);
  const result = JSON.parse(run.out);
  assert.equal(result.code, 0);
  assert.ok(result.rules.includes("placeholder-text"), "the template's findings were made");
  assert.deepEqual(result.loaded, []);
});

Deno.test("check loads the libraries for a block only the YAML library reads, and reports what it finds", async () => {
  // A custom tag: refused by the reader, which only the library can see. The environment must be hidden from
  // the library before it parses (it reads LOG_TOKENS; without --allow-env that read fails the run).
  const run = await checkLoads("test/fixtures/hostile/yaml-custom-tag");
  assert.equal(run.code, 0, run.err);
  assert.deepEqual(JSON.parse(run.out), { code: 1, rules: ["yaml-syntax"], loaded: ["YAML", "Markdown"] });
});

Deno.test("computeProject without the package parts skips the sensitivity study and the CSV tables, nothing else", async () => {
  const folder = await Deno.makeTempDir({ prefix: "fluxnote-check-scope-" });
  try {
    for (const name of ["10-materials.md", "20-constructions.md", "30-scenarios.md", "project.md"]) {
      let text = Deno.readTextFileSync(join(REPO, "templates", "new-project", name));
      if (name === "project.md") {
        text = text.replace("units: SI\n", "units: SI\nsensitivity: { variation: 0.2 }\n");
      }
      Deno.writeTextFileSync(join(folder, name), text);
    }
    const loaded = await loadProject(folder);
    assert.ok(loaded.model !== undefined);
    const full = computeProject(loaded.model, loaded.inputRecords, loaded.dataTexts);
    const lean = computeProject(loaded.model, loaded.inputRecords, loaded.dataTexts, undefined, {
      packageParts: false,
    });
    assert.ok(full.ok && lean.ok);
    assert.ok(full.computed.results.sensitivity !== undefined, "the full run has the study");
    assert.equal(lean.computed.results.sensitivity, undefined);
    assert.deepEqual(lean.computed.csvFiles, []);
    const { sensitivity: _, ...rest } = full.computed.results;
    assert.deepEqual(lean.computed.results, rest);
  } finally {
    await Deno.remove(folder, { recursive: true });
  }
});
