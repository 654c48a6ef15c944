/**
 * The `fluxnote` launcher (bin/fluxnote): run from a folder outside the repository with paths relative to
 * that folder, one command for every subcommand, each with only the Deno permissions it needs, and the
 * documented set-up line (`npm link`). The child processes use the Deno that runs the tests (the pinned
 * one) by putting it first on the PATH, as `npx -y deno@2.9.6 task …` does.
 */
import assert from "node:assert/strict";
import { dirname, join } from "node:path";
import { fileURLToPath } from "node:url";
import { COMMAND_NAMES } from "../../src/cli.ts";

const REPO = fileURLToPath(new URL("../../", import.meta.url));
const LAUNCHER = join(REPO, "bin", "fluxnote");
const MINIMAL = fileURLToPath(new URL("../fixtures/good/minimal/", import.meta.url));

/**
 * Runs a program found on the PATH through `sh` (the one program the test task may start besides mkfifo;
 * the launcher is a shell script anyway).
 */
function program(name: string, args: readonly string[], options: Deno.CommandOptions): Deno.Command {
  // INIT_CWD inherited from a `npx … task test` run names another folder: the child starts without it.
  return new Deno.Command("sh", {
    ...options,
    args: ["-c", 'unset INIT_CWD; exec "$0" "$@"', name, ...args],
  });
}

/** PATH with this test's Deno first, so the launcher takes it instead of asking npx. */
function pathWith(...folders: string[]): string {
  return [...folders, dirname(Deno.execPath()), Deno.env.get("PATH") ?? ""].join(":");
}

async function launch(
  args: readonly string[],
  cwd: string,
  env: Record<string, string> = {},
  launcher = LAUNCHER,
): Promise<{ code: number; out: string; err: string }> {
  const result = await new Deno.Command("sh", {
    args: [launcher, ...args],
    cwd,
    env: { PATH: pathWith(), NO_COLOR: "1", ...env },
    stdout: "piped",
    stderr: "piped",
  }).output();
  const decode = (b: Uint8Array) => new TextDecoder().decode(b);
  return { code: result.code, out: decode(result.stdout), err: decode(result.stderr) };
}

Deno.test("fluxnote runs from a folder outside the repository: init, check and build take paths relative to it", async () => {
  const caller = await Deno.makeTempDir({ prefix: "fluxnote-caller-" });
  try {
    const init = await launch(["init", "myproj"], caller);
    assert.equal(init.code, 0, init.err);
    assert.ok(
      Deno.statSync(join(caller, "myproj", "project.md")).isFile,
      "init wrote into the caller's folder",
    );
    const check = await launch(["check", "myproj"], caller);
    assert.equal(check.code, 0, check.err);
    assert.match(check.out, /^0 error\(s\), .* constructions read$/m);
    const build = await launch(["build", "myproj"], caller);
    assert.equal(build.code, 0, build.err);
    assert.ok(Deno.statSync(join(caller, "myproj", "out", "package.html")).isFile);
    assert.match(build.out, /^ {2}output +myproj\/out\/package\.html$/m);
    // Nothing landed in the repository.
    assert.throws(() => Deno.statSync(join(REPO, "myproj")));
  } finally {
    await Deno.remove(caller, { recursive: true });
  }
});

Deno.test("the fluxnote task resolves paths against the folder it was started from (INIT_CWD)", async () => {
  const caller = await Deno.makeTempDir({ prefix: "fluxnote-task-" });
  try {
    for (const name of ["project.md", "walls.md"]) {
      Deno.copyFileSync(join(MINIMAL, name), join(caller, name));
    }
    const result = await program(Deno.execPath(), [
      "task",
      "--quiet",
      "--config",
      join(REPO, "deno.json"),
      "fluxnote",
      "check",
      ".",
    ], {
      cwd: caller,
      env: { PATH: pathWith(), NO_COLOR: "1" },
      stdout: "piped",
      stderr: "piped",
    }).output();
    const out = new TextDecoder().decode(result.stdout);
    assert.equal(result.code, 0, new TextDecoder().decode(result.stderr));
    assert.match(out, /1 constructions read/);
  } finally {
    await Deno.remove(caller, { recursive: true });
  }
});

