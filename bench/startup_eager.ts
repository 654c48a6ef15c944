/**
 * The command line as it started before per-command loading (bench/startup.ts compares the two): every
 * command's modules are loaded before the arguments are looked at, as src/cli.ts imported them statically.
 */
import "../src/commands/build.ts";
import "../src/commands/check.ts";
import "../src/commands/diff.ts";
import "../src/commands/init.ts";
import "../src/commands/verify.ts";
import "../src/commands/signingKeys.ts";
import "../src/commands/serve.ts";
import { main } from "../src/cli.ts";
import { streamWriter } from "../src/commands/terminalIo.ts";

if (import.meta.main) {
  Deno.exit(await main(Deno.args, { stdout: streamWriter(Deno.stdout), stderr: streamWriter(Deno.stderr) }));
}
