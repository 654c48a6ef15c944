/**
 * Results before verification: each construction's body shows its layer table, drawing, U, the dynamic summary
 * and one line "N numerical checks passed (Appendix C)"; the factor tables move to Appendix D (leading terms),
 * every check to Appendix C; a failure stays in the body beside its number. The assumptions register states a
 * default once with the subjects it applies to, and the review's "Default in use" notes fold into it.
 */
import assert from "node:assert/strict";
import { expandPackageCopy } from "../../src/results/packageCopy.ts";
import { join } from "node:path";
import { runBuild } from "../../src/commands/build.ts";
import { renderConstructionOutput } from "../../src/report/constructions/constructionOutput.ts";
import { SI_DISPLAY } from "../../src/report/page/displayUnits.ts";
import { PRINTED_TERMS } from "../../src/report/constructions/dynamicTables.ts";
import { readDynamic } from "../../src/report/constructions/dynamicData.ts";
import { formatSig } from "../../src/report/page/format.ts";
import { quotedNumbers } from "../../src/report/page/quotedText.ts";
import { renderPackage } from "../../src/report/package.ts";
import { parseDocument, parseFragment } from "./dom.ts";
import { engineEntry } from "./dynamicFixture.ts";
import { fixture, wall } from "./fixture.ts";

const FACTOR_TABLES = [".rf-table", ".ctf-table", ".periodic-table"];

Deno.test("a construction's body section has no factor table and one line of passed numerical checks", () => {
  const c = wall();
  const { results, checks, notes } = engineEntry(c);
  const own = checks.filter((k) => k.subject === `construction:${c.id}`);
  assert.ok(own.length > 5 && own.every((k) => k.pass), "the engine's checks on the wall all pass");
  const root = parseFragment(
    renderConstructionOutput(c, results, checks, "c-w", SI_DISPLAY, false, notes).markup,
  );
  for (const table of FACTOR_TABLES) assert.equal(root.querySelectorAll(table).length, 0, table);
  assert.equal(root.querySelectorAll("svg.plot, .plot-figure").length, 0, "the plots are in Appendix D");
  assert.equal(root.querySelectorAll(".subject-checks").length, 0, "no PASS rows in the body");
  assert.equal(
    root.querySelector(".checks-line")?.textContent,
    `${own.length} numerical checks passed (Appendix C).`,
  );
  assert.ok(root.querySelector(".dynamic-summary") !== null, "the short dynamic summary stays");
  assert.ok(root.querySelector('a[href="#d-c-w"]') !== null, "points to the construction's factors");
});

Deno.test("a failed check stays in the body beside its number, the passed ones are counted", () => {
  const c = wall();
  const { results, checks, notes } = engineEntry(c);
  const own = checks.filter((k) => k.subject === `construction:${c.id}`);
  const broken = { ...own[0]!, value: 0.5, limit: 1e-6, pass: false };
  const injected = checks.map((k) => k === own[0] ? broken : k);
  const root = parseFragment(
    renderConstructionOutput(c, results, injected, "c-w", SI_DISPLAY, false, notes).markup,
  );
  const rows = Array.from(root.querySelectorAll(".subject-checks tbody tr"));
  assert.equal(rows.length, 1, "only the failure is tabled in the body");
  const cells = Array.from(rows[0]!.querySelectorAll("td")).map((td) => td.textContent);
  assert.deepEqual(cells, [
    "FAIL",
    broken.id,
    quotedNumbers(broken.description),
    formatSig(0.5, 3),
    formatSig(1e-6, 3),
  ]);
  assert.match(
    root.querySelector(".checks-line")?.textContent ?? "",
    new RegExp(`^${own.length - 1} of ${own.length} numerical checks passed \\(Appendix C\\)`),
  );
});

Deno.test("the package lists every check in Appendix C and the factors in Appendix D as leading terms", () => {
  const c = wall();
  const { checks } = engineEntry(c);
  const input = fixture({ checks });
  const doc = parseDocument(renderPackage(input));
  const appendixC = Array.from(doc.querySelectorAll("#s-c table.checks-list tbody tr"))
    .filter((r) => /PASS|FAIL/.test(r.textContent ?? ""));
  assert.equal(appendixC.length, checks.length, "every check, PASS rows included");
  for (const table of FACTOR_TABLES) assert.equal(doc.querySelectorAll(`#s-2 ${table}`).length, 0, table);
  assert.equal(
    doc.querySelectorAll("#s-4 tbody tr.pass, #s-4 td.pass").length,
    0,
    "no PASS rows in section 4",
  );
  const [id, entry] = Object.entries(input.results.constructions)[0]!;
  const anchor = doc.querySelector(`#s-2 .dynamic-response a[href^="#d-"]`)?.getAttribute("href") ?? "";
  const part = doc.querySelector(anchor)?.parentElement;
  assert.ok(part !== null && part !== undefined && part.id === "s-d", `${anchor} is in Appendix D`);
  const rf = readDynamic(entry)!.responseFactors;
  const printed = Array.from(part.querySelectorAll(".rf-table tbody tr"))
    .filter((r) => /^\d+$/.test(r.querySelector("td")?.textContent ?? ""));
  assert.equal(printed.length, Math.min(PRINTED_TERMS, rf.Y.length), "leading terms only");
  assert.ok(part.textContent?.includes(`csv/factors-${id}.csv`));
  // Every term stays in the embedded results (Appendix B): leading terms and the modal form, which expand to
  // exactly the series results.json holds.
  const embedded = JSON.parse(doc.querySelector('pre[data-embedded="results-json"]')?.textContent ?? "{}");
  const full = expandPackageCopy(embedded) as typeof embedded;
  assert.deepEqual(full.constructions[id].responseFactors.Y, rf.Y);
  // Every in-page link still lands on an element.
  for (const a of Array.from(doc.querySelectorAll('a[href^="#"]'))) {
    const target = a.getAttribute("href")!.slice(1);
    assert.ok(doc.getElementById(target) !== null, `#${target}`);
  }
});

