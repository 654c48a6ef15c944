/**
 * The README cannot drift from the tool: its example blocks are built as one project, and every
 * `fluxnote <command>` line it shows names a real command with real options. The expectation is the tool's
 * own acceptance (check and build exit 0 with no error), the README being the document under test.
 */
import assert from "node:assert/strict";
import { join } from "node:path";
import { main } from "../../src/cli.ts";
import { runBuild } from "../../src/commands/build.ts";
import { runCheck } from "../../src/commands/check.ts";
import {
  fencedBlocks,
  type ReadmeBlock,
  readmeExamples,
  readmeUsageLines,
  type UsageLine,
} from "./readmeExamples.ts";

const README = new URL("../../README.md", import.meta.url);

function collect(): { io: { stdout(l: string): void; stderr(l: string): void }; text(): string } {
  let text = "";
  return { io: { stdout: (l) => (text += `${l}\n`), stderr: (l) => (text += `${l}\n`) }, text: () => text };
}

const fenced = (b: ReadmeBlock) => `\`\`\`${b.kind}\n${b.text}\n\`\`\`\n`;

/**
 * Writes the README's examples as a project: its example project.md front matter (or a minimal one), the
 * `material` blocks in 10-materials.md and the other blocks in 20-walls.md, the files the front matter names.
 */
async function writeReadmeProject(markdown: string, dir: string): Promise<readonly ReadmeBlock[]> {
  const { frontMatter, blocks } = readmeExamples(markdown);
  const note = (b: ReadmeBlock) => `Example from README.md line ${b.line}.\n\n${fenced(b)}`;
  await Deno.writeTextFile(
    join(dir, "project.md"),
    `${frontMatter ?? "---\ntitle: README examples\ndate: 2026-01-01\n---"}\n\nThe README's examples.\n`,
  );
  await Deno.writeTextFile(
    join(dir, "10-materials.md"),
    blocks.filter((b) => b.kind === "material").map(note).join("\n"),
  );
  await Deno.writeTextFile(
    join(dir, "20-walls.md"),
    blocks.filter((b) => b.kind !== "material").map(note).join("\n"),
  );
  return blocks;
}

Deno.test("README example blocks find nested fences and keep their README line", () => {
  const md = "text\n\n````markdown\n```material\nid: a\n```\n````\n\n```sh\nfluxnote check p\n```\n";
  assert.deepEqual(fencedBlocks(md).map((f) => [f.info, f.line]), [["markdown", 3], ["material", 4], [
    "sh",
    9,
  ]]);
  assert.deepEqual(readmeExamples(md).blocks, [{ kind: "material", text: "id: a", line: 4 }]);
});

Deno.test("README example blocks build together as a project with no errors", async () => {
  const markdown = await Deno.readTextFile(README);
  const dir = await Deno.makeTempDir({ prefix: "fluxnote-readme-" });
  try {
    const blocks = await writeReadmeProject(markdown, dir);
    const kinds = new Set(blocks.map((b) => b.kind));
    assert.deepEqual(
      [...kinds].sort(),
      ["construction", "material", "room", "scenario"],
      "the README shows every kind",
    );
    const check = collect();
    const checkCode = await runCheck({ project: dir, format: "text", strict: false }, check.io);
    assert.match(check.text(), /^0 error\(s\)/m, check.text());
    assert.equal(checkCode, 0, check.text());
    const build = collect();
    const out = join(dir, "out");
    assert.equal(await runBuild({ project: dir, out }, build.io), 0, build.text());
    // Every block was read and used, not skipped: each construction and scenario id shows in the results,
    // and each material's name in the layer table of a construction that uses it.
    const results = await Deno.readTextFile(join(out, "results.json"));
    // Each room is computed: its output under its block is titled by its id, and results.json holds it.
    const page = await Deno.readTextFile(join(out, "package.html"));
    for (const b of blocks.filter((b) => b.kind === "room")) {
      const id = /^id: *(.+?) *(#.*)?$/m.exec(b.text)?.[1];
      assert.ok(
        id !== undefined && page.includes(`Results of room ${id}</h4>`) && results.includes(`"${id}": {`),
        `README.md:${b.line}: room "${id}" is missing from the package`,
      );
    }
    for (const b of blocks.filter((b) => b.kind !== "room")) {
      const key = b.kind === "material" ? "name" : "id";
      const value = new RegExp(`^${key}: *(.+?) *(#.*)?$`, "m").exec(b.text)?.[1];
      assert.ok(value !== undefined, `README.md:${b.line}: the ${b.kind} example has no ${key}`);
      assert.ok(
        results.includes(JSON.stringify(value)),
        `README.md:${b.line}: ${b.kind} ${key} "${value}" is missing from results.json`,
      );
    }
  } finally {
    await Deno.remove(dir, { recursive: true });
  }
});

/** What is wrong with usage lines: an unknown command, an option the command refuses or its help never names. */
async function usageLineProblems(lines: readonly UsageLine[]): Promise<string[]> {
  const problems: string[] = [];
  for (const { line, command, options } of lines) {
    const help = collect();
    // `help` and `--version` are run as they are written; every other command must answer `--help` with its usage.
    const meta = command === "help" || command.startsWith("-");
    const code = await main(meta ? [command] : [command, "--help"], help.io);
    if (code !== 0 || (!meta && !help.text().startsWith(`usage: fluxnote ${command}`))) {
      problems.push(`${line}: "fluxnote ${command} --help" exits ${code}: ${help.text().split("\n")[0]}`);
      continue;
    }
    if (meta) continue; // their lines name other commands' options in prose, e.g. "(and <command> --help)"
    for (const { name, sample } of options) {
      const parsed = collect();
      const args = [command, `--${name}`, ...(sample === undefined ? [] : [sample]), "--help"];
      const optionCode = await main(args, parsed.io);
      if (optionCode !== 0) problems.push(`${line}: "${args.join(" ")}" exits ${optionCode}`);
      else if (!help.text().includes(`--${name}`)) problems.push(`${line}: the help never names --${name}`);
    }
  }
  return problems;
}

Deno.test("README names only real commands and options", async () => {
  const lines = readmeUsageLines(await Deno.readTextFile(README));
  const commands = new Set(lines.map((l) => l.command));
  for (const c of ["build", "check", "diff", "verify", "init", "serve", "materials", "help"]) {
    assert.ok(commands.has(c), `the README's usage shows "fluxnote ${c}"`);
  }
  assert.deepEqual(await usageLineProblems(lines), []);
});

Deno.test("README usage lines with an unknown command or option are caught", async () => {
  const md = "```\nfluxnote check <project> [--bogus]\nfluxnote frob <x>\n" +
    "fluxnote build <project> [--out <dir>]\n                [--pdff]\n```\n";
  const lines = readmeUsageLines(md);
  assert.deepEqual(lines.map((l) => [l.command, l.options.map((o) => o.name)]), [
    ["check", ["bogus"]],
    ["frob", []],
    ["build", ["out", "pdff"]],
  ]);
  const problems = await usageLineProblems(lines);
  assert.equal(problems.length, 3, problems.join("\n"));
  assert.match(problems[0]!, /--bogus/);
  assert.match(problems[1]!, /fluxnote frob --help" exits 2/);
  assert.match(problems[2]!, /--pdff/);
});
