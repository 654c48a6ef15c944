/**
 * Property-based fuzzing (fast-check, fixed seeds, bounded runs): mutated projects never make the
 * reader or the build throw, and random text in any free-text place never becomes live markup.
 */
import assert from "node:assert/strict";
import fc from "fast-check";
import { loadProject } from "../../src/commands/loadProject.ts";
import { produceOutputs } from "../../src/commands/produce.ts";
import { formatDiagnostic } from "../../src/project/diagnostic.ts";
import { memoryProjectFs } from "../../src/project/projectFs.ts";
import { hostileProjectFiles, type HostileTexts, yamlQuoted } from "./hostileProject.ts";
import { assertInertPage } from "./inertPage.ts";

/** Longest one fuzz case may take, ms: a build of the small project takes well under a second. */
const CASE_LIMIT_MS = 20_000;

const encoder = new TextEncoder();

function fsOf(files: Record<string, string>) {
  return memoryProjectFs("fuzz", new Map(Object.entries(files).map(([p, t]) => [p, encoder.encode(t)])));
}

/** Loads and, when the inputs are valid, computes and renders; returns the page or undefined. */
async function buildInMemory(
  files: Record<string, string>,
): Promise<{ page?: string; diagnostics: string[] }> {
  const loaded = await loadProject(fsOf(files));
  const diagnostics = loaded.diagnostics.map(formatDiagnostic);
  if (loaded.model === undefined) return { diagnostics };
  const produced = produceOutputs(loaded);
  return produced.ok
    ? { page: produced.outputs.page, diagnostics }
    : { diagnostics: [...diagnostics, ...produced.diagnostics.map(formatDiagnostic)] };
}

// --- mutations of a valid project ----------------------------------------------------------------

const UNITS = [
  "mm",
  "m",
  "cm",
  "in",
  "ft",
  "W/(m K)",
  "BTU/(h ft degF)",
  "kg/m^3",
  "lb/ft^3",
  "J/(kg K)",
  "m^2 K/W",
  "degC",
  "degF",
  "K",
  "degR",
  "deg",
  "rad",
  "h",
  "min",
  "s",
  "m^2",
  "W/(m^2 K)",
  "W/m^2",
  "kg",
  "",
  "мм",
  "ｍｍ",
  "m\u202E",
];

const SPECIAL_VALUES = [
  "~",
  "null",
  "true",
  "[]",
  "{}",
  "[1, 2]",
  "{ a: 1 }",
  ".nan",
  ".inf",
  "-.inf",
  "NaN mm",
  "Infinity m",
  "1e308 m",
  "1e-320 mm",
  "0 mm",
  "-5 mm",
  "1,5 mm",
  "1 000 mm",
  "&a x",
  "*a",
  "!!binary aGk=",
  "!tag x",
  "'unclosed",
  '"unclosed',
  "|",
  ">",
  "- x",
  "? x",
  "@x",
  "`x`",
  "%x",
  "```",
  "---",
  "...",
  "#",
];

/** A replacement for a YAML value: a random string, a number, a quantity with some unit, or a special. */
const valueArb = fc.oneof(
  fc.string({ maxLength: 12 }),
  fc.string({ unit: "binary", maxLength: 6 }),
  fc.double().map(String),
  fc.integer({ min: -1000, max: 1000 }).map(String),
  fc.tuple(fc.double({ min: 1e-3, max: 500, noNaN: true }), fc.constantFrom(...UNITS)).map(([n, u]) =>
    `${Number(n.toPrecision(3))} ${u}`.trim()
  ),
  fc.constantFrom(...SPECIAL_VALUES),
);

const CHARS = [
  ..."{}[]:,-#&*!|>'\"\n\t\r\\%@` ?~0123456789.eE+",
  "\u00a0",
  "\u200b",
  "\u202e",
  "\ufeff",
  "\u0000",
];

type Mutation =
  | {
    readonly kind: "delete-char" | "duplicate-char" | "delete-line" | "duplicate-line";
    readonly at: number;
  }
  | { readonly kind: "insert-char"; readonly at: number; readonly ch: string }
  | { readonly kind: "swap-lines" | "swap-keys"; readonly at: number; readonly other: number }
  | { readonly kind: "replace-value"; readonly at: number; readonly value: string };

