/**
 * The demo package reads as an issued document: no internal wording, one general caution worded for any
 * jurisdiction plus the cautions that apply to the project, "Calculation methods" as section 3, the runtime
 * named once, and a build line that counts the heating scenario. Built end to end from projects/demo.
 */
import assert from "node:assert/strict";
import { join } from "node:path";
import { runBuild } from "../../src/commands/build.ts";
import { LIBRARY_MATERIALS } from "../../src/materials/library.ts";
import { parseDocument } from "./dom.ts";

const DEMO = new URL("../../projects/demo/", import.meta.url).pathname;

let cached: Promise<{ text: string; doc: Document; stdout: string[] }> | undefined;
function built(): Promise<{ text: string; doc: Document; stdout: string[] }> {
  cached ??= (async () => {
    const out = join(await Deno.makeTempDir(), "out");
    const stdout: string[] = [];
    assert.equal(
      await runBuild({ project: DEMO, out }, { stdout: (l) => stdout.push(l), stderr: () => {} }),
      0,
    );
    const doc = parseDocument(Deno.readTextFileSync(join(out, "package.html")));
    return { text: doc.body.textContent ?? "", doc, stdout };
  })();
  return cached;
}

const count = (text: string, needle: string) => text.split(needle).length - 1;

Deno.test("demo package: no internal wording (design rules, our stated rules, tool rules, option names in quotes)", async () => {
  const { text } = await built();
  for (
    const phrase of [
      "DESIGN rule",
      "our stated rule",
      "fluxnote transposition rules",
      'sky diffuse "handbook"',
    ]
  ) {
    assert.equal(count(text, phrase), 0, `"${phrase}" in the package`);
  }
});

Deno.test('demo package: section 3 is "Calculation methods", not "Method statement" (a site-safety document)', async () => {
  const { doc, text } = await built();
  assert.equal(doc.querySelector("#s-3 h2")?.textContent, "3 Calculation methods");
  assert.equal(count(text, "Method statement"), 0);
});

Deno.test("demo package: the general caution prints once, for any jurisdiction, with the project's cautions", async () => {
  const { doc, text } = await built();
  assert.equal(count(text, "licensed professional"), 0);
  assert.equal(count(text, "they do not replace it"), 1, "the general caution once");
  assert.equal(count(text, "do not replace, the professional judgment"), 0, "no per-scenario repeat");
  const cautions = doc.querySelector("#s-8")?.textContent ?? "";
  assert.match(cautions, /where the building stands/);
  // The demo runs a synthetic weather year, uses library values marked "from memory" and the default outside film.
  assert.match(cautions, /Synthetic weather: scenario\(s\) weather-year-synthetic/);
  assert.match(cautions, /Library values not confirmed: .*clay-brick-outer-leaf-1700/);
  assert.match(
    cautions,
    /Outside film: the sol-air temperature and the conduction use one outside coefficient/,
  );
});

Deno.test("demo package: the runtime is named once; the build line counts the heating scenario", async () => {
  const { doc, stdout } = await built();
  const row = Array.from(doc.querySelectorAll("#s-10 tr")).find((r) =>
    r.querySelector("th")?.textContent === "Runtime"
  );
  assert.match(row?.querySelector("td")?.textContent ?? "", /^Deno \d+\.\d+\.\d+$/);
  // projects/demo: EW-1…EW-4 and RF-1; july-design-day, weather-year-synthetic and the heating scenario winter-design.
  assert.match(stdout.join("\n"), /\(5 constructions, 3 scenarios\)/);
});

Deno.test("built-in library: every source is a material-data source, not a simulation test case", () => {
  for (const m of LIBRARY_MATERIALS) {
    assert.doesNotMatch(m.source, /Standard 140|\bcase \d+/i, `${m.id}: ${m.source}`);
  }
});
