import { faultAt } from "./environmentFault.ts";
import { basename, dirname, join } from "node:path";
import { inspectOutputFolder, OUTPUT_MARKER, outputMarkerText } from "./outputFolder.ts";

/** One file of the output set, path relative to the output folder (POSIX): text (written as UTF-8) or bytes. */
export type OutputFile =
  | { readonly path: string; readonly bytes: Uint8Array }
  | { readonly path: string; readonly text: string }
  | { readonly path: string; readonly chunks: () => Iterable<string> };

/** Characters encoded per write, so a large text never needs a second full copy as bytes. */
const TEXT_CHUNK = 1 << 20;

/** Test hooks: called at the two points where a killed build could stop; may wait. */
export interface WriteHooks {
  /** The new set is complete in its staging folder; the target is untouched. */
  readonly beforeSwap?: () => void | Promise<void>;
  /** The old set has been moved aside; the new set is not yet in place. */
  readonly afterRetire?: () => void | Promise<void>;
}

/** What the marker of a set records besides its file list. */
export interface SetIdentity {
  readonly tool: string;
  /** SHA-256 of the inputs (results.json `inputs.sha256`). */
  readonly inputs: string;
}

/** The target holds something fluxnote will not replace; nothing was changed. */
export class OutputRefused extends Error {
  constructor(readonly folder: string, readonly reason: string) {
    super(`refusing to write to "${folder}": ${reason}`);
  }
}

/**
 * Replaces the output folder with a new set of files as one unit: the set is written and flushed in a
 * staging folder beside the target, marker first, then swapped in by renames, so readers see either the
 * old set or the new one, never a mix, and a failure before the swap leaves the old set untouched.
 * The target is replaced only when it is absent, empty or an output set that fluxnote wrote (see
 * `inspectOutputFolder`); otherwise `OutputRefused` is thrown and nothing is changed. Builds into one
 * parent folder take turns (a lock on that folder), so staging and retired folders found beside the
 * target belong to a build that was killed; the first build that completes afterwards removes those that
 * are recognisably fluxnote's.
 */
export async function writeOutputSet(
  outDir: string,
  files: readonly OutputFile[],
  identity: SetIdentity,
  hooks: WriteHooks = {},
): Promise<void> {
  const parent = dirname(outDir);
  const name = basename(outDir);
  await Deno.mkdir(parent, { recursive: true });
  using lock = await lockFolder(parent);
  const verdict = await inspectOutputFolder(outDir);
  if (verdict.kind === "refused") throw new OutputRefused(outDir, verdict.reason);
  const staging = await Deno.makeTempDir({ dir: parent, prefix: `.${name}.staging-` })
    .catch(faultAt("create a staging folder in", parent));
  try {
    await Deno.chmod(staging, 0o755);
    const marker = outputMarkerText(identity.tool, identity.inputs, files.map((f) => f.path));
    const flushes = new FileFlushes();
    try {
      for (const file of [{ path: OUTPUT_MARKER, text: marker }, ...files]) {
        const target = join(staging, file.path);
        await Deno.mkdir(dirname(target), { recursive: true });
        const handle = await Deno.open(target, { write: true, createNew: true });
        try {
          if ("bytes" in file) await writeAll(handle, file.bytes);
          else if ("text" in file) await writeText(handle, file.text);
          else for (const chunk of file.chunks()) await writeText(handle, chunk);
        } catch (cause) {
          handle.close();
          throw cause;
        }
        await flushes.add(handle);
      }
    } finally {
      await flushes.settled();
    }
    flushes.throwFailure();
    await hooks.beforeSwap?.();
    await swapIn(
      staging,
      outDir,
      `${join(parent, `.${name}.retired-`)}${basename(staging).split("-").pop()}`,
      hooks,
    );
  } catch (cause) {
    await Deno.remove(staging, { recursive: true }).catch(() => {});
    throw cause;
  }
  await syncFolder(parent);
  // Without the lock a staging folder beside the target may be another build's, still being written.
  if (lock.held) await removeLeftovers(parent, name);
}

/** Flushes to disk running at once: a build of many constructions writes one CSV file for each. */
const FLUSHES_AT_ONCE = 16;

/**
 * Written files being flushed to disk (fsync) and closed, several at once while the next files are written: each
 * flush waits on the disk, and the file system can commit those that overlap together. Every file is flushed
 * before the set is swapped in, as it was when each waited for its own flush.
 */
class FileFlushes {
  #running: Promise<void>[] = [];
  #failure: { cause: unknown } | undefined;

