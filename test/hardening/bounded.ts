/** Test helpers for the hardening suite: builds run under a time bound, and temp folders. */
import type { BuildReport, BuildRequest } from "./buildWorker.ts";

export type { BuildReport } from "./buildWorker.ts";

/** Time bound for one build of a small hostile project, ms (generous: CI machines are shared). */
export const BUILD_TIME_LIMIT_MS = 30_000;
/** Time bound for the worker's start-up (loading and type-checking every module), ms; not counted as build time. */
const WORKER_START_LIMIT_MS = 180_000;

/**
 * Runs builds one at a time in a worker and rejects a build that has not finished within its time
 * bound; the worker is then terminated (a synchronous loop cannot be interrupted otherwise), so a
 * hang fails its test instead of stalling the suite. One worker serves many builds: starting one
 * costs most of a second.
 */
export class BoundedBuilds {
  #worker: Worker | undefined;

  /** Starts a worker and waits until its modules are loaded, so a build's time bound counts the build alone. */
  async #started(): Promise<Worker> {
    if (this.#worker !== undefined) return this.#worker;
    const worker = new Worker(new URL("./buildWorker.ts", import.meta.url).href, { type: "module" });
    this.#worker = worker;
    let timer: ReturnType<typeof setTimeout> | undefined;
    try {
      await new Promise<void>((resolve, reject) => {
        timer = setTimeout(() => {
          this.close();
          reject(new Error(`the build worker did not start within ${WORKER_START_LIMIT_MS} ms`));
        }, WORKER_START_LIMIT_MS);
        worker.onmessage = () => resolve();
        worker.onerror = (event) => {
          event.preventDefault();
          this.close();
          reject(new Error(`the build worker failed to start: ${event.message}`));
        };
      });
    } finally {
      clearTimeout(timer);
    }
    return worker;
  }

  /** Builds `request.project` into `request.out`; rejects after `limitMs` (worker start-up not counted). */
  async build(request: BuildRequest, limitMs = BUILD_TIME_LIMIT_MS): Promise<BuildReport> {
    const worker = await this.#started();
    let timer: ReturnType<typeof setTimeout> | undefined;
    try {
      return await new Promise<BuildReport>((resolve, reject) => {
        timer = setTimeout(() => {
          this.close();
          reject(new Error(`the build of ${request.project} did not finish within ${limitMs} ms`));
        }, limitMs);
        worker.onmessage = (event: MessageEvent<BuildReport>) => resolve(event.data);
        worker.onerror = (event) => {
          event.preventDefault();
          this.close();
          reject(new Error(`the build worker failed: ${event.message}`));
        };
        worker.postMessage(request);
      });
    } finally {
      clearTimeout(timer);
    }
  }

  /** Stops the worker; a later build starts a new one. */
  close(): void {
    this.#worker?.terminate();
    this.#worker = undefined;
  }
}

/** Copies a folder tree (files and folders only) into `to`. */
export function copyTree(from: string, to: string, filter: (path: string) => boolean = () => true): void {
  Deno.mkdirSync(to, { recursive: true });
  for (const entry of Deno.readDirSync(from)) {
    const source = `${from}/${entry.name}`;
    if (!filter(source)) continue;
    if (entry.isDirectory) copyTree(source, `${to}/${entry.name}`, filter);
    else if (entry.isFile) Deno.copyFileSync(source, `${to}/${entry.name}`);
  }
}

/** Names of the entries of a folder, sorted. */
export function listing(folder: string): string[] {
  return [...Deno.readDirSync(folder)].map((e) => e.name).sort();
}