/** A stand-in `deno` that reports the pinned version and prints the arguments it was run with. */
async function recordingDeno(): Promise<string> {
  const folder = await Deno.makeTempDir({ prefix: "fluxnote-fake-deno-" });
  const script = join(folder, "deno");
  Deno.writeTextFileSync(
    script,
    '#!/bin/sh\nif [ "$1" = --version ]; then echo "deno 2.9.6 (stand-in)"; exit 0; fi\n' +
      'for a in "$@"; do printf "%s\\n" "$a"; done\n',
  );
  Deno.chmodSync(script, 0o755);
  return folder;
}

Deno.test("the launcher gives each command only the permissions it needs", async () => {
  const fake = await recordingDeno();
  try {
    const permissionsOf = async (args: string[]) => {
      const result = await launch(args, fake, { PATH: pathWith(fake), FLUXNOTE_FROM_SOURCE: "1" });
      assert.equal(result.code, 0, result.err);
      const words = result.out.trimEnd().split("\n");
      assert.equal(words[0], "run");
      assert.ok(words.includes("--no-prompt"), "a missing permission must fail, never prompt");
      const cli = words.indexOf(join(REPO, "src", "cli.ts"));
      assert.deepEqual(words.slice(cli + 1), args, "the arguments pass through unchanged");
      return words.slice(0, cli).filter((w) => w.startsWith("--allow-")).sort();
    };
    assert.deepEqual(await permissionsOf(["check", "p", "--strict", "--severity", "error"]), [
      "--allow-read",
    ]);
    assert.deepEqual(await permissionsOf(["materials", "--search", "brick"]), ["--allow-read"]);
    assert.deepEqual(await permissionsOf(["verify", "p.html"]), ["--allow-read"]);
    assert.deepEqual(await permissionsOf(["build", "p", "--csv-locale", "de"]), [
      "--allow-read",
      "--allow-write",
    ]);
    assert.deepEqual(await permissionsOf(["build", "p", "--pdf"]), [
      "--allow-env=TMPDIR,TMP,TEMP,NODE_V8_COVERAGE",
      "--allow-read",
      "--allow-run=/usr/bin/chromium",
      "--allow-sys=homedir",
      "--allow-write",
    ]);
    // "--pdf" after "--" is a folder name, not the option.
    assert.deepEqual(await permissionsOf(["build", "--", "--pdf"]), ["--allow-read", "--allow-write"]);
    assert.deepEqual(await permissionsOf(["serve", "p"]), ["--allow-net=127.0.0.1", "--allow-read"]);
    assert.deepEqual(await permissionsOf(["diff", "a", "b"]), ["--allow-read"]);
    assert.deepEqual(await permissionsOf(["diff", "a", "b", "--out", "d.html"]), [
      "--allow-read",
      "--allow-write",
    ]);
    assert.deepEqual(await permissionsOf(["init", "p"]), ["--allow-read", "--allow-write"]);
    assert.deepEqual(await permissionsOf(["--version"]), []);
    assert.deepEqual(await permissionsOf(["help", "build"]), []);
  } finally {
    await Deno.remove(fake, { recursive: true });
  }
});

Deno.test("every command of the command line has a line in the launcher's permission table", () => {
  const text = Deno.readTextFileSync(LAUNCHER);
  const start = text.indexOf("case ${1:-} in");
  const table = text.slice(start, text.indexOf("esac", start));
  const labels = new Set(
    [...table.matchAll(/^ {2}([a-z |]+)\)/gm)].flatMap((m) => m[1]!.split("|")).map((s) => s.trim()),
  );
  for (const name of COMMAND_NAMES) assert.ok(labels.has(name), `no permission line for "${name}"`);
  assert.ok(labels.has("materials"), "materials (read-only) is in the table");
});

