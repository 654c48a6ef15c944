import { parseArgs } from "node:util";
import { type CommandIo, runBuild } from "./commands/build.ts";
import { runCheck } from "./commands/check.ts";
import { runDiff } from "./commands/diff.ts";
import { runInit } from "./commands/init.ts";
import { runVerify } from "./commands/verify.ts";
import { runServe } from "./commands/serve.ts";
import { TOOL_VERSION } from "./version.ts";

const USAGE =
  `fluxnote ${TOOL_VERSION} — heat flow through walls and roofs, as a reviewable calculation package

usage: fluxnote <command> [options]

commands:
  build <project> [--out <dir>]            write package.html, results.json and csv/
  check <project> [--format text|json] [--strict]
                                           validate the project, write nothing
  diff <a> <b> [--format text|json|html] [--out <file>]
                                           compare two revisions (folders or package.html files)
  verify <package.html>                    re-run the embedded inputs and compare
  init <dir>                               start a new project from the template
  serve <project> [--port N]               live preview on 127.0.0.1, rebuilt on every change
  help [command]                           show help

Run "fluxnote <command> --help" for a command's options.`;

const HELP: Record<string, string> = {
  build: `usage: fluxnote build <project> [--out <dir>]

Reads the project folder, computes every construction and writes one output set:
  <dir>/package.html   the self-contained calculation package
  <dir>/results.json   machine-readable results (schema fluxnote-results/1)
  <dir>/csv/           tables as CSV
--out defaults to <project>/out. The set is replaced as a whole; on an input error nothing is written.
Exit codes: 0 success; 1 input errors or a failed computed check (the package is still written then);
2 usage error or internal fault.`,
  verify: `usage: fluxnote verify <package.html>

Extracts the inputs and results embedded in a package, checks their hashes, re-runs the inputs with this
version and compares. Same version: results and package must be byte-identical (an edited table cell is
caught). Another version: every number must agree within 1e-9 relative; each difference is listed with its
JSON Pointer. Exit codes: 0 reproduced; 1 not reproduced or tampered; 2 not a package or usage error.`,
  serve: `usage: fluxnote serve <project> [--port N]

Builds the project in memory and serves the package at http://127.0.0.1:N/ (default port 8470), rebuilding
when a file of the project changes; the page reloads by itself every 2 s. Nothing is written to disk.
Only the loopback address is used. Exit codes: 0 stopped; 2 usage error.`,
  diff: `usage: fluxnote diff <a> <b> [--format text|json|html] [--out <file>]

Compares revision a with revision b; each is a project folder or an issued package.html (its embedded
inputs are re-run). Lists the changed files, every changed input key (old → new, with file:line:col on each
side) and the effect on the results (U, decrement factor, time lag, peaks and totals), largest first.
--format json   print {"schema": "fluxnote-diff/1", ...}; --format html   a self-contained page
--out <file>    write the output to <file> (replaced atomically) instead of stdout
Exit codes: 0 compared (whether or not anything differs); 1 input errors on either side;
2 usage error or a file that is not a package.`,
  init: `usage: fluxnote init <dir>

Creates <dir> with a starter project (project.md, materials, constructions, a design day) to edit.
Refuses a folder that already holds files. Exit codes: 0 created; 2 usage error or folder not empty.`,
  check: `usage: fluxnote check <project> [--format text|json] [--strict]

Runs all validation of a build and reports every finding as path:line:col: severity: message.
--format json   print {"schema": "fluxnote-check/1", "findings": [...]} on stdout
--strict        warnings also give exit code 1
Exit codes: 0 no errors; 1 errors (or warnings with --strict); 2 usage error.`,
};

const LATER: readonly string[] = [];

