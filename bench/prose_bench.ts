/**
 * Prose worst cases at the 1 MiB file limit: `npx -y deno@2.9.6 bench --allow-read --allow-env=LOG_TOKENS,LOG_STREAM bench/prose_bench.ts`.
 * Each case is project.md of a small valid project filled to 1 MiB with one shape of prose, read from
 * memory through the same reader as a folder. "check" is read, resolve, compute and review; "build"
 * is read, resolve, compute and render the package (what `build` does before writing). Budget: 5 s a
 * case for either path (issue 10, item 12); before the fixes, 128 KiB of some of these took minutes.
 */
import { loadProject } from "../src/commands/loadProject.ts";
import { produceOutputs } from "../src/commands/produce.ts";
import { MAX_MARKDOWN_BYTES } from "../src/project/readProject.ts";
import { memoryProjectFs } from "../src/project/projectFs.ts";
import { computeProject } from "../src/results/buildResults.ts";
import { reviewProject } from "../src/review/mod.ts";
import { hostileProjectFiles } from "../test/hardening/hostileProject.ts";

/** `unit` repeated to fill what is left of a 1 MiB project.md after the project's own text. */
function fill(unit: string, room: number): string {
  return unit.repeat(Math.floor(room / unit.length));
}

function nestedList(levels: number): string {
  let text = "";
  for (let i = 0; i < levels; i++) text += `${"  ".repeat(i)}- a\n`;
  return text;
}

/** Prose shapes: name → text of at most `room` bytes. */
const CASES: Record<string, (room: number) => string> = {
  "repeated identical headings": (room) => fill("# Same heading\n\n", room),
  "`# h` lines": (room) => fill("# h\n", room),
  "`_a` run": (room) => fill("_a", room),
  "`*a` run": (room) => fill("*a", room),
  "`**a` run": (room) => fill("**a", room),
  "flat list": (room) => fill("- a\n", room),
  "lists nested 32 deep, repeated": (room) => fill(nestedList(32) + "\n", room),
  "quotes nested 32 deep, repeated": (room) => fill("> ".repeat(32) + "a\n", room),
  "emphasis nested 64 deep, repeated": (room) =>
    fill("*a ".repeat(64) + "b" + " a*".repeat(64) + "\n\n", room),
  "1,000-level nested list (refused)": () => nestedList(1000),
  "quotes nested 3,000 deep (refused)": () => "> ".repeat(3000) + "a\n",
};

const encoder = new TextEncoder();

function projectFs(prose: (room: number) => string) {
  const files = hostileProjectFiles({});
  const base = files["project.md"] ?? "";
  files["project.md"] = `${base}\n${prose(MAX_MARKDOWN_BYTES - encoder.encode(base).length - 2)}\n`;
  return memoryProjectFs(
    "bench",
    new Map(Object.entries(files).map(([path, text]) => [path, encoder.encode(text)])),
  );
}

for (const [name, prose] of Object.entries(CASES)) {
  const fs = projectFs(prose);
  Deno.bench(`check: ${name}`, { group: "check", n: 1, warmup: 0 }, async () => {
    const loaded = await loadProject(fs);
    if (loaded.model === undefined) return;
    const computed = computeProject(loaded.model, loaded.inputRecords, loaded.dataTexts);
    reviewProject(loaded.model, computed.ok ? computed.computed.results : undefined);
  });
  Deno.bench(`build: ${name}`, { group: "build", n: 1, warmup: 0 }, async () => {
    produceOutputs(await loadProject(fs));
  });
}