const mutationArb: fc.Arbitrary<Mutation> = fc.oneof(
  fc.record({
    kind: fc.constantFrom(
      "delete-char" as const,
      "duplicate-char" as const,
      "delete-line" as const,
      "duplicate-line" as const,
    ),
    at: fc.nat(),
  }),
  fc.record({
    kind: fc.constant("insert-char" as const),
    at: fc.nat(),
    ch: fc.oneof(fc.constantFrom(...CHARS), fc.string({ unit: "binary", minLength: 1, maxLength: 1 })),
  }),
  fc.record({
    kind: fc.constantFrom("swap-lines" as const, "swap-keys" as const),
    at: fc.nat(),
    other: fc.nat(),
  }),
  fc.record({ kind: fc.constant("replace-value" as const), at: fc.nat(), value: valueArb }),
  // Values are where most mistakes are made: weigh them up.
  fc.record({ kind: fc.constant("replace-value" as const), at: fc.nat(), value: valueArb }),
);

/** Applies one mutation to a text; positions are taken modulo what exists. */
function mutate(text: string, m: Mutation): string {
  const lines = text.split("\n");
  switch (m.kind) {
    case "delete-char": {
      const i = m.at % Math.max(1, text.length);
      return text.slice(0, i) + text.slice(i + 1);
    }
    case "duplicate-char": {
      const i = m.at % Math.max(1, text.length);
      return text.slice(0, i + 1) + text.slice(i);
    }
    case "insert-char": {
      const i = m.at % (text.length + 1);
      return text.slice(0, i) + m.ch + text.slice(i);
    }
    case "delete-line":
      lines.splice(m.at % lines.length, 1);
      return lines.join("\n");
    case "duplicate-line": {
      const i = m.at % lines.length;
      lines.splice(i, 0, lines[i] ?? "");
      return lines.join("\n");
    }
    case "swap-lines": {
      const i = m.at % lines.length;
      const j = m.other % lines.length;
      [lines[i], lines[j]] = [lines[j] ?? "", lines[i] ?? ""];
      return lines.join("\n");
    }
    case "swap-keys": {
      const keys = [...text.matchAll(/([a-z][a-z-]*):/g)];
      if (keys.length < 2) return text;
      const a = keys[m.at % keys.length];
      const b = keys[m.other % keys.length];
      if (a === undefined || b === undefined || a.index === b.index) return text;
      const [first, second] = (a.index ?? 0) < (b.index ?? 0) ? [a, b] : [b, a];
      const f = first[1] ?? "";
      const s = second[1] ?? "";
      const fi = first.index ?? 0;
      const si = second.index ?? 0;
      return text.slice(0, fi) + s + text.slice(fi + f.length, si) + f + text.slice(si + s.length);
    }
    case "replace-value": {
      const values = [...text.matchAll(/: ([^,{}[\]\n]+)/g)];
      const v = values[m.at % Math.max(1, values.length)];
      if (v === undefined) return text;
      const start = (v.index ?? 0) + 2;
      return text.slice(0, start) + m.value + text.slice(start + (v[1] ?? "").length);
    }
  }
}

const BASE = hostileProjectFiles({ prose: "See [the brief](https://example.org/brief) and `code`." });
const BASE_NAMES = Object.keys(BASE).sort();

Deno.test("the fuzz base project builds (so mutations start from a valid project)", async () => {
  const built = await buildInMemory(BASE);
  assert.ok(built.page !== undefined, built.diagnostics.join("\n"));
});

Deno.test("fuzz: mutated projects never make loadProject() or produceOutputs() throw", async () => {
  let built = 0;
  let stopped = 0;
  let slowest = 0;
  await fc.assert(
    fc.asyncProperty(
      fc.constantFrom(...BASE_NAMES),
      fc.array(mutationArb, { minLength: 1, maxLength: 4 }),
      async (file, mutations) => {
        const files = { ...BASE, [file]: mutations.reduce(mutate, BASE[file] ?? "") };
        const started = performance.now();
        const result = await buildInMemory(files); // an exception fails the property
        const ms = performance.now() - started;
        slowest = Math.max(slowest, ms);
        assert.ok(ms < CASE_LIMIT_MS, `one case took ${Math.round(ms)} ms`);
        if (result.page !== undefined) built++;
        else stopped++;
        for (const d of result.diagnostics) {
          assert.match(
            d,
            /^[^\s:][^:]*:\d+:\d+: (error|warning|note): /,
            `not a positioned diagnostic: ${d}`,
          );
        }
        if (result.page === undefined) {
          assert.ok(result.diagnostics.some((d) => / error: /.test(d)), "stopped without an error");
        }
      },
    ),
    { seed: 20310115, numRuns: 1000, endOnFailure: true },
  );
  // Both outcomes must occur, or the property tested less than it claims.
  assert.ok(built >= 50, `only ${built} mutated projects built`);
  assert.ok(stopped >= 200, `only ${stopped} mutated projects were stopped`);
  console.log(`mutations: ${built} built, ${stopped} stopped, slowest ${Math.round(slowest)} ms`);
});

