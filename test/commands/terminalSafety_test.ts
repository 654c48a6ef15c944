/**
 * Values from a project, a weather file or a package never reach the terminal raw: ESC (title change,
 * clear screen, colours), BEL, CR, C1 and bidi controls are shown as `\u001b`-style escapes, a newline in
 * a value cannot start a line of its own (no fake "REPRODUCED"), and a long value is shortened.
 * The escape sequences used are the ECMA-48 / xterm control sequences (OSC 0 title: ESC ] 0 ; … BEL;
 * ED clear screen: ESC [ 2 J; SGR colour: ESC [ 31 m) — from memory.
 */
import assert from "node:assert/strict";
import { join } from "node:path";
import { main } from "../../src/cli.ts";
import { parseHTML } from "linkedom";
import { runBuild } from "../../src/commands/build.ts";
import { oneLine, shortened, terminalSafe } from "../../src/project/displayText.ts";
import { weatherScenarioBlock } from "../scenarios/_scenarioBlocks.ts";

const GOOD = new URL("../fixtures/good/minimal/", import.meta.url).pathname;
const quiet = { stdout: () => {}, stderr: () => {} };

/** Any control character except TAB and LF, DEL, C1, and the bidi controls: none may be written raw. */
// deno-lint-ignore no-control-regex
const RAW_CONTROL = /[\u0000-\u0008\u000b-\u001f\u007f-\u009f\u061c\u200e\u200f\u202a-\u202e\u2066-\u2069]/;

async function run(args: string[]): Promise<{ code: number; out: string; err: string }> {
  let out = "";
  let err = "";
  const code = await main(args, { stdout: (l) => (out += `${l}\n`), stderr: (l) => (err += `${l}\n`) });
  return { code, out, err };
}

/** Writes the minimal good project with edits into a new temp folder and returns it. */
async function project(edit: (files: Record<string, string>) => void): Promise<string> {
  const folder = await Deno.makeTempDir({ prefix: "fluxnote-terminal-" });
  const files: Record<string, string> = {
    "project.md": Deno.readTextFileSync(join(GOOD, "project.md")),
    "walls.md": Deno.readTextFileSync(join(GOOD, "walls.md")),
  };
  edit(files);
  for (const [name, text] of Object.entries(files)) Deno.writeTextFileSync(join(folder, name), text);
  return folder;
}

function assertNoRawControl(text: string, what: string): void {
  const found = RAW_CONTROL.exec(text);
  assert.equal(found, null, `${what}: a raw U+${found?.[0].charCodeAt(0).toString(16)} reached the terminal`);
  assert.doesNotMatch(text, /^REPRODUCED/m, `${what}: a value started a line of its own`);
}

// YAML double-quoted escapes (YAML 1.2 §5.7): \e ESC, \a BEL, \n LF, \r CR, \u202e RIGHT-TO-LEFT OVERRIDE.
const PAYLOAD = String.raw`\e]0;owned\a\e[2J\e[31m\r\nREPRODUCED: fake\u202e`;

const CASES: readonly { name: string; edit: (files: Record<string, string>) => void; shows: string }[] = [
  {
    name: "the front-matter date",
    edit: (f) => (f["project.md"] = f["project.md"]!.replace("date: 2031-01-15", `date: "2031${PAYLOAD}"`)),
    shows: "Cannot use the control character U+001B",
  },
  {
    name: "a name in files:",
    edit: (
      f,
    ) => (f["project.md"] = f["project.md"]!.replace(
      "units: SI\n",
      `units: SI\nfiles: [walls.md, "x${PAYLOAD}.md"]\n`,
    )),
    shows: "Cannot use the control character U+001B",
  },
  {
    name: "the weather path",
    edit: (f) => (f["walls.md"] = `${f["walls.md"]}\n${weatherScenarioBlock(`"w${PAYLOAD}.csv"`)}`),
    shows: "Cannot use the control character U+001B",
  },
  {
    name: "a material class",
    edit: (f) => (f["mat.md"] = [
      "```material",
      "id: m1",
      "name: M",
      `class: "brick${PAYLOAD}"`,
      "conductivity: 0.5 W/(m K)",
      "density: 1000 kg/m^3",
      "specific-heat: 1000 J/(kg K)",
      "source: test",
      "```",
      "",
    ].join("\n")),
    shows: "Cannot use the control character U+001B",
  },
  {
    name: "a weather cell",
    edit: (f) => {
      f["walls.md"] = `${f["walls.md"]}\n${weatherScenarioBlock("weather.csv")}`;
      f["weather.csv"] = "time,dry-bulb,global-horizontal,diffuse-horizontal\n" +
        "2031-01-01T01:00,\u001b]0;owned\u0007\u001b[2J\u009b31m\u202e,0,0\n";
    },
    shows: "weather.csv:2:",
  },
];

for (const c of CASES) {
  Deno.test(`check and build escape control characters from ${c.name} and keep each message on its lines`, async () => {
    const folder = await project(c.edit);
    try {
      const check = await run(["check", folder]);
      assert.equal(check.code, 1, check.err);
      assert.ok(check.err.includes(c.shows), check.err);
      // The YAML reader refuses control characters and names them as U+001B; a weather cell is echoed escaped.
      assert.ok(/\\u001b|U\+001B/.test(check.err), `the ESC is not shown escaped:\n${check.err}`);
      assertNoRawControl(check.err + check.out, `check, ${c.name}`);
      const build = await run(["build", folder, "--out", join(folder, "out")]);
      assertNoRawControl(build.err + build.out, `build, ${c.name}`);
      const json = await run(["check", folder, "--format", "json"]);
      // JSON output stays valid JSON and carries the value itself, not a changed one.
      const parsed = JSON.parse(json.out) as { findings: { message: string }[] };
      assert.ok(
        parsed.findings.some((f) => f.message.includes("\u001b") || f.message.includes("U+001B")),
        "the JSON lost the value",
      );
      assertNoRawControl(json.out, `check --format json, ${c.name}`);
    } finally {
      await Deno.remove(folder, { recursive: true });
    }
  });
}

