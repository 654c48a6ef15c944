import assert from "node:assert/strict";
import { PACKAGE_CSP, renderPackage } from "../../src/report/package.ts";
import { assertNoLiveMarkup, parseDocument } from "./dom.ts";
import { FAILING_CHECK, fixture, HOSTILE, PASSING_CHECK } from "./fixture.ts";

const ALL_HOSTILE = Object.values(HOSTILE).join(" ");

function text(doc: Document, selector: string): string {
  return doc.querySelector(selector)?.textContent ?? "";
}

Deno.test("renderPackage() emits no live markup when every text field is hostile", () => {
  const out = renderPackage(fixture({ text: ALL_HOSTILE, prose: Object.values(HOSTILE).join("\n\n") }));
  const doc = parseDocument(out);
  assertNoLiveMarkup(out, doc);
  // The hostile text is shown, not dropped: title, cover, file path attribute, results JSON.
  assert.ok(text(doc, "h1").includes(HOSTILE.script));
  assert.ok(text(doc, ".cover").includes(HOSTILE.img));
  const paths = Array.from(doc.querySelectorAll("pre.embedded-file")).map((p) => p.getAttribute("data-path"));
  assert.ok(paths.includes(`walls${ALL_HOSTILE}.md`));
  assert.ok(text(doc, "pre[data-embedded='results-json']").endsWith(ALL_HOSTILE));
});

