/**
 * The body keeps what a checking engineer reads (layer table, drawing, U, short dynamic summary, scenario
 * summaries and plots, one ranked sensitivity table); the long tables move to appendices and nothing is lost:
 * every hourly value, sensitivity effect and material value is still in the HTML. Built from projects/demo.
 */
import assert from "node:assert/strict";
import { join } from "node:path";
import { runBuild } from "../../src/commands/build.ts";
import { loadProject } from "../../src/commands/loadProject.ts";
import { renderSectionSvg } from "../../src/report/constructions/drawing/sectionSvg.ts";
import { SI_DISPLAY } from "../../src/report/page/displayUnits.ts";
import { formatFixed } from "../../src/report/page/format.ts";
import { parseDocument, parseFragment } from "./dom.ts";

const DEMO = new URL("../../projects/demo/", import.meta.url).pathname;

interface Built {
  readonly doc: Document;
  // deno-lint-ignore no-explicit-any
  readonly results: any;
}

let built: Promise<Built> | undefined;
/** The demo built once for this file (HTML and results.json). */
function demo(): Promise<Built> {
  built ??= (async () => {
    const out = join(await Deno.makeTempDir({ prefix: "fluxnote-density-" }), "out");
    assert.equal(await runBuild({ project: DEMO, out }, { stdout: () => {}, stderr: () => {} }), 0);
    const doc = parseDocument(await Deno.readTextFile(join(out, "package.html")));
    const results = JSON.parse(await Deno.readTextFile(join(out, "results.json")));
    await Deno.remove(join(out, ".."), { recursive: true });
    return { doc, results };
  })();
  return built;
}

const text = (el: Element | null | undefined) => (el?.textContent ?? "").replace(/\s+/g, " ").trim();

Deno.test("a construction's layers are listed once (table, not again under the drawing)", async () => {
  const loaded = await loadProject(DEMO);
  assert.ok(loaded.model !== undefined);
  for (const c of loaded.model.constructions) {
    const svg = parseFragment(renderSectionSvg(c, SI_DISPLAY).markup).querySelector("svg")!;
    const keys = Array.from(svg.querySelectorAll("text.key-label")).map((t) => t.textContent ?? "");
    // The key under the drawing names the hatch families only; the layer names are the layer table's.
    for (const layer of c.layers) {
      assert.ok(
        !keys.some((k) => k.includes(layer.name)),
        `${c.id}: "${layer.name}" repeated under the drawing`,
      );
    }
    assert.ok(keys.length > 0 && keys.length < c.layers.length + 2, `${c.id}: ${keys.join(" | ")}`);
    // Each square tag still points at a table row: one tag per layer, numbered 1..n.
    const tags = Array.from(svg.querySelectorAll("g.layer-tag text")).map((t) => t.textContent);
    assert.deepEqual(tags, c.layers.map((_, i) => String(i + 1)), c.id);
  }
});

Deno.test("hourly scenario values print in an appendix, not in the body, and every value is still in the HTML", async () => {
  const { doc, results } = await demo();
  const body = doc.querySelector("#s-2")!;
  assert.equal(body.querySelectorAll("table.hourly").length, 0, "no step table in section 2");
  assert.ok(text(body).includes("csv/scenario-july-design-day.csv"), "the body points at the CSV");
  const appendix = doc.querySelector("#s-e");
  assert.ok(appendix !== null, "Appendix E is there");
  assert.match(text(appendix.querySelector("h2")), /^Appendix E Hourly scenario values$/);
  // Every surface's heat gain at every step, as results.json holds it, rounded to whole watts.
  const day = results.scenarios["july-design-day"];
  const gains = Array.from(appendix.querySelectorAll("table.hourly-gains tbody tr")).map((tr) =>
    Array.from(tr.querySelectorAll('td[data-q="gain"]')).map((td) => td.textContent?.replace("\u2212", "-"))
  );
  const surfaces = Object.values(day.surfaces) as { heatGain: number[] }[];
  assert.equal(gains.length, day.totalHeatGain.length);
  gains.forEach((row, k) => {
    assert.deepEqual(
      row,
      surfaces.map((s) => formatFixed(s.heatGain[k]!, 0).replace("\u2212", "-")),
      `step ${k}`,
    );
  });
  // The cooling load at every hour, and the contents names the appendix.
  const loads = appendix.querySelectorAll('table.cooling-load td[data-q="total-load"]');
  assert.equal(loads.length, 24);
  assert.ok(text(doc.querySelector("nav.contents")).includes("Appendix E Hourly scenario values"));
});

Deno.test("a scenario's passed checks are one line in the body; the checks list is Appendix C's", async () => {
  const { doc, results } = await demo();
  const own = results.checks.filter((c: { subject: string }) =>
    c.subject.startsWith("scenario:july-design-day")
  );
  assert.ok(own.length > 0);
  const output = doc.querySelector("#s-2 .scenario-output")!;
  assert.equal(output.querySelectorAll("table.subject-checks").length, 0);
  assert.ok(text(output).includes(`${own.length} numerical checks passed (Appendix C)`));
});

