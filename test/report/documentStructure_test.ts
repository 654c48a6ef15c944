/**
 * The package follows the user's document structure: each file's section is titled by the file's own first
 * heading (file name in small print), the user's numbers are the only section numbers, the tool states its scope
 * once inside the calculation methods, and the contents lists every output block under its file, in input order.
 * The demo (projects/demo) is the outside reference: its headings are read from its Markdown files here.
 */
import assert from "node:assert/strict";
import { join } from "node:path";
import { runBuild } from "../../src/commands/build.ts";
import { leadingHeading } from "../../src/report/page/markdown.ts";
import { parseDocument } from "./dom.ts";

const DEMO = new URL("../../projects/demo/", import.meta.url).pathname;

interface Built {
  readonly doc: Document;
  readonly page: string;
  readonly results: { sensitivity: { constructions: Record<string, unknown> } };
}

async function build(project: string): Promise<Built> {
  const out = join(await Deno.makeTempDir({ prefix: "fluxnote-structure-" }), "out");
  const err: string[] = [];
  assert.equal(
    await runBuild({ project, out }, { stdout: () => {}, stderr: (l) => err.push(l) }),
    0,
    err.join("\n"),
  );
  const page = Deno.readTextFileSync(join(out, "package.html"));
  const results = JSON.parse(Deno.readTextFileSync(join(out, "results.json")));
  await Deno.remove(join(out, ".."), { recursive: true });
  return { doc: parseDocument(page), page, results };
}

let demo: Promise<Built> | undefined;
const builtDemo = () => demo ??= build(DEMO);

/** Builds a project from file texts (a minimal front matter is added to project.md). */
async function buildFiles(files: Record<string, string>): Promise<Built> {
  const dir = await Deno.makeTempDir({ prefix: "fluxnote-structure-project-" });
  const front =
    "---\ntitle: Structure test\nreference: T-11\nrevision: A\nstatus: draft\nprepared-by: Tester\nchecked-by: Checker\n" +
    "date: 2031-01-15\nunits: SI\n---\n";
  for (const [name, text] of Object.entries(files)) {
    Deno.writeTextFileSync(join(dir, name), name === "project.md" ? front + text : text);
  }
  try {
    return await build(dir);
  } finally {
    await Deno.remove(dir, { recursive: true });
  }
}

const WALL =
  "```construction\nid: W-1\nname: Test wall\nlayers:\n  - { material: concrete-2200, thickness: 200 mm }\n" +
  "  - { material: mineral-wool-25, thickness: 100 mm }\n```\n";

