/** Reads a file that must be a regular file of bounded size, without ever holding more than the bound. */

/** Largest package `verify` reads: 200 MiB (the 500-construction scale package is about 65 MB). */
export const PACKAGE_SIZE_LIMIT = 200 * 1024 * 1024;

export type BoundedRead =
  | { readonly ok: true; readonly bytes: Uint8Array }
  | { readonly ok: false; readonly reason: string };

function describe(info: Deno.FileInfo): string {
  if (info.isDirectory) return "a folder";
  if (info.isFifo === true) return "a named pipe (FIFO)";
  if (info.isCharDevice === true) return "a character device";
  if (info.isBlockDevice === true) return "a block device";
  if (info.isSocket === true) return "a socket";
  return "not a regular file";
}

function tooLarge(limit: number): string {
  return `it is larger than the limit of ${limit} bytes (${Math.round(limit / 1024 / 1024)} MiB)`;
}

/**
 * Reads `path` when it is a regular file of at most `limit` bytes. Devices, pipes and folders are refused
 * from their metadata before they are opened (so `/dev/zero` or a FIFO cannot block or flood the reader),
 * and at most `limit + 1` bytes are ever read, so a file that grows while it is read cannot exhaust memory.
 */
export async function readBoundedFile(path: string, limit: number): Promise<BoundedRead> {
  let info: Deno.FileInfo;
  try {
    info = await Deno.stat(path);
  } catch (cause) {
    return { ok: false, reason: cause instanceof Deno.errors.NotFound ? "it does not exist" : String(cause) };
  }
  if (!info.isFile) return { ok: false, reason: `it is ${describe(info)}, not a regular file` };
  if (info.size > limit) return { ok: false, reason: tooLarge(limit) };
  let file: Deno.FsFile;
  try {
    file = await Deno.open(path, { read: true });
  } catch (cause) {
    return { ok: false, reason: cause instanceof Error ? cause.message : String(cause) };
  }
  try {
    // The path may have been swapped between stat and open: check the opened file itself.
    const opened = await file.stat();
    if (!opened.isFile) return { ok: false, reason: `it is ${describe(opened)}, not a regular file` };
    const chunks: Uint8Array[] = [];
    let total = 0;
    const buffer = new Uint8Array(1024 * 1024);
    while (total <= limit) {
      const n = await file.read(buffer.subarray(0, Math.min(buffer.length, limit + 1 - total)));
      if (n === null) break;
      chunks.push(buffer.slice(0, n));
      total += n;
    }
    if (total > limit) return { ok: false, reason: tooLarge(limit) };
    const bytes = new Uint8Array(total);
    let at = 0;
    for (const chunk of chunks) {
      bytes.set(chunk, at);
      at += chunk.length;
    }
    return { ok: true, bytes };
  } catch (cause) {
    return { ok: false, reason: cause instanceof Error ? cause.message : String(cause) };
  } finally {
    file.close();
  }
}
