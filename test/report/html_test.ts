import assert from "node:assert/strict";
import fc from "fast-check";
import { cssStringLiteral, escapeHtml, html, raw, Trusted } from "../../src/report/page/html.ts";
import { parseFragment } from "./dom.ts";

Deno.test("escapeHtml() escapes the five HTML-significant characters", () => {
  // Expected entities: HTML Living Standard named character references (from memory).
  assert.equal(
    escapeHtml(`<a href="x" title='y'>&</a>`),
    "&lt;a href=&quot;x&quot; title=&#39;y&#39;&gt;&amp;&lt;/a&gt;",
  );
});

Deno.test("html`` escapes interpolated text and keeps Trusted fragments", () => {
  const inner = html`<b>${"<i>"}</b>`;
  assert.equal(html`<p>${inner}${"<script>"}</p>`.markup, "<p><b>&lt;i&gt;</b>&lt;script&gt;</p>");
});

Deno.test("html`` joins arrays of Trusted and rejects arrays of strings", () => {
  assert.equal(
    html`<ul>${[html`<li>${"a&b"}</li>`, raw("<li>c</li>")]}</ul>`.markup,
    "<ul><li>a&amp;b</li><li>c</li></ul>",
  );
  assert.throws(() => html`${["<b>"] as unknown as Trusted[]}`, TypeError);
});

Deno.test("html`` refuses numbers and objects, so every number goes through a formatter", () => {
  assert.throws(() => html`${1.5 as unknown as string}`, TypeError);
  assert.throws(() => html`${{ markup: "<script>" } as unknown as string}`, TypeError);
});

Deno.test("Trusted cannot be created outside html.ts", () => {
  const Ctor = Trusted as unknown as new (key: symbol, markup: string) => Trusted;
  assert.throws(() => new Ctor(Symbol("fluxnote.trusted"), "<script>"), TypeError);
});

Deno.test("html`` round-trips any text through element content and a quoted attribute (property)", () => {
  // Independent oracle: linkedom's HTML parser decodes what html`` encoded.
  // CR and NUL are excluded: the HTML parser normalises them by specification.
  const char = fc.oneof(
    fc.constantFrom("&", "<", ">", '"', "'", "=", "/", " ", "&amp;", "&#60;"),
    fc.string({ unit: "binary", minLength: 1, maxLength: 1 }),
  );
  const text = fc.array(char, { maxLength: 40 }).map((parts) => parts.join("")).filter((s) =>
    !/[\r\0]/.test(s)
  );
  fc.assert(
    fc.property(text, (s) => {
      const body = parseFragment(html`<p title="${s}">${s}</p>`.markup);
      const p = body.querySelector("p");
      assert.ok(p !== null);
      assert.equal(body.children.length, 1);
      assert.equal(p.children.length, 0);
      assert.equal(p.textContent, s);
      assert.equal(p.getAttribute("title"), s);
    }),
    { seed: 4242, numRuns: 300 },
  );
});

Deno.test("cssStringLiteral() leaves no quote, angle bracket or backslash-less escape in the stylesheet", () => {
  const out = cssStringLiteral(`a"; } </style><script>x</script> \\ 'b'`).markup;
  // CSS Syntax Level 3 §4.3.7: a backslash + up to six hex digits + one whitespace is a code point escape (from memory).
  assert.match(out, /^"[A-Za-z0-9 \\]*"$/);
  assert.ok(out.includes("\\000022"), "the double quote is written as \\000022");
  assert.ok(out.includes("\\00003c"), "< is written as \\00003c");
});
