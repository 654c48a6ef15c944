/**
 * Faults of the surroundings end in one clear line naming the path, exit 1 (README, "Exit codes"), never
 * "internal error … fault in fluxnote". The tests run as root in CI, where permission bits do not stop a
 * read or a write, so the faults are made by other means: a file where a folder is expected, a port
 * taken by the test itself, a stream whose reader has gone, a file removed between locating and
 * reading it, and (for the disk-full mapping only) the error Deno raises for ENOSPC.
 */
import assert from "node:assert/strict";
import { join } from "node:path";
import { main } from "../../src/cli.ts";
import {
  describeEnvironmentFault,
  faultAt,
  isEnvironmentFault,
} from "../../src/commands/environmentFault.ts";
import { streamWriter } from "../../src/commands/terminalIo.ts";
import { diskProjectFs, type ProjectFs } from "../../src/project/projectFs.ts";
import { readProject } from "../../src/project/readProject.ts";

const GOOD = new URL("../fixtures/good/minimal/", import.meta.url).pathname;

async function run(args: string[]): Promise<{ code: number; out: string; err: string }> {
  let out = "";
  let err = "";
  const code = await main(args, { stdout: (l) => (out += `${l}\n`), stderr: (l) => (err += `${l}\n`) });
  return { code, out, err };
}

function assertOneLine(err: string, path: string): void {
  const lines = err.trimEnd().split("\n");
  assert.equal(lines.length, 1, err);
  assert.ok(lines[0]!.includes(`"${path}"`), `the path is not named: ${err}`);
  assert.doesNotMatch(err, /internal error|fault in fluxnote|\n\s+at /);
}

Deno.test("build --out under a regular file says which path is in the way, in one line, exit 1", async () => {
  const base = await Deno.makeTempDir({ prefix: "fluxnote-env-" });
  try {
    const file = join(base, "a-file");
    Deno.writeTextFileSync(file, "not a folder");
    const result = await run(["build", GOOD, "--out", join(file, "out")]);
    assert.equal(result.code, 1, result.err);
    assertOneLine(result.err, file);
    assert.equal(Deno.readTextFileSync(file), "not a folder");
  } finally {
    await Deno.remove(base, { recursive: true });
  }
});

Deno.test("init onto an existing file refuses it clearly and leaves it alone (exit 2, as init --help says)", async () => {
  const base = await Deno.makeTempDir({ prefix: "fluxnote-env-" });
  try {
    const file = join(base, "notes.txt");
    Deno.writeTextFileSync(file, "keep me");
    const result = await run(["init", file]);
    assert.equal(result.code, 2, result.err);
    assert.match(result.err, /"[^"]*notes\.txt" already exists and is not a folder; nothing was written/);
    assert.doesNotMatch(result.err, /internal error/);
    assert.equal(Deno.readTextFileSync(file), "keep me");
  } finally {
    await Deno.remove(base, { recursive: true });
  }
});

Deno.test("serve on a port that is in use names the port and the way out, exit 1", async () => {
  const taken = Deno.listen({ hostname: "127.0.0.1", port: 0 });
  try {
    const port = (taken.addr as Deno.NetAddr).port;
    const result = await run(["serve", GOOD, "--port", String(port)]);
    assert.equal(result.code, 1, result.err);
    assert.ok(
      result.err.includes(`port ${port} on 127.0.0.1 is in use; choose another with --port`),
      result.err,
    );
    assert.doesNotMatch(result.err, /internal error/);
  } finally {
    taken.close();
  }
});

Deno.test("output cut short by its reader (broken pipe) ends quietly and keeps the exit code", async () => {
  let writes = 0;
  const gone = {
    writeSync(): number {
      writes++;
      throw new Deno.errors.BrokenPipe("Broken pipe (os error 32)");
    },
  };
  const write = streamWriter(gone);
  write("first line");
  write("second line");
  assert.equal(writes, 1, "writing went on after the reader had gone");
  // Through main(): a command whose stdout has gone returns without a message or a stack trace.
  let err = "";
  const code = await main(["check", GOOD], {
    stdout: streamWriter(gone),
    stderr: (l) => (err += `${l}\n`),
  });
  assert.equal(code, 0);
  assert.doesNotMatch(err, /internal error|BrokenPipe/);
  // A writer that raises the broken pipe itself: main() ends quietly with exit 1 instead of an internal error.
  let told = "";
  const cut = await main(["check", GOOD], {
    stdout: () => {
      throw new Deno.errors.BrokenPipe("Broken pipe (os error 32)");
    },
    stderr: (l) => (told += `${l}\n`),
  });
  assert.equal(cut, 1);
  assert.doesNotMatch(told, /internal error|BrokenPipe|fluxnote check:/);
});

Deno.test("a pipe that takes a line in parts still gets every byte", () => {
  const taken: number[] = [];
  const write = streamWriter({
    writeSync(bytes: Uint8Array): number {
      const n = Math.min(3, bytes.length);
      taken.push(...bytes.subarray(0, n));
      return n;
    },
  });
  write("fluxnote ✓");
  assert.equal(new TextDecoder().decode(new Uint8Array(taken)), "fluxnote ✓\n");
});

