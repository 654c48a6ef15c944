/**
 * Our unit reader (src/project/unitTable.ts, unitExpression.ts) against mathjs 15.2.0, the library that read
 * units before it (reference library; imported here only). The table must be mathjs's own for every unit built
 * from mass, length, time, temperature and angle, and every unit text found in the fixtures, templates,
 * projects and README, plus prefix, power and product combinations generated for each kind, must give the same
 * SI value (to 1e-12 relative) and the same accept/reject as the mathjs-based parseQuantity did.
 */
import * as assert from "node:assert/strict";
import { readdirSync, readFileSync, statSync } from "node:fs";
import { join } from "node:path";
import { Unit, unit } from "mathjs";
import { mathjsParseQuantity } from "./mathjsQuantity.ts";
import { parseQuantity, QUANTITY_KINDS, type QuantityKind } from "../../src/project/quantity.ts";
import { findUnit } from "../../src/project/unitExpression.ts";
import { prefixesOf, UNITS } from "../../src/project/unitTable.ts";

const ROOT = new URL("../../", import.meta.url).pathname;
const KINDS = Object.keys(QUANTITY_KINDS) as QuantityKind[];
/** mathjs's dimension order: mass, length, time, current, temperature, luminous intensity, amount, angle, bit. */
const OURS = [0, 1, 2, 4, 7];

interface MathjsUnitDef {
  readonly name: string;
  readonly value: unknown;
  readonly offset: number;
  readonly dimensions: readonly number[];
  readonly prefixes: Readonly<Record<string, { readonly value: number }>>;
}
// deno-lint-ignore no-explicit-any
const MATHJS_UNITS = (Unit as any).UNITS as Record<string, MathjsUnitDef>;

/** `.` between two units is ours only: mathjs reads the same text with `*`. */
const forMathjs = (text: string): string => text.replace(/(?<=[A-Za-z0-9])\.(?=[A-Za-z])/g, "*");

/** Compares one text for one kind; returns a description of the disagreement, or undefined. */
function disagreement(text: string, kind: QuantityKind): string | undefined {
  const ours = parseQuantity(text, kind);
  const theirs = mathjsParseQuantity(forMathjs(text), kind);
  if (!ours.ok && !theirs.ok) {
    // The diagnostics before the unit is read (characters, number, missing unit) and the wrong-dimension one
    // are unchanged; only mathjs's own messages for a unit it could not read are replaced.
    if (theirs.message.startsWith("Cannot read the unit") && !theirs.message.includes("plain ASCII")) {
      return undefined;
    }
    const same = ours.message === theirs.message.replace(forMathjs(text), text) && ours.hint === theirs.hint;
    return same ? undefined : `${text} as ${kind}: "${ours.message}" vs mathjs's "${theirs.message}"`;
  }
  if (ours.ok && theirs.ok) {
    const close = Math.abs(ours.value - theirs.value) <= 1e-12 * Math.abs(theirs.value);
    return close ? undefined : `${text} as ${kind}: ${ours.value} vs mathjs ${theirs.value}`;
  }
  // Deliberate differences: an absolute temperature in a compound unit (mathjs dropped the scale's zero there)
  // and celsius or fahrenheit as a difference (mathjs added the zero: 11 celsius = 284.15 K).
  if (
    !ours.ok && /a temperature is written with one unit|is a temperature, not a difference/.test(ours.message)
  ) {
    return undefined;
  }
  return `${text} as ${kind}: ours ${ours.ok ? `accepts (${ours.value})` : `rejects (${ours.message})`}, ` +
    `mathjs ${theirs.ok ? `accepts (${theirs.value})` : "rejects"}`;
}

/** A mathjs unit of a dimension no quantity here has (electric, luminous, amount, information). */
const isOther = (dimensions: readonly number[]): boolean =>
  dimensions.some((d, i) => d !== 0 && !OURS.includes(i));

Deno.test("the unit table holds every mathjs unit in mathjs's order, with its factor, dimension, prefixes and zero", () => {
  // VAR (reactive power) has a complex factor in mathjs and is no heat quantity: left out.
  const expected = Object.values(MATHJS_UNITS).filter((u) => u.name !== "VAR");
  assert.deepStrictEqual(UNITS.map((u) => u.name), expected.map((u) => u.name));
  for (const theirs of expected) {
    const ours = UNITS.find((u) => u.name === theirs.name)!;
    assert.strictEqual(ours.factor, Number(theirs.value), theirs.name);
    if (isOther(theirs.dimensions)) assert.ok(ours.dimension.every(Number.isNaN), theirs.name);
    else assert.deepStrictEqual([...ours.dimension], OURS.map((i) => theirs.dimensions[i]), theirs.name);
    const theirPrefixes = Object.entries(theirs.prefixes).map(([p, v]) => [p, v.value]).sort();
    assert.deepStrictEqual([...prefixesOf(ours)].sort(), theirPrefixes, theirs.name);
    const zero = ours.offset === undefined ? 0 : ours.offset[0] / ours.offset[1];
    assert.ok(Math.abs(zero - Number(theirs.value) * theirs.offset) < 1e-12, `${theirs.name} zero`);
  }
});

