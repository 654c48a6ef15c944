/**
 * Prose renders in time linear in its size, whatever its shape: repeated headings, long runs of
 * emphasis marks, deep inline nesting. Where a count can show it the tests count; the timing
 * checks compare n with 4n and allow a ratio of 8 (linear gives about 4, quadratic about 16).
 */
import assert from "node:assert/strict";
import { renderMarkdown } from "../../src/report/page/markdown.ts";
import { splitMarkdown } from "../../src/project/fences.ts";
import { parseFragment } from "./dom.ts";

/** A Set that counts its `has` calls. */
class CountingSet extends Set<string> {
  lookups = 0;
  override has(value: string): boolean {
    this.lookups++;
    return super.has(value);
  }
}

Deno.test("renderMarkdown() gives k identical headings unique ids with O(k) id lookups", () => {
  const k = 2000;
  const used = new CountingSet();
  const markup = renderMarkdown("# Same heading\n\n".repeat(k), { usedIds: used }).markup;
  const ids = Array.from(parseFragment(markup).querySelectorAll("h4")).map((h) => h.id);
  assert.equal(ids.length, k);
  assert.equal(new Set(ids).size, k);
  assert.deepEqual(ids.slice(0, 3), ["u-same-heading", "u-same-heading-2", "u-same-heading-3"]);
  assert.equal(ids.at(-1), `u-same-heading-${k}`);
  // Counting from 2 for every repeat looks up k²/2 = 2,000,000 ids; resuming the count, about 2k.
  assert.ok(used.lookups <= 3 * k, `${used.lookups} id lookups for ${k} headings`);
});

Deno.test("renderMarkdown() keeps suffixes unique next to headings that look like suffixed ids", () => {
  const used = new Set<string>();
  const markup = renderMarkdown("# Wall\n\n# Wall 2\n\n# Wall\n\n# Wall", { usedIds: used }).markup;
  const ids = Array.from(parseFragment(markup).querySelectorAll("h4")).map((h) => h.id);
  assert.deepEqual(ids, ["u-wall", "u-wall-2", "u-wall-3", "u-wall-4"]);
});

/** Least of three timings of `run`, ms (the least is the one least disturbed by other work). */
function fastest(run: () => unknown): number {
  let best = Infinity;
  for (let i = 0; i < 3; i++) {
    const start = performance.now();
    run();
    best = Math.min(best, performance.now() - start);
  }
  return best;
}

/** Asserts `work(4n)` takes less than 8 times `work(n)` (plus 30 ms for timer noise on small runs). */
function assertLinear(label: string, n: number, work: (size: number) => unknown): void {
  const small = fastest(() => work(n));
  const large = fastest(() => work(4 * n));
  assert.ok(
    large < 8 * small + 30,
    `${label}: ${large.toFixed(0)} ms at ${4 * n} bytes against ${small.toFixed(0)} ms at ${n} bytes`,
  );
}

const DELIMITER_RUNS = ["_a", "*a", "**a"];

Deno.test("renderMarkdown() renders long runs of emphasis marks in linear time", () => {
  for (const unit of DELIMITER_RUNS) {
    assertLinear(
      `renderMarkdown(${unit}…)`,
      16 * 1024,
      (size) => renderMarkdown(unit.repeat(size / unit.length), { usedIds: new Set() }),
    );
  }
});

Deno.test("splitMarkdown() splits long runs of emphasis marks in linear time", () => {
  for (const unit of DELIMITER_RUNS) {
    assertLinear(
      `splitMarkdown(${unit}…)`,
      16 * 1024,
      (size) => splitMarkdown(unit.repeat(size / unit.length), 1),
    );
  }
});

Deno.test("renderMarkdown() still links e-mail addresses, up to the 64-character local part", () => {
  // RFC 5321, section 4.5.3.1.1: a local part has at most 64 octets.
  const local = "a".repeat(64);
  const body = parseFragment(
    renderMarkdown(`Write to qa@example.org or ${local}@example.org.`, { usedIds: new Set() }).markup,
  );
  const hrefs = Array.from(body.querySelectorAll("a")).map((a) => a.getAttribute("href"));
  assert.deepEqual(hrefs, ["mailto:qa@example.org", `mailto:${local}@example.org`]);
});

Deno.test("renderMarkdown() reads emphasis nested 20,000 deep without overflowing the stack", () => {
  const depth = 20_000;
  const md = "*a ".repeat(depth) + "b" + " a*".repeat(depth);
  const body = parseFragment(renderMarkdown(md, { usedIds: new Set() }).markup);
  // Nesting past 8 levels stays text: the innermost <em> holds no further <em>.
  let levels = 0;
  for (let em = body.querySelector("em"); em !== null; em = em.querySelector("em")) levels++;
  assert.equal(levels, 8);
  assert.ok((body.textContent ?? "").includes("*a *a"), "the marks past the limit are shown as text");
});

Deno.test("renderMarkdown() reads images nested 10,000 deep without overflowing the stack", () => {
  const depth = 10_000;
  const markup =
    renderMarkdown("![".repeat(depth) + "a" + "](b)".repeat(depth), { usedIds: new Set() }).markup;
  assert.ok(markup.includes("image not embedded"));
});

Deno.test("renderMarkdown() shows task-list boxes as text, with no form control", () => {
  const markup =
    renderMarkdown("- [ ] check the U-value\n- [x] read the drawings", { usedIds: new Set() }).markup;
  const body = parseFragment(markup);
  assert.equal(body.querySelectorAll("input").length, 0);
  assert.doesNotMatch(markup, /<input/i);
  const items = Array.from(body.querySelectorAll("li")).map((li) => li.textContent?.trim());
  assert.deepEqual(items, ["[ ] check the U-value", "[x] read the drawings"]);
});