/** The ATX headings of a demo file, in order, as written (the file is the reference). */
function demoHeadings(file: string): { depth: number; text: string }[] {
  const text = Deno.readTextFileSync(join(DEMO, file));
  let fenced = false;
  const out: { depth: number; text: string }[] = [];
  for (const line of text.split("\n")) {
    if (line.startsWith("```")) fenced = !fenced;
    const m = fenced ? null : line.match(/^(#{1,6}) (.*)$/);
    if (m !== null) out.push({ depth: m[1]!.length, text: m[2]!.trim() });
  }
  return out;
}

const DEMO_FILES = [
  "project.md",
  "10-materials.md",
  "20-walls.md",
  "30-roof.md",
  "40-scenarios.md",
  "45-weather-year.md",
  "50-winter.md",
  "60-reading-room.md",
];

const headingText = (h: Element) => (h.textContent ?? "").replace(/\s+/g, " ").trim();

Deno.test("a file's first heading titles its section, with the file name in small print under it", async () => {
  const { doc } = await builtDemo();
  const sections = Array.from(doc.querySelectorAll('#s-2 > section.document[id^="s-2-"]'));
  assert.equal(sections.length, DEMO_FILES.length);
  sections.forEach((section, i) => {
    const file = DEMO_FILES[i]!;
    const first = demoHeadings(file)[0]!;
    const title = section.querySelector("h2");
    assert.equal(headingText(title!), first.text, file);
    assert.equal(section.querySelector("p.file-name")?.textContent, file);
    // The title is printed once: not again as the first heading of the prose.
    const again = Array.from(section.querySelectorAll("h2, h3, h4, h5, h6")).filter((h) =>
      headingText(h) === first.text
    );
    assert.equal(again.length, 1, `${file}: title printed once`);
  });
  // Nothing is titled by the package's own numbering and a file name ("2.3 20-walls.md").
  const all = Array.from(doc.querySelectorAll("h2, h3")).map(headingText);
  assert.ok(!all.some((t) => /^\d+(\.\d+)* \S+\.md$/.test(t)), all.join(" | "));
});

Deno.test("the user's section numbers are the only numbers", async () => {
  const { doc } = await builtDemo();
  // Every heading of the demo files stands as written, in order, with the user's level structure: a file's `#`
  // title is an h2 and its `##` headings are h3.
  const sections = Array.from(doc.querySelectorAll('#s-2 > section.document[id^="s-2-"]'));
  sections.forEach((section, i) => {
    const expected = demoHeadings(DEMO_FILES[i]!).map((h) => `H${h.depth + 1} ${h.text}`);
    const shown = Array.from(section.querySelectorAll("h2[id^='u-'], h3[id^='u-'], h4[id^='u-']")).map((h) =>
      `${h.tagName} ${headingText(h)}`
    );
    assert.deepEqual(shown, expected, DEMO_FILES[i]);
  });
  // The package's own sections carry no number; the appendices stay lettered.
  const own = Array.from(doc.querySelectorAll("main h2, main h3")).filter((h) => h.closest("#s-2") === null)
    .map(headingText);
  assert.ok(
    own.includes("Appendix G Calculation methods") && own.includes("Reproducibility"),
    own.join(" | "),
  );
  for (const title of own) assert.doesNotMatch(title, /^\d+(\.\d+)*\s/, title);
  assert.ok(own.some((t) => /^Appendix A /.test(t)) && own.some((t) => /^C\.1 /.test(t)));
  // Every "section <number>" in the package is one of the user's numbers: the package refers to its own
  // sections by name.
  const userNumbers = new Set(
    DEMO_FILES.flatMap((f) => demoHeadings(f)).flatMap((h) =>
      h.text.match(/^(\d+(?:\.\d+)*)\.?\s/)?.[1] ?? []
    ),
  );
  assert.ok(userNumbers.has("20.1") && userNumbers.has("2"));
  for (const m of (doc.body.textContent ?? "").matchAll(/\bsections? (\d+(?:\.\d+)*)/gi)) {
    assert.ok(userNumbers.has(m[1]!), `"${m[0]}" is no heading of the user's`);
  }
  const contents = Array.from(doc.querySelectorAll("nav.contents a")).map(headingText);
  assert.ok(contents.includes("20. External walls") && contents.includes("Appendix G Calculation methods"));
  assert.ok(!contents.some((t) => /^\d+ (Calculation|Scope)/.test(t)), contents.join(" | "));
});

Deno.test("a file whose headings carry no numbers gets none from the package", async () => {
  const { doc } = await buildFiles({
    "project.md": "# Office refit\n\nIntro.\n\n## Purpose\n\nText.\n",
    "walls.md": "# External walls\n\n## The concrete wall\n\n" + WALL,
    "notes.md": "Notes without a heading first.\n\n# Later heading\n\nMore.\n",
  });
  const sections = Array.from(doc.querySelectorAll('#s-2 > section.document[id^="s-2-"]'));
  const titles = sections.map((s) => headingText(s.querySelector("h2")!));
  // Build order of the reader: project.md first, then by file name.
  assert.deepEqual(titles, ["Office refit", "notes.md", "External walls"]);
  const headings = Array.from(doc.querySelectorAll("#s-2 h2, #s-2 h3")).map((h) =>
    `${h.tagName} ${headingText(h)}`
  );
  assert.deepEqual(headings, [
    "H2 Office refit",
    "H3 Purpose",
    "H2 notes.md",
    // A heading after the file's first text stays where it is; the file is titled by its name.
    "H3 Later heading",
    "H2 External walls",
    "H3 The concrete wall",
  ]);
  assert.equal(sections[1]?.querySelector("p.file-name"), null, "a file-name title has no second file name");
});

Deno.test("the package has one scope section: the user's; the tool's limits are stated once in the methods", async () => {
  const { doc } = await builtDemo();
  const scopes = Array.from(doc.querySelectorAll("h2, h3, h4")).filter((h) => /scope/i.test(headingText(h)));
  assert.deepEqual(scopes.map(headingText), ["2. Scope", "Scope of the calculation"]);
  assert.ok(scopes[1]?.closest("#s-3") !== null, "the tool's scope is part of the calculation methods");
  assert.match(doc.querySelector("#s-3")?.textContent ?? "", /one-dimensional heat conduction through plane/);
  const top = Array.from(doc.querySelectorAll("nav.contents > ol > li > a")).map(headingText);
  assert.ok(!top.some((t) => /scope/i.test(t)), top.join(" | "));
});

Deno.test("the contents lists every construction's results in input order, under its file's title", async () => {
  const { doc } = await builtDemo();
  const items = Array.from(doc.querySelectorAll("nav.contents > ol > li"));
  const under = (title: string) => {
    const item = items.find((li) => headingText(li.querySelector("a")!) === title);
    assert.ok(item !== undefined, title);
    return Array.from(item.querySelector("ol")?.querySelectorAll("a") ?? []).map(headingText);
  };
  // Construction and scenario blocks of the demo files, in the order they are written there.
  assert.deepEqual(under("20. External walls"), [
    "Results of construction EW-1",
    "Results of construction EW-2",
    "Results of construction EW-3",
    "Results of construction EW-4",
  ]);
  assert.deepEqual(under("30. Roof"), ["Results of construction RF-1"]);
  assert.deepEqual(under("40. Summer design day"), [
    "Results of scenario july-design-day",
    "Cooling load of july-design-day",
  ]);
  assert.deepEqual(under("45. Annual heat flows — synthetic weather year (illustration only)"), [
    "Results of scenario weather-year-synthetic",
  ]);
  assert.deepEqual(under("50. Winter design heat loss and surface condensation screening"), [
    "Results of heating scenario winter-design",
  ]);
  assert.deepEqual(under("60. Reading room — cooling load and heat loss").slice(0, 2), [
    "Results of construction GF-1",
    "Results of construction IW-2",
  ]);
  // Every contents link lands on an element of the package.
  for (const a of Array.from(doc.querySelectorAll("nav.contents a"))) {
    const id = a.getAttribute("href")!.slice(1);
    assert.ok(doc.getElementById(id) !== null, `#${id}`);
  }
  // The package's own sections follow the files.
  const top = items.map((li) => headingText(li.querySelector("a")!));
  assert.ok(
    top.indexOf("60. Reading room — cooling load and heat loss") < top.indexOf("Cautions"),
  );
});

Deno.test("the sensitivity study comes out in construction block order, in results.json and the package", async () => {
  const { doc, results } = await builtDemo();
  // Block order of the demo: 20-walls.md EW-1 … EW-4, 30-roof.md RF-1, then 60-reading-room.md GF-1, IW-2.
  const order = ["EW-1", "EW-2", "EW-3", "EW-4", "RF-1", "GF-1", "IW-2"];
  assert.deepEqual(Object.keys(results.sensitivity.constructions), order);
  // The per-construction tables are Appendix F's (the body keeps one ranked table).
  const study = doc.getElementById("s-f")!;
  const shown = Array.from(study.querySelectorAll("h3")).map(headingText).filter((t) =>
    t.startsWith("Construction")
  );
  assert.deepEqual(shown, order.map((id) => `Construction ${id}`));
  const listed = Array.from(doc.querySelectorAll('nav.contents a[href^="#sv-c-"]')).map(headingText);
  assert.deepEqual(listed, order.map((id) => `Construction ${id}`));
});

Deno.test("leadingHeading() takes only a heading that opens the prose", () => {
  assert.deepEqual(leadingHeading("\n\n# 20. *External* walls\n\nText.\n"), {
    heading: "# 20. *External* walls\n",
    depth: 1,
    text: "20. External walls",
    rest: "\nText.\n",
  });
  assert.equal(leadingHeading("Walls\n=====\n\nText.\n")?.text, "Walls");
  assert.equal(leadingHeading("Walls\n=====\n\nText.\n")?.rest, "\nText.\n");
  assert.equal(leadingHeading("## Walls &amp; roofs\nText.\n")?.text, "Walls & roofs");
  assert.equal(leadingHeading("Text first.\n\n# Walls\n"), undefined);
  assert.equal(leadingHeading("- item\n\n# Walls\n"), undefined);
  assert.equal(leadingHeading(""), undefined);
  // CommonMark 0.31 §4.2, §4.3: `#` needs a space after it; `---` under text makes a level-2 heading.
  assert.equal(leadingHeading("#hashtag\n"), undefined);
  assert.equal(leadingHeading("Roof\n---\n")?.depth, 2);
  assert.equal(leadingHeading("   ## Roof ##\n")?.text, "Roof");
});
