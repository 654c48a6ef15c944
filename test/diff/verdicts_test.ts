import assert from "node:assert/strict";
import { effectAbsolute, effectSide, effectValue } from "../../src/diff/display.ts";
import { compareResults } from "../../src/diff/effects.ts";
import { compareChecks, compareVerdicts } from "../../src/diff/verdicts.ts";
import { renderDiffHtml } from "../../src/diff/page.ts";
import { renderDiffText } from "../../src/diff/text.ts";
import type { ProjectDiff, SideSummary } from "../../src/diff/types.ts";
import type { CheckResult, ResultsJson } from "../../src/results/types.ts";
import type { Effect } from "../../src/diff/types.ts";

/** A results.json cut down to what the diff reads; the rest of the contract is irrelevant here. */
function results(parts: {
  constructions?: Record<string, Record<string, unknown>>;
  scenarios?: Record<string, Record<string, unknown>>;
  checks?: CheckResult[];
}): ResultsJson {
  return {
    constructions: parts.constructions ?? {},
    scenarios: parts.scenarios ?? {},
    checks: parts.checks ?? [],
  } as unknown as ResultsJson;
}

function designDay(peakHour: number): Record<string, unknown> {
  return {
    kind: "design-day",
    peak: { heatGain: 500, time_h: peakHour },
    totals: { gain_J: 1e7, loss_J: 0 },
    surfaces: {},
  };
}

function pick(effects: readonly Effect[], subject: string, quantity: string): Effect {
  const found = effects.find((e) => e.subject === subject && e.quantity === quantity);
  assert.ok(
    found,
    `${subject} ${quantity} among ${effects.map((e) => `${e.subject} ${e.quantity}`).join(", ")}`,
  );
  return found;
}

Deno.test("the hour of a design-day peak changes the short way round the clock: 23:00 → 00:00 is +1 h", () => {
  // Clock arithmetic modulo 24 h: 0 − 23 = −23 ≡ +1 (mod 24); 22 − 2 = 20 ≡ −4 (mod 24).
  const late = compareResults(
    results({ scenarios: { day: designDay(23) } }),
    results({ scenarios: { day: designDay(0) } }),
  );
  const wrap = pick(late.effects, "scenario:day", "peakTime_h");
  assert.equal(wrap.absolute, 1);
  assert.equal(wrap.relative, null);
  assert.equal(effectAbsolute(wrap), "+1.00\u2009h");
  assert.deepEqual([effectValue(wrap, wrap.old), effectValue(wrap, wrap.new)], ["23:00", "00:00"]);
  const back = compareResults(
    results({ scenarios: { day: designDay(2) } }),
    results({ scenarios: { day: designDay(22) } }),
  );
  assert.equal(pick(back.effects, "scenario:day", "peakTime_h").absolute, -4);
  const plain = compareResults(
    results({ scenarios: { day: designDay(14) } }),
    results({ scenarios: { day: designDay(16.5) } }),
  );
  assert.equal(pick(plain.effects, "scenario:day", "peakTime_h").absolute, 2.5);
});

function weatherYear(peakTime: string, timeH: number): Record<string, unknown> {
  // As the weather year writes them: `peakTime` is the label of the peak row (hour ending, local standard
  // time) and `peak.time_h` the hours from the first row to it, see test/scenarios/weatherYear_test.ts where a
  // spike in the row labelled 2031-07-21T14:00 gives time_h = spikeHour − 1.
  return {
    kind: "weather",
    peak: { heatGain: 800, time_h: timeH },
    peakTime,
    totals: { gain_J: 1e9, loss_J: 2e9 },
    surfaces: { south: { peak: { heatGain: 300, time_h: timeH }, peakTime } },
  };
}

// Rows from 2031-01-01T01:00: the row labelled 2031-07-21T14:00 is hour 201·24 + 14 = 4838 of the year, i.e.
// 4837 h after the first row; 2031-07-22T09:00 is 4857 h after it; 2031-08-02T14:00 is 4837 + 12·24 = 5125 h.
const JULY_21_14 = weatherYear("2031-07-21T14:00", 4837);

