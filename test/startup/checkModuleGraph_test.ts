/**
 * What `fluxnote check` loads before it can answer: the modules reachable from src/commands/check.ts by value
 * imports (static `import ... from`, `export ... from` and dynamic `import()`; `import type` is erased and
 * loads nothing). Start-up time is dominated by the size of that graph (README, "Start-up"), and mathjs's
 * bundle alone took about 0.2 s of the 0.7 s check of the template; its unit reader is replaced by our own
 * (src/project/unitExpression.ts), so mathjs must not be on the path. The rule is the project's own; nothing
 * outside to cite.
 */
import * as assert from "node:assert/strict";
import { readFileSync } from "node:fs";
import { dirname, join, normalize, relative } from "node:path";

const ROOT = new URL("../../", import.meta.url).pathname;
const VALUE_IMPORT =
  /(?:^|\n)\s*(?:import(?!\s+type\b)[^'"]*?from\s*|export(?!\s+type\b)[^'"]*?from\s*|import\s*)["']([^"']+)["']|\bimport\(\s*["']([^"']+)["']\s*\)/g;

/** Every module file (relative to the repository) and npm specifier reachable from `entry` by value imports. */
export function reachable(entry: string): { files: Set<string>; packages: Set<string> } {
  const files = new Set<string>();
  const packages = new Set<string>();
  const visit = (file: string): void => {
    if (files.has(file)) return;
    files.add(file);
    const text = readFileSync(join(ROOT, file), "utf8");
    for (const m of text.matchAll(VALUE_IMPORT)) {
      const specifier = m[1] ?? m[2]!;
      if (specifier.startsWith(".")) visit(relative(ROOT, normalize(join(ROOT, dirname(file), specifier))));
      else packages.add(specifier);
    }
  };
  visit(entry);
  return { files, packages };
}

Deno.test("check does not load mathjs: units are read by our own table-driven reader", () => {
  const { files, packages } = reachable("src/commands/check.ts");
  assert.ok(files.has("src/project/quantity.ts"), "the walk reaches the quantity reader");
  assert.deepStrictEqual([...packages].filter((p) => p.includes("mathjs")), []);
});

Deno.test("check does not load node:crypto: a project's small inputs are hashed by our own SHA-256", () => {
  // node:crypto's polyfill took tens of ms to load; src/archive/hash.ts loads it only for data over 256 KiB.
  const { packages } = reachable("src/commands/check.ts");
  assert.ok(!packages.has("node:crypto"), [...packages].join(", "));
});

Deno.test("the module walk sees value imports and skips type-only ones", () => {
  // Guards the walk itself: quantity.ts on main imported mathjs's bundle by value and its types by `import type`.
  const sample = 'import type { unit } from "mathjs";\nimport bundle from "mathjs/lib/browser/math.js";\n' +
    'export { x } from "./x.ts";\nconst m = await import("yaml");\n';
  const found = [...sample.matchAll(VALUE_IMPORT)].map((m) => m[1] ?? m[2]);
  assert.deepStrictEqual(found, ["mathjs/lib/browser/math.js", "./x.ts", "yaml"]);
});
