/** Test helpers: build a Model from Markdown snippets with the real reader, and pick findings by rule. */

import assert from "node:assert/strict";
import type { Diagnostic } from "../../src/project/diagnostic.ts";
import type { Model } from "../../src/project/model.ts";
import { formatPosition } from "../../src/project/position.ts";
import { resolveProject } from "../../src/project/resolveProject.ts";

const FRONT = `---
title: Review test
reference: T-REV
revision: A
status: draft
prepared-by: Test Preparer
checked-by: Test Checker
date: 2031-01-15
units: SI
---

# Review test
`;

/** Resolves `project.md` plus one `input.md` holding the given Markdown; fails the test on reader errors. */
export function modelOf(markdown: string): Model {
  const resolved = resolveProject([{ path: "project.md", text: FRONT }, {
    path: "input.md",
    text: markdown,
  }]);
  const errors = resolved.diagnostics.filter((d) => d.severity === "error");
  assert.deepStrictEqual(errors.map((d) => d.message), []);
  assert.ok(resolved.model !== undefined);
  return resolved.model;
}

/** A fenced material block. */
export function material(body: string): string {
  return "```material\n" + body.trim() + "\n```\n";
}

/** A fenced construction block with the given layer lines (YAML flow mappings). */
export function construction(id: string, name: string, layers: readonly string[], extra = ""): string {
  const lines = layers.map((l) => `  - ${l}`).join("\n");
  return "```construction\n" + `id: ${id}\nname: ${name}\nlayers:\n${lines}\n${extra}` + "```\n";
}

/** The findings of one rule, as `rule@file:line:col`. */
export function hits(findings: readonly Diagnostic[], rule: string): string[] {
  return findings.filter((f) => f.rule === rule).map((f) => `${f.rule}@${formatPosition(f.at)}`);
}

/** Rules of all findings except default-used notes. */
export function rulesOf(findings: readonly Diagnostic[]): string[] {
  return findings.filter((f) => f.rule !== "default-used").map((f) => f.rule);
}
