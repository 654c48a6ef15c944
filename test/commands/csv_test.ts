import assert from "node:assert/strict";
import { csvCell } from "../../src/commands/csv.ts";

Deno.test("csvCell() neutralises cells a spreadsheet would run as formulas (OWASP CSV injection guidance)", () => {
  for (const text of ['=HYPERLINK("x")', "+1+1", "-2+3", "@SUM(A1)", "\tcmd"]) {
    assert.ok(csvCell(text).replace(/^"/, "").startsWith("'"), text);
  }
  assert.equal(csvCell("plain, with comma"), '"plain, with comma"');
  assert.equal(csvCell('say "hi"'), '"say ""hi"""');
  assert.equal(csvCell(-1.5), "-1.5");
});

/** A spreadsheet's reading of one written cell: unquoted, then split on `;`, tab or a line break (as when opened with those separators). */
function piecesAsOpened(written: string): string[] {
  const text = written.startsWith('"') ? written.slice(1, -1).replaceAll('""', '"') : written;
  return text.split(/[;\t\r\n]/);
}

Deno.test("csvCell() guards formulas after a ';' or tab separator, after spaces or NBSP, and in full width (OWASP CSV injection guidance, from memory)", () => {
  // Payloads from the issue: a spreadsheet that splits on ';' or tab, or skips leading spaces, would run each.
  const payloads = [
    "x;=1+1",
    "x\t=1+1",
    " =1+1",
    "\u00a0=1+1",
    "\u3000=1+1",
    "\uFF1D1+1",
    "\uFF0B1+1",
    "\uFF0D1+1",
    "\uFF20SUM(A1)",
    "x; \u00a0@SUM(A1)",
    "x\r\n=1+1",
    "=cmd|' /C calc'!A0",
  ];
  for (const payload of payloads) {
    const written = csvCell(payload);
    for (const piece of piecesAsOpened(written)) {
      assert.doesNotMatch(
        piece.trimStart(),
        /^[=+\-@\uFF1D\uFF0B\uFF0D\uFF20]/,
        `${JSON.stringify(payload)} → ${written}`,
      );
    }
    assert.ok(written.replace(/^"/, "").startsWith("'"), `${JSON.stringify(payload)} → ${written}`);
  }
  // Numbers stay numbers; ordinary text and ids are untouched.
  assert.equal(csvCell(-3.2), "-3.2");
  assert.equal(csvCell("EW-1"), "EW-1");
  assert.equal(csvCell("brick - rendered"), "brick - rendered");
});
