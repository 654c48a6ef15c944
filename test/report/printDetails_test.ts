/**
 * Print details of the demo package (ISSUE 11, item 9): a table's header row is a thead, so the browser repeats
 * it on every page the table runs over, and the print rules never leave it as the last line of a page; the
 * cover and section 4 count the review findings in the same words, the folded "Default in use" notes included.
 */
import assert from "node:assert/strict";
import { demoPackage } from "./demoBuild.ts";
import { parseDocument } from "./dom.ts";

const demo = async (units: "SI" | "IP") => parseDocument(await Deno.readTextFile(await demoPackage(units)));
const textOf = (el: Element | null | undefined) => (el?.textContent ?? "").replace(/\s+/g, " ").trim();

/** A table of label–value rows (a row header and one value per row) has no header row to repeat. */
function isKeyValue(table: Element): boolean {
  return Array.from(table.querySelectorAll("tr")).every((tr) => {
    const cells = Array.from(tr.children);
    return cells.length <= 2 && cells[0]?.tagName === "TH" && cells[0].getAttribute("scope") === "row";
  });
}

for (const units of ["SI", "IP"] as const) {
  Deno.test(`${units} demo: every table with a header row has it in a thead`, async () => {
    const doc = await demo(units);
    const tables = Array.from(doc.querySelectorAll("table"));
    assert.ok(tables.length > 30, `${tables.length} tables`);
    const without = tables.filter((t) => t.querySelector("thead") === null && !isKeyValue(t));
    assert.deepEqual(
      without.map((t) =>
        `${t.getAttribute("class") ?? ""}: ${textOf(t.querySelector("caption") ?? t).slice(0, 60)}`
      ),
      [],
    );
  });
}

Deno.test("print rules: a table's header rows are never the last lines of a page", async () => {
  const doc = await demo("SI");
  const css = Array.from(doc.querySelectorAll("style")).map((s) => s.textContent ?? "").join("\n");
  const print = css.slice(css.indexOf("@media print"));
  assert.match(print, /thead, thead tr \{[^}]*break-after: avoid/);
  assert.match(print, /tbody > tr:first-child \{[^}]*break-before: avoid/);
  assert.match(print, /thead \{ display: table-header-group; \}/);
  // A caption is not split over two pages either (the open-items caption ended page 2 of the demo).
  assert.match(print, /caption \{ break-inside: avoid;/);
});

Deno.test("demo: the cover and section 4 count the review findings alike, folded notes included", async () => {
  const doc = await demo("SI");
  const line = (root: Element | null) => {
    const p = Array.from(root?.querySelectorAll("p") ?? []).map(textOf).find((t) =>
      t.startsWith("Review findings:")
    );
    return p?.replace(/; see the checks and findings\.$|\.$/, "");
  };
  const cover = line(doc.querySelector(".cover"));
  const section = line(doc.querySelector("#s-4"));
  assert.ok(cover !== undefined && section !== undefined, `cover: ${cover}; section 4: ${section}`);
  assert.equal(cover, section);
  const folded = /(\d+) notes \((all|(\d+) of them) "Default in use", folded into the assumptions register\)/
    .exec(cover);
  assert.ok(folded !== null, cover);
  const register = textOf(doc.querySelector("#s-5"));
  const inRegister = /The review's (\d+) notes "Default in use" are folded/.exec(register);
  assert.equal(inRegister?.[1], folded[3] ?? folded[1], register.slice(0, 300));
});
