import { sha256HexSmall } from "./sha256.ts";

/** Up to this size data is hashed here; above it node:crypto is loaded, the first time it is needed. */
const SMALL = 256 * 1024;

interface NodeCrypto {
  createHash(algorithm: "sha256"): { update(data: Uint8Array | string): { digest(encoding: "hex"): string } };
}
let nodeCrypto: NodeCrypto | undefined;

interface NodeBuffer {
  Buffer: { byteLength(text: string, encoding: "utf8"): number };
}
let nodeBuffer: NodeBuffer | undefined;

/** Node's built-in module `id`, through the process object (reached only when needed: it costs start-up time). */
function builtin<T>(id: string): T {
  return (globalThis as unknown as { process: { getBuiltinModule(id: string): T } }).process.getBuiltinModule(
    id,
  );
}

/** SHA-256 of bytes or UTF-8 text, lowercase hex. */
export function sha256Hex(data: Uint8Array | string): string {
  if (data.length <= SMALL / 4 || (typeof data !== "string" && data.length <= SMALL)) {
    return sha256HexSmall(typeof data === "string" ? new TextEncoder().encode(data) : data);
  }
  // Node's process object, reached only here: loading it costs start-up time that small inputs never need.
  nodeCrypto ??= builtin<NodeCrypto>("node:crypto");
  return nodeCrypto.createHash("sha256").update(data).digest("hex");
}

/** The whole-input hash: SHA-256 of the lines `<sha256>  <path>\n` of every input in build order. */
export function inputsHash(records: readonly { readonly path: string; readonly sha256: string }[]): string {
  return sha256Hex(records.map((r) => `${r.sha256}  ${r.path}\n`).join(""));
}

/**
 * UTF-8 length of a text in bytes, without encoding it (a lone surrogate counts 3, as its U+FFFD replacement).
 * Above `SMALL / 4` characters (results.json of a large project) node:buffer's native count, some eight times
 * faster than the loop below (it counts the same bytes: test/archive/utf8Length_test.ts).
 */
export function utf8Length(text: string): number {
  if (text.length > SMALL / 4) {
    nodeBuffer ??= builtin<NodeBuffer>("node:buffer");
    return nodeBuffer.Buffer.byteLength(text, "utf8");
  }
  return utf8LengthByLoop(text);
}

/** `utf8Length` by one pass over the UTF-16 code units (small texts, and the reference of the native count). */
export function utf8LengthByLoop(text: string): number {
  let bytes = 0;
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (c < 0x80) bytes += 1;
    else if (c < 0x800) bytes += 2;
    else if (c >= 0xd800 && c <= 0xdbff && i + 1 < text.length) {
      const next = text.charCodeAt(i + 1);
      if (next >= 0xdc00 && next <= 0xdfff) {
        bytes += 4;
        i++;
      } else bytes += 3;
    } else bytes += 3;
  }
  return bytes;
}
