/**
 * `build --pdf` prints package.pdf through Debian's Chromium: the paper from the front matter, page numbers and
 * the running header in the margins, an outline from the headings and the contents with page numbers.
 * Needs /usr/bin/chromium and poppler-utils (pdfinfo, pdftotext); skipped without Chromium.
 */
import assert from "node:assert/strict";
import { join } from "node:path";
import { runBuild } from "../src/commands/build.ts";
import { runVerify } from "../src/commands/verify.ts";
import { NO_CHROMIUM_MESSAGE } from "../src/commands/pdf.ts";
import { namedDestinations, pageNumbersFromOutline } from "../src/commands/pdfOutline.ts";

import { copyDir, HAS_CHROMIUM, tool } from "./browserTools.ts";

const DEMO = new URL("../projects/demo/", import.meta.url).pathname;

function capture() {
  const out: string[] = [];
  const err: string[] = [];
  return { io: { stdout: (l: string) => out.push(l), stderr: (l: string) => err.push(l) }, out, err };
}

async function buildPdf(paper: "A4" | "Letter") {
  const dir = await Deno.makeTempDir({ prefix: "fluxnote-pdf-test-" });
  const project = join(dir, "project");
  await copyDir(DEMO, project);
  if (paper === "Letter") {
    const md = await Deno.readTextFile(join(project, "project.md"));
    await Deno.writeTextFile(
      join(project, "project.md"),
      md.replace("\nunits: SI\n", "\nunits: SI\npaper: Letter\n"),
    );
  }
  const out = join(dir, "out");
  const c = capture();
  const code = await runBuild({ project, out, pdf: true }, c.io);
  return { dir, out, code, c };
}

Deno.test({
  name:
    "build --pdf writes an A4 package.pdf with page numbers, running header, outline and numbered contents",
  ignore: !HAS_CHROMIUM,
  async fn() {
    const { dir, out, code, c } = await buildPdf("A4");
    try {
      assert.equal(code, 0, c.err.join("\n"));
      const pdfPath = join(out, "package.pdf");
      const info = await tool("pdfinfo", [pdfPath]);
      // ISO 216: A4 is 210 × 297 mm = 595.28 × 841.89 pt (from memory); Chromium rounds to whole CSS px.
      assert.match(info, /Page size:\s+59[45]\.\d+ x 84[12]\.\d+ pts \(A4\)/);
      const pages = Number(info.match(/Pages:\s+(\d+)/)?.[1]);
      assert.ok(pages >= 10, `${pages} pages`);
      const text = await tool("pdftotext", ["-layout", pdfPath, "-"]);
      const byPage = text.split("\f");
      assert.match(byPage[2] ?? "", new RegExp(`Page 3 of ${pages}`), "page number in the margin");
      // The running header: title | reference rev revision, spaces kept (project.md of the demo).
      assert.ok(byPage[2]?.includes("QBP-2417-TH-01 rev C"), "running header with its spaces");
      const outline = pageNumbersFromOutline(await Deno.readFile(pdfPath));
      assert.ok(outline.length >= 10, `${outline.length} outline entries`);
      assert.ok(outline.some((e) => e.title.startsWith("Appendix A")), "the appendices are in the outline");
      const appendixA = outline.find((e) => e.title.startsWith("Appendix A"));
      // The contents lists Appendix A with the page the outline gives it.
      const contentsLine = text.split("\n").find((l) => /Appendix A Embedded inputs\s*…\s*\d+/.test(l));
      assert.ok(contentsLine !== undefined, "the contents has page numbers");
      assert.equal(Number(contentsLine.match(/(\d+)\s*$/)?.[1]), appendixA?.page);
      // The outline follows the user's headings: a file is titled by its first heading, with no package number.
      const titles = outline.map((e) => e.title);
      assert.ok(
        titles.includes("20. External walls") &&
          titles.includes("20.1 EW-1 — Extension wall, timber frame with wood-fibre sheathing"),
      );
      assert.ok(!titles.some((t) => /^2\.\d+ \S+\.md$/.test(t) || t === "2 Calculation"), titles.join(" | "));
      // Every output block has its contents line with the page its named destination (its element) is on.
      const dests = namedDestinations(await Deno.readFile(pdfPath));
      // The printed contents runs in two columns: pdftotext sets both on one line, so split at wide gaps.
      const lines = text.split("\n").flatMap((l) => l.split(/(?<=…\s*\d+)\s{3,}(?=\S)/));
      for (
        const [label, id] of [
          ["Results of construction EW-1", "c-ew-1"],
          ["Results of construction RF-1", "c-rf-1"],
          ["Results of heating scenario winter-design", "hs-winter-design"],
          ["Cooling load of july-design-day", "sc-july-design-day-fig-cooling-load"],
        ] as const
      ) {
        // The label with its page, at a line's start or after a column gap (the other column's entry may wrap).
        const entry = new RegExp(`(?:^|\\s{3,})${label}\\s*…\\s*(\\d+)(?:\\s{3,}|\\s*$)`);
        const line = lines.find((l) => entry.test(l));
        assert.ok(line !== undefined, `contents line for ${label}`);
        assert.equal(Number(line.match(entry)?.[1]), dests.get(id), label);
      }
      // The archived original stays the HTML: no page number written into it, and verify reproduces it.
      const html = await Deno.readTextFile(join(out, "package.html"));
      assert.ok(!html.includes("page-ref"));
      const v = capture();
      assert.equal(await runVerify(join(out, "package.html"), v.io), 0, v.err.join("\n"));
    } finally {
      await Deno.remove(dir, { recursive: true });
    }
  },
});

Deno.test({
  name: "build --pdf prints on Letter when the front matter says paper: Letter",
  ignore: !HAS_CHROMIUM,
  async fn() {
    const { dir, out, code, c } = await buildPdf("Letter");
    try {
      assert.equal(code, 0, c.err.join("\n"));
      // ANSI Letter is 8.5 × 11 in = 612 × 792 pt (from memory).
      assert.match(
        await tool("pdfinfo", [join(out, "package.pdf")]),
        /Page size:\s+612 x 792 pts \(letter\)/,
      );
    } finally {
      await Deno.remove(dir, { recursive: true });
    }
  },
});

Deno.test("build --pdf without Chromium says how to install it and writes nothing", async () => {
  const dir = await Deno.makeTempDir({ prefix: "fluxnote-pdf-test-" });
  try {
    const out = join(dir, "out");
    const c = capture();
    const code = await runBuild(
      { project: DEMO, out, pdf: true, chromiumPath: join(dir, "no-chromium") },
      c.io,
    );
    assert.equal(code, 1);
    assert.ok(
      c.err.some((l) => l.includes(NO_CHROMIUM_MESSAGE) && l.includes("nothing was written")),
      c.err.join("\n"),
    );
    assert.ok(c.err.some((l) => l.includes("apt-get install chromium")));
    await assert.rejects(Deno.stat(out), Deno.errors.NotFound);
  } finally {
    await Deno.remove(dir, { recursive: true });
  }
});