Deno.test("a 10 MB weather cell is shortened in the message, not echoed whole", async () => {
  const folder = await project((f) => {
    f["walls.md"] = `${f["walls.md"]}\n${weatherScenarioBlock("weather.csv")}`;
  });
  try {
    const cell = "x".repeat(10 * 1024 * 1024);
    Deno.writeTextFileSync(
      join(folder, "weather.csv"),
      `time,dry-bulb,global-horizontal,diffuse-horizontal\n2031-01-01T01:00,${cell},0,0\n`,
    );
    const check = await run(["check", folder]);
    assert.equal(check.code, 1);
    assert.ok(check.err.includes(`(${cell.length} characters)`), check.err.slice(0, 500));
    assert.ok(check.err.length < 5_000, `${check.err.length} characters written`);
    const json = await run(["check", folder, "--format", "json"]);
    assert.ok(json.out.length < 10_000, `${json.out.length} characters of JSON`);
  } finally {
    await Deno.remove(folder, { recursive: true });
  }
});

Deno.test("verify shows a hostile embedded file name escaped: no fake REPRODUCED line, no raw ESC", async () => {
  const base = await Deno.makeTempDir({ prefix: "fluxnote-terminal-" });
  try {
    assert.equal(await runBuild({ project: GOOD, out: join(base, "out") }, quiet), 0);
    const path = join(base, "out", "package.html");
    const page = Deno.readTextFileSync(path).replace(
      /data-path="walls\.md" data-sha256="[0-9a-f]{64}"/,
      `data-path="walls&#x1b;[2J&#x0a;REPRODUCED: results and package are byte-identical.md" data-sha256="${
        "0".repeat(64)
      }"`,
    );
    assert.ok(page.includes("&#x0a;REPRODUCED"), "the package was not edited");
    Deno.writeTextFileSync(path, page);
    const verify = await run(["verify", path]);
    assert.equal(verify.code, 1);
    assert.ok(verify.err.includes("\\u001b[2J\\nREPRODUCED"), verify.err);
    assertNoRawControl(verify.err + verify.out, "verify");
  } finally {
    await Deno.remove(base, { recursive: true });
  }
});

Deno.test("terminalSafe() and oneLine() make every control and bidi character visible (Unicode 15 Cc and Bidi_Control)", () => {
  // Cc = U+0000–U+001F and U+007F–U+009F; Bidi_Control = U+061C, U+200E, U+200F, U+202A–U+202E, U+2066–U+2069
  // (Unicode Character Database, PropList.txt; from memory).
  const controls = [
    ...Array.from({ length: 0x20 }, (_, i) => i),
    ...Array.from({ length: 0x21 }, (_, i) => 0x7f + i),
    0x061c,
    0x200e,
    0x200f,
    0x202a,
    0x202b,
    0x202c,
    0x202d,
    0x202e,
    0x2066,
    0x2067,
    0x2068,
    0x2069,
  ].map((c) => String.fromCharCode(c));
  for (const c of controls) {
    assert.doesNotMatch(oneLine(`a${c}b`), RAW_CONTROL);
    assert.ok(!oneLine(`a${c}b`).includes("\n"));
    if (c !== "\n" && c !== "\t") assert.doesNotMatch(terminalSafe(`a${c}b`), RAW_CONTROL);
  }
  assert.equal(terminalSafe("line 1\nline 2\tcell"), "line 1\nline 2\tcell");
  assert.equal(oneLine("a\u001b[2Jb\nc"), "a\\u001b[2Jb\\nc");
  assert.equal(terminalSafe("U = 0.35 W/(m²·K) — “ok”"), "U = 0.35 W/(m²·K) — “ok”");
  assert.equal(shortened("y".repeat(300)), `${"y".repeat(200)}… (300 characters)`);
});

Deno.test("diff --format html on stdout carries bidi controls as references, which a browser reads back", async () => {
  // The reader refuses C0/C1 controls in YAML text, so the title carries a bidi override (allowed, isolated).
  const a = await project((
    f,
  ) => (f["project.md"] = f["project.md"]!.replace(
    "title: Fixture project",
    String.raw`title: "Fixture\u202e project"`,
  )));
  const b = await project((f) => (f["walls.md"] = f["walls.md"]!.replace("100 mm", "120 mm")));
  try {
    const diff = await run(["diff", a, b, "--format", "html"]);
    assert.equal(diff.code, 0, diff.err);
    assertNoRawControl(diff.out, "diff --format html");
    assert.ok(diff.out.includes("Fixture&#x202e; project"), "the title is not carried as references");
    // HTML numeric character references (WHATWG HTML, "numeric character reference end state"; from memory).
    const { document } = parseHTML(diff.out);
    assert.ok(
      document.body.textContent?.includes("Fixture\u202e project"),
      "a browser does not read the title back",
    );
  } finally {
    await Deno.remove(a, { recursive: true });
    await Deno.remove(b, { recursive: true });
  }
});
