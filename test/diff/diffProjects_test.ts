import assert from "node:assert/strict";
import { diffProjects } from "../../src/diff/diffProjects.ts";
import type { Effect } from "../../src/diff/types.ts";
import { side } from "./_sides.ts";

// The known edits between the fixture revisions (see `diff -r test/fixtures/diff/rev-b test/fixtures/diff/rev-c`):
// one line each — section | subject | part | key | change | place in rev-b | place in rev-c. Each place was read
// off the fixture files independently, e.g. `sed -n 10p rev-b/20-constructions.md | cut -c25-` starts "thickness:".
const EXPECTED_CHANGES = [
  "project|project.md|-|revision|changed|project.md:4:1|project.md:4:1",
  "project|project.md|-|date|changed|project.md:8:1|project.md:8:1",
  "project|project.md|-|revisions.C|added|-|project.md:13:7",
  "material|wool-t|-|conductivity|changed|10-materials.md:17:1|10-materials.md:17:1",
  "material|fibre-t|-|-|added|-|10-materials.md:42:1",
  "construction|W-1|layer 2|thickness|changed|20-constructions.md:10:25|20-constructions.md:10:25",
  "construction|R-1|layer 1|-|added|-|20-constructions.md:22:5",
  "scenario|summer-day|surface wall-south|area|changed|30-scenario.md:13:74|30-scenario.md:13:74",
];

Deno.test("diffProjects() lists exactly the edited keys of the fixture, with their places on each side", async () => {
  const diff = diffProjects(await side("rev-b"), await side("rev-c"));
  const listed = diff.changes.map((c) =>
    [c.section, c.subject, c.part ?? "-", c.key ?? "-", c.change, c.oldAt ?? "-", c.newAt ?? "-"].join("|")
  );
  assert.deepEqual(listed, EXPECTED_CHANGES);
  assert.equal(diff.identical, false);
});

Deno.test("diffProjects() reports the edited values in SI with their units", async () => {
  const diff = diffProjects(await side("rev-b"), await side("rev-c"));
  const pick = (key: string) => diff.changes.find((c) => c.key === key);
  assert.deepEqual([pick("revision")?.old, pick("revision")?.new], ["B", "C"]);
  assert.deepEqual([pick("date")?.old, pick("date")?.new], ["2031-03-02", "2031-04-14"]);
  assert.deepEqual([pick("conductivity")?.old, pick("conductivity")?.new, pick("conductivity")?.unit], [
    0.035,
    0.032,
    "W/(m·K)",
  ]);
  // 100 mm → 120 mm, kept in metres
  assert.deepEqual([pick("thickness")?.old, pick("thickness")?.new, pick("thickness")?.unit], [
    0.1,
    0.12,
    "m",
  ]);
  assert.deepEqual([pick("area")?.old, pick("area")?.new, pick("area")?.unit], [40, 44, "m²"]);
  assert.equal(pick("revisions.C")?.new, "2031-04-14: Thicker insulation");
});

Deno.test("diffProjects() says which files changed and in which the prose changed", async () => {
  const diff = diffProjects(await side("rev-b"), await side("rev-c"));
  assert.deepEqual(diff.files, [
    { path: "project.md", status: "changed", proseChanged: false },
    { path: "10-materials.md", status: "changed", proseChanged: false },
    // "100 mm of mineral wool" became "120 mm of mineral wool" in the prose
    { path: "20-constructions.md", status: "changed", proseChanged: true },
    { path: "30-scenario.md", status: "changed", proseChanged: false },
  ]);
});

function effect(effects: readonly Effect[], subject: string, quantity: string): Effect {
  const found = effects.find((e) => e.subject === subject && e.quantity === quantity);
  assert.ok(found !== undefined, `${subject} ${quantity} is listed`);
  return found;
}

function close(actual: number | null, expected: number, rel = 1e-12): void {
  assert.ok(
    actual !== null && Math.abs(actual - expected) <= rel * Math.abs(expected),
    `${actual} ≈ ${expected}`,
  );
}