Deno.test("renderPackage() keeps hostile text out of the stylesheet", () => {
  const out = renderPackage(fixture({ text: ALL_HOSTILE }));
  const styles = parseDocument(out).querySelectorAll("style");
  assert.equal(styles.length, 1);
  const css = styles[0]?.textContent ?? "";
  assert.doesNotMatch(css, /url\(|<|evil\.example|@import/i);
  assert.equal(out.match(/<\/style/gi)?.length, 1, "one closing </style> only");
});

Deno.test("renderPackage() declares charset, language and the Content-Security-Policy", () => {
  const out = renderPackage(fixture());
  assert.ok(out.startsWith("<!doctype html>"));
  const doc = parseDocument(out);
  assert.equal(doc.documentElement.getAttribute("lang"), "en");
  assert.equal(doc.querySelector("meta[charset]")?.getAttribute("charset"), "utf-8");
  const csp = doc.querySelector("meta[http-equiv='Content-Security-Policy']")?.getAttribute("content");
  // Policy text from the brief (DESIGN.md §2 row 18 of REVIEW.md).
  assert.equal(csp, "default-src 'none'; img-src data:; style-src 'unsafe-inline'");
  assert.equal(csp, PACKAGE_CSP);
});

Deno.test("renderPackage() loads nothing external: no src, no link, only fragment or prose hrefs", () => {
  const doc = parseDocument(renderPackage(fixture()));
  assert.equal(doc.querySelectorAll("[src], link, script, img, iframe, object").length, 0);
  const hrefs = Array.from(doc.querySelectorAll("[href], [xlink\\:href]")).map((el) =>
    el.getAttribute("href")
  );
  const external = hrefs.filter((h) => h === null || !h.startsWith("#"));
  // The one external href is the link the fixture's prose writes itself.
  assert.deepEqual(external, ["https://example.org/brief"]);
  for (const h of hrefs.filter((h) => h?.startsWith("#"))) {
    assert.ok(doc.getElementById(h!.slice(1)) !== null, `fragment ${h} has a target`);
  }
});

Deno.test("renderPackage() gives byte-identical output for the same input", () => {
  const a = renderPackage(fixture({ text: ALL_HOSTILE, checks: [PASSING_CHECK, FAILING_CHECK] }));
  const b = renderPackage(fixture({ text: ALL_HOSTILE, checks: [PASSING_CHECK, FAILING_CHECK] }));
  assert.equal(a, b);
  assert.doesNotMatch(
    a,
    /\b20(2[4-9]|30)-\d\d-\d\d/,
    "no build date: only the front-matter date (2031) appears",
  );
});

Deno.test("renderPackage() marks drafts with a watermark and banner, and issued packages not", () => {
  for (const status of ["draft", "for-review"] as const) {
    const out = renderPackage(fixture({ status }));
    const doc = parseDocument(out);
    assert.match(text(doc, ".cover .status-banner"), /^DRAFT/);
    assert.match(text(doc, "style"), /body::before \{ content: "DRAFT"/);
  }
  const issued = renderPackage(fixture({ status: "issued" }));
  assert.doesNotMatch(issued, /DRAFT|body::before/);
  assert.match(text(parseDocument(issued), ".cover"), /ISSUED/);
});

Deno.test("renderPackage() shows a failed check on the cover and beside the number", () => {
  const doc = parseDocument(renderPackage(fixture({ checks: [PASSING_CHECK, FAILING_CHECK] })));
  const cover = doc.querySelector(".cover .check-summary.has-failures");
  assert.ok(cover !== null);
  assert.match(cover.textContent ?? "", /1 of 2 FAILED/);
  assert.match(cover.textContent ?? "", /energy-balance on construction:EW-9/);
  const beside = doc.querySelector(".block-output .subject-checks tr.fail");
  const cells = Array.from(beside?.querySelectorAll("td") ?? []).map((td) => td.textContent);
  assert.deepEqual(cells.slice(0, 2), ["FAIL", "energy-balance"]);
});

Deno.test("renderPackage() says when all checks pass or none apply", () => {
  const pass = parseDocument(renderPackage(fixture({ checks: [PASSING_CHECK] })));
  assert.match(text(pass, ".cover"), /all 1 passed/);
  assert.equal(pass.querySelector(".cover .has-failures"), null);
  const none = parseDocument(renderPackage(fixture({ checks: [] })));
  assert.match(text(none, "#s-4"), /No automated checks apply yet/);
});

Deno.test("renderPackage() embeds every input file's exact bytes as base64", () => {
  const input = fixture({ text: ALL_HOSTILE });
  const doc = parseDocument(renderPackage(input));
  const blocks = Array.from(doc.querySelectorAll("pre.embedded-file"));
  assert.equal(blocks.length, input.inputFiles.length);
  for (const file of input.inputFiles) {
    const pre = blocks.find((b) => b.getAttribute("data-path") === file.path);
    assert.ok(pre !== undefined, file.path);
    assert.equal(pre.getAttribute("data-sha256"), file.sha256);
    assert.equal(pre.getAttribute("data-encoding"), "base64");
    // Independent decoder: the runtime's web-standard atob.
    const decoded = Uint8Array.from(atob((pre.textContent ?? "").replace(/\s/g, "")), (c) => c.charCodeAt(0));
    assert.deepEqual(decoded, file.bytes);
  }
});

Deno.test("renderPackage() prints R and U of the wall as computed by hand", () => {
  const doc = parseDocument(renderPackage(fixture()));
  const table = doc.querySelector(".layer-table");
  assert.ok(table !== null);
  const totals = Array.from(table.querySelectorAll("tr.total td.num")).map((td) => td.textContent);
  // Hand calculation, R = d/λ per layer (ISO 6946:2017 §6.7.1, from memory) with R_se = 0.04 and
  // R_si = 0.13 m²K/W (ISO 6946:2017 Table 7, horizontal heat flow, from memory):
  // 0.04 + 0.015/0.8 + 0.12/0.035 + 0.18 + 0.175/0.52 + 0.0125/0.21 + 0.13 = 4.1934 → U = 0.23847.
  // Areal heat capacity ρcd summed: 24 + 3.48 + 0 + 220.5 + 8.75 = 256.73 kJ/(m²K).
  assert.deepEqual(totals, ["4.19", "257", "0.238"]);
  assert.match(text(doc, ".layer-table"), /Outside surface resistance R_se \(default, ISO 6946\)/);
});

Deno.test("renderPackage() orders the sections and ends with the end marker and input hash", () => {
  const out = renderPackage(fixture());
  // The body (results, registers, cautions), the records, then the appendices; the methods are Appendix G.
  const ids = ["s-2", "s-4", "s-5", "s-6", "s-8", "s-7", "s-9", "s-10", "s-a", "s-b", "s-3"];
  const positions = ids.map((id) => out.indexOf(` id="${id}"`));
  assert.ok(positions.every((p) => p > 0), "every section present");
  assert.deepEqual([...positions].sort((a, b) => a - b), positions);
  const doc = parseDocument(out);
  // The tool's scope of the calculation opens the calculation methods (no second scope section).
  assert.ok(doc.querySelector("#s-3 #s-1") !== null);
  assert.match(
    text(doc, ".end-marker"),
    new RegExp(`END OF CALCULATION PACKAGE\\s*Input SHA-256 ${"d".repeat(64)}`),
  );
  assert.ok(out.lastIndexOf("END OF CALCULATION PACKAGE") > positions[10]!);
});

Deno.test("renderPackage() follows each block with its output: material, missing scenario results, unresolved", () => {
  const doc = parseDocument(renderPackage(fixture()));
  const outputs = Array.from(doc.querySelectorAll(".block-output")).map((o) => o.textContent ?? "");
  assert.equal(outputs.length, 4);
  assert.match(outputs[1] ?? "", /Material lime-render as resolved/);
  assert.match(
    outputs[2] ?? "",
    /Not computed: results\.json holds no entry for scenario july-day/,
  );
  assert.match(outputs[3] ?? "", /did not resolve/);
  const labels = Array.from(doc.querySelectorAll(".input-label")).map((l) => l.textContent ?? "");
  assert.ok(labels.some((l) => l.includes("walls.md:3:1")), "each block shows its file:line");
});

Deno.test("renderPackage() lists used materials with origin, and the sources and assumptions", () => {
  const doc = parseDocument(renderPackage(fixture()));
  const rows = Array.from(doc.querySelectorAll("#s-6 tbody tr"));
  const cells = (r: Element) => Array.from(r.querySelectorAll("td")).map((td) => td.textContent?.trim());
  assert.deepEqual(rows.map((r) => cells(r)[0]), ["lime-render", "eps-board", "clay-block"]);
  // Origin second, then the values (the fixture's project materials have no block in a document to show them).
  assert.equal(cells(rows[2]!)[1], "library");
  assert.match(text(doc, "#s-7"), /ISO 6946:2017/);
  assert.match(text(doc, "#s-5"), /default:inside-surface-resistance:EW-9/);
});
