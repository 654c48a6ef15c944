/**
 * Runs `fluxnote check <project>` through src/cli.ts's `main` in this fresh process and prints one JSON line:
 * the exit code, the rules of the findings and which reader libraries were loaded. For test/commands/checkStartup_test.ts.
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
const { markdownLibrary, yamlLibrary } = await import("../../src/project/readerLibraries.ts");
const loaded = Object.entries({ YAML: yamlLibrary, Markdown: markdownLibrary }).flatMap(([name, library]) => {
  try {
    library();
    return [name];
  } catch {
    return [];
  }
});
const rules = (JSON.parse(out) as { findings: { rule: string }[] }).findings.map((f) => f.rule);
console.log(JSON.stringify({ code, rules: [...new Set(rules)], loaded }));
