import assert from "node:assert/strict";
import { join } from "node:path";
import { runBuild } from "../../src/commands/build.ts";
import { runVerify } from "../../src/commands/verify.ts";
import { encodeBase64 } from "../../src/archive/base64.ts";
import { sha256Hex } from "../../src/archive/hash.ts";
import { escapeHtml } from "../../src/report/page/html.ts";
import { PACKAGE_SIZE_LIMIT } from "../../src/commands/readBounded.ts";
import { heavyWallFiles } from "../../scripts/heavy-walls.ts";

const MINIMAL = new URL("../fixtures/good/minimal/", import.meta.url).pathname;

function capture() {
  const lines: string[] = [];
  return { lines, io: { stdout: (l: string) => lines.push(l), stderr: (l: string) => lines.push(l) } };
}

async function freshPackage(): Promise<{ path: string; text: string }> {
  const out = join(await Deno.makeTempDir(), "out");
  assert.equal(await runBuild({ project: MINIMAL, out }, capture().io), 0);
  const path = join(out, "package.html");
  return { path, text: Deno.readTextFileSync(path) };
}

async function verifyText(text: string): Promise<{ code: number; lines: string[] }> {
  const path = join(await Deno.makeTempDir(), "package.html");
  Deno.writeTextFileSync(path, text);
  const { lines, io } = capture();
  return { code: await runVerify(path, io), lines };
}

Deno.test("runVerify() reproduces a fresh package byte for byte", async () => {
  const { path } = await freshPackage();
  const { lines, io } = capture();
  assert.equal(await runVerify(path, io), 0);
  assert.ok(lines.some((l) => l.startsWith("REPRODUCED")));
});

Deno.test("runVerify() catches an edited number in a visible table", async () => {
  const { text } = await freshPackage();
  // The U-value cell of the minimal wall: U = 1/3.39026 = 0.294963 W/(m²K) (ISO 6946 sum, see build_test.ts).
  assert.ok(text.includes(">0.295<"));
  const result = await verifyText(text.replace(">0.295<", ">0.259<"));
  assert.equal(result.code, 1);
  assert.ok(result.lines.some((l) => l.includes("package text differs")));
});

Deno.test("runVerify() catches an edited number in the embedded results", async () => {
  const { text } = await freshPackage();
  // Text in the package is HTML-escaped, so the JSON quotes appear as &quot;.
  const edited = text.replace(/&quot;U&quot;: 0\.29496/, "&quot;U&quot;: 0.29596");
  assert.notEqual(edited, text);
  const result = await verifyText(edited);
  assert.equal(result.code, 1);
  assert.ok(result.lines.some((l) => l.includes("results differ")));
});

Deno.test("runVerify() catches an edited embedded input, with or without a matching hash", async () => {
  const { text } = await freshPackage();
  const original = Deno.readFileSync(join(MINIMAL, "walls.md"));
  const changed = new TextEncoder().encode(new TextDecoder().decode(original).replace("100 mm", "150 mm"));
  const edited = text.replace(encodeBase64(original), encodeBase64(changed));
  assert.notEqual(edited, text);
  const result = await verifyText(edited);
  assert.equal(result.code, 1);
  assert.ok(result.lines.some((l) => l.includes("do not match the SHA-256")));
  // A forger who also rewrites the hash beside the input is caught by the input records in the results.
  const forged = edited.replace(sha256Hex(original), sha256Hex(changed));
  const second = await verifyText(forged);
  assert.equal(second.code, 1);
  assert.ok(second.lines.some((l) => l.includes("the embedded inputs hash to")));
});

Deno.test("runVerify() answers 2 for a file that is not a package", async () => {
  const result = await verifyText("<!doctype html><title>not ours</title>");
  assert.equal(result.code, 2);
});

Deno.test("runVerify() takes the version from the embedded results, not from the generator mark", async () => {
  const { text } = await freshPackage();
  // Another version in both the mark and the embedded results: the results are compared within 1e-9, but the
  // page cannot be re-rendered in that version's layout, so it is not proven and nothing is REPRODUCED.
  const older = text.replace(/content="fluxnote [^"]+"/, 'content="fluxnote 0.0.9"')
    .replace(/&quot;version&quot;: &quot;[^&]+&quot;/, "&quot;version&quot;: &quot;0.0.9&quot;");
  assert.notEqual(older, text);
  const same = await verifyText(older);
  assert.equal(same.code, 1);
  assert.ok(same.lines.some((l) => l.includes("agrees within 1e-9")));
  assert.ok(same.lines.some((l) => l.includes("page text not verifiable with this version")));
  assert.ok(!same.lines.some((l) => l.startsWith("REPRODUCED")));
  const drifted = await verifyText(
    older.replace(/&quot;U&quot;: 0\.2949626508/, "&quot;U&quot;: 0.2949626518"),
  );
  assert.equal(drifted.code, 1);
  assert.ok(drifted.lines.some((l) => l.includes("/constructions/EW-1/U:") && l.includes("fluxnote 0.0.9")));
});