Deno.test("a weather-year peak shows the date and time the package prints, not an hour early", () => {
  const { effects } = compareResults(
    results({ scenarios: { year: JULY_21_14 } }),
    results({ scenarios: { year: weatherYear("2031-07-22T09:00", 4856) } }),
  );
  for (const subject of ["scenario:year", "scenario:year/south"]) {
    const e = pick(effects, subject, "peakTime_h");
    // The package's peak summary prints `weatherTime(peakTime)`: "2031-07-21 14:00" (src/report/scenarioSummary.ts).
    assert.equal(effectSide(e, "old"), "2031-07-21 14:00");
    assert.equal(effectSide(e, "new"), "2031-07-22 09:00");
    // Compared as times, not clock hours: 14:00 on the 21st to 09:00 on the 22nd is +19 h (modulo 24 it would be −5).
    assert.equal(e.absolute, 19);
    assert.deepEqual([e.oldTime, e.newTime], ["2031-07-21T14:00", "2031-07-22T09:00"]);
  }
});

Deno.test("a weather-year peak at the same hour of another day is a change of whole days", () => {
  const { effects } = compareResults(
    results({ scenarios: { year: JULY_21_14 } }),
    results({ scenarios: { year: weatherYear("2031-08-02T14:00", 5125) } }),
  );
  const e = pick(effects, "scenario:year", "peakTime_h");
  assert.equal(e.absolute, 12 * 24); // 21 July → 2 August: 12 days
  assert.equal(effectSide(e, "new"), "2031-08-02 14:00");
  const same = compareResults(
    results({ scenarios: { year: JULY_21_14 } }),
    results({ scenarios: { year: JULY_21_14 } }),
  );
  assert.deepEqual(same.effects, []);
});

function wall(u: number, extra: Record<string, unknown> = {}): Record<string, unknown> {
  return {
    U: u,
    correctedU: u + ((extra.deltaU as number | undefined) ?? 0),
    temperatureFactor: 1 - u * 0.13,
    ...extra,
  };
}

Deno.test('"U with corrections" is listed only when a side has a correction', () => {
  // Without corrections U_c = U: the U line says it all, no second line with the same numbers.
  const plain = compareResults(
    results({ constructions: { "EW-1": wall(0.3) } }),
    results({ constructions: { "EW-1": wall(0.25) } }),
  );
  assert.ok(plain.effects.some((e) => e.quantity === "U"));
  assert.ok(!plain.effects.some((e) => e.quantity === "correctedU"), "no U_c line without corrections");
  // With a correction on b (ΔU = 0.03 W/(m²K), invented): U_c moves from 0.3 to 0.28 and is listed.
  const corrected = { corrections: { layers: [], deltaU: 0.03 }, deltaU: 0.03 };
  const withCorrection = compareResults(
    results({ constructions: { "EW-1": wall(0.3) } }),
    results({ constructions: { "EW-1": wall(0.25, corrected) } }),
  );
  const e = pick(withCorrection.effects, "construction:EW-1", "correctedU");
  assert.deepEqual([e.old, e.new], [0.3, 0.28]);
});

Deno.test("counts such as the limits not met print as whole numbers", () => {
  const limit = (pass: boolean, kind: string) => ({
    limitKey: kind,
    pass,
    value: 1,
    limit: 1,
    clause: "c",
    unit: "-",
  });
  const { effects } = compareResults(
    results({ constructions: { "EW-1": wall(0.3, { limits: [limit(false, "max-u")] }) } }),
    results({
      constructions: { "EW-1": wall(0.3, { limits: [limit(false, "max-u"), limit(false, "min-time-lag")] }) },
    }),
  );
  const e = pick(effects, "construction:EW-1", "limitsNotMet");
  assert.deepEqual([effectSide(e, "old"), effectSide(e, "new"), effectAbsolute(e)], ["1", "2", "+1"]);
  assert.equal(effectAbsolute({ ...e, old: 2, new: 0, absolute: -2 }), "\u22122");
});

function limit(kind: string, pass: boolean, value: number, bound: number) {
  return {
    id: `${kind}:EW-1`,
    limitKey: kind,
    quantity: "correctedU",
    value,
    limit: bound,
    unit: "W/(m²K)",
    clause: `cl. ${kind}`,
    scope: "construction",
    at: "w.md:1:1",
    pass,
  };
}

