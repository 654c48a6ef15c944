import assert from "node:assert/strict";
import { readDynamic } from "../../src/report/constructions/dynamicData.ts";
import { formatFixed, formatSig } from "../../src/report/page/format.ts";
import { renderPackage } from "../../src/report/package.ts";
import { assertNoLiveMarkup, parseDocument, parseFragment } from "./dom.ts";
import { bareSlab, construction, ctfRejectingWall, renderWithEngine } from "./dynamicFixture.ts";
import { fixture, HOSTILE, wall } from "./fixture.ts";

/** The value cell of the summary row whose symbol cell is `symbol`. */
function summaryValue(root: ParentNode, symbol: string): string | undefined {
  const rows = Array.from(root.querySelectorAll(".dynamic-summary tbody tr"));
  const row = rows.find((r) => r.querySelectorAll("td")[1]?.textContent === symbol);
  return row?.querySelectorAll("td")[2]?.textContent ?? undefined;
}

Deno.test("renderConstructionOutput() prints the dynamic numbers of results.json", () => {
  const { markup, results } = renderWithEngine(wall());
  const view = readDynamic(results);
  assert.ok(view !== undefined, "the engine's entry reads as dynamic results");
  const root = parseFragment(markup);
  assert.equal(summaryValue(root, "f"), formatSig(view.dynamic.decrementFactor, 3));
  assert.equal(summaryValue(root, "τ₁"), formatSig(view.tau1_h, 3));
  assert.equal(summaryValue(root, "N"), String(view.poles.count));
  assert.equal(summaryValue(root, "Δt₁₂"), formatSig(view.dynamic.periodicTransmittance.timeShift_h, 3));
  assert.equal(summaryValue(root, "κ₁"), formatSig(view.dynamic.arealHeatCapacityInside / 1000, 3));
  // ISO 13786 sign convention (negative = lag), as the results contract states: the shift of Y12 is −lag.
  assert.ok(view.dynamic.periodicTransmittance.timeShift_h < 0);
  const rfRows = Array.from(root.querySelectorAll(".rf-table tbody tr")).map((r) =>
    Array.from(r.querySelectorAll("td")).map((td) => td.textContent)
  );
  const rf = view.responseFactors;
  assert.deepEqual(rfRows[1]?.slice(2), [rf.X[1]!, rf.Y[1]!, rf.Z[1]!].map((v) => formatSig(v, 4)));
  assert.equal(rfRows.filter((r) => /^\d+$/.test(r[0] ?? "")).length, 12, "twelve terms printed");
  assert.match(
    root.textContent ?? "",
    new RegExp(`${view.responseFactors.Y.length} terms in all per series`),
  );
});

Deno.test("renderConstructionOutput() shows the ISO 13786 figures of a bare slab as the closed form gives them", () => {
  // Closed form (homogeneous slab, no surface resistances): Y12 = λγ / sinh(γd), γ = (1 + i)/δp,
  // δp = √(2α/ω), ω = 2π/86 400 s; f = |Y12| / U with U = λ/d; lag = (T/2π)·(arg sinh((1+i)ξ) − π/4), ξ = d/δp.
  const lambda = 1, d = 0.2, alpha = 1 / 2e6, omega = (2 * Math.PI) / 86400;
  const dp = Math.sqrt((2 * alpha) / omega);
  const xi = d / dp;
  const sinhRe = Math.sinh(xi) * Math.cos(xi), sinhIm = Math.cosh(xi) * Math.sin(xi);
  const y12 = (lambda * Math.SQRT2) / dp / Math.hypot(sinhRe, sinhIm);
  const lagH = ((Math.atan2(sinhIm, sinhRe) - Math.PI / 4) * 24) / (2 * Math.PI);
  const root = parseFragment(renderWithEngine(bareSlab()).markup);
  assert.equal(summaryValue(root, "|Y₁₂|"), formatSig(y12, 3)); // 4.25 W/(m²K)
  assert.equal(summaryValue(root, "f"), formatSig(y12 / (lambda / d), 3)); // 0.849
  assert.equal(summaryValue(root, "φ"), formatSig(lagH, 3)); // 3.48 h
  assert.equal(summaryValue(root, "Δt₁₂"), formatSig(-lagH, 3));
});

Deno.test("renderConstructionOutput() notes a time lag beyond 12 h with the wrapped ISO value", () => {
  // 0.5 m of brickwork (invented values): the lag is about 17 h, so ISO's principal value would be +(24 − lag).
  const brick = construction("BR-1", [{
    kind: "massive",
    thicknessM: 0.5,
    conductivity: 0.77,
    density: 1850,
    specificHeat: 1000,
  }]);
  const { markup, results } = renderWithEngine(brick);
  const lag = readDynamic(results)!.dynamic.timeLag_h;
  assert.ok(lag > 12);
  const note = parseFragment(markup).querySelector(".dynamic-response p.note")?.textContent ?? "";
  assert.match(note, /exceeds 12 h/);
  assert.ok(note.includes(`+${formatSig(24 - lag, 3)} h`), note);
});

