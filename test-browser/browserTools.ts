/** What the browser tests share: whether Debian's Chromium is there, a copy of a project, a command's output. */
import assert from "node:assert/strict";
import { join } from "node:path";
import { CHROMIUM_PATH } from "../src/commands/pdf.ts";

/** True when Debian's Chromium is installed; the tests that print are skipped without it. */
export const HAS_CHROMIUM = (() => {
  try {
    return Deno.statSync(CHROMIUM_PATH).isFile;
  } catch {
    return false;
  }
})();

/** Copies a project folder, leaving out its outputs (`out`, `screenshots`) and hidden entries. */
export async function copyDir(from: string, to: string): Promise<void> {
  await Deno.mkdir(to, { recursive: true });
  for await (const entry of Deno.readDir(from)) {
    if (entry.name === "out" || entry.name === "screenshots" || entry.name.startsWith(".")) continue;
    if (entry.isDirectory) await copyDir(join(from, entry.name), join(to, entry.name));
    else if (entry.isFile) await Deno.copyFile(join(from, entry.name), join(to, entry.name));
  }
}

/** Runs a command-line tool (pdfinfo, pdftotext) and returns its standard output; fails the test if it fails. */
export async function tool(cmd: string, args: string[]): Promise<string> {
  const result = await new Deno.Command(cmd, { args, stdout: "piped", stderr: "piped" }).output();
  assert.ok(result.success, `${cmd} failed: ${new TextDecoder().decode(result.stderr)}`);
  return new TextDecoder().decode(result.stdout);
}