/** Runs the command line; returns the process exit code. */
export async function main(args: readonly string[], io: CommandIo): Promise<number> {
  const [command, ...rest] = args;
  if (command === undefined || command === "help" || command === "--help" || command === "-h") {
    const topic = rest[0];
    io.stdout(topic !== undefined && HELP[topic] !== undefined ? HELP[topic] : USAGE);
    return 0;
  }
  if (command === "--version") {
    io.stdout(`fluxnote ${TOOL_VERSION}`);
    return 0;
  }
  if (LATER.includes(command)) {
    io.stderr(`fluxnote: the "${command}" command is not available in version ${TOOL_VERSION}`);
    return 2;
  }
  if (command === "serve") {
    let parsedServe;
    try {
      parsedServe = parseArgs({
        args: [...rest],
        allowPositionals: true,
        strict: true,
        options: { port: { type: "string", default: "8470" }, help: { type: "boolean", short: "h" } },
      });
    } catch (cause) {
      io.stderr(`fluxnote serve: ${cause instanceof Error ? cause.message : String(cause)}\n\n${HELP.serve}`);
      return 2;
    }
    if (parsedServe.values.help === true) {
      io.stdout(HELP.serve ?? USAGE);
      return 0;
    }
    const port = Number(parsedServe.values.port);
    if (parsedServe.positionals.length !== 1 || !Number.isInteger(port) || port < 0 || port > 65535) {
      io.stderr(`fluxnote serve: expected one project folder and a port 0–65535\n\n${HELP.serve}`);
      return 2;
    }
    return await runServe({ project: parsedServe.positionals[0] ?? "", port }, io);
  }
  if (command === "verify") {
    if (rest[0] === "--help" || rest[0] === "-h") {
      io.stdout(HELP.verify ?? USAGE);
      return 0;
    }
    if (rest.length !== 1 || rest[0]?.startsWith("-")) {
      io.stderr(`fluxnote verify: expected one package file\n\n${HELP.verify}`);
      return 2;
    }
    return await runVerify(rest[0] ?? "", io);
  }
  if (command === "diff") return await dispatchDiff(rest, io);
  if (command === "init") {
    if (rest.length !== 1 || rest[0]?.startsWith("-")) {
      if (rest[0] === "--help" || rest[0] === "-h") {
        io.stdout(HELP.init ?? USAGE);
        return 0;
      }
      io.stderr(`fluxnote init: expected one folder name\n\n${HELP.init}`);
      return 2;
    }
    return await runInit(rest[0] ?? "", io);
  }
  if (command !== "build" && command !== "check") {
    io.stderr(`fluxnote: unknown command "${command}"\n\n${USAGE}`);
    return 2;
  }
  let parsed;
  try {
    parsed = parseArgs({
      args: [...rest],
      allowPositionals: true,
      strict: true,
      options: command === "build" ? { out: { type: "string" }, help: { type: "boolean", short: "h" } } : {
        format: { type: "string", default: "text" },
        strict: { type: "boolean" },
        help: { type: "boolean", short: "h" },
      },
    });
  } catch (cause) {
    io.stderr(
      `fluxnote ${command}: ${cause instanceof Error ? cause.message : String(cause)}\n\n${HELP[command]}`,
    );
    return 2;
  }
  const values = parsed.values as Record<string, string | boolean | undefined>;
  if (values.help === true) {
    io.stdout(HELP[command] ?? USAGE);
    return 0;
  }
  if (parsed.positionals.length !== 1) {
    io.stderr(
      `fluxnote ${command}: expected one project folder, found ${parsed.positionals.length}\n\n${
        HELP[command]
      }`,
    );
    return 2;
  }
  const project = parsed.positionals[0] ?? "";
  if (command === "build") {
    const out = values.out;
    return await runBuild(typeof out === "string" ? { project, out } : { project }, io);
  }
  const format = values.format;
  if (format !== "text" && format !== "json") {
    io.stderr(`fluxnote check: --format must be text or json, found "${String(format)}"`);
    return 2;
  }
  return await runCheck({ project, format, strict: values.strict === true }, io);
}

async function dispatchDiff(rest: readonly string[], io: CommandIo): Promise<number> {
  let parsed;
  try {
    parsed = parseArgs({
      args: [...rest],
      allowPositionals: true,
      strict: true,
      options: {
        format: { type: "string", default: "text" },
        out: { type: "string" },
        help: { type: "boolean", short: "h" },
      },
    });
  } catch (cause) {
    io.stderr(`fluxnote diff: ${cause instanceof Error ? cause.message : String(cause)}\n\n${HELP.diff}`);
    return 2;
  }
  if (parsed.values.help === true) {
    io.stdout(HELP.diff ?? USAGE);
    return 0;
  }
  const [a, b] = parsed.positionals;
  if (parsed.positionals.length !== 2 || a === undefined || b === undefined) {
    io.stderr(
      `fluxnote diff: expected two projects or packages, found ${parsed.positionals.length}\n\n${HELP.diff}`,
    );
    return 2;
  }
  const format = parsed.values.format;
  if (format !== "text" && format !== "json" && format !== "html") {
    io.stderr(`fluxnote diff: --format must be text, json or html, found "${String(format)}"`);
    return 2;
  }
  const out = parsed.values.out;
  return await runDiff(out === undefined ? { a, b, format } : { a, b, format, out }, io);
}

if (import.meta.main) {
  const encoder = new TextEncoder();
  const io: CommandIo = {
    stdout: (line) => Deno.stdout.writeSync(encoder.encode(`${line}\n`)),
    stderr: (line) => Deno.stderr.writeSync(encoder.encode(`${line}\n`)),
  };
  let code: number;
  try {
    code = await main(Deno.args, io);
  } catch (cause) {
    const message = cause instanceof Error ? `${cause.name}: ${cause.message}` : String(cause);
    io.stderr(
      `fluxnote: internal error: ${message}\nThis is a fault in fluxnote, not in your project; nothing was changed.`,
    );
    code = 2;
  }
  Deno.exit(code);
}
