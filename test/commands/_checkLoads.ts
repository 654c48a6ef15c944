/**
 * Runs `fluxnote check <project>` through src/cli.ts's `main` in this fresh process and prints one JSON line:
 * the exit code, the rules of the findings and whether the YAML library was loaded. For test/commands/checkStartup_test.ts.
 *
 *   deno run --allow-read test/commands/_checkLoads.ts <project folder>
 */
import { main } from "../../src/cli.ts";

let out = "";
const code = await main(["check", Deno.args[0] ?? "", "--format", "json"], {
  stdout: (text) => (out += text),
  stderr: () => {},
  colour: false,
});
const { yamlLibrary } = await import("../../src/project/yamlLibrary.ts");
let yamlLoaded = true;
try {
  yamlLibrary();
} catch {
  yamlLoaded = false;
}
const rules = (JSON.parse(out) as { findings: { rule: string }[] }).findings.map((f) => f.rule);
console.log(JSON.stringify({ code, rules: [...new Set(rules)], yamlLoaded }));
