import type { CommandIo } from "./commands/commandIo.ts";
import { describeEnvironmentFault, isEnvironmentFault } from "./commands/environmentFault.ts";
import { streamWriter, terminalIo } from "./commands/terminalIo.ts";
import { terminalSafe } from "./project/displayText.ts";
import { TOOL_VERSION } from "./version.ts";
import { CSV_LOCALE_NAMES, DEFAULT_CSV_LOCALE } from "./tables/csvTable.ts";

// Each command's modules are loaded by its `run` with `import()`, so `--version`, `--help` and `check` do
// not wait for the package renderer, the plotting and DOM libraries or the PDF printer, and `--version` and
// `--help` not for Node's argument parser either (README, "Start-up"). A new command loads its modules the
// same way and gets a line in the permission table of bin/fluxnote.

const USAGE =
  `fluxnote ${TOOL_VERSION} — heat flow through walls and roofs, as a reviewable calculation package

usage: fluxnote <command> [options]

commands:
  build <project> [--out <dir>] [--sign <private key>] [--pdf] [--csv-locale <name>] [--quiet]
                                           write package.html, results.json and csv/
  check <project> [--format text|json] [--strict] [--severity error|warning|note]
                                           validate the project, write nothing
  diff <a> <b> [--format text|json|html] [--out <file>]
                                           compare two revisions (folders or package.html files)
  verify <package.html> [--key <public key>]
                                           re-run the embedded inputs and compare
  keygen <name>                            make a signing key pair <name>.private.pem, <name>.public.pem
  init <dir>                               start a new project from the template
  materials [--class <class>] [--search <text>] [--format text|json]
                                           list the built-in materials library
  serve <project> [--port N]               live preview on 127.0.0.1, rebuilt on every change
  help [command]                           show help
  --version, -V                            print the version

Run "fluxnote <command> --help" for a command's options.`;