  /** Starts flushing and closing a written file; waits first while `FLUSHES_AT_ONCE` are running. */
  async add(handle: Deno.FsFile): Promise<void> {
    if (this.#running.length >= FLUSHES_AT_ONCE) await this.#running.shift();
    this.#running.push(
      handle.sync().catch((cause) => void (this.#failure ??= { cause })).finally(() => handle.close()),
    );
  }

  /** Waits for every flush started (they never reject: a failure is kept for `throwFailure`). */
  async settled(): Promise<void> {
    await Promise.all(this.#running);
    this.#running = [];
  }

  /** Throws the first flush failure, if any. */
  throwFailure(): void {
    if (this.#failure !== undefined) throw this.#failure.cause;
  }
}

async function writeText(handle: Deno.FsFile, text: string): Promise<void> {
  const encoder = new TextEncoder();
  for (let start = 0; start < text.length; start += TEXT_CHUNK) {
    let end = Math.min(start + TEXT_CHUNK, text.length);
    // Keep a surrogate pair together so each chunk is valid UTF-16.
    const last = text.charCodeAt(end - 1);
    if (end < text.length && last >= 0xd800 && last <= 0xdbff) end--;
    await writeAll(handle, encoder.encode(text.slice(start, end)));
  }
}

async function writeAll(handle: Deno.FsFile, bytes: Uint8Array): Promise<void> {
  let offset = 0;
  while (offset < bytes.length) offset += await handle.write(bytes.subarray(offset));
}

/**
 * Moves the old set aside, checks once more that what was moved is replaceable (it is now out of anyone
 * else's reach), puts the new set in place and removes the old one. A refused folder is moved back.
 */
async function swapIn(staging: string, outDir: string, retired: string, hooks: WriteHooks): Promise<void> {
  let hadOld = true;
  try {
    await Deno.rename(outDir, retired);
  } catch (cause) {
    if (!(cause instanceof Deno.errors.NotFound)) throw cause;
    hadOld = false;
  }
  if (hadOld) {
    const verdict = await inspectOutputFolder(retired);
    if (verdict.kind === "refused") {
      await Deno.rename(retired, outDir);
      throw new OutputRefused(outDir, verdict.reason);
    }
  }
  await hooks.afterRetire?.();
  try {
    await Deno.rename(staging, outDir);
  } catch (cause) {
    if (hadOld) await Deno.rename(retired, outDir).catch(() => {});
    throw cause;
  }
  // The new set is in place; an old set that cannot be removed now is removed by the next build.
  if (hadOld) await Deno.remove(retired, { recursive: true }).catch(() => {});
}

/** Removes staging and retired folders of killed builds of this target that are recognisably fluxnote's. */
async function removeLeftovers(parent: string, name: string): Promise<void> {
  const prefixes = [`.${name}.staging-`, `.${name}.retired-`];
  const found: string[] = [];
  for await (const entry of Deno.readDir(parent)) {
    if (entry.isDirectory && prefixes.some((p) => entry.name.startsWith(p))) found.push(entry.name);
  }
  for (const leftover of found) {
    const path = join(parent, leftover);
    if (await isFluxnoteLeftover(path)) await Deno.remove(path, { recursive: true }).catch(() => {});
  }
}

/** A leftover is fluxnote's when it is a replaceable folder, or holds only a marker (killed while writing it). */
async function isFluxnoteLeftover(path: string): Promise<boolean> {
  const verdict = await inspectOutputFolder(path);
  if (verdict.kind === "replaceable") return true;
  if (verdict.kind === "absent") return false;
  try {
    const entries = [];
    for await (const entry of Deno.readDir(path)) entries.push(entry);
    return entries.length === 1 && entries[0]?.name === OUTPUT_MARKER && entries[0].isFile;
  } catch {
    return false;
  }
}

/** A lock on a folder; `held` is false where the platform could not take it. */
interface FolderLock extends Disposable {
  readonly held: boolean;
}

/**
 * Takes an exclusive lock on a folder, waiting while another build holds it; released when disposed, and
 * by the operating system when a process is killed. Where a folder cannot be opened for locking
 * (Windows), builds into one folder do not wait for each other and leftovers are not removed.
 */
async function lockFolder(path: string): Promise<FolderLock> {
  const none = { held: false, [Symbol.dispose]: () => {} };
  let handle: Deno.FsFile;
  try {
    handle = await Deno.open(path, { read: true });
  } catch {
    return none;
  }
  try {
    await handle.lock(true);
  } catch {
    handle.close();
    return none;
  }
  return { held: true, [Symbol.dispose]: () => handle.close() };
}

async function syncFolder(path: string): Promise<void> {
  try {
    using handle = await Deno.open(path, { read: true });
    await handle.sync();
  } catch {
    // Some platforms cannot open a folder for syncing; the renames are still atomic.
  }
}
