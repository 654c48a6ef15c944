/**
 * Worker that runs one `runBuild` and stops for good at a chosen point of the output swap, after telling
 * the test it got there; the test then terminates the worker, which is what a killed build leaves (the
 * operating system releases its files and lock).
 */
import { runBuild } from "../../src/commands/build.ts";

/** Where the build stops. */
export type KillPoint = "beforeSwap" | "afterRetire";

/** What the worker is asked to do. */
export interface KilledBuildRequest {
  readonly project: string;
  readonly out: string;
  readonly killAt: KillPoint;
}

const scope = self as unknown as {
  onmessage: ((event: MessageEvent<KilledBuildRequest>) => void) | null;
  postMessage(message: string): void;
};

scope.onmessage = (event) => {
  const { project, out, killAt } = event.data;
  const stop = () => {
    scope.postMessage(killAt);
    return new Promise<void>(() => {});
  };
  const quiet = { stdout: () => {}, stderr: () => {} };
  runBuild({ project, out, [killAt]: stop }, quiet).then(
    (code) => scope.postMessage(`finished with ${code}`),
    (cause) => scope.postMessage(`failed: ${String(cause)}`),
  );
};