Deno.test("diffProjects() U-value changes equal the ISO 6946 sums written out", async () => {
  const diff = diffProjects(await side("rev-b"), await side("rev-c"));
  // ISO 6946:2017: R = d/λ for each homogeneous layer, R_T = R_se + ΣR + R_si, U = 1/R_T; conventional surface
  // resistances from its table: R_se = 0.04, R_si = 0.13 (horizontal heat flow), 0.10 (upward), m²·K/W.
  // W-1: brick 102 mm / 0.77, wool 100 → 120 mm / (0.035 → 0.032), block 100 mm / 1.0, plaster 13 mm / 0.52.
  const wallB = 0.04 + 0.102 / 0.77 + 0.100 / 0.035 + 0.100 / 1.0 + 0.013 / 0.52 + 0.13; // 3.284610 m²·K/W
  const wallC = 0.04 + 0.102 / 0.77 + 0.120 / 0.032 + 0.100 / 1.0 + 0.013 / 0.52 + 0.13; // 4.177468 m²·K/W
  const w = effect(diff.effects, "construction:W-1", "U");
  close(w.old, 1 / wallB);
  close(w.new, 1 / wallC);
  close(w.absolute, 1 / wallC - 1 / wallB);
  // Identity: with U = 1/R, (U_C − U_B)/U_B = R_B/R_C − 1.
  close(w.relative, wallB / wallC - 1);
  // R-1 (upward): 40 mm wood-fibre / 0.040 inserted; wool 200 mm / (0.035 → 0.032), concrete 150 mm / 2.0, plaster.
  const roofB = 0.04 + 0.200 / 0.035 + 0.150 / 2.0 + 0.013 / 0.52 + 0.10; // 5.954286 m²·K/W
  const roofC = 0.04 + 0.040 / 0.040 + 0.200 / 0.032 + 0.150 / 2.0 + 0.013 / 0.52 + 0.10; // 7.490000 m²·K/W
  const r = effect(diff.effects, "construction:R-1", "U");
  close(r.old, 1 / roofB);
  close(r.new, 1 / roofC);
  close(r.relative, roofB / roofC - 1);
});

Deno.test("diffProjects() effects: every entry is a real change, relative = absolute/|old|, largest first", async () => {
  const diff = diffProjects(await side("rev-b"), await side("rev-c"));
  assert.ok(diff.effects.length >= 8);
  let previous = Infinity;
  let seenWithout = false;
  for (const e of diff.effects) {
    assert.notEqual(e.old, e.new);
    // A clock hour changes the short way round the clock (signed difference modulo 24 h, in [−12, 12)).
    const clockHour = e.quantity === "peakTime_h" || e.quantity === "peakCoolingLoadTime_h";
    const wrapped = (d: number) => ((((d + 12) % 24) + 24) % 24) - 12;
    if (e.old !== null && e.new !== null) {
      close(e.absolute, clockHour ? wrapped(e.new - e.old) : e.new - e.old, 1e-15);
    }
    if (e.relative === null) {
      seenWithout = true;
      continue;
    }
    assert.ok(!seenWithout, "entries without a relative change come last");
    close(e.relative, (e.absolute ?? NaN) / Math.abs(e.old ?? NaN), 1e-15);
    assert.ok(
      Math.abs(e.relative) <= previous,
      `${e.subject} ${e.quantity} is not larger than the one before`,
    );
    previous = Math.abs(e.relative);
  }
  // Energy over the design day falls because both U-values fall and nothing else changed but one area (+10 %).
  const day = effect(diff.effects, "scenario:summer-day", "dailyGain_J");
  assert.ok(day.relative !== null && day.relative < 0);
  // The hour of a peak is a clock time: no relative change.
  assert.ok(diff.effects.filter((e) => e.quantity === "peakTime_h").every((e) => e.relative === null));
});

Deno.test("diffProjects() of a revision with itself finds no differences", async () => {
  const b = await side("rev-b");
  const diff = diffProjects(b, b);
  assert.equal(diff.identical, true);
  assert.deepEqual([diff.files, diff.changes, diff.effects], [[], [], []]);
  // 2 constructions × 5 quantities (U, decrement, lag, f_Rsi, limits not met; no correction, so no U_c)
  // + scenario (peak, hour, gain, loss) + 2 surfaces × (peak, hour)
  assert.equal(diff.unchangedEffects, 10 + 4 + 4);
});

Deno.test("diffProjects() in the other direction lists the inverse changes", async () => {
  const forward = diffProjects(await side("rev-b"), await side("rev-c"));
  const back = diffProjects(await side("rev-c"), await side("rev-b"));
  const inverse = { added: "removed", removed: "added", changed: "changed" } as const;
  const key = (c: (typeof forward.changes)[number], swap: boolean) =>
    [c.subject, c.part, c.key, swap ? inverse[c.change] : c.change, swap ? c.newAt : c.oldAt].join("|");
  assert.deepEqual(
    back.changes.map((c) => key(c, false)).sort(),
    forward.changes.map((c) => key(c, true)).sort(),
  );
});

Deno.test("diffProjects() compares front-matter settings added by later features", async () => {
  const b = await side("rev-b");
  const withStudy = { ...b, model: { ...b.model, info: { ...b.model.info, sensitivityVariation: 0.2 } } };
  const diff = diffProjects(b, withStudy);
  assert.deepEqual(diff.changes.map((c) => [c.key, c.change, c.old, c.new]), [[
    "sensitivity.variation",
    "added",
    null,
    0.2,
  ]]);
  const future = { ...b, model: { ...b.model, info: { ...b.model.info, climateBasis: "basis-x" } } };
  assert.deepEqual(diffProjects(b, future).changes.map((c) => [c.key, c.new]), [[
    "climate-basis",
    "basis-x",
  ]]);
});