const DEMO = new URL("../../projects/demo/", import.meta.url).pathname;

Deno.test("demo: the assumptions register has one row per default kind and statement, review notes folded", async () => {
  const out = join(await Deno.makeTempDir(), "out");
  assert.equal(await runBuild({ project: DEMO, out }, { stdout: () => {}, stderr: () => {} }), 0);
  const doc = parseDocument(Deno.readTextFileSync(join(out, "package.html")));
  const results = JSON.parse(Deno.readTextFileSync(join(out, "results.json")));
  const assumptions: { id: string }[] = results.assumptions;
  const rows = Array.from(doc.querySelectorAll("#s-5 table.assumptions tbody tr"));
  // The demo's 78 assumptions: R_si, R_se and the time step on each construction, and five defaults on each
  // scenario surface; stated once each (counted from projects/demo's inputs), at most 35 rows.
  assert.ok(assumptions.length >= 70, String(assumptions.length));
  assert.ok(rows.length <= 35, `${rows.length} rows`);
  const emittance = rows.filter((r) => r.querySelector("td code")?.textContent === "default:emittance");
  assert.equal(emittance.length, 1, "the long-wave emittance default is one row");
  const applies = emittance[0]!.querySelector("td.applies-to")?.textContent ?? "";
  const ids = assumptions.filter((a) => a.id.startsWith("default:emittance:")).map((a) => a.id);
  assert.ok(ids.length >= 6);
  // Listed per scenario ("july-design-day: ew1-south, ew1-west, … (40-scenarios.md 73–77:5)").
  for (const a of ids) {
    const [scenario, surface] = a.slice("default:emittance:".length).split("/");
    assert.ok(applies.includes(`${scenario}: `) && applies.includes(surface!), a);
  }
  // Nothing lost: every assumption id is named in the register (as its own row or kind plus subject).
  const text = doc.querySelector("#s-5")?.textContent ?? "";
  for (const a of assumptions) {
    const cut = a.id.lastIndexOf(":");
    // A scenario surface's subject "scenario/surface" is listed under its scenario: both names are there.
    const parts = a.id.slice(cut + 1).split("/");
    assert.ok(
      text.includes(a.id) || (text.includes(a.id.slice(0, cut)) && parts.every((p) => text.includes(p))),
      a.id,
    );
  }
  const notes = Array.from(doc.querySelectorAll("#s-4 tbody tr"))
    .filter((r) => (r.textContent ?? "").includes("Default in use"));
  assert.equal(notes.length, 0, "the Default in use notes are folded into the register");
  assert.match(
    doc.querySelector("#s-4")?.textContent ?? "",
    /\d+ notes \((all|\d+ of them) "Default in use", folded into the assumptions register\)/,
  );
});

Deno.test("each input block prints once: named in the body, its text in Appendix A", () => {
  const input = fixture();
  const out = renderPackage(input);
  const doc = parseDocument(out);
  const blocks = input.model.documents.flatMap((d) => d.segments.filter((s) => s.kind === "block"));
  assert.ok(blocks.length >= 2);
  const written = Array.from(doc.querySelectorAll("#s-a .block-as-written pre")).map((p) =>
    // The pre's leading newline (PRE_LEAD) is not part of the block.
    (p.textContent ?? "").replace(/^\n/, "")
  );
  assert.deepEqual(written, blocks.map((b) => `${b.kind === "block" ? b.source : ""}`));
  for (const label of Array.from(doc.querySelectorAll("#s-2 .input-block"))) {
    const href = label.querySelector('a[href^="#a-block-"]')?.getAttribute("href") ?? "";
    assert.ok(doc.querySelector(href) !== null, href);
    // The body's copy is folded on screen and not printed.
    assert.ok(label.querySelector("pre")?.closest("details.input-echo") !== null);
  }
  assert.match(
    out,
    /@media print \{[^}]*details\.input-echo \{ display: none; \}|@media print \{[^]*?details\.input-echo[^{]*\{ display: none; \}/,
  );
});
