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