Deno.test("serve works through the same fluxnote command and answers on loopback", async () => {
  const project = await Deno.makeTempDir({ prefix: "fluxnote-serve-" });
  for (const name of ["project.md", "walls.md"]) Deno.copyFileSync(join(MINIMAL, name), join(project, name));
  const child = new Deno.Command("sh", {
    args: [LAUNCHER, "serve", ".", "--port", "0"],
    cwd: project,
    env: { PATH: pathWith(), NO_COLOR: "1" },
    stdout: "piped",
    stderr: "piped",
  }).spawn();
  try {
    const reader = child.stdout.pipeThrough(new TextDecoderStream()).getReader();
    let seen = "";
    let port: string | undefined;
    const deadline = Date.now() + 60_000;
    while (port === undefined && Date.now() < deadline) {
      const { value, done } = await reader.read();
      if (done) break;
      seen += value;
      port = /http:\/\/127\.0\.0\.1:(\d+)\//.exec(seen)?.[1];
    }
    assert.ok(port !== undefined, `serve did not start: ${seen}`);
    const page = await (await fetch(`http://127.0.0.1:${port}/`)).text();
    assert.ok(page.includes("Fixture project"));
    reader.releaseLock();
  } finally {
    child.kill("SIGTERM");
    await child.status;
    await child.stdout.cancel().catch(() => {});
    await child.stderr.cancel();
    await Deno.remove(project, { recursive: true });
  }
});