Deno.test("runVerify() flags a generator mark that disagrees with the embedded results", async () => {
  const { text } = await freshPackage();
  const result = await verifyText(text.replace(/content="fluxnote [^"]+"/, 'content="fluxnote 0.0.9"'));
  assert.equal(result.code, 1);
  assert.ok(result.lines.some((l) => l.includes('generator mark says "fluxnote 0.0.9"')));
});

/** The minimal project with a U-value limit, so its package shows a MET verdict. */
async function packageWithLimit(): Promise<string> {
  const project = await Deno.makeTempDir();
  Deno.copyFileSync(join(MINIMAL, "project.md"), join(project, "project.md"));
  const walls = Deno.readTextFileSync(join(MINIMAL, "walls.md")).replace(
    "layers:",
    'limits:\n  max-u: { value: "0.30 W/(m^2 K)", clause: "Invented test brief, cl. 1" }\nlayers:',
  );
  Deno.writeTextFileSync(join(project, "walls.md"), walls);
  const out = join(project, "out");
  assert.equal(await runBuild({ project, out }, capture().io), 0);
  return Deno.readTextFileSync(join(out, "package.html"));
}

Deno.test("runVerify() catches an edited U-value and verdict even when the generator mark is retouched", async () => {
  const text = await packageWithLimit();
  // U = 0.295 W/(m²K) (ISO 6946 sum, see build_test.ts) meets the invented limit 0.30.
  assert.ok(text.includes(">0.295<") && text.includes('<td class="result">MET</td>'));
  const forged = text.replaceAll(">0.295<", ">0.395<")
    .replace('<td class="result">MET</td>', '<td class="result">NOT MET</td>')
    .replace(/content="fluxnote ([^"]+)"/, 'content="fluxnote $1 "');
  const result = await verifyText(forged);
  assert.equal(result.code, 1);
  assert.ok(result.lines.some((l) => l.includes("package text differs")));
  assert.ok(result.lines.some((l) => l.startsWith("NOT REPRODUCED")));
});

/** Replaces the embedded results JSON by `json`, escaped as the package writes it. */
function withResults(text: string, json: string): string {
  const edited = text.replace(
    /(<pre data-embedded="results-json">\n)[\s\S]*?(<\/pre>)/,
    (_m, open: string, close: string) => `${open}${escapeHtml(json)}${close}`,
  );
  assert.notEqual(edited, text);
  return edited;
}

Deno.test("runVerify() refuses malformed embedded results with exit 2 and one clear line", async () => {
  const { text } = await freshPackage();
  const good = JSON.parse(
    /<pre data-embedded="results-json">\n([\s\S]*?)<\/pre>/.exec(text)![1]!.replaceAll("&quot;", '"'),
  );
  const variants: readonly [string, string][] = [
    ["null", "the document must be an object, found null"],
    ["[]", "the document must be an object, found an array"],
    ["{", "not valid JSON"],
    [JSON.stringify({ ...good, tool: { name: "fluxnote", version: 1 } }), "/tool/version must be"],
    [JSON.stringify({ ...good, tool: null }), "/tool must be an object, found null"],
    [JSON.stringify({ ...good, inputs: { ...good.inputs, files: "all" } }), "/inputs/files must be an array"],
    [JSON.stringify({ ...good, inputs: { ...good.inputs, files: [{ path: 7 }] } }), "/inputs/files/0/path"],
    [JSON.stringify({ ...good, inputs: { ...good.inputs, sha256: [] } }), "/inputs/sha256 must be"],
  ];
  for (const [json, expected] of variants) {
    const result = await verifyText(withResults(text, json));
    assert.equal(result.code, 2, json.slice(0, 40));
    assert.equal(result.lines.length, 1, result.lines.join("\n"));
    assert.ok(result.lines[0]!.includes("malformed embedded results") && result.lines[0]!.includes(expected));
  }
});

