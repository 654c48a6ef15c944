/**
 * Reading the outline of a PDF: titles (literal and UTF-16BE hex strings) and pages through a nested page tree; the
 * pages of the named destinations (one per link target, as Chromium writes them).
 */
import assert from "node:assert/strict";
import { namedDestinations, pageNumbersFromOutline } from "../../src/commands/pdfOutline.ts";

// Object syntax, page trees, outline items and text strings: ISO 32000-1 §7.3.10, §7.7.3, §12.3.3, §7.9.2 (from memory).
const PDF = `%PDF-1.4
1 0 obj
<</Type /Catalog /Pages 2 0 R /Outlines 9 0 R>>
endobj
2 0 obj
<</Type /Pages /Kids [3 0 R 6 0 R] /Count 3>>
endobj
3 0 obj
<</Type /Pages /Kids [4 0 R 5 0 R] /Count 2>>
endobj
4 0 obj
<</Type /Page /Parent 3 0 R>>
endobj
5 0 obj
<</Type /Page /Parent 3 0 R>>
endobj
6 0 obj
<</Type /Page /Parent 2 0 R>>
endobj
10 0 obj
<</Title (Appendix \\(B\\))
/Dest [6 0 R /XYZ 6 800 0]>>
endobj
11 0 obj
<</Title <FEFF0053006500630020201C00740077006F201D>
/Dest [5 0 R /XYZ 6 500 0]>>
endobj
12 0 obj
<</Title (First)
/Dest [5 0 R /XYZ 6 700 0]>>
endobj
9 0 obj
<</Type /Outlines /First 12 0 R>>
endobj
%%EOF
`;

Deno.test("the outline gives each heading's page in document order, through a nested page tree", () => {
  assert.deepStrictEqual(pageNumbersFromOutline(new TextEncoder().encode(PDF)), [
    { title: "First", page: 2 },
    { title: "Sec “two”", page: 2 },
    { title: "Appendix (B)", page: 3 },
  ]);
});

Deno.test("a PDF without an outline gives no entries", () => {
  assert.deepStrictEqual(pageNumbersFromOutline(new TextEncoder().encode("%PDF-1.4\n%%EOF\n")), []);
});

// Named destinations in the catalog's /Dests dictionary, names with #xx escapes: ISO 32000-1 §12.3.2.3, §7.3.5
// (from memory).
const WITH_DESTS = PDF.replace("/Outlines 9 0 R>>", "/Outlines 9 0 R /Dests 20 0 R>>").replace(
  "%%EOF",
  `20 0 obj
<</s-2-3 [5 0 R /XYZ 0 280.5 0]
/c-ew-1 [6 0 R /XYZ 0 634.2 0]
/sv-c-ew#2D1 [4 0 R /XYZ 0 700 0]>>
endobj
%%EOF`,
);

Deno.test("the named destinations give each link target's page, through a nested page tree", () => {
  assert.deepStrictEqual(
    [...namedDestinations(new TextEncoder().encode(WITH_DESTS))],
    [["s-2-3", 2], ["c-ew-1", 3], ["sv-c-ew-1", 1]],
  );
  assert.equal(namedDestinations(new TextEncoder().encode(PDF)).size, 0);
});
