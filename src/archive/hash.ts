import { Buffer } from "node:buffer";
import { createHash } from "node:crypto";

/** SHA-256 of bytes or UTF-8 text, lowercase hex. */
export function sha256Hex(data: Uint8Array | string): string {
  return createHash("sha256").update(data).digest("hex");
}

/** The whole-input hash: SHA-256 of the lines `<sha256>  <path>\n` of every input in build order. */
export function inputsHash(records: readonly { readonly path: string; readonly sha256: string }[]): string {
  return sha256Hex(records.map((r) => `${r.sha256}  ${r.path}\n`).join(""));
}

/** UTF-8 length of a text in bytes, without encoding it (a lone surrogate counts 3, as its U+FFFD replacement). */
export function utf8Length(text: string): number {
  return Buffer.byteLength(text, "utf8");
}
