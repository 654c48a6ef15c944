/** Test helpers: parse rendered markup with linkedom and assert that no live markup or external load exists. */
import assert from "node:assert/strict";
import { DOMParser } from "linkedom";

/** Parses a full HTML document. */
export function parseDocument(markup: string): Document {
  return new DOMParser().parseFromString(markup, "text/html") as unknown as Document;
}

/** Parses a fragment inside a body and returns the body. */
export function parseFragment(markup: string): HTMLElement {
  return parseDocument(`<!doctype html><html><head></head><body>${markup}</body></html>`).body;
}

const URL_ATTRIBUTES = [
  "href",
  "src",
  "xlink:href",
  "action",
  "formaction",
  "srcset",
  "poster",
  "data",
  "background",
];
const FORBIDDEN_ELEMENTS = [
  "script",
  "iframe",
  "object",
  "embed",
  "img",
  "link",
  "base",
  "form",
  "frame",
  "video",
  "audio",
];

/**
 * Asserts the markup holds no script, no event attribute, no dangerous element and no URL attribute
 * with a scheme other than http(s)/mailto; checked on the parsed tree and on the raw text.
 */
export function assertNoLiveMarkup(markup: string, root: ParentNode): void {
  assert.doesNotMatch(markup, /<script/i, "raw output contains a <script tag");
  const unquoted = markup.replace(/"[^"]*"/g, '""');
  assert.doesNotMatch(
    unquoted,
    /<[a-z][^<>]*\son[a-z]+\s*=/i,
    "raw output has an on* attribute inside a tag",
  );
  for (const name of FORBIDDEN_ELEMENTS) {
    assert.equal(root.querySelectorAll(name).length, 0, `found a <${name}> element`);
  }
  for (const el of Array.from(root.querySelectorAll("*"))) {
    for (const attr of Array.from(el.attributes)) {
      assert.ok(!/^on/i.test(attr.name), `event attribute ${attr.name} on <${el.tagName}>`);
      if (URL_ATTRIBUTES.includes(attr.name.toLowerCase())) {
        // deno-lint-ignore no-control-regex
        const value = attr.value.replace(/[\u0000-\u0020]/g, "").toLowerCase();
        assert.ok(
          value.startsWith("#") || /^(https?|mailto):/.test(value) || !/^[^/?#]*:/.test(value),
          `unsafe URL in ${attr.name}: ${attr.value}`,
        );
      }
    }
  }
}
