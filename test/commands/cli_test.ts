import assert from "node:assert/strict";
import { main } from "../../src/cli.ts";

async function run(args: string[]): Promise<{ code: number; out: string; err: string }> {
  let out = "";
  let err = "";
  const code = await main(args, { stdout: (l) => (out += `${l}\n`), stderr: (l) => (err += `${l}\n`) });
  return { code, out, err };
}

Deno.test("main() answers usage errors with exit 2 and the command's help (DESIGN.md §3 exit codes)", async () => {
  for (
    const args of [
      ["build"],
      ["build", "a", "b"],
      ["check", "x", "--format", "xml"],
      ["diff", "a"],
      ["verify"],
      ["serve", "p", "--port", "99999"],
      ["frob"],
      ["build", "--bogus", "x"],
    ]
  ) {
    const result = await run(args);
    assert.equal(result.code, 2, args.join(" "));
    assert.ok(result.err.includes("usage:"), args.join(" "));
    assert.ok(!/\n\s+at /.test(result.err), "no stack trace");
  }
});

Deno.test("main() prints each command's help with exit 0", async () => {
  for (const command of ["build", "check", "diff", "verify", "init", "serve"]) {
    const result = await run([command, "--help"]);
    assert.equal(result.code, 0);
    assert.ok(result.out.startsWith(`usage: fluxnote ${command}`), command);
  }
  assert.ok((await run([])).out.includes("commands:"));
});

Deno.test("main() knows keygen, build --sign and verify --key", async () => {
  const help = await run(["keygen", "--help"]);
  assert.equal(help.code, 0);
  assert.ok(help.out.startsWith("usage: fluxnote keygen <name>"));
  assert.ok((await run(["build", "--help"])).out.includes("--sign <file>"));
  assert.ok((await run(["verify", "--help"])).out.includes("--key <file>"));
  for (const args of [["keygen"], ["keygen", "a", "b"], ["verify", "p.html", "--key"]]) {
    const result = await run(args);
    assert.equal(result.code, 2, args.join(" "));
    assert.ok(result.err.includes("usage:"), args.join(" "));
  }
});
