/**
 * Where `fluxnote check <project>` spends its time in one fresh process: loading the modules it needs, reading
 * the project, computing it and reviewing it. Prints one JSON line of milliseconds; bench/startup.ts runs it
 * in fresh processes and prints the medians.
 *
 * `--with-mathjs` loads mathjs's single-file build first, as src/project/quantity.ts did before our own unit
 * reader, so the two can be compared on one tree.
 *
 *   npx -y deno@2.9.6 run --allow-read bench/check_phases.ts <project folder> [--with-mathjs]
 */
const started = performance.now();
if (Deno.args.includes("--with-mathjs")) await import("mathjs/lib/browser/math.js");
(await import("../src/project/readerLibraries.ts")).deferReaderLibraries(); // as src/cli.ts does for check
const { loadProject } = await import("../src/commands/loadProject.ts");
const { computeProject } = await import("../src/results/buildResults.ts");
const { reviewProject } = await import("../src/review/mod.ts");
const imported = performance.now();
const loaded = await loadProject(Deno.args.find((a) => !a.startsWith("--")) ?? "templates/new-project");
const read = performance.now();
const computed = loaded.model === undefined
  ? undefined
  : computeProject(loaded.model, loaded.inputRecords, loaded.dataTexts, undefined, { packageParts: false });
const done = performance.now();
if (loaded.model !== undefined) {
  reviewProject(loaded.model, computed?.ok ? computed.computed.results : undefined);
}
const reviewed = performance.now();
console.log(JSON.stringify({
  import: imported - started,
  load: read - imported,
  compute: done - read,
  review: reviewed - done,
}));
