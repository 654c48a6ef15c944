import assert from "node:assert/strict";
import { SI_DISPLAY } from "../../src/report/displayUnits.ts";
import { renderConstructionOutput } from "../../src/report/constructionOutput.ts";
import { bareSlab, engineEntry } from "./dynamicFixture.ts";

Deno.test("renderConstructionOutput() in compact mode keeps the summary and points to the full series", () => {
  const c = bareSlab();
  const { results, checks } = engineEntry(c);
  const full = renderConstructionOutput(c, results, checks, "c-slab", SI_DISPLAY).markup;
  const compact = renderConstructionOutput(c, results, checks, "c-slab", SI_DISPLAY, true).markup;
  assert.ok(full.includes("<h5>Response factors</h5>") && !compact.includes("<h5>Response factors</h5>"));
  assert.ok(!compact.includes('<svg class="plot"') && !compact.includes('role="img" aria-label="Response'));
  assert.ok(compact.includes(`csv/factors-${c.id}.csv`));
  assert.ok(compact.includes("checks passed"));
  assert.ok(compact.length < full.length / 2);
});
