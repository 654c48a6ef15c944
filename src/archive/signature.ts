/**
 * Ed25519 signatures of packages (WebCrypto). The signature covers the whole page text with the signature
 * element removed (results JSON, every embedded input and library entry, and every visible number), plus
 * the signer's key fingerprint and the signing time, so recomputing the embedded hashes does not help a
 * forger. Keys are PEM files: PKCS#8 for the private key, SubjectPublicKeyInfo for the public key.
 */
import { encodeBase64 } from "./base64.ts";
import { decodeBase64 } from "./base64Decode.ts";
import { sha256Hex } from "./hash.ts";

export const SIGNATURE_SCHEME = "fluxnote-signature/1";
const ED25519 = { name: "Ed25519" } as const;

/** A signature as embedded in a package. */
export interface EmbeddedSignature {
  /** SHA-256 of the signer's public key (SPKI DER), lowercase hex. */
  readonly fingerprint: string;
  /** UTC, whole seconds: 2031-01-15T09:30:00Z. */
  readonly signedAt: string;
  /** The signer's public key, SPKI DER. */
  readonly publicKey: Uint8Array;
  /** 64 bytes. */
  readonly signature: Uint8Array;
}

/** The key fingerprint printed by `keygen`, `build --sign` and `verify`. */
export function keyFingerprint(spki: Uint8Array): string {
  return sha256Hex(spki);
}

/** Wraps DER bytes as PEM (RFC 7468) with the given label, e.g. "PUBLIC KEY". */
export function pemEncode(label: string, der: Uint8Array): string {
  return `-----BEGIN ${label}-----\n${encodeBase64(der, 64)}\n-----END ${label}-----\n`;
}

/** Unwraps the first PEM block with `label`; undefined when there is none or its base64 is broken. */
export function pemDecode(text: string, label: string): Uint8Array | undefined {
  const match = new RegExp(`-----BEGIN ${label}-----([A-Za-z0-9+/=\\s]*)-----END ${label}-----`).exec(text);
  if (match === null) return undefined;
  const bytes = decodeBase64((match[1] ?? "").replace(/\s/g, ""));
  return bytes === undefined || bytes.length === 0 ? undefined : bytes;
}

/** Imports an SPKI public key; undefined when the bytes are not an Ed25519 public key. */
export async function importPublicKey(spki: Uint8Array): Promise<CryptoKey | undefined> {
  try {
    return await crypto.subtle.importKey("spki", spki as BufferSource, ED25519, true, ["verify"]);
  } catch {
    return undefined;
  }
}

/** A private key ready to sign, with its public key (SPKI) and fingerprint. */
export interface Signer {
  readonly privateKey: CryptoKey;
  readonly publicKey: Uint8Array;
  readonly fingerprint: string;
}

/** Imports a PKCS#8 Ed25519 private key and derives its public key; undefined when it is not one. */
export async function importSigner(pkcs8: Uint8Array): Promise<Signer | undefined> {
  try {
    const privateKey = await crypto.subtle.importKey("pkcs8", pkcs8 as BufferSource, ED25519, true, ["sign"]);
    const jwk = await crypto.subtle.exportKey("jwk", privateKey);
    if (jwk.x === undefined) return undefined;
    const pub = await crypto.subtle.importKey(
      "jwk",
      { kty: "OKP", crv: "Ed25519", x: jwk.x },
      ED25519,
      true,
      [
        "verify",
      ],
    );
    const publicKey = new Uint8Array(await crypto.subtle.exportKey("spki", pub));
    return { privateKey, publicKey, fingerprint: keyFingerprint(publicKey) };
  } catch {
    return undefined;
  }
}

/** The exact bytes signed: scheme, fingerprint and time on their own lines, then the unsigned page. */
function signedMessage(unsignedPage: string, fingerprint: string, signedAt: string): Uint8Array<ArrayBuffer> {
  return new TextEncoder().encode(
    `${SIGNATURE_SCHEME}\nkey ${fingerprint}\nsigned-at ${signedAt}\n\n${unsignedPage}`,
  );
}

const START = '<section class="package-signature"';
const ANCHOR = '    <p class="end-marker">';