Deno.test("a project file removed between locating and reading it is an error diagnostic, not a crash", async () => {
  const folder = await Deno.makeTempDir({ prefix: "fluxnote-env-" });
  try {
    Deno.copyFileSync(join(GOOD, "project.md"), join(folder, "project.md"));
    Deno.copyFileSync(join(GOOD, "walls.md"), join(folder, "walls.md"));
    Deno.writeTextFileSync(join(folder, "zz.md"), "# soon gone\n");
    const disk = (await diskProjectFs(folder))!;
    // The real folder, but zz.md is deleted right after it was located: a save in progress, as `serve` sees it.
    let located = 0;
    const racing: ProjectFs = {
      ...disk,
      async locate(path) {
        const place = await disk.locate(path);
        // readProject locates a file twice (to spot a file listed twice, then to read it): remove it after the second.
        if (path === "zz.md" && ++located === 2) await Deno.remove(join(folder, "zz.md"));
        return place;
      },
    };
    const read = await readProject(racing);
    const problems = read.diagnostics.map((d) => `${d.rule}: ${d.message}`);
    assert.deepEqual(problems, ['file-not-readable: Cannot read "zz.md": it was removed while being read']);
  } finally {
    await Deno.remove(folder, { recursive: true });
  }
});

Deno.test("describeEnvironmentFault() names the operation, the path and the reason of real Deno errors", async () => {
  const base = await Deno.makeTempDir({ prefix: "fluxnote-env-" });
  try {
    const file = join(base, "f");
    Deno.writeTextFileSync(file, "x");
    const faults: [() => Promise<unknown>, RegExp][] = [
      [() => Deno.readFile(join(base, "missing")), /^cannot (open|read) "[^"]*missing": it does not exist$/],
      [
        () => Deno.mkdir(join(file, "sub")),
        /^cannot create the folder "[^"]*\/f\/sub": a part of the path is a file/,
      ],
      [
        () => Deno.writeTextFile(file, "y", { createNew: true }),
        /^cannot (open|write) "[^"]*\/f": it already exists$/,
      ],
      [() => Deno.readFile(base), /"[^"]*": it is a folder, not a file$|^cannot read "/],
    ];
    for (const [operation, expected] of faults) {
      const cause = await operation().then(() => undefined, (e: unknown) => e);
      assert.ok(isEnvironmentFault(cause), String(cause));
      assert.match(describeEnvironmentFault(cause), expected);
    }
    // ENOSPC (errno 28 on Linux, from memory) has no Deno error class: Deno raises a plain Error whose
    // message carries "(os error 28)" and the operation, as below.
    const full = new Error(`No space left on device (os error 28): write '${file}'`);
    assert.ok(isEnvironmentFault(full));
    assert.equal(
      describeEnvironmentFault(full),
      `cannot write "${file}": the disk is full (no space left on the device)`,
    );
    const denied = new Deno.errors.NotCapable(
      `Requires write access to "${file}", run again with the --allow-write flag`,
    );
    assert.equal(
      describeEnvironmentFault(denied),
      `not allowed to write "${file}": this run was not given --allow-write for it`,
    );
    assert.ok(
      !isEnvironmentFault(new TypeError("x is undefined")),
      "a fault in fluxnote is not the surroundings'",
    );
  } finally {
    await Deno.remove(base, { recursive: true });
  }
});

Deno.test("LOG_TOKENS=1 does not reach the YAML parser: check --format json prints only the JSON", async () => {
  const before = Deno.env.get("LOG_TOKENS");
  const log = console.log;
  const printed: unknown[] = [];
  Deno.env.set("LOG_TOKENS", "1");
  Deno.env.set("LOG_STREAM", "1");
  console.log = (...args: unknown[]) => printed.push(args);
  try {
    const result = await run(["check", GOOD, "--format", "json"]);
    assert.equal(result.code, 0);
    assert.deepEqual(printed, [], "a dependency printed to stdout");
    assert.equal((JSON.parse(result.out) as { schema: string }).schema, "fluxnote-check/1");
  } finally {
    console.log = log;
    if (before === undefined) Deno.env.delete("LOG_TOKENS");
    else Deno.env.set("LOG_TOKENS", before);
    Deno.env.delete("LOG_STREAM");
  }
});

Deno.test({
  name: "a folder where nothing can be created (read-only project) is named in one line, exit 1",
  // procfs refuses new entries to every user, root included (Linux proc(5), from memory); CI runs as root,
  // so permission bits cannot make a read-only folder there.
  ignore: Deno.build.os !== "linux",
  async fn() {
    const result = await run(["build", GOOD, "--out", "/proc/fluxnote-out"]);
    assert.equal(result.code, 1, result.err);
    // Deno asks for full access before it looks at anything under /proc, so the refusal may name the
    // output folder itself rather than /proc; either way one line names the path.
    assertOneLine(result.err, result.err.includes('"/proc/fluxnote-out"') ? "/proc/fluxnote-out" : "/proc");
  },
});

Deno.test("faultAt() names the path of an error that has none (Deno.makeTempDir reports only 'tmpdir')", async () => {
  const denied = new Deno.errors.PermissionDenied("Permission denied (os error 13): tmpdir");
  const named = await Promise.reject(denied).catch(faultAt("create a staging folder in", "/srv/project"))
    .then(
      () => undefined,
      (e: unknown) => e,
    );
  assert.ok(isEnvironmentFault(named));
  assert.equal(
    describeEnvironmentFault(named),
    'cannot create a staging folder in "/srv/project": permission denied',
  );
  const readOnly = new Error("Read-only file system (os error 30): tmpdir");
  const named30 = await Promise.reject(readOnly).catch(faultAt("create a staging folder in", "/srv/p")).then(
    () => undefined,
    (e: unknown) => e as Error,
  );
  assert.equal(
    describeEnvironmentFault(named30!),
    'cannot create a staging folder in "/srv/p": the file system is read-only',
  );
});
