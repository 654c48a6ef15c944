/**
 * The source folders depend on each other in one direction only (commands → report → results → sensitivity →
 * scenarios → climate/engine), and no module imports itself back through a chain of imports, types included.
 * A cycle between folders or modules is a defect of structure, not style: it is what makes a change in one layer
 * ripple into another. The rule is the project's own (DEVELOPERS.md, "Layers"); nothing outside to cite.
 */
import * as assert from "node:assert/strict";
import { readdirSync, readFileSync, statSync } from "node:fs";
import { dirname, join, normalize, relative } from "node:path";

const SRC = new URL("../../src/", import.meta.url).pathname;
const SPECIFIER = /(?:from|import)\s*\(?\s*["'](\.{1,2}\/[^"']+)["']/g;

function sourceFiles(folder: string): string[] {
  return readdirSync(folder).flatMap((name) => {
    const path = join(folder, name);
    if (statSync(path).isDirectory()) return sourceFiles(path);
    return name.endsWith(".ts") ? [path] : [];
  });
}

/** Module graph of src/: file (relative to src/) → the src/ files it imports. */
export function importGraph(): Map<string, string[]> {
  const graph = new Map<string, string[]>();
  for (const file of sourceFiles(SRC)) {
    const text = readFileSync(file, "utf8");
    const targets = [...text.matchAll(SPECIFIER)].map((m) =>
      relative(SRC, normalize(join(dirname(file), m[1]!)))
    );
    graph.set(relative(SRC, file), targets.filter((t) => !t.startsWith("..")));
  }
  return graph;
}

/** Strongly connected components with more than one member (or a self-import), by Tarjan's algorithm. */
export function cycles(graph: ReadonlyMap<string, readonly string[]>): string[][] {
  const index = new Map<string, number>();
  const low = new Map<string, number>();
  const stack: string[] = [];
  const onStack = new Set<string>();
  const found: string[][] = [];
  let next = 0;
  const visit = (node: string): void => {
    index.set(node, next);
    low.set(node, next++);
    stack.push(node);
    onStack.add(node);
    for (const to of graph.get(node) ?? []) {
      if (!index.has(to)) {
        visit(to);
        low.set(node, Math.min(low.get(node)!, low.get(to)!));
      } else if (onStack.has(to)) low.set(node, Math.min(low.get(node)!, index.get(to)!));
    }
    if (low.get(node) === index.get(node)) {
      const component: string[] = [];
      let member: string;
      do {
        member = stack.pop()!;
        onStack.delete(member);
        component.push(member);
      } while (member !== node);
      if (component.length > 1 || (graph.get(node) ?? []).includes(node)) found.push(component.sort());
    }
  };
  for (const node of graph.keys()) if (!index.has(node)) visit(node);
  return found;
}

/** Collapses the module graph onto folders: `report/page/html.ts` → `report/page` at `depth` 2. */
function folderGraph(graph: ReadonlyMap<string, readonly string[]>, within: string, depth: number) {
  // A file directly in `within` (src/cli.ts, src/report/package.ts) stands for itself.
  const folderOf = (file: string) => {
    const parts = file.split("/");
    return parts.length <= depth ? file : parts.slice(0, depth).join("/");
  };
  const folders = new Map<string, string[]>();
  for (const [from, targets] of graph) {
    if (!from.startsWith(within)) continue;
    const source = folderOf(from);
    const edges = folders.get(source) ?? [];
    for (const to of targets) {
      const target = folderOf(to);
      if (to.startsWith(within) && target !== source && !edges.includes(target)) edges.push(target);
    }
    folders.set(source, edges);
  }
  return folders;
}

Deno.test("no module of src/ imports itself back through a chain of imports", () => {
  assert.deepStrictEqual(cycles(importGraph()), []);
});

Deno.test("the top-level source folders import one another in one direction only", () => {
  assert.deepStrictEqual(cycles(folderGraph(importGraph(), "", 1)), []);
});

Deno.test("the report's folders import one another in one direction only", () => {
  assert.deepStrictEqual(cycles(folderGraph(importGraph(), "report/", 2)), []);
});

Deno.test("the named layers never import upward: engine, climate, scenarios, results, report, commands", () => {
  const order = ["engine", "climate", "scenarios", "sensitivity", "results", "report", "commands"];
  const folders = folderGraph(importGraph(), "", 1);
  const upward: string[] = [];
  for (const [from, targets] of folders) {
    for (const to of targets) {
      if (order.includes(from) && order.includes(to) && order.indexOf(to) > order.indexOf(from)) {
        upward.push(`${from} → ${to}`);
      }
    }
  }
  assert.deepStrictEqual(upward, []);
});

Deno.test("the cycle finder finds a two-module circle and a self-import, and passes a chain", () => {
  assert.deepStrictEqual(cycles(new Map([["a", ["b"]], ["b", ["a"]]])), [["a", "b"]]);
  assert.deepStrictEqual(cycles(new Map([["a", ["a"]]])), [["a"]]);
  assert.deepStrictEqual(cycles(new Map([["a", ["b"]], ["b", ["c"]], ["c", []]])), []);
});
