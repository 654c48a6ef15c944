/**
 * Marginal cost of one more heavy wall in `fluxnote build` as a user runs it: the launcher (bin/fluxnote, its
 * compiled copy) in fresh processes, reading the project and writing the output folder, for invented projects of
 * 41 and 121 heavy walls (scripts/heavy-walls.ts). Prints the medians of wall-clock and CPU time (user + system)
 * of the whole process and the per-wall figures (differences over the 80 added walls). bench/marginal_build.ts
 * splits the in-process part by phase. The two projects take turns run by run.
 * Run: deno run --allow-read --allow-write --allow-run --allow-env bench/marginal_command.ts [runs]
 */
import { heavyWallFiles } from "../scripts/heavy-walls.ts";
import { LAUNCHER, median, PATH_WITH_THIS_DENO as PATH } from "./launcherRuns.ts";

const RUNS = Number(Deno.args[0] ?? 5);
const COUNTS = [41, 121];

/** Seconds in the "1m2.5s" form of sh's `times`. */
const shSeconds = (text: string) => {
  const [, m, sec] = /^(\d+)m([\d.]+)s$/.exec(text)!;
  return Number(m) * 60 + Number(sec);
};

const root = await Deno.makeTempDir({ prefix: "fluxnote-marginal-" });
try {
  const projects = COUNTS.map((count) => `${root}/walls-${count}`);
  for (const [k, count] of COUNTS.entries()) {
    await Deno.mkdir(projects[k]!);
    for (const [path, bytes] of heavyWallFiles(count)) await Deno.writeFile(`${projects[k]}/${path}`, bytes);
  }
  // sh runs the launcher, then `times` prints the CPU time of its finished children (user and system).
  const run = async (project: string) => {
    const start = performance.now();
    const { code, stdout } = await new Deno.Command("sh", {
      args: [
        "-c",
        'sh "$0" build --quiet "$1" --out "$1/out" >/dev/null 2>&1 || exit 1; times',
        LAUNCHER,
        project,
      ],
      env: { PATH },
      stdout: "piped",
      stderr: "null",
    }).output();
    const wallMs = performance.now() - start;
    if (code !== 0) throw new Error(`the build of ${project} failed`);
    const [user, system] = new TextDecoder().decode(stdout).trim().split("\n").at(-1)!.split(/\s+/);
    return { wallMs, cpuMs: (shSeconds(user!) + shSeconds(system!)) * 1000 };
  };
  for (const project of projects) await run(project); // the compiled copy and the code cache
  const wall = COUNTS.map(() => [] as number[]);
  const cpu = COUNTS.map(() => [] as number[]);
  for (let i = 0; i < RUNS; i++) {
    for (const [k, project] of projects.entries()) {
      const measured = await run(project);
      wall[k]!.push(measured.wallMs);
      cpu[k]!.push(measured.cpuMs);
    }
  }
  console.log(`walls  wall-clock ms  CPU ms   (medians of ${RUNS} fresh processes)`);
  COUNTS.forEach((count, k) =>
    console.log(
      `${String(count).padStart(5)}  ${median(wall[k]!).toFixed(0).padStart(13)}  ${
        median(cpu[k]!).toFixed(0).padStart(6)
      }`,
    )
  );
  const added = COUNTS[1]! - COUNTS[0]!;
  const perWall = (series: number[][]) => ((median(series[1]!) - median(series[0]!)) / added).toFixed(1);
  console.log(`per added wall: ${perWall(wall)} ms wall-clock, ${perWall(cpu)} ms CPU`);
} finally {
  await Deno.remove(root, { recursive: true });
}