Deno.test("every prefixed unit name reads to mathjs's unit, factor and dimension", () => {
  let count = 0;
  for (const entry of UNITS) {
    for (const [prefix] of prefixesOf(entry)) {
      const name = prefix + entry.name;
      const ours = findUnit(name);
      // deno-lint-ignore no-explicit-any
      const theirs = unit(`1 ${name}`) as any;
      const theirUnit = theirs.units[0];
      assert.ok(ours !== undefined, name);
      assert.strictEqual(
        ours.entry.factor * ours.prefixFactor,
        Number(theirUnit.unit.value) * theirUnit.prefix.value,
      );
      if (!isOther(theirs.dimensions)) {
        assert.deepStrictEqual([...ours.entry.dimension], OURS.map((i) => theirs.dimensions[i]), name);
      }
      count++;
    }
  }
  assert.ok(count > 1500, `${count} names`);
});

function markdownFiles(folder: string): string[] {
  return readdirSync(folder).flatMap((name) => {
    const path = join(folder, name);
    if (statSync(path).isDirectory()) return markdownFiles(path);
    return name.endsWith(".md") ? [path] : [];
  });
}

/** Every `<number> <unit>` text in the fixtures, templates, projects and README (prose included). */
function foundTexts(): string[] {
  const files = [
    ...markdownFiles(join(ROOT, "test/fixtures")),
    ...markdownFiles(join(ROOT, "templates")),
    ...markdownFiles(join(ROOT, "projects")),
    join(ROOT, "README.md"),
  ];
  const quantity =
    /(?<![\w.])([+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?)[ \t]*([A-Za-z(/*][A-Za-z0-9^/()*. \t-]*?)[ \t]*(?=$|[,;}\]#"'`|])/gm;
  const texts = new Set<string>();
  for (const file of files) {
    for (const m of readFileSync(file, "utf8").matchAll(quantity)) texts.add(`${m[1]} ${m[2]}`);
  }
  return [...texts];
}

Deno.test("every unit text in the fixtures, templates, projects and README reads as mathjs read it, for every kind", () => {
  const texts = foundTexts();
  const problems: string[] = [];
  let accepted = 0;
  for (const text of texts) {
    for (const kind of KINDS) {
      const problem = disagreement(text, kind);
      if (problem !== undefined) problems.push(problem);
      if (parseQuantity(text, kind).ok) accepted++;
    }
  }
  assert.deepStrictEqual(problems, []);
  assert.ok(texts.length > 300 && accepted > 150, `${texts.length} texts, ${accepted} accepted`);
});

/** Units of one dimension, each bare and with a few of its prefixes. */
function spellings(dimension: readonly number[]): string[] {
  const out: string[] = [];
  for (const entry of UNITS) {
    if (entry.dimension.some((d, i) => d !== dimension[i])) continue;
    const prefixes = prefixesOf(entry);
    for (const p of ["", "k", "m", "c", "M", "u", "da", "kilo", "milli", "MM"]) {
      if (prefixes.has(p)) out.push(p + entry.name);
    }
  }
  return out;
}

const SPELLINGS = {
  L: spellings([0, 1, 0, 0, 0]),
  A: spellings([0, 2, 0, 0, 0]),
  V: spellings([0, 3, 0, 0, 0]),
  M: spellings([1, 0, 0, 0, 0]),
  T: spellings([0, 0, 1, 0, 0]),
  K: spellings([0, 0, 0, 1, 0]).filter((s) => !/deg[CF]|celsius|fahrenheit/.test(s)),
  Q: spellings([0, 0, 0, 1, 0]),
  D: spellings([0, 0, 0, 0, 1]),
  E: spellings([1, 2, -2, 0, 0]),
  P: spellings([1, 2, -3, 0, 0]),
  N: spellings([1, 1, -2, 0, 0]),
  Pa: spellings([1, -1, -2, 0, 0]),
} as const;
type Slot = keyof typeof SPELLINGS;
const DEFAULTS: Record<Slot, string> = {
  L: "m",
  A: "m2",
  V: "m3",
  M: "kg",
  T: "s",
  K: "K",
  Q: "K",
  D: "rad",
  E: "J",
  P: "W",
  N: "N",
  Pa: "Pa",
};

/** Forms written for each kind; {X} is a unit of that dimension. Both `.` and `*` and brackets and powers. */
const FORMS: Record<QuantityKind, readonly string[]> = {
  length: ["{L}", "{L}^1", "{A}/{L}", "{V}/{A}"],
  conductivity: [
    "{P}/({L} {K})",
    "{P}/{L}/{K}",
    "{E}/({T} {L} {K})",
    "{P} {L}^-1 {K}^-1",
    "{P}/({L}.{K})",
    "{P}/({L}*{K})",
    "{N}/({T}.{K})",
  ],
  density: ["{M}/{L}^3", "{M}/{V}", "{M} {L}^-3", "{M}/({L}^2 {L})", "{Pa} {T}^2/{L}^2"],
  specificHeat: ["{E}/({M} {K})", "{E}/{M}/{K}", "{E} {M}^-1 {K}^-1", "{E}/({M}.{K})", "{L}^2/({T}^2 {K})"],
  resistance: [
    "{L}^2 {K}/{P}",
    "{A} {K}/{P}",
    "{T} {L}^2 {K}/{E}",
    "{L}^2.{K}/{P}",
    "{A}*{K}/{P}",
    "{T} {A} {K}/{E}",
  ],
  temperature: ["{Q}"],
  temperatureDifference: ["{K}"],
  angle: ["{D}"],
  time: ["{T}", "{E}/{P}", "{T}^2/{T}"],
  area: ["{L}^2", "{L} {L}", "{L}*{L}", "{L}.{L}", "{A}", "{V}/{L}", "{L}^2.0"],
  coefficient: [
    "{P}/({L}^2 {K})",
    "{P}/({A} {K})",
    "{E}/({T} {L}^2 {K})",
    "{P} {A}^-1 {K}^-1",
    "{P}/{A}/{K}",
  ],
  irradiance: ["{P}/{L}^2", "{P}/{A}", "{E}/({T} {A})", "{E}/{T}/{L}^2", "{N}/({T} {L})"],
};
const NUMBERS = ["1", "0.13", "2.5e3", "-40", "91.4", "1e-3"];

/** Each form with one slot at a time run through all its spellings, the others at the SI unit. */
function generated(kind: QuantityKind): string[] {
  const out = new Set<string>();
  let n = 0;
  for (const form of FORMS[kind]) {
    const slots = [...form.matchAll(/\{(\w+)\}/g)].map((m) => m[1] as Slot);
    slots.forEach((varied, position) => {
      for (const spelling of SPELLINGS[varied]) {
        let slot = 0;
        const unitText = form.replace(
          /\{(\w+)\}/g,
          (_, s: Slot) => slot++ === position ? spelling : DEFAULTS[s],
        );
        out.add(`${NUMBERS[n++ % NUMBERS.length]} ${unitText}`);
      }
    });
  }
  return [...out];
}

Deno.test("generated prefix, power and product forms read as mathjs read them, for their kind and for a wrong one", () => {
  const problems: string[] = [];
  let total = 0;
  for (const [k, kind] of KINDS.entries()) {
    const wrong = KINDS[(k + 1) % KINDS.length]!;
    for (const text of generated(kind)) {
      total++;
      const own = disagreement(text, kind);
      if (own !== undefined) problems.push(own);
      const other = disagreement(text, wrong);
      if (other !== undefined) problems.push(other);
      if (!parseQuantity(text, kind).ok) problems.push(`${text} as ${kind}: rejected`);
    }
  }
  assert.deepStrictEqual(problems, []);
  assert.ok(total > 1000, `${total} texts`);
});

Deno.test("malformed unit texts are refused as mathjs refused them", () => {
  const texts = [
    "1 W/(m K",
    "1 W/m K)",
    "1 (m K)^2",
    "1 m**2",
    "1 m^",
    "1 m^x",
    "1 W//m",
    "1 W/",
    "1 W*",
    "1 m.",
    "1 .m",
    "1 m..K",
    "1 m. K",
    "1 2 m",
    "1 m^(2)",
    "1 ()",
    "1 kgK",
    "1 millimetres",
    "1 Btu",
    "1 W/mK",
    "1 e3",
  ];
  for (const text of texts) {
    for (const kind of KINDS) assert.strictEqual(disagreement(text, kind), undefined, text);
  }
});
