import { basename, dirname, join } from "node:path";

/** One file of the output set, path relative to the output folder (POSIX). */
export interface OutputFile {
  readonly path: string;
  readonly bytes: Uint8Array;
}

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
  const staging = await Deno.makeTempDir({ dir: parent, prefix: `.${name}.staging-` });
  try {
    await Deno.chmod(staging, 0o755);
    for (const file of files) {
      const target = join(staging, file.path);
      await Deno.mkdir(dirname(target), { recursive: true });
      using handle = await Deno.open(target, { write: true, createNew: true });
      await writeAll(handle, file.bytes);
      await handle.sync();
    }
    beforeSwap?.();
    await swapIn(staging, outDir, parent, name);
  } catch (cause) {
    await Deno.remove(staging, { recursive: true }).catch(() => {});
    throw cause;
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
