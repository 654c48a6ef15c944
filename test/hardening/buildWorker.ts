/**
 * Worker that runs one `runBuild` and posts what it printed, so a test can stop a build that hangs
 * (a synchronous loop cannot be interrupted in the test's own thread; a worker can be terminated).
 */
import { runBuild } from "../../src/commands/build.ts";

/** What the worker is asked to do. */
export interface BuildRequest {
  readonly project: string;
  readonly out: string;
}

/** What the worker reports: the exit code, the printed lines, and the stack of anything thrown. */
export interface BuildReport {
  readonly code: number | undefined;
  readonly stdout: readonly string[];
  readonly stderr: readonly string[];
  readonly thrown?: string;
}

const scope = self as unknown as {
  onmessage: ((event: MessageEvent<BuildRequest>) => void) | null;
  postMessage(message: BuildReport | { readonly ready: true }): void;
};

scope.onmessage = async (event) => {
  const stdout: string[] = [];
  const stderr: string[] = [];
  try {
    const code = await runBuild(event.data, { stdout: (l) => stdout.push(l), stderr: (l) => stderr.push(l) });
    scope.postMessage({ code, stdout, stderr });
  } catch (cause) {
    const thrown = cause instanceof Error ? cause.stack ?? String(cause) : String(cause);
    scope.postMessage({ code: undefined, stdout, stderr, thrown });
  }
};

// Loading and type-checking the modules above is start-up, not build time: say when it is done.
scope.postMessage({ ready: true });
