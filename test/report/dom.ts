/** Test helpers: parse rendered markup with linkedom and assert that no live markup or external load exists. */
import assert from "node:assert/strict";
import { DOMParser } from "linkedom";
import { assertInertTree } from "../hardening/inertPage.ts";

/** Parses a full HTML document. */
export function parseDocument(markup: string): Document {
  return new DOMParser().parseFromString(markup, "text/html") as unknown as Document;
}

/** Parses a fragment inside a body and returns the body. */
export function parseFragment(markup: string): HTMLElement {
  return parseDocument(`<!doctype html><html><head></head><body>${markup}</body></html>`).body;
}

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
  assertInertTree(root);
}