/** The signature element, one line; its visible sentence says what it is and what proves it. */
function signatureElement(s: EmbeddedSignature): string {
  return `${START} data-scheme="${SIGNATURE_SCHEME}" data-key="${s.fingerprint}" data-signed-at="${s.signedAt}" ` +
    `data-public-key="${encodeBase64(s.publicKey, 0)}" data-signature="${encodeBase64(s.signature, 0)}">` +
    `<p>Signed with the Ed25519 key of fingerprint <span class="hash">${s.fingerprint}</span> at ${s.signedAt}. ` +
    `The signature covers this whole page; only <code>fluxnote verify --key</code> with the signer's public key ` +
    `proves who signed.</p></section>\n`;
}

const ELEMENT = new RegExp(
  `^${START} data-scheme="${SIGNATURE_SCHEME}" data-key="([0-9a-f]{64})" ` +
    `data-signed-at="(\\d{4}-\\d\\d-\\d\\dT\\d\\d:\\d\\d:\\d\\dZ)" data-public-key="([A-Za-z0-9+/=]{1,400})" ` +
    `data-signature="([A-Za-z0-9+/=]{1,200})">`,
);

/** Formats a time as the signature records it: UTC, whole seconds. */
export function signingTime(now: Date): string {
  return `${now.toISOString().slice(0, 19)}Z`;
}

/** Signs a rendered (unsigned) page and returns it with the signature element before its end marker. */
export async function signPage(unsignedPage: string, signer: Signer, now: Date): Promise<string> {
  const at = unsignedPage.lastIndexOf(ANCHOR);
  if (at < 0) throw new Error("the rendered package has no end marker to place the signature before");
  const signedAt = signingTime(now);
  const signature = new Uint8Array(
    await crypto.subtle.sign(
      "Ed25519",
      signer.privateKey,
      signedMessage(unsignedPage, signer.fingerprint, signedAt),
    ),
  );
  const element = signatureElement({
    fingerprint: signer.fingerprint,
    signedAt,
    publicKey: signer.publicKey,
    signature,
  });
  return unsignedPage.slice(0, at) + element + unsignedPage.slice(at);
}

export type FoundSignature =
  | { readonly kind: "unsigned" }
  | { readonly kind: "signed"; readonly signature: EmbeddedSignature; readonly unsignedPage: string }
  | { readonly kind: "malformed"; readonly reason: string };

/** Finds the signature element of a page and returns the page without it (the text that was signed). */
export function findSignature(page: string): FoundSignature {
  const start = page.indexOf(START);
  if (start < 0) return { kind: "unsigned" };
  if (page.indexOf(START, start + 1) >= 0) {
    return { kind: "malformed", reason: "it holds more than one signature" };
  }
  const close = "</section>\n";
  const end = page.indexOf(close, start);
  const match = end < 0 ? null : ELEMENT.exec(page.slice(start, end + close.length));
  const publicKey = decodeBase64(match?.[3] ?? "");
  const signature = decodeBase64(match?.[4] ?? "");
  if (match === null || publicKey === undefined || signature === undefined || signature.length !== 64) {
    return { kind: "malformed", reason: "its signature element is not in the form fluxnote writes" };
  }
  const found: EmbeddedSignature = {
    fingerprint: match[1] ?? "",
    signedAt: match[2] ?? "",
    publicKey,
    signature,
  };
  // The element must be exactly what fluxnote writes, visible sentence included.
  if (signatureElement(found) !== page.slice(start, end + close.length)) {
    return { kind: "malformed", reason: "its signature element is not in the form fluxnote writes" };
  }
  // ...and where fluxnote puts it, so it cannot be slipped into a style sheet or a table cell.
  const after = end + close.length;
  if (!page.startsWith(ANCHOR, after) || page.lastIndexOf(ANCHOR) !== after) {
    return { kind: "malformed", reason: "its signature element is not just before the end marker" };
  }
  return {
    kind: "signed",
    signature: found,
    unsignedPage: page.slice(0, start) + page.slice(end + close.length),
  };
}

/** True when `signature` is a valid signature by `publicKey` (SPKI) over the unsigned page. */
export async function signatureHolds(
  signature: EmbeddedSignature,
  unsignedPage: string,
  publicKey: Uint8Array,
): Promise<boolean> {
  const key = await importPublicKey(publicKey);
  if (key === undefined) return false;
  const message = signedMessage(unsignedPage, signature.fingerprint, signature.signedAt);
  try {
    return await crypto.subtle.verify(
      "Ed25519",
      key,
      signature.signature as BufferSource,
      message as BufferSource,
    );
  } catch {
    return false;
  }
}