const HELP: Record<string, string> = {
  build:
    `usage: fluxnote build <project> [--out <dir>] [--sign <private key>] [--pdf] [--csv-locale <name>] [--quiet]

Reads the project folder, computes every construction and writes one output set:
  <dir>/package.html   the self-contained calculation package
  <dir>/results.json   machine-readable results (schema fluxnote-results/1)
  <dir>/csv/           tables as CSV
--out defaults to <project>/out. The set is replaced as a whole; on an input error nothing is written.
--out must be absent, empty or an earlier output (marked by <dir>/.fluxnote-output); the project folder,
a folder holding it, a file, a link or a folder of other files is refused and left untouched.
--sign <file>  sign package.html with an Ed25519 private key (PEM, from "fluxnote keygen"); the signature
               covers the whole page, the signing key's fingerprint and the signing time.
--pdf          also print package.pdf through the local Chromium (Debian's chromium package), paper from
               the front matter's paper: A4 (default) or Letter; without Chromium nothing is written.
--csv-locale comma-point|semicolon-comma
               the CSV dialect: "," between fields and decimal points (comma-point, the default), or ";"
               between fields, decimal commas and a UTF-8 byte-order mark for spreadsheets set to a
               decimal-comma locale (semicolon-comma).
--quiet, -q    print errors only (no warnings, no status block)
After writing, a status block: failed checks, unmet limits, open items, warnings (counts, the first few
named) and the output path; coloured only on a terminal, never with NO_COLOR set.
Exit codes: 0 success; 1 input errors, a refused --out or a failed computed check (the package is still
written then); 2 usage error, an unreadable --sign key (nothing is written) or internal fault.`,
  verify: `usage: fluxnote verify <package.html> [--key <public key>]

Extracts the inputs and results embedded in a package, checks their hashes, re-runs the inputs with this
version and compares. The package's version is the one in its embedded results (the generator mark must
agree). Same version: results and package must be byte-identical (an edited table cell is caught). Another
version: every number must agree within 1e-9 relative (each difference is listed with its JSON Pointer), but
the page text is not verifiable with this version, so the answer is NOT REPRODUCED (exit 1): REPRODUCED
needs both the results and the page proven. Packages over 200 MiB, devices and pipes are refused.
--key <file>  the package must carry a valid signature by this Ed25519 public key (PEM); prints the key
              fingerprint and signing time. Without --key a signature is checked against the key the
              package carries, which proves no signer.
Exit codes: 0 reproduced; 1 not reproduced, tampered or not signed by the key; 2 not a package, malformed
embedded data, a bad key file or usage error.`,
  keygen: `usage: fluxnote keygen <name>

Makes an Ed25519 key pair for signing packages: <name>.private.pem (PKCS#8, mode 0600, keep it secret) and
<name>.public.pem (SubjectPublicKeyInfo, give it to whoever verifies), and prints the key fingerprint
(SHA-256 of the public key). Never overwrites a file. Exit codes: 0 written; 2 a file exists or usage error.`,
  serve: `usage: fluxnote serve <project> [--port N]

Builds the project in memory and serves the package at http://127.0.0.1:N/ (default port 8470), rebuilding
when a file of the project changes; the page reloads by itself every 2 s. Nothing is written to disk.
Only the loopback address is used, and only requests for 127.0.0.1:N or localhost:N are answered.
Exit codes: 0 stopped; 1 the port is in use or the folder cannot be watched; 2 usage error.`,
  diff: `usage: fluxnote diff <a> <b> [--format text|json|html] [--out <file>]

Compares revision a with revision b; each is a project folder or an issued package.html (its embedded
inputs are re-run). Lists the changed files, every changed input key (old → new, with file:line:col on each
side) and the effect on the results (U, decrement factor, time lag, peaks and totals), largest first.
--format json   print {"schema": "fluxnote-diff/1", ...}; --format html   a self-contained page
--out <file>    write the output to <file> (replaced atomically; never a folder, a link or a revision)
Exit codes: 0 compared (whether or not anything differs); 1 input errors on either side or a refused
--out; 2 usage error or a file that is not a package.`,
  init: `usage: fluxnote init <dir>

Creates <dir> with a starter project (project.md, materials, constructions, a design day) to edit.
Refuses a folder that already holds files. Exit codes: 0 created; 2 usage error or folder not empty.`,
  materials: `usage: fluxnote materials [--class <class>] [--search <text>] [--format text|json]

Lists the built-in materials library: id (what a layer's material: names), name, λ, ρ and c (or R for an
air layer), class, and the source with its state: confirmed (read in the cited document or a copy of it),
from memory, or unconfirmed. Long names and sources are cut in the text form.
--class <class>   only entries of this material class (an unknown class lists the classes)
--search <text>   only entries whose id or name contains the text (case-insensitive)
--format json     print an array of objects, SI units in the keys (conductivity_W_per_mK, …)
Exit codes: 0 listed; 1 nothing matched; 2 unknown class or usage error.`,
  check: `usage: fluxnote check <project> [--format text|json] [--strict] [--severity error|warning|note]

Runs all validation of a build. Errors print one by one as path:line:col: error: message; warnings and
notes print grouped by rule (count, message, what they apply to, first path:line:col).
--format json   print {"schema": "fluxnote-check/1", "findings": [...], "groups": [...]} on stdout
--strict        warnings also give exit code 1, except those acknowledged in project.md
                (acknowledged: [{ rule, subject, reason, by }])
--severity S    print only findings of severity S and above (default note: all); the exit code is unchanged
Exit codes: 0 no errors; 1 errors (or unacknowledged warnings with --strict); 2 usage error.`,
};

/** One command: its options, how many positional arguments it takes, and how it runs once parsed. */
interface CommandSpec {
  readonly options: Record<string, { type: "string" | "boolean"; default?: string; short?: string }>;
  /** Number of positional arguments and what they are, for messages. */
  readonly positionals: { readonly count: number; readonly what: string };
  run(
    positionals: readonly string[],
    values: Readonly<Record<string, string | boolean | undefined>>,
    io: CommandIo,
  ): Promise<number>;
}

/** A usage error: the message is printed with the command's help and the exit code is 2. */
class UsageError extends Error {}

function choice<T extends string>(option: string, value: unknown, allowed: readonly T[]): T {
  if (typeof value === "string" && (allowed as readonly string[]).includes(value)) return value as T;
  throw new UsageError(`--${option} must be one of ${allowed.join(", ")}, found "${String(value)}"`);
}