Deno.test("the body's sensitivity table ranks effects across constructions above the threshold", async () => {
  const { doc, results } = await demo();
  const study = results.sensitivity;
  const section = doc.getElementById("s-sensitivity")!;
  const tables = section.querySelectorAll("table");
  assert.equal(tables.length, 1, "one table in the body");
  const rows = Array.from(tables[0]!.querySelectorAll("tbody tr"));
  const shares = rows.map((r) => Number(r.querySelector('td[data-q="relative"]')?.textContent));
  // Ranked: each share (largest change as % of its base) no larger than the one above, all above the threshold.
  shares.forEach((s, i) => {
    assert.ok(s >= study.threshold * 100 - 1e-9, `row ${i + 1}: ${s} %`);
    if (i > 0) assert.ok(s <= shares[i - 1]!, `row ${i + 1} ranked`);
  });
  // Across constructions: the rows name results of more than one construction.
  const subjects = new Set(rows.map((r) => text(r.querySelectorAll("td")[1]).replace(/^.* of /, "")));
  assert.ok(subjects.size >= 2, [...subjects].join(", "));
  // The largest effect of all, worked from results.json: max(|−|, |+|) / base over every construction's U.
  const top = Object.entries(study.constructions).flatMap(([id, c]) =>
    // deno-lint-ignore no-explicit-any
    (c as any).U.map((e: any) => Math.max(Math.abs(e.minus), Math.abs(e.plus)) / results.constructions[id].U)
  ).reduce((a: number, b: number) => Math.max(a, b), 0);
  assert.ok(shares[0]! >= Number((top * 100).toPrecision(2)) - 1e-9, `${shares[0]} vs ${top * 100}`);
  // Every per-construction table moved to Appendix F, none lost: in input order, every effect kept a row.
  const appendix = doc.querySelector("#s-f")!;
  const headings = Array.from(appendix.querySelectorAll("h3")).map((h) => text(h)).filter((t) =>
    t.startsWith("Construction ")
  );
  // projects/demo defines EW-1 … EW-4 in 20-walls.md, RF-1 in 30-roof.md, then GF-1 and IW-2 in 60-reading-room.md.
  assert.deepEqual(headings, [
    "Construction EW-1",
    "Construction EW-2",
    "Construction EW-3",
    "Construction EW-4",
    "Construction RF-1",
    "Construction GF-1",
    "Construction IW-2",
  ]);
  const kept = Object.values(study.scenarios).reduce(
    // deno-lint-ignore no-explicit-any
    (n: number, s: any) => n + s.peakHeatGain.length + s.conditions.length,
    // deno-lint-ignore no-explicit-any
    Object.values(study.constructions).reduce((n: number, c: any) => n + c.U.length + c.timeLag_h.length, 0),
  );
  assert.equal(appendix.querySelectorAll("tbody tr").length, kept, "one row per effect kept");
  for (const id of Object.keys(study.constructions)) {
    assert.ok(text(appendix).includes(`Effect on the U-value of ${id}`), id);
    assert.ok(text(appendix).includes(`Effect on the time lag of ${id}`), id);
    assert.ok(!text(section).includes(`Effect on the U-value of ${id}`), `${id} not in the body`);
  }
});

Deno.test("each material's values and source are stated once: section 6 lines, register one row, 7.2 numbered", async () => {
  const { doc } = await demo();
  const register = Array.from(doc.querySelectorAll("#s-5 table.assumptions tbody tr"));
  const library = register.filter((r) => text(r.querySelector("td code")) === "library:material");
  assert.equal(library.length, 1, "the built-in materials are one register row");
  const lines = Array.from(doc.querySelectorAll("#s-6 tbody tr"));
  const sources = Array.from(doc.querySelectorAll("#s-7 ol li")).map((li) => text(li));
  for (const line of lines) {
    const cells = Array.from(line.querySelectorAll("td")).map((td) => text(td));
    const id = cells[0]!;
    if (cells[1] === "library") assert.ok(text(library[0]).includes(id), `${id} in the register row`);
    else assert.match(cells[2]!, /table with its input/, `${id}: a project material's values are its table`);
    // The source is the number of its entry in 7.2, not the text again.
    const ref = /^\[(\d+)\]$/.exec(cells.find((c) => /^\[\d+\]$/.test(c)) ?? "");
    assert.ok(ref !== null, `${id}: ${cells.join(" | ")}`);
    assert.ok(sources[Number(ref[1]) - 1] !== undefined, `${id}: source ${ref[1]} listed in 7.2`);
    assert.ok(!cells.includes(sources[Number(ref[1]) - 1]!), `${id}: source text not repeated`);
  }
  // The framed layer's stud material is a material of the package too (EW-1, projects/demo 20-walls.md).
  assert.ok(lines.some((l) => text(l.querySelector("td")) === "timber-softwood-500"));
});
