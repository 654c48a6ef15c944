/** The page reader of the page-budget test on hand-made pdftotext output (A4, 20 mm top and bottom margins). */
import assert from "node:assert/strict";
import { bodyEndPage, pdfLines, strandedHeadings } from "./pdfPages.ts";

/** One page of pdftotext -bbox-layout output; each line is [yMin, text]; lines are 10 pt high. */
function page(lines: readonly (readonly [number, string])[]): string {
  const body = lines.map(([y, text]) =>
    `<line xMin="51" yMin="${y}" xMax="300" yMax="${y + 10}">${
      text.split(" ").map((w) => `<word xMin="51" yMin="${y}" xMax="60" yMax="${y + 10}">${w}</word>`).join(
        "",
      )
    }</line>`
  ).join("\n");
  return `<page width="595.28" height="841.89"><flow><block>${body}</block></flow></page>`;
}

const HEADER: readonly [number, string] = [23, "Title | REF rev B"];
const FOOTER: readonly [number, string] = [800, "Page 1 of 3"];
const HEADINGS = [
  { level: "h2", text: "Cautions" },
  { level: "h3", text: "8.1 A long heading that wraps onto a second line" },
  { level: "h2", text: "Appendix A Embedded inputs" },
];

const PDF = `<doc>${
  page([
    HEADER,
    [60, "Some text."],
    [700, "8.1 A long heading that wraps"],
    [712, "onto a second line"],
    FOOTER,
  ])
}${page([HEADER, [60, "Caution text."], [300, "More text."], FOOTER])}${
  page([HEADER, [60, "Appendix A Embedded inputs"], [80, "A table"], FOOTER])
}</doc>`;

Deno.test("the page reader leaves out the margins and finds a wrapped heading at a page foot", () => {
  const lines = pdfLines(PDF);
  assert.ok(!lines.some((l) => l.text.startsWith("Page ") || l.text.startsWith("Title")), "margins left out");
  assert.deepEqual(strandedHeadings(HEADINGS, lines), [
    'page 1: "8.1 A long heading that wraps onto a second line"',
  ]);
});

Deno.test("the body ends on the page before the first appendix when the appendix opens its page", () => {
  const lines = pdfLines(PDF);
  const outline = [{ title: "Cautions", page: 1 }, { title: "Appendix A Embedded inputs", page: 3 }];
  assert.equal(bodyEndPage(HEADINGS, outline, lines), 2);
  // An appendix starting below other text on its page: the body ends on that page.
  const sharedOutline = [{ title: "Cautions", page: 1 }, { title: "Appendix A Embedded inputs", page: 2 }];
  assert.equal(bodyEndPage(HEADINGS, sharedOutline, lines), 2);
});
