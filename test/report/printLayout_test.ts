/** The package on paper: running header text, page-break rules and readable appendices. */
import assert from "node:assert/strict";
import { cssStringLiteral } from "../../src/report/page/html.ts";
import { packageCss } from "../../src/report/page/css.ts";
import { renderPackage } from "../../src/report/package.ts";
import { parseDocument } from "./dom.ts";
import { fixture } from "./fixture.ts";

/**
 * Decodes a CSS string token as a browser does. CSS Syntax Level 3 §4.3.7 "consume an escaped code point":
 * up to six hex digits, then one whitespace, if present, is consumed as well (from memory).
 */
function decodeCssString(literal: string): string {
  assert.ok(literal.startsWith('"') && literal.endsWith('"'));
  const body = literal.slice(1, -1);
  let out = "";
  for (let i = 0; i < body.length; i++) {
    if (body[i] !== "\\") {
      out += body[i];
      continue;
    }
    let hex = "";
    while (hex.length < 6 && /[0-9a-fA-F]/.test(body[i + 1] ?? "")) hex += body[++i];
    if (/[ \t\n]/.test(body[i + 1] ?? "")) i++;
    out += String.fromCodePoint(parseInt(hex, 16));
  }
  return out;
}

Deno.test("the running header keeps the space after an escaped character", () => {
  for (const text of ["Rev. B – issued", "“Wall” 12, ref. A/7", "a. b", "x  y"]) {
    assert.equal(decodeCssString(cssStringLiteral(text).markup), text);
  }
  const css = packageCss({ left: "Project: Demo", right: "Ref. 7 rev. B" }, undefined).markup;
  const topLeft = css.match(/@top-left \{ content: ("[^"]*")/)?.[1] ?? "";
  assert.equal(decodeCssString(topLeft), "Project: Demo");
});

function printRules(): string {
  const css = packageCss({ left: "a", right: "b" }, undefined).markup;
  const start = css.indexOf("@media print");
  assert.ok(start >= 0);
  return css.slice(start);
}

Deno.test("print keeps headings and the computed output label with what follows", () => {
  const print = printRules();
  const rule = print.match(/([^{}]*)\{[^{}]*break-after: avoid/)?.[1] ?? "";
  for (const selector of ["h2", "h3", "h4", ".input-label"]) {
    assert.ok(rule.split(",").map((s) => s.trim()).includes(selector), `${selector} in "${rule}"`);
  }
});

Deno.test("print lets long tables break with their header rows repeated on each page", () => {
  const print = printRules();
  // CSS 2.1 §17.2: thead as table-header-group repeats on every page a table spans (from memory).
  assert.match(print, /thead \{ display: table-header-group; \}/);
  const avoided = print.match(/([^{}]*)\{ break-inside: avoid; \}/)?.[1] ?? "";
  assert.ok(!avoided.split(",").map((s) => s.trim()).includes("table"), `tables not kept whole: ${avoided}`);
});

Deno.test("the printed appendices give the inputs in full and name the results by their hash", () => {
  const doc = parseDocument(renderPackage(fixture()));
  const printedInputs = Array.from(doc.querySelectorAll("#s-a .print-only pre.printed-file"));
  assert.ok(printedInputs.length >= 1, "a print-only readable input");
  const screen = doc.querySelector("#s-a details.screen-only pre.readable-file")?.textContent;
  assert.equal(printedInputs[0]?.textContent, screen, "the printed input is the whole text");
  const printedResults = doc.querySelector("#s-b .print-only.printed-results");
  assert.ok(printedResults !== null, "a print-only view of the results");
  assert.match(printedResults.textContent ?? "", /Appendices C and D/, "it says where the numbers print");
  assert.ok(doc.querySelector("#s-b details.screen-only") !== null, "the screen keeps the collapsed view");
  assert.match(doc.querySelector("#s-b .print-only")?.textContent ?? "", /SHA-256 [0-9a-f]{64}/);
});
