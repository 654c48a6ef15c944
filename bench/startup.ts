/**
 * Start-up time of the command line, side by side for the ways of starting it: each command is run as a fresh
 * process (warm module cache; one unmeasured run of each first), the ways taking turns run by run so that the
 * machine's load falls on all alike, and the median and the fastest of the runs are printed.
 * - "eager": bench/startup_eager.ts, every command module loaded first (as src/cli.ts did before per-command
 *   loading);
 * - "mathjs": bench/startup_mathjs.ts, mathjs's single-file build loaded first (as the unit reader did before
 *   our own; `check` only);
 * - "sources": `deno run src/cli.ts`, the module graph of src/ as it is;
 * - "launcher": `sh bin/fluxnote`, what a user runs: the launcher's checks, then its compiled copy of src/
 *   (made once before the runs), with the launcher's V8 options (every function compiled as its module loads);
 * - "launcher, sources": the launcher with FLUXNOTE_FROM_SOURCE=1 (no compiled copy);
 * - "compiled copy, lazy": `deno run` of a copy of the launcher's compiled copy without the launcher's V8 options
 *   (functions compiled at their first call, as V8 does by default). The copy has its own entries in Deno's code
 *   cache, which V8 would otherwise reject and rewrite on every change of flags.
 * Then where `check` of the template spends its time (bench/check_phases.ts, medians in ms): loading modules,
 * reading, computing, reviewing. Not a test: figures depend on the machine and its load.
 *
 *   npx -y deno@2.9.6 run --allow-read --allow-write --allow-run --allow-env bench/startup.ts [runs]
 */
import { fileURLToPath as fromFileUrl } from "node:url";
import { LAUNCHER, median, PATH_WITH_THIS_DENO as PATH } from "./launcherRuns.ts";

const RUNS = Number(Deno.args[0] ?? "15");
const here = (path: string): string => fromFileUrl(new URL(path, import.meta.url));
const CONFIG = here("../deno.json");

interface Way {
  readonly label: string;
  readonly checkOnly: boolean;
  readonly command: (
    args: readonly string[],
  ) => { program: string; args: string[]; env?: Record<string, string> };
}

const denoRun = (entry: string) => (args: readonly string[]) => ({
  program: Deno.execPath(),
  args: ["run", "--quiet", "--no-prompt", "--config", CONFIG, "--allow-read", entry, ...args],
});
const launcher = (env: Record<string, string>) => (args: readonly string[]) => ({
  program: "sh",
  args: [LAUNCHER, ...args],
  env: { PATH, ...env },
});
/** A copy of the launcher's compiled copy (made by one launcher run), in a temporary folder. */
async function compiledCopyElsewhere(): Promise<string> {
  await new Deno.Command("sh", { args: [LAUNCHER, "--version"], env: { PATH }, stdout: "null" }).output();
  const cache = here("../.cache/");
  const name = (await Deno.readTextFile(`${cache}compiled`)).trim();
  const folder = await Deno.makeTempDir({ prefix: "fluxnote-startup-" });
  for await (const entry of Deno.readDir(`${cache}${name}`)) {
    await Deno.copyFile(`${cache}${name}/${entry.name}`, `${folder}/${entry.name}`);
  }
  return folder;
}
const lazyCopy = await compiledCopyElsewhere();
const WAYS: readonly Way[] = [
  { label: "eager", checkOnly: false, command: denoRun(here("./startup_eager.ts")) },
  { label: "mathjs", checkOnly: true, command: denoRun(here("./startup_mathjs.ts")) },
  { label: "sources", checkOnly: false, command: denoRun(here("../src/cli.ts")) },
  { label: "launcher", checkOnly: false, command: launcher({}) },
  { label: "launcher, sources", checkOnly: false, command: launcher({ FLUXNOTE_FROM_SOURCE: "1" }) },
  { label: "compiled copy, lazy", checkOnly: false, command: denoRun(`${lazyCopy}/cli.js`) },
];
const EMPTY = here("./startup_empty.ts");
const PHASES = here("./check_phases.ts");
const TEMPLATE = here("../templates/new-project/");
const CASES: { readonly label: string; readonly args: readonly string[] }[] = [
  { label: "fluxnote --version", args: ["--version"] },
  { label: "fluxnote --help", args: ["--help"] },
  { label: "fluxnote check <template>", args: ["check", TEMPLATE] },
];

