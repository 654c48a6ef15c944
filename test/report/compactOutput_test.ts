import assert from "node:assert/strict";
import { SI_DISPLAY } from "../../src/report/page/displayUnits.ts";
import { renderConstructionOutput } from "../../src/report/constructions/constructionOutput.ts";
import { bareSlab, engineEntry } from "./dynamicFixture.ts";

Deno.test("renderConstructionOutput() in compact mode keeps the summary and points to the full series", () => {
  const c = bareSlab();
  const { results, checks } = engineEntry(c);
  const full = renderConstructionOutput(c, results, checks, "c-slab", SI_DISPLAY).markup;
  const compact = renderConstructionOutput(c, results, checks, "c-slab", SI_DISPLAY, true).markup;
  // Neither prints the factor tables in the body; the full mode points to Appendix D, compact to results.json.
  assert.ok(full.includes('href="#d-c-slab"') && !compact.includes('href="#d-c-slab"'));
  assert.ok(!compact.includes('<svg class="plot"') && !compact.includes('role="img" aria-label="Response'));
  assert.ok(!compact.includes("rf-table") && !full.includes("rf-table"));
  assert.ok(compact.includes(`csv/factors-${c.id}.csv`));
  assert.ok(compact.includes("numerical checks passed"));
});