Deno.test("a missing permission is one line naming it and how to run the command, exit 1, never an internal fault", async () => {
  const project = await Deno.makeTempDir({ prefix: "fluxnote-denied-" });
  try {
    for (const name of ["project.md", "walls.md"]) {
      Deno.copyFileSync(join(MINIMAL, name), join(project, name));
    }
    const cases: { args: string[]; permissions: string[]; denied: RegExp }[] = [
      {
        args: ["serve", project, "--port", "0"],
        permissions: ["--allow-read"],
        denied: /not allowed to connect to "127\.0\.0\.1:0"/,
      },
      { args: ["check", project], permissions: [], denied: /not allowed to read "/ },
      { args: ["build", project], permissions: ["--allow-read"], denied: /not allowed to write "/ },
    ];
    for (const c of cases) {
      const cli = join(REPO, "src", "cli.ts");
      const result = await program(Deno.execPath(), [
        "run",
        "--quiet",
        "--no-prompt",
        ...c.permissions,
        cli,
        ...c.args,
      ], {
        stdout: "piped",
        stderr: "piped",
      }).output();
      const err = new TextDecoder().decode(result.stderr);
      assert.equal(result.code, 1, err);
      const lines = err.trimEnd().split("\n").filter((l) => !l.startsWith("build 1"));
      assert.equal(lines.length, 1, err);
      assert.match(lines[0]!, c.denied);
      assert.match(lines[0]!, new RegExp(`run it as "fluxnote ${c.args[0]} …" \\(bin/fluxnote\\)`));
      assert.doesNotMatch(err, /internal error|fault in fluxnote|\n\s+at /);
    }
  } finally {
    await Deno.remove(project, { recursive: true });
  }
});

Deno.test("npm link, the README's set-up line, puts a working fluxnote command on the PATH", async () => {
  const prefix = await Deno.makeTempDir({ prefix: "fluxnote-npm-prefix-" });
  const caller = await Deno.makeTempDir({ prefix: "fluxnote-linked-" });
  try {
    const link = await program("npm", ["link", "--offline", "--no-audit", "--no-fund"], {
      cwd: REPO,
      env: { npm_config_prefix: prefix, npm_config_update_notifier: "false" },
      stdout: "piped",
      stderr: "piped",
    }).output();
    assert.equal(link.code, 0, new TextDecoder().decode(link.stderr));
    for (const name of ["project.md", "walls.md"]) Deno.copyFileSync(join(MINIMAL, name), join(caller, name));
    const result = await program("fluxnote", ["check", "."], {
      cwd: caller,
      env: { PATH: pathWith(join(prefix, "bin")) },
      stdout: "piped",
      stderr: "piped",
    }).output();
    assert.equal(result.code, 0, new TextDecoder().decode(result.stderr));
    assert.match(new TextDecoder().decode(result.stdout), /1 constructions read/);
  } finally {
    await Deno.remove(prefix, { recursive: true });
    await Deno.remove(caller, { recursive: true });
  }
});

/** A copy of what the launcher needs of the repository (sources, template, configuration), in a new folder. */
async function repositoryCopy(): Promise<string> {
  const copy = await Deno.makeTempDir({ prefix: "fluxnote-repo-copy-" });
  const copyTree = (from: string, to: string) => {
    Deno.mkdirSync(to, { recursive: true });
    for (const entry of Deno.readDirSync(from)) {
      if (entry.isDirectory) copyTree(join(from, entry.name), join(to, entry.name));
      else Deno.copyFileSync(join(from, entry.name), join(to, entry.name));
    }
  };
  for (const folder of ["src", "bin", "templates"]) copyTree(join(REPO, folder), join(copy, folder));
  for (const file of ["deno.json", "deno.lock", "package.json"]) {
    Deno.copyFileSync(join(REPO, file), join(copy, file));
  }
  return copy;
}

/** Runs the launcher of a repository copy. */
const launchCopy = (copy: string, args: readonly string[], cwd: string, env: Record<string, string> = {}) =>
  launch(args, cwd, env, join(copy, "bin", "fluxnote"));

const compiledPointer = (copy: string) => {
  try {
    return Deno.readTextFileSync(join(copy, ".cache", "compiled")).trim();
  } catch {
    return undefined;
  }
};

Deno.test("the launcher runs a compiled copy of the sources that writes the same files, and makes it again after a source change", async () => {
  const copy = await repositoryCopy();
  const outputs = await Deno.makeTempDir({ prefix: "fluxnote-compiled-out-" });
  try {
    const demo = join(REPO, "projects", "demo");
    const compiled = await launchCopy(copy, ["build", demo, "--out", join(outputs, "compiled")], outputs);
    assert.equal(compiled.code, 0, compiled.err);
    const first = compiledPointer(copy);
    assert.ok(first !== undefined, "the first run made a compiled copy");
    assert.ok(Deno.statSync(join(copy, ".cache", first, "cli.js")).isFile);
    const source = await launchCopy(copy, ["build", demo, "--out", join(outputs, "source")], outputs, {
      FLUXNOTE_FROM_SOURCE: "1",
    });
    assert.equal(source.code, 0, source.err);
    const files = (folder: string): string[] =>
      [...Deno.readDirSync(folder)].flatMap((e) =>
        e.isDirectory ? files(join(folder, e.name)).map((f) => join(e.name, f)) : [e.name]
      ).sort();
    const compiledFiles = files(join(outputs, "compiled"));
    assert.deepEqual(compiledFiles, files(join(outputs, "source")));
    assert.ok(compiledFiles.includes("package.html") && compiledFiles.length > 5);
    for (const name of compiledFiles) {
      assert.deepEqual(
        Deno.readFileSync(join(outputs, "compiled", name)),
        Deno.readFileSync(join(outputs, "source", name)),
        `${name} differs between the compiled copy and the sources`,
      );
    }
    // init through the compiled copy finds the template beside the sources.
    const init = await launchCopy(copy, ["init", "fresh"], outputs);
    assert.equal(init.code, 0, init.err);
    assert.ok(Deno.statSync(join(outputs, "fresh", "project.md")).isFile);
    assert.equal(compiledPointer(copy), first, "an unchanged source tree keeps its compiled copy");
    // A changed source file: the next run compiles again and runs the change.
    const versionFile = join(copy, "src", "version.ts");
    const versionText = Deno.readTextFileSync(versionFile);
    Deno.writeTextFileSync(versionFile, versionText.replace(/"(\d+\.\d+\.\d+)"/, '"$1-changed"'));
    const version = await launchCopy(copy, ["--version"], outputs);
    assert.equal(version.code, 0, version.err);
    assert.match(version.out, /-changed/);
    const second = compiledPointer(copy);
    assert.notEqual(second, first, "the change made a new compiled copy");
    // A file replaced by an older version with its old modification time (as unpacking an archive or rsync -a
    // leaves it): the copy is made again all the same.
    Deno.writeTextFileSync(versionFile, versionText.replace(/"(\d+\.\d+\.\d+)"/, '"$1-older"'));
    const longAgo = new Date("2001-02-03T04:05:06Z");
    Deno.utimeSync(versionFile, longAgo, longAgo);
    const older = await launchCopy(copy, ["--version"], outputs);
    assert.equal(older.code, 0, older.err);
    assert.match(older.out, /-older/);
    assert.notEqual(compiledPointer(copy), second, "a file set back in time made a new compiled copy");
  } finally {
    await Deno.remove(copy, { recursive: true });
    await Deno.remove(outputs, { recursive: true });
  }
});

Deno.test("where no compiled copy can be made, the launcher runs the sources", async () => {
  const copy = await repositoryCopy();
  const caller = await Deno.makeTempDir({ prefix: "fluxnote-no-cache-" });
  try {
    Deno.writeTextFileSync(join(copy, ".cache"), "a file where the cache folder would be\n");
    for (const name of ["project.md", "walls.md"]) Deno.copyFileSync(join(MINIMAL, name), join(caller, name));
    const check = await launchCopy(copy, ["check", "."], caller);
    assert.equal(check.code, 0, check.err);
    assert.match(check.out, /1 constructions read/);
    assert.doesNotMatch(check.err, /compil|cache/i, "nothing is said about the cache");
  } finally {
    await Deno.remove(copy, { recursive: true });
    await Deno.remove(caller, { recursive: true });
  }
});

Deno.test("the packages the compiled copy leaves out are deno.json's imports", () => {
  const line = Deno.readTextFileSync(LAUNCHER).match(/^EXTERNAL_PACKAGES="([^"]*)"$/m);
  assert.ok(line !== null, "EXTERNAL_PACKAGES is set in bin/fluxnote");
  const imports = Object.keys(JSON.parse(Deno.readTextFileSync(join(REPO, "deno.json"))).imports).sort();
  assert.deepEqual(line[1]!.split(" ").sort(), imports);
});

/**
 * Writes a stand-in npx into `folder` that logs each call and answers `eval` with the path of the Deno running
 * these tests; returns the log's path.
 */
function standInNpx(folder: string): string {
  const log = join(folder, "calls.log");
  Deno.writeTextFileSync(
    join(folder, "npx"),
    `#!/bin/sh\nprintf '%s\\n' "$*" >>"${log}"\n` +
      `case "$*" in *eval*) echo "${Deno.execPath()}" ;; *) exit 3 ;; esac\n`,
  );
  Deno.chmodSync(join(folder, "npx"), 0o755);
  return log;
}

Deno.test("without the pinned Deno on the PATH, the launcher asks npx for it once and remembers the binary", async () => {
  const copy = await repositoryCopy();
  const fake = await Deno.makeTempDir({ prefix: "fluxnote-fake-npx-" });
  try {
    const log = standInNpx(fake);
    const env = { PATH: `${fake}:/usr/bin:/bin`, FLUXNOTE_FROM_SOURCE: "1" };
    for (let run = 0; run < 2; run++) {
      const version = await launchCopy(copy, ["--version"], fake, env);
      assert.equal(version.code, 0, version.err);
      assert.match(version.out, /^fluxnote \d+\.\d+\.\d+/);
    }
    const calls = Deno.readTextFileSync(log).trimEnd().split("\n");
    assert.equal(calls.length, 1, `npx was asked once: ${calls.join(" | ")}`);
    assert.match(calls[0]!, /^-y deno@2\.9\.6 eval /);
    assert.equal(Deno.readTextFileSync(join(copy, ".cache", "deno-2.9.6")).trim(), Deno.execPath());
  } finally {
    await Deno.remove(copy, { recursive: true });
    await Deno.remove(fake, { recursive: true });
  }
});

Deno.test("where the repository cannot keep it, the launcher remembers the Deno binary in the user's cache folder", async () => {
  const copy = await repositoryCopy();
  const fake = await Deno.makeTempDir({ prefix: "fluxnote-fake-npx-" });
  const userCache = await Deno.makeTempDir({ prefix: "fluxnote-user-cache-" });
  try {
    Deno.writeTextFileSync(join(copy, ".cache"), "a file where the cache folder would be\n");
    const log = standInNpx(fake);
    const env = { PATH: `${fake}:/usr/bin:/bin`, XDG_CACHE_HOME: userCache };
    for (let run = 0; run < 2; run++) {
      const version = await launchCopy(copy, ["--version"], fake, env);
      assert.equal(version.code, 0, version.err);
      assert.match(version.out, /^fluxnote \d+\.\d+\.\d+/);
    }
    assert.equal(Deno.readTextFileSync(log).trimEnd().split("\n").length, 1, "npx was asked once");
    assert.equal(Deno.readTextFileSync(join(userCache, "fluxnote", "deno-2.9.6")).trim(), Deno.execPath());
  } finally {
    await Deno.remove(copy, { recursive: true });
    await Deno.remove(fake, { recursive: true });
    await Deno.remove(userCache, { recursive: true });
  }
});
