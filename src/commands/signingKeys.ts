/** Key files for package signatures: `keygen`, and reading the keys `build --sign` and `verify --key` name. */
import {
  importPublicKey,
  importSigner,
  keyFingerprint,
  pemDecode,
  pemEncode,
  type Signer,
} from "../archive/signature.ts";
import type { CommandIo } from "./commandIo.ts";
import { readBoundedFile } from "./readBounded.ts";

/** Key files are a few hundred bytes; anything above this is not one. */
const KEY_FILE_LIMIT = 64 * 1024;

export type KeyOutcome<T> = { readonly ok: true; readonly key: T } | {
  readonly ok: false;
  readonly reason: string;
};

async function readPem(path: string, label: string, what: string): Promise<KeyOutcome<Uint8Array>> {
  const read = await readBoundedFile(path, KEY_FILE_LIMIT);
  if (!read.ok) return { ok: false, reason: `cannot read the ${what} "${path}": ${read.reason}` };
  const text = new TextDecoder().decode(read.bytes);
  const der = pemDecode(text, label);
  if (der === undefined) {
    const other = label === "PUBLIC KEY" ? "PRIVATE KEY" : "PUBLIC KEY";
    const hint = pemDecode(text, other) === undefined
      ? `give the .${label === "PUBLIC KEY" ? "public" : "private"}.pem file written by "fluxnote keygen"`
      : `it holds a ${other.toLowerCase()}; give the .${
        label === "PUBLIC KEY" ? "public" : "private"
      }.pem file`;
    return { ok: false, reason: `the ${what} "${path}" has no "-----BEGIN ${label}-----" block: ${hint}` };
  }
  return { ok: true, key: der };
}

/** Reads a PKCS#8 PEM Ed25519 private key for `build --sign`. */
export async function readSigner(path: string): Promise<KeyOutcome<Signer>> {
  const pem = await readPem(path, "PRIVATE KEY", "private key file");
  if (!pem.ok) return pem;
  const signer = await importSigner(pem.key);
  return signer === undefined
    ? { ok: false, reason: `the private key file "${path}" does not hold an Ed25519 key` }
    : { ok: true, key: signer };
}

/** Reads an SPKI PEM Ed25519 public key for `verify --key`: its DER bytes and fingerprint. */
export async function readPublicKey(
  path: string,
): Promise<KeyOutcome<{ readonly spki: Uint8Array; readonly fingerprint: string }>> {
  const pem = await readPem(path, "PUBLIC KEY", "public key file");
  if (!pem.ok) return pem;
  if (await importPublicKey(pem.key) === undefined) {
    return { ok: false, reason: `the public key file "${path}" does not hold an Ed25519 key` };
  }
  return { ok: true, key: { spki: pem.key, fingerprint: keyFingerprint(pem.key) } };
}

async function exists(path: string): Promise<boolean> {
  try {
    await Deno.lstat(path);
    return true;
  } catch {
    return false;
  }
}

/** Writes `<name>.private.pem` (mode 0600) and `<name>.public.pem`; never overwrites. Exit code. */
export async function runKeygen(name: string, io: CommandIo): Promise<number> {
  const privatePath = `${name}.private.pem`;
  const publicPath = `${name}.public.pem`;
  for (const path of [privatePath, publicPath]) {
    if (await exists(path)) {
      io.stderr(`fluxnote keygen: "${path}" already exists; nothing was written (choose another name)`);
      return 2;
    }
  }
  const pair = await crypto.subtle.generateKey({ name: "Ed25519" }, true, [
    "sign",
    "verify",
  ]) as CryptoKeyPair;
  const pkcs8 = new Uint8Array(await crypto.subtle.exportKey("pkcs8", pair.privateKey));
  const spki = new Uint8Array(await crypto.subtle.exportKey("spki", pair.publicKey));
  try {
    await Deno.writeTextFile(privatePath, pemEncode("PRIVATE KEY", pkcs8), { createNew: true, mode: 0o600 });
  } catch (cause) {
    io.stderr(
      `fluxnote keygen: cannot write "${privatePath}": ${cause instanceof Error ? cause.message : cause}`,
    );
    return 2;
  }
  try {
    await Deno.writeTextFile(publicPath, pemEncode("PUBLIC KEY", spki), { createNew: true });
  } catch (cause) {
    await Deno.remove(privatePath);
    io.stderr(
      `fluxnote keygen: cannot write "${publicPath}": ${cause instanceof Error ? cause.message : cause}`,
    );
    return 2;
  }
  io.stdout(
    `wrote ${privatePath} (keep it secret; mode 0600) and ${publicPath} (give it to whoever verifies)`,
  );
  io.stdout(`key fingerprint ${keyFingerprint(spki)}`);
  return 0;
}
