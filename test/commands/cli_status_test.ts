/**
 * What the terminal tells after a command: build's status block (failed checks, unmet limits, open items,
 * warnings, output path), --quiet, colour only on a terminal without NO_COLOR, -V, `help <unknown>`, and
 * the unknown-option message.
 */
import assert from "node:assert/strict";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { main } from "../../src/cli.ts";
import type { CommandIo } from "../../src/commands/build.ts";
import { styledLine, terminalIo } from "../../src/commands/terminalIo.ts";

const MINIMAL = fileURLToPath(new URL("../fixtures/good/minimal/", import.meta.url));
const ESC = "\u001b";

async function run(args: string[], colour?: boolean): Promise<{ code: number; out: string; err: string }> {
  let out = "";
  let err = "";
  const io: CommandIo = {
    stdout: (l) => (out += `${l}\n`),
    stderr: (l) => (err += `${l}\n`),
    ...(colour === undefined ? {} : { colour }),
  };
  const code = await main(args, io);
  return { code, out, err };
}

/** The minimal fixture with a U-value limit it cannot meet (its wall has U ≈ 0.3 W/(m²K)). */
async function projectWithUnmetLimit(): Promise<string> {
  const folder = await Deno.makeTempDir({ prefix: "fluxnote-status-" });
  Deno.copyFileSync(join(MINIMAL, "project.md"), join(folder, "project.md"));
  const walls = Deno.readTextFileSync(join(MINIMAL, "walls.md")).replace(
    "layers:",
    'limits:\n  max-u: { value: "0.1 W/(m^2 K)", clause: "Invented brief, cl. 1" }\nlayers:',
  );
  Deno.writeTextFileSync(join(folder, "walls.md"), walls);
  return folder;
}