const COMMANDS: Record<string, CommandSpec> = {
  build: {
    options: {
      out: { type: "string" },
      sign: { type: "string" },
      pdf: { type: "boolean" },
      "csv-locale": { type: "string", default: DEFAULT_CSV_LOCALE },
      quiet: { type: "boolean", short: "q" },
    },
    positionals: { count: 1, what: "one project folder" },
    run: async ([project = ""], values, io) => {
      const { runBuild } = await import("./commands/build.ts");
      return runBuild({
        project,
        ...(typeof values.out === "string" ? { out: values.out } : {}),
        ...(typeof values.sign === "string" ? { sign: values.sign } : {}),
        ...(values.pdf === true ? { pdf: true } : {}),
        csvLocale: choice("csv-locale", values["csv-locale"], CSV_LOCALE_NAMES),
        ...(values.quiet === true ? { quiet: true } : {}),
      }, io);
    },
  },
  check: {
    options: {
      format: { type: "string", default: "text" },
      strict: { type: "boolean" },
      severity: { type: "string", default: "note" },
    },
    positionals: { count: 1, what: "one project folder" },
    run: async ([project = ""], values, io) => {
      const format = choice("format", values.format, ["text", "json"] as const);
      const severity = choice("severity", values.severity, ["error", "warning", "note"] as const);
      // Plain YAML and Markdown are read without their libraries, loaded only for a text that needs them.
      (await import("./project/readerLibraries.ts")).deferReaderLibraries();
      const { runCheck } = await import("./commands/check.ts");
      return runCheck({ project, format, strict: values.strict === true, severity }, io);
    },
  },
  diff: {
    options: { format: { type: "string", default: "text" }, out: { type: "string" } },
    positionals: { count: 2, what: "two projects or packages" },
    run: async ([a = "", b = ""], values, io) => {
      const format = choice("format", values.format, ["text", "json", "html"] as const);
      const { runDiff } = await import("./commands/diff.ts");
      return runDiff(
        typeof values.out === "string" ? { a, b, format, out: values.out } : { a, b, format },
        io,
      );
    },
  },
  verify: {
    options: { key: { type: "string" } },
    positionals: { count: 1, what: "one package file" },
    run: async ([path = ""], values, io) => {
      const { runVerify } = await import("./commands/verify.ts");
      return runVerify(path, io, typeof values.key === "string" ? { key: values.key } : {});
    },
  },
  keygen: {
    options: {},
    positionals: { count: 1, what: "one key name" },
    run: async ([name = ""], _values, io) => (await import("./commands/signingKeys.ts")).runKeygen(name, io),
  },
  init: {
    options: {},
    positionals: { count: 1, what: "one folder name" },
    run: async ([target = ""], _values, io) => (await import("./commands/init.ts")).runInit(target, io),
  },
  materials: {
    options: {
      class: { type: "string" },
      search: { type: "string" },
      format: { type: "string", default: "text" },
    },
    positionals: { count: 0, what: "no arguments" },
    run: async (_positionals, values, io) => {
      const format = choice("format", values.format, ["text", "json"] as const);
      const { runMaterials } = await import("./commands/materials.ts");
      return runMaterials({
        ...(typeof values.class === "string" ? { materialClass: values.class } : {}),
        ...(typeof values.search === "string" ? { search: values.search } : {}),
        format,
      }, io);
    },
  },
  serve: {
    options: { port: { type: "string", default: "8470" } },
    positionals: { count: 1, what: "one project folder" },
    run: async ([project = ""], values, io) => {
      const port = Number(values.port);
      if (!Number.isInteger(port) || port < 0 || port > 65535) {
        throw new UsageError(`--port must be 0–65535, found "${String(values.port)}"`);
      }
      const { runServe } = await import("./commands/serve.ts");
      return runServe({ project, port }, io);
    },
  },
};

/** The command names, for the launcher's permission table (bin/fluxnote) and its test. */
export const COMMAND_NAMES: readonly string[] = Object.keys(COMMANDS);

/** node:util's parseArgs messages, reworded with balanced quotes and a fix. */
function usageMessage(cause: TypeError & { code?: unknown }): string {
  const unknown = /^Unknown option '([^']*)'/.exec(cause.message);
  if (cause.code === "ERR_PARSE_ARGS_UNKNOWN_OPTION" && unknown !== null) {
    const option = unknown[1] ?? "";
    return `unknown option "${option}"; a project or file whose name starts with "-" goes after "--", ` +
      `as in: -- "${option}"`;
  }
  return cause.message;
}