Deno.test("runVerify() refuses a malformed embedded library entry with exit 2, even with a matching hash", async () => {
  const { text } = await freshPackage();
  const entry =
    /<pre class="embedded-library" data-id="concrete-2200" data-sha256="([0-9a-f]{64})">([^<]*)<\/pre>/
      .exec(text)!;
  for (const json of ["null", '{"id":"concrete-2200","name":"x","materialClass":"x","source":"x"}']) {
    const forged = text.replace(
      entry[0],
      `<pre class="embedded-library" data-id="concrete-2200" data-sha256="${sha256Hex(json)}">${
        escapeHtml(json)
      }</pre>`,
    );
    const result = await verifyText(forged);
    assert.equal(result.code, 2);
    assert.equal(result.lines.length, 1, result.lines.join("\n"));
    assert.ok(result.lines[0]!.includes('malformed embedded library entry "concrete-2200"'));
  }
});

async function verifyPath(path: string): Promise<{ code: number; lines: string[]; ms: number }> {
  const { lines, io } = capture();
  const started = performance.now();
  const code = await runVerify(path, io);
  return { code, lines, ms: performance.now() - started };
}

Deno.test("runVerify() refuses a file over the size limit before reading it", async () => {
  const path = join(await Deno.makeTempDir(), "huge.html");
  // A sparse file: its size is one byte over the limit, but no data is written to disk.
  Deno.writeTextFileSync(path, "");
  Deno.truncateSync(path, PACKAGE_SIZE_LIMIT + 1);
  const result = await verifyPath(path);
  assert.equal(result.code, 2);
  assert.equal(result.lines.length, 1);
  assert.ok(result.lines[0]!.includes("larger than the limit of 209715200 bytes (200 MiB)"));
  assert.ok(result.ms < 2000, `took ${result.ms} ms`); // common practice, no source: "at once"
});

Deno.test({
  name: "runVerify() refuses /dev/zero at once instead of reading it forever",
  ignore: Deno.build.os === "windows",
  fn: async () => {
    const result = await verifyPath("/dev/zero");
    assert.equal(result.code, 2);
    assert.ok(result.lines[0]!.includes("character device, not a regular file"));
    assert.ok(result.ms < 2000, `took ${result.ms} ms`); // common practice, no source
  },
});

const canMkfifo = Deno.build.os !== "windows" &&
  Deno.permissions.querySync({ name: "run", command: "mkfifo" }).state === "granted";

Deno.test({
  name: "runVerify() refuses a named pipe at once instead of waiting for a writer",
  // Needs --allow-run=mkfifo to make the pipe (`deno task test` grants it)
  // (the same refusal is exercised by /dev/zero above).
  ignore: !canMkfifo,
  fn: async () => {
    const path = join(await Deno.makeTempDir(), "pipe.html");
    const made = await new Deno.Command("mkfifo", { args: [path] }).output();
    assert.ok(made.success);
    const result = await verifyPath(path);
    assert.equal(result.code, 2);
    assert.ok(result.lines[0]!.includes("named pipe (FIFO), not a regular file"));
  },
});

Deno.test("runVerify() refuses a folder with exit 2", async () => {
  const result = await verifyPath(await Deno.makeTempDir());
  assert.equal(result.code, 2);
  assert.ok(result.lines[0]!.includes("a folder, not a regular file"));
});

Deno.test("runVerify() compares an older package that embedded every response-factor term with a re-run", async () => {
  // Packages before the modal-form copy embedded results.json whole; the cut tails are exact expansions of the
  // modal form, so both sides compare in the copy's form and agree within 1e-9.
  const project = await Deno.makeTempDir();
  for (const [path, bytes] of heavyWallFiles(1)) Deno.writeFileSync(join(project, path), bytes);
  const out = join(await Deno.makeTempDir(), "out");
  assert.equal(await runBuild({ project, out }, capture().io), 0);
  const text = Deno.readTextFileSync(join(out, "package.html"));
  const full = Deno.readTextFileSync(join(out, "results.json"));
  const embedded = /<pre data-embedded="results-json">([^<]*)<\/pre>/.exec(text);
  assert.ok(
    embedded !== null && embedded[1]!.includes("&quot;leading&quot;"),
    "the copy cuts the long series",
  );
  const older = text.replace(embedded[0], `<pre data-embedded="results-json">\n${escapeHtml(full)}</pre>`)
    .replace(/content="fluxnote [^"]+"/, 'content="fluxnote 0.0.9"')
    .replaceAll(/&quot;version&quot;: &quot;[^&]+&quot;/g, "&quot;version&quot;: &quot;0.0.9&quot;");
  const result = await verifyText(older);
  assert.ok(result.lines.some((l) => l.includes("agrees within 1e-9")), result.lines.join("\n"));
  const tail = JSON.parse(full).constructions["H-1"].responseFactors.Y[100];
  const drifted = await verifyText(older.replace(String(tail), String(tail * (1 + 1e-6))));
  assert.ok(
    drifted.lines.some((l) => l.includes("/constructions/H-1/responseFactors")),
    drifted.lines.join("\n"),
  );
});
