import assert from "node:assert/strict";
import { renderMarkdown } from "../../src/report/page/markdown.ts";
import { decodeCharacterReferences, safeLinkUrl } from "../../src/report/page/safeUrl.ts";
import { assertNoLiveMarkup, parseFragment } from "./dom.ts";

function render(md: string): { markup: string; body: HTMLElement } {
  const markup = renderMarkdown(md, { usedIds: new Set() }).markup;
  return { markup, body: parseFragment(markup) };
}

// Payloads follow the usual XSS filter-evasion families (OWASP XSS Filter Evasion Cheat Sheet, from memory).
const PAYLOADS = [
  "<script>alert(1)</script>",
  "<SCRIPT SRC=//evil.example/x.js></SCRIPT>",
  'Text <img src=x onerror="alert(1)"> more',
  "<svg/onload=alert(1)>",
  "<div onclick=alert(1)>\n\nblock\n</div>",
  "<iframe src=javascript:alert(1)></iframe>",
  "[a](javascript:alert(1)) [b](JaVaScRiPt:alert(1)) [c](java&#115;cript:alert(1)) [d](javascript&colon;alert(1))",
  "[e](&#x6A;avascript:alert(1)) [f](vbscript:msgbox(1)) [g](data:text/html;base64,PHNjcmlwdD4=) [h](file:///etc/passwd)",
  "[i](<javascript:alert(1)>) [j]( javascript:alert(1) ) [k](java%0ascript:alert(1)) [l](//evil.example/x)",
  "[m](java&#10;script:alert(1)) [n](java&Tab;script:alert(1)) [o](&#0000106avascript:alert(1))",
  "<javascript:alert(1)> <vbscript:alert(1)>",
  "[ref]\n\n[ref]: javascript:alert(1)",
  '![x" onerror="alert(1)](javascript:alert(1))',
  "&lt;script&gt;alert(1)&lt;/script&gt; &#60;script&#62;alert(1)&#60;/script&#62;",
  "<!-- <script>alert(1)</script> -->",
  '<a href="javascript:alert(1)">click</a>',
  "`<script>` and\n\n```\n<script>alert(1)</script>\n```",
  "<style>body{background:url(https://evil.example/x)}</style>",
  '[t](https://example.org "a\\" onmouseover=\\"alert(1)")',
];

Deno.test("renderMarkdown() never emits live markup for hostile prose", () => {
  for (const md of PAYLOADS) {
    const { markup, body } = render(md);
    assertNoLiveMarkup(markup, body);
    assert.equal(body.querySelectorAll("style, a[href^='java'], svg, div").length, 0, md);
  }
});

Deno.test("renderMarkdown() shows raw HTML as visible text", () => {
  const { body } = render("Before <script>alert(1)</script> after");
  assert.ok(body.textContent?.includes("<script>alert(1)</script>"));
});

Deno.test("renderMarkdown() keeps http(s), mailto, relative and fragment links", () => {
  const { body } = render(
    "[a](https://example.org/x?y=1&z=2) [b](mailto:qa@example.org) [c](notes/b.md) [d](#u-walls) <https://example.org/auto>",
  );
  const hrefs = Array.from(body.querySelectorAll("a")).map((a) => a.getAttribute("href"));
  assert.deepEqual(hrefs, [
    "https://example.org/x?y=1&z=2",
    "mailto:qa@example.org",
    "notes/b.md",
    "#u-walls",
    "https://example.org/auto",
  ]);
});

Deno.test("renderMarkdown() renders a removed link as its label, with the target shown in a title", () => {
  const { body } = render("[label](javascript:alert(1))");
  assert.equal(body.querySelectorAll("a").length, 0);
  assert.equal(body.querySelector(".link-removed")?.textContent, "label");
});

Deno.test("renderMarkdown() shows an image's alt text and loads nothing", () => {
  const { body } = render("![Site photo, north face](https://example.org/p.jpg)");
  assert.equal(body.querySelectorAll("img").length, 0);
  assert.equal(body.textContent?.trim(), "[image not embedded: Site photo, north face]");
});

Deno.test("renderMarkdown() prefixes heading ids with u-, shifts levels and keeps ids unique", () => {
  const used = new Set<string>(["u-walls"]);
  const markup = renderMarkdown("# Walls\n\n## Walls\n\n# location", { usedIds: used }).markup;
  const ids = Array.from(parseFragment(markup).querySelectorAll("h4, h5")).map((h) => `${h.tagName}#${h.id}`);
  assert.deepEqual(ids, ["H4#u-walls-2", "H5#u-walls-3", "H4#u-location"]);
});

Deno.test("safeLinkUrl() allows only http, https, mailto, relative and fragments", () => {
  assert.equal(safeLinkUrl("https://example.org"), "https://example.org");
  assert.equal(safeLinkUrl("HTTP://example.org"), "HTTP://example.org");
  assert.equal(safeLinkUrl("#frag"), "#frag");
  assert.equal(safeLinkUrl("a/b.md"), "a/b.md");
  assert.equal(safeLinkUrl("java\tscript:alert(1)"), undefined);
  assert.equal(safeLinkUrl("\u0000javascript:alert(1)"), undefined);
  assert.equal(safeLinkUrl(" data:text/html,x"), undefined);
  assert.equal(safeLinkUrl("//evil.example"), undefined);
  assert.equal(safeLinkUrl("/\\evil.example"), undefined);
});

Deno.test("decodeCharacterReferences() decodes numeric and scheme-spelling named references", () => {
  // Code points: U+0073 's', U+006A 'j' (Unicode charts, from memory).
  assert.equal(decodeCharacterReferences("java&#115;cript&colon;"), "javascript:");
  assert.equal(decodeCharacterReferences("&#x6A;&#X6a;"), "jj");
  assert.equal(decodeCharacterReferences("&#0;&nbsp;"), "\uFFFD&nbsp;");
});