Deno.test("renderConstructionOutput() shows both CTF sets side by side, with the state-space mesh", () => {
  const { markup, results } = renderWithEngine(wall());
  const view = readDynamic(results)!;
  const tables = Array.from(parseFragment(markup).querySelectorAll(".ctf-table"));
  assert.equal(tables.length, 1);
  const caption = tables[0]?.querySelector("caption")?.textContent ?? "";
  assert.match(caption, /Roots: method of Stephenson & Mitalas \(1971\), \d+ poles\. State space:/);
  assert.ok(
    caption.includes(`cells per layer, outside to inside: ${view.ctfStateSpace!.cellsPerLayer.join(", ")}`),
  );
  const rows = Array.from(tables[0]!.querySelectorAll("tbody tr")).map((r) =>
    Array.from(r.querySelectorAll("td")).map((td) => td.textContent)
  );
  // Rows alternate: n with the root method's coefficients, then the state-space ones for the same n.
  assert.deepEqual(rows[2]?.slice(0, 2), ["1", "roots"]);
  assert.equal(rows[2]?.[5], formatSig(view.ctf!.Phi[0]!, 6));
  assert.equal(rows[3]?.[0], "state space");
  assert.equal(rows[3]?.[4], formatSig(view.ctfStateSpace!.Phi[0]!, 6));
  const longest = Math.max(view.ctf!.Y.length, view.ctfStateSpace!.Y.length);
  assert.equal(rows.length, 2 * longest);
});

Deno.test("renderConstructionOutput() reports a rejected polynomial CTF as a method choice, not a failure", () => {
  const { markup, results, checks, notes } = renderWithEngine(ctfRejectingWall());
  assert.equal(readDynamic(results)?.ctf, null, "the engine rejects this wall's polynomial CTF");
  const root = parseFragment(markup);
  const boxes = Array.from(root.querySelectorAll(".ctf-method-note"));
  assert.ok(boxes.length >= 1);
  const text = boxes[0]?.textContent ?? "";
  assert.match(text, /Root method: method choice, modal form used/);
  assert.match(text, /not a failed check/);
  const acceptance = ["ctf-resynthesis", "ctf-coefficient-bound", "ctf-identity"];
  assert.equal(
    checks.filter((c) => acceptance.includes(c.id)).length,
    0,
    "no acceptance row among the checks",
  );
  assert.ok(checks.every((c) => c.pass), JSON.stringify(checks.filter((c) => !c.pass)));
  const note = notes.find((n) => n.id === "ctf-modal-form")!;
  const over = note.figures.filter((f) => !(Math.abs(f.value) <= f.limit));
  assert.ok(over.length >= 1, "the note records the figure over its limit");
  for (const f of over) {
    assert.ok(text.includes(`${f.id} (`) && text.includes(`value ${formatSig(f.value, 3)}`), f.id);
  }
  assert.ok(!/FAIL/.test(text), "no FAIL wording in the note");
  assert.equal(root.querySelectorAll(".ctf-table").length, 0);
});

Deno.test("renderConstructionOutput() prints CTS summing to 100 % (identity Σ CTS = 1)", () => {
  // Identity: Σ_j Y_P,j = Σ_j Y_j = U, so Σ CTS = 1 (Spitler & Fisher 1999; ASHRAE Handbook—Fundamentals,
  // nonresidential cooling load chapter, from memory). Pure resistance: CTS = [1, 0, …, 0] (closed form).
  const wallRoot = parseFragment(renderWithEngine(wall()).markup);
  assert.match(wallRoot.querySelector(".periodic-table tr.total")?.textContent ?? "", /CTS 100\.00 %/);
  const resistive = construction("RS-1", [{ kind: "resistive", resistance: 2 }]);
  const root = parseFragment(renderWithEngine(resistive).markup);
  const first = root.querySelector(".periodic-table tbody tr")?.querySelectorAll("td");
  assert.equal(first?.[0]?.textContent, "0");
  assert.equal(first?.[4]?.textContent, formatFixed(100, 2));
  assert.equal(summaryValue(root, "f"), formatSig(1, 3)); // f = 1 without heat storage (closed form)
});

Deno.test("renderPackage() says so when a construction's dynamic results are incomplete", () => {
  const base = fixture();
  const { periodic: _dropped, ...partial } = base.results.constructions["EW-9"]!;
  const input = { ...base, results: { ...base.results, constructions: { "EW-9": partial } } };
  const part = parseDocument(renderPackage(input)).querySelector(".dynamic-response");
  assert.match(
    part?.textContent ?? "",
    /No dynamic results: results\.json holds no complete dynamic entry for EW-9/,
  );
  assert.equal(part?.querySelectorAll("svg").length, 0);
  assert.match(
    part?.textContent ?? "",
    /1 numerical checks? passed|0 of 1 numerical checks passed/,
    "the checks are still counted",
  );
});

Deno.test("renderPackage() escapes a hostile construction name in the figure captions", () => {
  const all = Object.values(HOSTILE).join(" ");
  const out = renderPackage(fixture({ text: all }));
  const doc = parseDocument(out);
  assertNoLiveMarkup(out, doc);
  const captions = Array.from(doc.querySelectorAll("figure.plot-figure figcaption"));
  assert.equal(captions.length, 3);
  for (const c of captions) assert.ok((c.textContent ?? "").includes(`Rendered block wall${all}`));
});

Deno.test("renderConstructionOutput() prints times jΔ in hours at a 15-minute step", () => {
  const { markup, results } = renderWithEngine({ ...wall(), timestepS: 900 });
  const root = parseFragment(markup);
  const row = root.querySelectorAll(".rf-table tbody tr")[1]?.querySelectorAll("td");
  assert.equal(row?.[1]?.textContent, "0.25"); // j = 1 at Δ = 900 s = 0.25 h
  assert.equal(summaryValue(root, "Δ"), "0.25");
  assert.equal(readDynamic(results)?.timestep_h, 0.25);
  // Periodic factors stay hourly whatever the step (24 values, results contract).
  assert.equal(root.querySelectorAll(".periodic-table tbody tr").length, 13);
});
