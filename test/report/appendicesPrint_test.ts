/**
 * The appendices on paper: Appendix C prints the checks per subject and kind (failures in full) and keeps every
 * single check on screen; Appendix D prints the leading response-factor terms and keeps every term on screen;
 * Appendix A prints every input file in full in small monospace, each block only within its file.
 */
import assert from "node:assert/strict";
import { formatSig } from "../../src/report/page/format.ts";
import { expandPackageCopy, LEADING_TERMS } from "../../src/results/packageCopy.ts";
import { sha256Hex } from "../../src/archive/hash.ts";
import { PRINTED_TERMS } from "../../src/report/constructions/dynamicTables.ts";
import { readDynamic } from "../../src/report/constructions/dynamicData.ts";
import { renderPackage } from "../../src/report/package.ts";
import type { CheckResult } from "../../src/results/types.ts";
import { parseDocument } from "./dom.ts";
import { engineEntry } from "./dynamicFixture.ts";
import { fixture, wall } from "./fixture.ts";

/** Rows of the tables matched by `selector` that a printout shows (not inside a screen-only element). */
function printedRows(doc: Document, selector: string): Element[] {
  return Array.from(doc.querySelectorAll(`${selector} tbody tr`)).filter((r) =>
    r.closest(".screen-only") === null
  );
}

function cells(row: Element): string[] {
  return Array.from(row.querySelectorAll("td")).map((td) => (td.textContent ?? "").trim());
}

/** The print rules of the package's stylesheet (every `@media print` block). */
function printCss(doc: Document): string {
  const css = Array.from(doc.querySelectorAll("style")).map((s) => s.textContent ?? "").join("\n");
  return css.split("@media print").slice(1).join("\n");
}

Deno.test("the checks appendix prints one row per check kind and subject, failures in full", () => {
  const { checks: engine } = engineEntry(wall());
  // A second surface with the same kinds twice (two checks per kind), and one failure among them.
  const scenario: CheckResult[] = [
    {
      id: "energy-balance",
      subject: "scenario:day/s1",
      description: "balance",
      value: 2e-9,
      limit: 1e-6,
      pass: true,
    },
    {
      id: "energy-balance",
      subject: "scenario:day/s1",
      description: "balance",
      value: -4e-7,
      limit: 1e-6,
      pass: true,
    },
    {
      id: "warm-up",
      subject: "scenario:day/s1",
      description: "warm-up",
      value: 0.5,
      limit: 1e-3,
      pass: false,
    },
    {
      id: "warm-up",
      subject: "scenario:day/s1",
      description: "warm-up",
      value: 1e-5,
      limit: 1e-3,
      pass: true,
    },
  ];
  const checks = [...engine, ...scenario];
  const doc = parseDocument(renderPackage(fixture({ checks })));
  const pairs = new Set(checks.map((c) => `${c.subject} ${c.id}`));
  const rows = printedRows(doc, "#s-c table.checks-by-kind");
  assert.equal(rows.length, pairs.size, "one printed row per subject and check kind");
  assert.ok(rows.length < checks.length);
  // Worst |value| / limit of the two energy-balance checks: 4e-7 / 1e-6 = 0.4 (arithmetic).
  const balance = rows.find((r) => cells(r)[1] === "energy-balance" && cells(r)[0] === "scenario:day/s1");
  assert.deepEqual(cells(balance!).slice(1), ["energy-balance", "2", formatSig(0.4, 2), "PASS"]);
  // warm-up: 0.5 / 1e-3 = 500, one of two failed.
  const warm = rows.find((r) => cells(r)[1] === "warm-up");
  assert.deepEqual(cells(warm!).slice(1), ["warm-up", "2", formatSig(500, 2), "FAIL (1 of 2)"]);
  // The failure in full, printed: id, subject, description, value, limit, result.
  const failed = printedRows(doc, "#s-c table.checks-list:not(.method-checks)");
  assert.equal(failed.length, 1);
  assert.deepEqual(cells(failed[0]!), [
    "warm-up",
    "scenario:day/s1",
    "warm-up",
    formatSig(0.5, 3),
    "0.00100",
    "FAIL",
  ]);
  // Every check stays in the HTML, on screen; the printout names results.json checks[] and its hash.
  const all = Array.from(doc.querySelectorAll("#s-c .screen-only table.checks-list tbody tr"));
  assert.equal(all.length, checks.length);
  const pointer = doc.querySelector("#s-c .print-only")?.textContent ?? "";
  assert.match(pointer, /results\.json checks\[\]/);
  const input = fixture({ checks });
  assert.ok(pointer.includes(sha256Hex(input.resultsJsonText)), "names the results by their SHA-256");
});

