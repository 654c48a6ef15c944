/** The signature part of `verify`: who signed, when, and whether the signature holds for this page. */
import { type FoundSignature, keyFingerprint, signatureHolds } from "../archive/signature.ts";
import type { CommandIo } from "./commandIo.ts";

/** The public key given with `verify --key`. */
export interface ExpectedKey {
  readonly path: string;
  readonly spki: Uint8Array;
  readonly fingerprint: string;
}

/**
 * Checks the signature found in a page. Without `expected`, a signature is checked against the public key
 * the package itself carries (a forger can embed their own key, so the signer stays unproven); with it, the
 * signature must be by that key. Returns the problems found; prints what was proven on stdout.
 */
export async function signatureProblems(
  found: FoundSignature,
  expected: ExpectedKey | undefined,
  io: CommandIo,
): Promise<string[]> {
  if (found.kind === "malformed") return [`the package's signature is unreadable: ${found.reason}`];
  if (found.kind === "unsigned") {
    if (expected === undefined) return [];
    return [
      `the package carries no signature, so it cannot be proven to come from key ${expected.fingerprint} (${expected.path})`,
    ];
  }
  const { signature, unsignedPage } = found;
  if (keyFingerprint(signature.publicKey) !== signature.fingerprint) {
    return [
      `the signature's public key does not have the fingerprint ${signature.fingerprint} written beside it`,
    ];
  }
  if (expected !== undefined && expected.fingerprint !== signature.fingerprint) {
    return [
      `the package is signed by key ${signature.fingerprint}, not by key ${expected.fingerprint} given with --key (${expected.path})`,
    ];
  }
  const holds = await signatureHolds(signature, unsignedPage, expected?.spki ?? signature.publicKey);
  if (!holds) {
    return [
      `the signature by key ${signature.fingerprint} does not match the package content: it was altered after signing`,
    ];
  }
  io.stdout(
    expected === undefined
      ? `signature: by key ${signature.fingerprint} at ${signature.signedAt}; it matches the public key the ` +
        `package carries, but who signed is unproven (give the signer's public key with --key)`
      : `signed by key ${signature.fingerprint} at ${signature.signedAt}, checked with ${expected.path}`,
  );
  return [];
}