// --- random text never becomes live markup -------------------------------------------------------

const FRAGMENTS = [
  "<script>",
  "</script>",
  "<img src=x onerror=alert(1)>",
  "<svg onload=alert(1)>",
  "<a href=javascript:alert(1)>",
  "javascript:",
  "vbscript:",
  "data:text/html,",
  "&#106;",
  "&#x3C;",
  "&lt;",
  "&colon;",
  '"',
  "'",
  "<",
  ">",
  "`",
  "</style>",
  "</pre>",
  "</textarea>",
  "</title>",
  "<!--",
  "-->",
  "url(",
  "expression(",
  "@import ",
  "[x](",
  "](javascript:alert(1))",
  "![",
  "<http://",
  "[r]: ",
  "\n\n",
  "\n",
  "# ",
  "- ",
  "> ",
  "    ",
  "```",
  "|",
  "\u202e",
  "\u0007",
  "\u001b[2J",
  "\u0085",
  "\u2028",
  "\ufeff",
  "\u200b",
];

const hostileText = fc.array(
  fc.oneof(
    { weight: 3, arbitrary: fc.constantFrom(...FRAGMENTS) },
    { weight: 1, arbitrary: fc.string({ maxLength: 8 }) },
    { weight: 1, arbitrary: fc.string({ unit: "binary", maxLength: 4 }) },
  ),
  { minLength: 1, maxLength: 12 },
).map((parts) => parts.join(""));

/** Prose may not hold NUL (the file would be refused as binary) — that case has its own corpus entry. */
const proseText = hostileText.map((t) => t.replaceAll("\u0000", ""));

/**
 * YAML text may not hold control characters (the reader refuses them: hostile/yaml-tags-and-escapes and
 * hostile/control-chars), so the fields that are YAML values drop them to keep most projects building.
 */
// deno-lint-ignore no-control-regex
const yamlText = hostileText.map((t) => t.replace(/[\u0000-\u0008\u000B-\u001F\u007F-\u009F]/g, ""));

Deno.test("fuzz: random text in prose, front matter, names and sources never becomes live markup", async () => {
  let built = 0;
  let runs = 0;
  await fc.assert(
    fc.asyncProperty(
      fc.record({
        prose: proseText,
        frontMatter: yamlText,
        material: yamlText,
        construction: yamlText,
      }),
      async (texts: HostileTexts) => {
        runs++;
        const result = await buildInMemory(hostileProjectFiles(texts));
        if (result.page === undefined) return;
        built++;
        assertInertPage(result.page, JSON.stringify(texts));
      },
    ),
    { seed: 7842, numRuns: 150, endOnFailure: true },
  );
  assert.ok(built >= runs / 2, `only ${built} of ${runs} hostile projects built, so few pages were checked`);
});

Deno.test("fuzz: random text as an id never throws and is never echoed with invisible characters", async () => {
  let refused = 0;
  await fc.assert(
    fc.asyncProperty(hostileText, async (id) => {
      const files = hostileProjectFiles({});
      files["walls.md"] = (files["walls.md"] ?? "").replace("id: EW-1", `id: ${yamlQuoted(id)}`);
      const loaded = await loadProject(fsOf(files));
      const printed = loaded.diagnostics.map(formatDiagnostic).join("\n");
      if (loaded.model === undefined) refused++;
      // deno-lint-ignore no-control-regex
      assert.doesNotMatch(printed, /[\u0000-\u0008\u000b-\u001f\u007f\u202a-\u202e\u2066-\u2069]/);
    }),
    { seed: 424242, numRuns: 300, endOnFailure: true },
  );
  assert.ok(refused >= 250, `only ${refused} hostile ids were refused`);
});
