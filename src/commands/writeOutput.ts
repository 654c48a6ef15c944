import { faultAt } from "./environmentFault.ts";
import { basename, dirname, join } from "node:path";

/** One file of the output set, path relative to the output folder (POSIX): text (written as UTF-8) or bytes. */
export type OutputFile =
  | { readonly path: string; readonly bytes: Uint8Array }
  | { readonly path: string; readonly text: string }
  | { readonly path: string; readonly chunks: () => Iterable<string> };

/** Characters encoded per write, so a large text never needs a second full copy as bytes. */
const TEXT_CHUNK = 1 << 20;

/**
 * Replaces the output folder with a new set of files as one unit: the set is written and flushed in a
 * staging folder beside the target, then swapped in by renames, so readers see either the old set or
 * the new one, never a mix, and a failure before the swap leaves the old set untouched.
 */
export async function writeOutputSet(
  outDir: string,
  files: readonly OutputFile[],
  beforeSwap?: () => void,
): Promise<void> {
  const parent = dirname(outDir);
  const name = basename(outDir);
  await Deno.mkdir(parent, { recursive: true });
  const staging = await Deno.makeTempDir({ dir: parent, prefix: `.${name}.staging-` })
    .catch(faultAt("create a staging folder in", parent));
  try {
    await Deno.chmod(staging, 0o755);
    for (const file of files) {
      const target = join(staging, file.path);
      await Deno.mkdir(dirname(target), { recursive: true });
      using handle = await Deno.open(target, { write: true, createNew: true });
      if ("bytes" in file) await writeAll(handle, file.bytes);
      else if ("text" in file) await writeText(handle, file.text);
      else for (const chunk of file.chunks()) await writeText(handle, chunk);
      await handle.sync();
    }
    beforeSwap?.();
    await swapIn(staging, outDir, parent, name);
  } catch (cause) {
    await Deno.remove(staging, { recursive: true }).catch(() => {});
    throw cause;
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

async function swapIn(staging: string, outDir: string, parent: string, name: string): Promise<void> {
  for (let attempt = 0; attempt < 20; attempt++) {
    const retired = `${join(parent, `.${name}.retired-`)}${basename(staging).split("-").pop()}-${attempt}`;
    let hadOld = true;
    try {
      await Deno.rename(outDir, retired);
    } catch (cause) {
      if (!(cause instanceof Deno.errors.NotFound)) throw cause;
      hadOld = false;
    }
    try {
      await Deno.rename(staging, outDir);
    } catch (cause) {
      // Another build put its complete set in place between our two renames; drop the old set and retry.
      if (hadOld) await Deno.remove(retired, { recursive: true }).catch(() => {});
      if (attempt === 19) throw cause;
      continue;
    }
    if (hadOld) await Deno.remove(retired, { recursive: true }).catch(() => {});
    await syncFolder(parent);
    return;
  }
}

async function syncFolder(path: string): Promise<void> {
  try {
    using handle = await Deno.open(path, { read: true });
    await handle.sync();
  } catch {
    // Some platforms cannot open a folder for syncing; the renames are still atomic.
  }
}