Deno.test("compareVerdicts() lists each limit whose verdict moved, newly NOT MET first, with its clause", () => {
  const a = results({
    constructions: {
      "EW-1": wall(0.3, { limits: [limit("max-u", false, 0.3, 0.28), limit("min-time-lag", true, 9, 8)] }),
      "EW-2": wall(0.3, { limits: [limit("max-u", true, 0.3, 0.35)] }),
    },
  });
  const b = results({
    constructions: {
      "EW-1": wall(0.25, { limits: [limit("max-u", true, 0.25, 0.28), limit("min-time-lag", false, 7, 8)] }),
      "EW-2": wall(0.3, { limits: [limit("max-u", true, 0.3, 0.35)] }),
    },
  });
  const verdicts = compareVerdicts(a, b);
  assert.deepEqual(verdicts.map((v) => [v.subject, v.limit, v.clause, v.old, v.new]), [
    ["construction:EW-1", "min-time-lag", "cl. min-time-lag", "MET", "NOT MET"],
    ["construction:EW-1", "max-u", "cl. max-u", "NOT MET", "MET"],
  ]);
  assert.deepEqual([verdicts[1]!.oldValue, verdicts[1]!.newValue], [0.3, 0.25]);
  assert.deepEqual(compareVerdicts(a, a), []);
});

function check(id: string, pass: boolean, value: number): CheckResult {
  return { id, subject: "construction:EW-1", description: `${id} holds`, value, limit: 1e-6, pass };
}

Deno.test("compareChecks() lists checks that newly fail first, then those that no longer fail; steady ones not", () => {
  const a = results({
    checks: [check("sum-rule", false, 1e-3), check("energy-balance", true, 1e-9), check("steady", true, 0)],
  });
  const b = results({
    checks: [check("sum-rule", true, 1e-8), check("energy-balance", false, 1e-2), check("steady", true, 0)],
  });
  assert.deepEqual(compareChecks(a, b).map((c) => [c.id, c.old, c.new]), [
    ["energy-balance", "pass", "fail"],
    ["sum-rule", "fail", "pass"],
  ]);
  assert.deepEqual(compareChecks(a, a), []);
});

Deno.test("a newly failing check and a weather peak's date lead the text and the page before files and effects", () => {
  const a = results({
    scenarios: { year: JULY_21_14 },
    checks: [check("energy-balance", true, 1e-9)],
  });
  const b = results({
    scenarios: { year: weatherYear("2031-07-22T09:00", 4856) },
    checks: [check("energy-balance", false, 1e-2)],
  });
  const sideOf = (revision: string): SideSummary => ({
    label: revision,
    kind: "folder",
    title: "T",
    revision,
    date: "2031-01-15",
    inputsSha256: "0".repeat(64),
  });
  const { effects, unchanged } = compareResults(a, b);
  const diff: ProjectDiff = {
    schema: "fluxnote-diff/1",
    a: sideOf("A"),
    b: sideOf("B"),
    identical: false,
    verdicts: compareVerdicts(a, b),
    checks: compareChecks(a, b),
    files: [{ path: "walls.md", status: "changed", proseChanged: false }],
    changes: [],
    effects,
    unchangedEffects: unchanged,
  };
  const text = renderDiffText(diff);
  const flipped = text.indexOf("construction EW-1 · energy-balance: pass → fail");
  assert.ok(flipped > 0, text);
  assert.ok(flipped < text.indexOf("Files:") && flipped < text.indexOf("Effects on results"), text);
  assert.match(text, /scenario year\s+hour of peak\s+2031-07-21 14:00\s+2031-07-22 09:00\s+\+19\.0\u2009h/);
  const page = renderDiffHtml(diff);
  const heading = page.indexOf("<h2>Calculation checks changed</h2>");
  assert.ok(heading > 0 && heading < page.indexOf("<h2>Files</h2>"));
  assert.ok(page.includes("2031-07-21 14:00") && !page.includes(">13:00<"));
});
