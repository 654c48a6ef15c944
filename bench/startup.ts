/**
 * Start-up time of the command line, side by side for three ways of starting: each command is run as a fresh
 * `deno run` process (warm module cache; one unmeasured run first) and the median and the fastest of the runs
 * are printed. "eager" is bench/startup_eager.ts (every command module loaded first, as src/cli.ts did before
 * per-command loading), "mathjs" is bench/startup_mathjs.ts (mathjs's single-file build loaded first, as the
 * unit reader did before our own; `check` only), "now" is src/cli.ts. Then where `check` of the template spends its time
 * (bench/check_phases.ts, medians in ms): loading modules, reading, computing, reviewing. Not a test: figures
 * depend on the machine and its load.
 *
 *   npx -y deno@2.9.6 run --allow-read --allow-run bench/startup.ts [runs]
 */
import { fileURLToPath as fromFileUrl } from "node:url";

const RUNS = Number(Deno.args[0] ?? "15");
const here = (path: string): string => fromFileUrl(new URL(path, import.meta.url));
const COLUMNS = [
  { label: "eager", entry: here("./startup_eager.ts"), checkOnly: false },
  { label: "mathjs", entry: here("./startup_mathjs.ts"), checkOnly: true },
  { label: "now", entry: here("../src/cli.ts"), checkOnly: false },
];
const EMPTY = here("./startup_empty.ts");
const PHASES = here("./check_phases.ts");
const CONFIG = here("../deno.json");
const TEMPLATE = here("../templates/new-project/");
const CASES: { readonly label: string; readonly args: readonly string[] }[] = [
  { label: "fluxnote --version", args: ["--version"] },
  { label: "fluxnote --help", args: ["--help"] },
  { label: "fluxnote check <template>", args: ["check", TEMPLATE] },
];

/** Runs one fresh process; returns its wall-clock seconds (start-up included) and its standard output. */
async function runOnce(entry: string, args: readonly string[]): Promise<{ seconds: number; stdout: string }> {
  const command = new Deno.Command(Deno.execPath(), {
    args: ["run", "--quiet", "--no-prompt", "--config", CONFIG, "--allow-read", entry, ...args],
    stdout: "piped",
    stderr: "null",
  });
  const start = performance.now();
  const { code, stdout } = await command.output();
  const seconds = (performance.now() - start) / 1000;
  if (code !== 0) throw new Error(`${entry} ${args.join(" ")} exited ${code}`);
  return { seconds, stdout: new TextDecoder().decode(stdout) };
}

async function times(entry: string, args: readonly string[]): Promise<number[]> {
  await runOnce(entry, args); // fills the module cache
  const out: number[] = [];
  for (let i = 0; i < RUNS; i++) out.push((await runOnce(entry, args)).seconds);
  return out;
}

function median(values: readonly number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  const mid = Math.floor(sorted.length / 2);
  return sorted.length % 2 === 1 ? sorted[mid]! : (sorted[mid - 1]! + sorted[mid]!) / 2;
}

function print(rows: string[][]): void {
  const widths = rows[0]!.map((_, i) => Math.max(...rows.map((r) => r[i]!.length)));
  for (const r of rows) {
    console.log(
      r.map((cell, i) => (i === 0 ? cell.padEnd(widths[i]!) : cell.padStart(widths[i]!))).join("  "),
    );
  }
}

const seconds = (values: readonly number[]): string[] => [
  `${median(values).toFixed(3)} s`,
  `${Math.min(...values).toFixed(3)} s`,
];
const rows: string[][] = [["command", ...COLUMNS.flatMap((c) => [`${c.label} median`, `${c.label} min`])]];
for (const c of CASES) {
  const figures: string[] = [c.label];
  for (const column of COLUMNS) {
    // mathjs was loaded by the unit reader: --version and --help never loaded it.
    const applies = !column.checkOnly || c.args[0] === "check";
    figures.push(...(applies ? seconds(await times(column.entry, c.args)) : ["", ""]));
  }
  rows.push(figures);
}
// The floor: Deno starting and running a module that does nothing.
rows.push(["deno run <empty module>", ...seconds(await times(EMPTY, [])), "", "", "", ""]);
console.log(`${RUNS} runs each, Deno ${Deno.version.deno}`);
print(rows);

// Where check of the template spends its time, in one process: medians in ms.
const phaseRows: string[][] = [["check <template>, ms", "import", "load", "compute", "review"]];
for (const [label, extra] of [["mathjs", ["--with-mathjs"]], ["now", []]] as const) {
  await runOnce(PHASES, [TEMPLATE, ...extra]);
  const samples: Record<string, number>[] = [];
  for (let i = 0; i < RUNS; i++) {
    samples.push(JSON.parse((await runOnce(PHASES, [TEMPLATE, ...extra])).stdout));
  }
  phaseRows.push([
    label,
    ...["import", "load", "compute", "review"].map((k) => median(samples.map((s) => s[k]!)).toFixed(0)),
  ]);
}
console.log("");
print(phaseRows);