Deno.test("every factor term is regained from the HTML while print shows the leading terms", () => {
  const input = fixture();
  const doc = parseDocument(renderPackage(input));
  const [id, entry] = Object.entries(input.results.constructions)[0]!;
  const view = readDynamic(entry)!;
  const rf = view.responseFactors;
  assert.ok(rf.Y.length > LEADING_TERMS, "a series longer than the embedded leading terms");
  // Printed: the leading terms only.
  const printed = printedRows(doc, "#s-d table.rf-table").filter((r) => /^\d+$/.test(cells(r)[0] ?? ""));
  assert.equal(printed.length, PRINTED_TERMS);
  // In the HTML: the embedded results give back every term of both series, bit for bit, from the leading terms
  // and the modal form they keep (no second copy of the series as tables).
  const embedded = JSON.parse(doc.querySelector('pre[data-embedded="results-json"]')?.textContent ?? "{}");
  const regained = (expandPackageCopy(embedded) as typeof embedded).constructions[id];
  assert.deepEqual(regained.responseFactors.Y, rf.Y);
  assert.deepEqual(regained.responseFactors.X, rf.X);
  assert.deepEqual(regained.surfaceToSurface.responseFactors.Z, view.surfaceToSurface.responseFactors.Z);
  assert.equal(doc.querySelectorAll("#s-d table.factor-series").length, 0);
  // The appendix says how many terms it prints and where every term is.
  const pointer = doc.querySelector("#s-d p.factor-pointer")?.textContent?.replace(/\s+/g, " ") ?? "";
  assert.ok(pointer.includes(`first ${PRINTED_TERMS} of ${rf.Y.length} terms`), pointer);
  assert.ok(pointer.includes(`csv/factors-${id}.csv`) && pointer.includes("results.json"), pointer);
  assert.ok(pointer.includes(sha256Hex(input.resultsJsonText)));
});

Deno.test("the inputs appendix prints every file in full in small monospace, each block only within its file", () => {
  const input = fixture();
  const doc = parseDocument(renderPackage(input));
  const print = printCss(doc);
  // Small type and tight lines for the printed files: at most 7 pt and 1.2 line height (common practice for
  // code listings, no source); long lines wrap instead of running off the page.
  const rule = print.match(/#s-a pre\.printed-file[^{]*\{([^}]*)\}/)?.[1] ?? "";
  assert.ok(Number(rule.match(/font-size: ([\d.]+)pt/)?.[1]) <= 7, rule);
  assert.ok(Number(rule.match(/line-height: ([\d.]+)/)?.[1]) <= 1.2, rule);
  assert.match(rule, /white-space: pre-wrap/);
  // The blocks as written repeat what the printed files hold: not printed again.
  assert.match(print, /#s-a \.block-as-written \{ display: none; \}/);
  const printed = Array.from(doc.querySelectorAll("#s-a .print-only pre.printed-file")).map((p) =>
    (p.textContent ?? "").replace(/^\n/, "")
  );
  for (const file of input.inputFiles) {
    const text = (() => {
      try {
        return new TextDecoder("utf-8", { fatal: true }).decode(file.bytes);
      } catch {
        return undefined;
      }
    })();
    if (text !== undefined) assert.ok(printed.includes(text), `${file.path} printed in full`);
    // One header line per file: path, bytes and SHA-256.
    const header = Array.from(doc.querySelectorAll("#s-a p.muted")).find((p) =>
      (p.textContent ?? "").includes(file.sha256)
    );
    assert.ok(header?.textContent?.includes(`${file.bytes.length} bytes`), file.path);
  }
});

Deno.test("the inputs appendix prints its files and the library entries in two columns", () => {
  const doc = parseDocument(renderPackage(fixture()));
  const print = printCss(doc);
  // Two text columns on A4 (common practice for code listings in print, no source): each printed file and the
  // library entries' block flow into two columns, so the short lines of the blocks do not leave half a line empty.
  const rule = print.match(/#s-a pre\.printed-file, #s-a \.library-entries \{([^}]*)\}/)?.[1] ?? "";
  assert.match(rule, /column-count: 2/);
  const entries = doc.querySelectorAll("#s-a .library-entries pre.embedded-library");
  assert.equal(entries.length, doc.querySelectorAll("pre.embedded-library").length);
  assert.ok(entries.length > 0, "the fixture uses a library entry");
});

Deno.test("the factors appendix prints a construction's plots two a row, large enough to read", () => {
  const doc = parseDocument(renderPackage(fixture()));
  const figures = doc.querySelectorAll("#s-d figure.plot-figure");
  assert.ok(figures.length >= 3, "the fixture's construction has its plots");
  // Two a row: each plot floats at most half the column wide (three a row set their text at about 2.8 pt on
  // paper, too small to read); the pointer after them starts below.
  const rule = printCss(doc).match(/#s-d figure\.plot-figure \{([^}]*)\}/)?.[1] ?? "";
  assert.match(rule, /float: left/);
  const width = Number(rule.match(/width: ([\d.]+)%/)?.[1]);
  const right = Number(rule.match(/margin: [\d.]+mm ([\d.]+)%/)?.[1] ?? 0);
  assert.ok(width > 40 && 2 * (width + right) <= 100, rule);
  assert.match(printCss(doc), /#s-d figure\.plot-figure \+ p\.factor-pointer \{ clear: both;/);
});