/** A permission the run was not given (Deno's permission system), as opposed to a file the OS refused. */
function isMissingPermission(cause: unknown): cause is Error {
  return cause instanceof Deno.errors.NotCapable;
}

/** Runs the command line; returns the process exit code. */
export async function main(args: readonly string[], rawIo: CommandIo): Promise<number> {
  const io = terminalIo(rawIo);
  const [command, ...rest] = args;
  try {
    return await dispatch(command, rest, io);
  } catch (cause) {
    if (!isEnvironmentFault(cause)) throw cause;
    // The reader of our output has gone (e.g. `| head`): there is no one left to tell.
    if (cause instanceof Deno.errors.BrokenPipe) return 1;
    const how = isMissingPermission(cause)
      ? `; run it as "fluxnote ${command ?? ""} …" (bin/fluxnote), which gives each command what it needs`
      : "";
    io.stderr(`fluxnote ${command ?? ""}: ${describeEnvironmentFault(cause)}${how}`);
    return 1;
  }
}

async function dispatch(
  command: string | undefined,
  rest: readonly string[],
  io: CommandIo,
): Promise<number> {
  if (command === undefined || command === "help" || command === "--help" || command === "-h") {
    const topic = rest[0];
    if (topic === undefined) {
      io.stdout(USAGE);
      return 0;
    }
    if (HELP[topic] === undefined) {
      io.stderr(`fluxnote help: no command "${topic}"\n\n${USAGE}`);
      return 2;
    }
    io.stdout(HELP[topic]);
    return 0;
  }
  if (command === "--version" || command === "-V") {
    io.stdout(`fluxnote ${TOOL_VERSION}`);
    return 0;
  }
  const spec = COMMANDS[command];
  if (spec === undefined) {
    io.stderr(`fluxnote: unknown command "${command}"\n\n${USAGE}`);
    return 2;
  }
  // Before any command module (and the YAML parser with it) is loaded. `check` loads the parser only for a
  // block that needs it, and hides the environment then (src/commands/check.ts): Node's process
  // object costs start-up time.
  if (command !== "check") {
    (await import("./commands/quietDependencies.ts")).hideEnvironmentFromDependencies();
  }
  const { parseArgs } = await import("node:util");
  try {
    const parsed = parseArgs({
      args: [...rest],
      allowPositionals: true,
      strict: true,
      options: { ...spec.options, help: { type: "boolean", short: "h" } },
    });
    const values = parsed.values as Record<string, string | boolean | undefined>;
    if (values.help === true) {
      io.stdout(HELP[command] ?? USAGE);
      return 0;
    }
    if (parsed.positionals.length !== spec.positionals.count) {
      throw new UsageError(`expected ${spec.positionals.what}, found ${parsed.positionals.length}`);
    }
    return await spec.run(parsed.positionals, values, io);
  } catch (cause) {
    const isParseError = cause instanceof TypeError && "code" in cause &&
      String((cause as { code: unknown }).code).startsWith("ERR_PARSE_ARGS");
    if (!(cause instanceof UsageError) && !isParseError) throw cause;
    const message = isParseError ? usageMessage(cause) : cause.message;
    io.stderr(`fluxnote ${command}: ${message}\n\n${HELP[command] ?? USAGE}`);
    return 2;
  }
}

if (import.meta.main) {
  const io: CommandIo = {
    stdout: streamWriter(Deno.stdout),
    stderr: streamWriter(Deno.stderr),
    // Colour only on a terminal, never with NO_COLOR set (Deno.noColor: set and not empty).
    colour: Deno.stdout.isTerminal() && !Deno.noColor,
  };
  let code: number;
  try {
    code = await main(Deno.args, io);
  } catch (cause) {
    const message = terminalSafe(cause instanceof Error ? `${cause.name}: ${cause.message}` : String(cause));
    io.stderr(
      `fluxnote: internal error: ${message}\nThis is a fault in fluxnote, not in your project; nothing was changed.`,
    );
    code = 2;
  }
  Deno.exit(code);
}
