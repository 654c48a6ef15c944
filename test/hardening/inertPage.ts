/**
 * The "no live markup" contract of a package page, checked on the parsed tree (linkedom) and on the
 * raw text: what a browser could run, load or submit must not be there, whatever the inputs held.
 */
import assert from "node:assert/strict";
import { DOMParser } from "linkedom";
import { PACKAGE_CSP } from "../../src/report/package.ts";

/** Parses a whole HTML document. */
export function parsePage(markup: string): Document {
  return new DOMParser().parseFromString(markup, "text/html") as unknown as Document;
}

/** Attributes whose value a browser follows or loads as a URL. */
const URL_ATTRIBUTES = new Set([
  "href",
  "src",
  "xlink:href",
  "action",
  "formaction",
  "srcset",
  "poster",
  "data",
  "background",
  "ping",
  "cite",
  "longdesc",
]);

/** Elements that run, embed, load, submit or redirect. */
const FORBIDDEN_ELEMENTS = [
  "script",
  "iframe",
  "frame",
  "frameset",
  "object",
  "embed",
  "applet",
  "base",
  "form",
  "link",
  "img",
  "video",
  "audio",
  "source",
  "portal",
  "foreignObject",
  "use",
  "image",
  "textarea",
  "input",
  "button",
];

/** True for `#…`, http:, https:, mailto: and scheme-less relative URLs (not `//host`). */
export function isAllowedUrl(value: string): boolean {
  // deno-lint-ignore no-control-regex
  const v = value.replace(/[\u0000-\u0020\u007f]/g, "").toLowerCase();
  if (v.startsWith("#")) return true;
  if (/^(https?|mailto):/.test(v)) return true;
  return !/^[^/?#]*:/.test(v) && !v.startsWith("//") && !v.startsWith("\\");
}

/**
 * Asserts the page holds no script, no event-handler attribute, no URL attribute with another
 * scheme, no embedding/submitting/redirecting element, exactly one <style> (free of url(),
 * expression() and @import) and exactly one Content-Security-Policy meta with the package policy.
 */
export function assertInertPage(markup: string, context = ""): void {
  const where = context === "" ? "" : ` (${context})`;
  assert.doesNotMatch(markup, /<script/i, `raw <script in the page${where}`);
  assert.doesNotMatch(markup, /<\/?(iframe|object|embed|base|form)\b/i, `raw embedding element${where}`);
  const doc = parsePage(markup);
  for (const meta of Array.from(doc.querySelectorAll("meta"))) {
    const equiv = (meta.getAttribute("http-equiv") ?? "").toLowerCase();
    assert.ok(equiv === "" || equiv === "content-security-policy", `<meta http-equiv="${equiv}">${where}`);
  }
  const csp = Array.from(doc.querySelectorAll("meta")).filter((m) =>
    (m.getAttribute("http-equiv") ?? "").toLowerCase() === "content-security-policy"
  );
  assert.equal(csp.length, 1, `expected one CSP meta, found ${csp.length}${where}`);
  assert.equal(csp[0]?.getAttribute("content"), PACKAGE_CSP);
  assert.equal(csp[0]?.parentElement?.tagName.toLowerCase(), "head", `the CSP meta is not in <head>${where}`);
  const styles = doc.querySelectorAll("style");
  assert.equal(styles.length, 1, `expected one <style>, found ${styles.length}${where}`);
  const css = styles[0]?.textContent ?? "";
  assert.doesNotMatch(css, /url\s*\(|expression\s*\(|@import|<\/|javascript:/i, `live CSS${where}`);
  assertInertTree(doc, where);
}

/**
 * Asserts a parsed tree holds no running, embedding or submitting element, no event attribute, no URL attribute
 * with another scheme and no live style attribute; `where` is appended to the messages.
 */
export function assertInertTree(root: ParentNode, where = ""): void {
  for (const name of FORBIDDEN_ELEMENTS) {
    assert.equal(root.querySelectorAll(name).length, 0, `a <${name}> element${where}`);
  }
  for (const el of Array.from(root.querySelectorAll("*"))) {
    for (const attr of Array.from(el.attributes)) {
      const name = attr.name.toLowerCase();
      assert.ok(!name.startsWith("on"), `event attribute ${attr.name} on <${el.tagName}>${where}`);
      if (URL_ATTRIBUTES.has(name)) {
        assert.ok(isAllowedUrl(attr.value), `unsafe URL in ${attr.name}="${attr.value}"${where}`);
      }
      if (name === "style") {
        assert.doesNotMatch(
          attr.value,
          /url\s*\(|expression\s*\(|javascript:/i,
          `live style attribute${where}`,
        );
      }
      if (name === "srcdoc" || name === "formaction" || name === "http-equiv" && el.tagName !== "META") {
        assert.fail(`attribute ${attr.name} on <${el.tagName}>${where}`);
      }
    }
  }
}