Deno.test("build prints a status block after writing: failed checks, unmet limits, open items, warnings, output", async () => {
  const project = await projectWithUnmetLimit();
  try {
    const out = join(project, "out");
    const result = await run(["build", project, "--out", out]);
    assert.equal(result.code, 0, result.err);
    const lines = result.out.trimEnd().split("\n");
    assert.match(lines[0]!, /^wrote /);
    const block = lines.slice(1);
    assert.deepEqual(
      block.map((l) => /^ {2}(\S+(?: \S+)?) {2,}/.exec(l)?.[1]),
      ["failed checks", "unmet limits", "open items", "warnings", "output"],
    );
    assert.match(block[0]!, /^ {2}failed checks +0$/);
    assert.match(block[1]!, /^ {2}unmet limits +1 {2}EW-1 max-u: 0\.\d+, limit 0\.1 W\/\(m²K\)$/);
    assert.match(block[2]!, /^ {2}open items +\d+ {2}\d+ [a-z-]+.*; \d+ stop status: issued$/);
    assert.match(block[4]!, new RegExp(`^ {2}output +${out.replaceAll("/", "\\/")}/package\\.html$`));
    // Aligned: the counts are right-aligned in one column, and the output path starts where that column does.
    const counts = block.slice(0, 4).map((l) => /^( {2}\S+(?: \S+)? +)(\d+)/.exec(l)!);
    const ends = new Set(counts.map((m) => m[1]!.length + m[2]!.length));
    assert.equal(ends.size, 1, block.join("\n"));
    const widest = Math.max(...counts.map((m) => m[2]!.length));
    assert.equal(block[4]!.search(/\//), [...ends][0]! - widest, block.join("\n"));
    assert.ok(!result.out.includes(ESC), "no colour without a terminal");
  } finally {
    await Deno.remove(project, { recursive: true });
  }
});

Deno.test("build --quiet prints errors only", async () => {
  const project = await projectWithUnmetLimit();
  try {
    const quiet = await run(["build", project, "--out", join(project, "out"), "--quiet"]);
    assert.equal(quiet.code, 0, quiet.err);
    assert.equal(quiet.out, "");
    assert.equal(quiet.err, "");
    Deno.writeTextFileSync(join(project, "walls.md"), "```construction\nid: EW-1\nlayers: []\n```\n");
    const broken = await run(["build", project, "--out", join(project, "out"), "-q"]);
    assert.equal(broken.code, 1);
    assert.match(broken.err, /walls\.md:\d+:\d+: error: /);
    assert.doesNotMatch(broken.err, /: (warning|note): /);
  } finally {
    await Deno.remove(project, { recursive: true });
  }
});

Deno.test("the status block is coloured only when the output is a terminal that takes colour", async () => {
  const parts = [{ text: "  failed checks  " }, { text: "2", tone: "bad" as const }];
  assert.equal(styledLine(parts, false), "  failed checks  2");
  assert.equal(styledLine(parts, true), `  failed checks  ${ESC}[31m2${ESC}[0m`);
  // The text inside a coloured part is still made safe: an escape in a name cannot reach the terminal raw.
  assert.equal(styledLine([{ text: `x${ESC}[2J`, tone: "warn" }], true), `${ESC}[33mx\\u001b[2J${ESC}[0m`);
  let written = "";
  terminalIo({ stdout: (l) => (written += l), stderr: () => {}, colour: false }).styled!(parts);
  assert.ok(!written.includes(ESC));
  const project = await projectWithUnmetLimit();
  try {
    const coloured = await run(["build", project, "--out", join(project, "out")], true);
    assert.match(coloured.out, new RegExp(`unmet limits +${ESC}\\[33m1${ESC}\\[0m`));
  } finally {
    await Deno.remove(project, { recursive: true });
  }
});

Deno.test("NO_COLOR set (not empty) turns colour off on a terminal; an empty NO_COLOR does not", async () => {
  // `script` gives the child a terminal; where it is missing the decision is still covered above.
  const hasScript = await new Deno.Command("sh", { args: ["-c", "command -v script"], stdout: "null" })
    .output();
  if (!hasScript.success) return;
  const cli = fileURLToPath(new URL("../../src/cli.ts", import.meta.url));
  const project = await projectWithUnmetLimit();
  try {
    const onTerminal = async (noColor: string | undefined) => {
      const inner =
        `${Deno.execPath()} run --quiet --no-prompt --allow-read --allow-write ${cli} build ${project}`;
      const result = await new Deno.Command("sh", {
        args: [
          "-c",
          `${noColor === undefined ? "unset NO_COLOR; " : ""}exec script -qec "$0" /dev/null`,
          inner,
        ],
        env: noColor === undefined ? {} : { NO_COLOR: noColor },
        stdout: "piped",
        stderr: "piped",
      }).output();
      return new TextDecoder().decode(result.stdout);
    };
    assert.match(await onTerminal(undefined), new RegExp(`${ESC}\\[33m1${ESC}\\[0m`));
    assert.match(await onTerminal(""), new RegExp(`${ESC}\\[33m1${ESC}\\[0m`));
    const plain = await onTerminal("1");
    assert.match(plain, /unmet limits +1/);
    assert.doesNotMatch(plain, new RegExp(`${ESC}\\[3\\dm`));
  } finally {
    await Deno.remove(project, { recursive: true });
  }
});

Deno.test("-V prints the version like --version", async () => {
  const long = await run(["--version"]);
  const short = await run(["-V"]);
  assert.equal(short.code, 0);
  assert.equal(short.out, long.out);
  assert.match(short.out, /^fluxnote \d+\.\d+\.\d+\n$/);
});

Deno.test("help for an unknown command exits 2 and says there is no such command", async () => {
  const result = await run(["help", "frob"]);
  assert.equal(result.code, 2);
  assert.match(result.err, /^fluxnote help: no command "frob"/);
  assert.ok(result.err.includes("commands:"));
  assert.equal((await run(["help", "build"])).code, 0);
});

Deno.test("an unknown option is named with balanced quotes and a fix", async () => {
  const result = await run(["build", "--bogus", "x"]);
  assert.equal(result.code, 2);
  const first = result.err.split("\n")[0]!;
  assert.equal(
    first,
    'fluxnote build: unknown option "--bogus"; a project or file whose name starts with "-" goes after "--", as in: -- "--bogus"',
  );
  for (const quote of ['"', "'"]) {
    assert.equal(first.split(quote).length % 2, 1, `unbalanced ${quote} in: ${first}`);
  }
});
