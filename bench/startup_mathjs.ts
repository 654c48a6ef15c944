/**
 * The command line as it started before units were read by our own reader (bench/startup.ts compares them):
 * mathjs's single-file build is loaded first, as src/project/quantity.ts imported it, then src/cli.ts runs.
 */
import "mathjs/lib/browser/math.js";
import { main } from "../src/cli.ts";
import { streamWriter } from "../src/commands/terminalIo.ts";

if (import.meta.main) {
  Deno.exit(await main(Deno.args, { stdout: streamWriter(Deno.stdout), stderr: streamWriter(Deno.stderr) }));
}
