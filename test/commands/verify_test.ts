import assert from "node:assert/strict";
import { join } from "node:path";
import { runBuild } from "../../src/commands/build.ts";
import { runVerify } from "../../src/commands/verify.ts";
import { encodeBase64 } from "../../src/report/base64.ts";
import { sha256Hex } from "../../src/archive/hash.ts";

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

Deno.test("runVerify() compares numbers within 1e-9 when the package comes from another version", async () => {
  const { text } = await freshPackage();
  const older = text.replace(/content="fluxnote [^"]+"/, 'content="fluxnote 0.0.9"');
  const same = await verifyText(older);
  assert.equal(same.code, 0);
  assert.ok(same.lines.some((l) => l.includes("agrees within 1e-9")));
  const drifted = await verifyText(
    older.replace(/&quot;U&quot;: 0\.2949626508/, "&quot;U&quot;: 0.2949626518"),
  );
  assert.equal(drifted.code, 1);
  assert.ok(drifted.lines.some((l) => l.includes("/constructions/EW-1/U:") && l.includes("fluxnote 0.0.9")));
});