/** Runs one fresh process; returns its wall-clock seconds (start-up included) and its standard output. */
async function runOnce(
  spec: { program: string; args: string[]; env?: Record<string, string> },
): Promise<{ seconds: number; stdout: string }> {
  const command = new Deno.Command(spec.program, {
    args: spec.args,
    ...(spec.env === undefined ? {} : { env: spec.env }),
    stdout: "piped",
    stderr: "null",
  });
  const start = performance.now();
  const { code, stdout } = await command.output();
  const seconds = (performance.now() - start) / 1000;
  if (code !== 0) throw new Error(`${spec.program} ${spec.args.join(" ")} exited ${code}`);
  return { seconds, stdout: new TextDecoder().decode(stdout) };
}

/** Seconds of each way, the ways taking turns run by run. */
async function timesTakingTurns(
  specs: readonly { program: string; args: string[]; env?: Record<string, string> }[],
): Promise<number[][]> {
  for (const spec of specs) await runOnce(spec); // fills the module cache (and makes the compiled copy)
  const out = specs.map(() => [] as number[]);
  for (let i = 0; i < RUNS; i++) {
    for (const [k, spec] of specs.entries()) out[k]!.push((await runOnce(spec)).seconds);
  }
  return out;
}

function print(rows: string[][]): void {
  const widths = rows[0]!.map((_, i) => Math.max(...rows.map((r) => r[i]!.length)));
  for (const r of rows) {
    console.log(
      r.map((cell, i) => (i === 0 ? cell.padEnd(widths[i]!) : cell.padStart(widths[i]!))).join("  "),
    );
  }
}

const seconds = (values: readonly number[]): string =>
  `${median(values).toFixed(3)} s (${Math.min(...values).toFixed(3)})`;
// One row per way, one column per command: "median (fastest)".
const rows: string[][] = [["way", ...CASES.map((c) => c.label)], ...WAYS.map((w) => [w.label])];
for (const c of CASES) {
  // mathjs was loaded by the unit reader: --version and --help never loaded it.
  const ways = WAYS.filter((w) => !w.checkOnly || c.args[0] === "check");
  const measured = await timesTakingTurns(ways.map((w) => w.command(c.args)));
  WAYS.forEach((w, row) => {
    const k = ways.indexOf(w);
    rows[row + 1]!.push(k < 0 ? "" : seconds(measured[k]!));
  });
}
// The floor: Deno starting and running a module that does nothing.
const [empty] = await timesTakingTurns([denoRun(EMPTY)([])]);
rows.push(["deno run <empty module>", seconds(empty!), ...CASES.slice(1).map(() => "")]);
console.log(`${RUNS} runs each, Deno ${Deno.version.deno}: median (fastest)`);
print(rows);
await Deno.remove(lazyCopy, { recursive: true });

// Where check of the template spends its time, in one process: medians in ms.
const phaseRows: string[][] = [["check <template>, ms", "import", "load", "compute", "review"]];
for (const [label, extra] of [["mathjs", ["--with-mathjs"]], ["now", []]] as const) {
  const phases = denoRun(PHASES)([TEMPLATE, ...extra]);
  await runOnce(phases);
  const samples: Record<string, number>[] = [];
  for (let i = 0; i < RUNS; i++) samples.push(JSON.parse((await runOnce(phases)).stdout));
  phaseRows.push([
    label,
    ...["import", "load", "compute", "review"].map((k) => median(samples.map((s) => s[k]!)).toFixed(0)),
  ]);
}
console.log("");
print(phaseRows);
