/**
 * Start-up time of the command line, before and after per-command loading, side by side: each command is
 * run as a fresh `deno run` process (warm module cache; one unmeasured run first) and the median and the
 * fastest of the runs are printed. "before" is bench/startup_eager.ts (every command module loaded first,
 * as src/cli.ts did), "after" is src/cli.ts. Not a test: figures depend on the machine and its load.
 *
 *   npx -y deno@2.9.6 run --allow-read --allow-run bench/startup.ts [runs]
 */
import { fileURLToPath as fromFileUrl } from "node:url";

const RUNS = Number(Deno.args[0] ?? "15");
const ENTRIES = {
  before: fromFileUrl(new URL("./startup_eager.ts", import.meta.url)),
  after: fromFileUrl(new URL("../src/cli.ts", import.meta.url)),
  empty: fromFileUrl(new URL("./startup_empty.ts", import.meta.url)),
};
const CONFIG = fromFileUrl(new URL("../deno.json", import.meta.url));
const TEMPLATE = fromFileUrl(new URL("../templates/new-project/", import.meta.url));
const CASES: { readonly label: string; readonly args: readonly string[] }[] = [
  { label: "fluxnote --version", args: ["--version"] },
  { label: "fluxnote --help", args: ["--help"] },
  { label: "fluxnote check <template>", args: ["check", TEMPLATE] },
];

/** Wall-clock seconds of one run (the process's whole life, start-up included). */
async function timeOnce(entry: string, args: readonly string[]): Promise<number> {
  const command = new Deno.Command(Deno.execPath(), {
    args: ["run", "--quiet", "--no-prompt", "--config", CONFIG, "--allow-read", entry, ...args],
    stdout: "null",
    stderr: "null",
  });
  const start = performance.now();
  const { code } = await command.output();
  const seconds = (performance.now() - start) / 1000;
  if (code !== 0) throw new Error(`${entry} ${args.join(" ")} exited ${code}`);
  return seconds;
}

function median(values: readonly number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  const mid = Math.floor(sorted.length / 2);
  return sorted.length % 2 === 1 ? sorted[mid]! : (sorted[mid - 1]! + sorted[mid]!) / 2;
}

const rows: string[][] = [["command", "before median", "before min", "after median", "after min"]];
for (const c of CASES) {
  const figures: string[] = [c.label];
  for (const entry of [ENTRIES.before, ENTRIES.after]) {
    await timeOnce(entry, c.args); // fills the module cache
    const times: number[] = [];
    for (let i = 0; i < RUNS; i++) times.push(await timeOnce(entry, c.args));
    figures.push(`${median(times).toFixed(3)} s`, `${Math.min(...times).toFixed(3)} s`);
  }
  rows.push(figures);
}
// The floor: Deno starting and running a module that does nothing.
const floor: number[] = [];
await timeOnce(ENTRIES.empty, []);
for (let i = 0; i < RUNS; i++) floor.push(await timeOnce(ENTRIES.empty, []));
rows.push([
  "deno run <empty module>",
  `${median(floor).toFixed(3)} s`,
  `${Math.min(...floor).toFixed(3)} s`,
  "",
  "",
]);
const widths = rows[0]!.map((_, i) => Math.max(...rows.map((r) => r[i]!.length)));
console.log(`${RUNS} runs each, Deno ${Deno.version.deno}`);
for (const r of rows) {
  console.log(r.map((cell, i) => (i === 0 ? cell.padEnd(widths[i]!) : cell.padStart(widths[i]!))).join("  "));
}
