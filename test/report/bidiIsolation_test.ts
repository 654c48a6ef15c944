/**
 * Bidirectional overrides in names and file names (U+202E RIGHT-TO-LEFT OVERRIDE, U+2066 LEFT-TO-RIGHT
 * ISOLATE; UAX #9) are isolated in the package: every text node holding one sits in a <bdi> element,
 * whose default style `unicode-bidi: isolate` (HTML Living Standard rendering section, from memory)
 * keeps it from reordering the text around it. The embedded inputs stay byte-exact.
 */
import assert from "node:assert/strict";
import { join } from "node:path";
import { extractPackage } from "../../src/archive/extract.ts";
import { loadProject } from "../../src/commands/loadProject.ts";
import { produceOutputs } from "../../src/commands/produce.ts";
import { html } from "../../src/report/page/html.ts";
import { parseDocument } from "./dom.ts";

const GOOD = new URL("../fixtures/good/minimal/", import.meta.url).pathname;
const BIDI = /[\u061C\u200E\u200F\u202A-\u202E\u2066-\u2069]/;

Deno.test("html`` puts text with a bidi override in <bdi> in element content, not in attributes", () => {
  assert.equal(html`<td>${"a\u202Eb"}</td>`.markup, "<td><bdi>a\u202Eb</bdi></td>");
  assert.equal(html`<td>${"plain"}</td>`.markup, "<td>plain</td>");
  assert.equal(html`<pre data-path="${"x\u202E.md"}">`.markup, '<pre data-path="x\u202E.md">');
  assert.equal(html`<title>${"t\u202Ex"}</title>`.markup, "<title>t\u202Ex</title>");
  // In SVG text an HTML element would not be rendered: the isolate characters U+2068 … U+2069 are used.
  assert.equal(html`<text x="1">${"a\u202Eb"}</text>`.markup, '<text x="1">\u2068a\u202Eb\u2069</text>');
});

Deno.test("a package with bidi overrides in names and a file name isolates every one in <bdi>", async () => {
  const folder = await Deno.makeTempDir({ prefix: "fluxnote-bidi-" });
  try {
    const project = Deno.readTextFileSync(join(GOOD, "project.md"))
      .replace("title: Fixture project", 'title: "Fixture \u202Etcejorp"')
      .replace("prepared-by: Test Preparer", 'prepared-by: "Test \u2066Preparer"');
    Deno.writeTextFileSync(join(folder, "project.md"), project);
    const walls = Deno.readTextFileSync(join(GOOD, "walls.md"))
      .replace("name: Test wall", 'name: "Test \u202Ellaw"')
      .replace("{ name: cavity,", '{ name: "cavity \u202Eria",');
    const wallsFile = "walls\u202Edm.md";
    Deno.writeTextFileSync(join(folder, wallsFile), walls);
    const loaded = await loadProject(folder);
    assert.deepEqual(loaded.diagnostics.filter((d) => d.severity === "error"), []);
    const produced = produceOutputs(loaded);
    assert.ok(produced.ok, "the project did not build");
    const page = produced.outputs.page;
    const doc = parseDocument(page);
    const walker = doc.createTreeWalker(doc.body, 4 /* NodeFilter.SHOW_TEXT */);
    let found = 0;
    for (let node = walker.nextNode(); node !== null; node = walker.nextNode()) {
      const text = node.textContent ?? "";
      if (!BIDI.test(text)) continue;
      found++;
      const parent = node.parentElement;
      const svgIsolated = text.startsWith("\u2068") && text.endsWith("\u2069");
      assert.ok(
        parent !== null && (parent.closest("bdi") !== null || svgIsolated),
        `not isolated in <${parent?.tagName.toLowerCase()}>: ${JSON.stringify(text)}`,
      );
    }
    assert.ok(found >= 5, `only ${found} text nodes with bidi controls: the names did not reach the page`);
    // The archive reader still gets the exact inputs and file name back.
    const extracted = extractPackage(page);
    assert.ok(extracted.ok, "the package could not be extracted");
    const bytes = extracted.contents.files.get(wallsFile);
    assert.ok(bytes !== undefined, "the file with a bidi override in its name was not extracted");
    assert.equal(new TextDecoder().decode(bytes), walls);
    assert.equal(extracted.contents.resultsJsonText, produced.outputs.embeddedResultsText);
  } finally {
    await Deno.remove(folder, { recursive: true });
  }
});
