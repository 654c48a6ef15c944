/**
 * An SI project renders byte for byte as it did before display units existed: the golden files in
 * test/report/golden/ were rendered from these same fixtures by the package code of that time.
 * After an intended change of the SI output, rewrite them with `FLUXNOTE_UPDATE_GOLDEN=1` and review the diff.
 */
import assert from "node:assert/strict";
import { renderPackage } from "../../src/report/package.ts";
import { siPackages } from "./unitFixtures.ts";

const GOLDEN = new URL("./golden/", import.meta.url);

function firstDifference(a: string, b: string): string {
  let i = 0;
  while (i < a.length && a[i] === b[i]) i++;
  return `at character ${i}:\n  now:    ${JSON.stringify(a.slice(i, i + 120))}\n  golden: ${
    JSON.stringify(b.slice(i, i + 120))
  }`;
}

for (const [name, input] of Object.entries(siPackages())) {
  Deno.test(`an SI package renders byte-identical to the golden ${name}`, () => {
    assert.equal(input.model.info.units, "SI");
    const path = new URL(`${name}.golden`, GOLDEN);
    const now = renderPackage(input);
    if (Deno.env.get("FLUXNOTE_UPDATE_GOLDEN") === "1") Deno.writeTextFileSync(path, now);
    const golden = Deno.readTextFileSync(path);
    assert.ok(now === golden, `${name} differs from its golden file ${firstDifference(now, golden)}`);
  });
}
