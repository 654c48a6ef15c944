import assert from "node:assert/strict";
import { changeText, effectRelative, effectValue } from "../../src/diff/display.ts";
import { diffProjects } from "../../src/diff/diffProjects.ts";
import { renderDiffJson } from "../../src/diff/json.ts";
import { DIFF_CSP, renderDiffHtml } from "../../src/diff/page.ts";
import { renderDiffText } from "../../src/diff/text.ts";
import { escapeHtml } from "../../src/report/page/html.ts";
import type { Change, Effect } from "../../src/diff/types.ts";
import { side } from "./_sides.ts";

const HOSTILE = `<script>alert("x")</script> & 'quoted'`;

function change(over: Partial<Change>): Change {
  return {
    section: "construction",
    subject: "W-1",
    part: "layer 2",
    key: "thickness",
    change: "changed",
    old: 0.1,
    new: 0.12,
    unit: "m",
    oldAt: "a.md:1:1",
    newAt: "a.md:1:1",
    ...over,
  };
}

Deno.test("changeText() prints old → new with the unit once; thickness in mm", () => {
  assert.equal(changeText(change({})), "100 → 120\u2009mm");
  assert.equal(
    changeText(change({ key: "conductivity", old: 0.035, new: 0.032, unit: "W/(m·K)" })),
    "0.035 → 0.032\u2009W/(m·K)",
  );
  assert.equal(changeText(change({ key: "revision", old: "B", new: "C", unit: "" })), "B → C");
  assert.equal(
    changeText(change({ key: null, change: "added", old: null, new: "fibre-t, 40 mm", unit: "" })),
    "added: fibre-t, 40 mm",
  );
});

Deno.test("effectValue() prints energies in kWh (1 kWh = 3.6 MJ) and peak hours as clock times", () => {
  const energy: Effect = {
    subject: "scenario:s",
    quantity: "dailyGain_J",
    unit: "J",
    old: 7.2e6,
    new: 3.6e6,
    absolute: -3.6e6,
    relative: -0.5,
  };
  assert.equal(effectValue(energy, energy.old), "2.000\u2009kWh");
  assert.equal(effectRelative(energy), "\u221250.0 %");
  const hour: Effect = {
    ...energy,
    quantity: "peakTime_h",
    unit: "h",
    old: 14.5,
    new: 22,
    absolute: 7.5,
    relative: null,
  };
  assert.equal(effectValue(hour, hour.old), "14:30");
  assert.equal(effectRelative(hour), "—");
});

Deno.test("renderDiffText() shows each change with both places and the effects table", async () => {
  const text = renderDiffText(diffProjects(await side("rev-b"), await side("rev-c")));
  assert.ok(text.includes("wool-t · conductivity: 0.035 → 0.032\u2009W/(m·K)"));
  assert.ok(text.includes("a 10-materials.md:17:1, b 10-materials.md:17:1"));
  assert.ok(text.includes("R-1 · layer 1: added: fibre-t, 40 mm"));
  assert.ok(text.includes("20-constructions.md  (prose changed)"));
  assert.ok(/Effects on results: \d+ quantities changed/.test(text));
});

Deno.test("renderDiffText() of identical sides says there are no differences", async () => {
  const b = await side("rev-b");
  assert.ok(
    renderDiffText(diffProjects(b, b)).endsWith("no differences: the inputs and the results are the same"),
  );
});

Deno.test("renderDiffJson() carries the schema and survives a round trip", async () => {
  const diff = diffProjects(await side("rev-b"), await side("rev-c"));
  const parsed = JSON.parse(renderDiffJson(diff));
  assert.equal(parsed.schema, "fluxnote-diff/1");
  assert.deepEqual(parsed, JSON.parse(JSON.stringify(diff)));
});

Deno.test("renderDiffHtml() has no script, forbids scripts by CSP, loads nothing and escapes project text", async () => {
  const b = await side("rev-b");
  const c = await side("rev-c");
  const hostile = {
    ...c,
    label: `rev-c ${HOSTILE}`,
    model: {
      ...c.model,
      info: { ...c.model.info, title: HOSTILE, revision: HOSTILE },
      materials: c.model.materials.map((m) =>
        m.id === "wool-t" ? { ...m, name: HOSTILE, source: HOSTILE } : m
      ),
    },
  };
  const page = renderDiffHtml(diffProjects(b, hostile));
  assert.ok(page.startsWith("<!DOCTYPE html>\n"));
  assert.ok(!/<script/i.test(page), "no script element");
  assert.ok(!/\son[a-z]+\s*=/i.test(page), "no event handler attributes");
  assert.ok(!/(src|href)\s*=/i.test(page), "no external resources");
  assert.ok(page.includes(`<meta http-equiv="Content-Security-Policy" content="${escapeHtml(DIFF_CSP)}">`));
  assert.ok(DIFF_CSP.startsWith("default-src 'none'") && !DIFF_CSP.includes("script-src"));
  assert.ok(page.includes("&lt;script&gt;alert(&quot;x&quot;)&lt;/script&gt; &amp; &#39;quoted&#39;"));
  // The largest effects are highlighted with a CSS class (no script).
  assert.ok(page.includes('<tr class="largest">'));
});

Deno.test("renderDiffText() keeps a value with line breaks on its own line, so it cannot fake a line of output", () => {
  // A YAML string may hold line feeds ("\n" escape, YAML 1.2 §5.7); the reader allows them in text values.
  const fake = "C\nREPRODUCED: every number agrees";
  const sideOf = (revision: string) => ({
    label: "a",
    kind: "folder" as const,
    title: "T",
    revision,
    date: "2031-01-15",
    inputsSha256: "0".repeat(64),
  });
  const text = renderDiffText({
    schema: "fluxnote-diff/1",
    a: sideOf("B"),
    b: sideOf(fake),
    identical: false,
    verdicts: [],
    checks: [],
    files: [{ path: "x\ny.md", status: "changed" } as never],
    changes: [
      change({
        section: "project",
        subject: "project",
        part: null,
        key: "revision",
        old: "B",
        new: fake,
        unit: "",
      }),
    ],
    effects: [],
    unchangedEffects: 0,
  });
  for (const line of text.split("\n")) assert.doesNotMatch(line, /^REPRODUCED|^y\.md/, text);
  assert.ok(text.includes("revision C\\nREPRODUCED"), text);
});
